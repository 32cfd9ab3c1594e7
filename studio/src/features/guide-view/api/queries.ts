import { queryOptions } from '@tanstack/react-query';
import { ApiError } from '@/lib/api-client';
import { api } from '@/lib/api-paths';
import type { ApiSchema } from '@/lib/api-types';

/**
 * Public guide answers may be kept 30 s by any cache (`Cache-Control: public, max-age=30`), but someone who
 * just confirmed a check must see it: the studio always asks again with the ETag it holds (`no-cache`), which
 * the API answers with a 304 from one query while nothing changed.
 */
const REVALIDATE = 'no-cache';

/** A window of a published guide's transcript: the cues asked for, and how many the whole transcript has. */
export type CueWindow = ApiSchema<'CueWindowResponseDto'>;
export type WindowCue = ApiSchema<'CueDto'>;

/** Cues a row window holds: a few screenfuls of the transcript list. */
export const CUE_PAGE_SIZE = 100;
/** The stretch of time one "what is playing" window covers. */
export const CUE_SLICE_MS = 60_000;
/** The most cues the API gives in one window. */
const CUE_WINDOW_MAX = 500;
/** The cues windows are the same for everyone and cached a minute by the API; a reader need not ask again sooner. */
const CUE_STALE_MS = 60_000;

const CUES = '/guides/{workshopSlug}/{guideSlug}/cues';

/**
 * The public side of guides. Its root key is not the editor's (`['guides']`), so a reader's cache and a
 * creator's drafts never mix; the editor invalidates `['public-guides']` by its literal after publishing.
 */
export const guideViewQueries = {
  all: () => ['public-guides'] as const,
  list: (q: string) =>
    queryOptions({
      queryKey: [...guideViewQueries.all(), 'list', { q }] as const,
      queryFn: ({ signal }) => api.get('/guides', { signal, query: { q: q || undefined }, cache: REVALIDATE }),
      placeholderData: (previous) => previous,
    }),
  /** Rows `page × CUE_PAGE_SIZE` onwards of the transcript: what a scrolled list shows. Page 0 also gives the total. */
  cuePage: (workshopSlug: string, guideSlug: string, page: number) =>
    queryOptions({
      queryKey: [...guideViewQueries.all(), 'cues', workshopSlug, guideSlug, 'page', page] as const,
      queryFn: ({ signal }) =>
        api.get(CUES, { signal, path: { workshopSlug, guideSlug }, query: { fromIndex: page * CUE_PAGE_SIZE, limit: CUE_PAGE_SIZE } }),
      staleTime: CUE_STALE_MS,
      // No transcript (404) stays so.
      retry: (failureCount, error) => !(error instanceof ApiError && error.status === 404) && failureCount < 2,
    }),
  /** The cues playing during one slice of time (`slice × CUE_SLICE_MS` on): which row plays now. */
  cueSlice: (workshopSlug: string, guideSlug: string, slice: number) =>
    queryOptions({
      queryKey: [...guideViewQueries.all(), 'cues', workshopSlug, guideSlug, 'slice', slice] as const,
      queryFn: ({ signal }) =>
        api.get(CUES, { signal, path: { workshopSlug, guideSlug }, query: { fromMs: slice * CUE_SLICE_MS, toMs: (slice + 1) * CUE_SLICE_MS } }),
      staleTime: CUE_STALE_MS,
    }),
  /** Every cue, fetched in the largest windows the API gives: only once the reader searches the transcript. */
  allCues: (workshopSlug: string, guideSlug: string) =>
    queryOptions({
      queryKey: [...guideViewQueries.all(), 'cues', workshopSlug, guideSlug, 'all'] as const,
      queryFn: async ({ signal }) => {
        const cues: WindowCue[] = [];
        let total = Infinity;
        while (cues.length < total) {
          const window = await api.get(CUES, { signal, path: { workshopSlug, guideSlug }, query: { fromIndex: cues.length, limit: CUE_WINDOW_MAX } });
          total = window.total;
          if (window.cues.length === 0) break;
          cues.push(...window.cues);
        }
        return cues;
      },
      staleTime: CUE_STALE_MS,
    }),
  detail: (workshopSlug: string, guideSlug: string) =>
    queryOptions({
      queryKey: [...guideViewQueries.all(), 'detail', workshopSlug, guideSlug] as const,
      queryFn: ({ signal }) => api.get('/guides/{workshopSlug}/{guideSlug}', { signal, path: { workshopSlug, guideSlug }, cache: REVALIDATE }),
      // A missing guide stays missing; retrying only delays the page that says so.
      retry: (failureCount, error) => !(error instanceof ApiError && error.status === 404) && failureCount < 2,
    }),
};
