/**
 * Where marks sit on the strip under the player. Positions are fractions of the footage (0–1);
 * markers closer than `minGap` go to the next lane so none hides another.
 */
export interface TimelineItem {
  id: string;
  startMs: number;
  endMs: number | null;
}

export interface PlacedItem {
  id: string;
  /** Start as a fraction of the footage. */
  x: number;
  /** Span width as a fraction (0 for a moment). */
  width: number;
  lane: number;
}

const clamp01 = (value: number) => Math.min(1, Math.max(0, value));

export function placeMarks(items: readonly TimelineItem[], durationMs: number, minGap = 0.02): { placed: PlacedItem[]; lanes: number } {
  if (!(durationMs > 0)) return { placed: [], lanes: 1 };
  const sorted = [...items].sort((a, b) => a.startMs - b.startMs || a.id.localeCompare(b.id));
  // The right edge of what each lane holds so far.
  const laneEnds: number[] = [];
  const placed = sorted.map((item) => {
    const x = clamp01(item.startMs / durationMs);
    const end = item.endMs === null ? x : clamp01(item.endMs / durationMs);
    const width = Math.max(0, end - x);
    let lane = laneEnds.findIndex((laneEnd) => x - laneEnd >= minGap);
    if (lane === -1) lane = laneEnds.length;
    laneEnds[lane] = x + width;
    return { id: item.id, x, width, lane };
  });
  return { placed, lanes: Math.max(1, laneEnds.length) };
}

/** The time at a click on the strip, from its offset and width in pixels. */
export function timeAt(offsetPx: number, widthPx: number, durationMs: number): number {
  if (!(widthPx > 0) || !(durationMs > 0)) return 0;
  return Math.round(clamp01(offsetPx / widthPx) * durationMs);
}
