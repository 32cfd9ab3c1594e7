import { LENGTH_UNITS, unitLabel, type LengthUnit } from '@/lib/units';

/** What a reading recorded while marking can say about itself (the measurements route's values). */
export const INSTRUMENT_CHOICES = [
  ['other', 'Not said'],
  ['outside_micrometer', 'Outside micrometer'],
  ['inside_micrometer', 'Inside micrometer'],
  ['bore_gauge', 'Bore gauge'],
  ['caliper', 'Caliper'],
  ['dial_indicator', 'Dial indicator'],
  ['feeler_gauge', 'Feeler gauge'],
  ['tape', 'Tape'],
].map(([value, label]) => ({ value, label }));

export const QUANTITY_CHOICES = [
  ['diameter', 'Diameter'],
  ['length', 'Length'],
  ['clearance', 'Clearance'],
  ['runout', 'Runout'],
  ['other', 'Other'],
].map(([value, label]) => ({ value, label }));

export const UNIT_CHOICES: { value: LengthUnit; label: string }[] = LENGTH_UNITS.map((unit) => ({ value: unit, label: unitLabel(unit) }));

const DECIMAL = /^\s*-?(\d+(\.\d*)?|\.\d+)\s*$/;

export const isDecimal = (text: string): boolean => DECIMAL.test(text);

/**
 * One step of the last digit written, as the default resolution of a reading typed in:
 * "0.015" → "0.001", "15.008" → "0.001", "530" → "1". Null for text that is not a decimal.
 */
export function stepOfDigits(text: string): string | null {
  if (!isDecimal(text)) return null;
  const decimals = text.trim().split('.')[1]?.length ?? 0;
  return decimals === 0 ? '1' : `0.${'0'.repeat(decimals - 1)}1`;
}
