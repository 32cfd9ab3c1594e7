import { queryOptions } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';

export interface FitQuery {
  size: string;
  unit: 'mm' | 'in';
  hole: string;
  shaft: string;
}

/** Deviations and clearances in µm; a negative clearance minimum means the parts may interfere. */
export interface FitAnswer {
  hole: { upper: number; lower: number };
  shaft: { upper: number; lower: number };
  clearance: { max: number; min: number };
  kind: 'clearance' | 'transition' | 'interference';
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
};
