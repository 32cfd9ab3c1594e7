// "Forgot password" timing: the median answer time for an address with an account and for one without,
// measured interleaved in the same run, and their ratio (≈ 1.0 when the answer does the same work for both,
// so its timing cannot tell which addresses have accounts).
// Run with: bash bench/run.sh forgot-password   (see the header of bench/run.sh); BENCH_RUNS pairs (default 200).
import { median, session, startApi } from '../lib/harness.mjs';

const PAIRS = Number(process.env.BENCH_RUNS ?? 200);
const WARM_UP = 20;

/** An account to ask about (it need not be confirmed: the reset job looks only at the address). */
async function existingAddress(baseUrl) {
  const api = session(baseUrl);
  const email = `bench-forgot-${Date.now().toString(36)}@fitwright.bench`;
  await api.get('/auth/me');
  await api.post('/auth/register', { email, password: 'benchmark password 2026', displayName: 'Bench forgot' });
  return email;
}

async function timedForgot(api, email) {
  const started = performance.now();
  await api.post('/auth/password/forgot', { email });
  return performance.now() - started;
}

async function main() {
  // This API process only: the per-address limit would otherwise stop the run after 10 requests a minute.
  process.env.AUTH_RATE_LIMIT = '100000';
  const api = await startApi();
  try {
    const known = await existingAddress(api.baseUrl);
    const browser = session(api.baseUrl);
    await browser.get('/auth/me');
    for (let index = 0; index < WARM_UP; index += 1) {
      await timedForgot(browser, index % 2 ? known : `nobody-warm-${index}@fitwright.bench`);
    }
    const knownMs = [];
    const unknownMs = [];
    for (let pair = 0; pair < PAIRS; pair += 1) {
      // Alternate which goes first, so neither side always follows the other's background job.
      const order = pair % 2 ? ['known', 'unknown'] : ['unknown', 'known'];
      for (const side of order) {
        if (side === 'known') knownMs.push(await timedForgot(browser, known));
        else unknownMs.push(await timedForgot(browser, `nobody-${pair}-${Date.now().toString(36)}@fitwright.bench`));
      }
    }
    const knownMedian = median(knownMs);
    const unknownMedian = median(unknownMs);
    console.log(`forgot password, ${PAIRS} pairs interleaved (API ${api.baseUrl}):`);
    console.log(`  existing address   median ${knownMedian.toFixed(2)} ms`);
    console.log(`  unknown address    median ${unknownMedian.toFixed(2)} ms`);
    console.log(`  ratio existing/unknown ${(knownMedian / unknownMedian).toFixed(3)} (1.0 = no timing difference)`);
  } finally {
    await api.stop();
  }
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
