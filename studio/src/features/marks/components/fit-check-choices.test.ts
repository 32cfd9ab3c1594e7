import { describe, expect, it } from 'vitest';
import type { LinkAssembly } from '../api/queries';
import { fitCheckChoices } from './link-labels';

const stack = (overrides: Partial<LinkAssembly>): LinkAssembly => ({
  id: 'a1',
  name: '21-tooth coupler stack',
  buildId: 'b1',
  buildTitle: 'Motor-to-gearbox coupler',
  interfaces: [
    { id: 'i1', name: 'coupler on motor shaft' },
    { id: 'i2', name: 'coupler on gearbox input' },
  ],
  checks: [],
  ...overrides,
});

describe('fitCheckChoices', () => {
  it('groups checks by assembly, this footage’s build first, other builds named, each with its state in words', () => {
    const here = stack({ checks: [{ id: 'c1', title: 'Test-fitted', state: 'confirmed', interfaceId: null }] });
    const other = stack({ id: 'a2', name: 'Long shaft stack', buildId: 'b2', buildTitle: 'Van conversion', checks: [{ id: 'c2', title: 'Runout', state: 'open', interfaceId: null }] });
    expect(fitCheckChoices([other, here], 'b1')).toEqual([
      { group: '21-tooth coupler stack', items: [{ value: 'c1', label: 'Test-fitted · confirmed' }] },
      { group: 'Long shaft stack (Van conversion)', items: [{ value: 'c2', label: 'Runout · open' }] },
    ]);
  });

  it('tells two checks of the same title apart by their interface, then by their place among those added by hand', () => {
    const twins = stack({
      checks: [
        { id: 'c1', title: 'Spline teeth match', state: 'bench_pass', interfaceId: 'i1' },
        { id: 'c2', title: 'Spline teeth match', state: 'bench_pass', interfaceId: 'i2' },
        { id: 'c3', title: 'Turns freely', state: 'open', interfaceId: null },
        { id: 'c4', title: 'turns freely ', state: 'open', interfaceId: null },
        { id: 'c5', title: 'Only one of me', state: 'open', interfaceId: 'i1' },
      ],
    });
    const labels = fitCheckChoices([twins], 'b1')[0].items.map((item) => item.label);
    expect(labels).toEqual([
      'Spline teeth match (at coupler on motor shaft) · passes on the bench',
      'Spline teeth match (at coupler on gearbox input) · passes on the bench',
      'Turns freely (added by hand, 1 of 2) · open',
      'turns freely  (added by hand, 2 of 2) · open',
      'Only one of me · open',
    ]);
    expect(new Set(labels).size).toBe(labels.length);
  });
});
