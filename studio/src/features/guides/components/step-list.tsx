import { Badge, Button, Group, Paper, Stack, Text, Title, Typography, UnstyledButton, VisuallyHidden } from '@mantine/core';
import { useEffect, useRef, useState, type ReactNode } from 'react';
import { ConfirmButton } from '@/components/confirm-button';
import { notifyError } from '@/lib/notify';
import { useDeleteStep, useReorderSteps } from '../api/mutations';
import type { GuideStep } from '../api/types';
import { CautionNote } from './caution-note';
import { MARK_KIND_NAMES } from './guide-labels';
import { formatClock } from '@/lib/clock';
import { StepMinutes } from '@/components/guide-effort';
import { useWorkshopReadOnly } from '@/lib/workshop-access';

export interface StepListProps {
  workshopId: string;
  guideId: string;
  steps: GuideStep[];
  /** The main footage's id: a step anchored elsewhere says so. */
  mainFootageId: string | null;
  /** Moves the player to a step's moment; absent when there is no player. */
  onSeek?: (ms: number) => void;
  onEdit: (step: GuideStep) => void;
  /** The step being edited shows this (its form) instead of its card. */
  editingStepId?: string | null;
  editor?: ReactNode;
}

type Direction = 'up' | 'down';

/** Guides with more steps than this list them folded, one step open at a time. */
export const FOLD_STEPS_OVER = 8;

/** The order with one step moved one place; unchanged at either end. */
export function moveStep(stepIds: string[], stepId: string, direction: Direction): string[] {
  const from = stepIds.indexOf(stepId);
  const to = direction === 'up' ? from - 1 : from + 1;
  if (from < 0 || to < 0 || to >= stepIds.length) return stepIds;
  const next = [...stepIds];
  [next[from], next[to]] = [next[to], next[from]];
  return next;
}

/** The guide's steps in order, each with its moment, caution, body and linked marks; move, edit or delete each. */
export function StepList({ workshopId, guideId, steps, mainFootageId, onSeek, onEdit, editingStepId, editor }: StepListProps) {
  const reorder = useReorderSteps(workshopId, guideId);
  const remove = useDeleteStep(workshopId, guideId);
  // Site admins (not members) and disabled workshops read the guide without the controls the API would refuse.
  const readOnly = useWorkshopReadOnly();
  const listRef = useRef<HTMLOListElement>(null);
  const [moved, setMoved] = useState<{ stepId: string; direction: Direction } | null>(null);
  const [announcement, setAnnouncement] = useState('');
  // A long guide lists its steps folded to their title lines, one open at a time: forty steps shown whole are
  // forty bodies and control rows in the page at once.
  const folding = steps.length > FOLD_STEPS_OVER;
  const [openStepId, setOpenStepId] = useState<string | null>(null);

  // A moved card is re-inserted in the DOM, which drops keyboard focus; put it back on the same button
  // (or its twin when the step reached an end), so pressing Enter again keeps moving it.
  useEffect(() => {
    if (!moved || !listRef.current) return;
    const card = listRef.current.querySelector<HTMLElement>(`[data-step-id="${moved.stepId}"]`);
    const same = card?.querySelector<HTMLButtonElement>(`[data-move="${moved.direction}"]`);
    const twin = card?.querySelector<HTMLButtonElement>(`[data-move="${moved.direction === 'up' ? 'down' : 'up'}"]`);
    (same && !same.disabled ? same : twin)?.focus();
  }, [moved, steps]);

  const handleMove = (step: GuideStep, direction: Direction) => {
    const ids = steps.map((item) => item.id);
    const next = moveStep(ids, step.id, direction);
    if (next === ids) return;
    setMoved({ stepId: step.id, direction });
    setAnnouncement(`“${step.title}” is now step ${next.indexOf(step.id) + 1} of ${next.length}.`);
    reorder.mutate(next, {
      onError: (error) => {
        setAnnouncement('The step could not be moved.');
        notifyError('The step was not moved', error);
      },
    });
  };

  if (steps.length === 0 && !editor) {
    return (
      <Text c="dimmed" data-testid="no-steps">
        No steps yet. A guide needs at least one step before it can be published.
      </Text>
    );
  }

  return (
    <>
      <VisuallyHidden role="status" aria-live="polite">
        {announcement}
      </VisuallyHidden>
      <ol ref={listRef} aria-label="Steps" data-testid="step-list" style={{ listStyle: 'none', margin: 0, padding: 0, display: 'grid', gap: 'var(--mantine-spacing-sm)' }}>
        {steps.map((step, index) => (
          <li key={step.id} data-step-id={step.id} data-testid="step-card">
            {editingStepId === step.id && editor ? (
              editor
            ) : (
              <StepCard
                step={step}
                index={index}
                count={steps.length}
                mainFootageId={mainFootageId}
                onSeek={onSeek}
                readOnly={readOnly}
                // Short guides show every step whole; long ones fold each to its title line but the one opened.
                fold={folding ? { open: step.id === openStepId, toggle: () => setOpenStepId(step.id === openStepId ? null : step.id) } : null}
                onMove={(direction) => handleMove(step, direction)}
                onEdit={() => onEdit(step)}
                onDelete={() => remove.mutate(step.id, { onError: (error) => notifyError('The step was not deleted', error) })}
              />
            )}
          </li>
        ))}
      </ol>
      {editor && !steps.some((step) => step.id === editingStepId) && <div>{editor}</div>}
    </>
  );
}

