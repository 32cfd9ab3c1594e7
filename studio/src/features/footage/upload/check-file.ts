import type { FootageLimits } from '../api/types';
import { formatBytes } from '../components/format';

/**
 * The server's upload rules (GET footage-limits), applied in the browser so a wrong file is refused
 * before a byte is sent. The server checks again when the upload is created.
 */
export function checkFootageFile(file: { name: string; type: string; size: number }, limits: FootageLimits): string | null {
  const dot = file.name.lastIndexOf('.');
  const extension = dot > 0 ? file.name.slice(dot + 1).toLowerCase() : '';
  const accepted = limits.types.map((type) => `.${type.extension}`).join(', ');
  const type = limits.types.find((candidate) => candidate.extension === extension);
  if (!type) return `"${file.name}" is not a video file we accept. Choose ${accepted}.`;
  const mime = file.type.toLowerCase();
  if (mime !== '' && mime !== 'application/octet-stream' && !type.mimeTypes.includes(mime)) {
    return `"${file.name}" ends in .${extension} but the browser reads it as ${mime}; it does not look like a video.`;
  }
  if (file.size === 0) return `"${file.name}" is empty.`;
  if (file.size > limits.maxBytes) {
    return `"${file.name}" is ${formatBytes(file.size)}; the largest accepted is ${formatBytes(limits.maxBytes)}.`;
  }
  return null;
}

/** The Dropzone's accept map (MIME type → extensions), from the server's list. */
export function acceptMap(limits: FootageLimits): Record<string, string[]> {
  const map: Record<string, string[]> = {};
  for (const type of limits.types) {
    for (const mime of type.mimeTypes) map[mime] = [...(map[mime] ?? []), `.${type.extension}`];
  }
  return map;
}
