import fc from 'fast-check';
import { checkLengthWindow, LengthWindowError, LengthWindowInput } from './length-window';
import { toNanometres } from './units';

const mm = (value: number | string) => toNanometres(value, 'mm');

/**
 * Source: the definitions in length-window.ts (travel left = installed extreme vs the part's own
 * extreme), worked by hand below; leaving travel at both ends is common practice for slip joints.
 * Inch figures use 1 in = 25.4 mm exactly (NIST SP 811, Appendix B.8).
 */
const DRIVESHAFT: LengthWindowInput = {
  assembled: { compressedNm: mm(600), extendedNm: mm(650) },
  installed: { minNm: mm(610), maxNm: mm(640) },
  margin: { compressionNm: mm(5), extensionNm: mm(5) },
};

describe('checkLengthWindow', () => {
  it('passes with travel left each way above the margin', () => {
    // 610 − 600 = 10 mm compression left; 650 − 640 = 10 mm extension left; margins 5 mm.
    expect(checkLengthWindow(DRIVESHAFT)).toEqual({
      status: 'pass',
      compressionLeftNm: mm(10),
      extensionLeftNm: mm(10),
      plungeAvailableNm: mm(50),
      travelNeededNm: mm(30),
      reasons: [
        'compression left at the shortest installed length: 10 mm (margin 5 mm)',
        'extension left at the longest installed length: 10 mm (margin 5 mm)',
      ],
    });
  });

  it('passes with exactly the margin left (the margin is a minimum)', () => {
    const result = checkLengthWindow({ ...DRIVESHAFT, margin: { compressionNm: mm(10), extensionNm: mm(10) } });
    expect(result.status).toBe('pass');
  });

  it('fails when the part bottoms out at the shortest installed length', () => {
    // 598 − 600 = −2 mm: the part needs 2 mm more compression than it has.
    const result = checkLengthWindow({ ...DRIVESHAFT, installed: { minNm: mm(598), maxNm: mm(640) } });
    expect(result).toMatchObject({ status: 'fail', compressionLeftNm: -mm(2) });
    expect(result.reasons).toEqual(['bottoms out: at the shortest installed length it needs 2 mm more compression than it has']);
  });

  it('fails when the part pulls apart at the longest installed length', () => {
    // 650 − 652.5 = −2.5 mm.
    const result = checkLengthWindow({ ...DRIVESHAFT, installed: { minNm: mm(610), maxNm: mm('652.5') } });
    expect(result.extensionLeftNm).toBe(-mm('2.5'));
    expect(result.reasons).toEqual(['pulls apart: at the longest installed length it needs 2.5 mm more extension than it has']);
  });

  it('fails when travel is left but less than the margin', () => {
    const result = checkLengthWindow({ ...DRIVESHAFT, margin: { compressionNm: mm(12), extensionNm: mm(3) } });
    expect(result.status).toBe('fail');
    expect(result.reasons).toEqual(['compression left at the shortest installed length is 10 mm, less than the 12 mm margin']);
  });

  it('says when no assembled length can cover the installed range', () => {
    // Installed range 60 mm, plunge 50 mm.
    const result = checkLengthWindow({ ...DRIVESHAFT, installed: { minNm: mm(595), maxNm: mm(655) } });
    expect(result.reasons[0]).toBe(
      'the installed length varies by 60 mm but the part plunges only 50 mm: no assembled length covers both ends',
    );
    expect(result.reasons).toHaveLength(3);
  });

  it('writes reasons in the display unit at its resolution', () => {
    // 10 mm = 0.3937 in to 0.0001 in (1 in = 25.4 mm exactly, NIST SP 811 App. B.8).
    const result = checkLengthWindow({ ...DRIVESHAFT, display: { unit: 'in', resolutionNm: toNanometres('0.0001', 'in') } });
    expect(result.reasons[0]).toBe('compression left at the shortest installed length: 0.3937 in (margin 0.1969 in)');
  });

  it('treats a fixed-length part and no margin correctly', () => {
    const result = checkLengthWindow({
      assembled: { compressedNm: mm(500), extendedNm: mm(500) },
      installed: { minNm: mm(500), maxNm: mm(500) },
    });
    expect(result).toMatchObject({ status: 'pass', compressionLeftNm: 0, extensionLeftNm: 0 });
  });

  it.each([
    [{ ...DRIVESHAFT, assembled: { compressedNm: mm(650), extendedNm: mm(600) } }, /compressed length/],
    [{ ...DRIVESHAFT, installed: { minNm: mm(640), maxNm: mm(610) } }, /shortest installed/],
    [{ ...DRIVESHAFT, margin: { compressionNm: -1 } }, /margins/],
    [{ ...DRIVESHAFT, installed: { minNm: 0.5, maxNm: mm(640) } }, /whole number/],
    [{ ...DRIVESHAFT, assembled: { compressedNm: 0, extendedNm: mm(650) } }, /greater than zero/],
  ])('rejects invalid input %#', (input, message) => {
    expect(() => checkLengthWindow(input)).toThrow(LengthWindowError);
    expect(() => checkLengthWindow(input)).toThrow(message);
  });

  it('property: passes exactly when both travels meet their margins; the travels add up', () => {
    const length = fc.integer({ min: 1, max: 2_000_000_000 });
    const margin = fc.integer({ min: 0, max: 50_000_000 });
    fc.assert(
      fc.property(length, length, length, length, margin, margin, (p1, p2, i1, i2, marginC, marginE) => {
        const result = checkLengthWindow({
          assembled: { compressedNm: Math.min(p1, p2), extendedNm: Math.max(p1, p2) },
          installed: { minNm: Math.min(i1, i2), maxNm: Math.max(i1, i2) },
          margin: { compressionNm: marginC, extensionNm: marginE },
        });
        expect(result.status === 'pass').toBe(result.compressionLeftNm >= marginC && result.extensionLeftNm >= marginE);
        expect(result.compressionLeftNm + result.extensionLeftNm).toBe(result.plungeAvailableNm - result.travelNeededNm);
        expect(result.reasons.length).toBeGreaterThan(0);
      }),
    );
  });
});
