import { describe, expect, it } from 'vitest';
import {
  centreView,
  clampView,
  clusterMarks,
  followPlayhead,
  hitDensity,
  MIN_VIEW_MS,
  panView,
  positionOf,
  timeAt,
  viewOfCluster,
  wholeView,
  zoomView,
} from './timeline-geometry';

const THREE_HOURS = 3 * 3_600_000;

describe('timeline view: zoom and pan', () => {
  it('zooms in around the time under the pointer, keeping that time where it was on the strip', () => {
    const view = zoomView(wholeView(THREE_HOURS), 0.5, 0.25, THREE_HOURS);
    expect(view.endMs - view.startMs).toBe(THREE_HOURS / 2);
    // 0.25 across the whole 3 h is 45 min; after zooming, 45 min is still a quarter across.
    expect(positionOf(45 * 60_000, view)).toBeCloseTo(0.25, 10);
  });

  it('zooms down to a few seconds and no further, and out to the whole footage and no further', () => {
    let view = wholeView(THREE_HOURS);
    for (let step = 0; step < 60; step += 1) view = zoomView(view, 0.5, 0.5, THREE_HOURS);
    expect(view.endMs - view.startMs).toBe(MIN_VIEW_MS);
    for (let step = 0; step < 60; step += 1) view = zoomView(view, 2, 0.9, THREE_HOURS);
    expect(view).toEqual(wholeView(THREE_HOURS));
  });

  it('pans by a fraction of the view and stops at either end of the footage', () => {
    const view = { startMs: 60_000, endMs: 120_000 };
    expect(panView(view, 0.5, THREE_HOURS)).toEqual({ startMs: 90_000, endMs: 150_000 });
    expect(panView(view, -5, THREE_HOURS)).toEqual({ startMs: 0, endMs: 60_000 });
    expect(panView(view, 1_000, THREE_HOURS)).toEqual({ startMs: THREE_HOURS - 60_000, endMs: THREE_HOURS });
  });

  it('keeps a short footage whole when the minimum zoom is wider than it', () => {
    expect(clampView({ startMs: 0, endMs: 1_000 }, 3_000)).toEqual({ startMs: 0, endMs: 3_000 });
    expect(centreView({ startMs: 0, endMs: 10_000 }, 2 * 3_600_000, THREE_HOURS)).toEqual({ startMs: 7_195_000, endMs: 7_205_000 });
  });

  it('turns the page when playback runs off the right edge, centres on a seek, and leaves a view the person moved away', () => {
    const view = { startMs: 0, endMs: 60_000 };
    expect(followPlayhead(view, 59_900, 60_150, THREE_HOURS)).toEqual({ startMs: 60_150, endMs: 120_150 });
    expect(followPlayhead(view, 30_000, 600_000, THREE_HOURS)).toEqual({ startMs: 570_000, endMs: 630_000 });
    expect(followPlayhead(view, 30_000, 30_250, THREE_HOURS)).toBe(view);
    expect(followPlayhead(view, 900_000, 900_250, THREE_HOURS)).toBe(view);
  });

  it('turns a point on the strip into a time within the view', () => {
    expect(timeAt(150, 600, { startMs: 0, endMs: 20_000 })).toBe(5_000);
    expect(timeAt(300, 600, { startMs: 3_600_000, endMs: 3_610_000 })).toBe(3_605_000);
    expect(timeAt(-10, 600, { startMs: 1_000, endMs: 2_000 })).toBe(1_000);
    expect(timeAt(10, 0, { startMs: 1_000, endMs: 2_000 })).toBe(1_000);
  });
});

describe('timeline clusters', () => {
  const moment = (id: string, startMs: number) => ({ id, startMs, endMs: null });

  it('gathers marks closer than the gap into one cluster and keeps lone marks and spans apart', () => {
    const view = { startMs: 0, endMs: 100_000 };
    // 1,000 px for 100 s: 20 px is 2 s.
    const clusters = clusterMarks(
      [moment('a', 10_000), moment('b', 11_000), moment('c', 11_500), { id: 'd', startMs: 50_000, endMs: 60_000 }, moment('e', 90_000)],
      view,
      1_000,
    );
    expect(clusters.map(({ ids, startMs, endMs }) => ({ ids, startMs, endMs }))).toEqual([
      { ids: ['a', 'b', 'c'], startMs: 10_000, endMs: 11_500 },
      { ids: ['d'], startMs: 50_000, endMs: 60_000 },
      { ids: ['e'], startMs: 90_000, endMs: 90_000 },
    ]);
    const placed = clusters.map(({ x, width }) => [x, width]);
    [[0.1, 0.015], [0.5, 0.1], [0.9, 0]].forEach(([x, width], index) => {
      expect(placed[index][0]).toBeCloseTo(x, 10);
      expect(placed[index][1]).toBeCloseTo(width, 10);
    });
  });

  it('draws 400 marks over 3 hours as a bounded number of markers, and each alone once zoomed in', () => {
    const marks = Array.from({ length: 400 }, (_, index) => moment(`m${index}`, index * 27_000));
    const whole = clusterMarks(marks, wholeView(THREE_HOURS), 1_000);
    // 20 px is 216 s: eight marks a cluster, 50 clusters; evenly spread marks never chain into one.
    expect(whole).toHaveLength(50);
    expect(whole.every((cluster) => cluster.ids.length === 8)).toBe(true);
    expect(whole.flatMap((cluster) => cluster.ids)).toHaveLength(400);
    // Ten minutes across 1,000 px: 27 s apart is 45 px, more than the gap.
    const zoomed = clusterMarks(marks, { startMs: 3_600_000, endMs: 4_200_000 }, 1_000);
    expect(zoomed.every((cluster) => cluster.ids.length === 1)).toBe(true);
    expect(zoomed.length).toBeGreaterThanOrEqual(22);
    expect(zoomed.length).toBeLessThanOrEqual(25);
  });

  it('opens a cluster into a view that shows its marks apart', () => {
    const marks = [moment('a', 10_000), moment('b', 11_000), moment('c', 12_000)];
    const [cluster] = clusterMarks(marks, wholeView(THREE_HOURS), 1_000);
    const view = viewOfCluster(cluster, THREE_HOURS);
    expect(view.startMs).toBeLessThanOrEqual(10_000);
    expect(view.endMs).toBeGreaterThanOrEqual(12_000);
    expect(clusterMarks(marks, view, 1_000).map((each) => each.ids)).toEqual([['a'], ['b'], ['c']]);
  });
});

describe('search hit density', () => {
  it('counts hits into columns of the view and leaves out hits outside it', () => {
    expect(hitDensity([0, 1_000, 1_500, 5_000, 9_999, 10_000, 25_000], { startMs: 0, endMs: 10_000 }, 4)).toEqual([3, 0, 1, 2]);
    expect(hitDensity([15_000], { startMs: 10_000, endMs: 20_000 }, 2)).toEqual([0, 1]);
    expect(hitDensity([1], { startMs: 0, endMs: 10 }, 0)).toEqual([]);
  });
});
