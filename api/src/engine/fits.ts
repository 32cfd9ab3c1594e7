import { EngineError } from './engine-error';
import {
  DELTA_UM,
  INTERMEDIATE_RANGE_UPPER_BOUNDS_MM,
  LowerDeviationShaftLetter,
  MAIN_RANGE_UPPER_BOUNDS_MM,
  MAX_IT_GRADE,
  MIN_IT_GRADE,
  SHAFT_LOWER_DEVIATIONS_UM,
  SHAFT_UPPER_DEVIATIONS_UM,
  STANDARD_TOLERANCES_UM,
  UpperDeviationShaftLetter,
} from './iso-286-tables';

/**
 * ISO 286-1/-2 limits and fits for nominal sizes up to 500 mm.
 *
 * Deviations are computed in integer nanometres and reported in micrometres. They are whole
 * micrometres except where the standard itself prints fractions: IT1/IT2 values, Δ for fine
 * grades (K4 at 3–6 mm is +0.5/−3.5) and js/JS of odd grades (js7 at 18–30 mm is ±10.5).
 *
 * J/j (the asymmetric "j" deviations) are not covered: the standard tabulates them separately
 * for a few grades only.
 */

export type FitKind = 'clearance' | 'transition' | 'interference';
export type FeatureKind = 'hole' | 'shaft';

export interface ToleranceZone {
  /** Upper deviation (ES for a hole, es for a shaft), µm. */
  upper: number;
  /** Lower deviation (EI for a hole, ei for a shaft), µm. */
  lower: number;
  itGrade: number;
  /** Fundamental-deviation letter(s) as written: "H", "g", "JS", "zc". */
  letter: string;
  feature: FeatureKind;
}

export interface Limits {
  upper: number;
  lower: number;
}

export interface Clearance {
  /** Largest hole minus smallest shaft, µm. */
  max: number;
  /** Smallest hole minus largest shaft, µm; negative means interference. */
  min: number;
}

export interface FitLimits {
  hole: Limits;
  shaft: Limits;
  clearance: Clearance;
  kind: FitKind;
  /** Which js/JS convention produced these numbers (stated in every answer, whatever the classes). */
  convention: FitConvention;
}

/**
 * js/JS limit deviations:
 * - 'none' (default): ±IT/2 exactly, as the limit-deviation tables of the current ISO 286-2 print them
 *   (js7 over 18 up to 30 mm: ±10.5 µm);
 * - 'even': the older practice of rounding odd IT7–IT11 values down to the even value below, so ±IT/2
 *   is a whole micrometre (js7 over 18 up to 30 mm: ±10 µm). Kept as an explicit option for old drawings.
 */
export type JsRounding = 'none' | 'even';

export interface FitOptions {
  jsRounding?: JsRounding;
}

export interface FitConvention {
  jsRounding: JsRounding;
  /** The convention in words, for a person reading the answer. */
  description: string;
}

export const JS_CONVENTION_DESCRIPTIONS: Readonly<Record<JsRounding, string>> = {
  none: 'js/JS = ±IT/2 exactly, as in the current ISO 286-2 tables',
  even: 'js/JS = ±IT/2 with odd IT7–IT11 rounded down to even (older practice)',
};

export function fitConvention(options: FitOptions = {}): FitConvention {
  const jsRounding = options.jsRounding ?? 'none';
  return { jsRounding, description: JS_CONVENTION_DESCRIPTIONS[jsRounding] };
}

export type FitErrorCode = 'FIT_UNKNOWN_CLASS' | 'FIT_NOT_DEFINED' | 'FIT_SIZE_OUT_OF_RANGE' | 'FIT_INVALID_CLEARANCE';

export class FitError extends EngineError {
  constructor(message: string, code: FitErrorCode) {
    super(message, code);
  }
}

export const MAX_NOMINAL_SIZE_MM = 500;

