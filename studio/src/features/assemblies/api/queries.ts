import { queryOptions } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { LengthUnit } from '@/lib/units';

export const INTERFACE_KINDS = ['spline', 'bore_shaft', 'length_window'] as const;
export type InterfaceKind = (typeof INTERFACE_KINDS)[number];

export interface Assembly {
  id: string;
  buildId: string;
  name: string;
  notes: string;
  createdAt: string;
  updatedAt: string;
}

/** The part features an interface can join, as the assembly detail carries them. */
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
    toleranceClass?: string;
    nominalNm?: number;
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

export interface AssemblyInterface {
  id: string;
  kind: InterfaceKind;
  name: string;
  featureAId: string;
  featureBId: string | null;
  unit: LengthUnit;
  installedMinNm: number | null;
  installedMaxNm: number | null;
  marginNm: number | null;
  installedMin: string | null;
  installedMax: string | null;
  margin: string | null;
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
      queryFn: ({ signal }) => apiRequest<AssemblyDetail>(`/workshops/${workshopId}/assemblies/${assemblyId}`, { signal }),
    }),
  /** The workshop's parts, to choose from when placing one. */
  partChoices: (workshopId: string) =>
    queryOptions({
      queryKey: [...assemblyQueries.all(), 'part-choices', workshopId] as const,
      queryFn: ({ signal }) => apiRequest<PartInfo[]>(`/workshops/${workshopId}/parts`, { signal }),
    }),
};
