import { classifyFit, fitLimits, toleranceZone, type FitKind } from './fits';
import { checkLengthWindow } from './length-window';
import { checkSplinePair, type SplinePitch } from './splines';
import { formatLength, type LengthUnit, type Nanometres } from './units';
import type { CheckOutcome } from './checklist';

/**
 * The verdict on one interface (where two parts mate), from what is known of its features:
 * their specs and any readings. It decides pass / fail / unknown and says why in words.
 */

export interface Reading {
  valueNm: Nanometres;
  resolutionNm: Nanometres;
}

export interface SplineFeatureInput {
  name: string;
  teeth: number;
  gender: 'internal' | 'external';
  diametralPitch?: number;
  stubPitch?: number;
  module?: number;
  /** Degrees; compared when both sides record it. */
  pressureAngle?: number;
}

export interface DiameterFeatureInput {
  name: string;
  role: 'hole' | 'shaft';
  nominalNm: Nanometres;
  toleranceClass?: string;
  maxNm?: Nanometres;
  minNm?: Nanometres;
  readings: readonly Reading[];
}

export interface LengthFeatureInput {
  name: string;
  lengthNm: Nanometres;
  compressedNm?: Nanometres;
  extendedNm?: Nanometres;
  readings: readonly Reading[];
}

export type InterfaceInput =
  | { kind: 'spline'; first: SplineFeatureInput; second: SplineFeatureInput }
  | {
      kind: 'bore_shaft';
      hole: DiameterFeatureInput;
      shaft: DiameterFeatureInput;
      /** Clearance read directly across the interface (feeler gauge, indicator): it outranks the diameters. */
      clearanceReadings?: readonly Reading[];
      minClearanceNm?: Nanometres;
      unit: LengthUnit;
    }
  | {
      kind: 'length_window';
      length: LengthFeatureInput;
      installedMinNm: Nanometres;
      installedMaxNm: Nanometres;
      marginNm?: Nanometres;
      unit: LengthUnit;
    };

export interface InterfaceVerdict {
  outcome: CheckOutcome;
  summary: string;
  reasons: string[];
  /** Numbers a diagram or a what-if needs; nanometres unless the key says µm. */
  detail: Record<string, unknown>;
}

export function evaluateInterface(input: InterfaceInput): InterfaceVerdict {
  switch (input.kind) {
    case 'spline':
      return evaluateSpline(input.first, input.second);
    case 'bore_shaft':
      return evaluateBoreShaft(input.hole, input.shaft, input.minClearanceNm ?? 0, input.unit, input.clearanceReadings ?? []);
    case 'length_window':
      return evaluateLengthWindow(input);
  }
}

function splinePitch(feature: SplineFeatureInput): SplinePitch | null {
  if (feature.diametralPitch !== undefined) {
    return { system: 'diametral', diametralPitch: feature.diametralPitch, stubPitch: feature.stubPitch };
  }
  if (feature.module !== undefined) return { system: 'module', moduleMm: feature.module };
  return null;
}

function evaluateSpline(first: SplineFeatureInput, second: SplineFeatureInput): InterfaceVerdict {
  const result = checkSplinePair(
    { name: first.name, teeth: first.teeth, kind: first.gender, pitch: splinePitch(first), pressureAngleDeg: first.pressureAngle ?? null },
    { name: second.name, teeth: second.teeth, kind: second.gender, pitch: splinePitch(second), pressureAngleDeg: second.pressureAngle ?? null },
  );
  const outcome: CheckOutcome = result.status === 'match' ? 'pass' : result.status === 'no_match' ? 'fail' : 'unknown';
  return {
    outcome,
    summary: result.summary,
    reasons: [...result.reasons, ...result.notes],
    detail: { status: result.status, pitchDiameterNm: result.pitchDiameterNm },
  };
}

/** Where the true size of a feature can lie: from readings (mean ± half a step) or else from its limits. */
interface SizeInterval {
  lowNm: Nanometres;
  highNm: Nanometres;
  source: 'measured' | 'limits';
  meanNm?: Nanometres;
  spreadNm?: Nanometres;
  readingCount?: number;
}