const UPPER_DEVIATION_SHAFT_LETTERS = Object.keys(SHAFT_UPPER_DEVIATIONS_UM) as UpperDeviationShaftLetter[];
const LOWER_DEVIATION_SHAFT_LETTERS = Object.keys(SHAFT_LOWER_DEVIATIONS_UM) as LowerDeviationShaftLetter[];

export interface ToleranceClass {
  text: string;
  feature: FeatureKind;
  /** Lower-case letter(s): holes and shafts share one table. */
  letter: string;
  grade: number;
}

interface ZoneNm {
  upper: number;
  lower: number;
}

/** Limit deviations of one tolerance class, e.g. toleranceZone(25, 'H7') → { upper: 21, lower: 0, ... }. */
export function toleranceZone(sizeMm: number, toleranceClass: string, options: FitOptions = {}): ToleranceZone {
  assertNominalSize(sizeMm);
  const parsed = parseToleranceClass(toleranceClass);
  const zone = parsed.feature === 'hole' ? holeZoneNm(sizeMm, parsed, options) : shaftZoneNm(sizeMm, parsed, options);
  return {
    upper: nmToUm(zone.upper),
    lower: nmToUm(zone.lower),
    itGrade: parsed.grade,
    letter: parsed.feature === 'hole' ? parsed.letter.toUpperCase() : parsed.letter,
    feature: parsed.feature,
  };
}

/**
 * Limits and clearances of a hole/shaft pair, e.g. 25 mm H7/g6 →
 * hole {21, 0}, shaft {−7, −20}, clearance {max 41, min 7}, 'clearance'.
 */
export function fitLimits(
  input: { sizeMm: number; hole: string; shaft: string },
  options: FitOptions = {},
): FitLimits {
  assertNominalSize(input.sizeMm);
  const holeClass = inField('hole', () => parseToleranceClass(input.hole));
  const shaftClass = inField('shaft', () => parseToleranceClass(input.shaft));
  if (holeClass.feature !== 'hole') {
    throw new FitError(`hole must be a hole class written in capitals, such as H7; got "${input.hole}"`, 'FIT_UNKNOWN_CLASS');
  }
  if (shaftClass.feature !== 'shaft') {
    throw new FitError(`shaft must be a shaft class written in lower case, such as g6; got "${input.shaft}"`, 'FIT_UNKNOWN_CLASS');
  }
  const hole = inField('hole', () => holeZoneNm(input.sizeMm, holeClass, options));
  const shaft = inField('shaft', () => shaftZoneNm(input.sizeMm, shaftClass, options));
  const clearance = { max: nmToUm(hole.upper - shaft.lower), min: nmToUm(hole.lower - shaft.upper) };
  return {
    hole: { upper: nmToUm(hole.upper), lower: nmToUm(hole.lower) },
    shaft: { upper: nmToUm(shaft.upper), lower: nmToUm(shaft.lower) },
    clearance,
    kind: classifyFit(clearance),
    convention: fitConvention(options),
  };
}

/** Runs one field's step, so a refusal starts with the field it is about ("shaft: t6 is not defined at 20 mm: …"). */
function inField<T>(field: 'hole' | 'shaft', step: () => T): T {
  try {
    return step();
  } catch (error) {
    if (error instanceof FitError && !error.message.startsWith(`${field} `)) {
      throw new FitError(`${field}: ${error.message}`, error.code as FitErrorCode);
    }
    throw error;
  }
}

/**
 * ISO 286-1 fit kinds: clearance when the minimum clearance is ≥ 0 (line-to-line still counts as
 * clearance), interference when the maximum clearance is ≤ 0, otherwise transition.
 */
export function classifyFit(clearance: Clearance): FitKind {
  if (!(clearance.min <= clearance.max)) {
    throw new FitError(
      `minimum clearance ${clearance.min} is greater than maximum clearance ${clearance.max}`,
      'FIT_INVALID_CLEARANCE',
    );
  }
  if (clearance.min >= 0) return 'clearance';
  if (clearance.max <= 0) return 'interference';
  return 'transition';
}

