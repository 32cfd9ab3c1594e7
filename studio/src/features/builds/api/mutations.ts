import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { ApiSchema } from '@/lib/api-types';
import { buildQueries, type Build } from './queries';

export type BuildInput = ApiSchema<'CreateBuildDto'>;

export function useCreateBuild(workshopId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: BuildInput) => apiRequest<Build>(`/workshops/${workshopId}/builds`, { method: 'POST', body: input }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: buildQueries.lists() }),
  });
}

export function useUpdateBuild(workshopId: string, buildId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: Partial<BuildInput>) =>
      apiRequest<Build>(`/workshops/${workshopId}/builds/${buildId}`, { method: 'PATCH', body: input }),
    onSuccess: (build) => {
      queryClient.setQueryData(buildQueries.detail(workshopId, buildId).queryKey, build);
      return queryClient.invalidateQueries({ queryKey: buildQueries.lists() });
    },
  });
}

export function useDeleteBuild(workshopId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (buildId: string) => apiRequest<null>(`/workshops/${workshopId}/builds/${buildId}`, { method: 'DELETE' }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: buildQueries.lists() }),
  });
}
