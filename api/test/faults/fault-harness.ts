import { type ChildProcess, execFileSync, spawn } from 'node:child_process';
import { closeSync, existsSync, mkdirSync, openSync, readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import request from 'supertest';
import { type Agent, echoingCsrf } from '../support/accounts';
import { tokenFrom, waitForMail } from '../support/mail-inbox';
import { portAnswers } from '../support/ports';

/**
 * Fault tests stop and start services on purpose, so they never touch a service someone else
 * started: this harness starts the "faults" profile's own MariaDB, Redis, S3 fake, mail fake and API
 * processes (ports, data and sockets under .data/faults/, from scripts/env.sh) as children of the
 * test process, and stops only those children.
 */

const ROOT = resolve(__dirname, '../../..');
const EXIT_WITH_PARENT = join(ROOT, 'local-services/exit-with-parent.js');
/** The API whose dist/ is run: this checkout's, or another build's (FAULTS_API_DIR) to compare. */
const API_DIR = process.env.FAULTS_API_DIR ?? join(ROOT, 'api');

function required(name: string): string {
  const value = process.env[name];
  if (!value) throw new Error(`${name} is not set: run the fault tests through npm run test:faults`);
  return value;
}

export const faultsEnv = {
  data: required('FW_DATA'),
  run: required('FW_RUN'),
  logs: required('FW_LOGS'),
  dbPort: Number(required('DB_PORT')),
  dbName: required('DB_NAME'),
  redisPort: Number(required('REDIS_PORT')),
  queuePrefix: required('QUEUE_PREFIX'),
  apiPort: Number(required('PORT')),
  s3Port: Number(required('S3_FAKE_PORT')),
  mailWebPort: Number(required('MAIL_FAKE_WEB_PORT')),
  mailSmtpPort: Number(required('MAIL_FAKE_SMTP_PORT')),
};

if (!/[/\\]\.data[/\\]faults(-slot\d)?$/u.test(faultsEnv.data)) {
  // The harness shuts services down: refuse to aim it at another profile's data.
  throw new Error(`fault tests run only on the faults profile (FW_DATA is ${faultsEnv.data})`);
}

export const apiUrl = `http://127.0.0.1:${faultsEnv.apiPort}`;

export const sleep = (ms: number) => new Promise<void>((done) => setTimeout(done, ms));

export async function waitUntil(what: string, check: () => Promise<boolean> | boolean, timeoutMs = 30_000, everyMs = 100): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (await check()) return;
    await sleep(everyMs);
  }
  throw new Error(`${what} did not happen within ${timeoutMs} ms`);
}


function quietly(command: string, args: string[]): boolean {
  try {
    execFileSync(command, args, { stdio: 'ignore', timeout: 10_000 });
    return true;
  } catch {
    return false;
  }
}

/** A child process whose output goes to a log file in the profile's log folder. */
export class Service {
  private child: ChildProcess | undefined;
  private exited: Promise<void> = Promise.resolve();

  constructor(
    readonly name: string,
    private readonly command: string,
    private readonly args: string[],
    private readonly options: { cwd?: string; env?: NodeJS.ProcessEnv } = {},
  ) {}

  get pid(): number | undefined {
    return this.child?.pid;
  }

  get running(): boolean {
    return this.child !== undefined && this.child.exitCode === null && this.child.signalCode === null;
  }

  spawn(): void {
    if (this.running) throw new Error(`${this.name} is already running`);
    const log = openSync(join(faultsEnv.logs, `${this.name}.log`), 'a');
    // A Node child gets an IPC channel and exits when it closes (local-services/exit-with-parent.js), so an
    // interrupted run leaves no API or fake behind to answer the next run in its place.
    const isNode = this.command === 'node';
    const child = spawn(this.command, isNode ? ['--require', EXIT_WITH_PARENT, ...this.args] : this.args, {
      cwd: this.options.cwd ?? ROOT,
      env: this.options.env ?? process.env,
      stdio: isNode ? ['ignore', log, log, 'ipc'] : ['ignore', log, log],
    });
    closeSync(log);
    child.channel?.unref();
    this.child = child;
    this.exited = new Promise((done) => child.once('exit', () => done()));
  }

  signal(signal: NodeJS.Signals): void {
    if (this.running) this.child?.kill(signal);
  }

