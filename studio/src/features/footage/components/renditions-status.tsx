import { Alert, Button, Group, Progress, Stack, Text } from '@mantine/core';
import { formatClock } from '@/lib/clock';
import { notifyError } from '@/lib/notify';
import { useWorkshopReadOnly } from '@/lib/workshop-access';
import { useRetryRenditions } from '../api/mutations';
import type { Footage } from '../api/types';

/** "42 % · about 1:10 left": what the creator sees while the web versions are made. */
export function renditionsProgressText(percent: number | null, secondsLeft: number | null): string {
  const done = percent === null ? 'Starting' : `${Math.floor(percent)} %`;
  return secondsLeft === null ? done : `${done} · about ${formatClock(secondsLeft * 1000)} left`;
}

/**
 * The web versions of a footage (for every browser and connection) while they are made, or why they
 * failed with a way to try again. Nothing once they are ready: the footage simply plays everywhere.
 */
export function RenditionsStatus({ footage, compact = false }: { footage: Footage; compact?: boolean }) {
  const readOnly = useWorkshopReadOnly();
  const retry = useRetryRenditions(footage.workshopId, footage.id);
  const renditions = footage.renditions;
  if (!renditions || footage.state !== 'ready' || renditions.state === 'ready') return null;

  if (renditions.state === 'failed') {
    return (
      <Alert color="orange" title="Web versions could not be made" data-testid="renditions-status" data-state="failed" p={compact ? 'xs' : undefined}>
        <Stack gap={6} align="flex-start">
          <Text size="sm">
            {renditions.reason ?? 'The video could not be converted.'} The original still plays where the browser can play it.
          </Text>
          {!readOnly && (
            <Button
              size="xs"
              variant="default"
              loading={retry.isPending}
              onClick={() => retry.mutate(undefined, { onError: (error) => notifyError('The conversion could not be started again', error) })}
            >
              Try the conversion again
            </Button>
          )}
        </Stack>
      </Alert>
    );
  }

  const waiting = renditions.state === 'waiting';
  return (
    <Stack gap={4} data-testid="renditions-status" data-state={renditions.state}>
      <Group justify="space-between" gap="xs" wrap="nowrap">
        <Text size="xs" c="dimmed">
          {waiting ? 'Web versions queued' : 'Making web versions (HLS and MP4)'}
        </Text>
        {!waiting && (
          <Text size="xs" c="dimmed" data-testid="renditions-progress" style={{ fontVariantNumeric: 'tabular-nums' }}>
            {renditionsProgressText(renditions.percent, renditions.secondsLeft)}
          </Text>
        )}
      </Group>
      <Progress
        value={renditions.percent ?? 0}
        size="sm"
        animated={waiting}
        aria-label="Web versions made"
        aria-valuetext={waiting ? 'Queued' : renditionsProgressText(renditions.percent, renditions.secondsLeft)}
      />
      {!compact && (
        <Text size="xs" c="dimmed">
          You can keep working: the footage plays from the original until then, and this updates by itself.
        </Text>
      )}
    </Stack>
  );
}
