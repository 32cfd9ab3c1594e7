import { describe, expect, it } from 'vitest';
import { placeMarks, timeAt } from './timeline-geometry';

describe('timeline geometry', () => {
  it('places moments and spans as fractions of the footage', () => {
    const { placed, lanes } = placeMarks(
      [
        { id: 'b', startMs: 5_000, endMs: 7_500 },
        { id: 'a', startMs: 1_000, endMs: null },
      ],
      10_000,
    );
    expect(placed).toEqual([
      { id: 'a', x: 0.1, width: 0, lane: 0 },
      { id: 'b', x: 0.5, width: 0.25, lane: 0 },
    ]);
    expect(lanes).toBe(1);
  });

  it('moves crowded or overlapping marks to another lane so none hides another', () => {
    const { placed, lanes } = placeMarks(
      [
        { id: 'a', startMs: 1_000, endMs: 4_000 },
        { id: 'b', startMs: 2_000, endMs: null },
        { id: 'c', startMs: 2_050, endMs: null },
        { id: 'd', startMs: 6_000, endMs: null },
      ],
      10_000,
    );
    expect(placed.map(({ id, lane }) => [id, lane])).toEqual([
      ['a', 0],
      ['b', 1],
      ['c', 2],
      ['d', 0],
    ]);
    expect(lanes).toBe(3);
  });

  it('keeps marks past the end on the strip and answers nothing for an unknown length', () => {
    expect(placeMarks([{ id: 'a', startMs: 12_000, endMs: null }], 10_000).placed[0].x).toBe(1);
    expect(placeMarks([{ id: 'a', startMs: 1, endMs: null }], 0)).toEqual({ placed: [], lanes: 1 });
  });

  it('turns a click on the strip into a time', () => {
    expect(timeAt(150, 600, 20_000)).toBe(5_000);
    expect(timeAt(-10, 600, 20_000)).toBe(0);
    expect(timeAt(10, 0, 20_000)).toBe(0);
  });
});
