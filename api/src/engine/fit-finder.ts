import { EngineError } from './engine-error';
import { fitLimits, parseToleranceClass, toleranceZone } from './fits';
import { checkSplinePair, describePitch, parseSplinePitch, type SplineKind, type SplinePitch } from './splines';
import { formatLengthValue, parseLength, unitLabel, type LengthUnit, type Nanometres } from './units';

/**
 * The fit finder's judgement of one recorded feature or interface against what a reader has.
 * It answers match, near miss (with the reason in trade words) or no match, by the same rules the
 * checklist uses: splines by tooth count, pitch and pressure angle (ANSI B92.1 / ISO 4156), diameters
 * against ISO 286 limits, measured clearances against the reader's fit class, lengths against a window.
 * Nothing here compares text: a 21-tooth spline never matches a 27-tooth one.
 */

/**
 * Lengths in reasons: to 0.00001 mm or 0.00001 in (a reading in tenths stays exact in millimetres:
 * 0.0001 in = 0.00254 mm), other units to the nanometre; trailing zeros dropped.
 */
const SHOWN_STEP_NM: Partial<Record<LengthUnit, Nanometres>> = { mm: 10, in: 254 };

export function showFinderLength(nanometres: Nanometres, unit: LengthUnit): string {
  const text = formatLengthValue(nanometres, unit, SHOWN_STEP_NM[unit]);
  return `${text.includes('.') ? text.replace(/\.?0+$/, '') : text} ${unitLabel(unit)}`;
}

export type FinderVerdict = 'match' | 'near_miss' | 'no_match';

export interface FinderJudgement {
  verdict: FinderVerdict;
  /** Why, in words a reader can act on ("same teeth, other pitch: …"). */
  reasons: string[];
}

/**
 * How far a size may be from the reader's and still be worth showing as a near miss: 2 % of the size,
 * at least 0.5 mm. Our rule (common practice: inch and metric near-equivalents, such as 0.750 in and
 * 19 mm, differ by 0.3 %; a part 2 % off is a different size, not a tolerance question).
 */
export const NEAR_SIZE_FRACTION = 0.02;
export const NEAR_SIZE_FLOOR_NM = 500_000;

export function nearSizeWindowNm(sizeNm: Nanometres): Nanometres {
  return Math.max(NEAR_SIZE_FLOOR_NM, Math.round(Math.abs(sizeNm) * NEAR_SIZE_FRACTION));
}

/** A length as a reader writes it ("0.750 in", "19.05 mm", `3/4"`), exactly in nanometres; field names the input. */
export function readFinderLength(field: string, text: string, defaultUnit?: LengthUnit): { nm: Nanometres; unit: LengthUnit } {
  try {
    const parsed = parseLength(text, defaultUnit);
    if (parsed.nanometres <= 0) throw new EngineError(`${field} must be greater than zero`, 'FINDER_INVALID');
    return { nm: parsed.nanometres, unit: parsed.unit };
  } catch (error) {
    if (error instanceof EngineError && !error.message.startsWith(field)) throw new EngineError(`${field}: ${error.message}`, error.code);
    throw error;
  }
}

/** A spline pitch as written ("16/32", "20 DP", "m1.25"); field names the input in a refusal. */
export function readFinderPitch(field: string, text: string): SplinePitch {
  try {
    return parseSplinePitch(text);
  } catch (error) {
    if (error instanceof EngineError) throw new EngineError(`${field}: ${error.message}`, error.code);
    throw error;
  }
}

// ---------------------------------------------------------------------------------------------
// Splines
// ---------------------------------------------------------------------------------------------

export type SplineFitType = 'side' | 'major';

export interface SplineQuery {
  teeth: number;
  pitch?: SplinePitch;
  pressureAngleDeg?: number;
  fit?: SplineFitType;
}

export interface RecordedSpline {
  name: string;
  teeth: number;
  gender: SplineKind;
  pitch: SplinePitch | null;
  pressureAngleDeg?: number | null;
  fit?: SplineFitType | null;
}

/**
 * Would the reader's spline mate with this recorded one? The reader's part is taken as the other
 * gender, so the engine's pair rules apply as they do on the checklist. Teeth that differ never
 * match and are not near misses either; the same teeth with another pitch, pressure angle or fit are.
 */
