import { describe, expect, it } from 'vitest';
import { formatClock } from './clock';

describe('formatClock', () => {
  it('shows minutes and seconds under the hour, cut to the second', () => {
    expect(formatClock(0)).toBe('0:00');
    expect(formatClock(5_999)).toBe('0:05');
    expect(formatClock(65_000)).toBe('1:05');
    expect(formatClock(3_599_999)).toBe('59:59');
    expect(formatClock(-10)).toBe('0:00');
  });

  it('shows hours once past the hour, never minutes over 59', () => {
    expect(formatClock(3_600_000)).toBe('1:00:00');
    expect(formatClock(3_725_000)).toBe('1:02:05');
    // 2 h 30 min: the footage player's clock, not "150:00".
    expect(formatClock(9_000_000)).toBe('2:30:00');
  });

  it('adds tenths on request, cut rather than rounded', () => {
    expect(formatClock(75_300, { tenths: true })).toBe('1:15.3');
    expect(formatClock(75_399, { tenths: true })).toBe('1:15.3');
    expect(formatClock(9_000_000, { tenths: true })).toBe('2:30:00.0');
    expect(formatClock(3_725_000, { tenths: true })).toBe('1:02:05.0');
  });
});
