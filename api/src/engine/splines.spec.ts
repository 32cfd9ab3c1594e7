import fc from 'fast-check';
import {
  checkSplinePair,
  identifySpline,
  MAX_PITCH_TEXT_LENGTH,
  parseSplinePitch,
  pitchDiameterNm,
  splineBasicDimensions,
  SplineDesignation,
  SplineError,
  SplinePitch,
  SplineSpec,
  standardDesignations,
} from './splines';
import { NANOMETRES_PER_UNIT, toNanometres } from './units';

const DP_16_32: SplinePitch = { system: 'diametral', diametralPitch: 16, stubPitch: 32 };
const DP_20_40: SplinePitch = { system: 'diametral', diametralPitch: 20, stubPitch: 40 };
const MODULE_1_25: SplinePitch = { system: 'module', moduleMm: 1.25 };

function spline(overrides: Partial<SplineSpec>): SplineSpec {
  return { teeth: 21, kind: 'external', pitch: DP_16_32, pressureAngleDeg: 30, ...overrides };
}

describe('pitchDiameterNm', () => {
  it('16/32 DP, 21 teeth → 1.3125 in', () => {
    // ANSI B92.1: D = N / P, where P is the numerator of the fractional pitch (16 for 16/32;
    // 32 is the stub pitch, which sets tooth depth, not the pitch diameter). 21 / 16 = 1.3125 in.
    expect(pitchDiameterNm({ teeth: 21, pitch: DP_16_32 })).toBe(toNanometres('1.3125', 'in'));
  });

  it('16/32 DP, 27 teeth → 1.6875 in', () => {
    // ANSI B92.1: D = N / P = 27 / 16.
    expect(pitchDiameterNm({ teeth: 27, pitch: DP_16_32 })).toBe(toNanometres('1.6875', 'in'));
  });

  it('module 1.25, 21 teeth → 26.25 mm; module 2, 27 teeth → 54 mm', () => {
    // ISO 4156: D = m · N.
    expect(pitchDiameterNm({ teeth: 21, pitch: MODULE_1_25 })).toBe(toNanometres('26.25', 'mm'));
    expect(pitchDiameterNm({ teeth: 27, pitch: { system: 'module', moduleMm: 2 } })).toBe(toNanometres(54, 'mm'));
  });

  it('rejects impossible inputs', () => {
    expect(() => pitchDiameterNm({ teeth: 0, pitch: DP_16_32 })).toThrow(SplineError);
    expect(() => pitchDiameterNm({ teeth: 2.5, pitch: DP_16_32 })).toThrow(SplineError);
    expect(() => pitchDiameterNm({ teeth: 21, pitch: { system: 'module', moduleMm: -1 } })).toThrow(SplineError);
  });
});

