import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { adminQueries } from './queries';

export function useSetUserDisabled() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, disabled }: { userId: string; disabled: boolean }) =>
      apiRequest<null>(`/admin/users/${userId}/${disabled ? 'disable' : 'enable'}`, { method: 'POST' }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: [...adminQueries.all(), 'users'] }),
  });
}

export function useSetWorkshopDisabled() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ workshopId, disabled }: { workshopId: string; disabled: boolean }) =>
      apiRequest<null>(`/admin/workshops/${workshopId}/${disabled ? 'disable' : 'enable'}`, { method: 'POST' }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: [...adminQueries.all(), 'workshops'] }),
  });
}
