import { queryOptions } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';

export type CheckState = 'up' | 'down';
export interface HealthReport {
  status: 'ok' | 'down';
  checks: { database: CheckState; storage: CheckState; mail: CheckState; queue: CheckState };
}

export const statusQueries = {
  all: () => ['status'] as const,
  health: () =>
    queryOptions({
      queryKey: [...statusQueries.all(), 'health'] as const,
      // 503 still carries the report of which check is down.
      queryFn: ({ signal }) => apiRequest<HealthReport>('/health', { signal, acceptStatuses: [503] }),
      refetchInterval: 10_000,
    }),
};
