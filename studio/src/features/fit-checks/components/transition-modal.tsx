import { Button, Group, Modal, Stack, Text, Textarea } from '@mantine/core';
import { useRef, useState } from 'react';
import { notifyDone, notifyError } from '@/lib/notify';
import { useTransitionCheck } from '../api/mutations';
import type { FitCheck, FitCheckState } from '../api/queries';
import { STATE_LOOK } from '@/components/check-state';

export interface TransitionRequest {
  check: FitCheck;
  to: FitCheckState;
}

const ACTION: Partial<Record<FitCheckState, { title: string; button: string; prompt: string }>> = {
  confirmed: {
    title: 'Confirm on the vehicle',
    button: 'Confirm',
    prompt: 'How was it test-fitted? Followers read this with the evidence.',
  },
  no_fit: { title: 'Mark as not fitting', button: 'Mark no fit', prompt: 'What did not fit, and how did you find out?' },
  retired: { title: 'Retire the check', button: 'Retire', prompt: 'Why does this check no longer count?' },
  open: { title: 'Re-open the check', button: 'Re-open', prompt: 'What needs looking at again?' },
};

export const ACTION_LABELS: Partial<Record<FitCheckState, string>> = {
  confirmed: 'Confirm…',
  no_fit: 'Mark no fit…',
  retired: 'Retire…',
  open: 'Re-open…',
};

/**
 * Every change of state by hand carries a reason, kept in the history. A refusal from the API
 * ("Attach evidence … before confirming") comes back as a notification in its own words.
 */
export function TransitionModal({ workshopId, request, onClose }: { workshopId: string; request: TransitionRequest | null; onClose: () => void }) {
  const transition = useTransitionCheck(workshopId);
  const [reason, setReason] = useState('');
  const [missing, setMissing] = useState(false);
  // Set before the request leaves, so a second click in the same frame (before `isPending` renders) sends nothing.
  const inFlight = useRef(false);
  const action = request ? ACTION[request.to] : undefined;

  const handleClose = () => {
    setReason('');
    setMissing(false);
    onClose();
  };

  const handleSubmit = () => {
    if (!request || inFlight.current) return;
    if (!reason.trim()) {
      setMissing(true);
      return;
    }
    inFlight.current = true;
    transition.mutate(
      // `from` is the state this person saw: if the check moved on meanwhile, the API refuses rather than repeats.
      { checkId: request.check.id, to: request.to, reason: reason.trim(), from: request.check.state },
      {
        onSettled: () => {
          inFlight.current = false;
        },
        onSuccess: (check) => {
          notifyDone(`"${check.title}" is now: ${STATE_LOOK[check.state].label}.`);
          handleClose();
        },
        onError: (error) => notifyError(`"${request.check.title}" was not changed`, error),
      },
    );
  };

  return (
    <Modal opened={request !== null} onClose={handleClose} title={action?.title ?? ''}>
      {request && action && (
        <form
          onSubmit={(event) => {
            event.preventDefault();
            handleSubmit();
          }}
          aria-label={action.title}
        >
          <Stack gap="sm">
            <Text size="sm" fw={500}>
              {request.check.title}
            </Text>
            <Textarea
              label="Reason"
              description={action.prompt}
              autosize
              minRows={3}
              data-autofocus
              value={reason}
              onChange={(event) => {
                setReason(event.currentTarget.value);
                setMissing(false);
              }}
              error={missing ? 'Say why; the history keeps it' : undefined}
              maxLength={500}
            />
            <Group justify="flex-end">
              <Button variant="default" onClick={handleClose}>
                Cancel
              </Button>
              <Button type="submit" loading={transition.isPending} disabled={transition.isPending} color={request.to === 'no_fit' ? 'red' : undefined}>
                {action.button}
              </Button>
            </Group>
          </Stack>
        </form>
      )}
    </Modal>
  );
}
