/** A 1–2–5 tick step giving about `target` ticks over `span`. */
export function niceStep(span: number, target = 6): number {
  if (!(span > 0) || !Number.isFinite(span)) return 1;
  const rough = span / target;
  const power = 10 ** Math.floor(Math.log10(rough));
  const fraction = rough / power;
  const nice = fraction <= 1 ? 1 : fraction <= 2 ? 2 : fraction <= 5 ? 5 : 10;
  return nice * power;
}

/** Tick values from `low` to `high` on multiples of a nice step (zero included when in range). */
export function niceTicks(low: number, high: number, target = 6): number[] {
  const step = niceStep(high - low, target);
  const first = Math.ceil(low / step) * step;
  const ticks: number[] = [];
  // Rounding to the step's decimals keeps 0.30000000000000004 out of the labels.
  const decimals = Math.max(0, -Math.floor(Math.log10(step)));
  for (let value = first; value <= high + step * 1e-9; value += step) {
    ticks.push(Number(value.toFixed(decimals)));
  }
  return ticks;
}

/** Writes a tick value with the step's decimals, and a true minus sign. */
export function formatTick(value: number, step: number): string {
  const decimals = Math.max(0, -Math.floor(Math.log10(step)));
  const text = Math.abs(value).toFixed(decimals);
  if (value < 0 && Number(text) !== 0) return `−${text}`;
  return value > 0 ? `+${text}` : text;
}
