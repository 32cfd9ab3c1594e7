import { Text } from '@mantine/core';
import type { CautionLevel } from '../api/types';
import classes from './guide-view.module.css';

/**
 * The header of a caution follows common ANSI Z535 practice: the signal word itself, a symbol and the level's
 * colour. DANGER, WARNING and CAUTION carry the safety alert symbol (a triangle with an exclamation mark); NOTICE
 * concerns property, not people, so it carries a different symbol (a square with a bar) and italic type.
 * The word is always written, so the level never rests on colour.
 */
function SignalSymbol({ level }: { level: CautionLevel }) {
  if (level === 'NOTICE') {
    return (
      <svg width="18" height="18" viewBox="0 0 18 18" aria-hidden="true" focusable="false" data-symbol="notice">
        <rect x="1.5" y="1.5" width="15" height="15" rx="2" fill="none" stroke="currentColor" strokeWidth="2" />
        <path d="M9 7.5v6" stroke="currentColor" strokeWidth="2.2" strokeLinecap="round" />
        <circle cx="9" cy="4.8" r="1.3" fill="currentColor" />
      </svg>
    );
  }
  return (
    <svg width="20" height="18" viewBox="0 0 20 18" aria-hidden="true" focusable="false" data-symbol="safety-alert">
      <path d="M10 1L19 17H1z" fill="currentColor" />
      <path d="M10 6.5v5" stroke="var(--signal-bg)" strokeWidth="2.2" strokeLinecap="round" />
      <circle cx="10" cy="14.2" r="1.25" fill="var(--signal-bg)" />
    </svg>
  );
}

export interface CautionPanelProps {
  level: CautionLevel;
  text: string;
  /** Where it comes from (a safety topic or a step); left out inside the step itself. */
  source?: string;
  compact?: boolean;
}

/** One caution: the signal-word header, then what to do. */
export function CautionPanel({ level, text, source, compact = false }: CautionPanelProps) {
  return (
    <section
      className={classes.caution}
      data-level={level}
      data-testid="caution"
      aria-label={source ? `${level}: ${source}` : level}
    >
      <div className={classes.signalHeader} data-level={level}>
        <SignalSymbol level={level} />
        <span className={classes.signalWord}>{level}</span>
        {source && <span className={classes.signalSource}>{source}</span>}
      </div>
      <Text size={compact ? 'sm' : 'md'} px="sm" py={compact ? 6 : 'xs'}>
        {text}
      </Text>
    </section>
  );
}