describe('checkSplinePair', () => {
  it('passes a matching internal/external pair and gives the shared pitch diameter', () => {
    const result = checkSplinePair(spline({ kind: 'internal', name: 'coupler' }), spline({ kind: 'external', name: 'shaft' }));
    expect(result.status).toBe('match');
    expect(result.summary).toBe('teeth and pitch match');
    expect(result.pitchDiameterNm).toBe(33_337_500); // 1.3125 in (ANSI B92.1: D = N/P)
    expect(result.reasons).toEqual([
      'one internal and one external',
      '21 teeth on both',
      'both 16/32 diametral pitch (ANSI B92.1)',
      'pitch diameter 1.3125 in',
    ]);
    expect(result.notes).toEqual([]);
  });

  it('never passes mismatched tooth counts (21 vs 27)', () => {
    const result = checkSplinePair(spline({ kind: 'internal' }), spline({ teeth: 27 }));
    expect(result.status).toBe('no_match');
    expect(result.reasons).toEqual(['tooth counts differ: first has 21, second has 27']);
  });

  it('needs one internal and one external', () => {
    const result = checkSplinePair(spline({}), spline({}));
    expect(result.status).toBe('no_match');
    expect(result.reasons[0]).toMatch(/both splines are external/);
  });

  it('never passes mismatched pitch systems (ANSI B92.1 vs ISO 4156)', () => {
    const result = checkSplinePair(spline({ kind: 'internal' }), spline({ pitch: MODULE_1_25 }));
    expect(result.status).toBe('no_match');
    expect(result.reasons).toEqual(['pitch systems differ: 16/32 diametral pitch (ANSI B92.1) and module 1.25 (ISO 4156)']);
  });

  it('never passes mismatched pitches or stub pitches', () => {
    expect(checkSplinePair(spline({ kind: 'internal' }), spline({ pitch: DP_20_40 })).status).toBe('no_match');
    expect(checkSplinePair(spline({ kind: 'internal', pitch: MODULE_1_25 }), spline({ pitch: { system: 'module', moduleMm: 1.5 } })).status).toBe('no_match');
    const stub = checkSplinePair(spline({ kind: 'internal' }), spline({ pitch: { system: 'diametral', diametralPitch: 16, stubPitch: 24 } }));
    expect(stub.status).toBe('no_match');
    expect(stub.reasons[0]).toMatch(/stub pitches/);
  });

  it('never passes mismatched pressure angles', () => {
    const result = checkSplinePair(spline({ kind: 'internal' }), spline({ pressureAngleDeg: 45 }));
    expect(result.status).toBe('no_match');
    expect(result.reasons).toEqual(['pressure angles differ: 30° and 45°']);
  });

  it("a pitch missing on one side is 'unknown pitch, teeth match', not a pass", () => {
    const result = checkSplinePair(spline({ kind: 'internal', name: 'coupler' }), spline({ pitch: null, name: 'motor shaft' }));
    expect(result.status).toBe('unknown_pitch');
    expect(result.summary).toBe('unknown pitch, teeth match');
    expect(result.reasons).toContain('pitch not recorded for motor shaft');
    expect(result.pitchDiameterNm).toBeNull();
  });

  it('a missing pitch does not hide a tooth-count mismatch', () => {
    expect(checkSplinePair(spline({ kind: 'internal', pitch: undefined }), spline({ teeth: 27, pitch: undefined })).status).toBe('no_match');
  });

  it('notes, without failing, what could not be compared', () => {
    const result = checkSplinePair(
      spline({ kind: 'internal', pressureAngleDeg: undefined }),
      spline({ pitch: { system: 'diametral', diametralPitch: 16 } }),
    );
    expect(result.status).toBe('match');
    expect(result.notes).toEqual([
      'pressure angle not compared: not recorded for first',
      'stub pitch recorded on one side only; ANSI B92.1 standard pitches use twice the diametral pitch',
    ]);
  });

  it('rejects malformed specs', () => {
    expect(() => checkSplinePair(spline({ teeth: -3 }), spline({ kind: 'internal' }))).toThrow(SplineError);
  });

  it('property: only equal counts, opposite kinds and equal pitches pass; the order of the pair does not matter', () => {
    const pitch = fc.option(
      fc.oneof(
        fc.constantFrom(16, 20, 24).map((p): SplinePitch => ({ system: 'diametral', diametralPitch: p, stubPitch: 2 * p })),
        fc.constantFrom(1, 1.25, 2).map((m): SplinePitch => ({ system: 'module', moduleMm: m })),
      ),
      { nil: null },
    );
    const spec = fc.record({
      teeth: fc.integer({ min: 6, max: 40 }),
      kind: fc.constantFrom<'internal' | 'external'>('internal', 'external'),
      pitch,
      pressureAngleDeg: fc.constantFrom(30, 45),
    });
    fc.assert(
      fc.property(spec, spec, (a, b) => {
        const result = checkSplinePair(a, b);
        expect(checkSplinePair(b, a).status).toBe(result.status);
        const compatible = a.teeth === b.teeth && a.kind !== b.kind && a.pressureAngleDeg === b.pressureAngleDeg;
        if (result.status === 'match') {
          expect(compatible).toBe(true);
          expect(a.pitch).toEqual(b.pitch);
        }
        if (result.status === 'unknown_pitch') {
          expect(compatible).toBe(true);
          expect(a.pitch === null || b.pitch === null).toBe(true);
        }
        if (compatible && a.pitch !== null && b.pitch !== null && JSON.stringify(a.pitch) !== JSON.stringify(b.pitch)) {
          expect(result.status).toBe('no_match');
        }
      }),
    );
  });
});

