import { Text } from '@mantine/core';
import { SignalWordHeader, signalColours } from '@/components/signal-word';
import type { CautionLevel } from '../api/types';
import classes from './guide-view.module.css';

export interface CautionPanelProps {
  level: CautionLevel;
  text: string;
  /** Where it comes from (a safety topic or a step); left out inside the step itself. */
  source?: string;
  compact?: boolean;
}

/** One caution in full: the signal-word header (ANSI Z535 symbol, word and colour), then what to do. */
export function CautionPanel({ level, text, source, compact = false }: CautionPanelProps) {
  return (
    <section
      className={`${classes.caution} ${signalColours}`}
      data-level={level}
      data-testid="caution"
      aria-label={source ? `${level}: ${source}` : level}
    >
      <SignalWordHeader level={level} source={source} />
      <Text size={compact ? 'sm' : 'md'} px="sm" py={compact ? 6 : 'xs'}>
        {text}
      </Text>
    </section>
  );
}

/**
 * A caution folded to its header line: the signal word and topic stay in view, the text opens on demand.
 * A native <details>, so it opens without script and the print stylesheet can open it on paper.
 */
export function FoldedCaution({ level, text, source }: Required<Pick<CautionPanelProps, 'level' | 'text' | 'source'>>) {
  return (
    <details className={`${classes.caution} ${classes.foldedCaution} ${signalColours}`} data-level={level} data-testid="caution">
      <summary className={classes.foldedSummary}>
        <SignalWordHeader level={level} source={source}>
          <span className={classes.foldHint} aria-hidden="true" />
        </SignalWordHeader>
      </summary>
      <Text size="sm" px="sm" py={6}>
        {text}
      </Text>
    </details>
  );
}
