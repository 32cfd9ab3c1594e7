import { EngineError } from './engine-error';
import { formatLength, formatLengthValue, LengthUnit, Nanometres, NANOMETRES_PER_UNIT, toNanometres } from './units';

/**
 * Involute spline compatibility by tooth count, internal/external pairing and pitch.
 *
 * Pitch systems:
 * - ANSI B92.1 (inch): diametral pitch P, written as a fraction such as 16/32 where the numerator
 *   is P (pitch diameter D = N / P inches) and the denominator the stub pitch that sets tooth depth.
 * - ISO 4156 (metric): module m, pitch diameter D = m · N millimetres.
 * Mismatched counts, pitch systems or pitches never pass; a pitch missing on one side gives
 * 'unknown_pitch' (teeth match, pitch unproven) rather than a pass.
 */

export type SplineKind = 'internal' | 'external';

export type SplinePitch =
  | { system: 'diametral'; diametralPitch: number; stubPitch?: number }
  | { system: 'module'; moduleMm: number };

export interface SplineSpec {
  /** Shown in reasons, e.g. a part number; defaults to "first"/"second". */
  name?: string;
  teeth: number;
  kind: SplineKind;
  pitch?: SplinePitch | null;
  /** Pressure angle in degrees (30, 37.5 or 45 in both standards), when known. */
  pressureAngleDeg?: number | null;
}

export type SplineMatchStatus = 'match' | 'no_match' | 'unknown_pitch';

export interface SplineCompatibility {
  status: SplineMatchStatus;
  summary: string;
  /** Why the status is what it is: every mismatch found, or what was confirmed. */
  reasons: string[];
  /** Caveats that do not change the status. */
  notes: string[];
  /** Pitch diameter both sides share, when the pitch is known and matches. */
  pitchDiameterNm: Nanometres | null;
}

export type SplineErrorCode = 'SPLINE_INVALID' | 'SPLINE_PITCH_PARSE';

export class SplineError extends EngineError {
  constructor(message: string, code: SplineErrorCode) {
    super(message, code);
  }
}

const SUMMARIES: Readonly<Record<SplineMatchStatus, string>> = {
  match: 'teeth and pitch match',
  no_match: 'no match',
  unknown_pitch: 'unknown pitch, teeth match',
};

/** Pitch diameter: N / P inches (ANSI B92.1) or m · N millimetres (ISO 4156), to the nearest nanometre. */
export function pitchDiameterNm(spec: { teeth: number; pitch: SplinePitch }): Nanometres {
  assertTeeth(spec.teeth, 'spline');
  assertPitch(spec.pitch);
  if (spec.pitch.system === 'diametral') {
    return Math.round((spec.teeth * NANOMETRES_PER_UNIT.in) / spec.pitch.diametralPitch);
  }
  return moduleNm(spec.pitch.moduleMm) * spec.teeth;
}

/** Compare two splines that are meant to mate. */
export function checkSplinePair(first: SplineSpec, second: SplineSpec): SplineCompatibility {
  const a = { ...first, name: first.name ?? 'first' };
  const b = { ...second, name: second.name ?? 'second' };
  for (const spec of [a, b]) {
    assertTeeth(spec.teeth, spec.name);
    if (spec.kind !== 'internal' && spec.kind !== 'external') {
      throw new SplineError(`${spec.name}: kind must be "internal" or "external"`, 'SPLINE_INVALID');
    }
    if (spec.pitch) assertPitch(spec.pitch);
  }

  const mismatches: string[] = [];
  const confirmed: string[] = [];
  const notes: string[] = [];

  if (a.kind === b.kind) {
    mismatches.push(`both splines are ${a.kind}; a pair needs one internal and one external`);
  } else {
    confirmed.push('one internal and one external');
  }

  if (a.teeth !== b.teeth) {
    mismatches.push(`tooth counts differ: ${a.name} has ${a.teeth}, ${b.name} has ${b.teeth}`);
  } else {
    confirmed.push(`${a.teeth} teeth on both`);
  }

  const missingAngle = [a, b].filter((spec) => spec.pressureAngleDeg == null).map((spec) => spec.name);
  if (missingAngle.length > 0) {
    notes.push(`pressure angle not compared: not recorded for ${missingAngle.join(' and ')}`);
  } else if (a.pressureAngleDeg !== b.pressureAngleDeg) {
    mismatches.push(`pressure angles differ: ${a.pressureAngleDeg}° and ${b.pressureAngleDeg}°`);
  }

  const missingPitch = [a, b].filter((spec) => !spec.pitch).map((spec) => spec.name);
  if (a.pitch && b.pitch) {
    const pitchMismatch = comparePitches(a.pitch, b.pitch, notes);
    if (pitchMismatch) mismatches.push(pitchMismatch);
    else confirmed.push(`both ${describePitch(a.pitch)}`);
  }

  if (mismatches.length > 0) {
    return { status: 'no_match', summary: SUMMARIES.no_match, reasons: mismatches, notes, pitchDiameterNm: null };
  }
  if (missingPitch.length > 0 || !a.pitch) {
    return {
      status: 'unknown_pitch',
      summary: SUMMARIES.unknown_pitch,
      reasons: [...confirmed, `pitch not recorded for ${missingPitch.join(' and ')}`],
      notes,
      pitchDiameterNm: null,
    };
  }
  const diameter = pitchDiameterNm({ teeth: a.teeth, pitch: a.pitch });
  const unit = a.pitch.system === 'diametral' ? 'in' : 'mm';
  return {
    status: 'match',
    summary: SUMMARIES.match,
    reasons: [...confirmed, `pitch diameter ${formatLength(diameter, unit)}`],
    notes,
    pitchDiameterNm: diameter,
  };
}

