import { Group, Text } from '@mantine/core';
import type { ApiSchema } from '@/lib/api-types';
import { ink, stateColours } from '@/theme/palette';

/** The fit-check states and checklist verdicts of the API (DESIGN.md vocabulary). */
export type FitCheckState = ApiSchema<'FitCheckState'>;
export type ChecklistVerdict = ApiSchema<'ChecklistVerdict'>;

interface StateLook {
  label: string;
  /** What the state means, for a tooltip-free reading of the list. */
  meaning: string;
  colour: string;
}

/** Our own words for the states; each also has its own shape, so colour is never the only sign. */
export const STATE_LOOK: Record<FitCheckState, StateLook> = {
  open: { label: 'Open', meaning: 'not proven yet', colour: stateColours.open },
  bench_pass: { label: 'Passes on the bench', meaning: 'the numbers fit; not yet test-fitted', colour: stateColours.bench_pass },
  confirmed: { label: 'Confirmed on the vehicle', meaning: 'test-fitted, with evidence', colour: stateColours.confirmed },
  no_fit: { label: 'Does not fit', meaning: 'the numbers or the test fit say no', colour: stateColours.no_fit },
  retired: { label: 'Retired', meaning: 'no longer counted', colour: stateColours.retired },
};

export const VERDICT_LOOK: Record<ChecklistVerdict, { label: string; explanation: string }> = {
  open: { label: 'Not proven yet', explanation: 'Some required checks are still open.' },
  bench_pass: {
    label: 'Passes on the bench',
    explanation: 'Every required check passes by the numbers; confirm each by test-fitting, with evidence.',
  },
  confirmed: { label: 'Verified fit', explanation: 'Every required check is confirmed on the vehicle, with evidence.' },
  no_fit: { label: 'Does not fit', explanation: 'At least one required check does not fit.' },
};

/** Outline of a double-ended plug gauge (go pin left, handle, no-go pin right) in a 16 × 16 box. */
const GAUGE = 'M1 6.5H5V4.5H11V7H15V9H11V11.5H5V9.5H1Z';
/** The same gauge drawn smaller about the box's centre, for glyphs that frame it. */
const SMALL_GAUGE = 'translate(8 8) scale(0.62) translate(-8 -8)';

/**
 * A glyph per state, drawn from the gauge a machinist proves a fit with: an empty gauge (not proven yet),
 * the gauge resting on the bench (passes by the numbers), the gauge in a solid tile (proven on the vehicle),
 * the gauge under the ISO 7010 prohibition ring (no-go), a dashed ghost of it (retired). Each shape differs,
 * so colour is never the only sign, and the state's words always stand beside it.
 */
export function StateIcon({ state, size = 16 }: { state: FitCheckState; size?: number }) {
  const colour = STATE_LOOK[state].colour;
  return (
    <svg width={size} height={size} viewBox="0 0 16 16" aria-hidden="true" focusable="false" data-icon={state}>
      {state === 'open' && <path d={GAUGE} fill="none" stroke={colour} strokeWidth="1.5" strokeLinejoin="round" />}
      {state === 'bench_pass' && (
        <>
          <path d={GAUGE} transform="translate(0 -1.5)" fill={colour} />
          <path d="M0.5 14H15.5" stroke={colour} strokeWidth="2" strokeLinecap="round" />
        </>
      )}
      {state === 'confirmed' && (
        <>
          <rect x="0.5" y="0.5" width="15" height="15" rx="3" fill={colour} />
          <path d={GAUGE} transform={SMALL_GAUGE} fill={ink.paper} />
        </>
      )}
      {state === 'no_fit' && (
        <>
          <path d={GAUGE} transform={SMALL_GAUGE} fill={colour} />
          <circle cx="8" cy="8" r="6.75" fill="none" stroke={colour} strokeWidth="1.5" />
          <path d="M3.2 3.2L12.8 12.8" stroke={colour} strokeWidth="1.75" />
        </>
      )}
      {state === 'retired' && <path d={GAUGE} fill="none" stroke={colour} strokeWidth="1.25" strokeDasharray="1.5 1.5" />}
    </svg>
  );
}

export function CheckStateBadge({ state }: { state: FitCheckState }) {
  const look = STATE_LOOK[state];
  return (
    <Group
      gap={6}
      wrap="nowrap"
      data-testid="check-state"
      data-state={state}
      px={8}
      py={2}
      style={{ border: `1.5px solid ${look.colour}`, borderRadius: 999, display: 'inline-flex' }}
    >
      <StateIcon state={state} />
      <Text size="sm" fw={600} c={look.colour} style={{ whiteSpace: 'nowrap' }}>
        {look.label}
      </Text>
    </Group>
  );
}
