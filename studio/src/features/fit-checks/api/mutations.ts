import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { fitCheckQueries, type Evidence, type FitCheck, type FitCheckState } from './queries';

function useRefreshChecks() {
  const queryClient = useQueryClient();
  return () => queryClient.invalidateQueries({ queryKey: fitCheckQueries.all() });
}

export function useTransitionCheck(workshopId: string) {
  const refresh = useRefreshChecks();
  return useMutation({
    mutationFn: ({ checkId, to, reason, from }: { checkId: string; to: FitCheckState; reason: string; from: FitCheckState }) =>
      apiRequest<FitCheck>(`/workshops/${workshopId}/checks/${checkId}/transitions`, { method: 'POST', body: { to, reason, from } }),
    // A refusal (409: already in that state, or changed meanwhile) means the list on screen is stale too.
    onSettled: refresh,
  });
}

export function useAddEvidence(workshopId: string) {
  const refresh = useRefreshChecks();
  return useMutation({
    mutationFn: ({ checkId, measurementId, note }: { checkId: string; measurementId: string; note?: string }) =>
      apiRequest<Evidence>(`/workshops/${workshopId}/checks/${checkId}/evidence`, {
        method: 'POST',
        body: { kind: 'measurement', measurementId, note },
      }),
    onSuccess: refresh,
  });
}

export function useCreateManualCheck(workshopId: string, assemblyId: string) {
  const refresh = useRefreshChecks();
  return useMutation({
    mutationFn: (input: { title: string; required: boolean }) =>
      apiRequest<FitCheck>(`/workshops/${workshopId}/assemblies/${assemblyId}/checks`, { method: 'POST', body: input }),
    onSuccess: refresh,
  });
}

export function useAddPhotoEvidence(workshopId: string) {
  const refresh = useRefreshChecks();
  return useMutation({
    mutationFn: ({ checkId, file }: { checkId: string; file: File }) => {
      const form = new FormData();
      form.append('photo', file);
      return apiRequest<Evidence>(`/workshops/${workshopId}/checks/${checkId}/photos`, { method: 'POST', body: form });
    },
    onSuccess: refresh,
  });
}
