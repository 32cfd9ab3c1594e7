/** The part of number-to-words 1.2.4 (a test-only reference, no bundled types) the specs use. */
declare module 'number-to-words' {
  /** English words for an integer, e.g. 1234 → "one thousand, two hundred thirty-four". */
  export function toWords(value: number): string;
}
