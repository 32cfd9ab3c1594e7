import { TranscriptParseError } from '../engine/transcript-formats';

/**
 * Turns an attached transcript file's bytes into text: UTF-8 (with or without a byte order mark)
 * or UTF-16 with a byte order mark, as subtitle editors save them. Anything else is refused with
 * the line of the first byte that is not text. Pure.
 */
export function decodeTranscriptFile(bytes: Uint8Array): string {
  if (bytes[0] === 0xff && bytes[1] === 0xfe) return new TextDecoder('utf-16le').decode(bytes.subarray(2));
  if (bytes[0] === 0xfe && bytes[1] === 0xff) return new TextDecoder('utf-16be').decode(bytes.subarray(2));
  const body = bytes[0] === 0xef && bytes[1] === 0xbb && bytes[2] === 0xbf ? bytes.subarray(3) : bytes;
  const nul = body.indexOf(0);
  if (nul !== -1) {
    throw new TranscriptParseError(lineAt(body, nul), 'the file contains a NUL byte: it looks like a binary file, not a text transcript');
  }
  try {
    return new TextDecoder('utf-8', { fatal: true }).decode(body);
  } catch {
    const bad = Math.max(0, firstInvalidUtf8Byte(body));
    throw new TranscriptParseError(lineAt(body, bad), 'the file is not UTF-8 text; save it as UTF-8 and attach it again');
  }
}

/** 1-based line of a byte offset (line feeds before it, plus one). */
function lineAt(bytes: Uint8Array, offset: number): number {
  let line = 1;
  for (let index = 0; index < offset; index += 1) if (bytes[index] === 0x0a) line += 1;
  return line;
}

/** Offset of the first byte that breaks UTF-8 (RFC 3629: no overlongs, no surrogates, at most U+10FFFF), or -1. */
export function firstInvalidUtf8Byte(bytes: Uint8Array): number {
  let index = 0;
  while (index < bytes.length) {
    const lead = bytes[index];
    if (lead < 0x80) {
      index += 1;
      continue;
    }
    let length: number;
    let min: number;
    if (lead >= 0xc2 && lead <= 0xdf) [length, min] = [2, 0x80];
    else if (lead >= 0xe0 && lead <= 0xef) [length, min] = [3, 0x800];
    else if (lead >= 0xf0 && lead <= 0xf4) [length, min] = [4, 0x10000];
    else return index;
    if (index + length > bytes.length) return index;
    let codePoint = lead & (0xff >> (length + 1));
    for (let next = 1; next < length; next += 1) {
      const byte = bytes[index + next];
      if ((byte & 0xc0) !== 0x80) return index;
      codePoint = (codePoint << 6) | (byte & 0x3f);
    }
    if (codePoint < min || codePoint > 0x10ffff || (codePoint >= 0xd800 && codePoint <= 0xdfff)) return index;
    index += length;
  }
  return -1;
}