/** Longer text is no pitch; refusing it first keeps the parser linear (and tiny) on any input. */
export const MAX_PITCH_TEXT_LENGTH = 40;

/**
 * Read a pitch as written on a part or drawing: "16/32", "16/32 DP", "20 DP" (ANSI B92.1);
 * "m1.25", "module 2", "1.25 module" (ISO 4156).
 * Linear time on any input: the length is checked before any pattern runs, and the patterns are
 * anchored with no nested or overlapping quantifiers.
 */
export function parseSplinePitch(text: string): SplinePitch {
  if (text.length > MAX_PITCH_TEXT_LENGTH) {
    throw new SplineError(
      `spline pitch is at most ${MAX_PITCH_TEXT_LENGTH} characters; write a diametral pitch such as 16/32 or 20 DP, or a module such as m1.25`,
      'SPLINE_PITCH_PARSE',
    );
  }
  const trimmed = text.trim();
  const decimal = String.raw`(\d+(?:\.\d+)?)`;
  const fractional = new RegExp(String.raw`^${decimal}\s*/\s*${decimal}\s*(?:dp)?$`, 'i').exec(trimmed);
  if (fractional) {
    return { system: 'diametral', diametralPitch: Number(fractional[1]), stubPitch: Number(fractional[2]) };
  }
  const diametral = new RegExp(String.raw`^${decimal}\s*(?:dp|diametral\s+pitch)$`, 'i').exec(trimmed);
  if (diametral) return { system: 'diametral', diametralPitch: Number(diametral[1]) };
  const moduleMatch =
    new RegExp(String.raw`^(?:m|mod|module)\s*${decimal}(?:\s*mm)?$`, 'i').exec(trimmed) ??
    new RegExp(String.raw`^${decimal}\s*(?:mm\s+)?(?:mod|module)$`, 'i').exec(trimmed);
  if (moduleMatch) return { system: 'module', moduleMm: Number(moduleMatch[1]) };
  throw new SplineError(
    `cannot read spline pitch "${text}"; write a diametral pitch such as 16/32 or 20 DP, or a module such as m1.25`,
    'SPLINE_PITCH_PARSE',
  );
}

export function describePitch(pitch: SplinePitch): string {
  if (pitch.system === 'module') return `module ${pitch.moduleMm} (ISO 4156)`;
  const written = pitch.stubPitch === undefined ? `${pitch.diametralPitch}` : `${pitch.diametralPitch}/${pitch.stubPitch}`;
  return `${written} diametral pitch (ANSI B92.1)`;
}

