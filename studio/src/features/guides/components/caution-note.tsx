import { Group, Paper, Text } from '@mantine/core';
import type { Caution, CautionLevel } from '../api/types';
import { CAUTION_LOOK } from './guide-labels';

/** The signal word's shape, named for screen readers (the word is shown beside it as well). */
export function CautionShape({ level, size = 14 }: { level: CautionLevel; size?: number }) {
  const look = CAUTION_LOOK[level];
  return (
    <svg width={size} height={size} viewBox="0 0 12 12" aria-hidden="true" style={{ flex: 'none' }}>
      <path d={look.shape} fill={`var(--mantine-color-${look.color}-7)`} />
    </svg>
  );
}

/** A step's caution: the signal word in capitals, its shape, then the text. */
export function CautionNote({ caution }: { caution: Caution }) {
  const look = CAUTION_LOOK[caution.level];
  return (
    <Paper
      withBorder
      p="xs"
      data-testid="step-caution"
      style={{ borderLeft: `4px solid var(--mantine-color-${look.color}-7)` }}
    >
      <Group gap="xs" wrap="nowrap" align="flex-start">
        <CautionShape level={caution.level} />
        <Text size="sm">
          <Text span fw={700} size="sm">
            {caution.level}
          </Text>{' '}
          {caution.text}
        </Text>
      </Group>
    </Paper>
  );
}