describe('parseSplinePitch', () => {
  it.each([
    ['16/32', { system: 'diametral', diametralPitch: 16, stubPitch: 32 }], // ANSI B92.1 fractional pitch
    ['16/32 DP', { system: 'diametral', diametralPitch: 16, stubPitch: 32 }],
    ['2.5/5', { system: 'diametral', diametralPitch: 2.5, stubPitch: 5 }],
    ['20 DP', { system: 'diametral', diametralPitch: 20 }],
    ['m1.25', { system: 'module', moduleMm: 1.25 }], // ISO 4156 module
    ['module 2', { system: 'module', moduleMm: 2 }],
    ['1.5 module', { system: 'module', moduleMm: 1.5 }],
  ] as const)('"%s"', (text, expected) => {
    expect(parseSplinePitch(text)).toEqual(expected);
  });

  it.each(['', 'fine', '16', '16/', 'm'])('rejects "%s"', (text) => {
    expect(() => parseSplinePitch(text)).toThrow(SplineError);
  });

  it('refuses text longer than a pitch before any pattern runs, so any input is read in linear time', () => {
    expect(() => parseSplinePitch('1'.repeat(1_000_000))).toThrow(new RegExp(`at most ${MAX_PITCH_TEXT_LENGTH} characters`));
    expect(() => parseSplinePitch(`${' '.repeat(30)}16/32`)).not.toThrow();
  });
});

/*
 * Worked examples for the basic dimensions. Each expected value is worked by hand from the
 * standard's equations (written beside it); the equations themselves are recalled from ANSI B92.1
 * ("Equations for involute spline basic dimensions") and ISO 4156-1 / ANSI B92.2M (basic
 * dimensions for es = 0), i.e. from memory, not copied from a table of results.
 */
function dims(designation: Partial<SplineDesignation> & Pick<SplineDesignation, 'teeth' | 'pitch'>) {
  const result = splineBasicDimensions({ pressureAngle: 30, root: 'flat', fit: 'side', ...designation });
  const values = Object.fromEntries(Object.entries(result.dimensions).map(([name, length]) => [name, length.value]));
  return { result, values };
}

const INCH_PRECISION = 6; // toBeCloseTo digits: hand working to 7 places, the engine to the nearest nanometre (≈ 4e-8 in)
const MM_PRECISION = 5;

