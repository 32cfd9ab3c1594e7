// Fit-news fan-out: 10,000 followers of one assembly (inserted straight into the database), one confirmed
// check, through the product's whole path (transition → outbox row → relay in a queue-only worker → pooled
// SMTP), against a plain pooled nodemailer loop sending 10,000 mails of the same size to the same SMTP fake
// in the same run. Prints mails/s for both and their ratio (goal ≥ 0.9), mails lost and doubled (counted by
// recipient at the fake, which writes each accepted message down before it answers), and the API's and the
// worker's memory. Run with: bash bench/run.sh fanout   (BENCH_FOLLOWERS, default 10000).
import { spawn, spawnSync } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import { closeSync, existsSync, openSync, readFileSync, readSync, rmSync, statSync } from 'node:fs';
import { createRequire } from 'node:module';
import { createServer } from 'node:net';
import { root, rssBytes, session, startApi, watchRss } from '../lib/harness.mjs';

const require = createRequire(`${root}api/package.json`);
const nodemailer = require('nodemailer');

const FOLLOWERS = Number(process.env.BENCH_FOLLOWERS ?? 10_000);
const CONCURRENCY = Number(process.env.MAIL_CONCURRENCY ?? 5);
/** The baseline's connections: the same as the product's unless set (to compare against a relay given more). */
const PLAIN_CONNECTIONS = Number(process.env.BENCH_PLAIN_CONNECTIONS ?? CONCURRENCY);
const MB = 1_000_000;

function freePort() {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address();
      server.close(() => resolve(port));
    });
    server.on('error', reject);
  });
}

function sql(statements) {
  const result = spawnSync('mariadb', ['--no-defaults', `--socket=${process.env.FW_RUN}/mysqld.sock`, '-uroot', '-N', '-B', process.env.DB_NAME], {
    input: statements,
    encoding: 'utf8',
    maxBuffer: 64 * MB,
  });
  if (result.status !== 0) throw new Error(`mariadb: ${result.stderr}`);
  return result.stdout.trim();
}

const sleep = (ms) => new Promise((resolve) => setTimeout(resolve, ms));