/** A reason the pitches differ, or null when they match. */
function comparePitches(a: SplinePitch, b: SplinePitch, notes: string[]): string | null {
  if (a.system !== b.system) {
    return `pitch systems differ: ${describePitch(a)} and ${describePitch(b)}`;
  }
  if (a.system === 'module' && b.system === 'module') {
    return moduleNm(a.moduleMm) === moduleNm(b.moduleMm) ? null : `modules differ: ${a.moduleMm} and ${b.moduleMm}`;
  }
  if (a.system === 'diametral' && b.system === 'diametral') {
    if (a.diametralPitch !== b.diametralPitch) {
      return `diametral pitches differ: ${describePitch(a)} and ${describePitch(b)}`;
    }
    if (a.stubPitch !== undefined && b.stubPitch !== undefined && a.stubPitch !== b.stubPitch) {
      return `stub pitches (tooth depth) differ: ${describePitch(a)} and ${describePitch(b)}`;
    }
    if ((a.stubPitch === undefined) !== (b.stubPitch === undefined)) {
      // From memory of ANSI B92.1: its standard pitches (2.5/5 … 48/96) all have a stub pitch of twice P.
      notes.push('stub pitch recorded on one side only; ANSI B92.1 standard pitches use twice the diametral pitch');
    }
  }
  return null;
}

function moduleNm(moduleMm: number): Nanometres {
  return toNanometres(moduleMm, 'mm');
}

function assertTeeth(teeth: number, name: string): void {
  if (!Number.isInteger(teeth) || teeth < 1) {
    throw new SplineError(`${name}: tooth count must be a whole number greater than zero; got ${teeth}`, 'SPLINE_INVALID');
  }
}

function assertPitch(pitch: SplinePitch): void {
  const values =
    pitch.system === 'diametral'
      ? [pitch.diametralPitch, ...(pitch.stubPitch === undefined ? [] : [pitch.stubPitch])]
      : [pitch.moduleMm];
  if (!values.every((value) => Number.isFinite(value) && value > 0)) {
    throw new SplineError(`spline pitch must be a number greater than zero: ${JSON.stringify(pitch)}`, 'SPLINE_INVALID');
  }
}

// ---------------------------------------------------------------------------------------------
// Basic dimensions (ANSI B92.1 inch, ISO 4156 / ANSI B92.2M metric) and identification
// ---------------------------------------------------------------------------------------------

export type SplineRoot = 'flat' | 'fillet';
export type SplineFit = 'side' | 'major';
export type SplinePressureAngle = 30 | 37.5 | 45;
export const SPLINE_PRESSURE_ANGLES: readonly SplinePressureAngle[] = [30, 37.5, 45];

export type SplineStandard = 'ANSI B92.1' | 'ISO 4156 / ANSI B92.2M';

/** A length in the designation's own unit, with the same length in the other unit (1 in = 25.4 mm exactly). */
export interface SplineLength {
  value: number;
  unit: 'in' | 'mm';
  converted: { value: number; unit: 'in' | 'mm' };
}

export interface SplineDesignation {
  teeth: number;
  pitch: SplinePitch;
  pressureAngle: SplinePressureAngle;
  root: SplineRoot;
  fit: SplineFit;
}

export interface SplineBasicDimensions {
  designation: string;
  standard: SplineStandard;
  teeth: number;
  /** As written in the standard: "16/32" or "m1.25". */
  pitch: string;
  pressureAngle: SplinePressureAngle;
  root: SplineRoot;
  fit: SplineFit;
  unit: 'in' | 'mm';
  dimensions: {
    pitchDiameter: SplineLength;
    baseDiameter: SplineLength;
    circularPitch: SplineLength;
    basicSpaceWidth: SplineLength;
    basicToothThickness: SplineLength;
    internalMajorDiameter: SplineLength;
    externalMajorDiameter: SplineLength;
    internalMinorDiameter: SplineLength;
    externalMinorDiameter: SplineLength;
    internalFormDiameter: SplineLength;
    externalFormDiameter: SplineLength;
    formClearance: SplineLength;
  };
  /** Which formula gave each figure that is not a plain basic equation, and what is simplified. */
  notes: string[];
}

/**
 * ANSI B92.1 standard diametral pitches (numerator; the stub pitch is twice it), from memory of
 * the standard's pitch series: 2.5/5 to 48/96 for 30° and 37.5°, 10/20 to 128/256 for 45°.
 */
export const ANSI_B92_1_PITCHES = [2.5, 3, 4, 5, 6, 8, 10, 12, 16, 20, 24, 32, 40, 48, 64, 80, 128] as const;
/** ISO 4156-1 modules, mm (from memory of its module series 0.25 to 10). */
export const ISO_4156_MODULES = [0.25, 0.5, 0.75, 1, 1.25, 1.5, 1.75, 2, 2.5, 3, 4, 5, 6, 8, 10] as const;

