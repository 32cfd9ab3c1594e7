/**
 * Reading ffprobe's JSON (`-print_format json -show_format -show_streams`) into the facts footage
 * keeps, and deciding whether a file is a video we accept. Pure: no process spawning here.
 */

/**
 * ffprobe's demuxer names (`format_name` lists them) of the accepted file types. One demuxer reads
 * both MP4 and QuickTime, another both Matroska and WebM, so the family alone does not say which.
 */
const ACCEPTED_DEMUXERS = new Map<string, 'mp4' | 'matroska'>([
  ['mov', 'mp4'],
  ['mp4', 'mp4'],
  ['m4a', 'mp4'],
  ['3gp', 'mp4'],
  ['3g2', 'mp4'],
  ['mj2', 'mp4'],
  ['matroska', 'matroska'],
  ['webm', 'matroska'],
]);

export interface MediaInfo {
  durationMs: number;
  width: number;
  height: number;
  /** Frames per second, three decimals (29.97 for 30000/1001); null when the file does not say. */
  frameRate: number | null;
  /** "mp4", "mov" (QuickTime), "matroska" or "webm". */
  container: string;
  videoCodec: string;
  audioCodec: string | null;
  /** Degrees the player turns the picture (the stream's display matrix, or the old `rotate` tag); 0, ±90 or 180. */
  rotation: number;
}

/** A file that is readable but is not a video we accept; `reason` is shown to the creator. */
export class NotAVideoError extends Error {
  constructor(readonly reason: string) {
    super(reason);
    this.name = 'NotAVideoError';
  }
}

interface ProbeStream {
  codec_type?: string;
  codec_name?: string;
  width?: number;
  height?: number;
  avg_frame_rate?: string;
  r_frame_rate?: string;
  duration?: string;
  disposition?: { attached_pic?: number };
  side_data_list?: { side_data_type?: string; rotation?: number }[];
  tags?: { rotate?: string };
}

interface ProbeOutput {
  format?: { format_name?: string; format_long_name?: string; duration?: string; tags?: { major_brand?: string } };
  streams?: ProbeStream[];
}

function parseRate(rate: string | undefined): number | null {
  if (!rate) return null;
  const [numerator, denominator = '1'] = rate.split('/');
  const value = Number(numerator) / Number(denominator);
  return Number.isFinite(value) && value > 0 ? Math.round(value * 1000) / 1000 : null;
}

function parseSeconds(value: string | undefined): number | null {
  const seconds = Number(value);
  return value !== undefined && Number.isFinite(seconds) && seconds > 0 ? seconds : null;
}

/**
 * Turns ffprobe's JSON into MediaInfo, or throws NotAVideoError naming what is wrong. `extension`
 * (the uploaded file's) tells WebM from Matroska, which share a demuxer; QuickTime is told from
 * MP4 by the file's brand.
 */
export function interpretProbe(output: unknown, extension?: string): MediaInfo {
  const probe = (typeof output === 'object' && output !== null ? output : {}) as ProbeOutput;
  const formatNames = (probe.format?.format_name ?? '').split(',').filter((name) => name !== '');
  const family = formatNames.map((name) => ACCEPTED_DEMUXERS.get(name)).find((name) => name !== undefined);
  if (!family) {
    const readAs = probe.format?.format_long_name ?? probe.format?.format_name ?? 'an unknown format';
    throw new NotAVideoError(`The file is not an MP4, MOV, WebM or MKV video (it reads as ${readAs}).`);
  }
  const streams = probe.streams ?? [];
  // Cover art in an audio file is a "video" stream too; it is not footage.
  const video = streams.find((stream) => stream.codec_type === 'video' && stream.disposition?.attached_pic !== 1);
  if (!video || !video.width || !video.height) {
    throw new NotAVideoError('The file has no video track.');
  }
  const seconds = parseSeconds(probe.format?.duration) ?? parseSeconds(video.duration);
  if (seconds === null) {
    throw new NotAVideoError('The video has no readable duration; it may be cut short or still being written.');
  }
  const audio = streams.find((stream) => stream.codec_type === 'audio');
  const container =
    family === 'mp4'
      ? probe.format?.tags?.major_brand?.trim() === 'qt'
        ? 'mov'
        : 'mp4'
      : extension === 'webm'
        ? 'webm'
        : 'matroska';
  return {
    durationMs: Math.round(seconds * 1000),
    width: video.width,
    height: video.height,
    frameRate: parseRate(video.avg_frame_rate) ?? parseRate(video.r_frame_rate),
    container,
    videoCodec: video.codec_name ?? 'unknown',
    audioCodec: audio?.codec_name ?? null,
    rotation: rotationOf(video),
  };
}

function rotationOf(video: ProbeStream): number {
  const matrix = video.side_data_list?.find((entry) => entry.side_data_type === 'Display Matrix');
  const degrees = typeof matrix?.rotation === 'number' ? matrix.rotation : Number(video.tags?.rotate ?? 0);
  if (!Number.isFinite(degrees)) return 0;
  const quarterTurns = Math.round(degrees / 90) % 4;
  return quarterTurns === 0 ? 0 : quarterTurns * 90;
}

/** ffprobe messages that mean "this is not media", as opposed to a network or storage hiccup worth retrying. */
const NOT_MEDIA_MESSAGES = [
  /Invalid data found when processing input/iu,
  /moov atom not found/iu,
  /EBML header parsing failed/iu,
  /could not find codec parameters/iu,
  /Format .* detected only with low score/iu,
];

export function isNotMediaMessage(stderr: string): boolean {
  return NOT_MEDIA_MESSAGES.some((pattern) => pattern.test(stderr));
}

/** The time of the poster frame: a tenth of the way in (past a fade from black), at most 10 s. */
export function posterTimeMs(durationMs: number): number {
  return Math.min(Math.floor(durationMs / 10), 10_000);
}
