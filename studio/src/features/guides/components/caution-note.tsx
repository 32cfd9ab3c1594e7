import { Paper, Text } from '@mantine/core';
import { SignalSymbol, SignalWordHeader, signalColours } from '@/components/signal-word';
import type { Caution, CautionLevel } from '../api/types';

/** The signal word's symbol (the ANSI Z535 set shared with the reader and the marks); the word is shown beside it. */
export function CautionShape({ level, size = 14 }: { level: CautionLevel; size?: number }) {
  return (
    <span className={signalColours} data-level={level} style={{ color: 'var(--signal-bg)', display: 'inline-flex' }}>
      <SignalSymbol level={level} size={size} onColour={false} />
    </span>
  );
}

/** A step's caution as the reader will see it: the signal-word header, then the text. */
export function CautionNote({ caution }: { caution: Caution }) {
  return (
    <Paper
      withBorder
      data-testid="step-caution"
      className={signalColours}
      data-level={caution.level}
      style={{ borderColor: 'var(--signal-bg)', borderWidth: 2, overflow: 'hidden' }}
    >
      <SignalWordHeader level={caution.level} />
      <Text size="sm" px="xs" py={4}>
        {caution.text}
      </Text>
    </Paper>
  );
}
