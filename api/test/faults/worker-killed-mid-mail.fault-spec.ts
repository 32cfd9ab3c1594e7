import Bull from 'bull';
import { randomBytes } from 'node:crypto';
import { QUEUES } from '../../src/infra/jobs/queues';
import { SEND_MAIL_JOB } from '../../src/infra/mail/mail-queue.service';
import type { OutgoingMail } from '../../src/infra/mail/mail.service';
import { listMail } from '../support/mail-inbox';
import { FaultApiProcess, FaultStack, faultsEnv, sleep, waitUntil } from './fault-harness';

/**
 * The queue-only worker (dist/worker.js) killed with SIGKILL while it sends a queue of e-mails, and a
 * new worker started: no mail is lost. Mail is at-least-once, not exactly-once: a kill that lands
 * after the SMTP server accepted a message but before Bull recorded the job as done sends that one
 * message again when the job is retried. The test therefore allows at most one repeat per kill and
 * reports how many it saw; a sent-marker in the database (a transactional outbox) would remove it.
 */

const MAILS = 60;

describe('the queue-only worker killed with SIGKILL mid-way through queued mail', () => {
  const stack = new FaultStack();
  let worker = new FaultApiProcess('worker');
  let producer: Bull.Queue<OutgoingMail>;

  beforeAll(async () => {
    await stack.start();
    producer = new Bull<OutgoingMail>(QUEUES.mail, {
      redis: { host: '127.0.0.1', port: faultsEnv.redisPort },
      prefix: faultsEnv.queuePrefix,
      // infra.module.ts's defaults, which the app's own enqueue gets.
      defaultJobOptions: { attempts: 5, backoff: { type: 'exponential', delay: 2000 } },
    });
    await worker.start();
  });
  afterAll(async () => {
    await producer?.close();
    await worker.stop();
    await stack.stop();
  });

  it('loses no mail and repeats at most the one in flight', async () => {
    const batch = randomBytes(4).toString('hex');
    const to = `worker-kill-${batch}@fitwright.test`;
    const subjects = Array.from({ length: MAILS }, (_, index) => `Worker kill ${batch} #${index + 1}`);
    const delivered = async () => (await listMail()).filter((message) => message.to.some((recipient) => recipient.address === to));

    await producer.addBulk(subjects.map((subject) => ({ name: SEND_MAIL_JOB, data: { to, subject, text: `Message ${subject}` } })));
    await waitUntil('the worker to send the first mails', async () => (await delivered()).length >= 10, 90_000, 20);

    worker.kill('SIGKILL');
    await worker.waitForExit();
    const arrivedBeforeKill = (await delivered()).length;
    expect(arrivedBeforeKill).toBeLessThan(MAILS);
    const killedAt = Date.now();

    worker = new FaultApiProcess('worker');
    await worker.start();
    await waitUntil('every mail to arrive', async () => new Set((await delivered()).map((m) => m.subject)).size >= MAILS, 120_000, 250);
    const recoveredMs = Date.now() - killedAt;
    await waitUntil('the queue to drain', async () => {
      const counts = await producer.getJobCounts();
      return counts.waiting + counts.active + counts.delayed === 0;
    }, 60_000, 250);
    // A repeat would arrive a moment after the last job: give it the time.
    await sleep(2_000);

    const counts = new Map<string, number>();
    for (const message of await delivered()) counts.set(message.subject, (counts.get(message.subject) ?? 0) + 1);
    const lost = subjects.filter((subject) => !counts.has(subject));
    const repeated = subjects.filter((subject) => (counts.get(subject) ?? 0) > 1);
    expect(lost).toEqual([]);
    expect(repeated.length).toBeLessThanOrEqual(1);
    expect(repeated.every((subject) => counts.get(subject) === 2)).toBe(true);
    expect((await producer.getJobCounts()).failed).toBe(0);
    console.log(
      `worker killed mid-mail: ${MAILS} mails, ${arrivedBeforeKill} sent before the kill, all sent ${recoveredMs} ms after it; ` +
        `repeated: ${repeated.length === 0 ? 'none' : repeated.join(', ')}`,
    );
  });
});
