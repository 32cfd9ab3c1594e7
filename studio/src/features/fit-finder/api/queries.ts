import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { ApiSchema } from '@/lib/api-types';

export type FitFinderAnswer = ApiSchema<'FitFinderAnswerDto'>;
export type FitFinderResult = ApiSchema<'FitFinderResultDto'>;
export type FinderCheck = ApiSchema<'FinderCheckDto'>;

/** What the form sends, as the address holds it (every value is text, as typed). */
export type FitFinderQuery = Partial<
  Record<
    | 'partNumber'
    | 'maker'
    | 'vehicle'
    | 'splineTeeth'
    | 'splinePitch'
    | 'pressureAngle'
    | 'splineFit'
    | 'diameter'
    | 'toleranceClass'
    | 'fit'
    | 'lengthMin'
    | 'lengthMax'
    | 'unit'
    | 'offset'
    | 'limit',
    string
  >
>;

export const FINDER_PAGE_SIZE = 10;

export const fitFinderQueries = {
  all: () => ['fit-finder'] as const,
  find: (query: FitFinderQuery) =>
    queryOptions({
      queryKey: [...fitFinderQueries.all(), 'find', query] as const,
      queryFn: ({ signal }) => apiRequest<FitFinderAnswer>('/fit-finder', { signal, query: { limit: String(FINDER_PAGE_SIZE), ...query } }),
      placeholderData: keepPreviousData,
      // A refusal names the field to fix; asking again changes nothing.
      retry: false,
    }),
};
