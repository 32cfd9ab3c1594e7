import { EngineError } from './engine-error';
import {
  finderStateRank,
  judgeClearance,
  judgeDiameter,
  judgeLength,
  judgeSpline,
  nearSizeWindowNm,
  readFinderLength,
  readFinderPitch,
  type RecordedSpline,
} from './fit-finder';

const coupler16_32: RecordedSpline = {
  name: 'HL-2107 gearbox spline',
  teeth: 21,
  gender: 'internal',
  pitch: { system: 'diametral', diametralPitch: 16, stubPitch: 32 },
  pressureAngleDeg: 30,
  fit: 'side',
};

describe('fit finder: splines', () => {
  it('matches the same teeth and diametral pitch (ANSI B92.1: 21 teeth at 16/32, pitch diameter N/P = 1.3125 in)', () => {
    const judgement = judgeSpline({ teeth: 21, pitch: readFinderPitch('splinePitch', '16/32'), pressureAngleDeg: 30 }, coupler16_32);
    expect(judgement.verdict).toBe('match');
    // ANSI B92.1 basic equation D = N / P: 21 / 16 = 1.3125 in.
    expect(judgement.reasons.join(' ')).toContain('1.3125 in');
  });

  it('never matches 21 teeth with 27, not even as a near miss (tooth counts must be equal: ANSI B92.1 and ISO 4156 alike)', () => {
    const judgement = judgeSpline({ teeth: 27, pitch: readFinderPitch('splinePitch', '16/32') }, coupler16_32);
    expect(judgement.verdict).toBe('no_match');
    expect(judgement.reasons[0]).toContain('21 teeth; yours has 27');
  });

  it('calls the same teeth at another diametral pitch a near miss: "same teeth, other pitch" (ANSI B92.1 pitches 16/32 and 24/48)', () => {
    const judgement = judgeSpline({ teeth: 21, pitch: readFinderPitch('splinePitch', '24/48') }, coupler16_32);
    expect(judgement.verdict).toBe('near_miss');
    expect(judgement.reasons[0]).toMatch(/^same teeth, other pitch: 24\/48 .* this is 16\/32/);
  });

  it('calls a module pitch against a diametral one a near miss (ISO 4156 module 1.25 vs ANSI B92.1 20/40: D = 26.25 mm vs 1.05 in = 26.67 mm)', () => {
    const judgement = judgeSpline({ teeth: 21, pitch: readFinderPitch('splinePitch', 'm1.25') }, { ...coupler16_32, pitch: { system: 'diametral', diametralPitch: 20, stubPitch: 40 } });
    expect(judgement.verdict).toBe('near_miss');
    expect(judgement.reasons[0]).toContain('other pitch');
  });

  it('calls another pressure angle a near miss (ANSI B92.1 defines 30°, 37.5° and 45° forms of one pitch)', () => {
    const judgement = judgeSpline({ teeth: 21, pitch: readFinderPitch('splinePitch', '16/32'), pressureAngleDeg: 45 }, coupler16_32);
    expect(judgement.verdict).toBe('near_miss');
    expect(judgement.reasons[0]).toBe('same teeth, other pressure angle: 45° asked, this is 30°');
  });

  it('calls a major-diameter fit against a side fit a near miss (ANSI B92.1 flat root side fit vs major diameter fit)', () => {
    const judgement = judgeSpline({ teeth: 21, pitch: readFinderPitch('splinePitch', '16/32'), fit: 'major' }, coupler16_32);
    expect(judgement.verdict).toBe('near_miss');
    expect(judgement.reasons[0]).toContain('other fit');
  });

  it('matches on teeth alone when the reader gives no pitch, and says what would rule out the rest (common practice: count first)', () => {
    const judgement = judgeSpline({ teeth: 21 }, coupler16_32);
    expect(judgement.verdict).toBe('match');
    expect(judgement.reasons[1]).toContain('pitch not given');
  });

  it('calls a recorded spline without a pitch a near miss when the reader gives one', () => {
    expect(judgeSpline({ teeth: 21, pitch: readFinderPitch('splinePitch', '16/32') }, { ...coupler16_32, pitch: null }).verdict).toBe('near_miss');
  });

  it('treats 1.25 and 1.250 as one module (ISO 4156 modules compared exactly in nanometres)', () => {
    const metric: RecordedSpline = { ...coupler16_32, pitch: { system: 'module', moduleMm: 1.25 } };
    expect(judgeSpline({ teeth: 21, pitch: readFinderPitch('splinePitch', 'module 1.250') }, metric).verdict).toBe('match');
  });

  it('names the field when a pitch cannot be read', () => {
    expect(() => readFinderPitch('splinePitch', 'sixteen')).toThrow(/^splinePitch: cannot read spline pitch/);
  });
});

