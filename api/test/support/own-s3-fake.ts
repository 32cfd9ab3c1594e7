import { type ChildProcess, spawn } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { portAnswers } from './ports';

const S3_FAKE_SCRIPT = resolve(__dirname, '../../../local-services/s3/server.js');

/** A port nobody listens on right now (the kernel picks it). */
export function freePort(): Promise<number> {
  return new Promise((done, fail) => {
    const server = createServer();
    server.once('error', fail);
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      server.close(() => done(port));
    });
  });
}


async function waitFor(what: string, check: () => Promise<boolean>, timeoutMs = 15_000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (await check()) return;
    await new Promise((wake) => setTimeout(wake, 50));
  }
  throw new Error(`${what} within ${timeoutMs} ms`);
}

/**
 * An S3 fake this test owns (local-services/s3/server.js on its own port and folder), so a test can
 * stop storage without touching the fake every other test shares. Stopping and starting keeps the
 * folder, as a restarted fake (or S3 coming back) still holds the parts already sent.
 */
export class OwnS3Fake {
  private child: ChildProcess | undefined;
  private readonly directory = mkdtempSync(join(tmpdir(), 'fitwright-own-s3-'));
  output = '';

  private constructor(readonly port: number) {}

  static async start(): Promise<OwnS3Fake> {
    const fake = new OwnS3Fake(await freePort());
    await fake.start();
    return fake;
  }

  get endpoint(): string {
    return `http://127.0.0.1:${this.port}`;
  }

  /** What the app needs to use this fake instead of the shared one. */
  get appEnv(): Record<string, string> {
    return { S3_ENDPOINT: this.endpoint, S3_PUBLIC_ENDPOINT: this.endpoint };
  }

  async start(): Promise<void> {
    if (this.child) throw new Error('this S3 fake is already running');
    const child = spawn(process.execPath, [S3_FAKE_SCRIPT], {
      env: { ...process.env, S3_FAKE_PORT: String(this.port), S3_FAKE_DIR: this.directory },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    child.stdout?.on('data', (chunk: Buffer) => (this.output += chunk.toString()));
    child.stderr?.on('data', (chunk: Buffer) => (this.output += chunk.toString()));
    this.child = child;
    await waitFor('the S3 fake did not start', async () => child.exitCode === null && (await portAnswers(this.port)));
  }

  /** Stops the fake this test started (SIGKILL: storage gone without notice) and waits until the port is closed. */
  async stop(signal: NodeJS.Signals = 'SIGKILL'): Promise<void> {
    const child = this.child;
    if (!child) return;
    this.child = undefined;
    if (child.exitCode === null && child.signalCode === null) {
      const exited = new Promise<void>((done) => child.once('exit', () => done()));
      child.kill(signal);
      await exited;
    }
    await waitFor('the S3 fake port stayed open', async () => !(await portAnswers(this.port)));
  }

  async remove(): Promise<void> {
    await this.stop('SIGTERM');
    rmSync(this.directory, { recursive: true, force: true });
  }
}
