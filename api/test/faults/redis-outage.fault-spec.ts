import Bull from 'bull';
import { randomBytes } from 'node:crypto';
import { QUEUES } from '../../src/infra/jobs/queues';
import { SEND_MAIL_JOB } from '../../src/infra/mail/mail-queue.service';
import type { OutgoingMail } from '../../src/infra/mail/mail.service';
import type { Agent } from '../support/accounts';
import { listMail } from '../support/mail-inbox';
import { browserAgentFor, FaultApiProcess, FaultStack, faultsEnv, health, sleep, waitUntil } from './fault-harness';

/**
 * Redis stopped (a clean SHUTDOWN, which writes the append-only file) while the API works a queue of
 * e-mails, and started again a few seconds later: every mail arrives exactly once, and health reports
 * the queue down while Redis is away.
 */

const MAILS = 80;
/**
 * Shorter than the ~10 s ioredis keeps a command waiting through reconnects (20 tries, 50 ms more each
 * time); FAULTS_REDIS_OUTAGE_MS tries a longer one (see docs/RELIABILITY.md for what that does).
 */
const OUTAGE_MS = Number(process.env.FAULTS_REDIS_OUTAGE_MS ?? 4_000);

describe('Redis stopped and restarted while the API works queued mail', () => {
  const stack = new FaultStack();
  const api = new FaultApiProcess('main');
  let producer: Bull.Queue<OutgoingMail>;

  beforeAll(async () => {
    await stack.start();
    await api.start();
    // Jobs are added as MailQueueService.enqueue adds them: same queue, prefix and job name.
    producer = new Bull<OutgoingMail>(QUEUES.mail, {
      redis: { host: '127.0.0.1', port: faultsEnv.redisPort },
      prefix: faultsEnv.queuePrefix,
      // infra.module.ts's defaults, which the app's own enqueue gets.
      defaultJobOptions: { attempts: 5, backoff: { type: 'exponential', delay: 2000 } },
    });
  });
  afterAll(async () => {
    await producer?.close();
    await api.stop();
    await stack.stop();
  });

  async function register(agent: Agent, email: string): Promise<{ status: number; body: unknown; ms: number }> {
    const started = Date.now();
    const response = await agent
      .post('/api/auth/register')
      .send({ email, password: 'correct horse battery staple', displayName: 'Outage Visitor' })
      .timeout(30_000);
    return { status: response.status, body: response.body, ms: Date.now() - started };
  }

  it('delivers every queued mail exactly once and reports the queue down during the outage', async () => {
    const batch = randomBytes(4).toString('hex');
    const to = `redis-fault-${batch}@fitwright.test`;
    const subjects = Array.from({ length: MAILS }, (_, index) => `Redis fault ${batch} #${index + 1}`);
    const delivered = async () => (await listMail()).filter((message) => message.to.some((recipient) => recipient.address === to));

    await producer.addBulk(subjects.map((subject) => ({ name: SEND_MAIL_JOB, data: { to, subject, text: `Message ${subject}` } })));
    await waitUntil('the first mails to arrive', async () => (await delivered()).length >= 10, 60_000, 50);

    const visitor = await browserAgentFor();
    await stack.redis.stop();
    const arrivedBeforeOutage = (await delivered()).length;
    const outageStarted = Date.now();
    const registering = register(visitor, `during-${batch}@fitwright.test`);
    const duringOutage = await health();
    await sleep(Math.max(0, OUTAGE_MS - (Date.now() - outageStarted)));
    await stack.redis.start();
    const registerDuring = await registering;

    expect(duringOutage.status).toBe(503);
    expect(duringOutage.body).toMatchObject({ status: 'down', checks: { database: 'up', storage: 'up', mail: 'up', queue: 'down' } });
    // A request that needs Redis (rate limit, enqueue) either waits for it and succeeds or answers a clear 503; never 500.
    if (registerDuring.status === 503) expect(registerDuring.body).toMatchObject({ statusCode: 503, code: 'queue_unavailable' });
    else expect({ status: registerDuring.status, body: registerDuring.body }).toMatchObject({ status: 202 });

    await waitUntil('every mail to arrive', async () => (await delivered()).length >= MAILS, 120_000, 250);
    // A doubled job would arrive a moment later: give it the time.
    await sleep(3_000);
    const counts = new Map<string, number>();
    for (const message of await delivered()) counts.set(message.subject, (counts.get(message.subject) ?? 0) + 1);
    const wrong = subjects.filter((subject) => counts.get(subject) !== 1).map((subject) => `${subject}: ${counts.get(subject) ?? 0}`);
    expect(wrong).toEqual([]);
    expect(arrivedBeforeOutage).toBeLessThan(MAILS);

    await waitUntil('health to report ok again', async () => (await health()).status === 200, 30_000, 250);
    const jobCounts = await producer.getJobCounts();
    expect(jobCounts).toMatchObject({ waiting: 0, active: 0, failed: 0, delayed: 0 });
    console.log(
      `redis outage: ${MAILS} mails queued, ${arrivedBeforeOutage} delivered before the stop, outage ${OUTAGE_MS} ms, ` +
        `each delivered once; health answered in ${duringOutage.elapsedMs} ms while down; ` +
        `a sign-up during the outage answered ${registerDuring.status} in ${registerDuring.ms} ms`,
    );
  });
});
