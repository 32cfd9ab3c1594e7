import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { SearchFilters, SearchResults } from './types';

export const SEARCH_PAGE_SIZE = 20;

/** Search answers depend on who is signed in; the session change clears the whole cache, so one key space is enough. */
export const searchQueries = {
  all: () => ['search'] as const,
  results: (filters: SearchFilters) =>
    queryOptions({
      queryKey: [...searchQueries.all(), 'results', filters] as const,
      queryFn: ({ signal }) =>
        apiRequest<SearchResults>('/search', {
          signal,
          query: {
            q: filters.q,
            kind: filters.kind,
            workshop: filters.workshop,
            state: filters.state,
            vehicle: filters.vehicle,
            checkState: filters.checkState,
            offset: filters.offset || undefined,
            limit: SEARCH_PAGE_SIZE,
          },
        }),
      enabled: filters.q.trim().length > 0,
      placeholderData: keepPreviousData,
    }),
};
