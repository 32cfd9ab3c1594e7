import { ListObjectsV2Command, S3Client } from '@aws-sdk/client-s3';
import Redis from 'ioredis';
import { execFileSync } from 'node:child_process';
import { randomBytes } from 'node:crypto';
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
 * The API process serves the uploads and is then stopped cleanly, so the worker is the only process
 * working the queues while the transcode runs (and is killed); the API comes back for the last reads.
 */

// Two full transcodes of a 24 s 720p clip, a kill and a recovery, on a box that may be busy.
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
  const renditions = (footageId: string) => {
    const [row] = sql(`SELECT renditions_state, COALESCE(renditions_percent, 0) FROM footage WHERE id = '${footageId}'`);
    return { state: row?.[0], percent: Number(row?.[1] ?? 0) };
  };
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
    const cleanListing = await storedNames(webPrefix(cleanId));
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
    // The killed worker's ffmpeg would run on as an orphan; a crashed host takes it down too.
    for (const pid of ffmpegPids) {
      try {
        process.kill(pid, 'SIGKILL');
      } catch {
        // already gone
      }
    }
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
    console.log(
      `worker killed mid-transcode at ${percentAtKill} %: ${listing.length} objects under web/ as in the clean run; ` +
        `the restarted worker finished ${recoveredMs} ms after the kill`,
    );
  });
});