describe('fit finder: units as people write them', () => {
  it('reads "0.750 in" and "19.05 mm" as the same exact length (1 in = 25.4 mm exactly, NIST SP 811)', () => {
    expect(readFinderLength('diameter', '0.750 in').nm).toBe(19_050_000);
    expect(readFinderLength('diameter', '19.05 mm').nm).toBe(19_050_000);
    expect(readFinderLength('diameter', '3/4"').nm).toBe(19_050_000);
    expect(readFinderLength('diameter', '0.750', 'in').unit).toBe('in');
  });

  it('refuses an unreadable or zero length, naming the field', () => {
    expect(() => readFinderLength('diameter', 'three quarters')).toThrow(/^diameter: cannot read/);
    expect(() => readFinderLength('lengthMin', '0 mm')).toThrow(/^lengthMin must be greater than zero/);
    expect(() => readFinderLength('diameter', '19.05')).toThrow(EngineError);
  });
});

describe('fit finder: diameters (ISO 286-2)', () => {
  // ISO 286-2, H7 over 10 up to 18 mm: +18 / 0 µm; g6: −6 / −17 µm (from memory, as in fits.spec.ts).
  const bearingBore = { name: 'bearing bore', role: 'hole' as const, nominalNm: 15_000_000, toleranceClass: 'H7' };

  it('matches a measured bore inside the reader\'s H7 at 15 mm (15.000 – 15.018 mm)', () => {
    const judgement = judgeDiameter({ sizeNm: 15_000_000, unit: 'mm', toleranceClass: 'H7' }, { ...bearingBore, readingsNm: [15_008_000] });
    expect(judgement.verdict).toBe('match');
    expect(judgement.reasons[1]).toBe('H7 at 15 mm is 15 mm – 15.018 mm (ISO 286-2)');
  });

  it('calls a measured bore above H7 a near miss: "diameter outside H7"', () => {
    const judgement = judgeDiameter({ sizeNm: 15_000_000, unit: 'mm', toleranceClass: 'H7' }, { ...bearingBore, readingsNm: [15_025_000] });
    expect(judgement.verdict).toBe('near_miss');
    expect(judgement.reasons[0]).toBe('diameter outside H7: bearing bore measured 15.025 mm');
  });

  it('judges an inch reading against millimetre data exactly: 0.5906 in = 15.00124 mm (1 in = 25.4 mm exactly)', () => {
    // 0.5906 in × 25.4 = 15.00124 mm exactly: a measured 15.00124 mm bore reads the same both ways.
    const judgement = judgeDiameter({ sizeNm: readFinderLength('diameter', '0.5906 in').nm, unit: 'in' }, { ...bearingBore, readingsNm: [15_001_240] });
    expect(judgement.verdict).toBe('match');
  });

  it('matches a reader\'s measured shaft within a recorded g6 shaft (14.983 – 14.994 mm) and refuses a hole class on a shaft', () => {
    const nose = { name: 'pilot nose', role: 'shaft' as const, nominalNm: 15_000_000, toleranceClass: 'g6', readingsNm: [] };
    expect(judgeDiameter({ sizeNm: 14_990_000, unit: 'mm' }, nose).verdict).toBe('match');
    expect(judgeDiameter({ sizeNm: 14_995_000, unit: 'mm' }, nose).verdict).toBe('near_miss');
    expect(judgeDiameter({ sizeNm: 15_000_000, unit: 'mm', toleranceClass: 'H7' }, nose).verdict).toBe('no_match');
  });

  it('leaves sizes well apart as no match (our near-size rule: 2 % of the size, at least 0.5 mm)', () => {
    expect(nearSizeWindowNm(15_000_000)).toBe(500_000);
    expect(nearSizeWindowNm(110_000_000)).toBe(2_200_000);
    expect(judgeDiameter({ sizeNm: 24_000_000, unit: 'mm', toleranceClass: 'H7' }, { ...bearingBore, readingsNm: [] }).verdict).toBe('no_match');
  });
});

