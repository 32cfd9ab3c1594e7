import { describe, expect, it } from 'vitest';
import { formatClock } from '@/lib/clock';
import { parseStepTime } from './step-time';

describe('parseStepTime', () => {
  it('reads m:ss, m:ss.s and plain seconds', () => {
    expect(parseStepTime('1:15')).toBe(75_000);
    expect(parseStepTime('1:15.3')).toBe(75_300);
    expect(parseStepTime('0:04.25')).toBe(4_250);
    expect(parseStepTime('12:00')).toBe(720_000);
    expect(parseStepTime('75')).toBe(75_000);
    expect(parseStepTime('4.2')).toBe(4_200);
    expect(parseStepTime(' 0:07,5 ')).toBe(7_500);
  });

  it('reads hours past the hour', () => {
    expect(parseStepTime('1:02:05')).toBe(3_725_000);
    expect(parseStepTime('1:02:05.5')).toBe(3_725_500);
  });

  it('tells an empty field from one it cannot read', () => {
    expect(parseStepTime('')).toBeNull();
    expect(parseStepTime('   ')).toBeNull();
    expect(parseStepTime('1:5')).toBeUndefined();
    expect(parseStepTime('1:75')).toBeUndefined();
    expect(parseStepTime('abc')).toBeUndefined();
    expect(parseStepTime('-3')).toBeUndefined();
    expect(parseStepTime('1:02:5')).toBeUndefined();
  });
});

describe('step times as the clock shows them', () => {
  it('round-trips what the clock shows', () => {
    for (const ms of [0, 4_200, 75_300, 600_000, 3_725_500]) expect(parseStepTime(formatClock(ms, { tenths: true }))).toBe(ms);
  });
});
