import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { ApiSchema } from '@/lib/api-types';

type FeatureInputDto = ApiSchema<'FeatureInputDto'>;

export type Part = ApiSchema<'PartResponseDto'>;
/** A part feature: `kind` tells which spec it carries (lengths in integer nanometres; `shown` has them in the feature's unit). */
export type PartFeature = Part['features'][number];
export type SplineSpec = ApiSchema<'SplineSpecDto'>;
export type DiameterSpec = ApiSchema<'DiameterSpecDto'>;
export type LengthSpec = ApiSchema<'LengthSpecDto'>;
export type FreeSpec = ApiSchema<'FreeSpecDto'>;
export type PartCategory = Part['category'];
export type PartSource = Part['source'];
export type FeatureKind = PartFeature['kind'];

// The choices offered in forms and filters, in the order shown; `satisfies` keeps them within the API's enums.
export const PART_CATEGORIES = ['coupler', 'shaft', 'joint', 'bearing', 'bore', 'plate', 'boot', 'seal', 'fastener', 'other'] as const satisfies readonly PartCategory[];
export const PART_SOURCES = ['new', 'remanufactured', 'used', 'original_equipment'] as const satisfies readonly PartSource[];
export const FEATURE_KINDS = ['spline', 'diameter', 'length', 'free'] as const satisfies readonly FeatureKind[];

export type SplinePressureAngle = NonNullable<FeatureInputDto['pressureAngle']>;
export type SplineFit = NonNullable<FeatureInputDto['splineFit']>;
export type SplineClass = NonNullable<FeatureInputDto['splineClass']>;
export const SPLINE_PRESSURE_ANGLES = [30, 37.5, 45] as const satisfies readonly SplinePressureAngle[];
export const SPLINE_FITS = ['side', 'major'] as const satisfies readonly SplineFit[];
export const SPLINE_CLASSES = [4, 5, 6, 7] as const satisfies readonly SplineClass[];

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

export type SplineCandidate = ApiSchema<'SplineCandidateDto'>;
export type SplineIdentification = ApiSchema<'SplineIdentificationDto'>;

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
