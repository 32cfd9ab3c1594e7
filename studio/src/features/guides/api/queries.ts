import { queryOptions } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { AssemblyChoice, FootageChoice, Guide, GuideSummary, Playback, Revision } from './types';

export const guideQueries = {
  all: () => ['guides'] as const,
  lists: () => [...guideQueries.all(), 'list'] as const,
  list: (workshopId: string, buildId: string) =>
    queryOptions({
      queryKey: [...guideQueries.lists(), workshopId, buildId] as const,
      queryFn: ({ signal }) => apiRequest<GuideSummary[]>(`/workshops/${workshopId}/builds/${buildId}/guides`, { signal }),
    }),
  details: () => [...guideQueries.all(), 'detail'] as const,
  detail: (workshopId: string, guideId: string) =>
    queryOptions({
      queryKey: [...guideQueries.details(), workshopId, guideId] as const,
      queryFn: ({ signal }) => apiRequest<Guide>(`/workshops/${workshopId}/guides/${guideId}`, { signal }),
    }),
  revisions: (workshopId: string, guideId: string) =>
    queryOptions({
      queryKey: [...guideQueries.all(), 'revisions', workshopId, guideId] as const,
      queryFn: ({ signal }) => apiRequest<Revision[]>(`/workshops/${workshopId}/guides/${guideId}/revisions`, { signal }),
    }),
  /** The build's footage, to pick the guide's main video from. */
  footageChoices: (workshopId: string, buildId: string) =>
    queryOptions({
      queryKey: [...guideQueries.all(), 'footage-choices', workshopId, buildId] as const,
      queryFn: ({ signal }) => apiRequest<FootageChoice[]>(`/workshops/${workshopId}/builds/${buildId}/footage`, { signal }),
    }),
  /** The build's assemblies, to pick the one whose checklist and parts the guide carries. */
  assemblyChoices: (workshopId: string, buildId: string) =>
    queryOptions({
      queryKey: [...guideQueries.all(), 'assembly-choices', workshopId, buildId] as const,
      queryFn: ({ signal }) => apiRequest<AssemblyChoice[]>(`/workshops/${workshopId}/builds/${buildId}/assemblies`, { signal }),
    }),
  /** The footage's presigned video link (valid for an hour): kept while the page is open so the player is not reloaded. */
  playback: (workshopId: string, footageId: string) =>
    queryOptions({
      queryKey: [...guideQueries.all(), 'playback', workshopId, footageId] as const,
      queryFn: ({ signal }) => apiRequest<Playback>(`/workshops/${workshopId}/footage/${footageId}/playback`, { signal }),
      staleTime: Infinity,
      gcTime: 0,
    }),
};
