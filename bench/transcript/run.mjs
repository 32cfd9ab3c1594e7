// Transcript benchmark: a generated 3-hour, 3,000-cue WebVTT transcript (invented shop talk) is
// attached to footage through the API (parse + store: 3,000 cues with their FULLTEXT index) and
// compared, in the same run, with the honest baseline for the same work: the `subtitle` npm parser's
// parse plus a plain mysql2 transaction that stores the same revision row (with its source text) and the
// same 3,000 cues in one multi-row INSERT into the same tables. Also prints the parses alone, to show
// where the time goes.
// Run with: bash bench/run.sh transcript   (see the header of bench/run.sh)
import { execFileSync } from 'node:child_process';
import { existsSync, readFileSync, statSync } from 'node:fs';
import { createRequire } from 'node:module';
import { randomUUID } from 'node:crypto';
import { join } from 'node:path';
import { editorWithBuild, median, root, startApi } from '../lib/harness.mjs';

const require = createRequire(`${root}api/package.json`);
const { parseSync } = require('subtitle');
const { parseTranscript } = require(`${root}api/dist/engine/transcript-formats.js`);
const mysql = require('mysql2/promise');
const Redis = require('ioredis');

const CUES = 3000;
const HOURS = 3;
const API_RUNS = Number(process.env.BENCH_RUNS ?? 7);
const PARSE_RUNS = 25;
const dataDir = process.env.BENCH_DATA ?? '.data/bench';

const WORDS = (
  'spline coupler gearbox input shaft pilot bearing bore nose micrometer caliper feeler gauge thousandths tenths ' +
  'millimetres inch clearance interference press fit slip yoke driveshaft length window plunge margin bump droop ' +
  'adapter plate register motor bell housing torque bolt washer key set screw chamfer runout dial indicator'
).split(' ');

/** A deterministic pseudo-random transcript: 3,000 cues evenly over three hours, 8 to 18 words each. */
function makeTranscript() {
  let seed = 20_261_201;
  const next = () => {
    seed = (seed * 1_103_515_245 + 12_345) % 2 ** 31;
    return seed / 2 ** 31;
  };
  const step = (HOURS * 3_600_000) / CUES;
  const stamp = (ms) => {
    const pad = (value, width = 2) => String(Math.floor(value)).padStart(width, '0');
    return `${pad(ms / 3_600_000)}:${pad((ms / 60_000) % 60)}:${pad((ms / 1000) % 60)}.${pad(ms % 1000, 3)}`;
  };
  const blocks = ['WEBVTT - benchmark transcript (generated)'];
  for (let index = 0; index < CUES; index += 1) {
    const start = Math.round(index * step);
    const words = Array.from({ length: 8 + Math.floor(next() * 11) }, () => WORDS[Math.floor(next() * WORDS.length)]);
    blocks.push(`${stamp(start)} --> ${stamp(start + Math.round(step * 0.9))}\n${words.join(' ')}.`);
  }
  return `${blocks.join('\n\n')}\n`;
}

/** Footage long enough for the transcript: three hours of a 32×32 colour at 1 frame a second (made once). */
function ensureLongClip() {
  const file = join(dataDir, 'three-hours.mp4');
  if (existsSync(file) && statSync(file).size > 0) return file;
  execFileSync('ffmpeg', [
    '-v', 'error', '-y', '-f', 'lavfi', '-i', `color=c=0x143b37:s=32x32:r=1:d=${HOURS * 3600 + 5}`,
    '-c:v', 'libx264', '-preset', 'ultrafast', '-pix_fmt', 'yuv420p', '-movflags', '+faststart', file,
  ]);
  return file;
}

/**
 * The baseline's store: in one transaction, a revision row like the API's (inactive, so the footage's active
 * revision stays) and every cue in one multi-row INSERT, through a connection opened beforehand (the API keeps a
 * pool too). Returns the new revision's id so it can be removed afterwards, outside the timing.
 */
async function storeDirectly(connection, footage, revision, text, cues) {
  const id = randomUUID();
  await connection.beginTransaction();
  await connection.query(
    'INSERT INTO transcripts (id, workshop_id, footage_id, revision, format, source_name, source_text, cue_count, is_active) VALUES (?, ?, ?, ?, ?, NULL, ?, ?, NULL)',
    [id, footage.workshop_id, footage.id, revision, 'webvtt', text, cues.length],
  );
  await connection.query('INSERT INTO transcript_cues (transcript_id, cue_index, start_ms, end_ms, identifier, text) VALUES ?', [
    cues.map((cue, index) => [id, index, cue.start, cue.end, null, cue.text]),
  ]);
  await connection.commit();
  return id;
}

function time(fn) {
  const started = performance.now();
  const result = fn();
  return { ms: performance.now() - started, result };
}

