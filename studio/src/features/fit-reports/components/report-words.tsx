import { Group, Text } from '@mantine/core';
import { fitColours, ink } from '@/theme/palette';
import type { FitReportOutcome, FitReportStatus } from '../api/queries';

export const OUTCOME_WORDS: Record<FitReportOutcome, string> = { fit: 'It fit', no_fit: 'It did not fit' };

/** The workshop's filter and status choices. */
export const STATUS_WORDS: Record<FitReportStatus, string> = {
  new: 'New',
  investigating: 'Investigating',
  verified: 'Verified',
  declined: 'Declined',
};

/** How the reporter reads their report's status. */
export const STATUS_FOR_REPORTER: Record<FitReportStatus, string> = {
  new: 'New: not reviewed yet',
  investigating: 'Investigating: the workshop is looking into it',
  verified: 'Verified by the workshop',
  declined: 'Declined by the workshop',
};

const OUTCOME_COLOUR: Record<FitReportOutcome, string> = { fit: fitColours.fit, no_fit: fitColours.noFit };

/** A tick in a circle for "it fit", a cross in a square for "it did not": the shape and the words carry it, not the colour. */
export function OutcomeLabel({ outcome }: { outcome: FitReportOutcome }) {
  const colour = OUTCOME_COLOUR[outcome];
  return (
    <Group gap={6} wrap="nowrap" data-testid="report-outcome" data-outcome={outcome} style={{ display: 'inline-flex' }}>
      <svg width={16} height={16} viewBox="0 0 16 16" aria-hidden="true" focusable="false">
        {outcome === 'fit' ? (
          <>
            <circle cx="8" cy="8" r="7" fill={colour} />
            <path d="M4.5 8.2l2.3 2.3 4.7-4.8" fill="none" stroke={ink.paper} strokeWidth="2" strokeLinecap="round" strokeLinejoin="round" />
          </>
        ) : (
          <>
            <rect x="1.5" y="1.5" width="13" height="13" rx="1.5" fill={colour} />
            <path d="M5 5l6 6M11 5l-6 6" stroke={ink.paper} strokeWidth="2" strokeLinecap="round" />
          </>
        )}
      </svg>
      <Text size="sm" fw={600} c={colour} style={{ whiteSpace: 'nowrap' }}>
        {OUTCOME_WORDS[outcome]}
      </Text>
    </Group>
  );
}

