import { inAxisUnit, type DeviationUnit } from './tolerance-zone-geometry';

export const DEVIATION_UNIT_LABEL: Record<DeviationUnit, string> = { um: 'µm', thou: 'thou' };

/** A deviation with its sign and unit: "+21 µm", "−0.28 thou", "0 µm". */
export function formatDeviation(um: number, unit: DeviationUnit): string {
  const value = inAxisUnit(um, unit);
  // ISO 286 tabulates whole and half micrometres; a thou needs two places to show a few µm.
  const text = unit === 'um' ? String(Math.round(Math.abs(value) * 10) / 10) : Math.abs(value).toFixed(2);
  const sign = Number(text) === 0 ? '' : value < 0 ? '−' : '+';
  return `${sign}${text} ${DEVIATION_UNIT_LABEL[unit]}`;
}

/** A clearance or a size difference, no plus sign: "7 µm", "−12 µm". */
export function formatSpan(um: number, unit: DeviationUnit): string {
  return formatDeviation(um, unit).replace(/^\+/, '');
}
