import { Alert, Badge, Group, Skeleton, Stack, Text } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import { useRef, useState, type RefObject } from 'react';
import { guideQueries } from '../api/queries';
import type { FootageChoice } from '../api/types';
import { formatClock } from '@/lib/clock';
import { useRenewingVideoLink } from '@/lib/use-renewing-video-link';

/** The player as the step form sees it: where it is now, and how to move it. */
export interface StepPlayerControls {
  videoRef: RefObject<HTMLVideoElement | null>;
  currentMs: number;
  setCurrentMs: (ms: number) => void;
  /** The video's position at this instant (more exact than the last time update). */
  readPositionMs: () => number;
  seek: (ms: number) => void;
}

export function useStepPlayer(): StepPlayerControls {
  const videoRef = useRef<HTMLVideoElement>(null);
  const [currentMs, setCurrentMs] = useState(0);
  return {
    videoRef,
    currentMs,
    setCurrentMs,
    readPositionMs: () => (videoRef.current ? Math.round(videoRef.current.currentTime * 1000) : currentMs),
    seek: (ms) => {
      const element = videoRef.current;
      if (!element) return;
      element.currentTime = ms / 1000;
      setCurrentMs(ms);
    },
  };
}

export interface StepPlayerProps {
  workshopId: string;
  footage: FootageChoice;
  videoRef: StepPlayerControls['videoRef'];
  currentMs: number;
  onTimeChange: (ms: number) => void;
}

/**
 * A small player of the guide's main footage, to find each step's moment. It plays from the same
 * presigned link as the footage player (GET …/footage/:id/playback) and fetches a new one when it runs out.
 */
export function StepPlayer({ workshopId, footage, videoRef, currentMs, onTimeChange }: StepPlayerProps) {
  const ready = footage.state === 'ready';
  const playback = useQuery({ ...guideQueries.playback(workshopId, footage.id), enabled: ready });
  const { videoError, onLoadedMetadata, onError } = useRenewingVideoLink(playback, { cannotPlay: 'This browser cannot play the video.' });

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
      {videoError && <Alert color="red">{videoError}</Alert>}
      {playback.data ? (
        <video
          ref={videoRef}
          key={playback.data.url}
          src={playback.data.url}
          poster={footage.posterUrl ?? undefined}
          controls
          preload="metadata"
          playsInline
          aria-label={`Main footage: ${footage.title}`}
          onTimeUpdate={(event) => onTimeChange(event.currentTarget.currentTime * 1000)}
          onSeeked={(event) => onTimeChange(event.currentTarget.currentTime * 1000)}
          onLoadedMetadata={onLoadedMetadata}
          onError={onError}
          data-testid="step-video"
          style={{
            width: '100%',
            aspectRatio: footage.width && footage.height ? `${footage.width} / ${footage.height}` : '16 / 9',
            background: '#000',
            borderRadius: 8,
          }}
        />
      ) : (
        <Skeleton height={180} />
      )}
      <Group gap="xs">
        <Badge variant="default" data-testid="step-player-position">
          {formatClock(currentMs, { tenths: true })}
        </Badge>
        {footage.durationMs !== null && (
          <Text size="xs" c="dimmed">
            of {formatClock(footage.durationMs, { tenths: true })}
          </Text>
        )}
      </Group>
    </Stack>
  );
}
