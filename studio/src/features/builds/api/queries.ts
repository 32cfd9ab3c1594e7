import { queryOptions } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';

export const BUILD_STATUSES = ['planning', 'in_progress', 'verified', 'archived'] as const;
export type BuildStatus = (typeof BUILD_STATUSES)[number];

export interface Build {
  id: string;
  workshopId: string;
  title: string;
  vehicle: string;
  goal: string;
  status: BuildStatus;
  createdAt: string;
  updatedAt: string;
}

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
