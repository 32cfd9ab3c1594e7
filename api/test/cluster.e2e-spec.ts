import { type ChildProcess, spawn } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { closeSync, mkdirSync, openSync, readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import mysql from 'mysql2/promise';
import { TEST_PASSWORD, uniqueClientIp, uniqueEmail, uniqueSlug } from './support/accounts';
import { inboxSnapshot, listMail, tokenFrom, waitForMail } from './support/mail-inbox';
import { portAnswers } from './support/ports';

jest.setTimeout(180_000);

/**
 * `npm run start:cluster`'s launcher (scripts/cluster.mjs) started for real on the test profile's services: two
 * API processes (`node dist/main.js`) and a queue-only worker (`node dist/worker.js`), each its own OS process, on
 * the same MariaDB, Redis and storage, with the round-robin proxy in front. A browser's requests go to one process
 * or the other by hand here, as a load balancer would send them: whatever one process stored or counted, the other
 * must see. The API processes do not relay mail (MAIL_RELAY=false), so every mail that arrives was sent by the worker.
 */

const ROOT = resolve(__dirname, '../..');
const testPort = Number(process.env.PORT ?? 3100);
// Beside the test profile's own app port (each slot owns ten ports from it), free while the API e2e tests run.
const proxyPort = testPort + 3;
const [portA, portB] = [testPort + 1, testPort + 2];
const urlA = `http://127.0.0.1:${portA}`;
const urlB = `http://127.0.0.1:${portB}`;
const viaProxy = `http://127.0.0.1:${proxyPort}`;
/** Sign-in, sign-up and reset attempts a minute per client address, low enough to reach here. */
const AUTH_LIMIT = 6;

interface Answer {
  status: number;
  body: any; // eslint-disable-line @typescript-eslint/no-explicit-any
  headers: Headers;
}

/**
 * One browser: one cookie jar, one client address (X-Forwarded-For, believed from loopback), echoing the fw_csrf
 * cookie in X-CSRF-Token as the studio does, and able to send each request to any process.
 */
class Browser {
  readonly cookies = new Map<string, string>();
  constructor(readonly clientIp = uniqueClientIp()) {}

  get csrf(): string | undefined {
    const value = this.cookies.get('fw_csrf');
    return value === undefined ? undefined : decodeURIComponent(value);
  }

  async call(baseUrl: string, method: string, path: string, body?: unknown, extra: Record<string, string> = {}): Promise<Answer> {
    const headers: Record<string, string> = {
      accept: 'application/json',
      'x-forwarded-for': this.clientIp,
      cookie: [...this.cookies].map(([key, value]) => `${key}=${value}`).join('; '),
    };
    if (this.csrf) headers['x-csrf-token'] = this.csrf;
    if (body !== undefined) headers['content-type'] = 'application/json';
    // fetch adds `Cache-Control: no-cache` to a conditional request that names none, which rightly forbids a 304.
    if (extra['if-none-match']) headers['cache-control'] = 'max-age=0';
    const response = await fetch(`${baseUrl}${path}`, {
      method,
      headers: { ...headers, ...extra },
      body: body === undefined ? undefined : JSON.stringify(body),
      redirect: 'manual',
      signal: AbortSignal.timeout(30_000),
    });
    for (const line of response.headers.getSetCookie()) {
      const [pair] = line.split(';');
      const [key, ...value] = pair.split('=');
      if (/max-age=0|expires=thu, 01 jan 1970/i.test(line)) this.cookies.delete(key.trim());
      else this.cookies.set(key.trim(), value.join('='));
    }
    const text = await response.text();
    let parsed: unknown = text;
    try {
      parsed = text ? JSON.parse(text) : null;
    } catch {
      // not JSON: keep the text
    }
    return { status: response.status, body: parsed, headers: response.headers };
  }

  /** Like call, but fails the test naming the route and the API's answer when the status is not `expected`. */
  async expect(expected: number, baseUrl: string, method: string, path: string, body?: unknown): Promise<Answer> {
    const answer = await this.call(baseUrl, method, path, body);
    if (answer.status !== expected) {
      throw new Error(`${method} ${baseUrl}${path}: expected ${expected}, got ${answer.status} ${JSON.stringify(answer.body)}`);
    }
    return answer;
  }
}

/** The launcher and its children (their output goes to one log in the profile's log folder); only it is stopped. */
class Cluster {
  private child: ChildProcess | undefined;
  readonly log = join(process.env.FW_LOGS ?? join(ROOT, '.data/test/logs'), 'cluster-e2e.log');

  async start(): Promise<void> {
    for (const port of [proxyPort, portA, portB]) {
      if (await portAnswers(port)) throw new Error(`port ${port} is taken: another cluster test running on this slot?`);
    }
    mkdirSync(join(this.log, '..'), { recursive: true });
    const log = openSync(this.log, 'w');
    this.child = spawn(process.execPath, [join(ROOT, 'scripts/cluster.mjs')], {
      cwd: ROOT,
      env: {
        ...process.env,
        PORT: String(proxyPort),
        CLUSTER_API_PORTS: `${portA},${portB}`,
        CLUSTER_WORKERS: '1',
        AUTH_RATE_LIMIT: String(AUTH_LIMIT),
      },
      // The IPC channel ends the launcher (and so its children) if this test process dies.
      stdio: ['ignore', log, log, 'ipc'],
    });
    closeSync(log);
    this.child.channel?.unref();
    const deadline = Date.now() + 120_000;
    while (!readFileSync(this.log, 'utf8').includes('cluster ready')) {
      if (this.child.exitCode !== null) throw new Error(`the cluster launcher exited (${this.child.exitCode}): see ${this.log}`);
      if (Date.now() > deadline) throw new Error(`the cluster did not become ready within 120 s: see ${this.log}`);
      await new Promise((done) => setTimeout(done, 250));
    }
  }

  /** The pids of the processes the launcher started, from its ready line. */
  pids(): Record<string, number> {
    const line = readFileSync(this.log, 'utf8').split('\n').find((candidate) => candidate.includes('cluster ready')) ?? '';
    return Object.fromEntries([...line.matchAll(/(api-[a-z]|worker-\d+) (\d+)/g)].map((match) => [match[1], Number(match[2])]));
  }

  async stop(): Promise<void> {
    const child = this.child;
    if (!child || child.exitCode !== null || child.signalCode !== null) return;
    const exited = new Promise((done) => child.once('exit', done));
    child.kill('SIGTERM');
    const timer = setTimeout(() => child.kill('SIGKILL'), 30_000);
    await exited;
    clearTimeout(timer);
  }
}

describe('two API processes and a queue-only worker behind the cluster proxy (separate OS processes)', () => {
  const cluster = new Cluster();
  let db: mysql.Connection;

  /** Signs up on A (the worker mails the link), confirms on B, signs in on A. */
  async function signedUp(): Promise<{ browser: Browser; email: string; userId: string }> {
    const browser = new Browser();
    const email = uniqueEmail('cluster');
    await browser.expect(200, urlA, 'GET', '/api/auth/me');
    await browser.expect(202, urlA, 'POST', '/api/auth/register', { email, password: TEST_PASSWORD, displayName: 'Cluster Tester' });
    const mail = await waitForMail(email, { subject: /Confirm your e-mail/, timeoutMs: 30_000 });
    await browser.expect(200, urlB, 'POST', '/api/auth/verify-email', { token: tokenFrom(mail, '/verify-email') });
    const login = await browser.expect(200, urlA, 'POST', '/api/auth/login', { email, password: TEST_PASSWORD });
    return { browser, email, userId: login.body.user.id as string };
  }

  beforeAll(async () => {
    await cluster.start();
    db = await mysql.createConnection({
      host: process.env.DB_HOST,
      port: Number(process.env.DB_PORT),
      user: process.env.DB_USER,
      password: process.env.DB_PASSWORD,
      database: process.env.DB_NAME,
    });
  });
  afterAll(async () => {
    await db?.end();
    await cluster.stop();
  });

  it('runs each API process and the worker as its own OS process, and the proxy answers from both', async () => {
    const pids = cluster.pids();
    expect(Object.keys(pids).sort()).toEqual(['api-a', 'api-b', 'worker-1']);
    expect(new Set(Object.values(pids)).size).toBe(3);
    expect(Object.values(pids)).not.toContain(process.pid);
    for (const url of [urlA, urlB, viaProxy]) expect((await fetch(`${url}/api/health`)).status).toBe(200);
  });

  it('accepts on B a session made on A, and signs out everywhere from B', async () => {
    const { browser, email, userId } = await signedUp();
    const onB = await browser.expect(200, urlB, 'GET', '/api/auth/me');
    expect(onB.body.user).toMatchObject({ id: userId, email });
    const viaTheProxy = await browser.expect(200, viaProxy, 'GET', '/api/auth/me');
    expect(viaTheProxy.body.user.id).toBe(userId);

    // Signed out on B: the session row is gone, so A refuses the old cookie too.
    const kept = new Browser(browser.clientIp);
    for (const [name, value] of browser.cookies) kept.cookies.set(name, value);
    await browser.expect(204, urlB, 'POST', '/api/auth/logout');
    expect((await kept.expect(200, urlA, 'GET', '/api/auth/me')).body.user).toBeNull();
  });

  it('accepts on each process the CSRF token the other issued, and refuses one of another session on both', async () => {
    const { browser } = await signedUp();
    // The token the sign-in on A set, used on B for a write.
    const made = await browser.expect(201, urlB, 'POST', '/api/workshops', { name: 'Cluster Shop', slug: uniqueSlug('cluster') });
    // B's answer may hand out a fresh token; A accepts what B issued.
    await browser.expect(200, urlB, 'GET', '/api/auth/me');
    await browser.expect(201, urlA, 'POST', `/api/workshops/${made.body.id}/builds`, { title: 'Made on A with B\'s token' });

    const other = (await signedUp()).browser;
    for (const url of [urlA, urlB]) {
      const forged = await browser.call(url, 'POST', `/api/workshops/${made.body.id}/builds`, { title: 'forged' }, { 'x-csrf-token': other.csrf! });
      expect({ url, status: forged.status, code: forged.body.code }).toEqual({ url, status: 403, code: 'csrf_invalid' });
    }
  });

  it('pauses sign-in for an address after five failures spread over both processes, on both', async () => {
    const { email } = await signedUp();
    // Each try from its own client address, so only the per-account pause (not the per-address limit) is counted.
    const statuses: number[] = [];
    for (const url of [urlA, urlB, urlA, urlB, urlA]) {
      const stranger = new Browser();
      await stranger.expect(200, url, 'GET', '/api/auth/me');
      statuses.push((await stranger.call(url, 'POST', '/api/auth/login', { email, password: 'not the password at all' })).status);
    }
    expect(statuses).toEqual([401, 401, 401, 401, 401]);
    for (const url of [urlB, urlA]) {
      const owner = new Browser();
      await owner.expect(200, url, 'GET', '/api/auth/me');
      const paused = await owner.call(url, 'POST', '/api/auth/login', { email, password: TEST_PASSWORD });
      expect({ url, status: paused.status, code: paused.body.code }).toEqual({ url, status: 429, code: 'sign_in_paused' });
    }
  });

  it('counts one client address\'s attempts a minute across both processes', async () => {
    const client = new Browser();
    await client.expect(200, urlA, 'GET', '/api/auth/me');
    const statuses: number[] = [];
    for (let attempt = 0; attempt <= AUTH_LIMIT; attempt += 1) {
      const answer = await client.call(attempt % 2 === 0 ? urlA : urlB, 'POST', '/api/auth/login', {
        email: uniqueEmail('nobody'),
        password: 'not the password at all',
      });
      statuses.push(answer.status);
    }
    // Six a minute in all, not six on each: the seventh, on A, is refused.
    expect(statuses).toEqual([...Array(AUTH_LIMIT).fill(401), 429]);
    expect((await client.call(urlB, 'POST', '/api/auth/login', { email: uniqueEmail('nobody'), password: 'x'.repeat(12) })).status).toBe(429);
  });

  it('does a job queued on A once: a password-reset request becomes one mail, sent by the worker', async () => {
    const { email } = await signedUp();
    const before = await inboxSnapshot(email);
    const stranger = new Browser();
    await stranger.expect(200, urlA, 'GET', '/api/auth/me');
    await stranger.expect(202, urlA, 'POST', '/api/auth/password/forgot', { email });
    await waitForMail(email, { subject: /Choose a new Fitwright password/, excluding: before, timeoutMs: 30_000 });
    // Every process works the queue; give a second run (if there were one) time to arrive before counting.
    await new Promise((done) => setTimeout(done, 3_000));
    const resets = (await listMail()).filter(
      (message) => !before.has(message.id) && message.subject === 'Choose a new Fitwright password' && message.to.some((to) => to.address.toLowerCase() === email),
    );
    expect(resets).toHaveLength(1);
    const [rows] = await db.query<mysql.RowDataPacket[]>(
      `SELECT state, attempts, sent_by FROM mail_deliveries WHERE recipient = ? AND subject = 'Choose a new Fitwright password'`,
      [email],
    );
    expect(rows.map((row) => ({ state: row.state, attempts: Number(row.attempts) }))).toEqual([{ state: 'sent', attempts: 1 }]);
    // Sent by the one relaying process: the same relay that sent the sign-up mail, while both APIs relay nothing.
    const [senders] = await db.query<mysql.RowDataPacket[]>('SELECT DISTINCT sent_by FROM mail_deliveries WHERE recipient = ?', [email]);
    expect(senders).toHaveLength(1);
  });

  it('shows on B a check confirmed through A at once, through the guide tag both processes share in Redis', async () => {
    const { browser } = await signedUp();
    const workshop = (await browser.expect(201, urlA, 'POST', '/api/workshops', { name: 'Cluster Garage', slug: uniqueSlug('cluster-guide') })).body;
    const base = `/api/workshops/${workshop.id}`;
    const build = (await browser.expect(201, urlA, 'POST', `${base}/builds`, { title: 'Coupler swap' })).body;
    const part = (
      await browser.expect(201, urlA, 'POST', `${base}/parts`, {
        partNumber: `CL-${randomBytes(2).toString('hex')}`,
        title: 'Pilot bearing and shaft',
        category: 'other',
        features: [{ name: 'bore', kind: 'diameter', role: 'hole', nominal: '15', unit: 'mm' }],
      })
    ).body;
    const assembly = (await browser.expect(201, urlA, 'POST', `${base}/builds/${build.id}/assemblies`, { name: 'Coupler stack' })).body;
    const check = (await browser.expect(201, urlA, 'POST', `${base}/assemblies/${assembly.id}/checks`, { title: 'Pilot bearing seats' })).body;
    const measurement = (
      await browser.expect(201, urlA, 'POST', `${base}/measurements`, {
        featureId: part.features[0].id,
        quantity: 'diameter',
        value: '15.010',
        unit: 'mm',
        instrumentKind: 'bore_gauge',
        resolution: '0.001',
      })
    ).body;
    const guide = (await browser.expect(201, urlA, 'POST', `${base}/builds/${build.id}/guides`, { title: 'Fitting the coupler' })).body;
    await browser.expect(200, urlA, 'PATCH', `${base}/guides/${guide.id}`, { assemblyId: assembly.id });
    await browser.expect(201, urlA, 'POST', `${base}/guides/${guide.id}/steps`, { title: 'Seat the bearing' });
    await browser.expect(201, urlA, 'POST', `${base}/guides/${guide.id}/revisions`, {});

    const reader = new Browser();
    const path = `/api/guides/${workshop.slug}/${guide.slug}`;
    // The measurement's re-evaluation job may still be writing the check: read until B's tag holds still.
    let before = await reader.expect(200, urlB, 'GET', path);
    let tag = String(before.headers.get('etag'));
    for (let tries = 0; (await reader.call(urlB, 'GET', path, undefined, { 'if-none-match': tag })).status !== 304; tries += 1) {
      if (tries > 20) throw new Error(`the guide's tag kept moving on B (last ${tag})`);
      await new Promise((done) => setTimeout(done, 250));
      before = await reader.expect(200, urlB, 'GET', path);
      tag = String(before.headers.get('etag'));
    }
    const stateOf = (answer: Answer) => (answer.body.checklist.checks as { id: string; state: string }[]).find((one) => one.id === check.id)?.state;
    expect(stateOf(before)).not.toBe('confirmed');

    await browser.expect(201, urlA, 'POST', `${base}/checks/${check.id}/evidence`, { kind: 'measurement', measurementId: measurement.id });
    await browser.expect(201, urlA, 'POST', `${base}/checks/${check.id}/transitions`, { to: 'confirmed', reason: 'Seated by hand' });

    // B held the old tag; the write on A forgot it before A answered, so B's next read is fresh.
    const after = await reader.call(urlB, 'GET', path, undefined, { 'if-none-match': tag });
    expect(after.status).toBe(200);
    expect(after.headers.get('etag')).not.toBe(tag);
    expect(stateOf(after)).toBe('confirmed');
    expect((await reader.call(urlA, 'GET', path, undefined, { 'if-none-match': String(after.headers.get('etag')) })).status).toBe(304);
  });
});
