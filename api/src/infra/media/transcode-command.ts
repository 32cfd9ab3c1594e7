/**
 * The one ffmpeg command that turns a source into everything the web needs, decoding it once:
 * H.264 High + AAC renditions cut into HLS (fMP4 segments, one master playlist), the scrub-preview
 * sprite sheets and mono PCM for the waveform. Pure: builds arguments and reads progress lines.
 */
import {
  type ConstantRate,
  framesPerKeyframe,
  KEYFRAME_SECONDS,
  type RenditionSize,
  SEGMENT_SECONDS,
  type SpriteLayout,
  WAVEFORM_SAMPLE_RATE,
} from '../../engine/media-renditions';

export interface TranscodePlan {
  /** A local path or a presigned storage URL. */
  input: string;
  /** A fresh, empty folder; outputs are written under it (layout in TRANSCODE_OUTPUTS). */
  outputDir: string;
  renditions: RenditionSize[];
  frameRate: ConstantRate;
  hasAudio: boolean;
  durationMs: number;
  sprites: SpriteLayout;
  /** x264 speed preset; `veryfast` keeps a 2-core box near real time for 1080p. */
  preset?: string;
}

/** Where the command writes, relative to outputDir. */
export const TRANSCODE_OUTPUTS = {
  master: 'master.m3u8',
  variantPlaylist: (index: number) => `v${index}/index.m3u8`,
  /** Single thumbnails; a second, cheap step tiles them into sheets (a tile filter in the main run holds back its progress reports). */
  thumbnailPattern: 'thumb-%04d.jpg',
  spritePattern: 'sprite-%02d.jpg',
  spriteSheet: (sheet: number) => `sprite-${String(sheet + 1).padStart(2, '0')}.jpg`,
  pcm: 'audio.pcm',
} as const;

/** AAC at 48 kHz stereo for every rendition; a silent track when the source has no audio, so every rendition has audio. */
const AUDIO_ARGS = ['-c:a', 'aac', '-b:a', '128k', '-ar', '48000', '-ac', '2'];

/** File descriptor the caller opens for ffmpeg's `-progress` key=value lines. */
export const PROGRESS_FD = 3;

