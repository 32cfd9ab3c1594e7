import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { GROWTH_ALLOWANCE, growthRatio } from '../../../api/src/testing/linear-time';
import { parseThumbnailTrack, tileAt, type ThumbnailTile } from './vtt-thumbnails';

const TRACK_URL = 'https://studio.example/api/workshops/w1/footage/f1/thumbnails.vtt';

/** A track as our pipeline writes it: one 160×90 tile every 5 s, 5 tiles to a row. */
function track(tileCount: number, target = (index: number) => `sprite.jpg#xywh=${(index % 5) * 160},${Math.floor(index / 5) * 90},160,90`) {
  const clock = (ms: number) => {
    const hours = Math.floor(ms / 3_600_000);
    const minutes = Math.floor(ms / 60_000) % 60;
    const seconds = Math.floor(ms / 1000) % 60;
    return `${String(hours).padStart(2, '0')}:${String(minutes).padStart(2, '0')}:${String(seconds).padStart(2, '0')}.${String(ms % 1000).padStart(3, '0')}`;
  };
  const cues = Array.from({ length: tileCount }, (_, index) => `${clock(index * 5000)} --> ${clock((index + 1) * 5000)}\n${target(index)}`);
  return `WEBVTT\n\n${cues.join('\n\n')}\n`;
}

describe('parseThumbnailTrack', () => {
  it('reads each cue as a tile of the sprite sheet, the name resolved beside the track (W3C Media Fragments xywh)', () => {
    const tiles = parseThumbnailTrack(track(7), TRACK_URL);
    expect(tiles).toHaveLength(7);
    expect(tiles[0]).toEqual({
      startMs: 0,
      endMs: 5000,
      imageUrl: 'https://studio.example/api/workshops/w1/footage/f1/sprite.jpg',
      x: 0,
      y: 0,
      width: 160,
      height: 90,
    });
    // The sixth tile starts the second row of the sheet.
    expect(tiles[5]).toMatchObject({ startMs: 25_000, endMs: 30_000, x: 0, y: 90 });
    expect(tiles[6]).toMatchObject({ x: 160, y: 90 });
  });

  it('keeps absolute (e.g. presigned) sprite addresses as they are, query included', () => {
    const signed = 'https://storage.example/bucket/f1/sprite.jpg?X-Amz-Signature=abc&X-Amz-Expires=300';
    const [tile] = parseThumbnailTrack(track(1, () => `${signed}#xywh=0,0,160,90`), TRACK_URL);
    expect(tile.imageUrl).toBe(signed);
  });

  it('reads short timestamps (mm:ss.ttt), CRLF line ends, cue identifiers, NOTE blocks and the pixel: unit', () => {
    const text = 'WEBVTT\r\n\r\nNOTE made by the pipeline\r\n\r\nthumb-1\r\n00:00.000 --> 00:04.500\r\nsheet.jpg#xywh=pixel:0,0,120,68\r\n\r\nthumb-2\r\n01:02:03.250 --> 01:02:08.250 align:start\r\nsheet.jpg#xywh=120,0,120,68\r\n';
    const tiles = parseThumbnailTrack(text, TRACK_URL);
    expect(tiles.map((tile) => [tile.startMs, tile.endMs, tile.x, tile.width])).toEqual([
      [0, 4500, 0, 120],
      [3_723_250, 3_728_250, 120, 120],
    ]);
  });

  it('skips cues that do not name a tile, are empty or run backwards, and reads nothing that is not WebVTT', () => {
    const text = [
      'WEBVTT',
      '',
      '00:00:00.000 --> 00:00:05.000',
      'sprite.jpg',
      '',
      '00:00:05.000 --> 00:00:10.000',
      'sprite.jpg#xywh=0,0,0,90',
      '',
      '00:00:15.000 --> 00:00:10.000',
      'sprite.jpg#xywh=0,0,160,90',
      '',
      '00:00:20.000 --> 00:00:25.000',
      'sprite.jpg#xywh=160,0,160,90',
    ].join('\n');
    expect(parseThumbnailTrack(text, TRACK_URL).map((tile) => tile.startMs)).toEqual([20_000]);
    expect(parseThumbnailTrack('00:00:00.000 --> 00:00:05.000\nsprite.jpg#xywh=0,0,160,90', TRACK_URL)).toEqual([]);
    expect(parseThumbnailTrack('', TRACK_URL)).toEqual([]);
  });

  it('never throws, and every tile it returns has a positive size and span (fast-check)', () => {
    const line = fc.oneof(
      fc.string(),
      fc.constant('00:00:01.000 --> 00:00:02.000'),
      fc.constant('sprite.jpg#xywh=1,2,3,4'),
      fc.constant('http://[bad#xywh=1,2,3,4'),
      fc.constant(''),
    );
    fc.assert(
      fc.property(fc.array(line, { maxLength: 40 }), (lines) => {
        const tiles = parseThumbnailTrack(['WEBVTT', ...lines].join('\n'), TRACK_URL);
        for (const tile of tiles) {
          expect(tile.endMs).toBeGreaterThan(tile.startMs);
          expect(tile.width * tile.height).toBeGreaterThan(0);
        }
      }),
    );
  });

  it('runs in linear time: 8× the cues within 20× the time (ratio, api/src/testing/linear-time.ts)', () => {
    const small = track(500);
    const large = track(4000);
    expect(growthRatio((text: string) => parseThumbnailTrack(text, TRACK_URL), small, large)).toBeLessThanOrEqual(GROWTH_ALLOWANCE);
    // A hostile line (long runs of digits and colons) stays linear too.
    const hostile = (size: number) => `WEBVTT\n${'1:'.repeat(size)}00.000 -->${' '.repeat(size)}x\n${'9,'.repeat(size)}`;
    expect(growthRatio((text: string) => parseThumbnailTrack(text, TRACK_URL), hostile(2000), hostile(16_000))).toBeLessThanOrEqual(
      GROWTH_ALLOWANCE,
    );
  });
});

describe('tileAt', () => {
  const tiles: ThumbnailTile[] = parseThumbnailTrack(track(4), TRACK_URL);

  it('finds the tile whose span holds the moment (start inclusive, end exclusive)', () => {
    expect(tileAt(tiles, 0)?.startMs).toBe(0);
    expect(tileAt(tiles, 4999)?.startMs).toBe(0);
    expect(tileAt(tiles, 5000)?.startMs).toBe(5000);
    expect(tileAt(tiles, 19_999)?.startMs).toBe(15_000);
  });

  it('answers null past the last tile, before the first, in a gap, and for no tiles', () => {
    expect(tileAt(tiles, 20_000)).toBeNull();
    expect(tileAt(tiles, -1)).toBeNull();
    const gapped = [tiles[0], tiles[2]];
    expect(tileAt(gapped, 7000)).toBeNull();
    expect(tileAt([], 0)).toBeNull();
  });

  it('agrees with a plain scan for any moment (fast-check)', () => {
    fc.assert(
      fc.property(fc.integer({ min: -1000, max: 25_000 }), (ms) => {
        const scanned = tiles.find((tile) => tile.startMs <= ms && ms < tile.endMs) ?? null;
        expect(tileAt(tiles, ms)).toBe(scanned);
      }),
    );
  });
});
