import { evaluateInterface, summariseReadings, type DiameterFeatureInput } from './interface-evaluation';

const mm = (value: number) => Math.round(value * 1_000_000);
const micrometerReadings = (...valuesMm: number[]) => valuesMm.map((value) => ({ valueNm: mm(value), resolutionNm: 1000 }));
const bore = (extra: Partial<DiameterFeatureInput> = {}): DiameterFeatureInput => ({
  name: 'pilot bore',
  role: 'hole',
  nominalNm: mm(15),
  toleranceClass: 'H7',
  readings: [],
  ...extra,
});
const shaft = (extra: Partial<DiameterFeatureInput> = {}): DiameterFeatureInput => ({
  name: 'motor pilot',
  role: 'shaft',
  nominalNm: mm(15),
  toleranceClass: 'g6',
  readings: [],
  ...extra,
});

describe('evaluateInterface: spline', () => {
  it('fails mismatched tooth counts whatever the pitch', () => {
    const verdict = evaluateInterface({
      kind: 'spline',
      first: { name: 'coupler', teeth: 27, gender: 'internal', diametralPitch: 16, stubPitch: 32 },
      second: { name: 'gearbox input', teeth: 21, gender: 'external', diametralPitch: 16, stubPitch: 32 },
    });
    expect(verdict.outcome).toBe('fail');
    expect(verdict.reasons.join(' ')).toMatch(/tooth counts differ/);
  });

  it('passes a matching pair and carries the pitch diameter', () => {
    const verdict = evaluateInterface({
      kind: 'spline',
      first: { name: 'coupler', teeth: 21, gender: 'internal', diametralPitch: 16, stubPitch: 32 },
      second: { name: 'gearbox input', teeth: 21, gender: 'external', diametralPitch: 16, stubPitch: 32 },
    });
    expect(verdict.outcome).toBe('pass');
    // ANSI B92.1: pitch diameter D = N / P = 21 / 16 in = 1.3125 in = 33.3375 mm.
    expect(verdict.detail.pitchDiameterNm).toBe(33_337_500);
  });

  it('stays unknown when one pitch is not recorded', () => {
    const verdict = evaluateInterface({
      kind: 'spline',
      first: { name: 'coupler', teeth: 21, gender: 'internal' },
      second: { name: 'gearbox input', teeth: 21, gender: 'external', module: 1.5 },
    });
    expect(verdict.outcome).toBe('unknown');
  });
});