export function transcodeArguments(plan: TranscodePlan): string[] {
  const count = plan.renditions.length;
  const seconds = (plan.durationMs / 1000).toFixed(3);
  const networkInput = /^https?:\/\//u.test(plan.input) ? ['-rw_timeout', '30000000'] : [];
  const inputs = ['-i', plan.input];
  // A source without audio gets silence of its length, so players and playlists see one shape.
  if (!plan.hasAudio) inputs.push('-f', 'lavfi', '-t', seconds, '-i', 'anullsrc=r=48000:cl=stereo');
  const audioInput = plan.hasAudio ? '0:a:0' : '1:a:0';

  const videoLabels = plan.renditions.map((_size, index) => `[s${index}]`).join('');
  const scales = plan.renditions.map((size, index) => `[s${index}]scale=${size.width}:${size.height}:flags=bicubic,setsar=1[v${index}]`);
  const { sprites } = plan;
  // ffmpeg applies the display matrix (autorotate) before this graph, so sizes here are as displayed.
  const graph = [
    `[0:v:0]fps=${plan.frameRate.ffmpeg},format=yuv420p,split=${count + 1}${videoLabels}[sp]`,
    ...scales,
    `[sp]fps=1/${sprites.intervalSeconds},scale=${sprites.tileWidth}:${sprites.tileHeight}[thumbs]`,
  ].join(';');

  const gop = String(framesPerKeyframe(plan.frameRate));
  const renditionMaps: string[] = [];
  const perRendition: string[] = [];
  plan.renditions.forEach((size, index) => {
    renditionMaps.push('-map', `[v${index}]`, '-map', audioInput);
    perRendition.push(`-maxrate:v:${index}`, `${size.maxKbits}k`, `-bufsize:v:${index}`, `${size.maxKbits * 2}k`);
  });
  const streamMap = plan.renditions.map((_size, index) => `v:${index},a:${index}`).join(' ');

  return [
    '-v', 'error', '-nostats', '-progress', `pipe:${PROGRESS_FD}`, '-y',
    ...networkInput,
    ...inputs,
    '-filter_complex', graph,
    ...renditionMaps,
    '-c:v', 'libx264', '-profile:v', 'high', '-pix_fmt', 'yuv420p', '-preset', plan.preset ?? 'veryfast', '-crf', '22',
    ...perRendition,
    // A fixed GOP and forced keyframes every KEYFRAME_SECONDS put a keyframe at every segment start, in every rendition alike.
    '-g', gop, '-keyint_min', gop, '-sc_threshold', '0', '-force_key_frames', `expr:gte(t,n_forced*${KEYFRAME_SECONDS})`,
    ...AUDIO_ARGS,
    '-f', 'hls', '-hls_time', String(SEGMENT_SECONDS), '-hls_playlist_type', 'vod', '-hls_segment_type', 'fmp4',
    '-hls_flags', 'independent_segments', '-hls_fmp4_init_filename', 'init.mp4',
    '-hls_segment_filename', `${plan.outputDir}/v%v/seg-%05d.m4s`,
    '-master_pl_name', TRANSCODE_OUTPUTS.master, '-var_stream_map', streamMap,
    `${plan.outputDir}/v%v/index.m3u8`,
    '-map', '[thumbs]', '-f', 'image2', '-q:v', '3', `${plan.outputDir}/${TRANSCODE_OUTPUTS.thumbnailPattern}`,
    '-map', audioInput, '-ac', '1', '-ar', String(WAVEFORM_SAMPLE_RATE), '-f', 's16le', `${plan.outputDir}/${TRANSCODE_OUTPUTS.pcm}`,
  ];
}

/** Tiles the single thumbnails into sprite sheets of columns × rows (the last sheet padded). */
export function spriteSheetArguments(outputDir: string, sprites: SpriteLayout): string[] {
  return [
    '-v', 'error', '-y', '-framerate', '1', '-i', `${outputDir}/${TRANSCODE_OUTPUTS.thumbnailPattern}`,
    '-vf', `tile=${sprites.columns}x${sprites.rows}`, '-q:v', '5', '-f', 'image2', `${outputDir}/${TRANSCODE_OUTPUTS.spritePattern}`,
  ];
}

/** ffmpeg's plain command for the download file: the highest rendition's segments, remuxed with the index up front. */
export function faststartArguments(variantPlaylist: string, output: string): string[] {
  return ['-v', 'error', '-y', '-allowed_extensions', 'ALL', '-i', variantPlaylist, '-c', 'copy', '-movflags', '+faststart', output];
}

export interface TranscodeProgress {
  /** Frames of the first rendition written so far. */
  frames: number;
  done: boolean;
}

/**
 * Reads ffmpeg's `-progress` output (blocks of key=value lines, each ending with `progress=`).
 * `frame=` counts the first video output, the top rendition, which advances at the constant
 * output rate; `out_time` would mix in the sprite sheets' odd time base. Chunks may split lines.
 */
export class ProgressReader {
  private pending = '';
  private frames = 0;

  constructor(private readonly onBlock: (progress: TranscodeProgress) => void) {}

  push(chunk: string): void {
    const text = this.pending + chunk;
    const lines = text.split('\n');
    this.pending = lines.pop() ?? '';
    for (const line of lines) {
      const separator = line.indexOf('=');
      if (separator < 0) continue;
      const key = line.slice(0, separator).trim();
      const value = line.slice(separator + 1).trim();
      if (key === 'frame') {
        const frames = Number(value);
        if (Number.isFinite(frames) && frames >= 0) this.frames = frames;
      } else if (key === 'progress') {
        this.onBlock({ frames: this.frames, done: value === 'end' });
      }
    }
  }
}
