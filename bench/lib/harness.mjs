// Shared by the benchmarks: an API process of our own (to watch its memory), a signed-in editor with a
// workshop and a build, and small statistics. Reads the settings scripts/env.sh exported (see bench/run.sh).
import { spawn } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { createServer } from 'node:net';
import { loadavg } from 'node:os';
import { fileURLToPath } from 'node:url';

export const root = fileURLToPath(new URL('../../', import.meta.url));

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

/**
 * How long an API process may take to become healthy: BENCH_API_START_SECONDS, else 60 s, stretched by the load
 * (10 s per unit of the 1-minute load average, up to 10 minutes): on this shared 2-core box at load 12–15 a
 * cold start (compiling, connecting, the first health answers) took longer than 60 s.
 */
export function apiStartSeconds(load = loadavg()[0]) {
  const fixed = Number(process.env.BENCH_API_START_SECONDS);
  if (Number.isFinite(fixed) && fixed > 0) return fixed;
  return Math.min(600, Math.max(60, Math.ceil(load * 10)));
}

/** Starts `node api/dist/main.js` on a spare port (`env` adds settings of its own); resolves when /api/health answers. */
export async function startApi(env = {}) {
  const port = await freePort();
  const child = spawn(process.execPath, ['dist/main.js'], {
    cwd: `${root}api`,
    env: { ...process.env, PORT: String(port), APP_ORIGIN: `http://localhost:${port}`, STUDIO_DIST: '', ...env },
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  const baseUrl = `http://127.0.0.1:${port}`;
  const seconds = apiStartSeconds();
  const started = Date.now();
  const deadline = started + seconds * 1000;
  // The last answer, so a start that never turns healthy says why (a service down, or no answer at all).
  let last = 'no answer yet';
  for (;;) {
    if (child.exitCode !== null) throw new Error(`the API exited with code ${child.exitCode}`);
    try {
      // Each probe gets its own time limit: under load one slow answer must not use up the whole wait.
      const response = await fetch(`${baseUrl}/api/health`, { signal: AbortSignal.timeout(10_000) });
      if (response.ok) break;
      last = `${response.status} ${(await response.text()).slice(0, 300)}`;
    } catch (error) {
      last = error instanceof Error ? error.message : String(error);
    }
    if (Date.now() > deadline) {
      child.kill('SIGTERM');
      throw new Error(`the API did not become healthy within ${seconds} s (load ${loadavg()[0].toFixed(1)}); last answer: ${last}`);
    }
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
  const startSeconds = (Date.now() - started) / 1000;
  if (startSeconds > 30) console.log(`  (the API took ${startSeconds.toFixed(0)} s to become healthy, load ${loadavg()[0].toFixed(1)})`);
  return {
    baseUrl,
    pid: child.pid,
    stop: () =>
      new Promise((resolve) => {
        child.once('exit', resolve);
        child.kill('SIGTERM');
      }),
  };
}

/** Resident set size of a process in bytes (Linux /proc). */
export function rssBytes(pid) {
  const match = /VmRSS:\s+(\d+) kB/u.exec(readFileSync(`/proc/${pid}/status`, 'utf8'));
  return match ? Number(match[1]) * 1024 : 0;
}

/** Samples a process's RSS every `everyMs` until stopped; returns the peak. */
export function watchRss(pid, everyMs = 50) {
  let peak = rssBytes(pid);
  const timer = setInterval(() => {
    peak = Math.max(peak, rssBytes(pid));
  }, everyMs);
  return () => {
    clearInterval(timer);
    return Math.max(peak, rssBytes(pid));
  };
}

/** A cookie jar and CSRF header for fetch, as the studio's browser would have. */
export function session(baseUrl) {
  const cookies = new Map();
  // Its own client address, so the sign-in rate limit of other local runs never trips it (believed only when TRUST_PROXY trusts loopback).
  const clientIp = `10.${Math.floor(Math.random() * 256)}.${Math.floor(Math.random() * 256)}.${Math.floor(Math.random() * 256)}`;
  const remember = (response) => {
    for (const line of response.headers.getSetCookie()) {
      const [pair] = line.split(';');
      const [key, ...value] = pair.split('=');
      cookies.set(key.trim(), value.join('='));
    }
  };
  const request = async (method, path, body) => {
    const headers = { 'X-Forwarded-For': clientIp, Accept: 'application/json', Cookie: [...cookies].map(([key, value]) => `${key}=${value}`).join('; ') };
    if (cookies.has('fw_csrf')) headers['X-CSRF-Token'] = decodeURIComponent(cookies.get('fw_csrf'));
    if (body !== undefined) headers['Content-Type'] = 'application/json';
    const response = await fetch(`${baseUrl}/api${path}`, { method, headers, body: body === undefined ? undefined : JSON.stringify(body) });
    remember(response);
    const text = await response.text();
    if (!response.ok) throw new Error(`${method} ${path}: ${response.status} ${text}`);
    return text ? JSON.parse(text) : null;
  };
  // The headers a browser of this session sends on a read (for autocannon, which keeps no cookies itself).
  const readHeaders = () => ({ 'x-forwarded-for': clientIp, cookie: [...cookies].map(([key, value]) => `${key}=${value}`).join('; ') });
  return { request, readHeaders, get: (path) => request('GET', path), post: (path, body) => request('POST', path, body), put: (path, body) => request('PUT', path, body), delete: (path) => request('DELETE', path) };
}

async function waitForMail(to, subject) {
  const inbox = process.env.MAIL_INBOX_URL;
  const deadline = Date.now() + 30_000;
  while (Date.now() < deadline) {
    const messages = await (await fetch(`${inbox}/email`)).json();
    const found = messages.filter((message) => message.to.some((r) => r.address.toLowerCase() === to) && subject.test(message.subject));
    if (found.length) return found[found.length - 1];
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
  throw new Error(`no mail to ${to} arrived`);
}

/** Signs up a throwaway editor (confirmed through the mail fake), with a workshop and a build. */
export async function editorWithBuild(baseUrl, label) {
  const api = session(baseUrl);
  const run = `${Date.now().toString(36)}${Math.floor(Math.random() * 1e4)}`;
  const email = `bench-${label}-${run}@fitwright.bench`;
  const password = 'benchmark password 2026';
  await api.get('/auth/me');
  await api.post('/auth/register', { email, password, displayName: `Bench ${label}` });
  const mail = await waitForMail(email, /Confirm your e-mail/);
  const token = new URL(mail.text.match(/https?:\/\/\S+verify-email\S*/u)[0]).searchParams.get('token');
  await api.post('/auth/verify-email', { token });
  await api.post('/auth/login', { email, password });
  const workshop = await api.post('/workshops', { name: `Bench ${label} ${run}`, slug: `bench-${label}-${run}` });
  const build = await api.post(`/workshops/${workshop.id}/builds`, { title: `Bench ${label}` });
  return { api, workshopId: workshop.id, buildId: build.id };
}

export function median(values) {
  const sorted = [...values].sort((a, b) => a - b);
  const middle = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? sorted[middle] : (sorted[middle - 1] + sorted[middle]) / 2;
}

export const MB = 1_000_000;
export const MiB = 1024 * 1024;
