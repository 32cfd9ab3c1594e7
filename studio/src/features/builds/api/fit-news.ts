import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { ApiSchema } from '@/lib/api-types';
import { buildQueries } from './queries';

/** A build's fit news: followers told about its checks' changes, pending, failed, and each check's line. */
export type BuildFitNewsRecord = ApiSchema<'BuildFitNewsRecordDto'>;
export type CheckFitNewsSummary = ApiSchema<'CheckFitNewsSummaryDto'>;

/** While mail is still going out the counts move: read them again every few seconds until nothing is pending. */
const WHILE_SENDING_MS = 5000;

export function buildFitNewsQuery(workshopId: string, buildId: string) {
  return queryOptions({
    queryKey: [...buildQueries.all(), 'fit-news', workshopId, buildId] as const,
    queryFn: ({ signal }) => apiRequest<BuildFitNewsRecord>(`/workshops/${workshopId}/builds/${buildId}/fit-news`, { signal }),
    refetchInterval: (query) => ((query.state.data?.pending ?? 0) > 0 ? WHILE_SENDING_MS : false),
  });
}

/** Owners: send the failed fit news of every check of the build again; the answer is the new record. */
export function useRetryBuildFitNews(workshopId: string, buildId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => apiRequest<BuildFitNewsRecord>(`/workshops/${workshopId}/builds/${buildId}/fit-news/retry`, { method: 'POST' }),
    onSuccess: (record) => queryClient.setQueryData(buildFitNewsQuery(workshopId, buildId).queryKey, record),
  });
}