export const MIN_SPLINE_TEETH = 6;
export const MAX_SPLINE_TEETH = 100;

/**
 * One row of a standard's basic-dimension table. Diameters are `(N + k) / P` inches (ANSI B92.1)
 * or `m (z + k)` millimetres (ISO 4156); each field is that k.
 */
interface DepthFactors {
  /** Pitch range the standard gives this form for (diametral pitch numerators, or modules). */
  pitchRange: readonly [number, number];
  internalMajor: number;
  externalMajor: number;
  internalMinor: number;
  /** External minor diameter; ANSI B92.1 37.5° changes it with the pitch. */
  externalMinor: number | ((pitch: number) => number);
  /** Internal form diameter = (N + k)/P + 2cF, or m(z + k) + 2cF. */
  internalForm: number;
  /** External form diameter = (N + k)/P − 2cF, or m(z + k) − 2cF. */
  externalForm: number;
  /** Basic space width = (π/2 + k)/P or (π/2 + k)·m; the tooth thickness is the circular pitch less it. */
  spaceWidthExtra: number;
  /** Only the 30° flat-root major-diameter fit: its internal form diameter is (N + 0.8)/P − 0.004 in + 2cF. */
  internalFormOffsetIn?: number;
}

type VariantKey = `${SplinePressureAngle}-${SplineRoot}-${SplineFit}`;

/*
 * ANSI B92.1 basic dimensions ("Equations for involute spline basic dimensions"), recalled from
 * the standard's table; each row is one column of it. Where a remembered cell disagreed with the
 * form-clearance rule (the external form diameter must stay 2cF inside the internal minor
 * diameter), the consistent value is used and the note on that row says so.
 */
const ANSI_B92_1_FORMS: Readonly<Partial<Record<VariantKey, DepthFactors>>> = {
  '30-flat-side': { pitchRange: [2.5, 32], internalMajor: 1.35, externalMajor: 1, internalMinor: -1, externalMinor: -1.35, internalForm: 1, externalForm: -1, spaceWidthExtra: 0 },
  '30-flat-major': { pitchRange: [3, 16], internalMajor: 1, externalMajor: 1, internalMinor: -1, externalMinor: -1.35, internalForm: 0.8, externalForm: -1, spaceWidthExtra: 0, internalFormOffsetIn: -0.004 },
  '30-fillet-side': { pitchRange: [2.5, 48], internalMajor: 1.8, externalMajor: 1, internalMinor: -1, externalMinor: -1.8, internalForm: 1, externalForm: -1, spaceWidthExtra: 0 },
  // 37.5°: the external minor diameter is (N − 1.3)/P up to 12/24 pitch and (N − 1.2)/P from 16/32.
  '37.5-fillet-side': { pitchRange: [2.5, 48], internalMajor: 1.6, externalMajor: 1, internalMinor: -0.8, externalMinor: (p) => (p <= 12 ? -1.3 : -1.2), internalForm: 1, externalForm: -0.8, spaceWidthExtra: 0.1 },
  // 45°: internal minor (N − 0.6)/P, consistent with the external form diameter (N − 0.6)/P − 2cF.
  '45-fillet-side': { pitchRange: [10, 128], internalMajor: 1.4, externalMajor: 1, internalMinor: -0.6, externalMinor: -1, internalForm: 1, externalForm: -0.6, spaceWidthExtra: 0.1 },
};

/*
 * ISO 4156-1 / ANSI B92.2M basic dimensions (es = 0, i.e. the basic H/h fit), recalled from the
 * standard's table: minimum internal major diameter m(z + 1.5 | 1.8 | 1.4 | 1.2), maximum external
 * major m(z + 1 | 1 | 0.9 | 0.8), maximum external minor m(z − 1.5 | 1.8 | 1.4 | 1.2), internal form
 * diameter m(z + 1 | 1 | 0.9 | 0.8) + 2cF. The standard derives the external form diameter from the
 * generating rack; here it is the basic rack's m(z − 1 | 1 | 0.9 | 0.8) − 2cF, and the minimum internal
 * minor diameter DFe + 2cF follows from it (a simplification stated in every answer's notes).
 */
