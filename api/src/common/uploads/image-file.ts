import { BadRequestException } from '@nestjs/common';
import { megabytes } from './single-file-upload.decorator';

/** Images we accept, recognised by their first bytes (the file name and the browser's type are not trusted). */
export interface ImageKind {
  contentType: 'image/png' | 'image/jpeg' | 'image/webp';
  extension: 'png' | 'jpg' | 'webp';
}

const PNG_SIGNATURE = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];

export function detectImage(bytes: Uint8Array): ImageKind | null {
  const startsWith = (signature: number[], offset = 0) =>
    bytes.length >= offset + signature.length && signature.every((byte, index) => bytes[offset + index] === byte);
  const ascii = (text: string) => [...text].map((char) => char.charCodeAt(0));

  if (startsWith(PNG_SIGNATURE)) return { contentType: 'image/png', extension: 'png' };
  if (startsWith([0xff, 0xd8, 0xff])) return { contentType: 'image/jpeg', extension: 'jpg' };
  if (startsWith(ascii('RIFF')) && startsWith(ascii('WEBP'), 8)) return { contentType: 'image/webp', extension: 'webp' };
  return null;
}

/** The parts of an uploaded file we read (multer's memory storage). */
export interface UploadedFileLike {
  buffer: Buffer;
  size: number;
}

/**
 * Checks an upload is a non-empty PNG, JPEG or WebP within `maxBytes`, with messages naming
 * the form field, and gives its kind and bytes.
 */
export function requireImage(
  file: UploadedFileLike | undefined,
  { field, what, maxBytes }: { field: string; what: string; maxBytes: number },
): ImageKind & { bytes: Buffer } {
  const limit = megabytes(maxBytes);
  if (!file || file.size === 0) {
    throw new BadRequestException({ message: `Choose an image file for ${what.toLowerCase()}`, errors: { [field]: 'Choose an image file' } });
  }
  if (file.size > maxBytes) {
    throw new BadRequestException({ message: `${what} must be ${limit} or smaller`, errors: { [field]: `At most ${limit}` } });
  }
  const kind = detectImage(file.buffer);
  if (!kind) {
    throw new BadRequestException({ message: `${what} must be a PNG, JPEG or WebP image`, errors: { [field]: 'PNG, JPEG or WebP only' } });
  }
  return { ...kind, bytes: file.buffer };
}
