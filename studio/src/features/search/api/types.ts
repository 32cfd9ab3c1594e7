import type { FitCheckState } from '@/components/check-state';

/** The answer of GET /api/search (api/src/search/dto/search.dto.ts). */
export const SEARCH_KINDS = ['guide', 'part', 'cue', 'build', 'footage', 'mark', 'fit_check', 'draft_guide'] as const;
export type SearchKind = (typeof SEARCH_KINDS)[number];
export type SearchState = 'published' | 'unpublished';
/** Fit-check states a search narrows to (the API's checkState; a retired check is history, not evidence). */
export const SEARCH_CHECK_STATES = ['confirmed', 'bench_pass', 'open', 'no_fit'] as const satisfies readonly FitCheckState[];
export type SearchCheckState = (typeof SEARCH_CHECK_STATES)[number];

export interface SnippetSegment {
  text: string;
  match: boolean;
}

export interface SearchHit {
  kind: SearchKind;
  id: string;
  published: boolean;
  title: string;
  snippet: SnippetSegment[];
  workshop: { name: string; slug: string };
  vehicle: string | null;
  startMs: number | null;
  checkState: FitCheckState | null;
  link: string;
}

export interface SearchResults {
  terms: string[];
  partNumbers: string[];
  total: number;
  /** True when total is a lower bound: show it as "1,000+". */
  totalCapped: boolean;
  offset: number;
  limit: number;
  counts: { kind: SearchKind; count: number; capped: boolean }[];
  results: SearchHit[];
}

export interface SearchFilters {
  q: string;
  kind?: SearchKind;
  workshop?: string;
  state?: SearchState;
  vehicle?: string;
  checkState?: SearchCheckState;
  offset?: number;
}