/** Standard tolerance ITn for a nominal size, µm (ISO 286-1 Table 1). */
export function standardTolerance(sizeMm: number, itGrade: number): number {
  assertNominalSize(sizeMm);
  assertGrade(itGrade, `IT${itGrade}`);
  return nmToUm(standardToleranceNm(sizeMm, itGrade));
}

/** The main ISO 286 size range a nominal size belongs to, e.g. 30 → { overMm: 18, upToMm: 30 }. */
export function sizeRange(sizeMm: number): { overMm: number; upToMm: number } {
  assertNominalSize(sizeMm);
  const index = rangeIndex(MAIN_RANGE_UPPER_BOUNDS_MM, sizeMm);
  return { overMm: index === 0 ? 0 : MAIN_RANGE_UPPER_BOUNDS_MM[index - 1], upToMm: MAIN_RANGE_UPPER_BOUNDS_MM[index] };
}

export function parseToleranceClass(text: string): ToleranceClass {
  const match = /^\s*([A-Za-z]{1,2})(\d{1,2})\s*$/.exec(text);
  if (!match) {
    throw new FitError(
      `"${text}" is not a tolerance class; write letter(s) and an IT grade, such as H7 (hole) or g6 (shaft)`,
      'FIT_UNKNOWN_CLASS',
    );
  }
  const [, letters = '', gradeText = ''] = match;
  const feature: FeatureKind | null =
    letters === letters.toUpperCase() ? 'hole' : letters === letters.toLowerCase() ? 'shaft' : null;
  const letter = letters.toLowerCase();
  if (feature === null) {
    throw new FitError(`"${text}" mixes capitals and lower case; holes are written H7, JS7 and shafts g6, js6`, 'FIT_UNKNOWN_CLASS');
  }
  if (letter === 'j') {
    throw new FitError(`"${text}": the J/j deviations are not supported; use JS/js or another letter`, 'FIT_UNKNOWN_CLASS');
  }
  if (!isKnownLetter(letter)) {
    throw new FitError(`"${text}": "${letters}" is not an ISO 286 fundamental deviation`, 'FIT_UNKNOWN_CLASS');
  }
  const grade = Number(gradeText);
  assertGrade(grade, text, gradeText);
  return { text: text.trim(), feature, letter, grade };
}

function isKnownLetter(letter: string): boolean {
  return letter === 'js' || isUpperDeviationShaftLetter(letter) || isLowerDeviationShaftLetter(letter);
}

function assertGrade(grade: number, text: string, gradeText = String(grade)): void {
  if (!Number.isInteger(grade) || grade < MIN_IT_GRADE || grade > MAX_IT_GRADE || gradeText.startsWith('0')) {
    throw new FitError(
      `"${text}": IT grade ${gradeText} is outside the supported grades IT${MIN_IT_GRADE} to IT${MAX_IT_GRADE}`,
      'FIT_UNKNOWN_CLASS',
    );
  }
}

function assertNominalSize(sizeMm: number): void {
  if (typeof sizeMm !== 'number' || !Number.isFinite(sizeMm) || sizeMm <= 0 || sizeMm > MAX_NOMINAL_SIZE_MM) {
    throw new FitError(
      `size must be greater than 0 mm and at most ${MAX_NOMINAL_SIZE_MM} mm (the ISO 286 tables); got ${String(sizeMm)} mm`,
      'FIT_SIZE_OUT_OF_RANGE',
    );
  }
}

/** Index of the range "over previous bound up to and including bound" that holds the size. */
function rangeIndex(upperBounds: readonly number[], sizeMm: number): number {
  return upperBounds.findIndex((bound) => sizeMm <= bound);
}

