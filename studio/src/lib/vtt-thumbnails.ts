/**
 * Scrub previews: a WebVTT thumbnails track names, for each stretch of the footage, a tile of a sprite
 * sheet (`sprite.jpg#xywh=x,y,w,h`, the W3C Media Fragments spatial dimension). Plain functions, no React.
 * The track is made by our own pipeline, so a cue that does not read is skipped rather than refused:
 * a missing preview is better than none at all.
 */

/** One tile: the image to show while the pointer is between `startMs` and `endMs`. */
export interface ThumbnailTile {
  startMs: number;
  endMs: number;
  /** The sprite sheet's address, resolved against the track's own address. */
  imageUrl: string;
  x: number;
  y: number;
  width: number;
  height: number;
}

const TIMING = /^\s*((?:\d+:)?\d{1,2}:\d{2}\.\d{3})\s+-->\s+((?:\d+:)?\d{1,2}:\d{2}\.\d{3})(?:\s|$)/;
const SPATIAL_FRAGMENT = /^(.*)#xywh=(?:pixel:)?(\d+),(\d+),(\d+),(\d+)\s*$/;

/** `hh:mm:ss.ttt` or `mm:ss.ttt` (WebVTT timestamps) in milliseconds. */
function timestampMs(text: string): number {
  const [clock, millis] = text.split('.');
  const fields = clock.split(':').map(Number);
  const [hours, minutes, seconds] = fields.length === 3 ? fields : [0, fields[0], fields[1]];
  return ((hours * 60 + minutes) * 60 + seconds) * 1000 + Number(millis);
}

function resolveImage(target: string, trackUrl: string): string | null {
  try {
    return new URL(target, trackUrl).toString();
  } catch {
    return null;
  }
}

/**
 * The tiles of a thumbnails track in time order. `trackUrl` must be absolute (e.g. `new URL(path, location.href)`)
 * so relative sprite names resolve as the browser would. One pass over the lines: linear in the track's length.
 */
export function parseThumbnailTrack(text: string, trackUrl: string): ThumbnailTile[] {
  const lines = text.split(/\r\n|\r|\n/);
  if (!/^\uFEFF?WEBVTT(?:[ \t]|$)/.test(lines[0] ?? '')) return [];
  const tiles: ThumbnailTile[] = [];
  for (let index = 1; index < lines.length; index += 1) {
    const timing = TIMING.exec(lines[index]);
    if (!timing) continue;
    const payload = (lines[index + 1] ?? '').trim();
    const fragment = SPATIAL_FRAGMENT.exec(payload);
    if (!fragment) continue;
    index += 1;
    const startMs = timestampMs(timing[1]);
    const endMs = timestampMs(timing[2]);
    const imageUrl = resolveImage(fragment[1], trackUrl);
    const [x, y, width, height] = fragment.slice(2, 6).map(Number);
    if (endMs <= startMs || imageUrl === null || width === 0 || height === 0) continue;
    tiles.push({ startMs, endMs, imageUrl, x, y, width, height });
  }
  return tiles.sort((a, b) => a.startMs - b.startMs);
}

/** The tile on show at `ms` (the last one starting at or before it, if it has not ended), or null. Binary search. */
export function tileAt(tiles: readonly ThumbnailTile[], ms: number): ThumbnailTile | null {
  let low = 0;
  let high = tiles.length - 1;
  let found = -1;
  while (low <= high) {
    const middle = (low + high) >> 1;
    if (tiles[middle].startMs <= ms) {
      found = middle;
      low = middle + 1;
    } else {
      high = middle - 1;
    }
  }
  if (found === -1) return null;
  const tile = tiles[found];
  return ms < tile.endMs ? tile : null;
}
