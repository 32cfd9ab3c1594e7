import { SegmentedControl, Skeleton, Stack, Text, Title } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import { useSearchParams } from 'react-router-dom';
import { FIT_REPORT_STATUSES, fitReportQueries, type FitReport, type FitReportStatus } from '../api/queries';
import { ReportReviewCard } from './report-review-card';
import { STATUS_WORDS } from './report-words';
import { RetryNotice } from '@/components/retry-notice';

const isStatus = (value: string | null): value is FitReportStatus => FIT_REPORT_STATUSES.includes(value as FitReportStatus);

export function countByStatus(reports: readonly FitReport[]): Record<FitReportStatus, number> {
  const counts: Record<FitReportStatus, number> = { new: 0, investigating: 0, verified: 0, declined: 0 };
  for (const report of reports) counts[report.status] += 1;
  return counts;
}

const EMPTY_WORDS: Record<FitReportStatus, string> = {
  new: 'No new fit reports. Reports sent from your published guides arrive here.',
  investigating: 'Nothing under investigation. Tying a report to a fit check moves it here.',
  verified: 'No verified reports yet.',
  declined: 'No declined reports.',
};

/**
 * The workshop's fit reports, filtered by status (kept in the address, `?status=`, so a filter can be
 * linked and survives a reload), each with what was claimed and the review actions.
 */
export function WorkshopFitReports({ workshopId, readOnly = false }: { workshopId: string; readOnly?: boolean }) {
  const reports = useQuery(fitReportQueries.workshop(workshopId));
  const [params, setParams] = useSearchParams();
  const requested = params.get('status');
  const status: FitReportStatus = isStatus(requested) ? requested : 'new';
  const counts = countByStatus(reports.data ?? []);
  const shown = (reports.data ?? []).filter((report) => report.status === status);

  const handleStatus = (value: string) =>
    setParams(
      (current) => {
        const next = new URLSearchParams(current);
        next.set('status', value);
        return next;
      },
      { replace: true },
    );

  return (
    <Stack gap="md">
      <div>
        <Title order={3}>Fit reports</Title>
        <Text size="sm" c="dimmed" maw={720}>
          Claims from readers of your guides: “I combined these parts and it fit, or did not”. Tie a report to a fit check to
          verify it; the reporter is e-mailed when that check is confirmed or found not to fit.
        </Text>
      </div>
      <SegmentedControl
        aria-label="Show reports with the status"
        value={status}
        onChange={handleStatus}
        data={FIT_REPORT_STATUSES.map((value) => ({
          value,
          label: reports.data ? `${STATUS_WORDS[value]} (${counts[value]})` : STATUS_WORDS[value],
        }))}
        style={{ alignSelf: 'flex-start' }}
        data-testid="report-status-filter"
      />
      {reports.isPending && <Skeleton height={160} aria-label="Loading fit reports" />}
      {reports.isError && (
        <RetryNotice title="Fit reports could not be loaded" message={reports.error.message} onRetry={() => void reports.refetch()} />
      )}
      {reports.data && shown.length === 0 && (
        <Text c="dimmed" data-testid="fit-reports-empty">
          {EMPTY_WORDS[status]}
        </Text>
      )}
      {shown.length > 0 && (
        <Stack gap="md" component="ul" aria-label={`${STATUS_WORDS[status]} fit reports`} style={{ listStyle: 'none', margin: 0, padding: 0 }}>
          {shown.map((report) => (
            <ReportReviewCard key={report.id} workshopId={workshopId} report={report} readOnly={readOnly} />
          ))}
        </Stack>
      )}
    </Stack>
  );
}
