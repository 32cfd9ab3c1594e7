// Upload benchmark: the same 1 GB file through the app's browser path (create footage, presigned part
// URLs, PUT each part straight to storage, record each ETag, complete; driven from Node) and directly
// with @aws-sdk/lib-storage, to the same S3 fake, in the same run. Prints the throughput ratio
// (goal ≥ 0.9) and the API process's resident memory during the app-path uploads (goal: flat, < +50 MB).
// Run with: bash bench/run.sh upload   (see the header of bench/run.sh)
import { DeleteObjectCommand, S3Client } from '@aws-sdk/client-s3';
import { Upload } from '@aws-sdk/lib-storage';
import { randomBytes } from 'node:crypto';
import { createReadStream, existsSync, statSync } from 'node:fs';
import { open } from 'node:fs/promises';
import { join } from 'node:path';
import { editorWithBuild, MB, median, MiB, rssBytes, startApi, watchRss } from '../lib/harness.mjs';

const SIZE = 1024 * MiB;
const CONCURRENCY = 4;
const ROUNDS = Number(process.env.BENCH_ROUNDS ?? 5);
const file = join(process.env.BENCH_DATA ?? '.data/bench', 'upload-1GiB.bin');

/** 1 GiB of random bytes (incompressible), made once and kept in the bench data folder. */
async function ensureFile() {
  if (existsSync(file) && statSync(file).size === SIZE) return;
  const handle = await open(file, 'w');
  for (let written = 0; written < SIZE; written += 64 * MiB) await handle.write(randomBytes(64 * MiB));
  await handle.close();
}

async function readPart(handle, partNumber, partSize) {
  const start = (partNumber - 1) * partSize;
  const length = Math.min(partSize, SIZE - start);
  const buffer = Buffer.allocUnsafe(length);
  await handle.read(buffer, 0, length, start);
  return buffer;
}

/** The studio's path, from Node: 4 parts in flight, signed by the API in batches, sent to storage, then recorded. */
async function uploadThroughApp({ api, workshopId, buildId }) {
  const started = performance.now();
  const created = await api.post(`/workshops/${workshopId}/builds/${buildId}/footage`, {
    fileName: 'bench-1GiB.mp4',
    contentType: 'video/mp4',
    sizeBytes: SIZE,
  });
  const footageId = created.footage.id;
  const { partSizeBytes, partCount } = created.upload;
  const base = `/workshops/${workshopId}/footage/${footageId}/upload`;
  const handle = await open(file, 'r');
  const waiting = Array.from({ length: partCount }, (_, index) => index + 1);
  const signed = new Map();
  // As in the studio: one signing request at a time, shared by whoever waits for it, and the next batch asked for
  // while fewer signed parts wait than there are slots, so no slot waits a round trip for its link.
  let signing = null;
  const signBatch = (first) => {
    const batch = [...first, ...waiting.filter((number) => !first.includes(number) && !signed.has(number))].slice(0, 16);
    signing = api.post(`${base}/part-urls`, { partNumbers: batch }).then(({ urls }) => {
      for (const { partNumber: number, url } of urls) signed.set(number, url);
    });
    const current = signing;
    const clear = () => {
      if (signing === current) signing = null;
    };
    current.then(clear, clear);
    return current;
  };
  const urlFor = async (partNumber) => {
    if (!signed.has(partNumber) && signing) await signing;
    if (!signed.has(partNumber)) await signBatch([partNumber]);
    const ready = waiting.filter((number) => signed.has(number)).length;
    if (!signing && ready < CONCURRENCY && ready < waiting.length) signBatch([]).catch(() => {});
    return signed.get(partNumber);
  };
  // As in the studio: a part's slot is free as soon as storage has the bytes; its ETag is recorded alongside.
  const recording = [];
  const worker = async () => {
    for (let partNumber = waiting.shift(); partNumber !== undefined; partNumber = waiting.shift()) {
      const url = await urlFor(partNumber);
      const body = await readPart(handle, partNumber, partSizeBytes);
      const response = await fetch(url, { method: 'PUT', body });
      if (!response.ok) throw new Error(`part ${partNumber}: storage answered ${response.status}`);
      signed.delete(partNumber);
      const recorded = api.put(`${base}/parts/${partNumber}`, { etag: response.headers.get('etag') });
      recorded.catch(() => {}); // reported by the Promise.all below
      recording.push(recorded);
    }
  };
  await Promise.all(Array.from({ length: CONCURRENCY }, worker));
  await Promise.all(recording);
  await handle.close();
  await api.post(`${base}/complete`);
  const seconds = (performance.now() - started) / 1000;
  return { seconds, footageId, partSizeBytes, partCount };
}

