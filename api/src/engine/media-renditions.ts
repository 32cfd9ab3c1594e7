/**
 * What web renditions a footage gets, and the arithmetic of its scrub previews and waveform.
 * Pure: the media job (footage/footage-renditions.service.ts) runs ffmpeg with these numbers.
 */

/** Rendition sizes by their short side ("1080p" is 1920×1080 landscape, 1080×1920 portrait). */
export const RENDITION_SHORT_SIDES = [1080, 720, 360] as const;

/** Caps for H.264 at each short side (kbit/s); common practice for streaming ladders, rounded. */
const MAX_KBITS_BY_SHORT_SIDE: ReadonlyArray<[number, number]> = [
  [1080, 5000],
  [720, 2800],
  [360, 800],
];

export interface RenditionSize {
  width: number;
  height: number;
  /** Upper bound of the video bit rate (ffmpeg -maxrate), kbit/s. */
  maxKbits: number;
}

export interface DisplaySize {
  width: number;
  height: number;
}

/** Even number nearest to `value` (H.264 with 4:2:0 chroma needs even sizes), at least 2. */
function even(value: number): number {
  return Math.max(2, Math.round(value / 2) * 2);
}

/**
 * The picture as players show it: a stream rotated by ±90° (phone portrait clips store landscape
 * pixels plus a display matrix) swaps width and height.
 */
export function displaySize(width: number, height: number, rotationDegrees: number): DisplaySize {
  const quarterTurns = Math.round(rotationDegrees / 90);
  return Math.abs(quarterTurns) % 2 === 1 ? { width: height, height: width } : { width, height };
}

/**
 * The rendition ladder, highest first: the source's short side capped at 1080, then 720 and 360
 * below it; never larger than the source, so a 240-line clip gets one 240-line rendition.
 */
export function renditionLadder(display: DisplaySize): RenditionSize[] {
  const portrait = display.height > display.width;
  const sourceShort = Math.min(display.width, display.height);
  const sourceLong = Math.max(display.width, display.height);
  const top = Math.min(sourceShort, RENDITION_SHORT_SIDES[0]);
  const shortSides = [top, ...RENDITION_SHORT_SIDES.filter((side) => side < top)];
  return shortSides.map((short) => {
    const shortSide = even(short);
    const longSide = even((sourceLong * short) / sourceShort);
    const maxKbits = MAX_KBITS_BY_SHORT_SIDE.find(([side]) => short >= side)?.[1] ?? scaledKbits(short);
    return portrait ? { width: shortSide, height: longSide, maxKbits } : { width: longSide, height: shortSide, maxKbits };
  });
}

/** Below 360 lines: the 360 cap scaled by pixel count, at least 200 kbit/s. */
function scaledKbits(short: number): number {
  return Math.max(200, Math.round((800 * (short / 360) ** 2) / 10) * 10);
}

/** The constant frame rates renditions use; NTSC rates as ffmpeg writes them. */
const STANDARD_RATES: ReadonlyArray<{ value: number; ffmpeg: string }> = [
  { value: 24000 / 1001, ffmpeg: '24000/1001' },
  { value: 24, ffmpeg: '24' },
  { value: 25, ffmpeg: '25' },
  { value: 30000 / 1001, ffmpeg: '30000/1001' },
  { value: 30, ffmpeg: '30' },
  { value: 50, ffmpeg: '50' },
  { value: 60000 / 1001, ffmpeg: '60000/1001' },
  { value: 60, ffmpeg: '60' },
];

export interface ConstantRate {
  /** Frames per second. */
  value: number;
  /** The same rate as ffmpeg's `fps` filter takes it. */
  ffmpeg: string;
}

/**
 * A variable-frame-rate phone clip averages an odd rate (29.87); renditions use the nearest
 * standard rate, at most 60 (higher rates are for slow motion, not for following a guide).
 * Unknown rates get 30.
 */
export function constantFrameRate(averageRate: number | null): ConstantRate {
  if (averageRate === null || !Number.isFinite(averageRate) || averageRate <= 0) return { value: 30, ffmpeg: '30' };
  const capped = Math.min(averageRate, 60);
  let best = STANDARD_RATES[0];
  for (const rate of STANDARD_RATES) if (Math.abs(rate.value - capped) < Math.abs(best.value - capped)) best = rate;
  return { value: best.value, ffmpeg: best.ffmpeg };
}

