// Transcode benchmark: a generated N-minute 1080p clip (default 10; `--minutes 2` for a shorter run)
// through the app's media pipeline (upload, probe, poster, the transcode job: one ffmpeg run making
// every rendition, sprites and waveform PCM, the faststart remux, storing it all in the bucket) against
// ffmpeg run directly on the same file with the same arguments (built by the same code) plus the same
// sprite tiling and remux, in the same run. Prints wall times, the ratio direct/pipeline (goal ≥ 0.9), and the intervals
// between progress changes the studio would see while polling (goal: at most 2 s).
// Run with: bash bench/run.sh transcode [--minutes N]   (see the header of bench/run.sh)
import { spawn, execFileSync } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync, statSync } from 'node:fs';
import { open } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { editorWithBuild, median, MiB, root, startApi } from '../lib/harness.mjs';

const minutesFlag = process.argv.indexOf('--minutes');
const MINUTES = Number(minutesFlag >= 0 ? process.argv[minutesFlag + 1] : (process.env.BENCH_MINUTES ?? 10));
if (!(MINUTES > 0)) throw new Error('--minutes needs a positive number');
const SECONDS = Math.round(MINUTES * 60);
const file = join(process.env.BENCH_DATA ?? '.data/bench', `transcode-${SECONDS}s-1080p.mp4`);

const { transcodeArguments, faststartArguments, spriteSheetArguments } = await import(`${root}api/dist/infra/media/transcode-command.js`);
const { interpretProbe } = await import(`${root}api/dist/infra/media/media-probe.js`);
const engine = await import(`${root}api/dist/engine/media-renditions.js`);

/** A 1080p30 test pattern with a tone, H.264 + AAC as a camera would write it; made once and kept. */
function ensureClip() {
  if (existsSync(file) && statSync(file).size > 0) return;
  console.log(`making a ${MINUTES}-minute 1080p clip (once, kept in ${file})…`);
  execFileSync('ffmpeg', [
    '-v', 'error', '-y',
    '-f', 'lavfi', '-i', `testsrc2=duration=${SECONDS}:size=1920x1080:rate=30`,
    '-f', 'lavfi', '-i', `sine=frequency=330:duration=${SECONDS}`,
    '-c:v', 'libx264', '-preset', 'ultrafast', '-crf', '23', '-pix_fmt', 'yuv420p', '-c:a', 'aac', '-shortest', '-movflags', '+faststart', file,
  ]);
}

/** The same plan the transcode job makes (footage-renditions.service.ts), for a local input. */
function planFor(input, outputDir) {
  const info = interpretProbe(JSON.parse(execFileSync('ffprobe', ['-v', 'error', '-print_format', 'json', '-show_format', '-show_streams', input], { encoding: 'utf8' })), 'mp4');
  const display = engine.displaySize(info.width, info.height, info.rotation);
  return {
    input,
    outputDir,
    renditions: engine.renditionLadder(display),
    frameRate: engine.constantFrameRate(info.frameRate),
    hasAudio: info.audioCodec !== null,
    durationMs: info.durationMs,
    sprites: engine.spriteLayout(info.durationMs, display),
  };
}

function runFfmpeg(args) {
  return new Promise((resolve, reject) => {
    // fd 3 carries -progress, as in the job; drained and ignored here.
    const child = spawn('ffmpeg', args, { stdio: ['ignore', 'ignore', 'pipe', 'pipe'] });
    let stderr = '';
    child.stderr.on('data', (chunk) => (stderr += chunk));
    child.stdio[3].resume();
    child.on('close', (code) => (code === 0 ? resolve() : reject(new Error(`ffmpeg exited ${code}: ${stderr.slice(0, 500)}`))));
  });
}

/** The baseline: ffmpeg alone, same arguments, local file in and out, then the same faststart remux. */
async function direct() {
  const outputDir = mkdtempSync(join(tmpdir(), 'fitwright-bench-transcode-'));
  try {
    const plan = planFor(file, outputDir);
    execFileSync('mkdir', ['-p', ...plan.renditions.map((_size, index) => join(outputDir, `v${index}`))]);
    const started = performance.now();
    await runFfmpeg(transcodeArguments(plan));
    await runFfmpeg(spriteSheetArguments(outputDir, plan.sprites));
    await runFfmpeg(faststartArguments(join(outputDir, 'v0/index.m3u8'), join(outputDir, 'download.mp4')));
    return (performance.now() - started) / 1000;
  } finally {
    rmSync(outputDir, { recursive: true, force: true });
  }
}

