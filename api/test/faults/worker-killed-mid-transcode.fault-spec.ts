import { ListObjectsV2Command, S3Client } from '@aws-sdk/client-s3';
import Redis from 'ioredis';
import { execFileSync } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { RENDITION_JOB_PHASES } from '../../src/engine/media-renditions';
import { QUEUES } from '../../src/infra/jobs/queues';
import type { Agent } from '../support/accounts';
import { makeClip, removeScratch, uploadFile } from '../support/footage';
import { FaultApiProcess, FaultStack, faultsEnv, signUp, waitUntil } from './fault-harness';

/**
 * A queue-only worker (dist/worker.js) is killed with SIGKILL while ffmpeg makes a footage's web
 * renditions, and started again. Bull finds the transcode job's lock expired and runs it again in
 * the new worker; the job first clears the footage's `web/` folder, so the bucket ends up holding
 * exactly what an uninterrupted run stores, the renditions end `ready` and the footage stays one row.
 *
 * The second case kills the worker while it stores the outputs in the bucket (some objects stored,
 * others not yet): the retry clears the half-filled folder and stores everything once. For that case
 * only, the S3 fake is restarted to answer each whole-object PUT a second late (a slow store), so the
 * storing phase lasts long enough to catch; the first case and the clean run store at full speed.
 *
 * The API process serves the uploads and is then stopped cleanly, so the worker is the only process
 * working the queues while the transcode runs (and is killed); the API comes back for the last reads.
 * Stopping it may interrupt its probing job; the worker then runs that job again, which still queues
 * the transcode (footage-processing.service.ts).
 *
 * Every percentage polled is kept: within one run it never goes backwards; the retry starts again from 0.
 */
const STORE_DELAY_MS = 1000;

// Transcodes of a 24 s 720p clip (a clean run, then two kills and recoveries), on a box that may be busy.
jest.setTimeout(600_000);

const S3 = {
  endpoint: `http://127.0.0.1:${faultsEnv.s3Port}`,
  bucket: process.env.S3_BUCKET ?? 'fitwright-media',
  accessKeyId: process.env.S3_ACCESS_KEY_ID ?? 'S3RVER',
  secretAccessKey: process.env.S3_SECRET_ACCESS_KEY ?? 'S3RVER',
};

/** Every key under a prefix, read straight from the S3 fake (all pages), relative to the prefix. */
async function storedNames(prefix: string): Promise<string[]> {
  const client = new S3Client({
    endpoint: S3.endpoint,
    region: 'us-east-1',
    forcePathStyle: true,
    credentials: { accessKeyId: S3.accessKeyId, secretAccessKey: S3.secretAccessKey },
  });
  const names: string[] = [];
  let token: string | undefined;
  do {
    const page = await client.send(new ListObjectsV2Command({ Bucket: S3.bucket, Prefix: prefix, ContinuationToken: token }));
    names.push(...(page.Contents ?? []).map((item) => item.Key!.slice(prefix.length)));
    token = page.IsTruncated ? page.NextContinuationToken : undefined;
  } while (token);
  client.destroy();
  return names.sort();
}

/** Direct children of a process (by parent id), e.g. the ffmpeg a worker spawned. */
function childrenOf(pid: number): number[] {
  try {
    return execFileSync('pgrep', ['-P', String(pid)], { encoding: 'utf8' }).split('\n').filter(Boolean).map(Number);
  } catch {
    return [];
  }
}

function commandOf(pid: number): string {
  try {
    return execFileSync('ps', ['-o', 'comm=', '-p', String(pid)], { encoding: 'utf8' }).trim();
  } catch {
    return '';
  }
}

/** The killed worker's children (its ffmpeg) would run on as orphans; a crashed host takes them down too. */
function killAll(pids: number[]): void {
  for (const pid of pids) {
    try {
      process.kill(pid, 'SIGKILL');
    } catch {
      // already gone
    }
  }
}

