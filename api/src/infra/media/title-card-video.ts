import { execFile } from 'node:child_process';
import { existsSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';

/**
 * Makes a narrated title-card video with Debian's ffmpeg and, when installed, espeak-ng: the demo
 * scenario's footage is generated at set-up, never taken from a real video. Each card shows a title
 * and a line of text while its narration plays; the cue times it returns match the audio.
 */

export interface TitleCard {
  title: string;
  subtitle: string;
  /** Spoken over the card (and the cue text of the transcript). */
  narration: string;
}

export interface TimedCard extends TitleCard {
  startMs: number;
  endMs: number;
}

export interface RenderedVideo {
  cards: TimedCard[];
  durationMs: number;
  narrated: boolean;
  /** False when no font was found: a test pattern stands in for the cards. */
  lettered: boolean;
}

const FONT_CANDIDATES = [
  '/usr/share/fonts/truetype/dejavu/DejaVuSans.ttf',
  '/usr/share/fonts/truetype/liberation/LiberationSans-Regular.ttf',
  '/usr/share/fonts/truetype/freefont/FreeSans.ttf',
];
const BOLD_FONT_CANDIDATES = ['/usr/share/fonts/truetype/dejavu/DejaVuSans-Bold.ttf', ...FONT_CANDIDATES];

/** Silence before the first card and between cards. */
const LEAD_MS = 500;
const GAP_MS = 600;
/** A card's length when there is no narration to time it by. */
const SILENT_CARD_MS = 6_000;
const SAMPLE_RATE = 22_050;

function run(command: string, args: string[]): Promise<string> {
  return new Promise((resolve, reject) => {
    execFile(command, args, { encoding: 'utf8', maxBuffer: 16 * 1024 * 1024, timeout: 300_000 }, (error, stdout, stderr) => {
      if (error) reject(new Error(`${command} failed: ${stderr.trim().split('\n').slice(-3).join(' ') || error.message}`));
      else resolve(stdout);
    });
  });
}

export async function isInstalled(command: string): Promise<boolean> {
  try {
    await run('sh', ['-c', `command -v ${command}`]);
    return true;
  } catch {
    return false;
  }
}

async function audioDurationMs(file: string): Promise<number> {
  const output = await run('ffprobe', ['-v', 'error', '-show_entries', 'format=duration', '-of', 'default=noprint_wrappers=1:nokey=1', file]);
  return Math.round(Number(output.trim()) * 1000);
}

/** A path for a quoted filter-graph option; the few characters the graph parser treats specially are refused. */
function filterPath(path: string): string {
  if (/[':\\]/u.test(path)) throw new Error(`ffmpeg filter paths must not contain quotes, colons or backslashes: ${path}`);
  return path;
}

/** Renders `cards` into `output` (H.264 + AAC MP4, 960×540), using `workDir` for intermediate files. */
export async function renderTitleCardVideo(cards: TitleCard[], output: string, workDir: string): Promise<RenderedVideo> {
  const narrated = await isInstalled('espeak-ng');
  const font = FONT_CANDIDATES.find((candidate) => existsSync(candidate));
  const boldFont = BOLD_FONT_CANDIDATES.find((candidate) => existsSync(candidate));

  // Time the cards by their narration.
  const timed: TimedCard[] = [];
  const voices: string[] = [];
  let at = LEAD_MS;
  for (const [index, card] of cards.entries()) {
    let length = SILENT_CARD_MS;
    if (narrated) {
      const voice = join(workDir, `narration-${index}.wav`);
      await run('espeak-ng', ['-v', 'en-gb', '-s', '165', '-a', '150', '-w', voice, card.narration]);
      length = await audioDurationMs(voice);
      voices.push(voice);
    }
    timed.push({ ...card, startMs: at, endMs: at + length });
    at += length + GAP_MS;
  }
  const durationMs = at;
  const seconds = (ms: number) => (ms / 1000).toFixed(3);

  const inputs: string[] = [];
  const filters: string[] = [];
  if (font && boldFont) {
    inputs.push('-f', 'lavfi', '-i', `color=c=0x143b37:s=960x540:r=25:d=${seconds(durationMs)}`);
    // Text comes from files, so no card text ever needs escaping for the filter graph.
    const draw: string[] = [];
    const header = join(workDir, 'header.txt');
    writeFileSync(header, 'Harrow Lane Garage · demo footage (generated)');
    draw.push(`drawtext=fontfile='${filterPath(font)}':textfile='${filterPath(header)}':fontsize=20:fontcolor=0xa9d4ce:x=40:y=32`);
    for (const [index, card] of timed.entries()) {
      const title = join(workDir, `card-${index}-title.txt`);
      const subtitle = join(workDir, `card-${index}-subtitle.txt`);
      writeFileSync(title, card.title);
      writeFileSync(subtitle, card.subtitle);
      const enable = `enable='between(t,${seconds(card.startMs - (index === 0 ? LEAD_MS : GAP_MS / 2))},${seconds(card.endMs + GAP_MS / 2 - 40)})'`;
      draw.push(`drawtext=fontfile='${filterPath(boldFont)}':textfile='${filterPath(title)}':fontsize=52:fontcolor=white:x=(w-text_w)/2:y=h/2-70:${enable}`);
      draw.push(`drawtext=fontfile='${filterPath(font)}':textfile='${filterPath(subtitle)}':fontsize=30:fontcolor=0xd6eae7:x=(w-text_w)/2:y=h/2+10:${enable}`);
    }
    filters.push(`[0:v]${draw.join(',')}[video]`);
  } else {
    inputs.push('-f', 'lavfi', '-i', `testsrc=s=960x540:r=25:d=${seconds(durationMs)}`);
    filters.push('[0:v]null[video]');
  }

  if (narrated) {
    // Silence, voice, silence, voice…: one track whose cue times match the cards.
    const pieces: string[] = [];
    for (const [index, voice] of voices.entries()) {
      inputs.push('-i', voice);
      const pause = index === 0 ? LEAD_MS : GAP_MS;
      filters.push(`anullsrc=r=${SAMPLE_RATE}:cl=mono,atrim=duration=${seconds(pause)}[pause${index}]`);
      filters.push(`[${index + 1}:a]aresample=${SAMPLE_RATE},aformat=channel_layouts=mono[voice${index}]`);
      pieces.push(`[pause${index}][voice${index}]`);
    }
    filters.push(`anullsrc=r=${SAMPLE_RATE}:cl=mono,atrim=duration=${seconds(GAP_MS)}[tail]`);
    filters.push(`${pieces.join('')}[tail]concat=n=${voices.length * 2 + 1}:v=0:a=1[audio]`);
  } else {
    filters.push(`anullsrc=r=${SAMPLE_RATE}:cl=mono,atrim=duration=${seconds(durationMs)}[audio]`);
  }

  await run('ffmpeg', [
    '-v', 'error', '-y',
    ...inputs,
    '-filter_complex', filters.join(';'),
    '-map', '[video]', '-map', '[audio]',
    '-c:v', 'libx264', '-preset', 'veryfast', '-tune', 'stillimage', '-crf', '26', '-pix_fmt', 'yuv420p',
    '-c:a', 'aac', '-b:a', '64k',
    '-t', seconds(durationMs),
    '-movflags', '+faststart',
    output,
  ]);
  return { cards: timed, durationMs, narrated, lettered: Boolean(font && boldFont) };
}
