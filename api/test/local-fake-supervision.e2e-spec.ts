import { type ChildProcess, spawn } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { freePort } from './support/own-s3-fake';
import { portAnswers } from './support/ports';

jest.setTimeout(60_000);

const LOCAL_SERVICES = resolve(__dirname, '../../local-services');


async function waitFor(what: string, check: () => boolean | Promise<boolean>, timeoutMs = 15_000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (await check()) return;
    await new Promise((wake) => setTimeout(wake, 50));
  }
  throw new Error(`${what} did not happen within ${timeoutMs} ms`);
}

/** Gone, or a zombie nobody reaps (PID 1 here does not): either way no longer running. */
function running(pid: number): boolean {
  try {
    const state = readFileSync(`/proc/${pid}/stat`, 'utf8').replace(/^.*\) /su, '')[0];
    return state !== 'Z' && state !== 'X';
  } catch {
    return false;
  }
}

/**
 * local-services/supervise.js, which scripts/lib.sh starts every local fake under: run here on the
 * S3 fake with its own port and folder, never the fake other tests share.
 */
describe('the local fakes supervisor (real S3 fake, own port)', () => {
  let directory: string;
  let port: number;
  let supervisor: ChildProcess;
  let log = '';

  const fakePids = () => [...log.matchAll(/started pid (\d+)/gu)].map((match) => Number(match[1]));

  beforeEach(async () => {
    directory = mkdtempSync(join(tmpdir(), 'fitwright-supervised-s3-'));
    port = await freePort();
    log = '';
    supervisor = spawn(process.execPath, [join(LOCAL_SERVICES, 'supervise.js'), 's3-fake', join(LOCAL_SERVICES, 's3/server.js')], {
      env: { ...process.env, S3_FAKE_PORT: String(port), S3_FAKE_DIR: directory, SUPERVISE_FIRST_DELAY_MS: '200' },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    supervisor.stdout?.on('data', (chunk: Buffer) => (log += chunk.toString()));
    supervisor.stderr?.on('data', (chunk: Buffer) => (log += chunk.toString()));
    await waitFor('the supervised fake to answer', () => portAnswers(port));
  });
  afterEach(async () => {
    if (running(supervisor.pid ?? 0)) {
      const exited = new Promise((done) => supervisor.once('exit', done));
      supervisor.kill('SIGTERM');
      await exited;
    }
    rmSync(directory, { recursive: true, force: true });
  });

  it('starts a fake that died again, with a growing pause, and logs each exit and restart', async () => {
    for (const expectedDelay of [200, 400]) {
      const [dying] = fakePids().slice(-1);
      process.kill(dying, 'SIGKILL');
      await waitFor('a new fake process', () => fakePids().length > 0 && fakePids().slice(-1)[0] !== dying);
      await waitFor('the restarted fake to answer', () => portAnswers(port));
      expect(log).toContain(`exited (signal SIGKILL); restarting in ${expectedDelay} ms`);
    }
    expect(fakePids()).toHaveLength(3);
  });

  it('SIGTERM to the supervisor stops its fake and then itself: nothing left running, the port closed', async () => {
    const exited = new Promise<number | null>((done) => supervisor.once('exit', (code) => done(code)));
    supervisor.kill('SIGTERM');
    expect(await exited).toBe(0);
    for (const pid of fakePids()) expect(running(pid)).toBe(false);
    expect(await portAnswers(port)).toBe(false);
    expect(log).toMatch(/\[supervise s3-fake\] stopped/u);
  });

  it('a supervisor killed outright (SIGKILL) takes its fake with it: no orphan keeps the port', async () => {
    const [fake] = fakePids();
    const exited = new Promise((done) => supervisor.once('exit', done));
    supervisor.kill('SIGKILL');
    await exited;
    await waitFor('the orphaned fake to end', () => !running(fake));
    await waitFor('the port to close', async () => !(await portAnswers(port)));
  });
});
