import { queryOptions } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { ApiSchema } from '@/lib/api-types';
import type { LengthUnit } from '@/lib/units';

export type Assembly = ApiSchema<'AssemblyResponseDto'>;
export type AssemblyInterface = ApiSchema<'InterfaceResponseDto'>;
export type InterfaceKind = AssemblyInterface['kind'];
/** The kinds in the order the form offers them; `satisfies` keeps them within the API's enum. */
export const INTERFACE_KINDS = ['spline', 'bore_shaft', 'length_window'] as const satisfies readonly InterfaceKind[];

/**
 * The part features an interface can join, as the assembly detail carries them (ApiSchema<'AssemblyDetailDto'>), read
 * loosely: the interface pickers compare gender and role without narrowing by kind. The detail query reads the generated
 * type and returns it as this one, so a change of the API's shape that no longer fits fails the type check.
 */
export interface FeatureInfo {
  id: string;
  partId: string;
  name: string;
  kind: 'spline' | 'diameter' | 'length' | 'free';
  unit: LengthUnit;
  spec: {
    teeth?: number;
    gender?: 'internal' | 'external';
    role?: 'hole' | 'shaft';
    /** A diameter's ISO 286 class ("H7"), or a spline's class number (4 to 7). */
    toleranceClass?: string | number;
    nominalNm?: number;
    /** The other kinds' fields (lengths, free values), which the pickers do not read. */
    [other: string]: unknown;
  };
  shown: Record<string, string>;
}

export interface PartInfo {
  id: string;
  partNumber: string;
  maker: string;
  title: string;
  category: string;
  features: FeatureInfo[];
}

export interface AssemblyDetail extends Assembly {
  parts: { position: string; sortOrder: number; part: PartInfo }[];
  interfaces: AssemblyInterface[];
}

export const assemblyQueries = {
  all: () => ['assemblies'] as const,
  lists: () => [...assemblyQueries.all(), 'list'] as const,
  list: (workshopId: string, buildId: string) =>
    queryOptions({
      queryKey: [...assemblyQueries.lists(), workshopId, buildId] as const,
      queryFn: ({ signal }) => apiRequest<Assembly[]>(`/workshops/${workshopId}/builds/${buildId}/assemblies`, { signal }),
    }),
  detail: (workshopId: string, assemblyId: string) =>
    queryOptions({
      queryKey: [...assemblyQueries.all(), 'detail', workshopId, assemblyId] as const,
      queryFn: async ({ signal }): Promise<AssemblyDetail> =>
        apiRequest<ApiSchema<'AssemblyDetailDto'>>(`/workshops/${workshopId}/assemblies/${assemblyId}`, { signal }),
    }),
  /** The workshop's parts, to choose from when placing one. */
  partChoices: (workshopId: string) =>
    queryOptions({
      queryKey: [...assemblyQueries.all(), 'part-choices', workshopId] as const,
      queryFn: ({ signal }) => apiRequest<PartInfo[]>(`/workshops/${workshopId}/parts`, { signal }),
    }),
};
