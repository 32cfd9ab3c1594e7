import { Button, Group, Paper, SegmentedControl, Stack, Text, Title, UnstyledButton } from '@mantine/core';
import { useState } from 'react';
import { ConfirmButton } from '@/components/confirm-button';
import { notifyError } from '@/lib/notify';
import { useRemoveMark } from '../api/mutations';
import { MARK_KINDS, type Mark, type MarkKind } from '../api/queries';
import { formatClock } from '@/lib/clock';
import { KindShape } from './kind-shape';
import { MarkLink } from './mark-link';
import { KIND_LOOK } from './mark-kinds';

export interface MarksListProps {
  workshopId: string;
  footageId: string;
  marks: Mark[];
  onSeek: (ms: number) => void;
  onEdit: (mark: Mark) => void;
}

/** The footage's marks in time order, filtered by kind; click a time to jump there. */
export function MarksList({ workshopId, footageId, marks, onSeek, onEdit }: MarksListProps) {
  const [kind, setKind] = useState<MarkKind | 'all'>('all');
  const remove = useRemoveMark(workshopId, footageId);
  const shown = kind === 'all' ? marks : marks.filter((mark) => mark.kind === kind);

  return (
    <Paper withBorder p="md">
      <Stack gap="sm">
        <Title order={4}>Marks</Title>
        <SegmentedControl
          size="xs"
          aria-label="Show marks of kind"
          value={kind}
          onChange={(next) => setKind(next as MarkKind | 'all')}
          data={[{ value: 'all', label: 'All' }, ...MARK_KINDS.map((value) => ({ value, label: KIND_LOOK[value].name }))]}
        />
        {shown.length === 0 && (
          <Text size="sm" c="dimmed">
            {marks.length === 0 ? 'No marks yet. Press M while the video plays, or use “Pin a mark”.' : 'No marks of this kind.'}
          </Text>
        )}
        <Stack gap={4} data-testid="marks-list">
          {shown.map((mark) => (
            <Group key={mark.id} justify="space-between" wrap="nowrap" data-testid="mark-row">
              <Group gap="xs" wrap="nowrap" align="flex-start" style={{ minWidth: 0 }}>
                <UnstyledButton onClick={() => onSeek(mark.startMs)} aria-label={`Jump to ${formatClock(mark.startMs, { tenths: true })}`}>
                  <Text size="sm" ff="monospace">
                    {formatClock(mark.startMs, { tenths: true })}
                  </Text>
                </UnstyledButton>
                <Group gap="xs" wrap="nowrap" h={22} style={{ flex: 'none' }}>
                  <KindShape kind={mark.kind} />
                  <Text size="sm" fw={500} style={{ whiteSpace: 'nowrap' }}>
                    {KIND_LOOK[mark.kind].name}
                  </Text>
                </Group>
                {/* The label as written, and under it what the mark links to. */}
                <Stack gap={0} style={{ minWidth: 0 }}>
                  {mark.label && (
                    <Text size="sm" lineClamp={1}>
                      {mark.label}
                    </Text>
                  )}
                  <MarkLink workshopId={workshopId} footageId={footageId} mark={mark} />
                </Stack>
              </Group>
              <Group gap={4} wrap="nowrap">
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
                  onConfirm={() => remove.mutate(mark.id, { onError: (error) => notifyError('The mark was not removed', error) })}
                >
                  Remove
                </ConfirmButton>
              </Group>
            </Group>
          ))}
        </Stack>
      </Stack>
    </Paper>
  );
}
