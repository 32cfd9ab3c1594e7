/**
 * The marking timeline's geometry, in plain functions: which stretch of the footage is in view (zoom and pan),
 * where a time falls on the strip, marks gathered into clusters when they would overlap at this zoom (one row,
 * never stacked lanes), and search hits counted into columns for the density band.
 */
export interface TimelineItem {
  id: string;
  startMs: number;
  endMs: number | null;
}

/** The stretch of footage the strip shows, in ms. */
export interface TimelineView {
  startMs: number;
  endMs: number;
}

/** Zooming stops at a few seconds across the strip: close enough to pin to the tenth, far enough to see context. */
export const MIN_VIEW_MS = 5_000;

const clamp = (value: number, low: number, high: number) => Math.min(high, Math.max(low, value));
const clamp01 = (value: number) => clamp(value, 0, 1);

export function wholeView(durationMs: number): TimelineView {
  return { startMs: 0, endMs: Math.max(durationMs, 0) };
}

/** A view kept inside the footage and no narrower than `MIN_VIEW_MS` (or the whole footage, if shorter). */
export function clampView(view: TimelineView, durationMs: number): TimelineView {
  const span = clamp(view.endMs - view.startMs, Math.min(MIN_VIEW_MS, durationMs), durationMs);
  const startMs = clamp(view.startMs, 0, Math.max(0, durationMs - span));
  return { startMs, endMs: startMs + span };
}

/**
 * Zoom by `factor` (below 1 zooms in) keeping the time under `anchor` (a fraction across the strip) where it is,
 * as maps do under the pointer.
 */
export function zoomView(view: TimelineView, factor: number, anchor: number, durationMs: number): TimelineView {
  const span = view.endMs - view.startMs;
  const anchorMs = view.startMs + span * clamp01(anchor);
  const nextSpan = clamp(span * factor, Math.min(MIN_VIEW_MS, durationMs), durationMs);
  const startMs = anchorMs - nextSpan * clamp01(anchor);
  return clampView({ startMs, endMs: startMs + nextSpan }, durationMs);
}

/** Move the view by a fraction of its own width (negative: earlier). */
export function panView(view: TimelineView, fraction: number, durationMs: number): TimelineView {
  const shift = (view.endMs - view.startMs) * fraction;
  return clampView({ startMs: view.startMs + shift, endMs: view.endMs + shift }, durationMs);
}

/** The same zoom, centred on `centreMs` (a click on the minimap, or the playhead leaving the view). */
export function centreView(view: TimelineView, centreMs: number, durationMs: number): TimelineView {
  const span = view.endMs - view.startMs;
  return clampView({ startMs: centreMs - span / 2, endMs: centreMs + span / 2 }, durationMs);
}

/**
 * While the footage plays past the right edge of a zoomed view, the view turns the page so the playhead stays in
 * sight; a jump elsewhere (a seek) centres on it. A playhead already out of view before stays where the person left it.
 */
export function followPlayhead(view: TimelineView, previousMs: number, currentMs: number, durationMs: number): TimelineView {
  const inView = (ms: number) => ms >= view.startMs && ms <= view.endMs;
  if (inView(currentMs) || !inView(previousMs)) return view;
  const span = view.endMs - view.startMs;
  const playedOn = currentMs > view.endMs && currentMs - view.endMs < span / 4;
  if (playedOn) return clampView({ startMs: currentMs, endMs: currentMs + span }, durationMs);
  return centreView(view, currentMs, durationMs);
}

/** Where a time falls across the strip, as a fraction of its width (outside 0–1 when out of view). */
export function positionOf(ms: number, view: TimelineView): number {
  const span = view.endMs - view.startMs;
  return span > 0 ? (ms - view.startMs) / span : 0;
}

/** The time at a point on the strip, from its offset and width in pixels. */
export function timeAt(offsetPx: number, widthPx: number, view: TimelineView): number {
  if (!(widthPx > 0)) return Math.round(view.startMs);
  return Math.round(view.startMs + clamp01(offsetPx / widthPx) * (view.endMs - view.startMs));
}

export interface MarkCluster {
  /** The marks gathered here, in time order (one for a lone marker). */
  ids: string[];
  startMs: number;
  /** The last start in the cluster, or a lone span's end. */
  endMs: number;
  /** Left edge on the strip as a fraction of its width, clamped to the strip. */
  x: number;
  /** Width as a fraction (a span's bar, or the spread of a cluster's starts). */
  width: number;
}

/**
 * Marks that start within `minGapPx` of a cluster's first mark at this zoom join it, so markers never overlap and
 * never need a second row (measured from the first, not the last, so evenly spaced marks never chain into one). Only marks touching the view are kept (the strip draws at most one marker per
 * `minGapPx`, however many marks the footage has).
 */
export function clusterMarks(items: readonly TimelineItem[], view: TimelineView, widthPx: number, minGapPx = 20): MarkCluster[] {
  const span = view.endMs - view.startMs;
  if (!(span > 0) || !(widthPx > 0)) return [];
  const gapMs = (minGapPx / widthPx) * span;
  const visible = items
    .filter((item) => (item.endMs ?? item.startMs) >= view.startMs - gapMs && item.startMs <= view.endMs + gapMs)
    .sort((a, b) => a.startMs - b.startMs || a.id.localeCompare(b.id));
  const clusters: { ids: string[]; startMs: number; lastStartMs: number; endMs: number | null }[] = [];
  for (const item of visible) {
    const last = clusters.at(-1);
    if (last && item.startMs - last.startMs < gapMs) {
      last.ids.push(item.id);
      last.lastStartMs = item.startMs;
      last.endMs = null;
    } else {
      clusters.push({ ids: [item.id], startMs: item.startMs, lastStartMs: item.startMs, endMs: item.endMs });
    }
  }
  return clusters.map(({ ids, startMs, lastStartMs, endMs }) => {
    const end = ids.length === 1 && endMs !== null ? endMs : lastStartMs;
    const x = clamp01(positionOf(startMs, view));
    return { ids, startMs, endMs: end, x, width: Math.max(0, clamp01(positionOf(end, view)) - x) };
  });
}

/** The view that shows a cluster's marks spread out, with a little room either side. */
export function viewOfCluster(cluster: Pick<MarkCluster, 'startMs' | 'endMs'>, durationMs: number): TimelineView {
  const spread = Math.max(cluster.endMs - cluster.startMs, MIN_VIEW_MS / 2);
  return clampView({ startMs: cluster.startMs - spread / 2, endMs: cluster.endMs + spread / 2 }, durationMs);
}

/** Search hits counted into `columns` equal stretches of the view (the density band); hits out of view are left out. */
export function hitDensity(hitStartsMs: readonly number[], view: TimelineView, columns: number): number[] {
  const counts = new Array<number>(Math.max(0, Math.floor(columns))).fill(0);
  const span = view.endMs - view.startMs;
  if (counts.length === 0 || !(span > 0)) return counts;
  for (const ms of hitStartsMs) {
    if (ms < view.startMs || ms > view.endMs) continue;
    counts[Math.min(counts.length - 1, Math.floor(((ms - view.startMs) / span) * counts.length))] += 1;
  }
  return counts;
}
