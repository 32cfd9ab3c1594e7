import { queryOptions } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { ApiSchema } from '@/lib/api-types';

export interface FitQuery {
  size: string;
  unit: 'mm' | 'in';
  hole: string;
  shaft: string;
  /** Only when asked: the older rounding of odd js/JS IT7–IT11 to even; the API's default is ±IT/2. */
  jsRounding?: 'even';
}

/** Deviations and clearances in µm; a negative clearance minimum means the parts may interfere. */
export type FitAnswer = ApiSchema<'FitLimitsDto'>;

export interface SplineQuery {
  teeth: string;
  pitch: string;
  pressureAngle: '30' | '37.5' | '45';
  root: 'flat' | 'fillet';
  fit: 'side' | 'major';
}

export interface SplineLength {
  value: number;
  unit: 'in' | 'mm';
  converted: { value: number; unit: 'in' | 'mm' };
}

export type SplineDimensionName =
  | 'pitchDiameter'
  | 'baseDiameter'
  | 'circularPitch'
  | 'basicSpaceWidth'
  | 'basicToothThickness'
  | 'internalMajorDiameter'
  | 'externalMajorDiameter'
  | 'internalMinorDiameter'
  | 'externalMinorDiameter'
  | 'internalFormDiameter'
  | 'externalFormDiameter'
  | 'formClearance';

/** GET /api/tools/splines: basic dimensions in the designation's own unit, each with its exact conversion. */
export interface SplineDimensionsAnswer {
  designation: string;
  standard: string;
  teeth: number;
  pitch: string;
  pressureAngle: number;
  root: 'flat' | 'fillet';
  fit: 'side' | 'major';
  unit: 'in' | 'mm';
  dimensions: Record<SplineDimensionName, SplineLength>;
  notes: string[];
}

export const fitCalculatorQueries = {
  all: () => ['fit-calculator'] as const,
  limits: (query: FitQuery) =>
    queryOptions({
      queryKey: [...fitCalculatorQueries.all(), query] as const,
      queryFn: ({ signal }) => apiRequest<FitAnswer>('/tools/fits', { signal, query: { ...query } }),
      // ISO 286 tables do not change while the page is open.
      staleTime: Infinity,
    }),
  splineDimensions: (query: SplineQuery) =>
    queryOptions({
      queryKey: [...fitCalculatorQueries.all(), 'spline', query] as const,
      queryFn: ({ signal }) => apiRequest<SplineDimensionsAnswer>('/tools/splines', { signal, query: { ...query } }),
      // The standards' equations do not change while the page is open.
      staleTime: Infinity,
    }),
};
