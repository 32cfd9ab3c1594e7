/** Logo images we accept, recognised by their first bytes (the file name and the browser's type are not trusted). */
export const LOGO_MAX_BYTES = 2 * 1024 * 1024;

export interface ImageKind {
  contentType: 'image/png' | 'image/jpeg' | 'image/webp';
  extension: 'png' | 'jpg' | 'webp';
}

const PNG_SIGNATURE = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];

export function detectLogoImage(bytes: Uint8Array): ImageKind | null {
  const startsWith = (signature: number[], offset = 0) =>
    bytes.length >= offset + signature.length && signature.every((byte, index) => bytes[offset + index] === byte);
  const ascii = (text: string) => [...text].map((char) => char.charCodeAt(0));

  if (startsWith(PNG_SIGNATURE)) return { contentType: 'image/png', extension: 'png' };
  if (startsWith([0xff, 0xd8, 0xff])) return { contentType: 'image/jpeg', extension: 'jpg' };
  if (startsWith(ascii('RIFF')) && startsWith(ascii('WEBP'), 8)) return { contentType: 'image/webp', extension: 'webp' };
  return null;
}
