import { formatMinutes, SKILL_LEVEL_WORDS, SKILL_LEVELS, stepMinutesTotal } from './guide-effort';

describe('guide effort', () => {
  it('formats whole minutes as hours and minutes (our own convention)', () => {
    expect(formatMinutes(1)).toBe('1 min');
    expect(formatMinutes(45)).toBe('45 min');
    expect(formatMinutes(60)).toBe('1 h');
    expect(formatMinutes(90)).toBe('1 h 30 min');
    expect(formatMinutes(6000)).toBe('100 h');
  });

  it('refuses a time that is not a whole positive number of minutes', () => {
    expect(() => formatMinutes(0)).toThrow(RangeError);
    expect(() => formatMinutes(2.5)).toThrow(RangeError);
  });

  it('adds the steps that give a time and says null when none does', () => {
    expect(stepMinutesTotal([{ estimatedMinutes: 20 }, { estimatedMinutes: null }, {}, { estimatedMinutes: 15 }])).toBe(35);
    expect(stepMinutesTotal([{ estimatedMinutes: null }, {}])).toBeNull();
  });

  it('has a label and a description for every level, each label different', () => {
    const labels = SKILL_LEVELS.map((level) => SKILL_LEVEL_WORDS[level].label);
    expect(new Set(labels).size).toBe(SKILL_LEVELS.length);
    for (const level of SKILL_LEVELS) expect(SKILL_LEVEL_WORDS[level].description.length).toBeGreaterThan(10);
  });
});
