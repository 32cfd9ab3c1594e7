import { Text } from '@mantine/core';
import type { PlaybackClock } from '@/lib/playback-clock';
import type { PublishedStep } from '../api/types';
import { usePlayingStepId } from '../hooks/use-playing-step';
import classes from './guide-view.module.css';
import { formatClock } from '@/lib/clock';

export interface NowPlayingProps {
  steps: PublishedStep[];
  mainFootageId: string | null;
  /** The video's clock: this line finds the playing step itself, and changes only when another step starts. */
  clock: PlaybackClock;
}

/**
 * On a phone, directly under the sticky video: the step playing now, so a reader can watch and read together
 * without scrolling to the step list. Wider screens have the step list beside the video instead.
 */
export function NowPlaying({ steps, mainFootageId, clock }: NowPlayingProps) {
  const playingId = usePlayingStepId(clock, steps, mainFootageId);
  const step = playingId === null ? null : (steps.find((candidate) => candidate.id === playingId) ?? null);
  return (
    <div className={classes.nowPlaying} data-testid="now-playing" aria-live="polite">
      {step ? (
        <>
          <Text size="xs" fw={600} className={classes.timeText}>
            Step {step.position} of {steps.length}
            {step.startMs !== null ? ` · from ${formatClock(step.startMs)}` : ''}
            {step.caution ? ` · ${step.caution.level}` : ''}
          </Text>
          <Text size="sm" fw={600} lineClamp={2}>
            {step.title}
          </Text>
        </>
      ) : (
        <Text size="sm">Press play: the step being shown appears here.</Text>
      )}
    </div>
  );
}
