import { Alert, Button, Group, Text } from '@mantine/core';
import type { RefObject, SyntheticEvent } from 'react';
import type { GuideFootage } from '../api/types';
import classes from './guide-view.module.css';
import { formatClock } from '@/lib/clock';

export interface GuideVideoProps {
  footage: GuideFootage;
  videoRef: RefObject<HTMLVideoElement | null>;
  currentMs: number;
  failed: boolean;
  onRetry: () => void;
  events: {
    onTimeUpdate: (event: SyntheticEvent<HTMLVideoElement>) => void;
    onSeeked: (event: SyntheticEvent<HTMLVideoElement>) => void;
    onLoadedMetadata: (event: SyntheticEvent<HTMLVideoElement>) => void;
    onError: () => void;
  };
}

/** The guide's video with its transcript as captions (on by default). */
export function GuideVideo({ footage, videoRef, currentMs, failed, onRetry, events }: GuideVideoProps) {
  return (
    <div className={classes.videoArea}>
      {failed && (
        <Alert color="red" title="The video did not load" mb="xs">
          <Group justify="space-between" gap="xs">
            <Text size="sm">The connection may have dropped, or this browser cannot play the video.</Text>
            <Button size="xs" variant="default" onClick={onRetry}>
              Try again
            </Button>
          </Group>
        </Alert>
      )}
      <video
        ref={videoRef}
        src={footage.videoUrl}
        poster={footage.posterUrl ?? undefined}
        controls
        preload="metadata"
        playsInline
        className={classes.video}
        aria-label={`Video: ${footage.title}`}
        data-testid="guide-video"
        {...events}
      >
        {footage.captionsUrl && <track kind="captions" srcLang="en" label="English captions" src={footage.captionsUrl} default />}
      </video>
      <Text size="xs" c="dimmed" mt={4} data-testid="video-position">
        {formatClock(currentMs)}
        {footage.durationMs !== null ? ` of ${formatClock(footage.durationMs)}` : ''} · {footage.title}
      </Text>
    </div>
  );
}