async function main() {
  const text = makeTranscript();
  const clip = ensureLongClip();
  const api = await startApi();
  try {
    const { api: session, workshopId, buildId } = await editorWithBuild(api.baseUrl, 'transcript');
    // The footage goes up the studio's way (one part here) and is processed by the media job.
    const bytes = readFileSync(clip);
    const created = await session.post(`/workshops/${workshopId}/builds/${buildId}/footage`, {
      fileName: 'three-hours.mp4',
      contentType: 'video/mp4',
      sizeBytes: bytes.length,
    });
    const footageId = created.footage.id;
    const base = `/workshops/${workshopId}/footage/${footageId}`;
    const { urls } = await session.post(`${base}/upload/part-urls`, { partNumbers: [1] });
    const put = await fetch(urls[0].url, { method: 'PUT', body: bytes });
    await session.put(`${base}/upload/parts/1`, { etag: put.headers.get('etag') });
    await session.post(`${base}/upload/complete`);
    for (let state = 'processing'; state === 'processing'; ) {
      await new Promise((resolve) => setTimeout(resolve, 200));
      ({ state } = await session.get(base));
      if (state === 'failed') throw new Error('the benchmark footage failed processing');
    }

    // Reference: the `subtitle` package's synchronous parser (its parse only; it stores nothing).
    const check = parseSync(text).filter((node) => node.type === 'cue');
    if (check.length !== CUES) throw new Error(`subtitle read ${check.length} cues`);
    for (let warm = 0; warm < 5; warm += 1) {
      parseSync(text);
      parseTranscript(text, 'auto');
    }
    const reference = median(Array.from({ length: PARSE_RUNS }, () => time(() => parseSync(text)).ms));
    const engine = median(Array.from({ length: PARSE_RUNS }, () => time(() => parseTranscript(text, 'auto')).ms));

    // Parse + store through the API: each run stores a new revision of 3,000 cues. Each stored revision queues a
    // mining job (marks suggested from the cues), which the same API process works after answering; the next run
    // waits for it, outside the timing, so a run measures the import alone, as the baseline's runs do.
    const redis = new Redis({ host: process.env.REDIS_HOST, port: Number(process.env.REDIS_PORT), password: process.env.REDIS_PASSWORD });
    const minedAfter = async (transcript) => {
      const key = `${process.env.QUEUE_PREFIX}:marks:mine-transcript-${transcript.id}`;
      for (const deadline = Date.now() + 120_000; !(await redis.hget(key, 'finishedOn')); ) {
        if (Date.now() > deadline || (await redis.hget(key, 'failedReason'))) throw new Error(`the mining job ${key} did not finish`);
        await new Promise((resolve) => setTimeout(resolve, 50));
      }
    };
    const stored = [];
    try {
      await minedAfter(await session.put(`${base}/transcript`, { text, format: 'auto' }));
      for (let run = 0; run < API_RUNS; run += 1) {
        const started = performance.now();
        const transcript = await session.put(`${base}/transcript`, { text, format: 'auto' });
        stored.push(performance.now() - started);
        if (transcript.cueCount !== CUES) throw new Error(`the API stored ${transcript.cueCount} cues`);
        await minedAfter(transcript);
      }
    } finally {
      redis.disconnect();
    }
    const apiMs = median(stored);

    // Baseline: the reference parse and a plain mysql2 store of the same rows, alternating with nothing else.
    const connection = await mysql.createConnection({
      host: process.env.DB_HOST,
      port: Number(process.env.DB_PORT),
      user: process.env.DB_USER,
      password: process.env.DB_PASSWORD,
      database: process.env.DB_NAME,
    });
    const baseline = [];
    try {
      const [[footage]] = await connection.query('SELECT id, workshop_id FROM footage WHERE id = ?', [footageId]);
      for (let run = -1; run < API_RUNS; run += 1) {
        const started = performance.now();
        const cues = parseSync(text)
          .filter((node) => node.type === 'cue')
          .map((node) => node.data);
        const id = await storeDirectly(connection, footage, 100_000 + run + 1, text, cues);
        // The first round warms the connection and the statement up, as the API's first PUT above did.
        if (run >= 0) baseline.push(performance.now() - started);
        await connection.query('DELETE FROM transcripts WHERE id = ?', [id]);
      }
    } finally {
      await connection.end();
    }
    const baselineMs = median(baseline);

    console.log(`transcript: ${CUES} cues over ${HOURS} h, ${(Buffer.byteLength(text) / 1000).toFixed(0)} kB of WebVTT`);
    console.log(`subtitle parseSync (reference, parse only):    ${reference.toFixed(1)} ms (median of ${PARSE_RUNS})`);
    console.log(`our engine's parseTranscript (parse only):      ${engine.toFixed(1)} ms (median of ${PARSE_RUNS}), ${(engine / reference).toFixed(2)}× the reference`);
    console.log(`API PUT transcript (HTTP + parse + store):      ${apiMs.toFixed(1)} ms (median of ${API_RUNS})`);
    console.log(`baseline: subtitle parse + mysql2 transaction:  ${baselineMs.toFixed(1)} ms (median of ${API_RUNS}; revision row + one ${CUES}-row INSERT)`);
    console.log(`ratio API parse+store / reference parse:        ${(apiMs / reference).toFixed(1)}×`);
    const ratio = apiMs / baselineMs;
    console.log(`ratio API parse+store / baseline parse+store:   ${ratio.toFixed(2)}× (goal ≤ 1.5×) ${ratio <= 1.5 ? 'MET' : 'NOT MET'}`);
  } finally {
    await api.stop();
  }
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