export function judgeSpline(query: SplineQuery, candidate: RecordedSpline): FinderJudgement {
  const readerGender: SplineKind = candidate.gender === 'internal' ? 'external' : 'internal';
  if (query.teeth !== candidate.teeth) {
    return { verdict: 'no_match', reasons: [`${candidate.teeth} teeth; yours has ${query.teeth}, and tooth counts must be equal`] };
  }
  const pair = checkSplinePair(
    { name: 'yours', teeth: query.teeth, kind: readerGender, pitch: query.pitch ?? null, pressureAngleDeg: query.pressureAngleDeg ?? null },
    { name: candidate.name, teeth: candidate.teeth, kind: candidate.gender, pitch: candidate.pitch, pressureAngleDeg: candidate.pressureAngleDeg ?? null },
  );
  const nearReasons: string[] = [];
  if (pair.status === 'no_match') {
    for (const reason of pair.reasons) {
      if (reason.includes('pitch')) nearReasons.push(`same teeth, other pitch: ${pitchWords(query.pitch)} asked, this is ${pitchWords(candidate.pitch)}`);
      else if (reason.startsWith('pressure angles')) {
        nearReasons.push(`same teeth, other pressure angle: ${query.pressureAngleDeg}° asked, this is ${candidate.pressureAngleDeg}°`);
      } else nearReasons.push(`same teeth, but ${reason}`);
    }
    return { verdict: 'near_miss', reasons: nearReasons };
  }
  if (query.fit && candidate.fit && query.fit !== candidate.fit) {
    return { verdict: 'near_miss', reasons: [`same teeth and pitch, other fit: ${query.fit} fit asked, this is a ${candidate.fit} fit`] };
  }
  if (pair.status === 'unknown_pitch') {
    if (query.pitch && !candidate.pitch) {
      return { verdict: 'near_miss', reasons: [`same teeth, pitch not recorded for ${candidate.name}: count and measure before relying on it`] };
    }
    return { verdict: 'match', reasons: [`${query.teeth} teeth`, `pitch not given: add it to rule out ${candidate.teeth}-tooth splines of another pitch`] };
  }
  return { verdict: 'match', reasons: pair.reasons.filter((reason) => !reason.startsWith('one internal')) };
}

function pitchWords(pitch: SplinePitch | null | undefined): string {
  return pitch ? describePitch(pitch) : 'no pitch';
}

// ---------------------------------------------------------------------------------------------
// Diameters and clearances
// ---------------------------------------------------------------------------------------------

export interface DiameterQuery {
  /** The size the reader gives: a nominal size with `toleranceClass`, or a size they measured. */
  sizeNm: Nanometres;
  unit: LengthUnit;
  /** An ISO 286 class (H7 for a bore, g6 for a shaft): the reader's part is made to it. */
  toleranceClass?: string;
}

export interface RecordedDiameter {
  name: string;
  role: 'hole' | 'shaft';
  nominalNm: Nanometres;
  toleranceClass?: string | null;
  maxNm?: Nanometres | null;
  minNm?: Nanometres | null;
  /** Readings of this feature, in nanometres. */
  readingsNm: readonly Nanometres[];
}

/** Where a recorded diameter lies: its readings if any, else its limits, else its nominal size. */
function candidateRange(candidate: RecordedDiameter): { lowNm: Nanometres; highNm: Nanometres; basis: string } {
  if (candidate.readingsNm.length > 0) {
    return { lowNm: Math.min(...candidate.readingsNm), highNm: Math.max(...candidate.readingsNm), basis: 'measured' };
  }
  const limits = limitsOf(candidate.nominalNm, candidate.toleranceClass ?? undefined, candidate.maxNm, candidate.minNm);
  if (limits) return { lowNm: limits.minNm, highNm: limits.maxNm, basis: candidate.toleranceClass ? `made to ${candidate.toleranceClass}` : 'by its limits' };
  return { lowNm: candidate.nominalNm, highNm: candidate.nominalNm, basis: 'nominal' };
}

