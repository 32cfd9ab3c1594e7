import { Text } from '@mantine/core';
import type { GuideFootage } from '../api/types';
import type { GuidePlayer } from '../hooks/use-guide-player';
import { FootagePlayer } from '@/components/footage-player/footage-player';
import type { FootagePlayerControl } from '@/components/footage-player/use-footage-player';
import { formatClock } from '@/lib/clock';
import { usePlaybackMs } from '@/lib/playback-clock';

export interface GuideVideoProps {
  footage: GuideFootage;
  player: GuidePlayer;
  /** Where to start, e.g. the evidence moment a fit finder result links to (`?t=`). */
  startAtMs?: number;
}

/** The line under the video: re-renders alone as the video plays. */
function VideoPosition({ control, footage }: { control: FootagePlayerControl; footage: GuideFootage }) {
  const currentMs = usePlaybackMs(control.clock);
  return (
    <Text size="xs" c="dimmed" mt={4} data-testid="video-position">
      {formatClock(currentMs)}
      {footage.durationMs !== null ? ` of ${formatClock(footage.durationMs)}` : ''} · {footage.title}
    </Text>
  );
}

/**
 * The guide's video with its transcript as captions (on by default): the HLS renditions where there are
 * some, else the file (its address redirects to a short-lived storage link, so "Try again" gets a fresh one),
 * and a seek bar with scrub previews. The layout may bound its height with `--guide-video-max-height`.
 */
export function GuideVideo({ footage, player, startAtMs }: GuideVideoProps) {
  return (
    <div>
      <FootagePlayer
        control={player.control}
        sources={{ hlsUrl: footage.hlsUrl ?? null, fileUrl: footage.mp4Url ?? footage.videoUrl }}
        posterUrl={footage.posterUrl}
        captions={footage.captionsUrl ? { src: footage.captionsUrl, label: 'English captions' } : null}
        label={`Video: ${footage.title}`}
        displayWidth={footage.displayWidth}
        displayHeight={footage.displayHeight}
        maxHeight="var(--guide-video-max-height, calc(100dvh - 56px - 4rem))"
        startAtMs={startAtMs}
        cannotPlayMessage="The connection may have dropped, or this browser cannot play the video."
        scrubBar={footage.durationMs !== null ? { durationMs: footage.durationMs, thumbnailsUrl: footage.thumbnailsUrl ?? null } : undefined}
        testId="guide-video"
      />
      <VideoPosition control={player.control} footage={footage} />
    </div>
  );
}
