import { LENGTH_UNITS, unitLabel, type LengthUnit } from '@/lib/units';
import type { InstrumentKind, Quantity } from '../api/queries';

export const INSTRUMENT_LABELS: Record<InstrumentKind, string> = {
  outside_micrometer: 'Outside micrometer',
  inside_micrometer: 'Inside micrometer',
  bore_gauge: 'Bore gauge',
  caliper: 'Caliper',
  dial_indicator: 'Dial indicator',
  feeler_gauge: 'Feeler gauge',
  tape: 'Tape measure',
  other: 'Other instrument',
};

export const QUANTITY_LABELS: Record<Quantity, string> = {
  diameter: 'Diameter',
  length: 'Length',
  clearance: 'Clearance',
  runout: 'Runout',
  other: 'Other',
};

export const UNIT_OPTIONS: { value: LengthUnit; label: string }[] = LENGTH_UNITS.map((unit) => ({ value: unit, label: unitLabel(unit) }));

/**
 * A usual smallest step for an instrument in a unit, offered until the person types their own
 * (common shop practice: a 0.0001 in micrometer, a 0.01 mm caliper); always editable.
 */
export function typicalResolution(kind: InstrumentKind, unit: LengthUnit): string {
  const fine = kind === 'outside_micrometer' || kind === 'inside_micrometer' || kind === 'bore_gauge';
  const coarse = kind === 'tape';
  switch (unit) {
    case 'mm':
      return fine ? '0.001' : coarse ? '1' : '0.01';
    case 'um':
      return fine ? '1' : coarse ? '1000' : '10';
    case 'in':
      return fine ? '0.0001' : coarse ? '0.0625' : '0.001';
    case 'thou':
      return fine ? '0.1' : coarse ? '62.5' : '1';
    case 'tenths':
      return fine ? '1' : coarse ? '625' : '10';
  }
}
