// node --test scripts/audit.test.mjs — how scripts/audit.mjs reads npm audit's answers. The inputs are the
// shapes npm 11 prints with --json: the 405 answer is the one this machine's registry proxy gave
// (2026-12-04), the others follow npm's report format (auditReportVersion 2) and its network error output.
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { classifyAuditOutput, judge, readAllowlist } from './audit.mjs';

const report = JSON.stringify({
  auditReportVersion: 2,
  vulnerabilities: {
    'deep-lib': {
      name: 'deep-lib',
      severity: 'high',
      via: [{ source: 1001, name: 'deep-lib', title: 'Prototype pollution', url: 'https://github.com/advisories/GHSA-aaaa-bbbb-cccc', severity: 'high' }],
    },
    // Reaches the same advisory through deep-lib: counted once.
    'wrapper-lib': { name: 'wrapper-lib', severity: 'high', via: ['deep-lib'] },
    'small-lib': {
      name: 'small-lib',
      severity: 'moderate',
      via: [{ source: 1002, name: 'small-lib', title: 'ReDoS', url: 'https://github.com/advisories/GHSA-dddd-eeee-ffff', severity: 'moderate' }],
    },
  },
  metadata: {},
});

test('a report yields each advisory once, with its GHSA id, package and severity', () => {
  const result = classifyAuditOutput(report);
  assert.equal(result.kind, 'report');
  assert.deepEqual(
    result.advisories.map((advisory) => [advisory.id, advisory.package, advisory.severity]),
    [
      ['GHSA-aaaa-bbbb-cccc', 'deep-lib', 'high'],
      ['GHSA-dddd-eeee-ffff', 'small-lib', 'moderate'],
    ],
  );
});

test('an HTTP answer other than a report (this machine: 405 from a GET-only proxy) means unanswered', () => {
  const output = JSON.stringify({
    message: '405 Method Not Allowed - POST https://registry.npmjs.org/-/npm/v1/security/advisories/bulk',
    statusCode: 405,
    error: { summary: '', detail: '' },
  });
  assert.deepEqual(classifyAuditOutput(output), { kind: 'unanswered', reason: '405 Method Not Allowed - POST https://registry.npmjs.org/-/npm/v1/security/advisories/bulk' });
});

test('a network failure means unanswered; a missing lockfile or garbage is an error that fails', () => {
  const offline = JSON.stringify({ error: { code: 'ENOTFOUND', summary: 'request to https://registry.npmjs.org/-/npm/v1/security/advisories/bulk failed, reason: getaddrinfo ENOTFOUND registry.npmjs.org' } });
  assert.equal(classifyAuditOutput(offline).kind, 'unanswered');
  const noLockfile = JSON.stringify({ error: { code: 'ENOLOCK', summary: 'This command requires an existing lockfile.' } });
  assert.deepEqual(classifyAuditOutput(noLockfile), { kind: 'error', reason: 'ENOLOCK: This command requires an existing lockfile.' });
  assert.equal(classifyAuditOutput('npm ERR! something').kind, 'error');
});

test('high and critical fail unless allowlisted for that package and not past the review date', () => {
  const { advisories } = classifyAuditOutput(report);
  const entry = { advisory: 'GHSA-aaaa-bbbb-cccc', package: 'deep-lib', reason: 'only reached from the build tool', reviewBy: '2027-01-31' };
  assert.deepEqual(judge(advisories, ['high', 'critical'], [], '2026-12-04').failures.map((item) => item.advisory.id), ['GHSA-aaaa-bbbb-cccc']);
  const allowed = judge(advisories, ['high', 'critical'], [entry], '2026-12-04');
  assert.deepEqual([allowed.failures.length, allowed.allowed.length], [0, 1]);
  const expired = judge(advisories, ['high', 'critical'], [entry], '2027-02-01');
  assert.deepEqual(expired.failures.map((item) => item.expired), ['2027-01-31']);
  // The same id allowed for another package does not cover this one.
  assert.equal(judge(advisories, ['high', 'critical'], [{ ...entry, package: 'other' }], '2026-12-04').failures.length, 1);
  // Development tools fail on critical only.
  assert.equal(judge(advisories, ['critical'], [], '2026-12-04').failures.length, 0);
});

test('the allowlist names the entry and field that is wrong', () => {
  assert.throws(() => readAllowlist('{"exceptions":[{"advisory":"GHSA-x","package":"p","reason":"","reviewBy":"2027-01-01"}]}'), /exceptions\[0\]\.reason is required/);
  assert.throws(() => readAllowlist('{"exceptions":[{"advisory":"GHSA-x","package":"p","reason":"r","reviewBy":"soon"}]}'), /exceptions\[0\]\.reviewBy must be YYYY-MM-DD/);
  assert.deepEqual(readAllowlist('{"exceptions":[]}'), []);
});
