import { EngineError } from './engine-error';
import { formatLength, Nanometres, NANOMETRES_PER_UNIT, toNanometres } from './units';

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

/**
 * Read a pitch as written on a part or drawing: "16/32", "16/32 DP", "20 DP" (ANSI B92.1);
 * "m1.25", "module 2", "1.25 module" (ISO 4156).
 */
export function parseSplinePitch(text: string): SplinePitch {
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
