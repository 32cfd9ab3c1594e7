import { Alert, Skeleton, Stack, Table, Text, Title } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import { countOf, FailedFitNewsAlert } from '@/components/failed-fit-news';
import { formatDateTime } from '@/lib/dates';
import { buildFitNewsQuery, useRetryBuildFitNews, type BuildFitNewsRecord } from '../api/fit-news';

const CHANGE_LABELS: Record<string, string> = { confirmed: 'Confirmed', no_fit: 'No fit' };

function when(first: string | null, last: string | null): string {
  if (!first) return '—';
  return last && last !== first ? `${formatDateTime(first)} – ${formatDateTime(last)}` : formatDateTime(first);
}

/** The build's totals in one sentence: people told, and what is still pending, failed, in digests or uncertain. */
function summary(record: BuildFitNewsRecord): string {
  const parts = [`${countOf(record.followersTold, 'follower')} told about changes of ${countOf(record.checks.length, 'check')} (${countOf(record.told, 'mail')})`];
  if (record.pending) parts.push(`${record.pending} pending`);
  if (record.failed) parts.push(`${record.failed} failed`);
  if (record.inDigests) parts.push(`${record.inDigests} in digests`);
  if (record.uncertain) parts.push(`${record.uncertain} possibly sent twice`);
  return parts.join(' · ');
}

/**
 * The build page's delivery record of fit news: how many followers were told about its checks'
 * changes and when, per check; pending and failed counts; owners send failed mail again.
 */
export function BuildFitNews({ workshopId, buildId, canRetry }: { workshopId: string; buildId: string; canRetry: boolean }) {
  const record = useQuery(buildFitNewsQuery(workshopId, buildId));
  const retry = useRetryBuildFitNews(workshopId, buildId);

  return (
    <Stack gap="sm" component="section" aria-labelledby="build-fit-news-title">
      <Title order={3} id="build-fit-news-title">
        Fit news to followers
      </Title>
      {record.isPending && <Skeleton height={60} />}
      {record.isError && (
        <Alert color="red" title="The fit-news record could not be read">
          {record.error.message}
        </Alert>
      )}
      {record.isSuccess && record.data.checks.length === 0 && (
        <Text c="dimmed" size="sm">
          No check of this build has been confirmed or found not to fit yet, so no fit news has gone out.
        </Text>
      )}
      {record.isSuccess && record.data.checks.length > 0 && (
        <>
          <Text size="sm" data-testid="build-fit-news-summary">
            {summary(record.data)}
            {record.data.firstSentAt && <> · sent {when(record.data.firstSentAt, record.data.lastSentAt)}</>}
          </Text>
          <FailedFitNewsAlert
            failed={record.data.failed}
            subject="this build"
            canRetry={canRetry}
            retry={retry}
            retryNote="paused addresses are left out"
            data-testid="build-fit-news-failed"
          />
          <Table striped withTableBorder aria-label="Fit news per check">
            <Table.Thead>
              <Table.Tr>
                <Table.Th>Check</Table.Th>
                <Table.Th>Assembly</Table.Th>
                <Table.Th>Latest change</Table.Th>
                <Table.Th>Told</Table.Th>
                <Table.Th>Pending</Table.Th>
                <Table.Th>Failed</Table.Th>
                <Table.Th>In digests</Table.Th>
                <Table.Th>Sent</Table.Th>
              </Table.Tr>
            </Table.Thead>
            <Table.Tbody>
              {record.data.checks.map((check) => (
                <Table.Tr key={check.checkId}>
                  <Table.Td>{check.checkTitle}</Table.Td>
                  <Table.Td>{check.assemblyName}</Table.Td>
                  <Table.Td>
                    {CHANGE_LABELS[check.lastChangeTo] ?? check.lastChangeTo}, {formatDateTime(check.lastChangedAt)}
                    {check.changes > 1 && (
                      <Text span size="xs" c="dimmed">
                        {' '}
                        ({check.changes} news changes)
                      </Text>
                    )}
                  </Table.Td>
                  <Table.Td>{check.told}</Table.Td>
                  <Table.Td>{check.pending}</Table.Td>
                  <Table.Td>{check.failed}</Table.Td>
                  <Table.Td>{check.inDigests}</Table.Td>
                  <Table.Td>{when(check.firstSentAt, check.lastSentAt)}</Table.Td>
                </Table.Tr>
              ))}
            </Table.Tbody>
          </Table>
        </>
      )}
    </Stack>
  );
}
