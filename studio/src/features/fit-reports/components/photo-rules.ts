import { FIT_REPORT_LIMITS } from '../api/queries';

/** The images the server accepts (it checks the bytes again), by type and by name. */
export const PHOTO_TYPES: Record<string, string[]> = {
  'image/jpeg': ['.jpg', '.jpeg'],
  'image/png': ['.png'],
  'image/webp': ['.webp'],
};

/** "15 MB", "2.4 MB", "850 kB": binary units, as the server states its limit. */
export function formatSize(bytes: number): string {
  if (bytes < 1024 * 1024) return `${Math.max(1, Math.round(bytes / 1024))} kB`;
  const megabytes = bytes / (1024 * 1024);
  return `${Number.isInteger(megabytes) ? megabytes : megabytes.toFixed(1)} MB`;
}

/** Why this file cannot go with a report, in a sentence, or null when it can. */
export function photoProblem(file: { name: string; type: string; size: number }): string | null {
  const extension = file.name.includes('.') ? file.name.slice(file.name.lastIndexOf('.')).toLowerCase() : '';
  const byType = PHOTO_TYPES[file.type.toLowerCase()];
  const byName = Object.values(PHOTO_TYPES).some((extensions) => extensions.includes(extension));
  if (!(byType ?? (file.type === '' && byName))) return `"${file.name}" is not a photo we accept. Choose JPEG, PNG or WebP images.`;
  if (file.size === 0) return `"${file.name}" is empty.`;
  if (file.size > FIT_REPORT_LIMITS.photoMaxBytes) {
    return `"${file.name}" is ${formatSize(file.size)}; each photo may be at most ${formatSize(FIT_REPORT_LIMITS.photoMaxBytes)}.`;
  }
  return null;
}

/**
 * Adds newly chosen files to those already picked: files with a problem are refused with a
 * sentence each, and past the limit the rest are left out (saying which).
 */
export function addPhotos(current: readonly File[], chosen: readonly File[]): { photos: File[]; problems: string[] } {
  const photos = [...current];
  const problems: string[] = [];
  const leftOut: string[] = [];
  for (const file of chosen) {
    const problem = photoProblem(file);
    if (problem) problems.push(problem);
    else if (photos.length >= FIT_REPORT_LIMITS.photosMax) leftOut.push(`"${file.name}"`);
    else photos.push(file);
  }
  if (leftOut.length) {
    problems.push(`A report takes up to ${FIT_REPORT_LIMITS.photosMax} photos; ${leftOut.join(', ')} ${leftOut.length === 1 ? 'was' : 'were'} left out.`);
  }
  return { photos, problems };
}
