import { Badge } from '@mantine/core';
import type { FootageState } from '../api/types';

const LABELS: Record<FootageState, { label: string; color: string }> = {
  uploading: { label: 'Uploading', color: 'blue' },
  processing: { label: 'Processing', color: 'yellow' },
  ready: { label: 'Ready', color: 'patina' },
  failed: { label: 'Failed', color: 'red' },
};

/**
 * `interrupted`: the footage is still `uploading` on the server but no tab is sending it (the page was
 * reloaded or closed), so "Uploading" would be untrue; the card offers to resume instead.
 */
export function FootageStateBadge({ state, interrupted = false }: { state: FootageState; interrupted?: boolean }) {
  const { label, color } = interrupted && state === 'uploading' ? { label: 'Interrupted', color: 'orange' } : LABELS[state];
  return (
    <Badge color={color} variant="light" data-testid="footage-state" data-state={state} data-interrupted={interrupted || undefined}>
      {label}
    </Badge>
  );
}