/** The baseline: the AWS SDK's managed upload, same part size and concurrency, same storage. */
async function uploadDirect(client, key, partSize) {
  const started = performance.now();
  const upload = new Upload({
    client,
    params: { Bucket: process.env.S3_BUCKET, Key: key, Body: createReadStream(file, { highWaterMark: MiB }), ContentType: 'video/mp4' },
    queueSize: CONCURRENCY,
    partSize,
  });
  await upload.done();
  const seconds = (performance.now() - started) / 1000;
  await client.send(new DeleteObjectCommand({ Bucket: process.env.S3_BUCKET, Key: key }));
  return { seconds };
}

async function main() {
  await ensureFile();
  const api = await startApi();
  const client = new S3Client({
    endpoint: process.env.S3_ENDPOINT,
    region: process.env.S3_REGION,
    forcePathStyle: true,
    credentials: { accessKeyId: process.env.S3_ACCESS_KEY_ID, secretAccessKey: process.env.S3_SECRET_ACCESS_KEY },
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
  });
  try {
    const editor = await editorWithBuild(api.baseUrl, 'upload');
    // Warm up both paths (JIT, connection pools) with one untimed upload each.
    const warm = await uploadThroughApp(editor);
    await editor.api.delete(`/workshops/${editor.workshopId}/footage/${warm.footageId}`).catch(() => {});
    await uploadDirect(client, `bench/warm-${Date.now()}.bin`, warm.partSizeBytes);
    await new Promise((resolve) => setTimeout(resolve, 2000));

    const app = [];
    const direct = [];
    const rss = [];
    const runDirect = async () => direct.push((await uploadDirect(client, `bench/direct-${Date.now()}.bin`, warm.partSizeBytes)).seconds);
    const runApp = async () => {
      const before = rssBytes(api.pid);
      const stopWatching = watchRss(api.pid);
      const result = await uploadThroughApp(editor);
      const peak = stopWatching();
      app.push(result.seconds);
      rss.push({ before, peak });
      await editor.api.delete(`/workshops/${editor.workshopId}/footage/${result.footageId}`).catch(() => {});
    };
    for (let round = 1; round <= ROUNDS; round += 1) {
      // Alternate which path goes first, so neither always meets a busier disk.
      if (round % 2) {
        await runDirect();
        await runApp();
      } else {
        await runApp();
        await runDirect();
      }
      const { before, peak } = rss[rss.length - 1];
      console.log(
        `round ${round}: direct ${(SIZE / MB / direct[direct.length - 1]).toFixed(0)} MB/s, app path ${(SIZE / MB / app[app.length - 1]).toFixed(0)} MB/s, ` +
          `API RSS ${(before / MB).toFixed(0)} → peak ${(peak / MB).toFixed(0)} MB`,
      );
    }

    const appSeconds = median(app);
    const directSeconds = median(direct);
    const ratio = directSeconds / appSeconds;
    const growth = Math.max(...rss.map(({ before, peak }) => peak - before));
    console.log('');
    console.log(`file: ${(SIZE / MiB).toFixed(0)} MiB of random bytes, parts of ${(warm.partSizeBytes / MiB).toFixed(0)} MiB (${warm.partCount}), ${CONCURRENCY} in flight, ${ROUNDS} rounds (medians)`);
    console.log(`direct (@aws-sdk/lib-storage): ${directSeconds.toFixed(2)} s, ${(SIZE / MB / directSeconds).toFixed(0)} MB/s`);
    console.log(`app path (presigned parts):    ${appSeconds.toFixed(2)} s, ${(SIZE / MB / appSeconds).toFixed(0)} MB/s`);
    console.log(`throughput ratio app/direct:   ${ratio.toFixed(2)} (goal ≥ 0.90) ${ratio >= 0.9 ? 'MET' : 'NOT MET'}`);
    console.log(
      `API process RSS during app-path uploads: largest rise ${(growth / MB).toFixed(1)} MB over ${(rss[0].before / MB).toFixed(0)} MB ` +
        `(goal < +50 MB) ${growth < 50 * MB ? 'MET' : 'NOT MET'}`,
    );
  } finally {
    await api.stop();
    client.destroy();
  }
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