export function summariseReadings(readings: readonly Reading[]) {
  const values = readings.map((reading) => reading.valueNm);
  const meanNm = Math.round(values.reduce((sum, value) => sum + value, 0) / values.length);
  const spreadNm = Math.max(...values) - Math.min(...values);
  // The coarsest instrument decides how sure we are.
  const resolutionNm = Math.max(...readings.map((reading) => reading.resolutionNm));
  return { meanNm, spreadNm, resolutionNm, count: values.length };
}

/** Limits from an ISO 286 class, or explicit max/min, as absolute sizes. */
function designLimits(feature: DiameterFeatureInput): { maxNm: Nanometres; minNm: Nanometres } | null {
  if (feature.maxNm !== undefined && feature.minNm !== undefined) return { maxNm: feature.maxNm, minNm: feature.minNm };
  if (!feature.toleranceClass) return null;
  const zone = toleranceZone(feature.nominalNm / 1_000_000, feature.toleranceClass);
  return { maxNm: feature.nominalNm + zone.upper * 1000, minNm: feature.nominalNm + zone.lower * 1000 };
}

function sizeInterval(feature: DiameterFeatureInput): SizeInterval | null {
  if (feature.readings.length > 0) {
    const { meanNm, spreadNm, resolutionNm, count } = summariseReadings(feature.readings);
    const half = Math.ceil(resolutionNm / 2);
    // Readings that disagree widen the interval too: the true size is somewhere among them.
    const values = feature.readings.map((reading) => reading.valueNm);
    return {
      lowNm: Math.min(...values) - half,
      highNm: Math.max(...values) + half,
      source: 'measured',
      meanNm,
      spreadNm,
      readingCount: count,
    };
  }
  const limits = designLimits(feature);
  return limits ? { lowNm: limits.minNm, highNm: limits.maxNm, source: 'limits' } : null;
}

function evaluateBoreShaft(
  hole: DiameterFeatureInput,
  shaft: DiameterFeatureInput,
  minClearanceNm: Nanometres,
  unit: LengthUnit,
  clearanceReadings: readonly Reading[],
): InterfaceVerdict {
  const show = (nm: Nanometres) => formatLength(nm, unit);
  let intent: FitKind = 'clearance';
  let isoFit: ReturnType<typeof fitLimits> | null = null;
  if (hole.toleranceClass && shaft.toleranceClass && hole.nominalNm === shaft.nominalNm) {
    isoFit = fitLimits({ sizeMm: hole.nominalNm / 1_000_000, hole: hole.toleranceClass, shaft: shaft.toleranceClass });
    intent = isoFit.kind;
  }
  const reasons: string[] = [];
  const detail: Record<string, unknown> = { intent, isoFit, minClearanceNm };

  // A measured part outside its own tolerance fails, whatever the other part does.
  for (const feature of [hole, shaft]) {
    const limits = designLimits(feature);
    if (!limits || feature.readings.length === 0) continue;
    const interval = sizeInterval(feature)!;
    if (interval.lowNm > limits.maxNm || interval.highNm < limits.minNm) {
      const side = interval.lowNm > limits.maxNm ? 'above' : 'below';
      reasons.push(
        `${feature.name} measures ${show(interval.meanNm!)}, ${side} its ${feature.toleranceClass ?? 'given'} limits ${show(limits.minNm)} – ${show(limits.maxNm)}`,
      );
    }
  }

  const holeSize = sizeInterval(hole);
  const shaftSize = sizeInterval(shaft);
  detail.hole = holeSize;
  detail.shaft = shaftSize;
  if (clearanceReadings.length > 0) {
    const direct = sizeInterval({ ...hole, readings: clearanceReadings })!;
    return judgeClearance({ min: direct.lowNm, max: direct.highNm }, 'measured across the interface', intent, minClearanceNm, show, reasons, {
      ...detail,
      clearanceMeasuredNm: direct.meanNm,
    });
  }
  if (!holeSize || !shaftSize) {
    const missing = [!holeSize && hole.name, !shaftSize && shaft.name].filter(Boolean).join(' and ');
    return {
      outcome: reasons.length > 0 ? 'fail' : 'unknown',
      summary: reasons.length > 0 ? 'out of tolerance' : 'not enough to compute',
      reasons: [...reasons, `measure ${missing}, or give it a tolerance class or limits`],
      detail,
    };
  }

  const clearance = { min: holeSize.lowNm - shaftSize.highNm, max: holeSize.highNm - shaftSize.lowNm };
  if (holeSize.meanNm !== undefined && shaftSize.meanNm !== undefined) {
    detail.clearanceMeasuredNm = holeSize.meanNm - shaftSize.meanNm;
  }
  const basis = holeSize.source === 'measured' && shaftSize.source === 'measured' ? 'measured' : 'by the limits';
  return judgeClearance(clearance, basis, intent, minClearanceNm, show, reasons, detail);
}