describe('splineBasicDimensions: ANSI B92.1 (inch)', () => {
  it('21T 16/32 30° flat root side fit', () => {
    const { result, values } = dims({ teeth: 21, pitch: DP_16_32 });
    expect(result.unit).toBe('in');
    expect(result.designation).toBe('21T 16/32 DP 30° flat root side fit (ANSI B92.1)');
    expect(values.pitchDiameter).toBe(1.3125); // D = N/P = 21/16
    expect(values.baseDiameter).toBeCloseTo(1.1366583, INCH_PRECISION); // Db = D cos 30° = 1.3125 × 0.8660254
    expect(values.circularPitch).toBeCloseTo(0.1963495, INCH_PRECISION); // p = π/P = 3.1415927/16
    expect(values.basicSpaceWidth).toBeCloseTo(0.0981748, INCH_PRECISION); // E = π/(2P) = 3.1415927/32
    expect(values.basicToothThickness).toBeCloseTo(0.0981748, INCH_PRECISION); // T = p − E = π/(2P)
    expect(values.internalMajorDiameter).toBe(1.396875); // Dri = (N + 1.35)/P = 22.35/16
    expect(values.externalMajorDiameter).toBe(1.375); // Do = (N + 1)/P = 22/16
    expect(values.internalMinorDiameter).toBe(1.25); // Di = (N − 1)/P = 20/16
    expect(values.externalMinorDiameter).toBe(1.228125); // Dre = (N − 1.35)/P = 19.65/16
    expect(values.formClearance).toBe(0.002); // cF = 0.001 D = 0.0013125, raised to the 0.002 minimum
    expect(values.internalFormDiameter).toBe(1.379); // DFi = (N + 1)/P + 2cF = 1.375 + 0.004
    expect(values.externalFormDiameter).toBe(1.246); // DFe = (N − 1)/P − 2cF = 1.25 − 0.004
    // Exact conversion: 1.375 in × 25.4 mm/in = 34.925 mm.
    expect(result.dimensions.externalMajorDiameter.converted).toEqual({ value: 34.925, unit: 'mm' });
  });

  it('30T 8/16 30° fillet root side fit: cF inside its 0.002–0.010 in bounds', () => {
    const { values } = dims({ teeth: 30, pitch: { system: 'diametral', diametralPitch: 8 }, root: 'fillet' });
    expect(values.pitchDiameter).toBe(3.75); // 30/8
    expect(values.formClearance).toBe(0.00375); // 0.001 × 3.75, between 0.002 and 0.010
    expect(values.internalMajorDiameter).toBe(3.975); // (30 + 1.8)/8
    expect(values.externalMinorDiameter).toBe(3.525); // (30 − 1.8)/8
    expect(values.internalFormDiameter).toBe(3.8825); // 31/8 + 2 × 0.00375
    expect(values.externalFormDiameter).toBe(3.6175); // 29/8 − 2 × 0.00375
  });

  it('cF stops at 0.010 in on a large spline (60T 2.5/5: D = 24 in)', () => {
    const { values } = dims({ teeth: 60, pitch: { system: 'diametral', diametralPitch: 2.5 }, root: 'fillet' });
    expect(values.pitchDiameter).toBe(24); // 60/2.5
    expect(values.formClearance).toBe(0.01); // 0.001 × 24 = 0.024, capped at 0.010
  });

  it('21T 16/32 30° flat root major-diameter fit', () => {
    const { values } = dims({ teeth: 21, pitch: DP_16_32, fit: 'major' });
    expect(values.internalMajorDiameter).toBe(1.375); // Dri = (N + 1)/P = 22/16: the hub is sized on the major diameter
    expect(values.externalMajorDiameter).toBe(1.375); // Do = (N + 1)/P
    expect(values.internalFormDiameter).toBe(1.3625); // DFi = (N + 0.8)/P − 0.004 + 2cF = 21.8/16 − 0.004 + 0.004
  });

  it('24T 20/40 45° fillet root: wider space width, shorter teeth', () => {
    const { values } = dims({ teeth: 24, pitch: DP_20_40, pressureAngle: 45, root: 'fillet' });
    expect(values.pitchDiameter).toBe(1.2); // 24/20
    expect(values.baseDiameter).toBeCloseTo(0.8485281, INCH_PRECISION); // 1.2 × cos 45° = 1.2 × 0.7071068
    expect(values.basicSpaceWidth).toBeCloseTo(0.0835398, INCH_PRECISION); // (π/2 + 0.1)/P = 1.6707963/20
    expect(values.basicToothThickness).toBeCloseTo(0.0735398, INCH_PRECISION); // π/20 − 0.0835398 = 0.1570796 − 0.0835398
    expect(values.internalMajorDiameter).toBe(1.27); // (N + 1.4)/P = 25.4/20
    expect(values.externalMajorDiameter).toBe(1.25); // (N + 1)/P = 25/20
    expect(values.internalMinorDiameter).toBe(1.17); // (N − 0.6)/P = 23.4/20
    expect(values.externalMinorDiameter).toBe(1.15); // (N − 1)/P = 23/20
    expect(values.externalFormDiameter).toBe(1.166); // (N − 0.6)/P − 2cF = 1.17 − 0.004
  });

  it('37.5° fillet root: the external minor diameter changes between 12/24 and 16/32 pitch', () => {
    expect(dims({ teeth: 20, pitch: { system: 'diametral', diametralPitch: 12 }, pressureAngle: 37.5, root: 'fillet' }).values.externalMinorDiameter).toBeCloseTo(
      1.5583333, // (N − 1.3)/P = 18.7/12
      INCH_PRECISION,
    );
    const fine = dims({ teeth: 20, pitch: DP_16_32, pressureAngle: 37.5, root: 'fillet' }).values;
    expect(fine.externalMinorDiameter).toBe(1.175); // (N − 1.2)/P = 18.8/16
    expect(fine.internalMajorDiameter).toBe(1.35); // (N + 1.6)/P = 21.6/16
    expect(fine.internalMinorDiameter).toBe(1.2); // (N − 0.8)/P = 19.2/16
  });
});

