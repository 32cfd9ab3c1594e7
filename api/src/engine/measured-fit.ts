import { EngineError } from './engine-error';
import { classifyFit } from './fits';
import { fromNanometres, Nanometres } from './units';

/**
 * Fits from measured parts.
 *
 * Uncertainty model — Fitwright's own rule, not taken from a standard (stated so a reader can check
 * it): a reading is the true size rounded to the instrument's resolution, so the true size lies within
 * ± half a resolution step of the reading. Clearance = bore − shaft, and its bounds widen by the sum of
 * the two half-steps (worst case, no statistical combination). Instrument error
 * beyond its resolution (calibration, temperature, technique) is not modelled: enter a coarser
 * resolution to allow for it. Half-steps are rounded up to whole nanometres, which only widens the range.
 */

export interface MeasuredDiameter {
  /** The reading, integer nm. */
  nanometres: Nanometres;
  /** The instrument's resolution (smallest step it shows), integer nm, > 0. */
  resolutionNm: Nanometres;
}

/**
 * clearance: every possible true clearance is ≥ 0; interference: every one is ≤ 0;
 * indeterminate: the readings cannot tell which (the range straddles zero) — measure finer.
 */
export type MeasuredFitKind = 'clearance' | 'interference' | 'indeterminate';

export interface MeasuredClearance {
  /** Bore reading − shaft reading. Negative means interference. */
  nominalNm: Nanometres;
  minNm: Nanometres;
  maxNm: Nanometres;
  /** Half-width of the range: half the bore step + half the shaft step. */
  uncertaintyNm: Nanometres;
  kind: MeasuredFitKind;
}

export interface WhatIf {
  clearanceNm: Nanometres;
  deltaNm: Nanometres;
  deltaUm: number;
  deltaThou: number;
  /** Share of the clearance the change takes, %; null when there is no positive clearance to share. */
  sharePercent: number | null;
  remainingClearanceNm: Nanometres;
  /** 'clearance' while something is left (zero still counts, as in ISO 286-1), otherwise 'interference'. */
  remainingKind: 'clearance' | 'interference';
}

export type MeasuredFitErrorCode = 'MEASURED_FIT_INVALID';

export class MeasuredFitError extends EngineError {
  constructor(message: string, code: MeasuredFitErrorCode = 'MEASURED_FIT_INVALID') {
    super(message, code);
  }
}

/** Clearance between a measured bore and a measured shaft, with the range the instruments allow. */
export function measuredClearance(input: { bore: MeasuredDiameter; shaft: MeasuredDiameter }): MeasuredClearance {
  assertReading(input.bore, 'bore');
  assertReading(input.shaft, 'shaft');
  const nominalNm = input.bore.nanometres - input.shaft.nanometres;
  const uncertaintyNm = Math.ceil((input.bore.resolutionNm + input.shaft.resolutionNm) / 2);
  const minNm = nominalNm - uncertaintyNm;
  const maxNm = nominalNm + uncertaintyNm;
  const isoKind = classifyFit({ min: minNm, max: maxNm });
  return {
    nominalNm,
    minNm,
    maxNm,
    uncertaintyNm,
    // ISO 286's "transition" means the parts may go either way; for measured parts it means the instruments cannot tell.
    kind: isoKind === 'transition' ? 'indeterminate' : isoKind,
  };
}

/**
 * What a part `deltaNm` larger does to a clearance of `clearanceNm`, e.g. a part 0.0004 in larger
 * takes 2.5 % of a 0.016 in clearance. A negative delta (a smaller part) gives clearance back.
 */
export function whatIf(input: { clearanceNm: Nanometres; deltaNm: Nanometres; shaftNm?: Nanometres }): WhatIf {
  assertWholeNanometres(input.clearanceNm, 'clearanceNm');
  assertWholeNanometres(input.deltaNm, 'deltaNm');
  const { clearanceNm, deltaNm, shaftNm } = input;
  // A shaft made smaller by its own size or more is no part at all: refuse it rather than answer.
  if (shaftNm !== undefined && shaftNm + deltaNm <= 0) {
    throw new MeasuredFitError(
      `delta must leave a shaft size greater than 0; the shaft measures ${fromNanometres(shaftNm, 'mm')} mm and the change is ${fromNanometres(deltaNm, 'mm')} mm`,
    );
  }
  const remainingClearanceNm = clearanceNm - deltaNm;
  return {
    clearanceNm,
    deltaNm,
    deltaUm: fromNanometres(deltaNm, 'um'),
    deltaThou: fromNanometres(deltaNm, 'thou'),
    // Multiply before dividing so exact cases (2.5 %) stay exact in floating point.
    sharePercent: clearanceNm > 0 ? (deltaNm * 100) / clearanceNm : null,
    remainingClearanceNm,
    remainingKind: remainingClearanceNm >= 0 ? 'clearance' : 'interference',
  };
}

function assertReading(reading: MeasuredDiameter, name: string): void {
  assertWholeNanometres(reading.nanometres, `${name} reading`);
  assertWholeNanometres(reading.resolutionNm, `${name} resolution`);
  if (reading.nanometres <= 0) throw new MeasuredFitError(`the ${name} reading must be greater than zero`);
  if (reading.resolutionNm <= 0) throw new MeasuredFitError(`the ${name} instrument resolution must be greater than zero`);
}

function assertWholeNanometres(value: number, name: string): void {
  if (!Number.isSafeInteger(value)) {
    throw new MeasuredFitError(`${name} must be a whole number of nanometres; got ${value}`);
  }
}
