import { EngineError } from './engine-error';

/**
 * Exact lengths.
 *
 * Every length is held as a whole number of nanometres (a safe-integer `number`).
 * 1 in = 25.4 mm exactly, so 1 in = 25 400 000 nm and a machinist's tenth (0.0001 in) is
 * exactly 2 540 nm: readings in tenths, thou, inches, millimetres and micrometres all
 * round-trip with no floating-point drift. Safe integers reach about 9 000 km, far beyond any part.
 *
 * Text is parsed digit by digit (never through parseFloat), so "1.2505 in" is exactly 31 762 700 nm.
 */

export const LENGTH_UNITS = ['mm', 'um', 'in', 'thou', 'tenths'] as const;

/** `um` is the micrometre (µm); `thou` is 0.001 in (also called a mil); `tenths` is 0.0001 in. */
export type LengthUnit = (typeof LENGTH_UNITS)[number];

/** Integer nanometres. */
export type Nanometres = number;

/** Exact size of one unit in nanometres. */
const NANOMETRES_PER_UNIT_EXACT: Readonly<Record<LengthUnit, bigint>> = {
  mm: 1_000_000n,
  um: 1_000n,
  in: 25_400_000n, // 25.4 mm exactly (international inch, 1959)
  thou: 25_400n,
  tenths: 2_540n,
};

export const NANOMETRES_PER_UNIT: Readonly<Record<LengthUnit, number>> = {
  mm: 1_000_000,
  um: 1_000,
  in: 25_400_000,
  thou: 25_400,
  tenths: 2_540,
};

const UNIT_LABELS: Readonly<Record<LengthUnit, string>> = {
  mm: 'mm',
  um: 'µm',
  in: 'in',
  thou: 'thou',
  tenths: 'tenths',
};

/** Spellings accepted after a number, lower-cased. */
const UNIT_SPELLINGS: ReadonlyMap<string, LengthUnit> = new Map<string, LengthUnit>([
  ...['mm', 'millimetre', 'millimetres', 'millimeter', 'millimeters'].map((s) => [s, 'mm'] as const),
  ...['um', 'µm', 'μm', 'micron', 'microns', 'micrometre', 'micrometres', 'micrometer', 'micrometers'].map(
    (s) => [s, 'um'] as const,
  ),
  ...['in', 'in.', 'inch', 'inches', '"', '″', '”'].map((s) => [s, 'in'] as const),
  ...['thou', 'mil', 'mils', 'thousandth', 'thousandths'].map((s) => [s, 'thou'] as const),
  ...['tenth', 'tenths'].map((s) => [s, 'tenths'] as const),
]);

export type UnitErrorCode = 'UNIT_PARSE' | 'UNIT_UNKNOWN' | 'UNIT_MISSING' | 'UNIT_NOT_WHOLE_NM' | 'UNIT_OUT_OF_RANGE';

export class UnitError extends EngineError {
  constructor(message: string, code: UnitErrorCode) {
    super(message, code);
  }
}

export function isLengthUnit(value: unknown): value is LengthUnit {
  return typeof value === 'string' && (LENGTH_UNITS as readonly string[]).includes(value);
}

export function unitLabel(unit: LengthUnit): string {
  return UNIT_LABELS[unit];
}

export interface ParsedLength {
  nanometres: Nanometres;
  /** The unit the value was written in (the text's own unit, else the default given). */
  unit: LengthUnit;
  /** Digits written after the decimal point ("0.0150" → 4); null for fractions such as "3/8". */
  decimalPlaces: number | null;
}

/** An exact rational value: numerator / denominator, denominator > 0. */
interface ExactValue {
  numerator: bigint;
  denominator: bigint;
  decimalPlaces: number | null;
}