describe('splineBasicDimensions: ISO 4156 / ANSI B92.2M (metric)', () => {
  it('21T m1.25 30° flat root', () => {
    const { result, values } = dims({ teeth: 21, pitch: MODULE_1_25 });
    expect(result.unit).toBe('mm');
    expect(result.standard).toBe('ISO 4156 / ANSI B92.2M');
    expect(values.pitchDiameter).toBe(26.25); // D = m z = 1.25 × 21
    expect(values.baseDiameter).toBeCloseTo(22.7331668, MM_PRECISION); // D cos 30° = 26.25 × 0.8660254
    expect(values.circularPitch).toBeCloseTo(3.9269908, MM_PRECISION); // π m
    expect(values.basicSpaceWidth).toBeCloseTo(1.9634954, MM_PRECISION); // 0.5 π m
    expect(values.basicToothThickness).toBeCloseTo(1.9634954, MM_PRECISION); // 0.5 π m
    expect(values.internalMajorDiameter).toBe(28.125); // Dei min = m (z + 1.5) = 1.25 × 22.5
    expect(values.externalMajorDiameter).toBe(27.5); // Dee max = m (z + 1) = 1.25 × 22
    expect(values.externalMinorDiameter).toBe(24.375); // Die max = m (z − 1.5) = 1.25 × 19.5
    expect(values.formClearance).toBe(0.125); // cF = 0.1 m
    expect(values.internalFormDiameter).toBe(27.75); // DFi = m (z + 1) + 2cF = 27.5 + 0.25
    expect(values.externalFormDiameter).toBe(24.75); // basic rack: m (z − 1) − 2cF = 25 − 0.25
    expect(values.internalMinorDiameter).toBe(25); // Dii min = DFe + 2cF = 24.75 + 0.25
    // Exact conversion: 27.5 mm ÷ 25.4 mm/in = 1.08267717 in (to the nearest nanometre).
    expect(result.dimensions.externalMajorDiameter.converted.value).toBeCloseTo(1.0826772, INCH_PRECISION);
  });

  it('18T m2 37.5° and 24T m1 45° fillet root', () => {
    const angled = dims({ teeth: 18, pitch: { system: 'module', moduleMm: 2 }, pressureAngle: 37.5, root: 'fillet' }).values;
    expect(angled.internalMajorDiameter).toBe(38.8); // m (z + 1.4) = 2 × 19.4
    expect(angled.externalMajorDiameter).toBe(37.8); // m (z + 0.9) = 2 × 18.9
    expect(angled.externalMinorDiameter).toBe(33.2); // m (z − 1.4) = 2 × 16.6
    expect(angled.internalFormDiameter).toBe(38.2); // m (z + 0.9) + 2cF = 37.8 + 0.4
    expect(angled.externalFormDiameter).toBe(33.8); // m (z − 0.9) − 2cF = 34.2 − 0.4
    const fine = dims({ teeth: 24, pitch: { system: 'module', moduleMm: 1 }, pressureAngle: 45, root: 'fillet' }).values;
    expect(fine.baseDiameter).toBeCloseTo(16.9705627, MM_PRECISION); // 24 × cos 45°
    expect(fine.internalMajorDiameter).toBe(25.2); // m (z + 1.2)
    expect(fine.externalMajorDiameter).toBe(24.8); // m (z + 0.8)
    expect(fine.externalMinorDiameter).toBe(22.8); // m (z − 1.2)
    expect(fine.internalMinorDiameter).toBe(23.2); // m (z − 0.8)
  });
});