  /** Waits for the process to end; after `timeoutMs` it is killed. */
  async waitForExit(timeoutMs = 20_000): Promise<void> {
    if (!this.running) return;
    const timer = setTimeout(() => this.signal('SIGKILL'), timeoutMs);
    await this.exited;
    clearTimeout(timer);
  }

  async stop(timeoutMs = 20_000): Promise<void> {
    this.signal('SIGTERM');
    await this.waitForExit(timeoutMs);
  }
}

const mariadbSocket = join(faultsEnv.run, 'mysqld.sock');

export class FaultMariaDb {
  private readonly datadir = join(faultsEnv.data, 'mariadb');
  private readonly service = new Service('mariadb', 'mariadbd', [
    '--no-defaults',
    `--user=${execFileSync('id', ['-un']).toString().trim()}`,
    `--datadir=${this.datadir}`,
    `--socket=${mariadbSocket}`,
    `--pid-file=${join(faultsEnv.run, 'mysqld.pid')}`,
    `--port=${faultsEnv.dbPort}`,
    '--bind-address=127.0.0.1',
    '--skip-name-resolve',
    '--character-set-server=utf8mb4',
    '--collation-server=utf8mb4_unicode_ci',
    '--skip-log-bin',
    `--log-error=${join(faultsEnv.logs, 'mariadb.err')}`,
  ]);

  ping(): boolean {
    return quietly('mariadb-admin', ['--no-defaults', `--socket=${mariadbSocket}`, '-uroot', 'ping']);
  }

  async start(): Promise<void> {
    if (this.ping()) {
      // Left over from an interrupted fault run (this profile's own socket): shut it down and start ours.
      quietly('mariadb-admin', ['--no-defaults', `--socket=${mariadbSocket}`, '-uroot', 'shutdown']);
      await waitUntil('the leftover MariaDB to stop', async () => !(await portAnswers(faultsEnv.dbPort)));
    }
    if (!existsSync(join(this.datadir, 'mysql'))) {
      mkdirSync(this.datadir, { recursive: true });
      execFileSync('mariadb-install-db', [
        '--no-defaults',
        `--user=${execFileSync('id', ['-un']).toString().trim()}`,
        `--datadir=${this.datadir}`,
        '--auth-root-authentication-method=normal',
        '--skip-test-db',
      ], { stdio: 'ignore' });
    }
    this.service.spawn();
    await waitUntil('MariaDB to answer', () => this.ping(), 60_000, 250);
  }

  /** A clean shutdown, as an operator or a package upgrade does it. */
  async stop(): Promise<void> {
    if (!quietly('mariadb-admin', ['--no-defaults', `--socket=${mariadbSocket}`, '-uroot', 'shutdown'])) this.service.signal('SIGTERM');
    await this.service.waitForExit(30_000);
  }

  /** A fresh, empty application database with the app's user, as scripts/lib.sh makes it. */
  resetDatabase(): void {
    const user = required('DB_USER');
    const password = required('DB_PASSWORD');
    this.sql(
      `
      DROP DATABASE IF EXISTS \`${faultsEnv.dbName}\`;
      CREATE DATABASE \`${faultsEnv.dbName}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
      CREATE USER IF NOT EXISTS '${user}'@'127.0.0.1' IDENTIFIED BY '${password}';
      CREATE USER IF NOT EXISTS '${user}'@'localhost' IDENTIFIED BY '${password}';
      GRANT ALL PRIVILEGES ON \`${faultsEnv.dbName}\`.* TO '${user}'@'127.0.0.1';
      GRANT ALL PRIVILEGES ON \`${faultsEnv.dbName}\`.* TO '${user}'@'localhost';`,
      null,
    );
  }

  /** Runs SQL as root over the socket (in the app database unless `database` is null); returns the rows' fields. */
  sql(statements: string, database: string | null = faultsEnv.dbName): string[][] {
    const args = ['--no-defaults', `--socket=${mariadbSocket}`, '-uroot', '-N', '-B', '-e', statements];
    const output = execFileSync('mariadb', database ? [...args, database] : args, { encoding: 'utf8' });
    return output.split('\n').filter((line) => line.length > 0).map((line) => line.split('\t'));
  }
}

