/** Display helpers for footage: sizes in decimal units (the API's own formatBytes), times left (clocks are in lib/clock.ts). */
import { formatBytes } from '@fitwright/engine';

export { formatBytes };

export function formatSpeed(bytesPerSecond: number): string {
  return `${formatBytes(bytesPerSecond)}/s`;
}

/** "about 3 min left", "12 s left". */
export function formatTimeLeft(seconds: number): string {
  if (seconds < 60) return `${seconds} s left`;
  if (seconds < 3600) return `about ${Math.round(seconds / 60)} min left`;
  const hours = Math.floor(seconds / 3600);
  return `about ${hours} h ${Math.round((seconds % 3600) / 60)} min left`;
}
