import fc from 'fast-check';
import { checkSplinePair, parseSplinePitch, pitchDiameterNm, SplineError, SplinePitch, SplineSpec } from './splines';
import { toNanometres } from './units';

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
});
