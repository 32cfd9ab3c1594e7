import { Group, Text } from '@mantine/core';
import { SAFETY_ALERT_SHAPE } from '@/components/signal-word';
import type { GuideMark, MarkKind } from '../api/types';
import classes from './guide-view.module.css';
import { formatClock } from '@/lib/clock';
import { usePlaybackMs, type PlaybackClock } from '@/lib/playback-clock';

/** Each kind has its own shape (a path in a 12×12 box) and name, as in the creator's player, so the strip reads without colour. */
export const MARK_LOOK: Record<MarkKind, { name: string; shape: string; colour: string }> = {
  part: { name: 'Part', shape: 'M2 2h8v8H2z', colour: 'var(--mantine-color-blue-7)' },
  measurement: { name: 'Measurement', shape: 'M6 0l6 6-6 6-6-6z', colour: 'var(--mantine-color-grape-7)' },
  check_evidence: { name: 'Check evidence', shape: 'M6 1a5 5 0 1 0 0.01 0z', colour: 'var(--mantine-color-teal-8)' },
  step: { name: 'Step', shape: 'M1 0.5h1.6v11H1z M2.6 0.5l8.4 3.2-8.4 3.2z', colour: 'var(--mantine-color-dark-5)' },
  // The safety alert symbol, as the signal-word headers in the editor and the reader carry it.
  caution: { name: 'Caution', shape: SAFETY_ALERT_SHAPE, colour: 'var(--mantine-color-orange-8)' },
  note: { name: 'Note', shape: 'M4.5 0h3v12h-3z', colour: 'var(--mantine-color-gray-7)' },
};

const lookOf = (kind: MarkKind) => MARK_LOOK[kind] ?? MARK_LOOK.note;

export function MarkShape({ kind, size = 12 }: { kind: MarkKind; size?: number }) {
  const look = lookOf(kind);
  return (
    <svg width={size} height={size} viewBox="0 0 12 12" aria-hidden="true" focusable="false" style={{ flex: 'none' }}>
      <path d={look.shape} fill={look.colour} />
    </svg>
  );
}

const LANE_HEIGHT = 18;
const MARKER = 12;
/** Markers closer than this (a fraction of the video) go to the next lane so none hides another. */
const MIN_GAP = 0.025;

/** Lanes for marks in time order: each goes to the first lane whose last marker is far enough behind. */
export function laneMarks(marks: readonly GuideMark[], durationMs: number): { mark: GuideMark; x: number; lane: number }[] {
  const laneEnds: number[] = [];
  return [...marks]
    .sort((a, b) => a.startMs - b.startMs || a.id.localeCompare(b.id))
    .map((mark) => {
      const x = Math.min(1, Math.max(0, mark.startMs / durationMs));
      let lane = laneEnds.findIndex((end) => x - end >= MIN_GAP);
      if (lane === -1) lane = laneEnds.length;
      laneEnds[lane] = x;
      return { mark, x, lane };
    });
}

export interface MarksStripProps {
  marks: GuideMark[];
  durationMs: number;
  /** The video's clock: only the playhead listens to it, so a time update moves the line and redraws no mark. */
  clock: PlaybackClock;
  onSeek: (ms: number) => void;
}

/** Where the video is along the strip; the one part of the strip that re-renders as the video plays. */
function Playhead({ clock, durationMs }: { clock: PlaybackClock; durationMs: number }) {
  const currentMs = usePlaybackMs(clock);
  return <div aria-hidden className={classes.playhead} data-testid="guide-marks-playhead" style={{ left: `${Math.min(100, (currentMs / durationMs) * 100)}%` }} />;
}

/** The small timeline under the video: each mark the guide uses as its kind's shape; a click plays from there. */
export function MarksStrip({ marks, durationMs, clock, onSeek }: MarksStripProps) {
  if (marks.length === 0 || !(durationMs > 0)) return null;
  const placed = laneMarks(marks, durationMs);
  const lanes = Math.max(1, ...placed.map((item) => item.lane + 1));
  const kinds = [...new Set(marks.map((mark) => mark.kind))];
  return (
    <div className={classes.marksStrip} data-testid="guide-marks">
      {/* The strip is for pointing; the list of marks below is the same for keyboards and screen readers. */}
      <div
        aria-hidden="true"
        className={classes.marksTrack}
        style={{ height: lanes * LANE_HEIGHT + 8 }}
      >
        <Playhead clock={clock} durationMs={durationMs} />
        {placed.map(({ mark, x, lane }) => {
          const name = `${lookOf(mark.kind).name} at ${formatClock(mark.startMs)}${mark.label ? `: ${mark.label}` : ''}`;
          return (
            <button
              key={mark.id}
              type="button"
              title={name}
              tabIndex={-1}
              data-kind={mark.kind}
              className={classes.markButton}
              onClick={() => onSeek(mark.startMs)}
              style={{ left: `calc(${x * 100}% - ${MARKER / 2}px)`, top: 4 + lane * LANE_HEIGHT }}
            >
              <MarkShape kind={mark.kind} size={MARKER} />
            </button>
          );
        })}
      </div>
      <Group gap="md" mt={4} aria-label="Key to the mark shapes">
        {kinds.map((kind) => (
          <Group key={kind} gap={4} wrap="nowrap">
            <MarkShape kind={kind} size={10} />
            <Text size="xs" c="dimmed">
              {lookOf(kind).name}
            </Text>
          </Group>
        ))}
      </Group>
      <ul className={classes.markChips} aria-label="Marks in the video">
        {placed.map(({ mark }) => (
          <li key={mark.id}>
            <button type="button" className={classes.markChip} data-kind={mark.kind} onClick={() => onSeek(mark.startMs)}>
              <MarkShape kind={mark.kind} size={10} />
              <span className={classes.visuallyHidden}>{lookOf(mark.kind).name} </span>
              <span className={classes.timeText}>{formatClock(mark.startMs)}</span>
              <span>{mark.label || lookOf(mark.kind).name}</span>
            </button>
          </li>
        ))}
      </ul>
    </div>
  );
}