/** The studio's upload path, from Node (4 parts in flight), then the pipeline until renditions are ready. */
async function throughPipeline({ api, workshopId, buildId }) {
  const size = statSync(file).size;
  const created = await api.post(`/workshops/${workshopId}/builds/${buildId}/footage`, { fileName: 'bench-1080p.mp4', contentType: 'video/mp4', sizeBytes: size });
  const footageId = created.footage.id;
  const { partSizeBytes, partCount } = created.upload;
  const base = `/workshops/${workshopId}/footage/${footageId}`;
  const handle = await open(file, 'r');
  const numbers = Array.from({ length: partCount }, (_, index) => index + 1);
  const urls = new Map();
  for (let start = 0; start < numbers.length; start += 100) {
    const { urls: batch } = await api.post(`${base}/upload/part-urls`, { partNumbers: numbers.slice(start, start + 100) });
    for (const { partNumber, url } of batch) urls.set(partNumber, url);
  }
  const waiting = [...numbers];
  await Promise.all(
    Array.from({ length: 4 }, async () => {
      for (let number = waiting.shift(); number !== undefined; number = waiting.shift()) {
        const length = Math.min(partSizeBytes, size - (number - 1) * partSizeBytes);
        const body = Buffer.allocUnsafe(length);
        await handle.read(body, 0, length, (number - 1) * partSizeBytes);
        const response = await fetch(urls.get(number), { method: 'PUT', body });
        if (!response.ok) throw new Error(`part ${number}: ${response.status}`);
        await api.put(`${base}/upload/parts/${number}`, { etag: response.headers.get('etag') });
      }
    }),
  );
  await handle.close();

  const started = performance.now();
  await api.post(`${base}/upload/complete`);
  // Changes of the percentage, and of what the studio shows (the percentage or the time left).
  const changes = [];
  const shown = [];
  let last = null;
  let lastShown = null;
  for (;;) {
    const footage = await api.get(base);
    const { state, percent, secondsLeft } = footage.renditions;
    if (footage.state === 'failed') throw new Error(`probing failed: ${footage.failureReason}`);
    if (state === 'failed') throw new Error(`renditions failed: ${footage.renditions.reason}`);
    if (state === 'processing' && percent !== last) {
      changes.push({ at: performance.now(), percent, secondsLeft });
      last = percent;
    }
    if (state === 'processing' && `${percent}|${secondsLeft}` !== lastShown) {
      shown.push({ at: performance.now(), percent, secondsLeft });
      lastShown = `${percent}|${secondsLeft}`;
    }
    if (state === 'ready') {
      // The wait between the last progress seen and "ready" (storing the outputs) is a gap the creator sees too.
      changes.push({ at: performance.now(), percent: 100, secondsLeft: 0 });
      shown.push({ at: performance.now(), percent: 100, secondsLeft: 0 });
      break;
    }
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
  const seconds = (performance.now() - started) / 1000;
  await api.delete(base);
  return { seconds, changes, shown };
}

ensureClip();
const api = await startApi();
try {
  const editor = await editorWithBuild(api.baseUrl, 'transcode');
  // Direct before and after the pipeline; their mean is the baseline, so drift in machine load evens out.
  const before = await direct();
  const pipeline = await throughPipeline(editor);
  const after = await direct();
  const baseline = (before + after) / 2;
  const ratio = baseline / pipeline.seconds;
  const gapsOf = (list) => list.slice(1).map((change, index) => (change.at - list[index].at) / 1000);
  const gaps = gapsOf(pipeline.changes);
  const maxGap = gaps.length ? Math.max(...gaps) : Number.NaN;
  const shownGaps = gapsOf(pipeline.shown);
  const maxShownGap = shownGaps.length ? Math.max(...shownGaps) : Number.NaN;
  console.log('');
  console.log(`clip: ${MINUTES} min 1920×1080 30 fps H.264 + AAC, ${(statSync(file).size / MiB).toFixed(0)} MiB; renditions 1080p, 720p, 360p, sprites, waveform, faststart MP4`);
  console.log(`ffmpeg direct (same arguments + remux): ${before.toFixed(1)} s before, ${after.toFixed(1)} s after, mean ${baseline.toFixed(1)} s`);
  console.log(`pipeline (complete → renditions ready): ${pipeline.seconds.toFixed(1)} s`);
  console.log(`speed ratio direct/pipeline:           ${ratio.toFixed(2)} (goal ≥ 0.90) ${ratio >= 0.9 ? 'MET' : 'NOT MET'}`);
  console.log(
    `progress seen by polling every 250 ms: ${pipeline.changes.length} changes, gaps median ${gaps.length ? median(gaps).toFixed(2) : '–'} s, ` +
      `max ${Number.isNaN(maxGap) ? '–' : maxGap.toFixed(2)} s (goal ≤ 2 s) ${maxGap <= 2 ? 'MET' : 'NOT MET'}`,
  );
  const longest = gaps
    .map((gap, index) => ({ gap, from: pipeline.changes[index].percent, to: pipeline.changes[index + 1].percent }))
    .sort((a, b) => b.gap - a.gap)
    .slice(0, 3);
  console.log(`longest gaps: ${longest.map(({ gap, from, to }) => `${gap.toFixed(2)} s (${from}% → ${to}%)`).join(', ')}`);
  console.log(
    `what the studio shows (percentage or time left): ${pipeline.shown.length} changes, gaps median ` +
      `${shownGaps.length ? median(shownGaps).toFixed(2) : '–'} s, max ${Number.isNaN(maxShownGap) ? '–' : maxShownGap.toFixed(2)} s (goal ≤ 2 s) ${maxShownGap <= 2 ? 'MET' : 'NOT MET'}`,
  );
  const shownLongest = shownGaps
    .map((gap, index) => ({ gap, from: pipeline.shown[index], to: pipeline.shown[index + 1] }))
    .sort((a, b) => b.gap - a.gap)
    .slice(0, 3);
  const label = ({ percent, secondsLeft }) => `${percent}% ${secondsLeft ?? '–'} s left`;
  console.log(`longest: ${shownLongest.map(({ gap, from, to }) => `${gap.toFixed(2)} s (${label(from)} → ${label(to)})`).join(', ')}`);
  const middle = pipeline.changes[Math.floor(pipeline.changes.length / 2)];
  if (middle) console.log(`halfway: ${middle.percent}% with ${middle.secondsLeft ?? '–'} s estimated left`);
} finally {
  await api.stop();
}
