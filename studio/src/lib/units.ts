/**
 * Exact length arithmetic for display only (unit toggles, diagram axes). It is the API's own
 * engine module, imported rather than copied, so a reading shown in the studio is converted and
 * rounded exactly as the server does it. Never compute a fit verdict here: the API owns those.
 */
import { formatLengthValue, unitLabel, type LengthUnit } from '@fitwright/engine';

export {
  LENGTH_UNITS,
  decimalsForResolution,
  formatLength,
  formatLengthValue,
  fromNanometres,
  parseLength,
  toNanometres,
  unitLabel,
} from '@fitwright/engine';
export type { LengthUnit, Nanometres } from '@fitwright/engine';

/** The finest step worth showing when no instrument says otherwise: 0.0001 mm, 0.1 µm, 0.0001 in. */
const DISPLAY_STEP_NM: Record<LengthUnit, number> = { mm: 100, um: 100, in: 2_540, thou: 254, tenths: 254 };

/**
 * A computed length (a mean, a converted limit, a margin) for people: rounded to a step a shop can
 * measure, trailing zeros dropped, e.g. "20.4724 in" rather than "20.47244094 in".
 */
export function formatReadableLength(nanometres: number, unit: LengthUnit): string {
  const text = formatLengthValue(Math.round(nanometres), unit, DISPLAY_STEP_NM[unit]);
  const trimmed = text.includes('.') ? text.replace(/\.?0+$/, '') : text;
  return `${trimmed === '-0' ? '0' : trimmed} ${unitLabel(unit)}`;
}
