import { describe, expect, it } from 'vitest';
import type { MarkSuggestion } from '../api/queries';
import { spokenAt } from './marks-workspace';
import { stepOfDigits } from './reading-choices';

describe('stepOfDigits', () => {
  it('is one step of the last digit written', () => {
    expect(stepOfDigits('0.015')).toBe('0.001');
    expect(stepOfDigits('15.008')).toBe('0.001');
    expect(stepOfDigits('0.5902')).toBe('0.0001');
    expect(stepOfDigits(' 530 ')).toBe('1');
    expect(stepOfDigits('.5')).toBe('0.1');
    expect(stepOfDigits('-0.2')).toBe('0.1');
    expect(stepOfDigits('fifteen')).toBeNull();
  });
});

describe('spokenAt', () => {
  const suggestion = (id: string, change: Partial<MarkSuggestion>): MarkSuggestion => ({
    id,
    footageId: 'f1',
    cueIndex: 0,
    startMs: 6000,
    endMs: 9000,
    kind: 'measurement',
    phrase: 'fifteen thousandths',
    value: '0.015',
    unit: 'in',
    millimetres: 0.381,
    partId: null,
    status: 'pending',
    markId: null,
    ...change,
  });

  it('finds the measurement spoken in the cue playing at that moment', () => {
    const found = [suggestion('s1', { kind: 'part', value: null, unit: null, startMs: 3000, endMs: 5500 }), suggestion('s2', {})];
    expect(spokenAt(found, 7000)).toEqual({ suggestionId: 's2', phrase: 'fifteen thousandths', value: '0.015', unit: 'in' });
    expect(spokenAt(found, 6000)?.suggestionId).toBe('s2');
    expect(spokenAt(found, 4200)).toBeNull();
    expect(spokenAt(found, 9100)).toBeNull();
  });
});