describe('evaluateInterface: bore and shaft', () => {
  it('passes an H7/g6 pair by its limits alone', () => {
    // ISO 286-2, 10–18 mm: H7 = +18/0 µm, g6 = −6/−17 µm, so clearance 6 to 35 µm.
    const verdict = evaluateInterface({ kind: 'bore_shaft', hole: bore(), shaft: shaft(), unit: 'mm' });
    expect(verdict.outcome).toBe('pass');
    expect(verdict.detail).toMatchObject({ intent: 'clearance', clearanceMinNm: 6_000, clearanceMaxNm: 35_000 });
  });

  it('cannot tell when the creator wants more clearance than the limits promise', () => {
    const verdict = evaluateInterface({ kind: 'bore_shaft', hole: bore(), shaft: shaft(), minClearanceNm: 10_000, unit: 'mm' });
    expect(verdict.outcome).toBe('unknown');
  });

  it('uses readings over limits, widened by half the instrument step each', () => {
    const verdict = evaluateInterface({
      kind: 'bore_shaft',
      hole: bore({ readings: micrometerReadings(15.01, 15.012) }),
      shaft: shaft({ readings: micrometerReadings(14.99) }),
      unit: 'mm',
    });
    // hole 15.010–15.012 (±0.0005), shaft 14.990 (±0.0005): clearance 0.019 to 0.023 mm.
    expect(verdict.outcome).toBe('pass');
    expect(verdict.detail).toMatchObject({ clearanceMinNm: 19_000, clearanceMaxNm: 23_000, clearanceMeasuredNm: 21_000 });
  });

  it('fails a measured part outside its own class', () => {
    // ISO 286-2, 10–18 mm H7 upper deviation +18 µm: 15.025 mm is out.
    const verdict = evaluateInterface({
      kind: 'bore_shaft',
      hole: bore({ readings: micrometerReadings(15.025) }),
      shaft: shaft({ readings: micrometerReadings(14.99) }),
      unit: 'mm',
    });
    expect(verdict.outcome).toBe('fail');
    expect(verdict.reasons[0]).toMatch(/pilot bore measures 15\.025 mm, above its H7 limits/);
  });

  it('fails parts that interfere when a clearance fit is meant', () => {
    const verdict = evaluateInterface({
      kind: 'bore_shaft',
      hole: bore({ toleranceClass: undefined, readings: micrometerReadings(14.98) }),
      shaft: shaft({ toleranceClass: undefined, readings: micrometerReadings(14.99) }),
      unit: 'mm',
    });
    expect(verdict.outcome).toBe('fail');
    expect(verdict.reasons).toContain('the parts interfere');
  });

  it('passes an interference fit that the classes intend', () => {
    // ISO 286-2, 18–30 mm: H7 = +21/0 µm, p6 = +35/+22 µm: clearance −35 to −1 µm, an interference fit.
    const verdict = evaluateInterface({
      kind: 'bore_shaft',
      hole: bore({ nominalNm: mm(25) }),
      shaft: shaft({ nominalNm: mm(25), toleranceClass: 'p6' }),
      unit: 'mm',
    });
    expect(verdict.detail.intent).toBe('interference');
    expect(verdict.outcome).toBe('pass');
  });

  it('lets a clearance read across the interface outrank the diameters', () => {
    // Invented feeler-gauge reading of 0.016 in with a 0.001 in step.
    const verdict = evaluateInterface({
      kind: 'bore_shaft',
      hole: bore({ toleranceClass: undefined }),
      shaft: shaft({ toleranceClass: undefined }),
      clearanceReadings: [{ valueNm: 406_400, resolutionNm: 25_400 }],
      unit: 'in',
    });
    expect(verdict.outcome).toBe('pass');
    expect(verdict.detail).toMatchObject({ clearanceMinNm: 406_400 - 12_700, clearanceMaxNm: 406_400 + 12_700 });
  });

  it('asks for what is missing when nothing is known', () => {
    const verdict = evaluateInterface({
      kind: 'bore_shaft',
      hole: bore({ toleranceClass: undefined }),
      shaft: shaft({ toleranceClass: undefined }),
      unit: 'mm',
    });
    expect(verdict.outcome).toBe('unknown');
    expect(verdict.reasons.at(-1)).toMatch(/measure pilot bore and motor pilot/);
  });
});

describe('evaluateInterface: length window', () => {
  const length = { name: 'driveshaft', lengthNm: mm(540), compressedNm: mm(520), extendedNm: mm(565), readings: [] };

  it('passes when travel is left both ways beyond the margin', () => {
    const verdict = evaluateInterface({ kind: 'length_window', length, installedMinNm: mm(530), installedMaxNm: mm(555), marginNm: mm(5), unit: 'mm' });
    expect(verdict.outcome).toBe('pass');
    expect(verdict.detail).toMatchObject({ compressionLeftNm: mm(10), extensionLeftNm: mm(10) });
  });

  it('fails when the margin is not met', () => {
    const verdict = evaluateInterface({ kind: 'length_window', length, installedMinNm: mm(530), installedMaxNm: mm(555), marginNm: mm(12), unit: 'mm' });
    expect(verdict.outcome).toBe('fail');
  });

  it('shifts the range by a measured overall length', () => {
    const verdict = evaluateInterface({
      kind: 'length_window',
      length: { ...length, readings: [{ valueNm: mm(548), resolutionNm: mm(0.5) }] },
      installedMinNm: mm(530),
      installedMaxNm: mm(555),
      marginNm: mm(5),
      unit: 'mm',
    });
    // 8 mm longer than nominal: compressed 528 leaves only 2 mm at the shortest installed length.
    expect(verdict.outcome).toBe('fail');
    expect(verdict.detail).toMatchObject({ compressedNm: mm(528), compressionLeftNm: mm(2) });
  });
});

describe('summariseReadings', () => {
  it('gives mean, spread and the coarsest resolution', () => {
    expect(
      summariseReadings([
        { valueNm: 100, resolutionNm: 10 },
        { valueNm: 130, resolutionNm: 20 },
      ]),
    ).toEqual({ meanNm: 115, spreadNm: 30, resolutionNm: 20, count: 2 });
  });
});