function limitsOf(nominalNm: Nanometres, toleranceClass?: string, maxNm?: Nanometres | null, minNm?: Nanometres | null) {
  if (maxNm != null && minNm != null) return { maxNm, minNm };
  if (!toleranceClass) return null;
  const zone = toleranceZone(nominalNm / 1_000_000, toleranceClass);
  return { maxNm: nominalNm + zone.upper * 1000, minNm: nominalNm + zone.lower * 1000 };
}

/**
 * A reader's diameter against a recorded one of the same role. With a class, the recorded part's
 * size (measured, else its own limits) must lie within the reader's ISO 286 limits; without one, the
 * reader's measured size must lie within the recorded part's limits (or its readings).
 */
export function judgeDiameter(query: DiameterQuery, candidate: RecordedDiameter): FinderJudgement {
  const show = (nm: Nanometres) => showFinderLength(nm, query.unit);
  const near = nearSizeWindowNm(query.sizeNm);
  if (query.toleranceClass) {
    const readerClass = parseToleranceClass(query.toleranceClass);
    if ((readerClass.feature === 'hole') !== (candidate.role === 'hole')) {
      return { verdict: 'no_match', reasons: [`this is a ${candidate.role}; ${query.toleranceClass} is a ${readerClass.feature} class`] };
    }
    const limits = limitsOf(query.sizeNm, query.toleranceClass)!;
    const range = candidateRange(candidate);
    const within = range.lowNm >= limits.minNm && range.highNm <= limits.maxNm;
    const limitsText = `${query.toleranceClass} at ${show(query.sizeNm)} is ${show(limits.minNm)} – ${show(limits.maxNm)} (ISO 286-2)`;
    const sizeText = range.lowNm === range.highNm ? show(range.lowNm) : `${show(range.lowNm)} – ${show(range.highNm)}`;
    if (within) return { verdict: 'match', reasons: [`${candidate.name} ${range.basis}: ${sizeText}`, limitsText] };
    if (Math.abs(candidate.nominalNm - query.sizeNm) <= near) {
      return { verdict: 'near_miss', reasons: [`diameter outside ${query.toleranceClass}: ${candidate.name} ${range.basis} ${sizeText}`, limitsText] };
    }
    return { verdict: 'no_match', reasons: [`${candidate.name} is ${show(candidate.nominalNm)} nominal; ${show(query.sizeNm)} asked`] };
  }
  const range = candidateRange(candidate);
  // A single reading stands for a step of the reader's instrument; the candidate's range is what was recorded.
  const sizeText = range.lowNm === range.highNm ? show(range.lowNm) : `${show(range.lowNm)} – ${show(range.highNm)}`;
  if (range.basis !== 'nominal' && query.sizeNm >= range.lowNm && query.sizeNm <= range.highNm) {
    return { verdict: 'match', reasons: [`your ${show(query.sizeNm)} lies within ${candidate.name} ${range.basis}: ${sizeText}`] };
  }
  if (range.basis === 'nominal' && query.sizeNm === candidate.nominalNm) {
    return { verdict: 'match', reasons: [`${candidate.name} is ${show(candidate.nominalNm)} nominal, no tolerance recorded`] };
  }
  if (Math.abs(candidate.nominalNm - query.sizeNm) <= near) {
    const side = query.sizeNm > range.highNm ? 'above' : 'below';
    return { verdict: 'near_miss', reasons: [`your ${show(query.sizeNm)} is ${side} ${candidate.name} ${range.basis}: ${sizeText}`] };
  }
  return { verdict: 'no_match', reasons: [`${candidate.name} is ${show(candidate.nominalNm)} nominal; ${show(query.sizeNm)} asked`] };
}

export interface ClearanceQuery {
  nominalNm: Nanometres;
  unit: LengthUnit;
  /** The reader's fit, e.g. H7 and g6. */
  hole: string;
  shaft: string;
}

export interface RecordedClearance {
  name: string;
  nominalNm: Nanometres;
  /** The clearance range the checklist computed for the interface (negative: interference). */
  clearanceMinNm: Nanometres;
  clearanceMaxNm: Nanometres;
  measured: boolean;
}

/**
 * A recorded bore/shaft clearance against the reader's fit class at the reader's size (ISO 286-2
 * limits): inside the class's clearance range is a match; the same size outside it is a near miss.
 */
