import { queryOptions } from '@tanstack/react-query';
import { ApiError, apiRequest } from '@/lib/api-client';
import type { FitCheckState } from '@/components/check-state';
import type { ApiSchema } from '@/lib/api-types';

export type Mark = ApiSchema<'MarkResponseDto'>;
export type MarkKind = Mark['kind'];
/** The kinds in the order the form offers them; `satisfies` keeps them within the API's enum. */
export const MARK_KINDS = ['part', 'measurement', 'check_evidence', 'step', 'caution', 'note'] as const satisfies readonly MarkKind[];
/** A suggestion as the studio reads it (it never needs the transcript revision it was mined from). */
export type MarkSuggestion = Omit<ApiSchema<'MarkSuggestionResponseDto'>, 'transcriptId'>;

/** Only what the link pickers need from the parts, measurements, assemblies, fit-check and guide routes. */
export interface PartChoice {
  id: string;
  partNumber: string;
  title: string;
  features: { id: string; name: string; kind: 'spline' | 'diameter' | 'length' | 'free' }[];
}
export interface MeasurementChoice {
  id: string;
  featureId: string | null;
  interfaceId: string | null;
  /** The reading in its unit with the instrument's decimals, e.g. "0.5902 in". */
  shown: string;
  quantity: string;
  footageId: string | null;
  footageTimeMs: number | null;
}
export type { FitCheckState };
/** An assembly of the workshop with what a mark can point at in it: its interfaces and its fit checks. */
export interface LinkAssembly {
  id: string;
  name: string;
  buildId: string;
  buildTitle: string;
  interfaces: { id: string; name: string }[];
  /** In the order they were added; `interfaceId` is set on a check derived from an interface. */
  checks: { id: string; title: string; state: FitCheckState; interfaceId: string | null }[];
}
/** GET /workshops/:id/guide-steps (the guides contract). */
export interface GuideStepChoice {
  id: string;
  guideId: string;
  guideTitle: string;
  position: number;
  title: string;
  startMs: number | null;
}

/** Reads every assembly of every build, with its interfaces and checklist: the workshop's link targets. */
async function fetchLinkAssemblies(workshopId: string, signal: AbortSignal): Promise<LinkAssembly[]> {
  const builds = await apiRequest<{ id: string; title: string }[]>(`/workshops/${workshopId}/builds`, { signal });
  const perBuild = await Promise.all(
    builds.map(async (build) => {
      const assemblies = await apiRequest<{ id: string; name: string }[]>(`/workshops/${workshopId}/builds/${build.id}/assemblies`, { signal });
      return Promise.all(
        assemblies.map(async (assembly): Promise<LinkAssembly> => {
          const [detail, checklist] = await Promise.all([
            apiRequest<{ interfaces: { id: string; name: string }[] }>(`/workshops/${workshopId}/assemblies/${assembly.id}`, { signal }),
            apiRequest<{ checks: { id: string; title: string; state: FitCheckState; interfaceId: string | null }[] }>(
              `/workshops/${workshopId}/assemblies/${assembly.id}/checklist`,
              { signal },
            ),
          ]);
          return {
            id: assembly.id,
            name: assembly.name,
            buildId: build.id,
            buildTitle: build.title,
            interfaces: detail.interfaces.map(({ id, name }) => ({ id, name })),
            checks: checklist.checks.map(({ id, title, state, interfaceId }) => ({ id, title, state, interfaceId: interfaceId ?? null })),
          };
        }),
      );
    }),
  );
  return perBuild.flat();
}

/** A missing guides route (404) means there are no guide steps to link yet, not a failure. */
async function fetchGuideSteps(workshopId: string, query: { footageId?: string }, signal: AbortSignal): Promise<GuideStepChoice[]> {
  try {
    return await apiRequest<GuideStepChoice[]>(`/workshops/${workshopId}/guide-steps`, { signal, query });
  } catch (error) {
    if (error instanceof ApiError && error.status === 404) return [];
    throw error;
  }
}

export const markQueries = {
  all: () => ['marks'] as const,
  list: (workshopId: string, footageId: string) =>
    queryOptions({
      queryKey: [...markQueries.all(), 'list', workshopId, footageId] as const,
      queryFn: ({ signal }) => apiRequest<Mark[]>(`/workshops/${workshopId}/footage/${footageId}/marks`, { signal }),
    }),
  suggestions: (workshopId: string, footageId: string) =>
    queryOptions({
      queryKey: [...markQueries.all(), 'suggestions', workshopId, footageId] as const,
      queryFn: ({ signal }) => apiRequest<MarkSuggestion[]>(`/workshops/${workshopId}/footage/${footageId}/mark-suggestions`, { signal }),
    }),
  /** The footage's build, so links into that build are offered first. */
  footage: (workshopId: string, footageId: string) =>
    queryOptions({
      queryKey: [...markQueries.all(), 'footage', workshopId, footageId] as const,
      queryFn: ({ signal }) => apiRequest<{ id: string; buildId: string }>(`/workshops/${workshopId}/footage/${footageId}`, { signal }),
    }),
  parts: (workshopId: string) =>
    queryOptions({
      queryKey: [...markQueries.all(), 'link-parts', workshopId] as const,
      queryFn: ({ signal }) => apiRequest<PartChoice[]>(`/workshops/${workshopId}/parts`, { signal }),
    }),
  measurements: (workshopId: string) =>
    queryOptions({
      queryKey: [...markQueries.all(), 'link-measurements', workshopId] as const,
      queryFn: async ({ signal }) =>
        (await apiRequest<{ measurements: MeasurementChoice[] }>(`/workshops/${workshopId}/measurements`, { signal })).measurements,
    }),
  assemblies: (workshopId: string) =>
    queryOptions({
      queryKey: [...markQueries.all(), 'link-assemblies', workshopId] as const,
      queryFn: ({ signal }) => fetchLinkAssemblies(workshopId, signal),
    }),
  /** Steps anchored in this footage first, then the workshop's other steps. */
  guideSteps: (workshopId: string, footageId: string) =>
    queryOptions({
      queryKey: [...markQueries.all(), 'link-guide-steps', workshopId, footageId] as const,
      queryFn: async ({ signal }) => {
        const [inFootage, every] = await Promise.all([
          fetchGuideSteps(workshopId, { footageId }, signal),
          fetchGuideSteps(workshopId, {}, signal),
        ]);
        const anchored = new Set(inFootage.map((step) => step.id));
        return { inFootage, others: every.filter((step) => !anchored.has(step.id)) };
      },
    }),
};
