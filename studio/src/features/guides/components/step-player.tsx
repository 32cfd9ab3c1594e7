import { Alert, Badge, Group, Skeleton, Stack, Text } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import { guideQueries } from '../api/queries';
import type { FootageChoice } from '../api/types';
import { FootagePlayer } from '@/components/footage-player/footage-player';
import { useFootagePlayer, type FootagePlayerControl } from '@/components/footage-player/use-footage-player';
import { formatClock } from '@/lib/clock';
import { usePlaybackMs } from '@/lib/playback-clock';

/** The player as the step form sees it: where it is, and how to move it (the shared footage player's control). */
export type StepPlayerControls = FootagePlayerControl;

export function useStepPlayer(): StepPlayerControls {
  return useFootagePlayer();
}

export interface StepPlayerProps {
  workshopId: string;
  footage: FootageChoice;
  control: StepPlayerControls;
}

/** The position under the player: the only part that re-renders as the video plays. */
function StepPlayerPosition({ control, durationMs }: { control: StepPlayerControls; durationMs: number | null }) {
  const currentMs = usePlaybackMs(control.clock);
  return (
    <Group gap="xs">
      <Badge variant="default" data-testid="step-player-position">
        {formatClock(currentMs, { tenths: true })}
      </Badge>
      {durationMs !== null && (
        <Text size="xs" c="dimmed">
          of {formatClock(durationMs, { tenths: true })}
        </Text>
      )}
    </Group>
  );
}

/**
 * A small player of the guide's main footage, to find each step's moment. It plays what the footage
 * player plays (GET …/footage/:id/playback: the HLS master, or the file, whose link is renewed when it runs out).
 */
export function StepPlayer({ workshopId, footage, control }: StepPlayerProps) {
  const ready = footage.state === 'ready';
  const playback = useQuery({ ...guideQueries.playback(workshopId, footage.id), enabled: ready });

  if (!ready) {
    return (
      <Alert color="gray" title="The main footage is not ready">
        {footage.state === 'failed' ? 'Its processing failed; choose other footage.' : 'It is still uploading or being processed.'}
      </Alert>
    );
  }
  return (
    <Stack gap={6} data-testid="step-player">
      <Text size="sm" fw={500}>
        {footage.title}
      </Text>
      {playback.isError && <Alert color="red">{playback.error.message}</Alert>}
      {playback.data ? (
        <FootagePlayer
          control={control}
          sources={{ hlsUrl: playback.data.hlsUrl ?? null, fileUrl: playback.data.url }}
          fileLinkExpiresAt={playback.data.expiresAt}
          onRenewFileLink={() => void playback.refetch()}
          posterUrl={footage.posterUrl}
          captions={null}
          label={`Main footage: ${footage.title}`}
          displayWidth={playback.data.displayWidth ?? footage.width}
          displayHeight={playback.data.displayHeight ?? footage.height}
          maxHeight="50dvh"
          cannotPlayMessage="This browser cannot play the video."
          testId="step-video"
        />
      ) : (
        <Skeleton height={180} />
      )}
      <StepPlayerPosition control={control} durationMs={footage.durationMs} />
    </Stack>
  );
}
