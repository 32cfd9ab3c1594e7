import { Alert, Button, Group, Text } from '@mantine/core';
import { formatDateTime } from '@/lib/dates';
import { useRetryFailedFitNews, type ChangeDeliveryRecord } from '../api/fit-news-record';

function count(n: number, one: string, many = `${one}s`): string {
  return `${n} ${n === 1 ? one : many}`;
}

/** One news change's delivery in a line: who was told and when, what is pending, failed or waiting in digests. */
export function FitNewsDeliveryLine({ change }: { change: ChangeDeliveryRecord }) {
  const parts = [`${count(change.told, 'follower')} told`];
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
  if (failed === 0 && !retry.isError) return null;
  return (
    <Alert color="yellow" role="status" title={`${count(failed, 'fit-news mail')} of this check failed`} mb="md" data-testid="fit-news-failed">
      <Group gap="sm" justify="space-between" align="center">
        <Text size="sm">
          {canRetry
            ? 'The followers’ mail servers refused them or we gave up trying. Send them again once the cause is mended.'
            : 'The followers’ mail servers refused them or we gave up trying. A workshop owner can send them again.'}
        </Text>
        {canRetry && (
          <Button size="xs" loading={retry.isPending} onClick={() => retry.mutate()}>
            Retry failed
          </Button>
        )}
      </Group>
      {retry.isError && (
        <Text size="sm" c="red" role="alert" mt="xs">
          {retry.error.message}
        </Text>
      )}
    </Alert>
  );
}