const ISO_4156_FORMS: Readonly<Partial<Record<VariantKey, DepthFactors>>> = {
  '30-flat-side': { pitchRange: [0.5, 10], internalMajor: 1.5, externalMajor: 1, internalMinor: -1, externalMinor: -1.5, internalForm: 1, externalForm: -1, spaceWidthExtra: 0 },
  '30-fillet-side': { pitchRange: [0.5, 10], internalMajor: 1.8, externalMajor: 1, internalMinor: -1, externalMinor: -1.8, internalForm: 1, externalForm: -1, spaceWidthExtra: 0 },
  '37.5-fillet-side': { pitchRange: [0.5, 10], internalMajor: 1.4, externalMajor: 0.9, internalMinor: -0.9, externalMinor: -1.4, internalForm: 0.9, externalForm: -0.9, spaceWidthExtra: 0 },
  '45-fillet-side': { pitchRange: [0.25, 2.5], internalMajor: 1.2, externalMajor: 0.8, internalMinor: -0.8, externalMinor: -1.2, internalForm: 0.8, externalForm: -0.8, spaceWidthExtra: 0 },
};

/** Basic dimensions of one designation, in its own unit. Throws SplineError naming the bad field. */
export function splineBasicDimensions(designation: SplineDesignation): SplineBasicDimensions {
  const { teeth, pitch, pressureAngle, root, fit } = designation;
  assertDesignation(designation);
  const factors = formFactors(designation);
  const inch = pitch.system === 'diametral';
  const unit = inch ? 'in' : 'mm';
  // One pitch-size length in the designation's unit: 1/P inch, or m millimetres.
  const scale = inch ? 1 / pitch.diametralPitch : pitch.moduleMm;
  const pitchNumber = inch ? pitch.diametralPitch : pitch.moduleMm;
  const pitchDiameter = teeth * scale;
  const radians = (pressureAngle * Math.PI) / 180;
  const circularPitch = Math.PI * scale;
  const spaceWidth = (Math.PI / 2 + factors.spaceWidthExtra) * scale;
  // ANSI B92.1: cF = 0.001 D, at least 0.002 in and at most 0.010 in. ISO 4156: cF = 0.1 m.
  const formClearance = inch ? Math.min(0.01, Math.max(0.002, 0.001 * pitchDiameter)) : 0.1 * pitch.moduleMm;
  const diameter = (k: number) => (teeth + k) * scale;
  const externalMinorFactor = typeof factors.externalMinor === 'function' ? factors.externalMinor(pitchNumber) : factors.externalMinor;
  const externalForm = diameter(factors.externalForm) - 2 * formClearance;
  const internalMinor = inch ? diameter(factors.internalMinor) : externalForm + 2 * formClearance;
  const length = (value: number) => splineLength(value, unit);
  const notes = inch
    ? [
        'ANSI B92.1: D = N/P, Db = D cos φ, p = π/P; diameters (N + k)/P from the basic-dimension table; cF = 0.001 D (0.002 to 0.010 in)',
      ]
    : [
        'ISO 4156 / ANSI B92.2M: D = m z, Db = m z cos α, p = π m; diameters m (z + k) for the basic H/h fit (es = 0); cF = 0.1 m',
        "external form diameter: the basic rack's m (z − k) − 2cF; the standard derives it from the generating rack, so a drawing may differ slightly",
      ];
  if (factors.spaceWidthExtra !== 0) {
    notes.push(`${pressureAngle}° ANSI B92.1 widens the basic space width to (π/2 + 0.1)/P; the tooth thickness is the circular pitch less it`);
  }
  return {
    designation: describeDesignation(designation),
    standard: inch ? 'ANSI B92.1' : 'ISO 4156 / ANSI B92.2M',
    teeth,
    pitch: writtenPitch(pitch),
    pressureAngle,
    root,
    fit,
    unit,
    dimensions: {
      pitchDiameter: length(pitchDiameter),
      baseDiameter: length(pitchDiameter * Math.cos(radians)),
      circularPitch: length(circularPitch),
      basicSpaceWidth: length(spaceWidth),
      basicToothThickness: length(circularPitch - spaceWidth),
      internalMajorDiameter: length(diameter(factors.internalMajor)),
      externalMajorDiameter: length(diameter(factors.externalMajor)),
      internalMinorDiameter: length(internalMinor),
      externalMinorDiameter: length(diameter(externalMinorFactor)),
      internalFormDiameter: length(diameter(factors.internalForm) + (factors.internalFormOffsetIn ?? 0) + 2 * formClearance),
      externalFormDiameter: length(externalForm),
      formClearance: length(formClearance),
    },
    notes,
  };
}

