import { Alert, Drawer, Skeleton, Stack, Text, Timeline } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import { fitNewsRecordQuery } from '../api/fit-news-record';
import { fitCheckQueries, type FitCheck, type FitCheckEvent } from '../api/queries';
import { FailedFitNews, FitNewsDeliveryLine } from './fit-news-delivery';
import { StateIcon, STATE_LOOK } from '@/components/check-state';
import { formatDateTime } from '@/lib/dates';

/**
 * Every state a check has been in, who or what moved it, and why; under each change that was news, how
 * its fit news reached the followers. `canRetryFitNews` (owners) offers to send failed mail again.
 */
export function HistoryDrawer({
  workshopId,
  check,
  onClose,
  canRetryFitNews = false,
}: {
  workshopId: string;
  check: FitCheck | null;
  onClose: () => void;
  canRetryFitNews?: boolean;
}) {
  return (
    <Drawer opened={check !== null} onClose={onClose} position="right" size="md" title={check ? `History: ${check.title}` : ''}>
      {check && <HistoryList workshopId={workshopId} checkId={check.id} canRetryFitNews={canRetryFitNews} />}
    </Drawer>
  );
}

/** Who moved the check: the member by name, a member whose account is gone, or the fit engine on its own. */
function actorWords(event: FitCheckEvent): string {
  if (!event.actorId) return 'by the fit engine';
  return event.actorName ? `by ${event.actorName}` : 'by a former member';
}

function HistoryList({ workshopId, checkId, canRetryFitNews }: { workshopId: string; checkId: string; canRetryFitNews: boolean }) {
  const history = useQuery(fitCheckQueries.history(workshopId, checkId));
  // The delivery record is extra: the history shows without it when it cannot be read.
  const record = useQuery(fitNewsRecordQuery(workshopId, checkId));
  if (history.isPending) return <Skeleton height={120} />;
  if (history.isError) return <Alert color="red">{history.error.message}</Alert>;
  const deliveries = new Map((record.data ?? []).map((change) => [change.changeId, change]));
  return (
    <>
      {record.data && <FailedFitNews workshopId={workshopId} checkId={checkId} record={record.data} canRetry={canRetryFitNews} />}
      <Timeline bulletSize={22} lineWidth={2} active={history.data.length - 1} aria-label="Check history">
        {history.data.map((event) => {
          const delivery = deliveries.get(event.id);
          return (
            <Timeline.Item key={event.id} bullet={<StateIcon state={event.to} size={14} />} title={STATE_LOOK[event.to].label}>
              <Stack gap={2}>
                <Text size="sm">{event.reason}</Text>
                <Text size="xs" c="dimmed">
                  {formatDateTime(event.at)} · {actorWords(event)}
                  {event.from && event.from !== event.to ? ` · was ${STATE_LOOK[event.from].label}` : ''}
                </Text>
                {delivery && <FitNewsDeliveryLine change={delivery} />}
              </Stack>
            </Timeline.Item>
          );
        })}
      </Timeline>
    </>
  );
}
