import { Text } from '@mantine/core';
import type { PublishedStep } from '../api/types';
import classes from './guide-view.module.css';
import { formatClock } from '@/lib/clock';

/**
 * On a phone, directly under the sticky video: the step playing now, so a reader can watch and read together
 * without scrolling to the step list. Wider screens have the step list beside the video instead.
 */
export function NowPlaying({ step, stepCount }: { step: PublishedStep | null; stepCount: number }) {
  return (
    <div className={classes.nowPlaying} data-testid="now-playing" aria-live="polite">
      {step ? (
        <>
          <Text size="xs" fw={600} className={classes.timeText}>
            Step {step.position} of {stepCount}
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
