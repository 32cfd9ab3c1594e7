import type { ReactNode } from 'react';
import classes from './signal-word.module.css';

/**
 * The safety alert symbol as one path in a 12×12 box (a triangle with the exclamation mark cut out, wound
 * the other way), for small marks such as a caution on a timeline.
 */
export const SAFETY_ALERT_SHAPE = 'M6 0.5l5.8 11H0.2z M5.3 4v4h1.4V4z M5.3 9v1.4h1.4V9z';

/** ANSI Z535 signal words, most severe first. */
export type SignalWord = 'DANGER' | 'WARNING' | 'CAUTION' | 'NOTICE';

/**
 * The symbol beside a signal word, after common ANSI Z535 practice: DANGER, WARNING and CAUTION carry the
 * safety alert symbol (a triangle with an exclamation mark); NOTICE concerns property, not people, so it
 * carries a square with a bar instead. The word is always written beside it, so the level never rests on
 * colour or shape alone. `onColour` draws the mark inside the triangle in the header's own colour.
 */
export function SignalSymbol({ level, size = 18, onColour = true }: { level: SignalWord; size?: number; onColour?: boolean }) {
  if (level === 'NOTICE') {
    return (
      <svg width={size} height={size} viewBox="0 0 18 18" aria-hidden="true" focusable="false" data-symbol="notice" style={{ flex: 'none' }}>
        <rect x="1.5" y="1.5" width="15" height="15" rx="2" fill="none" stroke="currentColor" strokeWidth="2" />
        <path d="M9 7.5v6" stroke="currentColor" strokeWidth="2.2" strokeLinecap="round" />
        <circle cx="9" cy="4.8" r="1.3" fill="currentColor" />
      </svg>
    );
  }
  const inner = onColour ? 'var(--signal-bg, var(--mantine-color-white))' : 'var(--mantine-color-white)';
  return (
    <svg width={(size * 20) / 18} height={size} viewBox="0 0 20 18" aria-hidden="true" focusable="false" data-symbol="safety-alert" style={{ flex: 'none' }}>
      <path d="M10 1L19 17H1z" fill="currentColor" />
      <path d="M10 6.5v5" stroke={inner} strokeWidth="2.2" strokeLinecap="round" />
      <circle cx="10" cy="14.2" r="1.25" fill={inner} />
    </svg>
  );
}

/** The signal-word header: the symbol and the word on the level's colour, and where the caution comes from. */
export function SignalWordHeader({ level, source, children }: { level: SignalWord; source?: string; children?: ReactNode }) {
  return (
    <span className={`${classes.signal} ${classes.header}`} data-level={level} data-signal-header="">
      <SignalSymbol level={level} />
      <span className={classes.word}>{level}</span>
      {source && <span className={classes.source}>{source}</span>}
      {children}
    </span>
  );
}

/** The class that sets `--signal-bg` and `--signal-fg` for a level, for borders drawn in the level's colour. */
export const signalColours = classes.signal;

/** A short caution in running text (outside a guide): the signal-word header over the text, bordered in its colour. */
export function SignalNote({ level, children, testId }: { level: SignalWord; children: ReactNode; testId?: string }) {
  return (
    <div className={`${classes.signal} ${classes.note}`} data-level={level} data-testid={testId} role="note" aria-label={level}>
      <SignalWordHeader level={level} />
      <div className={classes.noteText}>{children}</div>
    </div>
  );
}
