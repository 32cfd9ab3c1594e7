import fc from 'fast-check';
import { measuredClearance, MeasuredFitError, whatIf } from './measured-fit';
import { toNanometres } from './units';

const TENTH_MICROMETER = toNanometres('0.0001', 'in'); // 2540 nm: a 0.0001 in micrometer
const CALIPER = toNanometres('0.01', 'mm'); // 10 000 nm: a 0.01 mm caliper

function reading(text: string, resolutionNm: number) {
  return { nanometres: toNanometres(text, 'mm'), resolutionNm };
}

describe('measuredClearance', () => {
  it("gives the clearance ± the sum of half-resolutions (Fitwright's own worst-case rule)", () => {
    // 1.2505 in bore, 1.2500 in shaft, both read to 0.0001 in: 0.0005 in ± 0.0001 in (1 in = 25.4 mm exactly, NIST SP 811 App. B.8).
    const result = measuredClearance({ bore: reading('1.2505 in', TENTH_MICROMETER), shaft: reading('1.2500 in', TENTH_MICROMETER) });
    expect(result).toEqual({ nominalNm: 12_700, minNm: 10_160, maxNm: 15_240, uncertaintyNm: 2_540, kind: 'clearance' });
  });

  it('counts a possible line-to-line fit as clearance, like ISO 286-1', () => {
    const result = measuredClearance({ bore: reading('25.00', CALIPER), shaft: reading('24.99', CALIPER) });
    expect(result).toMatchObject({ nominalNm: 10_000, minNm: 0, maxNm: 20_000, kind: 'clearance' });
  });

  it('says indeterminate when the instruments cannot tell clearance from interference', () => {
    const result = measuredClearance({ bore: reading('25.00', CALIPER), shaft: reading('25.00', CALIPER) });
    expect(result).toMatchObject({ nominalNm: 0, minNm: -10_000, maxNm: 10_000, kind: 'indeterminate' });
  });

  it('finds interference when every possible clearance is ≤ 0', () => {
    const result = measuredClearance({ bore: reading('24.98', CALIPER), shaft: reading('25.00', CALIPER) });
    expect(result).toMatchObject({ nominalNm: -20_000, maxNm: -10_000, kind: 'interference' });
  });

  it('carries mixed instruments through and rounds half-steps up', () => {
    const mixed = measuredClearance({ bore: reading('25.40', CALIPER), shaft: reading('0.9995 in', TENTH_MICROMETER) });
    expect(mixed.uncertaintyNm).toBe(6_270); // (10 000 + 2 540) / 2
    const odd = measuredClearance({ bore: { nanometres: 1_000, resolutionNm: 3 }, shaft: { nanometres: 900, resolutionNm: 2 } });
    expect(odd.uncertaintyNm).toBe(3); // 2.5 rounded up: the range only widens
  });

  it('rejects readings that are not positive whole nanometres', () => {
    expect(() => measuredClearance({ bore: { nanometres: 0, resolutionNm: 10 }, shaft: reading('1', CALIPER) })).toThrow(MeasuredFitError);
    expect(() => measuredClearance({ bore: reading('1', 0), shaft: reading('1', CALIPER) })).toThrow(/resolution/);
    expect(() => measuredClearance({ bore: { nanometres: 1.5, resolutionNm: 10 }, shaft: reading('1', CALIPER) })).toThrow(/whole number/);
  });

  it('property: min ≤ nominal ≤ max and the range is twice the uncertainty', () => {
    const size = fc.integer({ min: 1, max: 500_000_000 });
    const resolution = fc.integer({ min: 1, max: 100_000 });
    fc.assert(
      fc.property(size, resolution, size, resolution, (bore, boreRes, shaft, shaftRes) => {
        const result = measuredClearance({ bore: { nanometres: bore, resolutionNm: boreRes }, shaft: { nanometres: shaft, resolutionNm: shaftRes } });
        expect(result.minNm).toBeLessThanOrEqual(result.nominalNm);
        expect(result.nominalNm).toBeLessThanOrEqual(result.maxNm);
        expect(result.maxNm - result.minNm).toBe(2 * result.uncertaintyNm);
        expect(2 * result.uncertaintyNm).toBeGreaterThanOrEqual(boreRes + shaftRes);
      }),
    );
  });
});

describe('whatIf', () => {
  it('a part 0.0004 in larger takes 2.5 % of a 0.016 in clearance', () => {
    // DESIGN.md worked example; 0.0004 in = 10.16 µm = 0.4 thou (NIST SP 811 App. B.8: 1 in = 2.54 cm exactly).
    const result = whatIf({ clearanceNm: toNanometres('0.016', 'in'), deltaNm: toNanometres('0.0004', 'in') });
    expect(result).toEqual({
      clearanceNm: 406_400,
      deltaNm: 10_160,
      deltaUm: 10.16,
      deltaThou: 0.4,
      sharePercent: 2.5,
      remainingClearanceNm: 396_240,
      remainingKind: 'clearance',
    });
  });

  it('reports when a larger part uses up all the clearance', () => {
    const result = whatIf({ clearanceNm: toNanometres('0.0005', 'in'), deltaNm: toNanometres('0.0006', 'in') });
    expect(result).toMatchObject({ sharePercent: 120, remainingClearanceNm: -2_540, remainingKind: 'interference' });
    expect(whatIf({ clearanceNm: 10_000, deltaNm: 10_000 }).remainingKind).toBe('clearance'); // zero left still fits
  });

  it('a smaller part gives clearance back', () => {
    expect(whatIf({ clearanceNm: 20_000, deltaNm: -5_000 })).toMatchObject({ sharePercent: -25, remainingClearanceNm: 25_000 });
  });

  it('has no share of a clearance that is not positive', () => {
    expect(whatIf({ clearanceNm: 0, deltaNm: 1_000 }).sharePercent).toBeNull();
    expect(whatIf({ clearanceNm: -5_000, deltaNm: 1_000 }).sharePercent).toBeNull();
  });

  it('refuses a change that leaves a shaft size that is not positive (a size is greater than 0: common practice)', () => {
    // A 25 mm shaft made 25 mm smaller is 0 mm: no shaft; 24.999 mm smaller still leaves 1 µm.
    const shaftNm = toNanometres('25', 'mm');
    expect(() => whatIf({ clearanceNm: 20_000, deltaNm: -shaftNm, shaftNm })).toThrow(
      'delta must leave a shaft size greater than 0; the shaft measures 25 mm and the change is -25 mm',
    );
    expect(() => whatIf({ clearanceNm: 20_000, deltaNm: -shaftNm - 1_000, shaftNm })).toThrow(MeasuredFitError);
    expect(whatIf({ clearanceNm: 20_000, deltaNm: -shaftNm + 1_000, shaftNm }).remainingClearanceNm).toBe(20_000 + shaftNm - 1_000);
  });

  it('rejects fractional nanometres', () => {
    expect(() => whatIf({ clearanceNm: 0.5, deltaNm: 1 })).toThrow(MeasuredFitError);
  });

  it('property: share × clearance / 100 gives the delta back', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 10_000_000 }), fc.integer({ min: -10_000_000, max: 10_000_000 }), (clearanceNm, deltaNm) => {
        const result = whatIf({ clearanceNm, deltaNm });
        expect(((result.sharePercent ?? Number.NaN) * clearanceNm) / 100).toBeCloseTo(deltaNm, 6);
        expect(result.remainingClearanceNm + deltaNm).toBe(clearanceNm);
      }),
    );
  });
});