describe('splineBasicDimensions: refuses what the standards do not define, naming the field', () => {
  it.each([
    [{ teeth: 21, pitch: DP_16_32, pressureAngle: 45 as const, root: 'flat' as const }, /has no 45° flat root/],
    [{ teeth: 21, pitch: MODULE_1_25, fit: 'major' as const }, /ISO 4156 has no 30° flat root major fit/],
    [{ teeth: 21, pitch: { system: 'diametral' as const, diametralPitch: 48, stubPitch: 96 } }, /^pitch: .*2.5\/5 to 32\/64; got 48\/96/],
    [{ teeth: 21, pitch: { system: 'diametral' as const, diametralPitch: 14 } }, /^pitch: 14 is not an ANSI B92.1 diametral pitch/],
    [{ teeth: 21, pitch: { system: 'diametral' as const, diametralPitch: 16, stubPitch: 24 } }, /^pitch: ANSI B92.1 stub pitches/],
    [{ teeth: 21, pitch: { system: 'module' as const, moduleMm: 1.3 } }, /^pitch: module 1.3 is not an ISO 4156 module/],
    [{ teeth: 5, pitch: DP_16_32 }, /^teeth must be a whole number from 6 to 100/],
    [{ teeth: 20.5, pitch: DP_16_32 }, /^teeth/],
  ])('%o', (designation, message) => {
    expect(() => dims(designation)).toThrow(message);
  });
});

