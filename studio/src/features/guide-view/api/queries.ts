import { queryOptions } from '@tanstack/react-query';
import { ApiError, apiRequest } from '@/lib/api-client';
import type { PublishedGuide, PublishedGuideSummary } from './types';

/**
 * Public guide answers may be kept 30 s by any cache (`Cache-Control: public, max-age=30`), but someone who
 * just confirmed a check must see it: the studio always asks again with the ETag it holds (`no-cache`), which
 * the API answers with a 304 from one query while nothing changed.
 */
const REVALIDATE = 'no-cache';

/**
 * The public side of guides. Its root key is not the editor's (`['guides']`), so a reader's cache and a
 * creator's drafts never mix; the editor invalidates `['public-guides']` by its literal after publishing.
 */
export const guideViewQueries = {
  all: () => ['public-guides'] as const,
  list: (q: string) =>
    queryOptions({
      queryKey: [...guideViewQueries.all(), 'list', { q }] as const,
      queryFn: ({ signal }) => apiRequest<PublishedGuideSummary[]>('/guides', { signal, query: { q: q || undefined }, cache: REVALIDATE }),
      placeholderData: (previous) => previous,
    }),
  detail: (workshopSlug: string, guideSlug: string) =>
    queryOptions({
      queryKey: [...guideViewQueries.all(), 'detail', workshopSlug, guideSlug] as const,
      queryFn: ({ signal }) =>
        apiRequest<PublishedGuide>(`/guides/${encodeURIComponent(workshopSlug)}/${encodeURIComponent(guideSlug)}`, { signal, cache: REVALIDATE }),
      // A missing guide stays missing; retrying only delays the page that says so.
      retry: (failureCount, error) => !(error instanceof ApiError && error.status === 404) && failureCount < 2,
    }),
};
