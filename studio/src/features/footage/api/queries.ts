import { infiniteQueryOptions, queryOptions } from '@tanstack/react-query';
import { ApiError, apiRequest } from '@/lib/api-client';
import type { CueMatch, Footage, HitMoments, FootageLimits, Playback, SearchResults, Transcript, TranscriptRevision, WorkshopCueMatch } from './types';

/** While footage is being processed (or its web renditions made) the studio asks every two seconds; otherwise it does not poll. */
const LIVE_STATE_POLL_MS = 2_000;
const isSettling = (footage: Footage) =>
  footage.state === 'processing' || footage.renditions?.state === 'waiting' || footage.renditions?.state === 'processing';

export const footageQueries = {
  all: () => ['footage'] as const,
  lists: () => [...footageQueries.all(), 'list'] as const,
  list: (workshopId: string, buildId: string) =>
    queryOptions({
      queryKey: [...footageQueries.lists(), workshopId, buildId] as const,
      queryFn: ({ signal }) => apiRequest<Footage[]>(`/workshops/${workshopId}/builds/${buildId}/footage`, { signal }),
      refetchInterval: (query) => (query.state.data?.some(isSettling) ? LIVE_STATE_POLL_MS : false),
    }),
  detail: (workshopId: string, footageId: string) =>
    queryOptions({
      queryKey: [...footageQueries.all(), 'detail', workshopId, footageId] as const,
      queryFn: ({ signal }) => apiRequest<Footage>(`/workshops/${workshopId}/footage/${footageId}`, { signal }),
      refetchInterval: (query) => (query.state.data && isSettling(query.state.data) ? LIVE_STATE_POLL_MS : false),
    }),
  limits: (workshopId: string) =>
    queryOptions({
      queryKey: [...footageQueries.all(), 'limits', workshopId] as const,
      queryFn: ({ signal }) => apiRequest<FootageLimits>(`/workshops/${workshopId}/footage-limits`, { signal }),
      staleTime: Infinity,
    }),
  /**
   * The link is valid for an hour; keep it while the page is open so the player is not reloaded under the viewer.
   * `renditionsState` is part of the key: once the renditions are ready the answer gains the HLS master.
   */
  playback: (workshopId: string, footageId: string, renditionsState?: string) =>
    queryOptions({
      queryKey: [...footageQueries.all(), 'playback', workshopId, footageId, renditionsState ?? null] as const,
      queryFn: ({ signal }) => apiRequest<Playback>(`/workshops/${workshopId}/footage/${footageId}/playback`, { signal }),
      staleTime: Infinity,
      gcTime: 0,
    }),
};

export const transcriptQueries = {
  all: () => ['transcripts'] as const,
  active: (workshopId: string, footageId: string) =>
    queryOptions({
      queryKey: [...transcriptQueries.all(), 'active', workshopId, footageId] as const,
      // No transcript yet is an answer, not an error.
      queryFn: async ({ signal }) => {
        try {
          return await apiRequest<Transcript>(`/workshops/${workshopId}/footage/${footageId}/transcript`, { signal });
        } catch (error) {
          if (error instanceof ApiError && error.status === 404) return null;
          throw error;
        }
      },
    }),
  revisions: (workshopId: string, footageId: string) =>
    queryOptions({
      queryKey: [...transcriptQueries.all(), 'revisions', workshopId, footageId] as const,
      queryFn: ({ signal }) =>
        apiRequest<TranscriptRevision[]>(`/workshops/${workshopId}/footage/${footageId}/transcript/revisions`, { signal }),
    }),
  /** Every hit, a page at a time ("Show more" fetches the next page). */
  search: (workshopId: string, footageId: string, q: string) =>
    infiniteQueryOptions({
      queryKey: [...transcriptQueries.all(), 'search', workshopId, footageId, q] as const,
      queryFn: ({ signal, pageParam }) =>
        apiRequest<SearchResults<CueMatch>>(`/workshops/${workshopId}/footage/${footageId}/transcript/search`, {
          signal,
          query: { q, offset: pageParam, limit: SEARCH_PAGE_SIZE },
        }),
      initialPageParam: 0,
      getNextPageParam: nextSearchOffset,
      enabled: q.trim().length > 0,
    }),
  /** When every hit starts (all of them at once, no text), for the hit density band on the marking timeline. */
  moments: (workshopId: string, footageId: string, q: string) =>
    queryOptions({
      queryKey: [...transcriptQueries.all(), 'moments', workshopId, footageId, q] as const,
      queryFn: ({ signal }) =>
        apiRequest<HitMoments>(`/workshops/${workshopId}/footage/${footageId}/transcript/search/moments`, { signal, query: { q } }),
      enabled: q.trim().length > 0,
    }),
  workshopSearch: (workshopId: string, q: string) =>
    infiniteQueryOptions({
      queryKey: [...transcriptQueries.all(), 'workshop-search', workshopId, q] as const,
      queryFn: ({ signal, pageParam }) =>
        apiRequest<SearchResults<WorkshopCueMatch>>(`/workshops/${workshopId}/transcripts/search`, {
          signal,
          query: { q, offset: pageParam, limit: SEARCH_PAGE_SIZE },
        }),
      initialPageParam: 0,
      getNextPageParam: nextSearchOffset,
      enabled: q.trim().length > 0,
    }),
};

const SEARCH_PAGE_SIZE = 50;

/** Where the next page of hits starts, or undefined when every hit has been fetched. */
export function nextSearchOffset(last: SearchResults<unknown>): number | undefined {
  const next = last.offset + last.results.length;
  return last.results.length > 0 && next < last.total ? next : undefined;
}

/** Where the player fetches captions: same origin, so the session cookie goes along. */
export function captionsUrl(workshopId: string, footageId: string, revision: number): string {
  return `/api/workshops/${workshopId}/footage/${footageId}/transcript/webvtt?revision=${revision}`;
}

export function downloadUrl(workshopId: string, footageId: string, revision: number): string {
  return `${captionsUrl(workshopId, footageId, revision)}&download=true`;
}
