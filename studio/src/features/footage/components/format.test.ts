import { describe, expect, it } from 'vitest';
import { formatBytes, formatTimeLeft } from './format';
import { activeCueIndex } from './transcript-pane';

describe('footage display helpers', () => {
  it('shows sizes in decimal units and the time left', () => {
    expect(formatBytes(20_800_000)).toBe('20.8 MB');
    expect(formatBytes(20_000_000_000)).toBe('20 GB');
    expect(formatTimeLeft(42)).toBe('42 s left');
    expect(formatTimeLeft(7_500)).toBe('about 2 h 5 min left');
  });

  it('finds the cue playing now, and none in a gap between cues', () => {
    const cues = [
      { index: 0, startMs: 1000, endMs: 4000, text: 'a' },
      { index: 1, startMs: 5000, endMs: 8000, text: 'b' },
    ];
    expect(activeCueIndex(cues, 500)).toBe(-1);
    expect(activeCueIndex(cues, 1000)).toBe(0);
    expect(activeCueIndex(cues, 4500)).toBe(-1);
    expect(activeCueIndex(cues, 7999)).toBe(1);
    expect(activeCueIndex(cues, 8000)).toBe(-1);
  });
});
