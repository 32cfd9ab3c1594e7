import fc from 'fast-check';
import { EngineError } from './engine-error';
import {
  convert,
  decimalsForResolution,
  formatLength,
  formatLengthValue,
  fromNanometres,
  isLengthUnit,
  LengthUnit,
  parseLength,
  toNanometres,
  UnitError,
  unitLabel,
} from './units';

/** k / 10^decimals written as an exact decimal string, e.g. (-5, 4) → "-0.0005". */
function decimalString(k: number, decimals: number): string {
  const digits = Math.abs(k).toString().padStart(decimals + 1, '0');
  const body = decimals === 0 ? digits : `${digits.slice(0, -decimals)}.${digits.slice(-decimals)}`;
  return k < 0 ? `-${body}` : body;
}

describe('exact unit definitions', () => {
  it('1 in = 25.4 mm exactly', () => {
    // NIST SP 811 (2008), Appendix B.8: inch (in) → metre: 2.54 E−02 exactly (1 in = 2.54 cm).
    expect(toNanometres(1, 'in')).toBe(25_400_000);
    expect(toNanometres(2.54, 'mm') * 10).toBe(toNanometres(1, 'in'));
  });

  it('1 thou (mil) = 0.001 in = 25.4 µm exactly', () => {
    // NIST SP 811 (2008), Appendix B.8: mil (0.001 in) → metre: 2.54 E−05 exactly.
    expect(toNanometres(1, 'thou')).toBe(25_400);
    expect(parseLength('1 mil').nanometres).toBe(25_400);
  });

  it('1 tenth = 0.0001 in = 2540 nm exactly', () => {
    // NIST SP 811 Appendix B.8 (1 in = 2.54 E−02 m exactly) scaled by 10^−4; "tenth" is machinist usage (common practice).
    expect(toNanometres(1, 'tenths')).toBe(2_540);
    expect(toNanometres('0.0001', 'in')).toBe(2_540);
  });

  it('1 mm = 1000 µm = 10^6 nm', () => {
    // SI prefixes (NIST SP 811, Section 4.3 / Table 5).
    expect(toNanometres(1, 'mm')).toBe(1_000_000);
    expect(toNanometres(1, 'um')).toBe(1_000);
  });

  it('labels and recognises units', () => {
    expect(unitLabel('um')).toBe('µm');
    expect(unitLabel('in')).toBe('in');
    expect(isLengthUnit('thou')).toBe(true);
    expect(isLengthUnit('cm')).toBe(false);
  });
});

