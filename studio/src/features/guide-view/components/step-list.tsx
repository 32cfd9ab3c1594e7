import { Badge, Group, Paper, Text, Title, Typography, UnstyledButton } from '@mantine/core';
import { memo, useMemo } from 'react';
import { BackToNow } from '@/components/back-to-now';
import type { PlaybackClock } from '@/lib/playback-clock';
import { useFollowPlayback } from '@/lib/use-follow-playback';
import { useStableHandler } from '@/lib/use-stable-handler';
import type { GuideMark, PublishedStep } from '../api/types';
import { usePlayingStepId } from '../hooks/use-playing-step';
import { CautionPanel } from './caution-panel';
import classes from './guide-view.module.css';
import { MARK_LOOK, MarkShape } from './marks-strip';
import { formatClock } from '@/lib/clock';
import { StepMinutes } from '@/components/guide-effort';
import { isInMainVideo } from './playback';

export interface StepListProps {
  steps: PublishedStep[];
  marks: GuideMark[];
  mainFootageId: string | null;
  /** The video's clock: the list finds the playing step itself and draws again only when another one starts. */
  clock: PlaybackClock;
  onSeek: (ms: number) => void;
}

const NO_MARKS: GuideMark[] = [];

function StepTime({ step, mainFootageId, onSeek }: { step: PublishedStep; mainFootageId: string | null; onSeek: (ms: number) => void }) {
  if (step.startMs === null) return null;
  const range = `${formatClock(step.startMs)}${step.endMs !== null && step.endMs > step.startMs ? `–${formatClock(step.endMs)}` : ''}`;
  if (!isInMainVideo(step, mainFootageId)) {
    return (
      <Text span size="sm" c="dimmed" className={classes.timeText}>
        {range}
        {mainFootageId !== null ? ' in another video' : ''}
      </Text>
    );
  }
  return (
    <UnstyledButton
      className={classes.stepTime}
      onClick={() => step.startMs !== null && onSeek(step.startMs)}
      aria-label={`Play step ${step.position} from ${formatClock(step.startMs)}`}
      data-testid="step-time"
    >
      {range}
    </UnstyledButton>
  );
}

/** The steps in order; the one playing now stands out (a bar, a badge and aria-current, not colour alone). */
export function StepList({ steps, marks, mainFootageId, clock, onSeek }: StepListProps) {
  // The playing step stays in view while the list scrolls on its own beside the video; the page never jumps.
  const { following, box, currentRow, resume } = useFollowPlayback<HTMLOListElement>('top');
  const playingId = usePlayingStepId(clock, steps, mainFootageId);
  const ordered = useMemo(() => [...steps].sort((a, b) => a.position - b.position), [steps]);
  // Each step's marks, worked out once, so a step that keeps playing (or not) keeps the same props.
  const marksByStep = useMemo(() => {
    const byStep = new Map<string, GuideMark[]>();
    for (const mark of marks) {
      if (mark.stepId === null) continue;
      byStep.set(mark.stepId, [...(byStep.get(mark.stepId) ?? []), mark]);
    }
    return byStep;
  }, [marks]);
  const seek = useStableHandler(onSeek);

  return (
    <Paper withBorder p="md" component="section" aria-labelledby="guide-steps-heading" className={classes.stepsPanel} data-testid="guide-steps">
      <Group justify="space-between" mb="sm" className={classes.keepWithNext}>
        <Title order={2} size="h4" id="guide-steps-heading" className={classes.keepWithNext}>
          Steps
        </Title>
        {!following && <BackToNow onClick={resume} />}
      </Group>
      <ol ref={box} className={classes.stepList}>
        {ordered.map((step) => {
          const isCurrent = step.id === playingId;
          return (
            <StepRow
              key={step.id}
              step={step}
              marks={marksByStep.get(step.id) ?? NO_MARKS}
              mainFootageId={mainFootageId}
              current={isCurrent}
              rowRef={isCurrent ? currentRow : undefined}
              onSeek={seek}
            />
          );
        })}
      </ol>
    </Paper>
  );
}

interface StepRowProps {
  step: PublishedStep;
  marks: GuideMark[];
  mainFootageId: string | null;
  current: boolean;
  rowRef: ((node: HTMLElement | null) => void) | undefined;
  onSeek: (ms: number) => void;
}

/**
 * One step; memoised, so when another step starts playing only the step that stops and the one that starts draw
 * again. Laid out by the module's grid (number beside title and time, the rest under them) rather than nested
 * Mantine groups: a 40-step guide is all in the page (it prints whole and find-in-page finds every step), so each
 * step keeps to a few elements.
 */
const StepRow = memo(function StepRow({ step, marks, mainFootageId, current, rowRef, onSeek }: StepRowProps) {
  return (
    <li
      ref={rowRef}
      className={classes.step}
      data-current={current || undefined}
      aria-current={current ? 'step' : undefined}
      data-testid="guide-step"
    >
      <span className={classes.stepNumber} aria-hidden="true">
        {step.position}
      </span>
      <Title order={3} size="h5" className={classes.stepTitle}>
        <span className={classes.visuallyHidden}>Step {step.position}: </span>
        {step.title}
      </Title>
      <div className={classes.stepMeta}>
        <StepTime step={step} mainFootageId={mainFootageId} onSeek={onSeek} />
        <StepMinutes minutes={step.estimatedMinutes} size="sm" />
        {current && (
          <Badge size="sm" variant="filled" className={classes.noPrint} data-testid="step-now">
            Playing now
          </Badge>
        )}
      </div>
      {step.caution && <CautionPanel level={step.caution.level} text={step.caution.text} compact />}
      {step.body && (
        // The server sanitises step bodies (a short allow-list of tags) before they reach any reader.
        <Typography className={classes.stepBody} dangerouslySetInnerHTML={{ __html: step.body }} />
      )}
      {marks.length > 0 && (
        <ul className={classes.markChips} aria-label={`Marks in step ${step.position}`}>
          {marks.map((mark) => (
            <li key={mark.id}>
              <button type="button" className={classes.markChip} onClick={() => onSeek(mark.startMs)}>
                <MarkShape kind={mark.kind} size={10} />
                <span className={classes.visuallyHidden}>{MARK_LOOK[mark.kind]?.name ?? 'Mark'} </span>
                <span className={classes.timeText}>{formatClock(mark.startMs)}</span>
                <span>{mark.label || MARK_LOOK[mark.kind]?.name}</span>
              </button>
            </li>
          ))}
        </ul>
      )}
    </li>
  );
});
