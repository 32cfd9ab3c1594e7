import { queryOptions } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { LengthUnit } from '@/lib/units';

export const QUANTITIES = ['diameter', 'length', 'clearance', 'runout', 'other'] as const;
export type Quantity = (typeof QUANTITIES)[number];
export const INSTRUMENT_KINDS = [
  'outside_micrometer',
  'inside_micrometer',
  'bore_gauge',
  'caliper',
  'dial_indicator',
  'feeler_gauge',
  'tape',
  'other',
] as const;
export type InstrumentKind = (typeof INSTRUMENT_KINDS)[number];

export interface Measurement {
  id: string;
  featureId: string | null;
  interfaceId: string | null;
  quantity: Quantity;
  /** Exactly as taken, in `unit`. */
  value: string;
  unit: LengthUnit;
  valueNm: number;
  /** The reading in its unit with the instrument's decimals, e.g. "0.6692 in". */
  shown: string;
  instrument: { kind: InstrumentKind; resolutionNm: number; resolution: string; calibratedOn: string | null; note: string };
  temperatureC: number | null;
  takenBy: string | null;
  takenAt: string;
  footageId: string | null;
  footageTimeMs: number | null;
  note: string;
}

export interface MeasurementSummary {
  count: number;
  unit: LengthUnit;
  meanNm: number;
  spreadNm: number;
  mean: string;
  spread: string;
}

export interface MeasurementList {
  measurements: Measurement[];
  summary: MeasurementSummary | null;
}

/** What was measured: a part feature, or an interface (a clearance read across two parts). */
export type MeasurementSubject = { featureId: string; interfaceId?: undefined } | { interfaceId: string; featureId?: undefined };

export const measurementQueries = {
  all: () => ['measurements'] as const,
  lists: () => [...measurementQueries.all(), 'list'] as const,
  list: (workshopId: string, subject: MeasurementSubject) =>
    queryOptions({
      queryKey: [...measurementQueries.lists(), workshopId, subject] as const,
      queryFn: ({ signal }) =>
        apiRequest<MeasurementList>(`/workshops/${workshopId}/measurements`, { signal, query: { ...subject } }),
    }),
};
