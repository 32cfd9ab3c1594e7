// Spoken-measurement extraction on the public route: does a long text hold up other requests?
// Prints (1) the extraction time for 8× the text over 1× (≈ 8 when linear), and (2) how long a cheap
// calculator call (GET /api/tools/fits) waits while a 200,000-character extraction is in flight,
// as a ratio to the same call on an idle API. All figures come from one run on one machine.
// Run with: bash bench/run.sh extract   (see the header of bench/run.sh); BENCH_RUNS rounds (default 5).
import { median, startApi } from '../lib/harness.mjs';

const ROUNDS = Number(process.env.BENCH_RUNS ?? 5);
const CAP = 200_000;

/** Worst cases seen while fuzzing: every few characters a hit, and long runs of number words. */
const TEXTS = {
  'a hit every 5 characters': '1 mm ',
  'number words, no hits': 'nine hundred ninety nine thousand nine hundred ninety nine point one two three ',
  'workshop talk': 'The bore came in at one thousandth and two tenths over, and the pilot is 22 mm. ',
};

const fill = (unit, length) => unit.repeat(Math.ceil(length / unit.length)).slice(0, length);

async function post(baseUrl, path, body) {
  const response = await fetch(`${baseUrl}/api${path}`, { method: 'POST', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify(body) });
  if (!response.ok) throw new Error(`${path}: ${response.status} ${await response.text()}`);
  return response.json();
}

async function timedFits(baseUrl) {
  const started = performance.now();
  const response = await fetch(`${baseUrl}/api/tools/fits?size=25&unit=mm&hole=H7&shaft=g6`);
  await response.arrayBuffer();
  return performance.now() - started;
}

async function timedExtract(baseUrl, text) {
  const started = performance.now();
  await post(baseUrl, '/tools/measurements/extract', { text });
  return performance.now() - started;
}

/** Fires a fits call every 2 ms while `work` runs; returns each call's time. */
async function fitsDuring(baseUrl, work) {
  const times = [];
  let running = true;
  const probe = (async () => {
    while (running) {
      times.push(await timedFits(baseUrl));
      await new Promise((resolve) => setTimeout(resolve, 2));
    }
  })();
  await work();
  running = false;
  await probe;
  return times;
}

async function main() {
  // This API process only: the per-address limits would otherwise stop the run.
  process.env.TOOLS_RATE_LIMIT = '1000000';
  process.env.TOOLS_TEXT_RATE_LIMIT = '1000000';
  const api = await startApi();
  try {
    for (let warm = 0; warm < 20; warm += 1) await timedFits(api.baseUrl);
    const idle = [];
    for (let call = 0; call < 200; call += 1) idle.push(await timedFits(api.baseUrl));
    const idleMedian = median(idle);
    console.log(`measurement extraction (API ${api.baseUrl}), ${ROUNDS} rounds each, medians:`);
    console.log(`  GET /api/tools/fits on an idle API: ${idleMedian.toFixed(2)} ms`);
    for (const [label, unit] of Object.entries(TEXTS)) {
      const small = fill(unit, CAP / 8);
      const large = fill(unit, CAP);
      await timedExtract(api.baseUrl, small);
      const smallMs = [];
      const largeMs = [];
      const waits = [];
      for (let round = 0; round < ROUNDS; round += 1) {
        smallMs.push(await timedExtract(api.baseUrl, small));
        const during = await fitsDuring(api.baseUrl, async () => largeMs.push(await timedExtract(api.baseUrl, large)));
        waits.push(Math.max(...during));
      }
      console.log(`  ${label}:`);
      console.log(`    extract ${small.length} chars ${median(smallMs).toFixed(1)} ms, ${large.length} chars ${median(largeMs).toFixed(1)} ms: ratio ${(median(largeMs) / median(smallMs)).toFixed(1)} for 8× the text`);
      console.log(`    longest fits call during the 200,000-char extraction ${median(waits).toFixed(1)} ms: ${(median(waits) / idleMedian).toFixed(1)}× idle, ${((median(waits) / median(largeMs)) * 100).toFixed(0)} % of the extraction`);
    }
  } finally {
    await api.stop();
  }
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
