import { TranscriptParseError } from '../engine/transcript-formats';
import { decodeTranscriptFile, firstInvalidUtf8Byte } from './transcript-text';

const bytes = (...parts: (string | number[])[]) =>
  Buffer.concat(parts.map((part) => (typeof part === 'string' ? Buffer.from(part, 'utf8') : Buffer.from(part))));

describe('decodeTranscriptFile', () => {
  it('reads UTF-8 with or without a byte order mark', () => {
    expect(decodeTranscriptFile(bytes('WEBVTT\n\ncafé'))).toBe('WEBVTT\n\ncafé');
    expect(decodeTranscriptFile(bytes([0xef, 0xbb, 0xbf], 'WEBVTT'))).toBe('WEBVTT');
  });

  it('reads UTF-16 with a byte order mark (Unicode Standard, ch. 3.10), as some subtitle editors save', () => {
    const le = Buffer.concat([Buffer.from([0xff, 0xfe]), Buffer.from('WEBVTT\nÄ', 'utf16le')]);
    expect(decodeTranscriptFile(le)).toBe('WEBVTT\nÄ');
    const be = Buffer.from(Buffer.from('WEBVTT', 'utf16le')).swap16();
    expect(decodeTranscriptFile(Buffer.concat([Buffer.from([0xfe, 0xff]), be]))).toBe('WEBVTT');
  });

  it('names the line of the first byte that is not UTF-8 (a Latin-1 "é")', () => {
    const latin1 = bytes('WEBVTT\n\n00:00:01.000 --> 00:00:02.000\ncaf', [0xe9], '\n');
    expect(() => decodeTranscriptFile(latin1)).toThrow(
      new TranscriptParseError(4, 'the file is not UTF-8 text; save it as UTF-8 and attach it again'),
    );
  });

  it('refuses binary files', () => {
    expect(() => decodeTranscriptFile(bytes('PK', [0x03, 0x04, 0x00]))).toThrow(/NUL byte/);
  });
});

describe('firstInvalidUtf8Byte (RFC 3629)', () => {
  it('accepts valid sequences and points at overlongs, surrogates, truncation and stray continuation bytes', () => {
    expect(firstInvalidUtf8Byte(bytes('a€𝄞'))).toBe(-1);
    expect(firstInvalidUtf8Byte(bytes('a', [0xc0, 0xaf]))).toBe(1);
    expect(firstInvalidUtf8Byte(bytes('ab', [0xed, 0xa0, 0x80]))).toBe(2);
    expect(firstInvalidUtf8Byte(bytes('abc', [0xe2, 0x82]))).toBe(3);
    expect(firstInvalidUtf8Byte(bytes([0x80]))).toBe(0);
    expect(firstInvalidUtf8Byte(bytes([0xf4, 0x90, 0x80, 0x80]))).toBe(0);
  });
});
