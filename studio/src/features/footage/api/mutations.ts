import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { footageQueries, transcriptQueries } from './queries';
import type { Footage, Transcript, TranscriptFormat } from './types';

export function useRenameFootage(workshopId: string, footageId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (title: string) =>
      apiRequest<Footage>(`/workshops/${workshopId}/footage/${footageId}`, { method: 'PATCH', body: { title } }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: footageQueries.all() }),
  });
}

export function useDeleteFootage(workshopId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (footageId: string) => apiRequest<void>(`/workshops/${workshopId}/footage/${footageId}`, { method: 'DELETE' }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: footageQueries.lists() }),
  });
}

/** Makes the web renditions again after a failure (owners and editors; re-running replaces partial outputs). */
export function useRetryRenditions(workshopId: string, footageId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => apiRequest<Footage>(`/workshops/${workshopId}/footage/${footageId}/renditions/retry`, { method: 'POST' }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: footageQueries.all() }),
  });
}

export type TranscriptInput =
  | { kind: 'paste'; text: string; format: TranscriptFormat | 'auto' }
  | { kind: 'file'; file: File; format: TranscriptFormat | 'auto' };

/** Attaches a transcript as the new revision; a 422 comes back as an ApiError whose message names the line. */
export function useAttachTranscript(workshopId: string, footageId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: TranscriptInput) => {
      const base = `/workshops/${workshopId}/footage/${footageId}/transcript`;
      if (input.kind === 'paste') {
        return apiRequest<Transcript>(base, { method: 'PUT', body: { text: input.text, format: input.format } });
      }
      const form = new FormData();
      form.append('format', input.format);
      form.append('file', input.file);
      return apiRequest<Transcript>(`${base}/file`, { method: 'POST', body: form });
    },
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: transcriptQueries.all() }),
        queryClient.invalidateQueries({ queryKey: footageQueries.all() }),
      ]),
  });
}
