import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { workshopQueries, type Invitation, type InvitationOptOut, type MediaSettings, type Member, type MemberRole, type Workshop } from './queries';

export interface WorkshopInput {
  name: string;
  slug: string;
  description: string;
}

export function useCreateWorkshop() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: WorkshopInput) => apiRequest<Workshop>('/workshops', { method: 'POST', body: input }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: workshopQueries.mine().queryKey }),
  });
}

/** Every change to one workshop refreshes that workshop (and the switcher's list). */
function useInvalidateWorkshop(workshopId: string) {
  const queryClient = useQueryClient();
  return () =>
    Promise.all([
      queryClient.invalidateQueries({ queryKey: workshopQueries.detail(workshopId).queryKey }),
      queryClient.invalidateQueries({ queryKey: workshopQueries.mine().queryKey }),
    ]);
}

export function useUpdateWorkshop(workshopId: string) {
  const invalidate = useInvalidateWorkshop(workshopId);
  return useMutation({
    mutationFn: (input: Partial<WorkshopInput & { showMemberNames: boolean }>) =>
      apiRequest<Workshop>(`/workshops/${workshopId}`, { method: 'PATCH', body: input }),
    onSuccess: invalidate,
  });
}

export function useUploadLogo(workshopId: string) {
  const invalidate = useInvalidateWorkshop(workshopId);
  return useMutation({
    mutationFn: (file: File) => {
      const body = new FormData();
      body.append('logo', file);
      return apiRequest<Workshop>(`/workshops/${workshopId}/logo`, { method: 'PUT', body });
    },
    onSuccess: invalidate,
  });
}

export function useRemoveLogo(workshopId: string) {
  const invalidate = useInvalidateWorkshop(workshopId);
  return useMutation({
    mutationFn: () => apiRequest<null>(`/workshops/${workshopId}/logo`, { method: 'DELETE' }),
    onSuccess: invalidate,
  });
}

/** Owners only; the answer is the setting as stored, so the cache takes it without a refetch. */
export function useUpdateMediaSettings(workshopId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: MediaSettings) => apiRequest<MediaSettings>(`/workshops/${workshopId}/media-settings`, { method: 'PUT', body: input }),
    onSuccess: (settings) => queryClient.setQueryData(workshopQueries.mediaSettings(workshopId).queryKey, settings),
  });
}

export function useInvite(workshopId: string) {
  const invalidate = useInvalidateWorkshop(workshopId);
  return useMutation({
    mutationFn: (input: { email: string; role: MemberRole }) =>
      apiRequest<Invitation>(`/workshops/${workshopId}/invitations`, { method: 'POST', body: input }),
    onSuccess: invalidate,
  });
}

export function useRevokeInvitation(workshopId: string) {
  const invalidate = useInvalidateWorkshop(workshopId);
  return useMutation({
    mutationFn: (invitationId: string) =>
      apiRequest<null>(`/workshops/${workshopId}/invitations/${invitationId}`, { method: 'DELETE' }),
    onSuccess: invalidate,
  });
}

export function useChangeRole(workshopId: string) {
  const invalidate = useInvalidateWorkshop(workshopId);
  return useMutation({
    mutationFn: ({ userId, role }: { userId: string; role: MemberRole }) =>
      apiRequest<Member>(`/workshops/${workshopId}/members/${userId}`, { method: 'PATCH', body: { role } }),
    onSuccess: invalidate,
  });
}

export function useRemoveMember(workshopId: string) {
  const invalidate = useInvalidateWorkshop(workshopId);
  return useMutation({
    mutationFn: (userId: string) => apiRequest<null>(`/workshops/${workshopId}/members/${userId}`, { method: 'DELETE' }),
    onSuccess: invalidate,
  });
}

export function useTransferOwnership(workshopId: string) {
  const invalidate = useInvalidateWorkshop(workshopId);
  return useMutation({
    mutationFn: (userId: string) =>
      apiRequest<Member[]>(`/workshops/${workshopId}/transfer-ownership`, { method: 'POST', body: { userId } }),
    onSuccess: invalidate,
  });
}

export function useLeaveWorkshop(workshopId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => apiRequest<null>(`/workshops/${workshopId}/leave`, { method: 'POST' }),
    onSuccess: () => {
      queryClient.removeQueries({ queryKey: workshopQueries.detail(workshopId).queryKey });
      return queryClient.invalidateQueries({ queryKey: workshopQueries.mine().queryKey });
    },
  });
}

/** Deletes the workshop with everything in it; the server wants its name typed again. */
export function useDeleteWorkshop(workshopId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (confirmName: string) => apiRequest<null>(`/workshops/${workshopId}`, { method: 'DELETE', body: { confirmName } }),
    onSuccess: () => {
      queryClient.removeQueries({ queryKey: workshopQueries.detail(workshopId).queryKey });
      return queryClient.invalidateQueries({ queryKey: workshopQueries.mine().queryKey });
    },
  });
}

export function useAcceptInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (token: string) =>
      apiRequest<{ workshopId: string; role: MemberRole }>('/invitations/accept', { method: 'POST', body: { token } }),
    // Accepting also confirms the address: refresh who we are, and our workshops.
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: workshopQueries.all() }),
        queryClient.invalidateQueries({ queryKey: ['session'] }),
      ]),
  });
}

/** Stops invitations to the address of an invitation mail's link, or allows them again (no sign-in: the token is the key). */
export function useSetInvitationOptOut(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (stopped: boolean) => apiRequest<InvitationOptOut>('/invitations/opt-out', { method: 'PUT', query: { token }, body: { stopped } }),
    onSuccess: (answer) => queryClient.setQueryData(workshopQueries.invitationOptOut(token).queryKey, answer),
  });
}