// sign, then a mixed fraction ("1 3/8", "1-3/8"), a fraction ("3/8") or a decimal ("1.2505", ".5", "15.", "1e-3"),
// then an optional unit word or inch mark.
const LENGTH_PATTERN =
  /^(?<sign>[+\-\u2212])?\s*(?:(?<whole>\d+)(?:\s+|-)(?<mixedNum>\d+)\/(?<mixedDen>\d+)|(?<num>\d+)\/(?<den>\d+)|(?<decimal>(?:\d+(?:\.\d*)?|\.\d+)(?:e[+-]?\d+)?))\s*(?<unit>[a-zµμ"″”].*)?$/i;

/** Beyond this, an exponent cannot describe a part; it also bounds the bigint work. */
const MAX_EXPONENT = 30;

/**
 * Parse a written length such as "1.2505", "0.015 in", "25 mm", "15 thou", "3/8 in", `1 3/8"`, "22µm".
 * A unit written in the text wins; `defaultUnit` applies when the text names none.
 * Throws UnitError on unreadable text, an unknown unit, no unit at all, or a value that is
 * not a whole number of nanometres (e.g. "1/3 in").
 */
export function parseLength(text: string, defaultUnit?: LengthUnit): ParsedLength {
  const trimmed = text.trim();
  const match = LENGTH_PATTERN.exec(trimmed);
  if (!match?.groups) {
    throw new UnitError(
      `cannot read "${text}" as a length: write a number such as 1.2505, 3/8 or 1 3/8, optionally followed by a unit (mm, µm, in, thou, tenths)`,
      'UNIT_PARSE',
    );
  }
  const groups = match.groups;
  const unit = groups.unit === undefined ? defaultUnit : unitFromText(groups.unit, text);
  if (unit === undefined) {
    throw new UnitError(`"${text}" has no unit; write one (mm, µm, in, thou, tenths) or pass a default unit`, 'UNIT_MISSING');
  }

  let value: ExactValue;
  if (groups.whole !== undefined) {
    value = mixedFraction(groups.whole, groups.mixedNum ?? '', groups.mixedDen ?? '', text);
  } else if (groups.num !== undefined) {
    value = mixedFraction('0', groups.num, groups.den ?? '', text);
  } else {
    value = exactDecimal(groups.decimal ?? '', text);
  }
  const negative = groups.sign !== undefined && groups.sign !== '+';
  const nanometres = exactToNanometres(value, unit, text);
  return { nanometres: negative && nanometres !== 0 ? -nanometres : nanometres, unit, decimalPlaces: value.decimalPlaces };
}

function unitFromText(unitText: string, wholeText: string): LengthUnit {
  const unit = UNIT_SPELLINGS.get(unitText.trim().toLowerCase());
  if (unit === undefined) {
    throw new UnitError(
      `unknown unit "${unitText.trim()}" in "${wholeText}"; use mm, µm, in, thou (mil) or tenths`,
      'UNIT_UNKNOWN',
    );
  }
  return unit;
}

function mixedFraction(whole: string, numerator: string, denominator: string, text: string): ExactValue {
  const den = BigInt(denominator);
  if (den === 0n) throw new UnitError(`"${text}" divides by zero`, 'UNIT_PARSE');
  return { numerator: BigInt(whole) * den + BigInt(numerator), denominator: den, decimalPlaces: null };
}

/** "1.2505" → 12505/10000, split into integer and fraction digits; "1e-3" → 1/1000. */
function exactDecimal(decimal: string, text: string): ExactValue {
  const [mantissa = '', exponentText] = decimal.toLowerCase().split('e');
  const [integerDigits = '', fractionDigits = ''] = mantissa.split('.');
  const exponent = exponentText === undefined ? 0 : Number(exponentText);
  if (Math.abs(exponent) > MAX_EXPONENT) {
    throw new UnitError(`"${text}" is out of range for a length`, 'UNIT_OUT_OF_RANGE');
  }
  const digits = BigInt(`${integerDigits}${fractionDigits}` || '0');
  const scale = fractionDigits.length - exponent;
  return scale >= 0
    ? { numerator: digits, denominator: 10n ** BigInt(scale), decimalPlaces: scale }
    : { numerator: digits * 10n ** BigInt(-scale), denominator: 1n, decimalPlaces: 0 };
}

function exactToNanometres(value: ExactValue, unit: LengthUnit, text: string): Nanometres {
  const scaled = value.numerator * NANOMETRES_PER_UNIT_EXACT[unit];
  if (scaled % value.denominator !== 0n) {
    throw new UnitError(
      `"${text}" is not a whole number of nanometres in ${unitLabel(unit)}; round it to the instrument's resolution`,
      'UNIT_NOT_WHOLE_NM',
    );
  }
  return toSafeNanometres(scaled / value.denominator, text);
}

function toSafeNanometres(nanometres: bigint, text: string): Nanometres {
  const asNumber = Number(nanometres);
  if (!Number.isSafeInteger(asNumber)) {
    throw new UnitError(`"${text}" is out of range for a length`, 'UNIT_OUT_OF_RANGE');
  }
  return asNumber;
}

/**
 * Exact nanometres of `value` in `unit`. A number is read through its shortest decimal form
 * (what `String(value)` prints), so 0.0001 in → 2540 nm; a number that is not a whole number
 * of nanometres (0.1 + 0.2 mm) throws rather than being rounded silently.
 * A string may carry its own unit, which wins over `unit`.
 */
export function toNanometres(value: string | number, unit: LengthUnit): Nanometres {
  if (typeof value === 'number') {
    if (!Number.isFinite(value)) throw new UnitError(`${value} is not a length`, 'UNIT_PARSE');
    return parseLength(String(value), unit).nanometres;
  }
  return parseLength(value, unit).nanometres;
}

/** Nanometres expressed in `unit` as the nearest floating-point number (for arithmetic and charts, not storage). */
export function fromNanometres(nanometres: Nanometres, unit: LengthUnit): number {
  assertNanometres(nanometres);
  return nanometres / NANOMETRES_PER_UNIT[unit];
}

/** Convert a value between units; exact on the way in, nearest float on the way out. */
export function convert(value: string | number, from: LengthUnit, to: LengthUnit): number {
  return fromNanometres(toNanometres(value, from), to);
}

/**
 * Decimal places needed to show a step of `resolutionNm` in `unit`: the fewest places d with
 * 10^-d unit ≤ resolution. A 0.0001 in micrometer shows 4 places in inches, a 0.01 mm caliper
 * 2 places in millimetres, the same caliper 4 places in inches.
 */
export function decimalsForResolution(resolutionNm: Nanometres, unit: LengthUnit): number {
  assertNanometres(resolutionNm);
  if (resolutionNm <= 0) throw new UnitError('an instrument resolution must be greater than zero', 'UNIT_OUT_OF_RANGE');
  const perUnit = NANOMETRES_PER_UNIT_EXACT[unit];
  let decimals = 0;
  while (BigInt(resolutionNm) * 10n ** BigInt(decimals) < perUnit) decimals += 1;
  return decimals;
}

/**
 * The number alone, e.g. "0.0150": with `resolutionNm`, fixed decimals for that resolution
 * (trailing zeros kept, because they state the instrument's resolution); without it, the value
 * to the nearest nanometre's worth of decimals, trailing zeros dropped. Rounds half away from zero, exactly.
 */
export function formatLengthValue(nanometres: Nanometres, unit: LengthUnit, resolutionNm?: Nanometres): string {
  assertNanometres(nanometres);
  const decimals = decimalsForResolution(resolutionNm ?? 1, unit);
  const text = fixedDecimal(BigInt(nanometres), NANOMETRES_PER_UNIT_EXACT[unit], decimals);
  return resolutionNm === undefined && text.includes('.') ? text.replace(/\.?0+$/, '') : text;
}

/** The value with its unit label, e.g. "0.0150 in", "25.40 mm". */
export function formatLength(nanometres: Nanometres, unit: LengthUnit, resolutionNm?: Nanometres): string {
  return `${formatLengthValue(nanometres, unit, resolutionNm)} ${unitLabel(unit)}`;
}

/** numerator / denominator to `decimals` places, rounded half away from zero. */
function fixedDecimal(numerator: bigint, denominator: bigint, decimals: number): string {
  const negative = numerator < 0n;
  const magnitude = negative ? -numerator : numerator;
  const scale = 10n ** BigInt(decimals);
  const rounded = (magnitude * scale * 2n + denominator) / (denominator * 2n);
  const digits = rounded.toString().padStart(decimals + 1, '0');
  const integerPart = digits.slice(0, digits.length - decimals);
  const fractionPart = digits.slice(digits.length - decimals);
  const body = decimals > 0 ? `${integerPart}.${fractionPart}` : integerPart;
  return negative && rounded !== 0n ? `-${body}` : body;
}

function assertNanometres(nanometres: number): void {
  if (!Number.isSafeInteger(nanometres)) {
    throw new UnitError(`${nanometres} is not a whole number of nanometres`, 'UNIT_NOT_WHOLE_NM');
  }
}
