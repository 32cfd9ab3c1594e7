import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { fitReportQueries, type FitReport, type FitReportChanges, type NewFitReport } from './queries';

/** Sends a report from a published guide (the photos follow, one by one, once it exists). */
export function useSendFitReport(workshopSlug: string, guideSlug: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (report: NewFitReport) =>
      apiRequest<FitReport>(`/guides/${encodeURIComponent(workshopSlug)}/${encodeURIComponent(guideSlug)}/fit-reports`, {
        method: 'POST',
        body: report,
      }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: fitReportQueries.mine().queryKey }),
  });
}

/** A workshop editor's review: status, the note to the reporter, the check that verifies the claim. */
export function useUpdateFitReport(workshopId: string) {
  const queryClient = useQueryClient();
  const listKey = fitReportQueries.workshop(workshopId).queryKey;
  return useMutation({
    mutationFn: ({ reportId, changes }: { reportId: string; changes: FitReportChanges }) =>
      apiRequest<FitReport>(`/workshops/${workshopId}/fit-reports/${encodeURIComponent(reportId)}`, { method: 'PATCH', body: changes }),
    onSuccess: async (updated) => {
      // Show the answer at once (tying moves a new report on), then read the list again for counts.
      queryClient.setQueryData(listKey, (reports) => reports?.map((report) => (report.id === updated.id ? updated : report)));
      await queryClient.invalidateQueries({ queryKey: listKey });
      // The workshop header counts new reports; it belongs to the workshops feature, so its key is named literally.
      await queryClient.invalidateQueries({ queryKey: ['workshops', 'detail', workshopId, 'new-fit-reports'] });
    },
  });
}