describe('fit finder: a measured clearance against the reader\'s fit class', () => {
  // ISO 286-2 at 15 mm: H7/g6 clearance 6 to 35 µm (H7 +18/0, g6 −6/−17), from memory as in the demo guide.
  const interfaceAt15 = { name: 'pilot bearing on input shaft nose', nominalNm: 15_000_000, measured: true };

  it('matches a measured 7.5 – 10.5 µm clearance inside H7/g6', () => {
    const judgement = judgeClearance({ nominalNm: 15_000_000, unit: 'mm', hole: 'H7', shaft: 'g6' }, { ...interfaceAt15, clearanceMinNm: 7_500, clearanceMaxNm: 10_500 });
    expect(judgement.verdict).toBe('match');
    expect(judgement.reasons[1]).toBe('H7/g6 at 15 mm allows 0.006 mm to 0.035 mm (ISO 286-2)');
  });

  it('calls a measured 45 µm clearance a near miss against H7/g6, and a tighter class like H7/h6 (0 to 29 µm) too', () => {
    const loose = { ...interfaceAt15, clearanceMinNm: 40_000, clearanceMaxNm: 45_000 };
    const judgement = judgeClearance({ nominalNm: 15_000_000, unit: 'mm', hole: 'H7', shaft: 'g6' }, loose);
    expect(judgement.verdict).toBe('near_miss');
    expect(judgement.reasons[0]).toMatch(/^clearance outside H7\/g6/);
    expect(judgeClearance({ nominalNm: 15_000_000, unit: 'mm', hole: 'H7', shaft: 'h6' }, { ...interfaceAt15, clearanceMinNm: 7_500, clearanceMaxNm: 10_500 }).verdict).toBe('match');
    expect(judgeClearance({ nominalNm: 15_000_000, unit: 'mm', hole: 'H7', shaft: 'h6' }, { ...interfaceAt15, clearanceMinNm: 25_000, clearanceMaxNm: 30_000 }).verdict).toBe('near_miss');
  });

  it('is no match for another size', () => {
    expect(judgeClearance({ nominalNm: 24_000_000, unit: 'mm', hole: 'H7', shaft: 'g6' }, { ...interfaceAt15, clearanceMinNm: 7_500, clearanceMaxNm: 10_500 }).verdict).toBe('no_match');
  });
});

describe('fit finder: length windows', () => {
  // A slip shaft 520 – 565 mm against the reader's window (the demo driveshaft; invented numbers, worked by hand).
  const driveshaft = { name: 'driveshaft', lengthNm: 540_000_000, compressedNm: 520_000_000, extendedNm: 565_000_000 };

  it('matches a plunge range inside the window', () => {
    expect(judgeLength({ minNm: 515_000_000, maxNm: 570_000_000, unit: 'mm' }, driveshaft).verdict).toBe('match');
  });

  it('is a near miss 5 mm out (within 2 % of 540 mm = 10.8 mm) and no match 30 mm out', () => {
    const near = judgeLength({ minNm: 525_000_000, unit: 'mm' }, driveshaft);
    expect(near.verdict).toBe('near_miss');
    expect(near.reasons[0]).toBe('driveshaft reaches 520 mm, 5 mm shorter than your 525 mm');
    expect(judgeLength({ maxNm: 535_000_000, unit: 'mm' }, driveshaft).verdict).toBe('no_match');
  });

  it('works in inches exactly: 21.25 in = 539.75 mm', () => {
    const judgement = judgeLength({ minNm: readFinderLength('lengthMin', '20 in').nm, maxNm: readFinderLength('lengthMax', '22.25 in').nm, unit: 'in' }, driveshaft);
    expect(judgement.verdict).toBe('match');
    expect(judgeLength({ maxNm: readFinderLength('lengthMax', '21.25 in').nm, unit: 'in' }, { name: 'x', lengthNm: 539_750_000 }).verdict).toBe('match');
  });

  it('refuses a window without bounds or upside down', () => {
    expect(() => judgeLength({ unit: 'mm' }, driveshaft)).toThrow(EngineError);
    expect(() => judgeLength({ minNm: 2, maxNm: 1, unit: 'mm' }, driveshaft)).toThrow('lengthMin must not exceed lengthMax');
  });
});

describe('fit finder: ranking', () => {
  it('puts confirmed before bench-passed before open, and a recorded no-fit last', () => {
    const states = ['open', 'no_fit', 'confirmed', 'bench_pass'];
    expect([...states].sort((a, b) => finderStateRank(a) - finderStateRank(b))).toEqual(['confirmed', 'bench_pass', 'open', 'no_fit']);
  });
});
