import Redis from 'ioredis';
import { randomBytes } from 'node:crypto';
import { QUEUES } from '../../src/infra/jobs/queues';
import type { Agent } from '../support/accounts';
import { makeClip, removeScratch, uploadFile, waitUntilProcessed } from '../support/footage';
import { FaultApiProcess, FaultStack, faultsEnv, signUp, sleep } from './fault-harness';

/**
 * The API process is killed with SIGKILL while it works a media job (probe, poster frame, state
 * change), and started again: Bull finds the job's lock expired (stalled-job recovery), runs it again
 * in the new process, and the footage ends up ready once, with one poster. The job is idempotent: the
 * poster has a fixed key and the state changes only from `processing`.
 */

/** How many uploads to try before giving up on catching a job between "taken" and "finished". */
const CATCH_TRIES = 8;

describe('the API killed with SIGKILL mid-job and started again', () => {
  const stack = new FaultStack();
  let api = new FaultApiProcess('main');
  let redis: Redis;
  let owner: Agent;
  let workshopId: string;
  let buildId: string;
  let clip: string;

  const jobKey = (suffix: string) => `${faultsEnv.queuePrefix}:${QUEUES.media}:${suffix}`;

  beforeAll(async () => {
    await stack.start();
    await api.start();
    redis = new Redis({ host: '127.0.0.1', port: faultsEnv.redisPort, maxRetriesPerRequest: 3 });
    owner = await signUp(`kill-fault-${randomBytes(3).toString('hex')}@fitwright.test`);
    workshopId = (await owner.post('/api/workshops').send({ name: 'Crash Bench', slug: `crash-${randomBytes(4).toString('hex')}` }).expect(201)).body.id;
    buildId = (await owner.post(`/api/workshops/${workshopId}/builds`).send({ title: 'Spindle coupler' }).expect(201)).body.id;
    // A longer, larger clip so the job (probe + poster frame) lasts long enough to be caught.
    clip = makeClip('kill.mp4', { seconds: 20, width: 1280, height: 720 });
  });
  afterAll(async () => {
    removeScratch();
    redis?.disconnect();
    await api.stop();
    await stack.stop();
  });

  /** Uploads the clip and freezes the API (SIGSTOP) the moment its media job is active; undefined if it was too quick. */
  async function uploadAndFreezeMidJob(): Promise<{ footageId: string; jobId: string } | undefined> {
    const footageId = await uploadFile(owner, workshopId, buildId, clip);
    const jobId = `process-footage-${footageId}`;
    const deadline = Date.now() + 20_000;
    while (Date.now() < deadline) {
      if ((await redis.lrange(jobKey('active'), 0, -1)).includes(jobId)) {
        api.kill('SIGSTOP');
        // Frozen now: if the job has not finished, the kill lands mid-job.
        if (!(await redis.hexists(jobKey(jobId), 'finishedOn'))) return { footageId, jobId };
        api.kill('SIGCONT');
        return undefined;
      }
      if (await redis.hexists(jobKey(jobId), 'finishedOn')) return undefined;
      await sleep(5);
    }
    throw new Error(`the media job ${jobId} never became active`);
  }

  it('finishes the interrupted job once, in the restarted process', async () => {
    let caught: { footageId: string; jobId: string } | undefined;
    let tries = 0;
    while (!caught && tries < CATCH_TRIES) {
      tries += 1;
      caught = await uploadAndFreezeMidJob();
    }
    if (!caught) throw new Error(`no media job could be caught mid-way in ${CATCH_TRIES} uploads`);
    const { footageId, jobId } = caught;

    const killedPid = api.pid;
    api.kill('SIGKILL');
    await api.waitForExit();
    // Killed mid-job: still active and unfinished, the footage still processing.
    expect(await redis.lrange(jobKey('active'), 0, -1)).toContain(jobId);
    expect(await redis.hexists(jobKey(jobId), 'finishedOn')).toBe(0);
    expect(stack.mariadb.sql(`SELECT state FROM footage WHERE id = '${footageId}'`)).toEqual([['processing']]);

    const killedAt = Date.now();
    api = new FaultApiProcess('main');
    await api.start();
    expect(api.pid).not.toBe(killedPid);

    const footage = await waitUntilProcessed(owner, workshopId, footageId, 90_000);
    const recoveredMs = Date.now() - killedAt;
    expect({ state: footage.state, failureReason: footage.failureReason }).toEqual({ state: 'ready', failureReason: null });

    const job = await redis.hgetall(jobKey(jobId));
    expect(job.finishedOn).toBeDefined();
    expect(job.failedReason).toBeUndefined();
    expect(await redis.zscore(jobKey('completed'), jobId)).not.toBeNull();
    expect(await redis.lrange(jobKey('active'), 0, -1)).not.toContain(jobId);
    // One poster, under the footage's fixed key, and the footage row written once to ready.
    expect(stack.mariadb.sql(`SELECT state, poster_key IS NOT NULL FROM footage WHERE id = '${footageId}'`)).toEqual([['ready', '1']]);
    console.log(`API killed mid-job: caught on upload ${tries}; the restarted API finished the job ${recoveredMs} ms after the kill`);
  });
});
