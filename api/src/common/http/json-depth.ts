/**
 * How deeply a JSON text nests its objects and arrays, found in one pass over the bytes (brackets inside
 * strings do not count), so a hostile body is refused before JSON.parse and the validators walk it.
 * Returns as soon as `limit` is exceeded.
 */
export function jsonNestingExceeds(body: Buffer | string, limit: number): boolean {
  // Byte by byte: in UTF-8 the ASCII brackets, quote and backslash never occur inside a multi-byte character.
  const bytes = typeof body === 'string' ? Buffer.from(body) : body;
  let depth = 0;
  let inString = false;
  for (let index = 0; index < bytes.length; index++) {
    const char = bytes[index];
    if (inString) {
      if (char === BACKSLASH) index++;
      else if (char === QUOTE) inString = false;
    } else if (char === QUOTE) {
      inString = true;
    } else if (char === OPEN_BRACE || char === OPEN_BRACKET) {
      depth++;
      if (depth > limit) return true;
    } else if (char === CLOSE_BRACE || char === CLOSE_BRACKET) {
      depth--;
    }
  }
  return false;
}

const QUOTE = 0x22;
const BACKSLASH = 0x5c;
const OPEN_BRACE = 0x7b;
const CLOSE_BRACE = 0x7d;
const OPEN_BRACKET = 0x5b;
const CLOSE_BRACKET = 0x5d;