/** Decides a bore/shaft verdict from the clearance range, the intended kind of fit and the creator's minimum. */
function judgeClearance(
  clearance: { min: Nanometres; max: Nanometres },
  basis: string,
  intent: FitKind,
  minClearanceNm: Nanometres,
  show: (nm: Nanometres) => string,
  toleranceFailures: string[],
  detail: Record<string, unknown>,
): InterfaceVerdict {
  detail.clearanceMinNm = clearance.min;
  detail.clearanceMaxNm = clearance.max;
  detail.kind = classifyFit(clearance);
  const range = `clearance ${basis}: ${show(clearance.min)} to ${show(clearance.max)}`;
  const measured = basis !== 'by the limits';

  if (toleranceFailures.length > 0) {
    return { outcome: 'fail', summary: 'out of tolerance', reasons: [...toleranceFailures, range], detail };
  }
  if (intent === 'clearance') {
    if (clearance.min >= minClearanceNm) {
      return { outcome: 'pass', summary: 'clearance fit', reasons: [range, `at least ${show(minClearanceNm)} required`], detail };
    }
    if (clearance.max < minClearanceNm) {
      const why = clearance.max <= 0 ? 'the parts interfere' : `less than the ${show(minClearanceNm)} required`;
      return { outcome: 'fail', summary: 'too tight', reasons: [range, why], detail };
    }
    return {
      outcome: 'unknown',
      summary: 'cannot tell yet',
      reasons: [range, `the range straddles the ${show(minClearanceNm)} required: measure with a finer instrument`],
      detail,
    };
  }
  if (intent === 'interference') {
    if (clearance.max <= 0) return { outcome: 'pass', summary: 'interference fit', reasons: [range], detail };
    if (clearance.min > 0) return { outcome: 'fail', summary: 'loose', reasons: [range, 'an interference fit was intended'], detail };
    return { outcome: 'unknown', summary: 'cannot tell yet', reasons: [range, 'measure with a finer instrument'], detail };
  }
  // A transition fit may go either way by design: it passes when both parts are within their classes.
  if (measured) return { outcome: 'pass', summary: 'transition fit, parts in tolerance', reasons: [range], detail };
  return { outcome: 'unknown', summary: 'transition fit', reasons: [range, 'measure both parts to see how this pair goes'], detail };
}

function evaluateLengthWindow(input: Extract<InterfaceInput, { kind: 'length_window' }>): InterfaceVerdict {
  const { length } = input;
  // A measured overall length shifts the whole plunge range by its difference from the nominal length.
  const shiftNm = length.readings.length > 0 ? summariseReadings(length.readings).meanNm - length.lengthNm : 0;
  const compressedNm = (length.compressedNm ?? length.lengthNm) + shiftNm;
  const extendedNm = (length.extendedNm ?? length.lengthNm) + shiftNm;
  const margin = input.marginNm ?? 0;
  const result = checkLengthWindow({
    assembled: { compressedNm, extendedNm },
    installed: { minNm: input.installedMinNm, maxNm: input.installedMaxNm },
    margin: { compressionNm: margin, extensionNm: margin },
    display: { unit: input.unit },
  });
  const reasons = [...result.reasons];
  if (shiftNm !== 0) reasons.push(`measured length differs from nominal by ${formatLength(shiftNm, input.unit)}`);
  return {
    outcome: result.status,
    summary: result.status === 'pass' ? 'inside the window' : 'outside the window',
    reasons,
    detail: {
      compressedNm,
      extendedNm,
      installedMinNm: input.installedMinNm,
      installedMaxNm: input.installedMaxNm,
      marginNm: margin,
      compressionLeftNm: result.compressionLeftNm,
      extensionLeftNm: result.extensionLeftNm,
    },
  };
}