describe('parseLength', () => {
  it.each([
    ['1.2505', 'in', 31_762_700, 'in', 4], // 1.2505 × 25 400 000
    ['0.015 in', undefined, 381_000, 'in', 3],
    ['25 mm', undefined, 25_000_000, 'mm', 0],
    ['15 thou', undefined, 381_000, 'thou', 0],
    ['3/8 in', undefined, 9_525_000, 'in', null],
    ['1 3/8"', undefined, 34_925_000, 'in', null],
    ['1-3/8 inch', undefined, 34_925_000, 'in', null],
    ['22µm', undefined, 22_000, 'um', 0], // U+00B5 micro sign
    ['22 μm', undefined, 22_000, 'um', 0], // U+03BC Greek mu
    ['22 microns', undefined, 22_000, 'um', 0],
    ['2 tenths', undefined, 5_080, 'tenths', 0],
    ['.5 thou', undefined, 12_700, 'thou', 1],
    ['-0.0005 in', undefined, -12_700, 'in', 4],
    ['\u22120.0005 in', undefined, -12_700, 'in', 4], // Unicode minus
    ['0.0150', 'in', 381_000, 'in', 4],
    ['25.40 mm', 'in', 25_400_000, 'mm', 2], // the text's own unit wins over the default
    ['1e-3 in', undefined, 25_400, 'in', 3],
  ] as const)('"%s" (default %s) → %s nm', (text, defaultUnit, nanometres, unit, decimalPlaces) => {
    expect(parseLength(text, defaultUnit)).toEqual({ nanometres, unit, decimalPlaces });
  });

  it('never returns −0', () => {
    expect(Object.is(parseLength('-0 mm').nanometres, 0)).toBe(true);
  });

  it.each([
    ['', 'UNIT_PARSE'],
    ['abc', 'UNIT_PARSE'],
    ['1.2.3 mm', 'UNIT_PARSE'],
    ['1,5 mm', 'UNIT_PARSE'],
    ['5 cm', 'UNIT_UNKNOWN'],
    ['1.5', 'UNIT_MISSING'],
    ['1/3 in', 'UNIT_NOT_WHOLE_NM'], // 8 466 666.67 nm
    ['1.2345678 mm', 'UNIT_NOT_WHOLE_NM'], // 1 234 567.8 nm
    ['3/0 in', 'UNIT_PARSE'],
    ['1e400 mm', 'UNIT_OUT_OF_RANGE'],
    ['1000000000 in', 'UNIT_OUT_OF_RANGE'], // 2.54 × 10^16 nm, beyond a safe integer
  ])('rejects "%s" with %s', (text, code) => {
    expect(() => parseLength(text)).toThrow(UnitError);
    expect(() => parseLength(text)).toThrow(expect.objectContaining({ code }));
  });

  it('throws an EngineError with a clear message', () => {
    expect(() => parseLength('5 furlongs')).toThrow(EngineError);
    expect(() => parseLength('5 furlongs')).toThrow(/unknown unit "furlongs"/);
  });
});

describe('toNanometres / fromNanometres / convert', () => {
  it('reads numbers through their shortest decimal form', () => {
    expect(toNanometres(0.0001, 'in')).toBe(2_540);
    expect(toNanometres(1e-6, 'mm')).toBe(1);
    expect(toNanometres(-0.015, 'in')).toBe(-381_000);
  });

  it('refuses floating-point noise instead of rounding it away', () => {
    expect(() => toNanometres(0.1 + 0.2, 'mm')).toThrow(expect.objectContaining({ code: 'UNIT_NOT_WHOLE_NM' }));
    expect(() => toNanometres(Number.NaN, 'mm')).toThrow(UnitError);
    expect(() => toNanometres(1e21, 'mm')).toThrow(expect.objectContaining({ code: 'UNIT_OUT_OF_RANGE' }));
  });

  it('converts between units', () => {
    expect(convert(1, 'in', 'mm')).toBe(25.4); // NIST SP 811 Appendix B.8
    expect(convert('0.0004', 'in', 'um')).toBe(10.16);
    expect(convert(0.016, 'in', 'thou')).toBe(16);
    expect(convert(15, 'thou', 'tenths')).toBe(150);
    expect(convert(25.4, 'mm', 'in')).toBe(1);
    expect(fromNanometres(2_540, 'tenths')).toBe(1);
  });

  it('rejects non-integer nanometres', () => {
    expect(() => fromNanometres(1.5, 'mm')).toThrow(UnitError);
  });
});

