import { Badge } from '@mantine/core';
import type { FootageState } from '../api/types';

const LABELS: Record<FootageState, { label: string; color: string }> = {
  uploading: { label: 'Uploading', color: 'blue' },
  processing: { label: 'Processing', color: 'yellow' },
  ready: { label: 'Ready', color: 'patina' },
  failed: { label: 'Failed', color: 'red' },
};

export function FootageStateBadge({ state }: { state: FootageState }) {
  const { label, color } = LABELS[state];
  return (
    <Badge color={color} variant="light" data-testid="footage-state" data-state={state}>
      {label}
    </Badge>
  );
}
