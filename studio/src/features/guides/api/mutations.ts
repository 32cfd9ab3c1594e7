import { useMutation, useQueryClient, type QueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { guideQueries } from './queries';
import type { Guide, GuideInput, GuideStep, PublishedRevision, StepInput } from './types';

const guidePath = (workshopId: string, guideId: string) => `/workshops/${workshopId}/guides/${guideId}`;

/** Lists, the detail (status, unpublished changes) and revisions all move together after any change. */
function refreshGuides(queryClient: QueryClient) {
  return queryClient.invalidateQueries({ queryKey: guideQueries.all() });
}

/** What readers see changes only when a revision is published or withdrawn (the guide-view feature's root key). */
function refreshPublicGuides(queryClient: QueryClient) {
  return queryClient.invalidateQueries({ queryKey: ['public-guides'] });
}

export function useCreateGuide(workshopId: string, buildId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: Pick<GuideInput, 'title'> & Partial<GuideInput>) =>
      apiRequest<Guide>(`/workshops/${workshopId}/builds/${buildId}/guides`, { method: 'POST', body: input }),
    onSuccess: (guide) => {
      queryClient.setQueryData(guideQueries.detail(workshopId, guide.id).queryKey, guide);
      return queryClient.invalidateQueries({ queryKey: guideQueries.lists() });
    },
  });
}

export function useUpdateGuide(workshopId: string, guideId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: Partial<GuideInput>) => apiRequest<Guide>(guidePath(workshopId, guideId), { method: 'PATCH', body: input }),
    onSuccess: (guide) => {
      queryClient.setQueryData(guideQueries.detail(workshopId, guideId).queryKey, guide);
      return queryClient.invalidateQueries({ queryKey: guideQueries.lists() });
    },
  });
}

export function useDeleteGuide(workshopId: string, guideId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => apiRequest<null>(guidePath(workshopId, guideId), { method: 'DELETE' }),
    onSuccess: () => {
      queryClient.removeQueries({ queryKey: guideQueries.detail(workshopId, guideId).queryKey });
      return Promise.all([queryClient.invalidateQueries({ queryKey: guideQueries.lists() }), refreshPublicGuides(queryClient)]);
    },
  });
}

export function useSaveStep(workshopId: string, guideId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, ...input }: StepInput & { id?: string }) =>
      id
        ? apiRequest<GuideStep>(`${guidePath(workshopId, guideId)}/steps/${id}`, { method: 'PATCH', body: input })
        : apiRequest<GuideStep>(`${guidePath(workshopId, guideId)}/steps`, { method: 'POST', body: input }),
    onSuccess: () => refreshGuides(queryClient),
  });
}

export function useDeleteStep(workshopId: string, guideId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (stepId: string) => apiRequest<null>(`${guidePath(workshopId, guideId)}/steps/${stepId}`, { method: 'DELETE' }),
    // Marks that pointed at the step lose the link; the marks feature refreshes by its root key.
    onSuccess: () => Promise.all([refreshGuides(queryClient), queryClient.invalidateQueries({ queryKey: ['marks'] })]),
  });
}

/** Moves are shown at once (so repeated key presses feel direct) and rolled back if the server refuses. */
export function useReorderSteps(workshopId: string, guideId: string) {
  const queryClient = useQueryClient();
  const detailKey = guideQueries.detail(workshopId, guideId).queryKey;
  const mutationKey = [...guideQueries.all(), 'reorder', workshopId, guideId];
  return useMutation({
    mutationKey,
    // Quick presses queue up and reach the server in order, so the last order shown is the one kept.
    scope: { id: mutationKey.join('/') },
    mutationFn: (stepIds: string[]) =>
      apiRequest<Guide>(`${guidePath(workshopId, guideId)}/steps/order`, { method: 'PUT', body: { stepIds } }),
    onMutate: async (stepIds) => {
      await queryClient.cancelQueries({ queryKey: detailKey });
      const previous = queryClient.getQueryData(detailKey);
      if (previous) {
        const byId = new Map(previous.steps.map((step) => [step.id, step]));
        const steps = stepIds.flatMap((id, index) => {
          const step = byId.get(id);
          return step ? [{ ...step, position: index + 1 }] : [];
        });
        queryClient.setQueryData(detailKey, { ...previous, steps });
      }
      return { previous };
    },
    onError: (_error, _stepIds, context) => {
      if (context?.previous) queryClient.setQueryData(detailKey, context.previous);
    },
    onSuccess: (guide) => {
      // A later move is still queued: its order is the one on screen, so keep it.
      if (queryClient.isMutating({ mutationKey }) <= 1) queryClient.setQueryData(detailKey, guide);
      return queryClient.invalidateQueries({ queryKey: guideQueries.lists() });
    },
  });
}

export function usePublishRevision(workshopId: string, guideId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (note: string) =>
      apiRequest<PublishedRevision>(`${guidePath(workshopId, guideId)}/revisions`, { method: 'POST', body: note ? { note } : {} }),
    onSuccess: () => Promise.all([refreshGuides(queryClient), refreshPublicGuides(queryClient)]),
  });
}

export function useWithdrawGuide(workshopId: string, guideId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => apiRequest<null>(`${guidePath(workshopId, guideId)}/publication`, { method: 'DELETE' }),
    onSuccess: () => Promise.all([refreshGuides(queryClient), refreshPublicGuides(queryClient)]),
  });
}
