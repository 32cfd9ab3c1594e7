#!/usr/bin/env node
// npm run audit (and a step of npm test): asks the registry's advisory service about every installed
// package. Production dependencies (what the API, the studio bundle and the local fakes run) fail on a high
// or critical advisory; development tools fail on critical only and their high findings are printed, since
// they run only on developer and CI machines against inputs we write. When the advisory service does not
// answer (offline, DNS, a proxy that allows only GET), it says so and exits 0. Exceptions live in
// audit-allowlist.json, each with a reason and a review date after which it stops applying.
import { spawnSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

const ROOT = join(dirname(fileURLToPath(import.meta.url)), '..');
const FAILING = { production: ['high', 'critical'], development: ['critical'] };

/** Error codes that mean the advisory service could not be reached, as opposed to a broken install. */
const UNREACHABLE_CODES = new Set([
  'ENOTFOUND', 'EAI_AGAIN', 'ECONNREFUSED', 'ECONNRESET', 'ETIMEDOUT', 'ESOCKETTIMEDOUT', 'EHOSTUNREACH',
  'ENETUNREACH', 'ECONNABORTED', 'EPIPE', 'ERR_SOCKET_TIMEOUT', 'ENOTCONN', 'EPROTO', 'SELF_SIGNED_CERT_IN_CHAIN',
  'UNABLE_TO_GET_ISSUER_CERT_LOCALLY', 'UNABLE_TO_VERIFY_LEAF_SIGNATURE', 'CERT_HAS_EXPIRED',
]);

/**
 * Reads `npm audit --json` output: a report, an unanswered service (with why), or an error that must fail
 * (a missing lockfile, unreadable output).
 * @param {string} stdout
 * @returns {{ kind: 'report', advisories: Advisory[] } | { kind: 'unanswered', reason: string } | { kind: 'error', reason: string }}
 */
export function classifyAuditOutput(stdout) {
  let parsed;
  try {
    parsed = JSON.parse(stdout);
  } catch {
    return { kind: 'error', reason: `npm audit printed no JSON: ${stdout.slice(0, 200)}` };
  }
  if (parsed && typeof parsed === 'object' && parsed.auditReportVersion === 2 && parsed.vulnerabilities) {
    return { kind: 'report', advisories: advisoriesOf(parsed.vulnerabilities) };
  }
  if (typeof parsed?.statusCode === 'number') {
    return { kind: 'unanswered', reason: parsed.message || `the advisory endpoint answered HTTP ${parsed.statusCode}` };
  }
  const code = parsed?.error?.code;
  const summary = parsed?.error?.summary || parsed?.message || '';
  if (UNREACHABLE_CODES.has(code) || /request to \S+ failed/.test(summary)) {
    return { kind: 'unanswered', reason: `${code ?? 'network error'}: ${summary}`.trim() };
  }
  return { kind: 'error', reason: `${code ?? 'npm audit failed'}: ${summary || JSON.stringify(parsed).slice(0, 200)}` };
}

/**
 * @typedef {{ id: string, package: string, severity: string, title: string, url: string }} Advisory
 * Every advisory once (a report lists it under each package it reaches through), keyed by its GHSA id.
 */
function advisoriesOf(vulnerabilities) {
  const byId = new Map();
  for (const entry of Object.values(vulnerabilities)) {
    for (const via of entry.via ?? []) {
      if (typeof via !== 'object') continue;
      const id = (String(via.url ?? '').match(/GHSA-[\w-]+$/) ?? [String(via.source)])[0];
      byId.set(id, { id, package: via.name, severity: via.severity, title: via.title, url: via.url });
    }
  }
  return [...byId.values()];
}

/**
 * Splits advisories into failures and allowed ones. An exception applies to its advisory id and package
 * until its review date; after that it fails again, so it is looked at once more.
 */
export function judge(advisories, failingSeverities, allowlist, today) {
  const failures = [];
  const allowed = [];
  for (const advisory of advisories) {
    if (!failingSeverities.includes(advisory.severity)) continue;
    const exception = allowlist.find((entry) => entry.advisory === advisory.id && entry.package === advisory.package);
    if (exception && exception.reviewBy >= today) allowed.push({ advisory, exception });
    else failures.push({ advisory, expired: exception ? exception.reviewBy : null });
  }
  return { failures, allowed };
}

/** Reads the allowlist, naming the entry and field that is wrong. */
export function readAllowlist(text) {
  const parsed = JSON.parse(text);
  if (!Array.isArray(parsed.exceptions)) throw new Error('audit-allowlist.json: "exceptions" must be a list');
  parsed.exceptions.forEach((entry, index) => {
    for (const field of ['advisory', 'package', 'reason', 'reviewBy']) {
      if (typeof entry[field] !== 'string' || entry[field].trim() === '') {
        throw new Error(`audit-allowlist.json: exceptions[${index}].${field} is required`);
      }
    }
    if (!/^\d{4}-\d{2}-\d{2}$/.test(entry.reviewBy)) throw new Error(`audit-allowlist.json: exceptions[${index}].reviewBy must be YYYY-MM-DD`);
  });
  return parsed.exceptions;
}

function runAudit(omitDev) {
  const args = ['audit', '--json', ...(omitDev ? ['--omit=dev'] : [])];
  const result = spawnSync('npm', args, { cwd: ROOT, encoding: 'utf8', timeout: 120_000, maxBuffer: 64 * 1024 * 1024 });
  if (result.error) return { kind: 'unanswered', reason: `npm audit did not finish: ${result.error.message}` };
  return classifyAuditOutput(result.stdout);
}

function describe({ advisory }) {
  return `${advisory.severity} ${advisory.id} in ${advisory.package}: ${advisory.title} (${advisory.url})`;
}

function main() {
  const allowlist = readAllowlist(readFileSync(join(ROOT, 'audit-allowlist.json'), 'utf8'));
  const today = new Date().toISOString().slice(0, 10);
  const production = runAudit(true);
  if (production.kind === 'unanswered') {
    console.log(`[audit] the registry's advisory service did not answer (${production.reason}); dependencies NOT audited, continuing`);
    return 0;
  }
  if (production.kind === 'error') {
    console.error(`[audit] ${production.reason}`);
    return 1;
  }
  const everything = runAudit(false);
  if (everything.kind !== 'report') {
    console.error(`[audit] the second audit (with development dependencies) gave no report: ${everything.reason}`);
    return 1;
  }
  const productionIds = new Set(production.advisories.map((advisory) => advisory.id));
  const developmentOnly = everything.advisories.filter((advisory) => !productionIds.has(advisory.id));
  const prod = judge(production.advisories, FAILING.production, allowlist, today);
  const dev = judge(developmentOnly, FAILING.development, allowlist, today);
  for (const item of [...prod.allowed, ...dev.allowed]) console.log(`[audit] allowed until ${item.exception.reviewBy}: ${describe(item)} — ${item.exception.reason}`);
  for (const advisory of developmentOnly.filter((candidate) => candidate.severity === 'high')) {
    console.log(`[audit] development tool, not failing: ${describe({ advisory })}`);
  }
  const failures = [...prod.failures, ...dev.failures];
  for (const item of failures) {
    console.error(`[audit] FAIL ${describe(item)}${item.expired ? ` (allowlist entry expired ${item.expired})` : ''}`);
  }
  console.log(
    `[audit] ${production.advisories.length} advisories in production dependencies, ${developmentOnly.length} more in development ones; ${failures.length} failing`,
  );
  return failures.length > 0 ? 1 : 0;
}

if (import.meta.url === pathToFileURL(process.argv[1]).href) process.exitCode = main();