interface StepCardProps {
  step: GuideStep;
  index: number;
  count: number;
  mainFootageId: string | null;
  onSeek?: (ms: number) => void;
  readOnly: boolean;
  /** In a long guide: whether this step is the open one, and how to open or fold it; null when every step shows whole. */
  fold: { open: boolean; toggle: () => void } | null;
  onMove: (direction: Direction) => void;
  onEdit: () => void;
  onDelete: () => void;
}

/** One step: its title line (number, title, time), then, when shown whole, its caution, body, marks and controls. */
function StepCard({ step, index, count, mainFootageId, onSeek, readOnly, fold, onMove, onEdit, onDelete }: StepCardProps) {
  const whole = fold === null || fold.open;
  const titleLine = (
    <Group justify="space-between" align="flex-start" wrap="nowrap">
      <Group gap="xs" align="baseline" wrap="nowrap">
        <Badge variant="default" style={{ flex: 'none' }}>
          Step {index + 1}
        </Badge>
        <Title order={4} fz="md">
          {fold ? (
            <UnstyledButton onClick={fold.toggle} aria-expanded={fold.open} fz="md" fw="inherit" ta="left">
              {step.title}
            </UnstyledButton>
          ) : (
            step.title
          )}
        </Title>
        <StepMinutes minutes={step.estimatedMinutes} />
      </Group>
      {step.startMs !== null && <StepMoment step={step} mainFootageId={mainFootageId} onSeek={onSeek} />}
    </Group>
  );
  // The same elements around the title line folded or whole, so its button keeps focus as the step opens and folds.
  return (
    <Paper withBorder px="md" py={whole ? 'md' : 'xs'}>
      <Stack gap="xs">
        {titleLine}
        {whole && (
          <StepDetails step={step} index={index} count={count} readOnly={readOnly} onMove={onMove} onEdit={onEdit} onDelete={onDelete} />
        )}
      </Stack>
    </Paper>
  );
}

/** A step shown whole, under its title line: caution, body, linked marks and its controls. */
function StepDetails({ step, index, count, readOnly, onMove, onEdit, onDelete }: Omit<StepCardProps, 'mainFootageId' | 'onSeek' | 'fold'>) {
  return (
    <>
      {step.caution && <CautionNote caution={step.caution} />}
      {step.body && (
        // Sanitised by the server (see the guides contract); never the editor's own HTML.
        <Typography fz="sm" dangerouslySetInnerHTML={{ __html: step.body }} />
      )}
      {step.marks.length > 0 && (
        <Stack gap={2} aria-label={`Marks linked to step ${index + 1}`} data-testid="step-marks">
          <Text size="xs" fw={600} c="dimmed">
            Linked marks
          </Text>
          {step.marks.map((mark) => (
            <Text key={mark.id} size="xs" data-testid="step-mark">
              <Text span ff="monospace" size="xs">
                {formatClock(mark.startMs, { tenths: true })}
              </Text>{' '}
              <Text span fw={600} size="xs">
                {MARK_KIND_NAMES[mark.kind] ?? mark.kind}
              </Text>{' '}
              {mark.label}
            </Text>
          ))}
        </Stack>
      )}
      {!readOnly && (
        <Group gap={6} justify="flex-end">
          <Button
            size="compact-sm"
            variant="default"
            data-move="up"
            disabled={index === 0}
            aria-label={`Move step ${index + 1}, ${step.title}, up`}
            onClick={() => onMove('up')}
          >
            ↑ Up
          </Button>
          <Button
            size="compact-sm"
            variant="default"
            data-move="down"
            disabled={index === count - 1}
            aria-label={`Move step ${index + 1}, ${step.title}, down`}
            onClick={() => onMove('down')}
          >
            ↓ Down
          </Button>
          <Button size="compact-sm" variant="default" onClick={onEdit} aria-label={`Edit step ${index + 1}, ${step.title}`}>
            Edit
          </Button>
          <ConfirmButton
            size="compact-sm"
            variant="subtle"
            color="red"
            aria-label={`Delete step ${index + 1}, ${step.title}`}
            question={`Delete step ${index + 1}?`}
            detail={`“${step.title}” goes; the steps after it move up. Marks linked to it stay on the footage.`}
            confirmLabel="Delete step"
            onConfirm={onDelete}
          >
            Delete
          </ConfirmButton>
        </Group>
      )}
    </>
  );
}

function StepMoment({ step, mainFootageId, onSeek }: { step: GuideStep; mainFootageId: string | null; onSeek?: (ms: number) => void }) {
  const startMs = step.startMs ?? 0;
  const label = `${formatClock(startMs, { tenths: true })}${step.endMs !== null ? `–${formatClock(step.endMs, { tenths: true })}` : ''}`;
  const elsewhere = step.footageId !== null && step.footageId !== mainFootageId;
  if (!onSeek || elsewhere) {
    return (
      <Text size="sm" ff="monospace" style={{ flex: 'none' }} data-testid="step-time">
        {label}
        {elsewhere && ' (other footage)'}
      </Text>
    );
  }
  return (
    <UnstyledButton
      onClick={() => onSeek(startMs)}
      aria-label={`Play from ${formatClock(startMs, { tenths: true })}`}
      style={{ flex: 'none' }}
      fz="sm"
      ff="monospace"
      c="patina.8"
      td="underline"
      data-testid="step-time"
    >
      {label}
    </UnstyledButton>
  );
}
