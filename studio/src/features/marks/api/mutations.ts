import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { ApiSchema } from '@/lib/api-types';
import { markQueries, type Mark, type MarkKind, type MarkSuggestion } from './queries';

export interface MarkInput {
  startMs: number;
  endMs?: number | null;
  kind: MarkKind;
  label: string;
  partId?: string | null;
  measurementId?: string | null;
  fitCheckId?: string | null;
  guideStepId?: string | null;
}

/** A reading recorded from the mark form: what was measured, as taken, and the moment of the footage that shows it. */
export interface ReadingInput {
  featureId?: string;
  interfaceId?: string;
  quantity: string;
  value: string;
  unit: string;
  instrumentKind: string;
  resolution: string;
  footageId: string;
  footageTimeMs: number;
}

export interface AcceptInput {
  featureId?: string;
  quantity?: string;
  instrumentKind?: string;
  resolution?: string;
}

const base = (workshopId: string, footageId: string) => `/workshops/${workshopId}/footage/${footageId}`;

/** Marks change the footage's marks and suggestions; an accepted reading also changes measurements and fit checks. */
function useRefresh(alsoReadings = false) {
  const queryClient = useQueryClient();
  return () =>
    Promise.all([
      queryClient.invalidateQueries({ queryKey: markQueries.all() }),
      ...(alsoReadings
        ? [queryClient.invalidateQueries({ queryKey: ['measurements'] }), queryClient.invalidateQueries({ queryKey: ['fit-checks'] })]
        : []),
    ]);
}

export function useSaveMark(workshopId: string, footageId: string) {
  const refresh = useRefresh();
  return useMutation({
    mutationFn: ({ id, ...input }: MarkInput & { id?: string }) =>
      id
        ? apiRequest<Mark>(`${base(workshopId, footageId)}/marks/${id}`, { method: 'PATCH', body: input })
        : apiRequest<Mark>(`${base(workshopId, footageId)}/marks`, { method: 'POST', body: input }),
    onSuccess: refresh,
  });
}

/** The measurements route, called from here so the reading and its mark are made in one form (features stay apart). */
export function useRecordReading(workshopId: string) {
  const refresh = useRefresh(true);
  return useMutation({
    mutationFn: (input: ReadingInput) =>
      apiRequest<ApiSchema<'MeasurementResponseDto'>>(`/workshops/${workshopId}/measurements`, {
        method: 'POST',
        body: input,
      }),
    onSuccess: refresh,
  });
}

export function useRemoveMark(workshopId: string, footageId: string) {
  const refresh = useRefresh();
  return useMutation({
    mutationFn: (markId: string) => apiRequest<null>(`${base(workshopId, footageId)}/marks/${markId}`, { method: 'DELETE' }),
    onSuccess: refresh,
  });
}

export function useAcceptSuggestion(workshopId: string, footageId: string) {
  const refresh = useRefresh(true);
  return useMutation({
    mutationFn: ({ id, ...input }: AcceptInput & { id: string }) =>
      apiRequest<ApiSchema<'AcceptedSuggestionResponseDto'>>(`${base(workshopId, footageId)}/mark-suggestions/${id}/accept`, {
        method: 'POST',
        body: input,
      }),
    onSuccess: refresh,
  });
}

export function useDismissSuggestion(workshopId: string, footageId: string) {
  const refresh = useRefresh();
  return useMutation({
    mutationFn: (id: string) =>
      apiRequest<MarkSuggestion>(`${base(workshopId, footageId)}/mark-suggestions/${id}/dismiss`, { method: 'POST' }),
    onSuccess: refresh,
  });
}
