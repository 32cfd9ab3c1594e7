import { Button, Group, Paper, SegmentedControl, Stack, Text, Title, UnstyledButton } from '@mantine/core';
import { memo, useMemo, useState } from 'react';
import { BackToNow } from '@/components/back-to-now';
import { ConfirmButton } from '@/components/confirm-button';
import { formatClock } from '@/lib/clock';
import { notifyError } from '@/lib/notify';
import { usePlaybackSelect, type PlaybackClock } from '@/lib/playback-clock';
import { useFollowingList } from '@/lib/use-follow-playback';
import { useStableHandler } from '@/lib/use-stable-handler';
import { PROVISIONAL_MARK_PREFIX, useRemoveMark } from '../api/mutations';
import { MARK_KINDS, type Mark, type MarkKind } from '../api/queries';
import { KindShape } from './kind-shape';
import { KIND_LOOK, LINK_OF_KIND } from './mark-kinds';
import { MarkLink } from './mark-link';
import classes from './virtual-list.module.css';
import { useWorkshopReadOnly } from '@/lib/workshop-access';

/**
 * First guesses at a row's height, rows being measured once drawn: one line, or two when a link goes under the
 * label. A close guess keeps the list from correcting its scroll position row after row while it is flung through.
 */
const MARK_ROW_ESTIMATE_PX = { oneLine: 26, withLink: 46 };

/** Whether the row shows a link line under its label. */
function hasLinkLine(mark: Mark): boolean {
  const field = LINK_OF_KIND[mark.kind];
  return field !== undefined && Boolean(mark[field]);
}

export interface MarksListProps {
  workshopId: string;
  footageId: string;
  marks: Mark[];
  /** The playing moment: the last mark at or before it is highlighted and kept in view while following. */
  clock: PlaybackClock;
  onSeek: (ms: number) => void;
  onEdit: (mark: Mark) => void;
}

/** The index of the last row starting at or before `ms` (rows in time order), or -1. Binary search: hours of marks. */
export function lastStartedAt(rows: readonly { startMs: number }[], ms: number): number {
  let low = 0;
  let high = rows.length - 1;
  let found = -1;
  while (low <= high) {
    const middle = (low + high) >> 1;
    if (rows[middle].startMs <= ms) {
      found = middle;
      low = middle + 1;
    } else {
      high = middle - 1;
    }
  }
  return found;
}

/**
 * The footage's marks in time order, filtered by kind; click a time to jump there. Only the rows in view are drawn;
 * the list follows playback until the person scrolls it, and a time update draws again only the rows whose
 * highlight changes.
 */