export class FaultRedis {
  private readonly service = new Service('redis', 'redis-server', [
    '--port', String(faultsEnv.redisPort),
    '--bind', '127.0.0.1',
    '--dir', join(faultsEnv.data, 'redis'),
    // Queued jobs must survive a restart (as scripts/lib.sh runs it).
    '--appendonly', 'yes',
    '--save', '',
  ]);

  ping(): boolean {
    return quietly('redis-cli', ['-h', '127.0.0.1', '-p', String(faultsEnv.redisPort), 'ping']);
  }

  async start(): Promise<void> {
    if (this.ping()) {
      quietly('redis-cli', ['-h', '127.0.0.1', '-p', String(faultsEnv.redisPort), 'shutdown']);
      await waitUntil('the leftover Redis to stop', async () => !(await portAnswers(faultsEnv.redisPort)));
    }
    mkdirSync(join(faultsEnv.data, 'redis'), { recursive: true });
    this.service.spawn();
    await waitUntil('Redis to answer', () => this.ping(), 20_000, 100);
  }

  /** SHUTDOWN: Redis writes its append-only file and exits, as a clean restart does. */
  async stop(): Promise<void> {
    if (!quietly('redis-cli', ['-h', '127.0.0.1', '-p', String(faultsEnv.redisPort), 'shutdown'])) this.service.signal('SIGTERM');
    await this.service.waitForExit();
  }

  flushAll(): void {
    execFileSync('redis-cli', ['-h', '127.0.0.1', '-p', String(faultsEnv.redisPort), 'flushall'], { stdio: 'ignore' });
  }
}

/** The S3 and mail fakes of the faults profile (they are not faulted here; they must simply be ours). */
export class FaultFakes {
  private s3: Service;
  private readonly mail = new Service('mail-fake', 'node', [join(ROOT, 'local-services/mail/server.js')]);

  /** `s3PutDelayMs`: the S3 fake stores each whole object that much later (a slow store; see local-services/s3/server.js). */
  constructor(options: { s3PutDelayMs?: number } = {}) {
    this.s3 = FaultFakes.s3Service(options.s3PutDelayMs ?? 0);
  }

  private static s3Service(putDelayMs: number): Service {
    const env = putDelayMs > 0 ? { ...process.env, S3_FAKE_PUT_DELAY_MS: String(putDelayMs) } : undefined;
    return new Service('s3-fake', 'node', [join(ROOT, 'local-services/s3/server.js')], env ? { env } : {});
  }

  /**
   * Restarts the S3 fake with another PUT delay (0: on time); its objects stay on disk. For a slow store in
   * one test only: call it while no job is storing anything.
   */
  async restartS3(putDelayMs: number): Promise<void> {
    await this.s3.stop();
    await waitUntil('the S3 fake to stop listening', async () => !(await portAnswers(faultsEnv.s3Port)), 20_000);
    this.s3 = FaultFakes.s3Service(putDelayMs);
    this.s3.spawn();
    await waitUntil(`the S3 fake to listen on ${faultsEnv.s3Port}`, () => portAnswers(faultsEnv.s3Port), 20_000);
  }

  async start(): Promise<void> {
    for (const [service, port] of [[this.s3, faultsEnv.s3Port], [this.mail, faultsEnv.mailWebPort]] as const) {
      if (await portAnswers(port)) throw new Error(`port ${port} is taken: is another fault run going on?`);
      service.spawn();
      await waitUntil(`${service.name} to listen on ${port}`, () => portAnswers(port), 20_000);
    }
    await waitUntil('the mail fake SMTP port', () => portAnswers(faultsEnv.mailSmtpPort), 20_000);
  }

  async stop(): Promise<void> {
    await Promise.all([this.s3.stop(), this.mail.stop()]);
  }
}

/** An API process (dist/main.js) or a queue-only worker (dist/worker.js), built by npm run test:faults. */
export class FaultApiProcess {
  private readonly service: Service;

  constructor(
    readonly entry: 'main' | 'worker',
    env: NodeJS.ProcessEnv = {},
  ) {
    this.service = new Service(`api-${entry}`, 'node', [join(API_DIR, 'dist', `${entry}.js`)], {
      cwd: API_DIR,
      // Every test signs up from 127.0.0.1; the sign-in limits are not what these tests are about.
      env: { ...process.env, AUTH_RATE_LIMIT: '10000', ...env },
    });
  }