function umToNm(micrometres: number): number {
  // Table values have at most one decimal, so rounding removes only float noise.
  return Math.round(micrometres * 1000);
}

function nmToUm(nanometres: number): number {
  // `+ 0` turns a negated zero (−0) into 0 so results compare and serialise plainly.
  return nanometres / 1000 + 0;
}

function standardToleranceNm(sizeMm: number, grade: number): number {
  const row = STANDARD_TOLERANCES_UM[grade - MIN_IT_GRADE] ?? [];
  return umToNm(row[rangeIndex(MAIN_RANGE_UPPER_BOUNDS_MM, sizeMm)] ?? Number.NaN);
}

function deltaNm(sizeMm: number, grade: number, cls: ToleranceClass): number {
  if (grade < 3 || grade > 8) {
    throw notDefined(cls, sizeMm, 'ISO 286-1 gives Δ only for IT3 to IT8');
  }
  const row = DELTA_UM[grade as 3 | 4 | 5 | 6 | 7 | 8];
  return umToNm(row[rangeIndex(MAIN_RANGE_UPPER_BOUNDS_MM, sizeMm)] ?? Number.NaN);
}

function tabulatedDeviationNm(sizeMm: number, row: readonly (number | null)[], cls: ToleranceClass): number {
  const value = row[rangeIndex(INTERMEDIATE_RANGE_UPPER_BOUNDS_MM, sizeMm)];
  if (value === null || value === undefined) {
    throw notDefined(cls, sizeMm, `ISO 286-1 gives no ${cls.letter}/${cls.letter.toUpperCase()} deviation at this size`);
  }
  return umToNm(value);
}

function notDefined(cls: ToleranceClass, sizeMm: number, why: string): FitError {
  return new FitError(`${cls.text} is not defined at ${sizeMm} mm: ${why}`, 'FIT_NOT_DEFINED');
}

/** js/JS: ±IT/2 (current ISO 286-2), or on request the older rounding of odd IT7–IT11 values down to even. */
function symmetricZoneNm(sizeMm: number, grade: number, options: FitOptions): ZoneNm {
  const itNm = standardToleranceNm(sizeMm, grade);
  const roundToEven = (options.jsRounding ?? 'none') === 'even' && grade >= 7 && grade <= 11 && (itNm / 1000) % 2 === 1;
  const half = (roundToEven ? itNm - 1000 : itNm) / 2;
  return { upper: half, lower: -half };
}

function assertNotTooSmallForAB(sizeMm: number, cls: ToleranceClass): void {
  // ISO 286-1 footnote (from memory): a, b, A and B are not used for nominal sizes up to 1 mm.
  if ((cls.letter === 'a' || cls.letter === 'b') && sizeMm <= 1) {
    throw notDefined(cls, sizeMm, 'a, b, A and B are not used for nominal sizes up to 1 mm');
  }
}

function shaftZoneNm(sizeMm: number, cls: ToleranceClass, options: FitOptions): ZoneNm {
  const it = standardToleranceNm(sizeMm, cls.grade);
  const letter = cls.letter;
  if (letter === 'js') return symmetricZoneNm(sizeMm, cls.grade, options);
  if (isUpperDeviationShaftLetter(letter)) {
    assertNotTooSmallForAB(sizeMm, cls);
    const es = tabulatedDeviationNm(sizeMm, SHAFT_UPPER_DEVIATIONS_UM[letter], cls);
    return { upper: es, lower: es - it };
  }
  if (isLowerDeviationShaftLetter(letter)) {
    // k: the tabulated ei applies to IT4–IT7 only; finer and coarser k grades start at zero.
    const kHasTabulatedDeviation = cls.grade >= 4 && cls.grade <= 7;
    const ei = letter === 'k' && !kHasTabulatedDeviation ? 0 : tabulatedDeviationNm(sizeMm, SHAFT_LOWER_DEVIATIONS_UM[letter], cls);
    return { upper: ei + it, lower: ei };
  }
  throw new FitError(`"${cls.text}" is not a supported shaft class`, 'FIT_UNKNOWN_CLASS');
}