export function MarksList({ workshopId, footageId, marks, clock, onSeek, onEdit }: MarksListProps) {
  const [kind, setKind] = useState<MarkKind | 'all'>('all');
  const remove = useRemoveMark(workshopId, footageId);
  // Site admins (not members) and disabled workshops read the marks without Edit and Remove.
  const readOnly = useWorkshopReadOnly();
  const shown = useMemo(() => (kind === 'all' ? marks : marks.filter((mark) => mark.kind === kind)), [marks, kind]);
  // Re-renders when the highlighted row changes, not on every time update.
  const active = usePlaybackSelect(clock, (ms) => lastStartedAt(shown, ms));
  const seek = useStableHandler(onSeek);
  const edit = useStableHandler(onEdit);
  const removeMark = useStableHandler((mark: Mark) =>
    remove.mutate(mark.id, { onError: (error) => notifyError('The mark was not removed', error) }),
  );
  const { following, box, rows, resume } = useFollowingList<HTMLDivElement>({
    count: shown.length,
    currentIndex: active,
    estimateRowHeight: (index) => (hasLinkLine(shown[index]) ? MARK_ROW_ESTIMATE_PX.withLink : MARK_ROW_ESTIMATE_PX.oneLine),
    place: 'third',
  });

  return (
    <Paper withBorder p="md" data-testid="marks-panel">
      <Stack gap="sm">
        <Group justify="space-between">
          <Title order={4}>Marks</Title>
          {!following && shown.length > 0 && <BackToNow onClick={resume} />}
        </Group>
        {/* Seven kinds do not fit a phone's width: the strip scrolls sideways rather than squeezing the words. */}
        <div className={classes.kindFilter} data-testid="mark-kind-filter">
          <SegmentedControl
            size="xs"
            aria-label="Show marks of kind"
            value={kind}
            onChange={(next) => setKind(next as MarkKind | 'all')}
            data={[{ value: 'all', label: 'All' }, ...MARK_KINDS.map((value) => ({ value, label: KIND_LOOK[value].name }))]}
          />
        </div>
        {shown.length === 0 && (
          <Text size="sm" c="dimmed">
            {marks.length === 0 ? 'No marks yet. Press M while the video plays, or use “Pin a mark”.' : 'No marks of this kind.'}
          </Text>
        )}
        {shown.length > 0 && (
          <div ref={box} className={classes.scroller} data-testid="marks-list">
            <div className={classes.spacer} style={{ height: rows.getTotalSize() }}>
              {rows.getVirtualItems().map((row) => (
                <div
                  key={shown[row.index].id}
                  data-index={row.index}
                  ref={rows.measureElement}
                  className={classes.row}
                  style={{ transform: `translateY(${row.start}px)` }}
                  data-active={row.index === active || undefined}
                >
                  <MarkRow workshopId={workshopId} footageId={footageId} mark={shown[row.index]} onSeek={seek} onEdit={edit} onRemove={removeMark} readOnly={readOnly || shown[row.index].id.startsWith(PROVISIONAL_MARK_PREFIX)} />
                </div>
              ))}
            </div>
          </div>
        )}
      </Stack>
    </Paper>
  );
}

interface MarkRowProps {
  workshopId: string;
  footageId: string;
  mark: Mark;
  onSeek: (ms: number) => void;
  onEdit: (mark: Mark) => void;
  onRemove: (mark: Mark) => void;
  readOnly: boolean;
}

/**
 * One mark; memoised, so the playing moment moving on does not draw it again. Plain elements laid out by the
 * module's grid where Mantine's layout components would only add work: a fling through 400 marks draws a
 * screenful of new rows every frame.
 */
const MarkRow = memo(function MarkRow({ workshopId, footageId, mark, onSeek, onEdit, onRemove, readOnly }: MarkRowProps) {
  const at = formatClock(mark.startMs, { tenths: true });
  return (
    <div className={classes.markRow} data-testid="mark-row">
      <UnstyledButton className={classes.time} onClick={() => onSeek(mark.startMs)} aria-label={`Jump to ${at}`}>
        <Text size="sm" ff="monospace" data-testid="mark-time">
          {at}
        </Text>
      </UnstyledButton>
      <div className={classes.kind}>
        <KindShape kind={mark.kind} />
        <Text span size="sm" fw={500}>
          {KIND_LOOK[mark.kind].name}
        </Text>
      </div>
      {/* The label as written (whole, wrapping between words), and under it what the mark links to. */}
      <div className={classes.text}>
        {mark.label && (
          <Text size="sm" data-testid="mark-label">
            {mark.label}
          </Text>
        )}
        <MarkLink workshopId={workshopId} footageId={footageId} mark={mark} />
      </div>
      {!readOnly && (
        <div className={classes.actions}>
          <Button size="compact-xs" variant="default" onClick={() => onEdit(mark)}>
            Edit
          </Button>
          <ConfirmButton
            size="compact-xs"
            variant="subtle"
            color="red"
            question="Remove this mark?"
            detail="What it links to (a part, a reading, a fit check, a step) stays."
            confirmLabel="Remove mark"
            onConfirm={() => onRemove(mark)}
          >
            Remove
          </ConfirmButton>
        </div>
      )}
    </div>
  );
});
