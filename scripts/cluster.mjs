// Several API processes and a queue-only worker on one machine, behind a round-robin proxy, as a deployment with a
// load balancer runs them: `npm run start:cluster` (scripts/start-cluster.sh sets up the services first), or
// `node scripts/cluster.mjs` with the settings of scripts/env.sh already in the environment (the e2e test does).
//
//   PORT                the proxy's port (the one the browser uses; default 3000)
//   CLUSTER_API_PORTS   the API processes' ports, comma separated (default PORT+1,PORT+2)
//   CLUSTER_WORKERS     queue-only workers (default 1)
//
// Every process gets the same database, Redis, storage, CSRF_SECRET and APP_ORIGIN (the proxy's address), which is
// all they share. The API processes do not relay mail (MAIL_RELAY=false); the workers do. The API processes believe
// X-Forwarded-For from loopback only (the proxy), so rate limits count the real client. Prints "cluster ready" once
// every process answers; SIGINT/SIGTERM stops them all; if one of them ends, the others are stopped too.
import { spawn } from 'node:child_process';
import { createServer, request as forward } from 'node:http';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('../', import.meta.url));
const exitWithParent = `${root}local-services/exit-with-parent.js`;
const proxyPort = Number(process.env.PORT ?? 3000);
const host = process.env.HOST ?? '127.0.0.1';
const apiPorts = (process.env.CLUSTER_API_PORTS ?? `${proxyPort + 1},${proxyPort + 2}`).split(',').map((port) => Number(port.trim()));
const workers = Number(process.env.CLUSTER_WORKERS ?? 1);
const appOrigin = process.env.APP_ORIGIN ?? `http://localhost:${proxyPort}`;
if (apiPorts.some((port) => !Number.isInteger(port) || port <= 0 || port === proxyPort)) {
  throw new Error(`CLUSTER_API_PORTS must be ports other than the proxy's ${proxyPort}: ${process.env.CLUSTER_API_PORTS}`);
}

const children = [];
let stopping = false;

/** Starts one process with its output prefixed by its name; the IPC channel ends it with us (exit-with-parent.js). */
function start(name, entry, env, readyLine) {
  const child = spawn(process.execPath, ['--require', exitWithParent, entry], {
    cwd: `${root}api`,
    env: { ...process.env, APP_ORIGIN: appOrigin, ...env },
    stdio: ['ignore', 'pipe', 'pipe', 'ipc'],
  });
  child.channel?.unref();
  let ready;
  const readySeen = new Promise((resolve) => (ready = resolve));
  for (const stream of [child.stdout, child.stderr]) {
    let partial = '';
    stream.on('data', (chunk) => {
      const lines = (partial + chunk.toString()).split('\n');
      partial = lines.pop() ?? '';
      for (const line of lines) {
        process.stdout.write(`[${name}] ${line}\n`);
        if (readyLine && line.includes(readyLine)) ready();
      }
    });
  }
  child.once('exit', (code, signal) => {
    if (stopping) return;
    console.error(`[cluster] ${name} (pid ${child.pid}) ended (${signal ?? `code ${code}`}); stopping the others`);
    void stopAll(1);
  });
  children.push({ name, child });
  return { child, readySeen };
}

async function healthy(port, timeoutMs = 90_000) {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline && !stopping) {
    try {
      if ((await fetch(`http://127.0.0.1:${port}/api/health`, { signal: AbortSignal.timeout(5_000) })).ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
  throw new Error(`the API on port ${port} did not answer /api/health within ${timeoutMs / 1000} s`);
}

async function stopAll(code) {
  if (stopping) return;
  stopping = true;
  proxy.close();
  await Promise.all(
    children.map(
      ({ child }) =>
        new Promise((resolve) => {
          if (child.exitCode !== null || child.signalCode !== null) return resolve();
          const timer = setTimeout(() => child.kill('SIGKILL'), 15_000);
          child.once('exit', () => {
            clearTimeout(timer);
            resolve();
          });
          child.kill('SIGTERM');
        }),
    ),
  );
  process.exit(code);
}

/**
 * Round robin over the API processes, a request at a time (no stickiness: nothing needs it). Appends the client's
 * address to X-Forwarded-For as a load balancer does. A process that refuses the connection is skipped for that
 * request when nothing of the body has been sent yet (GET and HEAD); otherwise the client gets a 502.
 */
let next = 0;
const proxy = createServer((incoming, outgoing) => {
  const forwardedFor = [incoming.headers['x-forwarded-for'], incoming.socket.remoteAddress].filter(Boolean).join(', ');
  const headers = { ...incoming.headers, 'x-forwarded-for': forwardedFor, 'x-forwarded-proto': 'http' };
  const retryable = incoming.method === 'GET' || incoming.method === 'HEAD';
  const attempt = (triesLeft) => {
    const port = apiPorts[next++ % apiPorts.length];
    const upstream = forward({ host: '127.0.0.1', port, method: incoming.method, path: incoming.url, headers }, (answer) => {
      outgoing.writeHead(answer.statusCode ?? 502, answer.rawHeaders);
      answer.pipe(outgoing);
    });
    upstream.on('error', (error) => {
      if (retryable && triesLeft > 1 && error.code === 'ECONNREFUSED') return attempt(triesLeft - 1);
      if (!outgoing.headersSent) {
        outgoing.writeHead(502, { 'content-type': 'application/json; charset=utf-8' });
        outgoing.end(JSON.stringify({ statusCode: 502, message: `No API process answered (${error.code ?? error.message})` }));
      } else outgoing.destroy(error);
    });
    if (retryable) upstream.end();
    else incoming.pipe(upstream);
  };
  attempt(apiPorts.length);
});
proxy.keepAliveTimeout = 65_000;

process.on('SIGINT', () => void stopAll(0));
process.on('SIGTERM', () => void stopAll(0));
// Started by a test (or any parent with an IPC channel): end with it.
if (process.channel) {
  process.on('disconnect', () => void stopAll(0));
  process.channel.unref();
}

async function main() {
  const apis = apiPorts.map((port, index) =>
    start(`api-${String.fromCharCode(97 + index)}`, 'dist/main.js', {
      PORT: String(port),
      MAIL_RELAY: 'false',
      TRUST_PROXY: process.env.CLUSTER_TRUST_PROXY ?? 'loopback',
    }),
  );
  const started = Array.from({ length: workers }, (_, index) => start(`worker-${index + 1}`, 'dist/worker.js', { MAIL_RELAY: 'true' }, 'queue worker running'));
  await Promise.all(apiPorts.map((port) => healthy(port)));
  await Promise.all(started.map(({ readySeen }) => readySeen));
  await new Promise((resolve, reject) => {
    proxy.once('error', reject);
    proxy.listen(proxyPort, host, resolve);
  });
  const pids = [...apis, ...started].map(({ child }, index) => `${children[index].name} ${child.pid}`).join(', ');
  console.log(`[cluster] cluster ready: proxy http://localhost:${proxyPort} → API ports ${apiPorts.join(', ')}; ${pids}`);
}

main().catch((error) => {
  console.error(`[cluster] ${error instanceof Error ? error.message : error}`);
  void stopAll(1);
});