/**
 * Holes follow ISO 286-1 Table 3:
 * - A to H: EI = −es of the same shaft letter (general rule);
 * - K, M, N up to IT8 and P to ZC up to IT7: ES = −ei + Δ (special rule, so that e.g. H7/p6 and P7/h6 have the same clearances);
 * - coarser grades: ES = −ei, except K above IT8 (ES = 0, only tabulated up to 3 mm) and N above IT8 (ES = 0 above 3 mm).
 * The K/N exceptions and the M6 special case are from memory of ISO 286-1 Table 3 and its footnotes;
 * N9 = 0/−IT9 above 3 mm is also the common-practice keyway-width tolerance.
 */
function holeZoneNm(sizeMm: number, cls: ToleranceClass, options: FitOptions): ZoneNm {
  const it = standardToleranceNm(sizeMm, cls.grade);
  const letter = cls.letter;
  const grade = cls.grade;
  if (letter === 'js') return symmetricZoneNm(sizeMm, grade, options);
  if (isUpperDeviationShaftLetter(letter)) {
    assertNotTooSmallForAB(sizeMm, cls);
    const ei = -tabulatedDeviationNm(sizeMm, SHAFT_UPPER_DEVIATIONS_UM[letter], cls);
    return { upper: ei + it, lower: ei };
  }
  if (!isLowerDeviationShaftLetter(letter)) {
    throw new FitError(`"${cls.text}" is not a supported hole class`, 'FIT_UNKNOWN_CLASS');
  }
  if (grade < 3) {
    throw notDefined(cls, sizeMm, 'ISO 286-1 gives Δ only for IT3 to IT8, so hole letters K to ZC start at IT3');
  }
  const es = holeUpperDeviationNm(sizeMm, cls, letter);
  return { upper: es, lower: es - it };
}

function holeUpperDeviationNm(sizeMm: number, cls: ToleranceClass, letter: LowerDeviationShaftLetter): number {
  const grade = cls.grade;
  const shaftEi = tabulatedDeviationNm(sizeMm, SHAFT_LOWER_DEVIATIONS_UM[letter], cls);
  switch (letter) {
    case 'k':
      if (grade <= 8) return -shaftEi + deltaNm(sizeMm, grade, cls);
      if (sizeMm <= 3) return 0;
      throw notDefined(cls, sizeMm, 'ISO 286-1 tabulates K coarser than IT8 only up to 3 mm');
    case 'm':
      // ISO 286-1 special case: M6 over 250 up to 315 mm has ES = −9 µm, not −11 µm.
      if (grade === 6 && sizeMm > 250 && sizeMm <= 315) return -9000;
      return grade <= 8 ? -shaftEi + deltaNm(sizeMm, grade, cls) : -shaftEi;
    case 'n':
      if (grade <= 8) return -shaftEi + deltaNm(sizeMm, grade, cls);
      if (sizeMm <= 1) throw notDefined(cls, sizeMm, 'N coarser than IT8 is not used for nominal sizes up to 1 mm');
      // Up to 3 mm the table keeps ES = −4 µm; above 3 mm N coarser than IT8 has ES = 0.
      return sizeMm <= 3 ? -shaftEi : 0;
    default:
      return grade <= 7 ? -shaftEi + deltaNm(sizeMm, grade, cls) : -shaftEi;
  }
}

function isUpperDeviationShaftLetter(letter: string): letter is UpperDeviationShaftLetter {
  return (UPPER_DEVIATION_SHAFT_LETTERS as string[]).includes(letter);
}

function isLowerDeviationShaftLetter(letter: string): letter is LowerDeviationShaftLetter {
  return (LOWER_DEVIATION_SHAFT_LETTERS as string[]).includes(letter);
}
