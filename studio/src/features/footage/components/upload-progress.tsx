import { Badge, Button, Group, Paper, Progress, Stack, Text } from '@mantine/core';
import { useSyncExternalStore } from 'react';
import { ConfirmButton } from '@/components/confirm-button';
import { notifyError } from '@/lib/notify';
import type { MultipartUpload, UploadPhase } from '../upload/multipart-upload';
import { formatBytes, formatSpeed, formatTimeLeft } from './format';

const PHASES: Record<UploadPhase, { label: string; color: string }> = {
  uploading: { label: 'Uploading', color: 'blue' },
  paused: { label: 'Paused', color: 'gray' },
  retrying: { label: 'Waiting to retry', color: 'orange' },
  'waiting-for-storage': { label: 'Waiting for storage', color: 'orange' },
  completing: { label: 'Finishing', color: 'blue' },
  done: { label: 'Uploaded', color: 'patina' },
  failed: { label: 'Stopped', color: 'red' },
  cancelled: { label: 'Cancelled', color: 'gray' },
};

/** One upload in this tab: progress in bytes, speed and time left, with pause, resume and cancel. */
export function UploadProgress({ upload }: { upload: MultipartUpload }) {
  const snapshot = useSyncExternalStore(upload.subscribe, upload.getSnapshot);
  const percent = snapshot.totalBytes > 0 ? (snapshot.uploadedBytes / snapshot.totalBytes) * 100 : 0;
  // Every byte sent but the upload not yet complete (last ETags being recorded, then completion): say so,
  // rather than "Uploading" with a speed that can no longer be measured.
  const finishing =
    snapshot.phase === 'completing' || (snapshot.phase === 'uploading' && snapshot.totalBytes > 0 && snapshot.uploadedBytes >= snapshot.totalBytes);
  const phase = finishing ? PHASES.completing : PHASES[snapshot.phase];
  const canPause = snapshot.phase === 'uploading' || snapshot.phase === 'retrying' || snapshot.phase === 'waiting-for-storage';
  const canResume = snapshot.phase === 'paused';
  const canCancel = !['done', 'cancelled', 'completing'].includes(snapshot.phase);

  const handleCancel = () => {
    upload.cancel().catch((error: unknown) => notifyError('The upload could not be cancelled', error));
  };

  return (
    <Paper withBorder p="md" data-testid="upload-progress" data-phase={snapshot.phase}>
      <Stack gap={6}>
        <Group justify="space-between" wrap="nowrap">
          <Text fw={500} truncate>
            {snapshot.fileName}
          </Text>
          <Badge color={phase.color} variant="light">
            {phase.label}
          </Badge>
        </Group>
        <Progress
          value={percent}
          animated={snapshot.phase === 'uploading' || finishing}
          color={phase.color}
          aria-label={`Upload of ${snapshot.fileName}`}
          aria-valuenow={Math.floor(percent)}
        />
        <Group justify="space-between" gap="xs">
          <Text size="sm" data-testid="upload-bytes">
            {formatBytes(snapshot.uploadedBytes)} of {formatBytes(snapshot.totalBytes)} · {Math.floor(percent)} %
          </Text>
          <Text size="sm" c="dimmed" data-testid="upload-speed">
            {finishing
              ? 'Finishing…'
              : snapshot.bytesPerSecond !== null && snapshot.secondsLeft !== null
                ? `${formatSpeed(snapshot.bytesPerSecond)} · ${formatTimeLeft(snapshot.secondsLeft)}`
                : snapshot.phase === 'uploading'
                  ? 'Measuring speed…'
                  : ''}
          </Text>
        </Group>
        {snapshot.phase === 'paused' && !snapshot.error && (
          <Text size="sm" c="dimmed">
            Paused. Finished parts are kept; parts that were half sent start again when you resume.
          </Text>
        )}
        {snapshot.error && (
          <Text size="sm" c={snapshot.phase === 'failed' ? 'red' : 'orange'}>
            {snapshot.error}
            {snapshot.retryInSeconds !== null && ` Trying again in ${snapshot.retryInSeconds} s.`}
          </Text>
        )}
        <Group gap="xs">
          {canPause && (
            <Button size="xs" variant="default" onClick={() => upload.pause()}>
              Pause
            </Button>
          )}
          {canResume && (
            <Button size="xs" onClick={() => upload.resume()}>
              Resume
            </Button>
          )}
          {canCancel && (
            <ConfirmButton
              size="xs"
              variant="subtle"
              color="red"
              question="Cancel this upload?"
              detail="The parts sent so far are discarded and the footage is removed."
              confirmLabel="Cancel upload"
              onConfirm={handleCancel}
            >
              Cancel
            </ConfirmButton>
          )}
        </Group>
      </Stack>
    </Paper>
  );
}