describe('formatLength', () => {
  it('shows the decimals the instrument resolves', () => {
    expect(formatLength(381_000, 'in', 2_540)).toBe('0.0150 in'); // 0.0001 in micrometer
    expect(formatLength(25_400_000, 'mm', 10_000)).toBe('25.40 mm'); // 0.01 mm caliper
    expect(formatLength(25_400_000, 'in', 10_000)).toBe('1.0000 in'); // the same caliper read in inches
    expect(formatLength(22_000, 'um', 1_000)).toBe('22 µm');
    expect(formatLength(381_000, 'thou', 2_540)).toBe('15.0 thou');
  });

  it('without a resolution, shows the exact value without trailing zeros', () => {
    expect(formatLength(12_700, 'thou')).toBe('0.5 thou');
    expect(formatLength(2_540, 'in')).toBe('0.0001 in');
    expect(formatLength(25_000_000, 'mm')).toBe('25 mm');
    expect(formatLength(1, 'mm')).toBe('0.000001 mm');
  });

  it('rounds half away from zero, exactly, and never prints −0', () => {
    expect(formatLengthValue(5_000, 'mm', 10_000)).toBe('0.01');
    expect(formatLengthValue(-5_000, 'mm', 10_000)).toBe('-0.01');
    expect(formatLengthValue(4_999, 'mm', 10_000)).toBe('0.00');
    expect(formatLengthValue(-1_000, 'mm', 10_000)).toBe('0.00');
  });

  it('derives decimals from resolution', () => {
    expect(decimalsForResolution(2_540, 'in')).toBe(4);
    expect(decimalsForResolution(25_400, 'in')).toBe(3);
    expect(decimalsForResolution(10_000, 'mm')).toBe(2);
    expect(decimalsForResolution(1_000, 'um')).toBe(0);
    expect(decimalsForResolution(10_000, 'in')).toBe(4);
    expect(() => decimalsForResolution(0, 'mm')).toThrow(UnitError);
  });
});

describe('round-trip properties (fast-check)', () => {
  const count = fc.integer({ min: -1_000_000_000, max: 1_000_000_000 });

  it('a value in tenths → nm → tenths round-trips exactly', () => {
    fc.assert(
      fc.property(count, (tenths) => {
        const nm = toNanometres(tenths, 'tenths');
        expect(nm).toBe(tenths * 2_540);
        expect(fromNanometres(nm, 'tenths')).toBe(tenths);
      }),
    );
  });

  it('an inch reading to 4 decimals round-trips through nm, the display string and the number', () => {
    fc.assert(
      fc.property(count, (k) => {
        const text = decimalString(k, 4);
        const nm = parseLength(`${text} in`).nanometres;
        expect(nm).toBe(k * 2_540);
        expect(formatLengthValue(nm, 'in', 2_540)).toBe(text === '-0.0000' ? '0.0000' : text);
        expect(toNanometres(fromNanometres(nm, 'in'), 'in')).toBe(nm);
      }),
    );
  });

  it('a millimetre value with 3 decimals round-trips exactly', () => {
    fc.assert(
      fc.property(count, (k) => {
        const text = decimalString(k, 3);
        const nm = toNanometres(text, 'mm');
        expect(nm).toBe(k * 1_000);
        expect(formatLengthValue(nm, 'mm', 1_000)).toBe(text === '-0.000' ? '0.000' : text);
        expect(toNanometres(fromNanometres(nm, 'mm'), 'mm')).toBe(nm);
      }),
    );
  });

  it('thou with one decimal and whole micrometres round-trip exactly', () => {
    fc.assert(
      fc.property(count, fc.constantFrom<[LengthUnit, number, number]>(['thou', 1, 2_540], ['um', 0, 1_000]), (k, [unit, decimals, step]) => {
        const nm = toNanometres(decimalString(k, decimals), unit);
        expect(nm).toBe(k * step);
        expect(toNanometres(formatLengthValue(nm, unit, step), unit)).toBe(nm);
      }),
    );
  });

  it('any whole number of nanometres prints exactly in mm and µm and parses back', () => {
    fc.assert(
      fc.property(fc.integer({ min: -Number.MAX_SAFE_INTEGER, max: Number.MAX_SAFE_INTEGER }), fc.constantFrom<LengthUnit>('mm', 'um'), (nm, unit) => {
        expect(toNanometres(formatLengthValue(nm, unit), unit)).toBe(nm);
      }),
    );
  });

  it('tenths, thou and inches agree: 10 tenths = 1 thou, 1000 thou = 1 in', () => {
    fc.assert(
      fc.property(count, (k) => {
        expect(toNanometres(k * 10, 'tenths')).toBe(toNanometres(k, 'thou'));
        expect(toNanometres(decimalString(k, 3), 'in')).toBe(toNanometres(k, 'thou'));
      }),
    );
  });
});
