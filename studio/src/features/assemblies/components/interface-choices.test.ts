import { describe, expect, it } from 'vitest';
import type { AssemblyDetail, FeatureInfo } from '../api/queries';
import { featureChoiceLabel, interfaceChoices } from './interface-choices';

const feature = (id: string, partId: string, kind: FeatureInfo['kind'], spec: FeatureInfo['spec']): FeatureInfo => ({
  id,
  partId,
  name: id,
  kind,
  unit: 'mm',
  spec,
  shown: { nominal: '15', length: '540' },
});

const PARTS: AssemblyDetail['parts'] = [
  {
    position: 'input side',
    sortOrder: 0,
    part: {
      id: 'coupler',
      partNumber: 'HL-2107',
      maker: '',
      title: 'coupler',
      category: 'coupler',
      features: [
        feature('coupler-spline', 'coupler', 'spline', { teeth: 27, gender: 'internal' }),
        feature('pilot-bore', 'coupler', 'diameter', { role: 'hole', toleranceClass: 'H7' }),
      ],
    },
  },
  {
    position: 'shaft',
    sortOrder: 1,
    part: {
      id: 'shaft',
      partNumber: 'DS-540',
      maker: '',
      title: 'shaft',
      category: 'shaft',
      features: [
        feature('shaft-spline', 'shaft', 'spline', { teeth: 21, gender: 'external' }),
        feature('other-internal', 'shaft', 'spline', { teeth: 21, gender: 'internal' }),
        feature('pilot-journal', 'shaft', 'diameter', { role: 'shaft', toleranceClass: 'g6' }),
        feature('overall', 'shaft', 'length', {}),
      ],
    },
  },
];

const values = (groups: { items: { value: string }[] }[]) => groups.flatMap((group) => group.items.map((item) => item.value));

describe('interfaceChoices', () => {
  it('names the part in every choice, so the chosen field says whose feature it is', () => {
    const { first, second } = interfaceChoices('bore_shaft', PARTS, 'pilot-bore');
    const labels = [...first, ...second].flatMap((group) => group.items.map((item) => item.label));
    expect(labels[0]).toMatch(/^HL-2107 coupler — pilot-bore/);
    expect(labels[1]).toMatch(/^DS-540 shaft — pilot-journal/);
    expect(second.flatMap((group) => group.items.map((item) => item.label))).toEqual([labels[1]]);
  });

  it('leaves out empty brackets when a feature has nothing to summarise', () => {
    const bare = feature('keyway note', 'shaft', 'free', {});
    expect(featureChoiceLabel({ partNumber: 'DS-540', title: 'shaft' }, bare)).toBe('DS-540 shaft — keyway note');
    expect(featureChoiceLabel({ partNumber: 'DS-540', title: 'shaft' }, bare)).not.toContain('()');
  });

  it('offers only features of the kind the interface joins, grouped by position and part', () => {
    const { first } = interfaceChoices('bore_shaft', PARTS, null);
    expect(values(first)).toEqual(['pilot-bore', 'pilot-journal']);
    expect(first.map((group) => group.group)).toEqual(['input side · HL-2107', 'shaft · DS-540']);
  });

  it('offers as partner a spline of the other gender, whatever its tooth count', () => {
    const { second } = interfaceChoices('spline', PARTS, 'coupler-spline');
    // 21 teeth against 27 is offered: saying it does not match is the check's job.
    expect(values(second)).toEqual(['shaft-spline']);
  });

  it('offers a shaft for a hole and nothing for a length window', () => {
    expect(values(interfaceChoices('bore_shaft', PARTS, 'pilot-bore').second)).toEqual(['pilot-journal']);
    const window = interfaceChoices('length_window', PARTS, 'overall');
    expect(values(window.first)).toEqual(['overall']);
    expect(window.second).toEqual([]);
  });
});
