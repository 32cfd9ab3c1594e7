import { formatBytes } from '../engine/byte-sizes';

/**
 * Rules for a footage upload, decided before any byte is sent: accepted file types (by extension
 * and the browser's MIME type), the size limit, the multipart plan and a safe file name. Pure.
 */

export interface FootageType {
  extension: string;
  /** The Content-Type stored with the object and served on playback. */
  contentType: string;
  /** MIME types browsers report for the extension. */
  mimeTypes: string[];
}

export const FOOTAGE_TYPES: readonly FootageType[] = [
  { extension: 'mp4', contentType: 'video/mp4', mimeTypes: ['video/mp4'] },
  { extension: 'mov', contentType: 'video/quicktime', mimeTypes: ['video/quicktime'] },
  { extension: 'webm', contentType: 'video/webm', mimeTypes: ['video/webm'] },
  { extension: 'mkv', contentType: 'video/x-matroska', mimeTypes: ['video/x-matroska', 'video/matroska', 'video/mkv'] },
];

/** What browsers report when they do not know a file's type (often the case for .mkv). */
const UNKNOWN_MIME_TYPES = ['', 'application/octet-stream'];

const MiB = 1024 * 1024;
export const MIN_PART_BYTES = 8 * MiB;
export const MAX_PART_BYTES = 64 * MiB;
/** S3's limit on parts in one multipart upload. */
export const MAX_PARTS = 10_000;
/** Parts grow with the file so a large file needs about this many requests; small files use 8 MiB parts. */
const TARGET_PARTS = 1_000;

/** Input the upload rules refuse; the message is written for the creator. */
export class UploadRuleError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'UploadRuleError';
  }
}

export function extensionOf(fileName: string): string {
  const dot = fileName.lastIndexOf('.');
  return dot <= 0 ? '' : fileName.slice(dot + 1).toLowerCase();
}

/** The footage type of a file, checked by extension and, when the browser gave one, by MIME type. */
export function resolveFootageType(fileName: string, mimeType: string): FootageType {
  const extension = extensionOf(fileName);
  const type = FOOTAGE_TYPES.find((candidate) => candidate.extension === extension);
  const accepted = FOOTAGE_TYPES.map((candidate) => `.${candidate.extension}`).join(', ');
  if (!type) {
    const found = extension === '' ? 'has no extension' : `is a .${extension} file`;
    throw new UploadRuleError(`"${fileName}" ${found}; upload a video file: ${accepted}.`);
  }
  const mime = mimeType.trim().toLowerCase().split(';')[0].trim();
  if (!UNKNOWN_MIME_TYPES.includes(mime) && !type.mimeTypes.includes(mime)) {
    throw new UploadRuleError(
      `"${fileName}" ends in .${extension} but its type is ${mime}; expected ${type.mimeTypes.join(' or ')}.`,
    );
  }
  return type;
}

/** Sizes in messages read as the studio shows them: one function, in the engine. */
export { formatBytes };

export function checkFileSize(sizeBytes: number, maxBytes: number): void {
  if (sizeBytes <= 0) throw new UploadRuleError('The file is empty.');
  if (sizeBytes > maxBytes) {
    throw new UploadRuleError(`The file is ${formatBytes(sizeBytes)}; the largest accepted is ${formatBytes(maxBytes)}.`);
  }
}

export interface PartPlan {
  partSizeBytes: number;
  partCount: number;
}

/** Part size from 8 to 64 MiB in whole MiB, chosen so the upload needs about a thousand parts at most. */
export function planParts(sizeBytes: number): PartPlan {
  const wanted = Math.ceil(sizeBytes / TARGET_PARTS / MiB) * MiB;
  const partSizeBytes = Math.min(MAX_PART_BYTES, Math.max(MIN_PART_BYTES, wanted));
  const partCount = Math.max(1, Math.ceil(sizeBytes / partSizeBytes));
  if (partCount > MAX_PARTS) {
    throw new UploadRuleError(`The file is too large to upload in ${MAX_PARTS} parts of ${formatBytes(MAX_PART_BYTES)}.`);
  }
  return { partSizeBytes, partCount };
}

/** Size in bytes of part `partNumber` (1-based): every part is full except perhaps the last. */
export function partLength(plan: PartPlan, sizeBytes: number, partNumber: number): number {
  return partNumber < plan.partCount ? plan.partSizeBytes : sizeBytes - plan.partSizeBytes * (plan.partCount - 1);
}

// Control characters, and bidirectional overrides that can disguise an extension ("evil\u202Emp4.exe").
// eslint-disable-next-line no-control-regex
const UNSAFE_CHARACTERS = /[\u0000-\u001f\u007f-\u009f\u200e\u200f\u202a-\u202e\u2066-\u2069]/gu;
const MAX_NAME_LENGTH = 200;

/**
 * The file name as shown in the studio: the last path segment only, without control or bidi
 * characters, Windows-reserved punctuation replaced, spaces collapsed, no leading dots, at most
 * 200 characters with the extension kept. Storage keys never use it.
 */
export function sanitiseFileName(fileName: string): string {
  const base = fileName.split(/[\\/]/u).pop() ?? '';
  let name = base
    .normalize('NFC')
    .replace(UNSAFE_CHARACTERS, '')
    .replace(/[<>:"|?*]/gu, '_')
    .replace(/\s+/gu, ' ')
    .trim();
  // A leading dot hides a file; a name that is only an extension (".mp4") gets a stem.
  name = /^\.+[^.]+$/u.test(name) ? `video${name.replace(/^\.+/u, '.')}` : name.replace(/^\.+/u, '');
  if (name === '') name = 'video';
  const extension = extensionOf(name);
  if ([...name].length > MAX_NAME_LENGTH) {
    // Keep a short extension so the shortened name still says what it is.
    const suffix = extension.length > 0 && extension.length <= 10 ? `.${extension}` : '';
    const stem = [...name.slice(0, name.length - suffix.length)];
    name = `${stem.slice(0, MAX_NAME_LENGTH - suffix.length).join('').trimEnd()}${suffix}`;
  }
  return name;
}

/** A default title from a file name: the name without its extension, separators read as spaces. */
export function titleFromFileName(fileName: string): string {
  const dot = fileName.lastIndexOf('.');
  const stem = dot >= 0 ? fileName.slice(0, dot) : fileName;
  const title = stem.replace(/[_]+/gu, ' ').replace(/\s+/gu, ' ').trim();
  return (title === '' ? 'Untitled footage' : title).slice(0, 200);
}
