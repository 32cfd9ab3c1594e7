import { queryOptions } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';

/** Shapes of the marks routes (api/src/marks; OpenAPI at /api/docs). */
export const MARK_KINDS = ['part', 'measurement', 'check_evidence', 'step', 'caution', 'note'] as const;
export type MarkKind = (typeof MARK_KINDS)[number];

export interface Mark {
  id: string;
  footageId: string;
  startMs: number;
  endMs: number | null;
  kind: MarkKind;
  partId: string | null;
  measurementId: string | null;
  fitCheckId: string | null;
  guideStepId: string | null;
  label: string;
  createdBy: string | null;
  createdAt: string;
  updatedAt: string;
}

export interface MarkSuggestion {
  id: string;
  footageId: string;
  cueIndex: number;
  startMs: number;
  endMs: number;
  kind: 'measurement' | 'part';
  phrase: string;
  value: string | null;
  unit: 'mm' | 'um' | 'in' | null;
  millimetres: number | null;
  partId: string | null;
  status: 'pending' | 'accepted' | 'dismissed';
  markId: string | null;
}

/** Only what the link pickers need from the parts and measurements routes. */
export interface PartChoice {
  id: string;
  partNumber: string;
  title: string;
  features: { id: string; name: string }[];
}
export interface MeasurementChoice {
  id: string;
  shown: string;
  quantity: string;
  footageTimeMs: number | null;
}

export const markQueries = {
  all: () => ['marks'] as const,
  list: (workshopId: string, footageId: string) =>
    queryOptions({
      queryKey: [...markQueries.all(), 'list', workshopId, footageId] as const,
      queryFn: ({ signal }) => apiRequest<Mark[]>(`/workshops/${workshopId}/footage/${footageId}/marks`, { signal }),
    }),
  suggestions: (workshopId: string, footageId: string) =>
    queryOptions({
      queryKey: [...markQueries.all(), 'suggestions', workshopId, footageId] as const,
      queryFn: ({ signal }) => apiRequest<MarkSuggestion[]>(`/workshops/${workshopId}/footage/${footageId}/mark-suggestions`, { signal }),
    }),
  parts: (workshopId: string) =>
    queryOptions({
      queryKey: [...markQueries.all(), 'link-parts', workshopId] as const,
      queryFn: ({ signal }) => apiRequest<PartChoice[]>(`/workshops/${workshopId}/parts`, { signal }),
    }),
  measurements: (workshopId: string) =>
    queryOptions({
      queryKey: [...markQueries.all(), 'link-measurements', workshopId] as const,
      queryFn: async ({ signal }) =>
        (await apiRequest<{ measurements: MeasurementChoice[] }>(`/workshops/${workshopId}/measurements`, { signal })).measurements,
    }),
};