/** e.g. "21T 16/32 DP 30° flat root side fit (ANSI B92.1)". */
export function describeDesignation(designation: SplineDesignation): string {
  const { teeth, pitch, pressureAngle, root, fit } = designation;
  const pitchText = pitch.system === 'diametral' ? `${writtenPitch(pitch)} DP` : writtenPitch(pitch);
  const fitText = fit === 'major' ? 'major-diameter fit' : 'side fit';
  const standard = pitch.system === 'diametral' ? 'ANSI B92.1' : 'ISO 4156';
  return `${teeth}T ${pitchText} ${pressureAngle}° ${root} root ${fitText} (${standard})`;
}

/** "16/32" (stub pitch twice P when not written) or "m1.25". */
export function writtenPitch(pitch: SplinePitch): string {
  if (pitch.system === 'module') return `m${pitch.moduleMm}`;
  return `${pitch.diametralPitch}/${pitch.stubPitch ?? 2 * pitch.diametralPitch}`;
}

export interface SplineIdentificationInput {
  teeth: number;
  /** 'major': the outside diameter of a shaft (external spline); 'minor': the bore of a hub (internal spline). */
  feature: 'major' | 'minor';
  measuredNm: Nanometres;
  /** The unit the reading was taken in; deviations are given in it. */
  unit: 'in' | 'mm';
  /** The instrument's resolution, nm; defaults to 0.001 in or 0.01 mm (a common caliper). */
  resolutionNm?: Nanometres;
}

export interface SplineCandidate {
  designation: string;
  standard: SplineStandard;
  pitch: string;
  pressureAngle: SplinePressureAngle;
  root: SplineRoot;
  /** Forms sharing this diameter (e.g. 30° flat and fillet root share the external major diameter). */
  alsoFits: string[];
  /** The basic diameter the reading is compared with, in the designation's own unit. */
  basicDiameter: SplineLength;
  /** Reading − basic diameter, in the reading's unit. Negative: the part measures under basic. */
  deviation: { value: number; unit: 'in' | 'mm' };
  /** Whether the reading falls inside the window of Fitwright's own rule (see `identificationWindowNm`). */
  explainsReading: boolean;
}

export interface SplineIdentification {
  teeth: number;
  feature: 'major' | 'minor';
  measured: { value: number; unit: 'in' | 'mm'; resolution: number };
  /** Best first: by the size of the deviation. */
  candidates: SplineCandidate[];
  /** Warnings such as an inch and a metric designation both close to the reading. */
  pitfalls: string[];
  /** How `explainsReading` is decided, in words. */
  rule: string;
}

export const MAX_SPLINE_CANDIDATES = 8;
const DEFAULT_RESOLUTION_NM: Readonly<Record<'in' | 'mm', Nanometres>> = { in: 25_400, mm: 10_000 };

/**
 * Rank the standard designations with this tooth count by how well their basic major (or minor)
 * diameter explains a reading, and flag the inch-vs-metric swap: a 20/40 DP spline and a module 1.25
 * spline with the same teeth differ by about 1.6 % in diameter, close enough to confuse on calipers,
 * yet they are not interchangeable.
 */