/** HLS segments last this long; keyframes fall every KEYFRAME_SECONDS, so each segment starts on one. */
export const SEGMENT_SECONDS = 4;
export const KEYFRAME_SECONDS = 2;

/** Frames in one group of pictures at `rate` (the fixed GOP passed as -g). */
export function framesPerKeyframe(rate: ConstantRate): number {
  return Math.max(1, Math.round(rate.value * KEYFRAME_SECONDS));
}

/* ------------------------------------------------------------------------------- scrub previews */

/** A 3-hour footage gets at most this many thumbnails; short clips one every 2 s. */
export const MAX_THUMBNAILS = 400;
export const MIN_THUMBNAIL_SECONDS = 2;
export const THUMBNAIL_WIDTH = 160;
/** Tiles per sprite sheet side: a sheet holds 10 × 10 thumbnails. */
export const SPRITE_COLUMNS = 10;
export const SPRITE_ROWS = 10;

export interface SpriteLayout {
  intervalSeconds: number;
  tileWidth: number;
  tileHeight: number;
  columns: number;
  rows: number;
  /** Thumbnails in all sheets together. */
  count: number;
  sheets: number;
}

/** Whole seconds between thumbnails so the count stays within MAX_THUMBNAILS, and the sheets that holds. */
export function spriteLayout(durationMs: number, display: DisplaySize): SpriteLayout {
  const seconds = Math.max(durationMs / 1000, 0.001);
  const intervalSeconds = Math.max(MIN_THUMBNAIL_SECONDS, Math.ceil(seconds / MAX_THUMBNAILS));
  const count = Math.max(1, Math.ceil(seconds / intervalSeconds));
  const perSheet = SPRITE_COLUMNS * SPRITE_ROWS;
  return {
    intervalSeconds,
    tileWidth: THUMBNAIL_WIDTH,
    tileHeight: even((THUMBNAIL_WIDTH * display.height) / display.width),
    columns: SPRITE_COLUMNS,
    rows: SPRITE_ROWS,
    count,
    sheets: Math.ceil(count / perSheet),
  };
}

/** WebVTT time stamp hh:mm:ss.mmm. */
export function vttTimestamp(milliseconds: number): string {
  const total = Math.max(0, Math.round(milliseconds));
  const hours = Math.floor(total / 3_600_000);
  const minutes = Math.floor((total % 3_600_000) / 60_000);
  const seconds = Math.floor((total % 60_000) / 1000);
  const millis = total % 1000;
  const pad = (value: number, width: number) => String(value).padStart(width, '0');
  return `${pad(hours, 2)}:${pad(minutes, 2)}:${pad(seconds, 2)}.${pad(millis, 3)}`;
}

/**
 * The WebVTT thumbnails track: one cue per thumbnail whose text is the sheet's URL with a media
 * fragment `#xywh=x,y,w,h` (W3C Media Fragments URI 1.0, spatial dimension) naming the tile.
 */
export function thumbnailsTrack(layout: SpriteLayout, durationMs: number, sheetUrl: (sheet: number) => string): string {
  const perSheet = layout.columns * layout.rows;
  const lines = ['WEBVTT', ''];
  for (let index = 0; index < layout.count; index += 1) {
    const startMs = index * layout.intervalSeconds * 1000;
    const endMs = Math.min((index + 1) * layout.intervalSeconds * 1000, durationMs);
    if (endMs <= startMs) break;
    const sheet = Math.floor(index / perSheet);
    const onSheet = index % perSheet;
    const x = (onSheet % layout.columns) * layout.tileWidth;
    const y = Math.floor(onSheet / layout.columns) * layout.tileHeight;
    lines.push(`${vttTimestamp(startMs)} --> ${vttTimestamp(endMs)}`);
    lines.push(`${sheetUrl(sheet)}#xywh=${x},${y},${layout.tileWidth},${layout.tileHeight}`);
    lines.push('');
  }
  return lines.join('\n');
}

/* ------------------------------------------------------------------------------------ waveform */

