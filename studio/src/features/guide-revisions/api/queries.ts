import { queryOptions, useMutation } from '@tanstack/react-query';
import { ApiError, apiRequest } from '@/lib/api-client';
import type { ApiSchema } from '@/lib/api-types';

export type RevisionList = ApiSchema<'PublicRevisionListDto'>;
export type Revision = ApiSchema<'PublicRevisionDto'>;
export type RevisionCompare = ApiSchema<'RevisionCompareDto'>;
export type GuideReading = ApiSchema<'GuideReadingDto'>;
export type TextPiece = ApiSchema<'TextPieceDto'>;

function guidePath(workshopSlug: string, guideSlug: string): string {
  return `/guides/${encodeURIComponent(workshopSlug)}/${encodeURIComponent(guideSlug)}`;
}

/** A missing guide or revision stays missing; retrying only delays the page that says so. */
const retryUnlessMissing = (failureCount: number, error: Error) => !(error instanceof ApiError && error.status === 404) && failureCount < 2;

/** Published revisions of one guide, and the signed-in reader's own last-read record (kept apart: never shared). */
export const guideRevisionQueries = {
  all: () => ['guide-revisions'] as const,
  list: (workshopSlug: string, guideSlug: string) =>
    queryOptions({
      queryKey: [...guideRevisionQueries.all(), workshopSlug, guideSlug, 'list'] as const,
      queryFn: ({ signal }) => apiRequest<RevisionList>(`${guidePath(workshopSlug, guideSlug)}/revisions`, { signal }),
      retry: retryUnlessMissing,
    }),
  revision: (workshopSlug: string, guideSlug: string, number: number) =>
    queryOptions({
      queryKey: [...guideRevisionQueries.all(), workshopSlug, guideSlug, 'revision', number] as const,
      queryFn: ({ signal }) => apiRequest<Revision>(`${guidePath(workshopSlug, guideSlug)}/revisions/${number}`, { signal }),
      retry: retryUnlessMissing,
    }),
  compare: (workshopSlug: string, guideSlug: string, from: number, to: number) =>
    queryOptions({
      queryKey: [...guideRevisionQueries.all(), workshopSlug, guideSlug, 'compare', from, to] as const,
      queryFn: ({ signal }) => apiRequest<RevisionCompare>(`${guidePath(workshopSlug, guideSlug)}/revisions/compare`, { signal, query: { from, to } }),
      retry: retryUnlessMissing,
    }),
  /** Read once when the guide opens: the notice keeps what it said even after the visit is recorded. */
  reading: (workshopSlug: string, guideSlug: string) =>
    queryOptions({
      queryKey: [...guideRevisionQueries.all(), workshopSlug, guideSlug, 'reading'] as const,
      queryFn: ({ signal }) => apiRequest<GuideReading>(`${guidePath(workshopSlug, guideSlug)}/reading`, { signal }),
      staleTime: Infinity,
      retry: false,
    }),
};

/** Records that the signed-in reader has opened the guide as published now. */
export function useRecordReading(workshopSlug: string, guideSlug: string) {
  return useMutation({
    mutationFn: () => apiRequest<GuideReading>(`${guidePath(workshopSlug, guideSlug)}/reading`, { method: 'PUT' }),
  });
}
