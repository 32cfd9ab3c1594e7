import { describe, expect, it } from 'vitest';
import { toFeatureInput, type FeatureFormValues } from './feature-form';

const BASE: FeatureFormValues = {
  name: 'input spline',
  kind: 'spline',
  unit: 'in',
  teeth: 21,
  gender: 'external',
  pitchSystem: 'module',
  diametralPitch: 16,
  stubPitch: 32,
  module: 1.25,
  pressureAngle: 'unknown',
  splineFit: 'unknown',
  splineClass: 'unknown',
  majorDiameter: '',
  role: 'hole',
  nominal: '',
  toleranceMode: 'class',
  toleranceClass: '',
  max: '',
  min: '',
  length: '',
  compressed: '',
  extended: '',
  value: '',
  freeUnit: '',
};

describe('toFeatureInput', () => {
  it('sends only the chosen pitch system for a new spline', () => {
    expect(toFeatureInput(BASE, false)).toEqual({
      name: 'input spline',
      kind: 'spline',
      unit: 'in',
      teeth: 21,
      gender: 'external',
      diametralPitch: undefined,
      stubPitch: undefined,
      module: 1.25,
      pressureAngle: undefined,
      splineFit: undefined,
      splineClass: undefined,
      majorDiameter: undefined,
    });
  });

  it('clears the other pitch system with null on an update, so the server forgets it', () => {
    const input = toFeatureInput(BASE, true);
    expect(input.diametralPitch).toBeNull();
    expect(input.stubPitch).toBeNull();
    expect(input.module).toBe(1.25);
    expect(JSON.parse(JSON.stringify(input))).toHaveProperty('diametralPitch', null);
  });

  it('sends limits instead of a class for a diameter given as largest and smallest', () => {
    const input = toFeatureInput(
      { ...BASE, kind: 'diameter', name: 'pilot bore', nominal: '15', toleranceMode: 'limits', toleranceClass: 'H7', max: '15.018', min: '15.000', unit: 'mm' },
      true,
    );
    expect(input).toMatchObject({ kind: 'diameter', role: 'hole', nominal: '15', toleranceClass: null, max: '15.018', min: '15.000', unit: 'mm' });
  });

  it('sends the pressure angle, fit and class as the typed values the API takes', () => {
    const input = toFeatureInput({ ...BASE, pressureAngle: '37.5', splineFit: 'major', splineClass: '5' }, false);
    expect(input).toMatchObject({ pressureAngle: 37.5, splineFit: 'major', splineClass: 5 });
    expect(typeof input.pressureAngle).toBe('number');
    expect(typeof input.splineClass).toBe('number');
  });

  it('clears a spline attribute set back to "not known" with null on an update', () => {
    const input = toFeatureInput({ ...BASE, pressureAngle: '30', splineFit: 'unknown', splineClass: 'unknown' }, true);
    expect(input.pressureAngle).toBe(30);
    expect(input.splineFit).toBeNull();
    expect(input.splineClass).toBeNull();
  });
});
