import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { LengthUnit } from '@/lib/units';
import { assemblyQueries, type Assembly, type AssemblyInterface, type InterfaceKind } from './queries';

export interface AssemblyInput {
  name: string;
  notes?: string;
}

export interface InterfaceInput {
  kind: InterfaceKind;
  name: string;
  featureAId: string;
  featureBId?: string;
  unit?: LengthUnit;
  installedMin?: string;
  installedMax?: string;
  margin?: string;
}

export function useCreateAssembly(workshopId: string, buildId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: AssemblyInput) =>
      apiRequest<Assembly>(`/workshops/${workshopId}/builds/${buildId}/assemblies`, { method: 'POST', body: input }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: assemblyQueries.lists() }),
  });
}

export function useRenameAssembly(workshopId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ assemblyId, name }: { assemblyId: string; name: string }) =>
      apiRequest<Assembly>(`/workshops/${workshopId}/assemblies/${assemblyId}`, { method: 'PATCH', body: { name } }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: assemblyQueries.all() }),
  });
}

export function useDeleteAssembly(workshopId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (assemblyId: string) => apiRequest<null>(`/workshops/${workshopId}/assemblies/${assemblyId}`, { method: 'DELETE' }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: assemblyQueries.lists() }),
  });
}

/**
 * Interfaces derive fit checks on the server; the checklist lives under its own root key, so it
 * is refreshed by that key after any change here.
 */
function useRefreshAssembly(workshopId: string, assemblyId: string) {
  const queryClient = useQueryClient();
  return () =>
    Promise.all([
      queryClient.invalidateQueries({ queryKey: assemblyQueries.detail(workshopId, assemblyId).queryKey }),
      queryClient.invalidateQueries({ queryKey: ['fit-checks'] }),
    ]);
}

export function usePlacePart(workshopId: string, assemblyId: string) {
  const refresh = useRefreshAssembly(workshopId, assemblyId);
  return useMutation({
    mutationFn: ({ partId, position, sortOrder }: { partId: string; position: string; sortOrder: number }) =>
      apiRequest<null>(`/workshops/${workshopId}/assemblies/${assemblyId}/parts/${partId}`, {
        method: 'PUT',
        body: { position, sortOrder },
      }),
    onSuccess: refresh,
  });
}

export function useRemovePlacedPart(workshopId: string, assemblyId: string) {
  const refresh = useRefreshAssembly(workshopId, assemblyId);
  return useMutation({
    mutationFn: (partId: string) =>
      apiRequest<null>(`/workshops/${workshopId}/assemblies/${assemblyId}/parts/${partId}`, { method: 'DELETE' }),
    onSuccess: refresh,
  });
}

export function useAddInterface(workshopId: string, assemblyId: string) {
  const refresh = useRefreshAssembly(workshopId, assemblyId);
  return useMutation({
    mutationFn: (input: InterfaceInput) =>
      apiRequest<AssemblyInterface>(`/workshops/${workshopId}/assemblies/${assemblyId}/interfaces`, { method: 'POST', body: input }),
    onSuccess: refresh,
  });
}

export function useUpdateInterface(workshopId: string, assemblyId: string) {
  const refresh = useRefreshAssembly(workshopId, assemblyId);
  return useMutation({
    mutationFn: ({ interfaceId, input }: { interfaceId: string; input: Partial<InterfaceInput> }) =>
      apiRequest<AssemblyInterface>(`/workshops/${workshopId}/assemblies/${assemblyId}/interfaces/${interfaceId}`, {
        method: 'PATCH',
        body: input,
      }),
    onSuccess: refresh,
  });
}

export function useRemoveInterface(workshopId: string, assemblyId: string) {
  const refresh = useRefreshAssembly(workshopId, assemblyId);
  return useMutation({
    mutationFn: (interfaceId: string) =>
      apiRequest<null>(`/workshops/${workshopId}/assemblies/${assemblyId}/interfaces/${interfaceId}`, { method: 'DELETE' }),
    onSuccess: refresh,
  });
}