describe('a worker killed with SIGKILL mid-transcode and started again', () => {
  const stack = new FaultStack();
  let api = new FaultApiProcess('main');
  let worker = new FaultApiProcess('worker');
  let redis: Redis;
  let owner: Agent;
  let workshopId: string;
  let clip: string;

  const jobKey = (suffix: string) => `${faultsEnv.queuePrefix}:${QUEUES.mediaTranscode}:${suffix}`;
  const sql = (statement: string) => stack.mariadb.sql(statement);
  /** Every processing or ready percentage polled, per footage, in order. */
  const percentsSeen = new Map<string, number[]>();
  const renditions = (footageId: string) => {
    const [row] = sql(`SELECT renditions_state, COALESCE(renditions_percent, 0) FROM footage WHERE id = '${footageId}'`);
    const seen = { state: row?.[0], percent: Number(row?.[1] ?? 0) };
    if (seen.state === 'processing' || seen.state === 'ready') percentsSeen.set(footageId, [...(percentsSeen.get(footageId) ?? []), seen.percent]);
    return seen;
  };
  /** The polled percentages rose within each run: at most one step back (the retry starting over), ending at 100. */
  const expectProgressForward = (footageId: string) => {
    const seen = percentsSeen.get(footageId) ?? [];
    const stepsBack = seen.filter((percent, index) => index > 0 && percent < seen[index - 1]);
    expect(stepsBack.length).toBeLessThanOrEqual(1);
    expect(seen[seen.length - 1]).toBe(100);
  };
  let cleanListing: string[] = [];
  const webPrefix = (footageId: string) => sql(`SELECT object_key FROM footage WHERE id = '${footageId}'`)[0][0].replace(/[^/]+$/u, 'web/');

  async function newBuild(title: string): Promise<string> {
    return (await owner.post(`/api/workshops/${workshopId}/builds`).send({ title }).expect(201)).body.id;
  }

  async function waitForRenditions(footageId: string, timeoutMs: number): Promise<string> {
    await waitUntil(`renditions of ${footageId} to finish`, () => ['ready', 'failed'].includes(renditions(footageId).state ?? ''), timeoutMs, 250);
    return renditions(footageId).state!;
  }

  beforeAll(async () => {
    await stack.start();
    await api.start();
    await worker.start();
    redis = new Redis({ host: '127.0.0.1', port: faultsEnv.redisPort, maxRetriesPerRequest: 3 });
    owner = await signUp(`transcode-fault-${randomBytes(3).toString('hex')}@fitwright.test`);
    workshopId = (await owner.post('/api/workshops').send({ name: 'Quarry Road Machining', slug: `quarry-${randomBytes(4).toString('hex')}` }).expect(201)).body.id;
    // Long enough that the transcode (several renditions, sprites, waveform) can be caught half-way.
    clip = makeClip('transcode-kill.mp4', { seconds: 24, width: 1280, height: 720 });
  });
  afterAll(async () => {
    removeScratch();
    redis?.disconnect();
    await worker.stop();
    await api.stop();
    await stack.stop();
  });

  it('ends ready, with the same web/ listing as a clean run and one footage row', async () => {
    // A clean run of the same clip: what the bucket should hold.
    const cleanBuildId = await newBuild('Clean run');
    const cleanId = await uploadFile(owner, workshopId, cleanBuildId, clip);
    expect(await waitForRenditions(cleanId, 240_000)).toBe('ready');
    cleanListing = await storedNames(webPrefix(cleanId));
    expect(cleanListing.length).toBeGreaterThan(5);

    // The run to interrupt: uploaded through the API, which then stops, so the worker alone makes the
    // renditions (a probe the API had taken fails with the closed connection and is retried by the worker).
    const buildId = await newBuild('Killed run');
    const footageId = await uploadFile(owner, workshopId, buildId, clip);
    await api.stop();
    const jobId = `transcode-footage-${footageId}`;

    // Half-way: the worker's ffmpeg running and progress between 10 % and 70 %.
    const workerPid = worker.pid!;
    let ffmpegPids: number[] = [];
    await waitUntil(
      'the worker to be half-way through the transcode',
      () => {
        const { state, percent } = renditions(footageId);
        ffmpegPids = childrenOf(workerPid).filter((pid) => commandOf(pid) === 'ffmpeg');
        if (state === 'ready') throw new Error('the transcode finished before it could be caught; make the clip longer');
        return state === 'processing' && percent >= 10 && percent <= 70 && ffmpegPids.length > 0;
      },
      180_000,
      100,
    );
    const percentAtKill = renditions(footageId).percent;
    worker.kill('SIGKILL');
    killAll(ffmpegPids);
    await worker.waitForExit();
    expect(renditions(footageId).state).toBe('processing');
    expect(await redis.lrange(jobKey('active'), 0, -1)).toContain(jobId);
    expect(await redis.hexists(jobKey(jobId), 'finishedOn')).toBe(0);

    const killedAt = Date.now();
    worker = new FaultApiProcess('worker');
    await worker.start();
    expect(worker.pid).not.toBe(workerPid);
    expect(await waitForRenditions(footageId, 240_000)).toBe('ready');
    const recoveredMs = Date.now() - killedAt;

    // The job finished once, in the new worker, without using up an attempt on failure.
    const job = await redis.hgetall(jobKey(jobId));
    expect(job.finishedOn).toBeDefined();
    expect(job.failedReason).toBeUndefined();
    expect(await redis.lrange(jobKey('active'), 0, -1)).not.toContain(jobId);

    // Nothing doubled or left over: the same names as the clean run, no more, no fewer.
    const listing = await storedNames(webPrefix(footageId));
    expect(listing).toEqual(cleanListing);
    expect(new Set(listing).size).toBe(listing.length);
    expect(sql(`SELECT COUNT(*), SUM(renditions_state = 'ready'), SUM(state = 'ready') FROM footage WHERE build_id = '${buildId}'`)).toEqual([['1', '1', '1']]);

    // And the API, back up, describes it as ready.
    api = new FaultApiProcess('main');
    await api.start();
    const footage = (await owner.get(`/api/workshops/${workshopId}/footage/${footageId}`).expect(200)).body as { renditions: { state: string; percent: number | null } };
    expect(footage.renditions).toMatchObject({ state: 'ready', percent: 100 });
    expectProgressForward(footageId);
    console.log(
      `worker killed mid-transcode at ${percentAtKill} %: ${listing.length} objects under web/ as in the clean run; ` +
        `the restarted worker finished ${recoveredMs} ms after the kill`,
    );
  });

  it('killed while storing its outputs, ends with exactly the objects of a clean run', async () => {
    expect(cleanListing.length).toBeGreaterThan(5);
    await stack.fakes.restartS3(STORE_DELAY_MS);
    const buildId = await newBuild('Killed while storing');
    const footageId = await uploadFile(owner, workshopId, buildId, clip);
    await api.stop();
    const prefix = webPrefix(footageId);
    const jobId = `transcode-footage-${footageId}`;
    const workerPid = worker.pid!;

    // The storing phase starts with a progress write of its own, before the first PUT; then the first objects land
    // (a second each, four at a time), and the worker is frozen at once (SIGSTOP) so what is stored cannot change.
    const storingPercent = RENDITION_JOB_PHASES.storing.start * 100;
    const finished = () => {
      if (renditions(footageId).state === 'ready') throw new Error('the outputs were all stored before the worker could be caught');
    };
    await waitUntil('the worker to reach the storing phase', () => {
      finished();
      const { state, percent } = renditions(footageId);
      return state === 'processing' && percent >= storingPercent;
    }, 240_000, 100);
    await waitUntil('the first outputs in the bucket', async () => {
      finished();
      return (await storedNames(prefix)).length > 0;
    }, 60_000, 50);
    worker.kill('SIGSTOP');
    const stored = await storedNames(prefix);
    const { state, percent } = renditions(footageId);
    killAll(childrenOf(workerPid));
    worker.kill('SIGKILL');
    await worker.waitForExit();

    // Caught half-way through storing, and the creator was told so: the percentage had reached the storing phase.
    expect(state).toBe('processing');
    expect(stored.length).toBeGreaterThan(0);
    expect(stored.length).toBeLessThan(cleanListing.length);
    expect(percent).toBeGreaterThanOrEqual(storingPercent);
    expect(percent).toBeLessThan(100);

    const killedAt = Date.now();
    worker = new FaultApiProcess('worker');
    await worker.start();
    expect(await waitForRenditions(footageId, 240_000)).toBe('ready');
    const recoveredMs = Date.now() - killedAt;
    const job = await redis.hgetall(jobKey(jobId));
    expect(job.finishedOn).toBeDefined();
    expect(job.failedReason).toBeUndefined();

    const listing = await storedNames(prefix);
    expect(listing).toEqual(cleanListing);
    expect(new Set(listing).size).toBe(listing.length);
    expect(sql(`SELECT COUNT(*), SUM(renditions_state = 'ready'), SUM(state = 'ready') FROM footage WHERE build_id = '${buildId}'`)).toEqual([['1', '1', '1']]);
    expectProgressForward(footageId);
    console.log(
      `worker killed while storing at ${percent} % with ${stored.length} of ${cleanListing.length} objects stored: ` +
        `the retry stored all ${listing.length} once, ready ${recoveredMs} ms after the kill`,
    );
  });
});
