import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { ApiSchema } from '@/lib/api-types';
import { fitCheckQueries } from './queries';

/** How one change of a check that was news reached its followers: told, pending, failed, waiting in digests. */
export type ChangeDeliveryRecord = ApiSchema<'ChangeDeliveryRecordDto'>;

/** While mail is still going out the counts move: read them again every few seconds until nothing is pending. */
const WHILE_SENDING_MS = 5000;

export function fitNewsRecordQuery(workshopId: string, checkId: string) {
  return queryOptions({
    // Under the fit-checks root, so a transition (which invalidates it) brings the new change's row.
    queryKey: [...fitCheckQueries.all(), 'fit-news', workshopId, checkId] as const,
    queryFn: ({ signal }) => apiRequest<ChangeDeliveryRecord[]>(`/workshops/${workshopId}/checks/${checkId}/fit-news`, { signal }),
    refetchInterval: (query) => (query.state.data?.some((change) => change.pending > 0) ? WHILE_SENDING_MS : false),
  });
}

/** Owners: send the check's failed fit news again; the answer is the new record. */
export function useRetryFailedFitNews(workshopId: string, checkId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => apiRequest<ChangeDeliveryRecord[]>(`/workshops/${workshopId}/checks/${checkId}/fit-news/retry`, { method: 'POST' }),
    onSuccess: (record) => queryClient.setQueryData(fitNewsRecordQuery(workshopId, checkId).queryKey, record),
  });
}
