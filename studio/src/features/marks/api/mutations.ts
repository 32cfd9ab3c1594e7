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

/** The list's order, as the API gives it: by start, then creation (a provisional row, made now, goes last). */
function inTimeOrder(marks: Mark[]): Mark[] {
  return [...marks].sort((a, b) => a.startMs - b.startMs || a.createdAt.localeCompare(b.createdAt) || a.id.localeCompare(b.id));
}

/** Ids of marks drawn before the API has answered; never sent to it. */
let provisionalCount = 0;
export const PROVISIONAL_MARK_PREFIX = 'provisional-';

/**
 * Saving a mark changes one row of one footage's list: the list in the cache is changed at once (a new mark shows
 * as soon as it is pinned, an edited one at its new time), then takes the API's answer, or goes back as it was
 * when the API refuses. Nothing is read again: refetching every mark (and every list a link could name) for one
 * pin drew the whole workspace again at three hours.
 */
export function useSaveMark(workshopId: string, footageId: string) {
  const queryClient = useQueryClient();
  const listKey = markQueries.list(workshopId, footageId).queryKey;
  return useMutation({
    mutationFn: ({ id, ...input }: MarkInput & { id?: string }) =>
      id
        ? apiRequest<Mark>(`${base(workshopId, footageId)}/marks/${id}`, { method: 'PATCH', body: input })
        : apiRequest<Mark>(`${base(workshopId, footageId)}/marks`, { method: 'POST', body: input }),
    onMutate: async ({ id, ...input }) => {
      // A read on its way would overwrite the change with the list as it was.
      await queryClient.cancelQueries({ queryKey: listKey });
      const before = queryClient.getQueryData(listKey);
      const now = new Date().toISOString();
      const shownId = id ?? `${PROVISIONAL_MARK_PREFIX}${(provisionalCount += 1)}`;
      if (before) {
        const edited = id ? before.find((mark) => mark.id === id) : undefined;
        const shown: Mark = {
          id: shownId,
          footageId,
          endMs: null,
          partId: null,
          measurementId: null,
          fitCheckId: null,
          guideStepId: null,
          createdBy: null,
          createdAt: now,
          ...edited,
          ...input,
          updatedAt: now,
        };
        queryClient.setQueryData(listKey, inTimeOrder([...before.filter((mark) => mark.id !== shownId), shown]));
      }
      return { before, shownId };
    },
    onSuccess: (saved, _input, context) => {
      queryClient.setQueryData(listKey, (current) =>
        current ? inTimeOrder([...current.filter((mark) => mark.id !== context.shownId && mark.id !== saved.id), saved]) : current,
      );
    },
    onError: (_error, _input, context) => {
      if (context?.before) queryClient.setQueryData(listKey, context.before);
    },
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

/** Removing a mark takes its row out of the cached list at once, and puts it back if the API refuses. */
export function useRemoveMark(workshopId: string, footageId: string) {
  const queryClient = useQueryClient();
  const listKey = markQueries.list(workshopId, footageId).queryKey;
  return useMutation({
    mutationFn: (markId: string) => apiRequest<null>(`${base(workshopId, footageId)}/marks/${markId}`, { method: 'DELETE' }),
    onMutate: async (markId) => {
      await queryClient.cancelQueries({ queryKey: listKey });
      const before = queryClient.getQueryData(listKey);
      if (before) queryClient.setQueryData(listKey, before.filter((mark) => mark.id !== markId));
      return { before };
    },
    onError: (_error, _markId, context) => {
      if (context?.before) queryClient.setQueryData(listKey, context.before);
    },
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