describe('identifySpline', () => {
  it('a 20-tooth shaft reading 26.67 mm is 20/40 DP, with m1.25 flagged as the swap pitfall', () => {
    // 20/40: Do = (20 + 1)/20 = 1.05 in = 26.67 mm exactly. m1.25: Dee = 1.25 × 21 = 26.25 mm, 0.42 mm (1.6 %) smaller.
    const result = identifySpline({ teeth: 20, feature: 'major', measuredNm: toNanometres('26.67', 'mm'), unit: 'mm' });
    const [best] = result.candidates;
    expect(best).toMatchObject({ pitch: '20/40', standard: 'ANSI B92.1', deviation: { value: 0, unit: 'mm' }, explainsReading: true });
    expect(best?.basicDiameter).toEqual({ value: 1.05, unit: 'in', converted: { value: 26.67, unit: 'mm' } });
    // All B92.1 forms of 20/40 share Do = (N + 1)/P, so they are one candidate.
    expect(best?.alsoFits).toEqual(expect.arrayContaining(['20T 20/40 DP 45° fillet root side fit (ANSI B92.1)']));
    const metric = result.candidates.find((candidate) => candidate.designation === '20T m1.25 30° flat root side fit (ISO 4156)');
    // Window for m1.25 with a 0.01 mm caliper: 0.005 + 0.1 × 1.25 = 0.13 mm < 0.42 mm.
    expect(metric).toMatchObject({ deviation: { value: 0.42, unit: 'mm' }, explainsReading: false });
    expect(result.pitfalls).toHaveLength(1);
    expect(result.pitfalls[0]).toMatch(/^inch\/metric swap: 20T 20\/40 DP .* and 20T m1.25 .* differ by only 0.42 mm/);
    expect(result.rule).toMatch(/Fitwright's own rule/);
  });

  it('ranks by the size of the deviation and says which designations explain the reading', () => {
    // 21T, 27.5 mm: m1.25 30° Dee = 1.25 × 22 = 27.5 (0); 20/40 Do = 22/20 = 1.1 in = 27.94 mm (−0.44).
    const result = identifySpline({ teeth: 21, feature: 'major', measuredNm: toNanometres('27.50', 'mm'), unit: 'mm' });
    const deviations = result.candidates.map((candidate) => Math.abs(candidate.deviation.value));
    expect(deviations).toEqual([...deviations].sort((a, b) => a - b));
    expect(result.candidates[0]).toMatchObject({ pitch: 'm1.25', pressureAngle: 30, explainsReading: true });
    expect(result.candidates.find((candidate) => candidate.pitch === '20/40')?.deviation.value).toBeCloseTo(-0.44, 9);
    expect(result.pitfalls[0]).toMatch(/m1.25 .* and 21T 20\/40 DP/);
    expect(result.candidates.length).toBeLessThanOrEqual(8);
  });

  it('reads a hub bore as the internal minor diameter, in inches', () => {
    // 21T 16/32: Di = (21 − 1)/16 = 1.25 in for every 30° form; 37.5° gives (21 − 0.8)/16 = 1.2625 in.
    const result = identifySpline({ teeth: 21, feature: 'minor', measuredNm: toNanometres('1.2505', 'in'), unit: 'in', resolutionNm: toNanometres('0.0001', 'in') });
    expect(result.measured).toEqual({ value: 1.2505, unit: 'in', resolution: 0.0001 });
    expect(result.candidates[0]).toMatchObject({ pitch: '16/32', pressureAngle: 30, deviation: { value: 0.0005, unit: 'in' }, explainsReading: true });
    expect(result.candidates[0]?.alsoFits).toHaveLength(2); // flat root major-diameter fit and fillet root share Di
    expect(result.candidates.find((candidate) => candidate.pitch === '16/32' && candidate.pressureAngle === 37.5)?.deviation.value).toBeCloseTo(-0.012, 9);
  });

  it('explains nothing far from every standard size, and still ranks', () => {
    const result = identifySpline({ teeth: 21, feature: 'major', measuredNm: toNanometres('30.00', 'mm'), unit: 'mm' });
    expect(result.candidates.length).toBeGreaterThan(0);
    expect(result.candidates.every((candidate) => !candidate.explainsReading)).toBe(true);
  });

  it('rejects a reading that is not a length above zero and a tooth count outside 6–100', () => {
    expect(() => identifySpline({ teeth: 21, feature: 'major', measuredNm: 0, unit: 'mm' })).toThrow(/majorDiameter/);
    expect(() => identifySpline({ teeth: 3, feature: 'major', measuredNm: 1_000_000, unit: 'mm' })).toThrow(/teeth/);
  });

  it('property: a reading at a designation\'s basic diameter puts a candidate with zero deviation first', () => {
    fc.assert(
      fc.property(fc.integer({ min: 6, max: 60 }), fc.nat(), fc.constantFrom<'major' | 'minor'>('major', 'minor'), (teeth, pick, feature) => {
        const designations = standardDesignations(teeth);
        const designation = designations[pick % designations.length];
        if (!designation) return;
        const dimensions = splineBasicDimensions(designation).dimensions;
        const basic = feature === 'major' ? dimensions.externalMajorDiameter : dimensions.internalMinorDiameter;
        const measuredNm = Math.round(basic.value * NANOMETRES_PER_UNIT[basic.unit]);
        const result = identifySpline({ teeth, feature, measuredNm, unit: basic.unit });
        expect(Math.abs(result.candidates[0]?.deviation.value ?? Number.NaN)).toBeLessThan(1e-6);
        expect(result.candidates[0]?.explainsReading).toBe(true);
      }),
    );
  });
});
