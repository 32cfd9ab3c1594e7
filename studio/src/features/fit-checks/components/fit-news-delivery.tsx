import { Text } from '@mantine/core';
import { countOf, FailedFitNewsAlert } from '@/components/failed-fit-news';
import { formatDateTime } from '@/lib/dates';
import { useRetryFailedFitNews, type ChangeDeliveryRecord } from '../api/fit-news-record';

/** One news change's delivery in a line: who was told and when, what is pending, failed or waiting in digests. */
export function FitNewsDeliveryLine({ change }: { change: ChangeDeliveryRecord }) {
  const parts = [`${countOf(change.told, 'follower')} told`];
  if (change.firstSentAt) {
    parts[0] +=
      change.lastSentAt && change.lastSentAt !== change.firstSentAt
        ? ` (${formatDateTime(change.firstSentAt)} – ${formatDateTime(change.lastSentAt)})`
        : ` (${formatDateTime(change.firstSentAt)})`;
  }
  if (change.pending) parts.push(`${change.pending} pending`);
  if (change.failed) parts.push(`${change.failed} failed`);
  if (change.inDigests) parts.push(`${change.inDigests} in digests`);
  return (
    <Text size="xs" data-testid="fit-news-delivery">
      Fit news: {parts.join(' · ')}
      {change.refusals.length > 0 && (
        <Text span size="xs" c="dimmed" display="block">
          Mail servers answered: {change.refusals.join('; ')}
        </Text>
      )}
    </Text>
  );
}

/**
 * Mail about this check that did not get through, and (owners) a way to send it again. Addresses whose
 * mail is paused after repeated refusals are left out of the retry by the API.
 */
export function FailedFitNews({
  workshopId,
  checkId,
  record,
  canRetry,
}: {
  workshopId: string;
  checkId: string;
  record: ChangeDeliveryRecord[];
  canRetry: boolean;
}) {
  const retry = useRetryFailedFitNews(workshopId, checkId);
  const failed = record.reduce((sum, change) => sum + change.failed, 0);
  return <FailedFitNewsAlert failed={failed} subject="this check" canRetry={canRetry} retry={retry} mb="md" data-testid="fit-news-failed" />;
}