export function identifySpline(input: SplineIdentificationInput): SplineIdentification {
  assertTeethRange(input.teeth);
  if (!Number.isSafeInteger(input.measuredNm) || input.measuredNm <= 0) {
    throw new SplineError(`${input.feature}Diameter must be a length greater than zero`, 'SPLINE_INVALID');
  }
  const resolutionNm = input.resolutionNm ?? DEFAULT_RESOLUTION_NM[input.unit];
  if (!Number.isSafeInteger(resolutionNm) || resolutionNm <= 0) {
    throw new SplineError('resolution must be a length greater than zero', 'SPLINE_INVALID');
  }
  const byDiameter = new Map<string, { nm: number; candidate: Omit<SplineCandidate, 'alsoFits'>; alsoFits: string[] }>();
  for (const designation of standardDesignations(input.teeth)) {
    const dims = splineBasicDimensions(designation);
    const basic = input.feature === 'major' ? dims.dimensions.externalMajorDiameter : dims.dimensions.internalMinorDiameter;
    const basicNm = Math.round(basic.value * NANOMETRES_PER_UNIT[basic.unit]);
    const deviationNm = input.measuredNm - basicNm;
    const key = `${dims.standard}|${dims.pitch}|${basicNm}`;
    const existing = byDiameter.get(key);
    if (existing) {
      existing.alsoFits.push(dims.designation);
      continue;
    }
    byDiameter.set(key, {
      nm: Math.abs(deviationNm),
      alsoFits: [],
      candidate: {
        designation: dims.designation,
        standard: dims.standard,
        pitch: dims.pitch,
        pressureAngle: dims.pressureAngle,
        root: dims.root,
        basicDiameter: basic,
        deviation: { value: roundedIn(deviationNm, input.unit), unit: input.unit },
        explainsReading: Math.abs(deviationNm) <= identificationWindowNm(designation.pitch, resolutionNm),
      },
    });
  }
  const ranked = [...byDiameter.values()].sort((a, b) => a.nm - b.nm).slice(0, MAX_SPLINE_CANDIDATES);
  const candidates = ranked.map(({ candidate, alsoFits }) => ({ ...candidate, alsoFits }));
  return {
    teeth: input.teeth,
    feature: input.feature,
    measured: { value: roundedIn(input.measuredNm, input.unit), unit: input.unit, resolution: roundedIn(resolutionNm, input.unit) },
    candidates,
    pitfalls: swapPitfalls(candidates, input.unit),
    rule:
      "Fitwright's own rule, not a standard's: a designation explains the reading when the reading lies within " +
      'half the instrument resolution plus a tenth of the module (25.4/P mm for an inch pitch) of its basic diameter; ' +
      'ISO 4156 sets the form clearance at 0.1 m, and real parts sit at or under basic by about that much',
  };
}

/** Half a resolution step plus 0.1 module; nanometres. */
export function identificationWindowNm(pitch: SplinePitch, resolutionNm: Nanometres): Nanometres {
  const moduleNmEquivalent = pitch.system === 'module' ? pitch.moduleMm * 1_000_000 : NANOMETRES_PER_UNIT.in / pitch.diametralPitch;
  return Math.round(resolutionNm / 2 + 0.1 * moduleNmEquivalent);
}

/** Every standard designation with this tooth count (each pitch × each form of each standard). */
export function standardDesignations(teeth: number): SplineDesignation[] {
  const designations: SplineDesignation[] = [];
  const add = (forms: Readonly<Partial<Record<VariantKey, DepthFactors>>>, pitches: readonly number[], toPitch: (n: number) => SplinePitch) => {
    for (const [key, factors] of Object.entries(forms) as [VariantKey, DepthFactors][]) {
      const [angle, root, fit] = key.split('-') as [string, SplineRoot, SplineFit];
      for (const value of pitches) {
        if (value < factors.pitchRange[0] || value > factors.pitchRange[1]) continue;
        designations.push({ teeth, pitch: toPitch(value), pressureAngle: Number(angle) as SplinePressureAngle, root, fit });
      }
    }
  };
  add(ANSI_B92_1_FORMS, ANSI_B92_1_PITCHES, (p) => ({ system: 'diametral', diametralPitch: p, stubPitch: 2 * p }));
  add(ISO_4156_FORMS, ISO_4156_MODULES, (m) => ({ system: 'module', moduleMm: m }));
  return designations;
}

function swapPitfalls(candidates: readonly SplineCandidate[], unit: 'in' | 'mm'): string[] {
  const [best] = candidates;
  if (!best) return [];
  const rival = candidates.find((candidate) => candidate.standard !== best.standard);
  if (!rival) return [];
  const bestNm = best.basicDiameter.value * NANOMETRES_PER_UNIT[best.basicDiameter.unit];
  const rivalNm = rival.basicDiameter.value * NANOMETRES_PER_UNIT[rival.basicDiameter.unit];
  const gapNm = Math.abs(bestNm - rivalNm);
  // Within 3 % the two read alike on a worn part or a coarse caliper (Fitwright's own threshold).
  if (gapNm > 0.03 * bestNm && !rival.explainsReading) return [];
  const gap = `${roundedIn(Math.round(gapNm), unit)} ${unit}`;
  return [
    `inch/metric swap: ${best.designation} and ${rival.designation} differ by only ${gap} on this diameter; ` +
      'they are not interchangeable (different pitch and tooth form), so confirm with a finer instrument or a measurement over pins before ordering',
  ];
}

