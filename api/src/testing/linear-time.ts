import { performance } from 'node:perf_hooks';

/**
 * A linear-time check for the fuzz specs, stated as a ratio so it holds on any machine: the time for
 * an input `GROWTH_FACTOR` times larger may be at most `GROWTH_ALLOWANCE` times the time for the
 * small input. With 8 and 20, linear work passes with room for noise (8× expected), while quadratic
 * work (64× expected) fails. To keep timer noise and garbage-collection pauses out of tiny inputs,
 * each size is timed in batches of at least `MIN_BATCH_MS`, and each figure is the fastest of `runs`
 * rounds (small and large interleaved): noise from a busy machine only ever adds time.
 */
export interface GrowthMeasurement {
  /** Milliseconds per call on the small input. */
  smallMs: number;
  /** Milliseconds per call on the large input. */
  largeMs: number;
  /** largeMs / smallMs: about `GROWTH_FACTOR` when the work is linear. */
  ratio: number;
}

export const GROWTH_FACTOR = 8;
export const GROWTH_ALLOWANCE = 20;

const MIN_BATCH_MS = 8;
const MAX_BATCH_CALLS = 4_096;

function timeBatchMs(work: () => unknown, calls: number): number {
  const started = performance.now();
  for (let call = 0; call < calls; call += 1) work();
  return performance.now() - started;
}

/** Calls per batch so one batch takes at least MIN_BATCH_MS (also warms the code paths up). */
function callsPerBatch(work: () => unknown): number {
  let calls = 1;
  while (calls < MAX_BATCH_CALLS && timeBatchMs(work, calls) < MIN_BATCH_MS) calls *= 2;
  return calls;
}

/** One batch's time per call. */
function perCallMs(work: () => unknown, calls: number): number {
  return timeBatchMs(work, calls) / calls;
}

export function measureGrowth<T>(work: (input: T) => unknown, small: T, large: T, runs = 5): GrowthMeasurement {
  const smallCalls = callsPerBatch(() => work(small));
  const largeCalls = callsPerBatch(() => work(large));
  let smallMs = Number.POSITIVE_INFINITY;
  let largeMs = Number.POSITIVE_INFINITY;
  for (let round = 0; round < runs; round += 1) {
    smallMs = Math.min(smallMs, perCallMs(() => work(small), smallCalls));
    largeMs = Math.min(largeMs, perCallMs(() => work(large), largeCalls));
  }
  smallMs = Math.max(smallMs, 1e-6);
  return { smallMs, largeMs, ratio: largeMs / smallMs };
}

/**
 * The growth ratio of `work` from `small` to `large`, measured up to `attempts` times until it is within
 * the allowance: a busy machine can slow one measurement, but quadratic work fails every attempt.
 */
export function growthRatio<T>(work: (input: T) => unknown, small: T, large: T, attempts = 3): number {
  let best = Number.POSITIVE_INFINITY;
  for (let attempt = 0; attempt < attempts && best > GROWTH_ALLOWANCE; attempt += 1) {
    best = Math.min(best, measureGrowth(work, small, large).ratio);
  }
  return best;
}

/** Runs `work`, swallowing the errors the parser under test may throw on bad input; any other error fails the test. */
export function ignoringExpectedErrors<T>(work: (input: T) => unknown, isExpected: (error: unknown) => boolean) {
  return (input: T): void => {
    try {
      work(input);
    } catch (error) {
      if (!isExpected(error)) throw error;
    }
  };
}
