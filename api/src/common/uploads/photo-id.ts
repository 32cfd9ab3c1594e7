/** A photo is addressed by the file name of its object key (a UUID), without the extension. */
export function photoIdOf(key: string): string {
  return key.slice(key.lastIndexOf('/') + 1).replace(/\.[a-z]+$/, '');
}
