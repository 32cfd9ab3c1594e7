import { queryOptions } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { ApiSchema } from '@/lib/api-types';

export type Build = ApiSchema<'BuildResponseDto'>;
export type BuildStatus = Build['status'];
/** In the order a build goes through them (for pickers); each must be a status of the contract. */
export const BUILD_STATUSES = ['planning', 'in_progress', 'verified', 'archived'] as const satisfies readonly BuildStatus[];

export const buildQueries = {
  all: () => ['builds'] as const,
  lists: () => [...buildQueries.all(), 'list'] as const,
  list: (workshopId: string) =>
    queryOptions({
      queryKey: [...buildQueries.lists(), workshopId] as const,
      queryFn: ({ signal }) => apiRequest<Build[]>(`/workshops/${workshopId}/builds`, { signal }),
    }),
  detail: (workshopId: string, buildId: string) =>
    queryOptions({
      queryKey: [...buildQueries.all(), 'detail', workshopId, buildId] as const,
      queryFn: ({ signal }) => apiRequest<Build>(`/workshops/${workshopId}/builds/${buildId}`, { signal }),
    }),
};
