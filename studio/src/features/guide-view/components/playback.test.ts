import { describe, expect, it } from 'vitest';
import { currentCueIndex, currentStepId, filterCues, searchWords, type TimedStep } from './playback';

const MAIN = 'footage-main';
const step = (id: string, position: number, startMs: number | null, extra: Partial<TimedStep> = {}): TimedStep => ({
  id,
  position,
  footageId: MAIN,
  startMs,
  endMs: null,
  ...extra,
});

describe('currentStepId', () => {
  const steps = [step('s1', 1, 0), step('s2', 2, 5_000), step('s3', 3, 12_000)];

  it('is the step that started last', () => {
    expect(currentStepId(steps, 0, MAIN)).toBe('s1');
    expect(currentStepId(steps, 4_999, MAIN)).toBe('s1');
    expect(currentStepId(steps, 5_000, MAIN)).toBe('s2');
    expect(currentStepId(steps, 11_999.5, MAIN)).toBe('s2');
    expect(currentStepId(steps, 60_000, MAIN)).toBe('s3');
  });

  it('is none before the first anchored step starts', () => {
    const later = [step('a', 1, 3_000), step('b', 2, 8_000)];
    expect(currentStepId(later, 0, MAIN)).toBeNull();
    expect(currentStepId(later, 2_999, MAIN)).toBeNull();
    expect(currentStepId(later, 3_000, MAIN)).toBe('a');
  });

  it('ends a step at its end time when the next has not started', () => {
    const withEnds = [step('a', 1, 1_000, { endMs: 4_000 }), step('b', 2, 10_000)];
    expect(currentStepId(withEnds, 3_999, MAIN)).toBe('a');
    expect(currentStepId(withEnds, 4_000, MAIN)).toBeNull();
    expect(currentStepId(withEnds, 10_000, MAIN)).toBe('b');
  });

  it('ignores an end at or before the start', () => {
    expect(currentStepId([step('a', 1, 2_000, { endMs: 2_000 })], 9_000, MAIN)).toBe('a');
    expect(currentStepId([step('a', 1, 2_000, { endMs: 1_000 })], 9_000, MAIN)).toBe('a');
  });

  it('lets a short step inside a long one win, then returns to the long one', () => {
    const overlapping = [step('a', 1, 0, { endMs: 20_000 }), step('b', 2, 5_000, { endMs: 8_000 }), step('c', 3, 25_000)];
    expect(currentStepId(overlapping, 4_000, MAIN)).toBe('a');
    expect(currentStepId(overlapping, 6_000, MAIN)).toBe('b');
    expect(currentStepId(overlapping, 9_000, MAIN)).toBe('a');
    expect(currentStepId(overlapping, 21_000, MAIN)).toBeNull();
    expect(currentStepId(overlapping, 25_000, MAIN)).toBe('c');
  });

  it('ends a step without an end time when a later one starts, even a later one with an end', () => {
    const mixed = [step('a', 1, 0), step('b', 2, 5_000, { endMs: 8_000 })];
    expect(currentStepId(mixed, 6_000, MAIN)).toBe('b');
    expect(currentStepId(mixed, 9_000, MAIN)).toBeNull();
  });

  it('follows time, not position, when the steps are out of time order', () => {
    const reordered = [step('late', 1, 30_000), step('early', 2, 2_000)];
    expect(currentStepId(reordered, 10_000, MAIN)).toBe('early');
    expect(currentStepId(reordered, 31_000, MAIN)).toBe('late');
  });

  it('gives an equal start to the later position', () => {
    expect(currentStepId([step('x', 2, 4_000), step('y', 3, 4_000), step('w', 1, 4_000)], 4_000, MAIN)).toBe('y');
  });

  it('skips steps without a time or in another video', () => {
    const mixed = [step('untimed', 1, null), step('other', 2, 1_000, { footageId: 'another' }), step('here', 3, 3_000, { footageId: null })];
    expect(currentStepId(mixed, 2_000, MAIN)).toBeNull();
    expect(currentStepId(mixed, 3_500, MAIN)).toBe('here');
  });

  it('is none without a video or without steps', () => {
    expect(currentStepId(steps, 6_000, null)).toBeNull();
    expect(currentStepId([], 6_000, MAIN)).toBeNull();
  });
});

describe('currentCueIndex', () => {
  const cues = [
    { startMs: 500, endMs: 3_000, text: 'one' },
    { startMs: 3_000, endMs: 5_500, text: 'two' },
    { startMs: 6_000, endMs: 9_000, text: 'three' },
  ];
  it('finds the cue on screen, none in gaps', () => {
    expect(currentCueIndex(cues, 0)).toBe(-1);
    expect(currentCueIndex(cues, 500)).toBe(0);
    expect(currentCueIndex(cues, 3_000)).toBe(1);
    expect(currentCueIndex(cues, 5_800)).toBe(-1);
    expect(currentCueIndex(cues, 8_999)).toBe(2);
    expect(currentCueIndex(cues, 9_000)).toBe(-1);
    expect(currentCueIndex([], 1_000)).toBe(-1);
  });
});

describe('transcript search', () => {
  const cues = [
    { startMs: 0, endMs: 2_000, text: 'Lift the cab on the stands.' },
    { startMs: 2_000, endMs: 4_000, text: 'The spigot bore measures fifteen thousandths over.' },
    { startMs: 4_000, endMs: 6_000, text: 'Twenty-one teeth on the coupler, 21T.' },
    { startMs: 6_000, endMs: 8_000, text: 'Check the spigot again: Déjà vu.' },
  ];

  it('keeps every cue for an empty or blank search', () => {
    expect(filterCues(cues, '')).toHaveLength(4);
    expect(filterCues(cues, '   ')).toHaveLength(4);
  });

  it('keeps the cues holding every word, in any case, part words included, with their transcript index', () => {
    expect(filterCues(cues, 'SPIGOT').map((match) => match.index)).toEqual([1, 3]);
    expect(filterCues(cues, 'spigot thou').map((match) => match.index)).toEqual([1]);
    expect(filterCues(cues, 'thou spigot').map((match) => match.index)).toEqual([1]);
    expect(filterCues(cues, 'spigot stands')).toEqual([]);
    expect(filterCues(cues, '21t')[0].cue.text).toMatch(/^Twenty-one/);
  });

  it('ignores punctuation around words and accents', () => {
    expect(filterCues(cues, '"twenty-one,"').map((match) => match.index)).toEqual([2]);
    expect(filterCues(cues, 'deja').map((match) => match.index)).toEqual([3]);
    expect(searchWords('  “Spigot”,  bore! ')).toEqual(['spigot', 'bore']);
    expect(searchWords('-- ...')).toEqual([]);
  });
});