/** The job decodes audio to mono 16-bit PCM at this rate: plenty for an envelope, 16 kB per second. */
export const WAVEFORM_SAMPLE_RATE = 8000;
/** A 3-hour footage gets at most this many peaks; short clips 20 per second. */
export const MAX_PEAKS = 20_000;
export const MAX_PEAKS_PER_SECOND = 20;

/** Samples folded into one peak, so the waveform stays within MAX_PEAKS. */
export function samplesPerPeak(durationMs: number): number {
  const seconds = Math.max(durationMs / 1000, 0.001);
  const peaksPerSecond = Math.min(MAX_PEAKS_PER_SECOND, MAX_PEAKS / seconds);
  return Math.max(1, Math.ceil(WAVEFORM_SAMPLE_RATE / peaksPerSecond));
}

/**
 * Folds a stream of signed 16-bit little-endian mono samples into peaks: the largest absolute
 * sample of each run of `samplesPerPeak`, as a fraction of full scale. Chunks may split a sample.
 */
export class PeakAccumulator {
  private readonly peaks: number[] = [];
  private current = 0;
  private inBucket = 0;
  private carry: number | null = null;

  constructor(private readonly perPeak: number) {
    if (!Number.isInteger(perPeak) || perPeak < 1) throw new RangeError('samplesPerPeak must be a whole number ≥ 1');
  }

  push(chunk: Uint8Array): void {
    let offset = 0;
    if (this.carry !== null && chunk.length > 0) {
      this.add(this.carry | (chunk[0] << 8));
      this.carry = null;
      offset = 1;
    }
    for (; offset + 1 < chunk.length; offset += 2) this.add(chunk[offset] | (chunk[offset + 1] << 8));
    if (offset < chunk.length) this.carry = chunk[offset];
  }

  /** The peaks, 0..1 with two decimals; a partly filled last bucket counts. */
  finish(): number[] {
    if (this.inBucket > 0) this.close();
    return this.peaks;
  }

  private add(unsigned: number): void {
    const sample = unsigned >= 0x8000 ? unsigned - 0x10000 : unsigned;
    const magnitude = Math.abs(sample);
    if (magnitude > this.current) this.current = magnitude;
    this.inBucket += 1;
    if (this.inBucket === this.perPeak) this.close();
  }

  private close(): void {
    this.peaks.push(Math.round(Math.min(1, this.current / 32768) * 100) / 100);
    this.current = 0;
    this.inBucket = 0;
  }
}

/**
 * The transcode job's share of the whole per phase: converting is nearly all of it; starting (clearing
 * an earlier try's outputs, probing, ffmpeg opening the source) comes first, packing (sprite sheets,
 * the download MP4, the waveform) and storing the outputs follow. The creator sees one percentage
 * that moves from the start to the end, not a number parked at 0 or 99 while no frame is counted.
 * The weights are our own estimate from this box (storing ≈ 2–4 % of the time on local storage).
 */
export const RENDITION_JOB_PHASES = {
  starting: { start: 0, share: 0.01 },
  converting: { start: 0.01, share: 0.93 },
  packing: { start: 0.94, share: 0.02 },
  storing: { start: 0.96, share: 0.04 },
} as const;

export type RenditionJobPhase = keyof typeof RENDITION_JOB_PHASES;

/** The whole job's fraction done, from the phase and how far into it the job is (0–1). */
export function renditionJobFraction(phase: RenditionJobPhase, phaseFraction: number): number {
  const { start, share } = RENDITION_JOB_PHASES[phase];
  return start + share * Math.min(1, Math.max(0, phaseFraction));
}

/**
 * Percent done (one decimal) and the seconds left, by straight-line extrapolation of the time spent
 * so far; no estimate before 1 % (the start-up would dominate it).
 */
export function progressEstimate(fraction: number, elapsedMs: number): { percent: number; secondsLeft: number | null } {
  const done = Math.min(1, Math.max(0, fraction));
  const percent = Math.round(done * 1000) / 10;
  if (done <= 0.01 || elapsedMs <= 0) return { percent, secondsLeft: null };
  return { percent, secondsLeft: Math.max(0, Math.round(((elapsedMs / done) * (1 - done)) / 1000)) };
}
