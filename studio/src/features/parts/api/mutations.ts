import { useMutation, useQueryClient, type QueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { LengthUnit } from '@/lib/units';
import {
  partQueries,
  type FeatureKind,
  type Part,
  type PartCategory,
  type PartFeature,
  type PartSource,
  type SplineClass,
  type SplineFit,
  type SplinePressureAngle,
} from './queries';

export interface PartInput {
  partNumber: string;
  maker?: string;
  title: string;
  category: PartCategory;
  source?: PartSource;
  notes?: string;
}

/**
 * A feature as the API takes it: lengths as decimal strings in `unit`. On an update, null clears a
 * field (say, the diametral pitch when the spline turns out to be metric).
 */
export interface FeatureInput {
  name: string;
  kind: FeatureKind;
  unit?: LengthUnit;
  teeth?: number;
  gender?: 'internal' | 'external';
  diametralPitch?: number | null;
  stubPitch?: number | null;
  module?: number | null;
  pressureAngle?: SplinePressureAngle | null;
  splineFit?: SplineFit | null;
  splineClass?: SplineClass | null;
  majorDiameter?: string | null;
  role?: 'hole' | 'shaft';
  nominal?: string;
  toleranceClass?: string | null;
  max?: string | null;
  min?: string | null;
  length?: string;
  compressed?: string | null;
  extended?: string | null;
  value?: string;
  freeUnit?: string | null;
}

/**
 * A changed feature re-evaluates the fit checks that use it, and assemblies show parts' features:
 * both are refreshed by their root keys (they belong to other features of the studio).
 */
function refreshAfterFeatureChange(queryClient: QueryClient, workshopId: string, partId: string) {
  return Promise.all([
    queryClient.invalidateQueries({ queryKey: partQueries.detail(workshopId, partId).queryKey }),
    queryClient.invalidateQueries({ queryKey: partQueries.lists() }),
    queryClient.invalidateQueries({ queryKey: ['assemblies'] }),
    queryClient.invalidateQueries({ queryKey: ['fit-checks'] }),
  ]);
}

export function useCreatePart(workshopId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: PartInput) => apiRequest<Part>(`/workshops/${workshopId}/parts`, { method: 'POST', body: input }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: partQueries.lists() }),
  });
}

export function useUpdatePart(workshopId: string, partId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: Partial<PartInput>) =>
      apiRequest<Part>(`/workshops/${workshopId}/parts/${partId}`, { method: 'PATCH', body: input }),
    onSuccess: (part) => {
      queryClient.setQueryData(partQueries.detail(workshopId, partId).queryKey, part);
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: partQueries.lists() }),
        queryClient.invalidateQueries({ queryKey: ['assemblies'] }),
      ]);
    },
  });
}

export function useDeletePart(workshopId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (partId: string) => apiRequest<null>(`/workshops/${workshopId}/parts/${partId}`, { method: 'DELETE' }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: partQueries.lists() }),
  });
}

export function useAddFeature(workshopId: string, partId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: FeatureInput) =>
      apiRequest<PartFeature>(`/workshops/${workshopId}/parts/${partId}/features`, { method: 'POST', body: input }),
    onSuccess: () => refreshAfterFeatureChange(queryClient, workshopId, partId),
  });
}

export function useUpdateFeature(workshopId: string, partId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ featureId, input }: { featureId: string; input: Partial<FeatureInput> }) =>
      apiRequest<PartFeature>(`/workshops/${workshopId}/parts/${partId}/features/${featureId}`, { method: 'PATCH', body: input }),
    onSuccess: () => refreshAfterFeatureChange(queryClient, workshopId, partId),
  });
}

export function useRemoveFeature(workshopId: string, partId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (featureId: string) =>
      apiRequest<null>(`/workshops/${workshopId}/parts/${partId}/features/${featureId}`, { method: 'DELETE' }),
    onSuccess: () => refreshAfterFeatureChange(queryClient, workshopId, partId),
  });
}

export function useAddPartPhoto(workshopId: string, partId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (file: File) => {
      const form = new FormData();
      form.append('photo', file);
      return apiRequest<Part>(`/workshops/${workshopId}/parts/${partId}/photos`, { method: 'POST', body: form });
    },
    onSuccess: (part) => queryClient.setQueryData(partQueries.detail(workshopId, partId).queryKey, part),
  });
}

export function useRemovePartPhoto(workshopId: string, partId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (photoId: string) =>
      apiRequest<null>(`/workshops/${workshopId}/parts/${partId}/photos/${photoId}`, { method: 'DELETE' }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: partQueries.detail(workshopId, partId).queryKey }),
  });
}
