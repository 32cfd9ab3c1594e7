import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { LengthUnit } from '@/lib/units';

export const PART_CATEGORIES = ['coupler', 'shaft', 'joint', 'bearing', 'bore', 'plate', 'boot', 'seal', 'fastener', 'other'] as const;
export type PartCategory = (typeof PART_CATEGORIES)[number];
export const PART_SOURCES = ['new', 'remanufactured', 'used', 'original_equipment'] as const;
export type PartSource = (typeof PART_SOURCES)[number];
export const FEATURE_KINDS = ['spline', 'diameter', 'length', 'free'] as const;
export type FeatureKind = (typeof FEATURE_KINDS)[number];

/** Lengths in integer nanometres, as the API stores them; `shown` has them written in the feature's unit. */
export interface SplineSpec {
  teeth: number;
  gender: 'internal' | 'external';
  diametralPitch?: number;
  stubPitch?: number;
  module?: number;
  majorDiameterNm?: number;
}
export interface DiameterSpec {
  role: 'hole' | 'shaft';
  nominalNm: number;
  toleranceClass?: string;
  maxNm?: number;
  minNm?: number;
}
export interface LengthSpec {
  lengthNm: number;
  compressedNm?: number;
  extendedNm?: number;
}
export interface FreeSpec {
  value: string;
  unit?: string;
}

interface FeatureBase {
  id: string;
  partId: string;
  name: string;
  unit: LengthUnit;
  shown: Record<string, string>;
}
export type PartFeature =
  | (FeatureBase & { kind: 'spline'; spec: SplineSpec })
  | (FeatureBase & { kind: 'diameter'; spec: DiameterSpec })
  | (FeatureBase & { kind: 'length'; spec: LengthSpec })
  | (FeatureBase & { kind: 'free'; spec: FreeSpec });

export interface Part {
  id: string;
  workshopId: string;
  partNumber: string;
  maker: string;
  title: string;
  category: PartCategory;
  source: PartSource;
  notes: string;
  photos: { id: string; url: string }[];
  features: PartFeature[];
  createdAt: string;
  updatedAt: string;
}

export interface PartFilters {
  q?: string;
  category?: PartCategory;
  featureKind?: FeatureKind;
  splineTeeth?: number;
}

export const partQueries = {
  all: () => ['parts'] as const,
  lists: () => [...partQueries.all(), 'list'] as const,
  list: (workshopId: string, filters: PartFilters = {}) =>
    queryOptions({
      queryKey: [...partQueries.lists(), workshopId, filters] as const,
      queryFn: ({ signal }) => apiRequest<Part[]>(`/workshops/${workshopId}/parts`, { signal, query: { ...filters } }),
      // Typing in the search box keeps the last rows on screen instead of flashing a skeleton.
      placeholderData: keepPreviousData,
    }),
  detail: (workshopId: string, partId: string) =>
    queryOptions({
      queryKey: [...partQueries.all(), 'detail', workshopId, partId] as const,
      queryFn: ({ signal }) => apiRequest<Part>(`/workshops/${workshopId}/parts/${partId}`, { signal }),
    }),
};

/** GET /api/tools/splines/identify: a shaft's major diameter or a hub's bore (minor diameter), with the reading's unit. */
export interface SplineIdentifyQuery {
  teeth: number;
  majorDiameter?: number;
  minorDiameter?: number;
  unit: 'in' | 'mm';
  resolution?: number;
}

export interface SplineCandidate {
  designation: string;
  standard: string;
  /** "16/32" or "m1.25". */
  pitch: string;
  pressureAngle: number;
  alsoFits: string[];
  basicDiameter: { value: number; unit: 'in' | 'mm'; converted: { value: number; unit: 'in' | 'mm' } };
  deviation: { value: number; unit: 'in' | 'mm' };
  explainsReading: boolean;
}

export interface SplineIdentification {
  teeth: number;
  feature: 'major' | 'minor';
  measured: { value: number; unit: 'in' | 'mm'; resolution: number };
  candidates: SplineCandidate[];
  pitfalls: string[];
  rule: string;
}

export const splineToolQueries = {
  all: () => ['spline-tools'] as const,
  identify: (query: SplineIdentifyQuery) =>
    queryOptions({
      queryKey: [...splineToolQueries.all(), 'identify', query] as const,
      queryFn: ({ signal }) => apiRequest<SplineIdentification>('/tools/splines/identify', { signal, query: { ...query } }),
      // The standards' sizes do not change while the form is open.
      staleTime: Infinity,
    }),
};