  get pid(): number | undefined {
    return this.service.pid;
  }

  get running(): boolean {
    return this.service.running;
  }

  async start(): Promise<void> {
    const log = join(faultsEnv.logs, `api-${this.entry}.log`);
    const readyLinesBefore = this.readyLines(log);
    this.service.spawn();
    if (this.entry === 'worker') {
      // dist/worker.js serves no HTTP: it is ready when it logs that it works the queues.
      await waitUntil(
        'the worker to start',
        () => {
          if (!this.service.running) throw new Error(`the worker exited; see ${log}`);
          return this.readyLines(log) > readyLinesBefore;
        },
        60_000,
        200,
      );
    }
    if (this.entry === 'main') {
      await waitUntil(
        'the API to answer /api/health',
        async () => {
          if (!this.service.running) throw new Error(`the API exited; see ${join(faultsEnv.logs, 'api-main.log')}`);
          return (await fetchStatus('/api/health')) === 200;
        },
        60_000,
        200,
      );
    }
  }

  private readyLines(log: string): number {
    return existsSync(log) ? readFileSync(log, 'utf8').split('queue worker running').length - 1 : 0;
  }

  kill(signal: NodeJS.Signals): void {
    this.service.signal(signal);
  }

  async waitForExit(): Promise<void> {
    await this.service.waitForExit();
  }

  async stop(): Promise<void> {
    await this.service.stop();
  }
}

export function runMigrations(): void {
  execFileSync('node', ['dist/database/run-migrations.js'], { cwd: API_DIR, env: process.env, stdio: 'ignore' });
}

async function fetchStatus(path: string): Promise<number | undefined> {
  try {
    const response = await fetch(`${apiUrl}${path}`, { signal: AbortSignal.timeout(5_000) });
    await response.arrayBuffer();
    return response.status;
  } catch {
    return undefined;
  }
}

export interface HealthAnswer {
  status: number;
  body: { status?: string; statusCode?: number; message?: string; checks?: Record<string, string> };
  elapsedMs: number;
}

/** GET /api/health with a deadline well above the probes' own timeout, so a hang shows as a failure. */
export async function health(): Promise<HealthAnswer> {
  const started = Date.now();
  const response = await fetch(`${apiUrl}/api/health`, { signal: AbortSignal.timeout(15_000) });
  return { status: response.status, body: (await response.json()) as HealthAnswer['body'], elapsedMs: Date.now() - started };
}

/** A browser-like agent against the API process: keeps cookies and echoes the CSRF cookie in X-CSRF-Token. */
export async function browserAgentFor(baseUrl = apiUrl): Promise<Agent> {
  return echoingCsrf(request.agent(baseUrl));
}

/** Registers, follows the verification mail from the faults profile's own mail fake, signs in. */
export async function signUp(email: string, password = 'correct horse battery staple'): Promise<Agent> {
  const agent = await browserAgentFor();
  await agent.post('/api/auth/register').send({ email, password, displayName: 'Fault Tester' }).expect(202);
  const mail = await waitForMail(email, { subject: /Confirm your e-mail/ });
  await agent.post('/api/auth/verify-email').send({ token: tokenFrom(mail, '/verify-email') }).expect(200);
  await agent.post('/api/auth/login').send({ email, password }).expect(200);
  return agent;
}

/** Every service of the faults profile, fresh: empty database (migrated) and empty Redis. */
export class FaultStack {
  readonly mariadb = new FaultMariaDb();
  readonly redis = new FaultRedis();
  readonly fakes: FaultFakes;

  constructor(fakes: ConstructorParameters<typeof FaultFakes>[0] = {}) {
    this.fakes = new FaultFakes(fakes);
  }

  async start(): Promise<void> {
    mkdirSync(faultsEnv.logs, { recursive: true });
    mkdirSync(faultsEnv.run, { recursive: true });
    await Promise.all([this.mariadb.start(), this.redis.start(), this.fakes.start()]);
    this.mariadb.resetDatabase();
    this.redis.flushAll();
    runMigrations();
  }

  async stop(): Promise<void> {
    await Promise.allSettled([this.mariadb.stop(), this.redis.stop(), this.fakes.stop()]);
  }
}