function formFactors(designation: SplineDesignation): DepthFactors {
  const key: VariantKey = `${designation.pressureAngle}-${designation.root}-${designation.fit}`;
  const forms = designation.pitch.system === 'diametral' ? ANSI_B92_1_FORMS : ISO_4156_FORMS;
  const factors = forms[key];
  const standard = designation.pitch.system === 'diametral' ? 'ANSI B92.1' : 'ISO 4156';
  if (!factors) {
    const offered = Object.keys(forms)
      .map((k) => {
        const [angle, root, fit] = k.split('-');
        return `${angle}° ${root} root ${fit} fit`;
      })
      .join(', ');
    throw new SplineError(
      `${standard} has no ${designation.pressureAngle}° ${designation.root} root ${designation.fit} fit; it offers ${offered}`,
      'SPLINE_INVALID',
    );
  }
  const value = designation.pitch.system === 'diametral' ? designation.pitch.diametralPitch : designation.pitch.moduleMm;
  const [low, high] = factors.pitchRange;
  if (value < low || value > high) {
    const range = designation.pitch.system === 'diametral' ? `${low}/${2 * low} to ${high}/${2 * high}` : `m${low} to m${high}`;
    throw new SplineError(
      `pitch: ${standard} gives the ${designation.pressureAngle}° ${designation.root} root ${designation.fit} fit for ${range}; got ${writtenPitch(designation.pitch)}`,
      'SPLINE_INVALID',
    );
  }
  return factors;
}

function assertDesignation(designation: SplineDesignation): void {
  assertTeethRange(designation.teeth);
  assertPitch(designation.pitch);
  if (!SPLINE_PRESSURE_ANGLES.includes(designation.pressureAngle)) {
    throw new SplineError(`pressureAngle must be 30, 37.5 or 45; got ${String(designation.pressureAngle)}`, 'SPLINE_INVALID');
  }
  const { pitch } = designation;
  if (pitch.system === 'diametral') {
    if (!(ANSI_B92_1_PITCHES as readonly number[]).includes(pitch.diametralPitch)) {
      throw new SplineError(
        `pitch: ${pitch.diametralPitch} is not an ANSI B92.1 diametral pitch; standard pitches are ${ANSI_B92_1_PITCHES.map((p) => `${p}/${2 * p}`).join(', ')}`,
        'SPLINE_INVALID',
      );
    }
    if (pitch.stubPitch !== undefined && pitch.stubPitch !== 2 * pitch.diametralPitch) {
      throw new SplineError(
        `pitch: ANSI B92.1 stub pitches are twice the diametral pitch (${pitch.diametralPitch}/${2 * pitch.diametralPitch}); got ${pitch.diametralPitch}/${pitch.stubPitch}`,
        'SPLINE_INVALID',
      );
    }
  } else if (!(ISO_4156_MODULES as readonly number[]).includes(pitch.moduleMm)) {
    throw new SplineError(
      `pitch: module ${pitch.moduleMm} is not an ISO 4156 module; standard modules are ${ISO_4156_MODULES.join(', ')}`,
      'SPLINE_INVALID',
    );
  }
}

function assertTeethRange(teeth: number): void {
  if (!Number.isInteger(teeth) || teeth < MIN_SPLINE_TEETH || teeth > MAX_SPLINE_TEETH) {
    throw new SplineError(
      `teeth must be a whole number from ${MIN_SPLINE_TEETH} to ${MAX_SPLINE_TEETH}; got ${String(teeth)}`,
      'SPLINE_INVALID',
    );
  }
}

function splineLength(value: number, unit: 'in' | 'mm'): SplineLength {
  const nanometres = Math.round(value * NANOMETRES_PER_UNIT[unit]);
  const other = unit === 'in' ? 'mm' : 'in';
  return { value: roundedIn(nanometres, unit), unit, converted: { value: roundedIn(nanometres, other), unit: other } };
}

/** Nanometres in `unit`, to the nearest nanometre's worth of decimals (exact decimal, no float drift). */
function roundedIn(nanometres: Nanometres, unit: LengthUnit): number {
  return Number(formatLengthValue(nanometres, unit));
}
