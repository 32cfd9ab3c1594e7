import type { FitCheck, ZoneUm } from '../api/queries';

/**
 * Typed views of a check's `detail`, which the API sends as open JSON. Each reader checks the
 * numbers it needs are there, so a check the engine could not compute simply draws no diagram.
 */

const isNumber = (value: unknown): value is number => typeof value === 'number' && Number.isFinite(value);
const isObject = (value: unknown): value is Record<string, unknown> => typeof value === 'object' && value !== null;

export function checkSummary(check: FitCheck): { summary: string | null; reasons: string[] } {
  const detail = check.detail ?? {};
  return {
    summary: typeof detail.summary === 'string' ? detail.summary : null,
    reasons: Array.isArray(detail.reasons) ? detail.reasons.filter((reason): reason is string => typeof reason === 'string') : [],
  };
}

export interface BoreShaftDetail {
  /** ISO 286 limits when both parts carry a class at the same nominal size, µm. */
  isoFit: { hole: ZoneUm; shaft: ZoneUm; clearance: { min: number; max: number } } | null;
  clearanceMinNm: number | null;
  clearanceMaxNm: number | null;
  clearanceMeasuredNm: number | null;
  minClearanceNm: number;
}

function readZone(value: unknown): ZoneUm | null {
  return isObject(value) && isNumber(value.upper) && isNumber(value.lower) ? { upper: value.upper, lower: value.lower } : null;
}

export function readBoreShaft(check: FitCheck): BoreShaftDetail | null {
  if (check.kind !== 'fit' || !check.detail) return null;
  const detail = check.detail;
  let isoFit: BoreShaftDetail['isoFit'] = null;
  if (isObject(detail.isoFit)) {
    const hole = readZone(detail.isoFit.hole);
    const shaft = readZone(detail.isoFit.shaft);
    const clearance = isObject(detail.isoFit.clearance) ? detail.isoFit.clearance : null;
    if (hole && shaft && clearance && isNumber(clearance.min) && isNumber(clearance.max)) {
      isoFit = { hole, shaft, clearance: { min: clearance.min, max: clearance.max } };
    }
  }
  return {
    isoFit,
    clearanceMinNm: isNumber(detail.clearanceMinNm) ? detail.clearanceMinNm : null,
    clearanceMaxNm: isNumber(detail.clearanceMaxNm) ? detail.clearanceMaxNm : null,
    clearanceMeasuredNm: isNumber(detail.clearanceMeasuredNm) ? detail.clearanceMeasuredNm : null,
    minClearanceNm: isNumber(detail.minClearanceNm) ? detail.minClearanceNm : 0,
  };
}

export interface LengthWindowDetail {
  compressedNm: number;
  extendedNm: number;
  installedMinNm: number;
  installedMaxNm: number;
  marginNm: number;
  compressionLeftNm: number;
  extensionLeftNm: number;
}

export function readLengthWindow(check: FitCheck): LengthWindowDetail | null {
  if (check.kind !== 'length_window' || !check.detail) return null;
  const detail = check.detail;
  const keys = ['compressedNm', 'extendedNm', 'installedMinNm', 'installedMaxNm', 'marginNm', 'compressionLeftNm', 'extensionLeftNm'] as const;
  if (!keys.every((key) => isNumber(detail[key]))) return null;
  return Object.fromEntries(keys.map((key) => [key, detail[key]])) as unknown as LengthWindowDetail;
}
