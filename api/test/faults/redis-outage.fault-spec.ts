import { randomBytes } from 'node:crypto';
import type { Agent } from '../support/accounts';
import { listMail } from '../support/mail-inbox';
import { browserAgentFor, FaultApiProcess, FaultStack, health, sleep, waitUntil } from './fault-harness';

/**
 * Redis stopped (a clean SHUTDOWN, which writes the append-only file) while the API serves sign-ups,
 * and started again a few seconds later: health reports the queue down while Redis is away, a request
 * that needs Redis answers a clear 503 or waits and succeeds (never 500), and mail — which goes through
 * the outbox in MariaDB, not through Redis — arrives exactly once for every sign-up that was accepted.
 * (A fan-out of fit news through a Redis outage: outbox-fan-out.fault-spec.ts.)
 */

const SIGN_UPS = 20;
/**
 * Shorter than the ~10 s ioredis keeps a command waiting through reconnects (20 tries, 50 ms more each
 * time); FAULTS_REDIS_OUTAGE_MS tries a longer one (see docs/RELIABILITY.md for what that does).
 */
const OUTAGE_MS = Number(process.env.FAULTS_REDIS_OUTAGE_MS ?? 4_000);

describe('Redis stopped and restarted under a running API', () => {
  const stack = new FaultStack();
  const api = new FaultApiProcess('main');

  beforeAll(async () => {
    await stack.start();
    await api.start();
  });
  afterAll(async () => {
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

  it('reports the queue down, answers clearly, and sends each accepted sign-up its mail once', async () => {
    const batch = randomBytes(4).toString('hex');
    const addresses = Array.from({ length: SIGN_UPS }, (_, index) => `redis-fault-${index}-${batch}@fitwright.test`);
    const visitor = await browserAgentFor();
    const before = await Promise.all(addresses.slice(0, SIGN_UPS / 2).map(async (email) => ({ email, ...(await register(visitor, email)) })));

    await stack.redis.stop();
    const outageStarted = Date.now();
    const registering = Promise.all(addresses.slice(SIGN_UPS / 2).map(async (email) => ({ email, ...(await register(visitor, email)) })));
    const duringOutage = await health();
    await sleep(Math.max(0, OUTAGE_MS - (Date.now() - outageStarted)));
    await stack.redis.start();
    const during = await registering;

    expect(duringOutage.status).toBe(503);
    expect(duringOutage.body).toMatchObject({ status: 'down', checks: { database: 'up', storage: 'up', mail: 'up', queue: 'down' } });
    for (const answer of during) {
      // A request that needs Redis (rate limit) either waits for it and succeeds or answers a clear 503; never 500.
      if (answer.status === 503) expect(answer.body).toMatchObject({ statusCode: 503, code: 'queue_unavailable' });
      else expect({ status: answer.status, body: answer.body }).toMatchObject({ status: 202 });
    }
    const accepted = [...before, ...during].filter((answer) => answer.status === 202).map((answer) => answer.email);
    expect(before.every((answer) => answer.status === 202)).toBe(true);

    const confirmations = async () =>
      (await listMail()).filter((message) => message.subject.includes('Confirm your e-mail') && message.to.some((to) => addresses.includes(to.address)));
    await waitUntil('every accepted sign-up to get its mail', async () => (await confirmations()).length >= accepted.length, 60_000, 250);
    await sleep(2_000);
    const counts = new Map<string, number>();
    for (const message of await confirmations()) for (const to of message.to) counts.set(to.address, (counts.get(to.address) ?? 0) + 1);
    expect(accepted.filter((email) => counts.get(email) !== 1)).toEqual([]);
    expect([...counts.keys()].filter((email) => !accepted.includes(email))).toEqual([]);

    await waitUntil('health to report ok again', async () => (await health()).status === 200, 30_000, 250);
    const statuses = during.map((answer) => answer.status).join(', ');
    console.log(
      `redis outage ${OUTAGE_MS} ms: health answered ${duringOutage.status} in ${duringOutage.elapsedMs} ms while down; ` +
        `sign-ups during it answered ${statuses}; ${accepted.length} accepted sign-ups, each mailed once`,
    );
  });
});
