import { randomBytes } from 'node:crypto';
import type { Agent } from '../support/accounts';
import { FaultApiProcess, FaultStack, health, signUp, sleep, waitUntil } from './fault-harness';

/**
 * MariaDB stopped and started again while one API process keeps serving: requests answer a clear
 * 503 (never 500, never a hang), health says the database is down, and the same process recovers
 * by itself. A workshop is created with its owner membership in one transaction (two rows), so
 * every create attempted around the outage must leave both rows or neither.
 */

const REQUEST_DEADLINE_MS = 15_000;

function slug(label: string): string {
  return `${label}-${randomBytes(4).toString('hex')}`;
}

interface Attempt {
  slug: string;
  status: number | 'no answer';
  body: unknown;
}

describe('MariaDB stopped and restarted under a running API', () => {
  const stack = new FaultStack();
  const api = new FaultApiProcess('main');
  let owner: Agent;

  beforeAll(async () => {
    await stack.start();
    await api.start();
    owner = await signUp(`db-fault-${randomBytes(3).toString('hex')}@fitwright.test`);
  });
  afterAll(async () => {
    await api.stop();
    await stack.stop();
  });

  async function createWorkshop(workshopSlug: string): Promise<Attempt> {
    try {
      const response = await owner.post('/api/workshops').send({ name: 'Outage Bench', slug: workshopSlug }).timeout(REQUEST_DEADLINE_MS);
      return { slug: workshopSlug, status: response.status, body: response.body };
    } catch (error) {
      return { slug: workshopSlug, status: 'no answer', body: String(error) };
    }
  }

  /** [workshops with this slug, owner memberships of that workshop], read straight from MariaDB. */
  function rowsFor(workshopSlug: string): [number, number] {
    const [row] = stack.mariadb.sql(
      `SELECT (SELECT COUNT(*) FROM workshops WHERE slug = '${workshopSlug}'),
              (SELECT COUNT(*) FROM workshop_members m JOIN workshops w ON w.id = m.workshop_id WHERE w.slug = '${workshopSlug}')`,
    );
    return [Number(row[0]), Number(row[1])];
  }

  it('answers 503 during the outage, reports it in health, recovers in the same process, and leaves no half-written workshop', async () => {
    const before = await health();
    expect({ status: before.status, body: before.body }).toEqual({
      status: 200,
      body: { status: 'ok', checks: { database: 'up', storage: 'up', mail: 'up', queue: 'up' } },
    });
    expect((await createWorkshop(slug('before'))).status).toBe(201);
    const apiPid = api.pid;

    // Creates keep arriving while the server shuts down: some commit, some are cut off mid-way.
    const attempts: Promise<Attempt>[] = [];
    let writing = true;
    const writer = (async () => {
      while (writing) {
        attempts.push(createWorkshop(slug('during')));
        await sleep(20);
      }
    })();
    await sleep(150);
    await stack.mariadb.stop();

    const duringOutage = await Promise.all([
      owner.get('/api/workshops').timeout(REQUEST_DEADLINE_MS),
      createWorkshop(slug('outage')),
      health(),
    ]);
    writing = false;
    await writer;
    const [list, create, downHealth] = duringOutage;

    expect({ status: list.status, body: list.body }).toEqual({
      status: 503,
      body: { statusCode: 503, message: expect.stringMatching(/database/i), code: 'database_unavailable' },
    });
    expect(create.status).toBe(503);
    expect(downHealth.status).toBe(503);
    expect(downHealth.body).toMatchObject({
      statusCode: 503,
      status: 'down',
      checks: { database: 'down', storage: 'up', mail: 'up', queue: 'up' },
    });

    await stack.mariadb.start();
    // The same process, never restarted, finds the database again.
    await waitUntil('health to report ok again', async () => (await health()).status === 200, 30_000, 250);
    expect(api.running).toBe(true);
    expect(api.pid).toBe(apiPid);
    expect((await owner.get('/api/workshops').timeout(REQUEST_DEADLINE_MS)).status).toBe(200);
    expect((await createWorkshop(slug('after'))).status).toBe(201);

    const settled = await Promise.all(attempts);
    settled.push(create);
    const outcomes = settled.map((attempt) => ({ attempt, rows: rowsFor(attempt.slug) }));
    for (const { attempt, rows } of outcomes) {
      // All or nothing: the workshop with its owner, or no trace of it.
      expect({ slug: attempt.slug, rows }).toEqual({ slug: attempt.slug, rows: rows[0] === 0 ? [0, 0] : [1, 1] });
      // An answered 201 is stored; anything else is a clear 503, never a 500.
      if (attempt.status === 201) expect({ slug: attempt.slug, rows }).toEqual({ slug: attempt.slug, rows: [1, 1] });
      else expect({ slug: attempt.slug, status: attempt.status }).toEqual({ slug: attempt.slug, status: 503 });
    }
    // The outage really interrupted writes (otherwise this test proved nothing).
    expect(settled.filter((attempt) => attempt.status === 503).length).toBeGreaterThan(0);
    console.log(
      `database outage: ${settled.length} creates around the outage, ${settled.filter((a) => a.status === 201).length} stored, ` +
        `${settled.filter((a) => a.status === 503).length} answered 503; health answered in ${downHealth.elapsedMs} ms while down`,
    );
  });
});