/** The SMTP fake both arms send to: records each accepted message (JSON line) before answering 250. */
async function startSmtpFake(file) {
  const port = await freePort();
  rmSync(file, { force: true });
  const child = spawn(process.execPath, [`${root}api/test/faults/recording-smtp-fake.js`], {
    env: { ...process.env, RECORDING_SMTP_PORT: String(port), RECORDING_SMTP_FILE: file },
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  await sleep(500);
  return { port, pid: child.pid, stop: () => new Promise((resolve) => (child.once('exit', resolve), child.kill('SIGTERM'))) };
}

function recorded(file) {
  if (!existsSync(file)) return [];
  return readFileSync(file, 'utf8').split('\n').filter(Boolean).map((line) => JSON.parse(line));
}

/** MariaDB's own counters (statements, log syncs), to tell what the product arm cost the database per mail. */
function dbCounters() {
  const rows = sql("SHOW GLOBAL STATUS WHERE Variable_name IN ('Com_update','Com_select','Com_commit','Innodb_data_fsyncs','Questions')");
  return Object.fromEntries(rows.split('\n').map((line) => line.split('\t')).map(([name, value]) => [name, Number(value)]));
}

/** How evenly the mails arrived: gaps between consecutive acceptances of `subject` at the fake (claims or commits stalling show as long gaps). */
function arrivalGaps(records, subject) {
  const times = records.filter((record) => record.subject === subject).map((record) => record.at).sort((a, b) => a - b);
  const gaps = times.slice(1).map((time, index) => time - times[index]).sort((a, b) => a - b);
  const at = (share) => gaps[Math.min(gaps.length - 1, Math.floor(share * gaps.length))] ?? 0;
  return { p50: at(0.5), p99: at(0.99), max: gaps.at(-1) ?? 0, over100: gaps.filter((gap) => gap > 100).length, idleMs: gaps.filter((gap) => gap > 100).reduce((sum, gap) => sum + gap, 0) };
}

function tally(records, subject, recipients) {
  const copies = new Map();
  let last = 0;
  for (const record of records) {
    if (record.subject !== subject) continue;
    last = Math.max(last, record.at);
    for (const to of record.to) copies.set(to, (copies.get(to) ?? 0) + 1);
  }
  return {
    delivered: recipients.filter((to) => copies.has(to)).length,
    lost: recipients.filter((to) => !copies.has(to)).length,
    doubled: recipients.filter((to) => (copies.get(to) ?? 0) > 1).length,
    last,
  };
}

/**
 * Counts the fake's records with `subject` as they arrive, reading only the bytes added since the last look:
 * re-reading and parsing the whole file (20,000 lines by the end) several times a second cost a core's worth
 * of CPU on this 2-core box during the product arm only, and so slowed the arm it was measuring.
 */
function arrivalCounter(file, subject) {
  let offset = 0;
  let partial = '';
  const seen = new Set();
  const needle = JSON.stringify(subject);
  return () => {
    if (!existsSync(file)) return 0;
    const size = statSync(file).size;
    if (size > offset) {
      const buffer = Buffer.alloc(size - offset);
      const fd = openSync(file, 'r');
      try {
        readSync(fd, buffer, 0, buffer.length, offset);
      } finally {
        closeSync(fd);
      }
      offset = size;
      const lines = (partial + buffer.toString('utf8')).split('\n');
      partial = lines.pop() ?? '';
      for (const line of lines) if (line.includes(needle)) for (const to of JSON.parse(line).to) seen.add(to);
    }
    return seen.size;
  };
}

async function waitFor(what, check, timeoutMs) {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (await check()) return;
    await sleep(250);
  }
  throw new Error(`${what} did not happen within ${timeoutMs} ms`);
}

function startWorker(env) {
  const child = spawn(process.execPath, ['dist/worker.js'], { cwd: `${root}api`, env: { ...process.env, ...env }, stdio: ['ignore', 'pipe', 'inherit'] });
  const ready = new Promise((resolve, reject) => {
    child.stdout.on('data', (chunk) => String(chunk).includes('queue worker running') && resolve());
    child.once('exit', (code) => reject(new Error(`the worker exited with code ${code}`)));
  });
  child.stdout.resume();
  return { pid: child.pid, ready, stop: () => new Promise((resolve) => (child.once('exit', resolve), child.kill('SIGTERM'))) };
}

/** An owner with a workshop, a published guide on one assembly and an open check with evidence; followers inserted directly. */
async function scenario(baseUrl, recipients) {
  const api = session(baseUrl);
  const run = `${Date.now().toString(36)}${Math.floor(Math.random() * 1e4)}`;
  const email = `bench-fanout-${run}@fitwright.bench`;
  const password = 'benchmark password 2026';
  await api.get('/auth/me');
  await api.post('/auth/register', { email, password, displayName: 'Bench fan-out' });
  sql(`UPDATE users SET email_verified_at = NOW(3) WHERE email = '${email}'`);
  await api.post('/auth/login', { email, password });
  const workshop = await api.post('/workshops', { name: `Bench fan-out ${run}`, slug: `bench-fanout-${run}` });
  const base = `/workshops/${workshop.id}`;
  const build = await api.post(`${base}/builds`, { title: 'Fan-out build' });
  const part = await api.post(`${base}/parts`, {
    partNumber: `FO-${run}`,
    title: 'Fan-out coupler',
    category: 'coupler',
    features: [{ name: 'bore', kind: 'diameter', role: 'hole', nominal: '15', unit: 'mm' }],
  });
  const assembly = await api.post(`${base}/builds/${build.id}/assemblies`, { name: 'Fan-out stack' });
  await api.put(`${base}/assemblies/${assembly.id}/parts/${part.id}`, { position: 'input side' });
  const check = await api.post(`${base}/assemblies/${assembly.id}/checks`, { title: `Coupler seats ${run}` });
  const reading = await api.post(`${base}/measurements`, {
    featureId: part.features[0].id,
    quantity: 'diameter',
    value: '15.006',
    unit: 'mm',
    instrumentKind: 'bore_gauge',
    resolution: '0.001',
  });
  await api.post(`${base}/checks/${check.id}/evidence`, { kind: 'measurement', measurementId: reading.id });
  const guide = await api.post(`${base}/builds/${build.id}/guides`, { title: 'Fan-out guide', assemblyId: assembly.id });
  await api.post(`${base}/guides/${guide.id}/steps`, { title: 'Fit it' });
  await api.post(`${base}/guides/${guide.id}/revisions`, {});
  const statements = [];
  for (let start = 0; start < recipients.length; start += 1000) {
    const users = recipients.slice(start, start + 1000).map((to) => ({ id: randomUUID(), to }));
    statements.push(
      `INSERT INTO users (id, email, password_hash, display_name, email_verified_at) VALUES ${users.map((user) => `('${user.id}', '${user.to}', 'x', 'Follower', NOW(3))`).join(',')};`,
      `INSERT INTO follows (id, user_id, workshop_id, target_kind, target_id) VALUES ${users
        .map((user) => `('${randomUUID()}', '${user.id}', '${workshop.id}', 'assembly', '${assembly.id}')`)
        .join(',')};`,
    );
  }
  sql(statements.join('\n'));
  return { confirm: () => api.post(`${base}/checks/${check.id}/transitions`, { to: 'confirmed', reason: 'Seated fully', from: 'open' }), subject: `Fit confirmed: Coupler seats ${run}` };
}

/** The baseline: the same number of mails, each to its own address, through one pooled transport with the same concurrency. */
async function plainLoop(port, recipients, subject, sample) {
  const transport = nodemailer.createTransport({ pool: true, maxConnections: PLAIN_CONNECTIONS, maxMessages: 500, host: '127.0.0.1', port, ignoreTLS: true });
  const queue = [...recipients];
  const started = Date.now();
  await Promise.all(
    Array.from({ length: PLAIN_CONNECTIONS }, async () => {
      for (let to = queue.shift(); to; to = queue.shift()) {
        await transport.sendMail({ from: process.env.MAIL_FROM, to, subject, text: sample.text, html: sample.html, headers: sample.headers });
      }
    }),
  );
  transport.close();
  return started;
}

async function main() {
  const file = `${process.env.BENCH_DATA}/fanout-recorded.jsonl`;
  const smtp = await startSmtpFake(file);
  const mailEnv = { SMTP_PORT: String(smtp.port), SMTP_IGNORE_TLS: 'true', MAIL_CONCURRENCY: String(CONCURRENCY), MAIL_RATE_PER_MINUTE: '1000000' };
  process.env.AUTH_RATE_LIMIT = '100000';
  // The API serves the transition and does not relay; the queue-only worker relays, as in production.
  const api = await startApi({ ...mailEnv, MAIL_RELAY: 'false' });
  const worker = startWorker({ ...mailEnv, MAIL_RELAY: 'true' });
  try {
    await worker.ready;
    const run = Date.now().toString(36);
    const followers = Array.from({ length: FOLLOWERS }, (_, index) => `fan-${index}-${run}@fitwright.bench`);
    const news = await scenario(api.baseUrl, followers);

    // A mail of the same size as the product's (text, HTML, List-Unsubscribe headers) for the baseline.
    const sample = {
      text: 'x'.repeat(700),
      html: `<p>${'x'.repeat(700)}</p>`,
      headers: { 'List-Unsubscribe': '<http://localhost/api/follows/unsubscribe?token=abc>', 'List-Unsubscribe-Post': 'List-Unsubscribe=One-Click' },
    };
    const plainSubject = `Plain loop ${run}`;
    const plainRecipients = followers.map((to) => `plain-${to}`);
    const plainStarted = await plainLoop(smtp.port, plainRecipients, plainSubject, sample);
    const plain = tally(recorded(file), plainSubject, plainRecipients);
    const plainRate = plain.delivered / ((plain.last - plainStarted) / 1000);

    const apiRssBefore = rssBytes(api.pid);
    const stopApiWatch = watchRss(api.pid);
    const stopWorkerWatch = watchRss(worker.pid);
    const countersBefore = dbCounters();
    const started = Date.now();
    await news.confirm();
    const arrivals = arrivalCounter(file, news.subject);
    await waitFor('every follower to be mailed', () => arrivals() >= FOLLOWERS, 600_000);
    await sleep(2000); // a doubled mail would arrive a moment later
    const countersAfter = dbCounters();
    const apiPeak = stopApiWatch();
    const workerPeak = stopWorkerWatch();
    const product = tally(recorded(file), news.subject, followers);
    const productRate = product.delivered / ((product.last - started) / 1000);
    const [pending, failed] = sql("SELECT SUM(state='pending'), SUM(state='failed') FROM mail_deliveries WHERE kind='fit-news'").split('\t');

    console.log(`fit-news fan-out to ${FOLLOWERS} followers, SMTP connections: relay ${CONCURRENCY}, plain loop ${PLAIN_CONNECTIONS}; same SMTP fake:`);
    console.log(`  plain pooled nodemailer loop   ${plainRate.toFixed(0)} mails/s (${plain.delivered} sent, ${plain.lost} lost, ${plain.doubled} doubled)`);
    console.log(`  transition → outbox → relay    ${productRate.toFixed(0)} mails/s (${product.delivered} sent, ${product.lost} lost, ${product.doubled} doubled)`);
    console.log(`  ratio product/plain            ${(productRate / plainRate).toFixed(2)} (goal ≥ 0.9)`);
    console.log(`  outbox afterwards              pending ${pending === 'NULL' ? 0 : pending}, failed ${failed === 'NULL' ? 0 : failed}`);
    const per = (name) => ((countersAfter[name] - countersBefore[name]) / FOLLOWERS).toFixed(2);
    console.log(`  MariaDB per mail               ${per('Questions')} statements (${per('Com_update')} UPDATE, ${per('Com_select')} SELECT, ${per('Com_commit')} COMMIT), ${per('Innodb_data_fsyncs')} log fsyncs`);
    const gaps = arrivalGaps(recorded(file), news.subject);
    const plainGaps = arrivalGaps(recorded(file), plainSubject);
    console.log(`  gaps between arrivals, ms      product p50 ${gaps.p50} p99 ${gaps.p99} max ${gaps.max}, ${gaps.over100} over 100 ms (${gaps.idleMs} ms); plain p50 ${plainGaps.p50} p99 ${plainGaps.p99} max ${plainGaps.max}`);
    console.log(`  API RSS                        ${(apiRssBefore / MB).toFixed(0)} MB before, ${(apiPeak / MB).toFixed(0)} MB peak during the fan-out`);
    console.log(`  worker RSS                     ${(workerPeak / MB).toFixed(0)} MB peak`);
  } finally {
    await worker.stop();
    await api.stop();
    await smtp.stop();
  }
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
