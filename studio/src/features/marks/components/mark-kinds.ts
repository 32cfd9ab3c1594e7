import type { FitCheckState, MarkKind } from '../api/queries';
import { SAFETY_ALERT_SHAPE } from '@/components/signal-word';

/**
 * How each kind reads on screen. Every kind has its own shape (an SVG path in a 12×12 box) and name,
 * so the timeline reads without colour; the colour only helps.
 */
export const KIND_LOOK: Record<MarkKind, { name: string; shape: string; color: string }> = {
  part: { name: 'Part', shape: 'M2 2h8v8H2z', color: 'var(--mantine-color-blue-7)' },
  measurement: { name: 'Measurement', shape: 'M6 0l6 6-6 6-6-6z', color: 'var(--mantine-color-grape-7)' },
  check_evidence: { name: 'Check evidence', shape: 'M6 1a5 5 0 1 0 0.01 0z', color: 'var(--mantine-color-teal-8)' },
  step: { name: 'Step', shape: 'M1 0.5h1.6v11H1z M2.6 0.5l8.4 3.2-8.4 3.2z', color: 'var(--mantine-color-dark-5)' },
  // The safety alert symbol, as the signal-word headers in the editor and the reader carry it.
  caution: { name: 'Caution', shape: SAFETY_ALERT_SHAPE, color: 'var(--mantine-color-orange-8)' },
  note: { name: 'Note', shape: 'M4.5 0h3v12h-3z', color: 'var(--mantine-color-gray-7)' },
};

export type MarkLinkField = 'partId' | 'measurementId' | 'fitCheckId' | 'guideStepId';

/** The link each kind may carry (mirrors the API's rule, which has the last word); cautions and notes link nothing. */
export const LINK_OF_KIND: Partial<Record<MarkKind, MarkLinkField>> = {
  part: 'partId',
  measurement: 'measurementId',
  check_evidence: 'fitCheckId',
  step: 'guideStepId',
};

export const LINK_FIELDS: MarkLinkField[] = ['partId', 'measurementId', 'fitCheckId', 'guideStepId'];

/** Fit-check states in words, beside a check's title in the picker. */
export const CHECK_STATE_WORDS: Record<FitCheckState, string> = {
  open: 'open',
  bench_pass: 'passes on the bench',
  confirmed: 'confirmed',
  no_fit: 'no fit',
  retired: 'retired',
};
