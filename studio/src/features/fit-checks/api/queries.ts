import { queryOptions } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { ApiSchema } from '@/lib/api-types';
import type { LengthUnit } from '@/lib/units';

import type { ChecklistVerdict, FitCheckState } from '@/components/check-state';

export type { ChecklistVerdict, FitCheckState };
export type FitCheck = ApiSchema<'FitCheckResponseDto'>;
export type Evidence = ApiSchema<'EvidenceResponseDto'>;
export type Checklist = ApiSchema<'ChecklistResponseDto'>;
/** One state change; `actorName` is the member's display name (members read the history; the public page never shows it), null for the fit engine. */
export type FitCheckEvent = ApiSchema<'FitCheckEventResponseDto'>;
export type WhatIfResult = ApiSchema<'WhatIfResponseDto'>;
export type CheckKind = FitCheck['kind'];

/** The assembly as the checklist needs it: which features each interface joins, with their specs. */
export interface ChecklistFeature {
  id: string;
  partId: string;
  name: string;
  kind: 'spline' | 'diameter' | 'length' | 'free';
  unit: LengthUnit;
  spec: { role?: 'hole' | 'shaft'; nominalNm?: number; toleranceClass?: string; maxNm?: number; minNm?: number };
}
export interface ChecklistAssembly {
  id: string;
  name: string;
  parts: { position: string; part: { id: string; partNumber: string; features: ChecklistFeature[] } }[];
  interfaces: { id: string; kind: 'spline' | 'bore_shaft' | 'length_window'; name: string; featureAId: string; featureBId: string | null; unit: LengthUnit }[];
}

export interface Reading {
  id: string;
  featureId: string | null;
  interfaceId: string | null;
  quantity: string;
  unit: LengthUnit;
  valueNm: number;
  shown: string;
  instrument: { kind: string; resolutionNm: number };
  takenAt: string;
}

/** ISO 286 limit deviations of one class, µm. */
export interface ZoneUm {
  upper: number;
  lower: number;
}

export const fitCheckQueries = {
  all: () => ['fit-checks'] as const,
  checklist: (workshopId: string, assemblyId: string) =>
    queryOptions({
      queryKey: [...fitCheckQueries.all(), 'checklist', workshopId, assemblyId] as const,
      queryFn: ({ signal }) => apiRequest<Checklist>(`/workshops/${workshopId}/assemblies/${assemblyId}/checklist`, { signal }),
    }),
  history: (workshopId: string, checkId: string) =>
    queryOptions({
      queryKey: [...fitCheckQueries.all(), 'history', workshopId, checkId] as const,
      queryFn: ({ signal }) => apiRequest<FitCheckEvent[]>(`/workshops/${workshopId}/checks/${checkId}/history`, { signal }),
    }),
  // The assemblies part of the studio keeps its own copy of this; the checklist reads only the specs it draws.
  assembly: (workshopId: string, assemblyId: string) =>
    queryOptions({
      queryKey: [...fitCheckQueries.all(), 'assembly', workshopId, assemblyId] as const,
      queryFn: ({ signal }) => apiRequest<ChecklistAssembly>(`/workshops/${workshopId}/assemblies/${assemblyId}`, { signal }),
    }),
  /** Every reading of the workshop: the evidence picker and the diagrams' markers filter it to the assembly. */
  readings: (workshopId: string) =>
    queryOptions({
      queryKey: [...fitCheckQueries.all(), 'readings', workshopId] as const,
      queryFn: async ({ signal }) =>
        (await apiRequest<{ measurements: Reading[] }>(`/workshops/${workshopId}/measurements`, { signal })).measurements,
    }),
  whatIf: (workshopId: string, interfaceId: string, delta: string, unit: LengthUnit) =>
    queryOptions({
      queryKey: [...fitCheckQueries.all(), 'what-if', workshopId, interfaceId, delta, unit] as const,
      queryFn: ({ signal }) =>
        apiRequest<WhatIfResult>(`/workshops/${workshopId}/interfaces/${interfaceId}/what-if`, { signal, query: { delta, unit } }),
    }),
  /**
   * The limits of one tolerance class at a size. The public calculator takes a hole and a shaft, so
   * the class is paired with the basic partner of the same grade (H or h), whose half is ignored.
   */
  zone: (sizeMm: number, toleranceClass: string) =>
    queryOptions({
      queryKey: [...fitCheckQueries.all(), 'zone', sizeMm, toleranceClass] as const,
      queryFn: async ({ signal }) => {
        const isHole = /^[A-Z]/.test(toleranceClass);
        const grade = toleranceClass.replace(/^[A-Za-z]+/, '');
        const limits = await apiRequest<{ hole: ZoneUm; shaft: ZoneUm }>('/tools/fits', {
          signal,
          query: { size: sizeMm, unit: 'mm', hole: isHole ? toleranceClass : `H${grade}`, shaft: isHole ? `h${grade}` : toleranceClass },
        });
        return isHole ? limits.hole : limits.shaft;
      },
      staleTime: Infinity,
    }),
};