export function judgeClearance(query: ClearanceQuery, candidate: RecordedClearance): FinderJudgement {
  const show = (nm: Nanometres) => showFinderLength(nm, query.unit);
  const fit = fitLimits({ sizeMm: query.nominalNm / 1_000_000, hole: query.hole, shaft: query.shaft });
  const classMinNm = fit.clearance.min * 1000;
  const classMaxNm = fit.clearance.max * 1000;
  const fitName = `${query.hole}/${query.shaft}`;
  const classText = `${fitName} at ${show(query.nominalNm)} allows ${show(classMinNm)} to ${show(classMaxNm)} (ISO 286-2)`;
  const basis = candidate.measured ? 'measured' : 'by its limits';
  const found = `clearance ${basis} ${show(candidate.clearanceMinNm)} to ${show(candidate.clearanceMaxNm)}`;
  if (Math.abs(candidate.nominalNm - query.nominalNm) > nearSizeWindowNm(query.nominalNm)) {
    return { verdict: 'no_match', reasons: [`${candidate.name} is ${show(candidate.nominalNm)} nominal; ${show(query.nominalNm)} asked`] };
  }
  if (candidate.nominalNm === query.nominalNm && candidate.clearanceMinNm >= classMinNm && candidate.clearanceMaxNm <= classMaxNm) {
    return { verdict: 'match', reasons: [found, classText] };
  }
  const why = candidate.nominalNm !== query.nominalNm ? `other size: ${show(candidate.nominalNm)} nominal` : `clearance outside ${fitName}`;
  return { verdict: 'near_miss', reasons: [`${why}; ${found}`, classText] };
}

// ---------------------------------------------------------------------------------------------
// Lengths
// ---------------------------------------------------------------------------------------------

export interface LengthQuery {
  minNm?: Nanometres;
  maxNm?: Nanometres;
  unit: LengthUnit;
}

export interface RecordedLength {
  name: string;
  lengthNm: Nanometres;
  compressedNm?: Nanometres | null;
  extendedNm?: Nanometres | null;
}

/**
 * A recorded length (its whole plunge range for a slip shaft) against the reader's window: all of it
 * inside is a match; within the near-size window outside it is a near miss, saying by how much.
 */
export function judgeLength(query: LengthQuery, candidate: RecordedLength): FinderJudgement {
  if (query.minNm === undefined && query.maxNm === undefined) throw new EngineError('a length window needs a shortest or a longest length', 'FINDER_INVALID');
  if (query.minNm !== undefined && query.maxNm !== undefined && query.minNm > query.maxNm) {
    throw new EngineError('lengthMin must not exceed lengthMax', 'FINDER_INVALID');
  }
  const show = (nm: Nanometres) => showFinderLength(nm, query.unit);
  const low = candidate.compressedNm ?? candidate.lengthNm;
  const high = candidate.extendedNm ?? candidate.lengthNm;
  const span = low === high ? show(low) : `${show(low)} – ${show(high)}`;
  const shortBy = query.minNm !== undefined && low < query.minNm ? query.minNm - low : 0;
  const longBy = query.maxNm !== undefined && high > query.maxNm ? high - query.maxNm : 0;
  if (shortBy === 0 && longBy === 0) return { verdict: 'match', reasons: [`${candidate.name} ${span}, inside your window`] };
  const reasons: string[] = [];
  if (shortBy > 0) reasons.push(`${candidate.name} reaches ${show(low)}, ${show(shortBy)} shorter than your ${show(query.minNm!)}`);
  if (longBy > 0) reasons.push(`${candidate.name} reaches ${show(high)}, ${show(longBy)} longer than your ${show(query.maxNm!)}`);
  const near = nearSizeWindowNm(candidate.lengthNm);
  return { verdict: Math.max(shortBy, longBy) <= near ? 'near_miss' : 'no_match', reasons };
}

// ---------------------------------------------------------------------------------------------
// Ranking
// ---------------------------------------------------------------------------------------------

/** Confirmed on the vehicle first, then bench-passed, then open; a recorded no-fit is evidence too, shown last. */
export const FINDER_STATE_RANK: Readonly<Record<string, number>> = { confirmed: 0, bench_pass: 1, open: 2, no_fit: 3 };

export function finderStateRank(state: string): number {
  return FINDER_STATE_RANK[state] ?? 4;
}
