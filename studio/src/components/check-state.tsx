import { Group, Text } from '@mantine/core';

/** The fit-check states and checklist verdicts of the API (DESIGN.md vocabulary). */
export type FitCheckState = 'open' | 'bench_pass' | 'confirmed' | 'no_fit' | 'retired';
export type ChecklistVerdict = Exclude<FitCheckState, 'retired'>;

interface StateLook {
  label: string;
  /** What the state means, for a tooltip-free reading of the list. */
  meaning: string;
  colour: string;
}

/** Our own words for the states; each also has its own shape, so colour is never the only sign. */
export const STATE_LOOK: Record<FitCheckState, StateLook> = {
  open: { label: 'Open', meaning: 'not proven yet', colour: '#5c6470' },
  bench_pass: { label: 'Passes on the bench', meaning: 'the numbers fit; not yet test-fitted', colour: '#1c5fa8' },
  confirmed: { label: 'Confirmed on the vehicle', meaning: 'test-fitted, with evidence', colour: '#0d7369' },
  no_fit: { label: 'Does not fit', meaning: 'the numbers or the test fit say no', colour: '#b3261e' },
  retired: { label: 'Retired', meaning: 'no longer counted', colour: '#868e96' },
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

/** A small shape per state: ring (open), half-filled (bench), filled with a tick (confirmed), crossed square (no fit), slashed ring (retired). */
export function StateIcon({ state, size = 16 }: { state: FitCheckState; size?: number }) {
  const colour = STATE_LOOK[state].colour;
  return (
    <svg width={size} height={size} viewBox="0 0 16 16" aria-hidden="true" focusable="false" data-icon={state}>
      {state === 'open' && <circle cx="8" cy="8" r="6" fill="none" stroke={colour} strokeWidth="2" />}
      {state === 'bench_pass' && (
        <>
          <circle cx="8" cy="8" r="6" fill="none" stroke={colour} strokeWidth="2" />
          <path d="M8 2a6 6 0 0 0 0 12z" fill={colour} />
        </>
      )}
      {state === 'confirmed' && (
        <>
          <circle cx="8" cy="8" r="7" fill={colour} />
          <path d="M4.5 8.2l2.3 2.3 4.7-4.8" fill="none" stroke="#fff" strokeWidth="2" strokeLinecap="round" strokeLinejoin="round" />
        </>
      )}
      {state === 'no_fit' && (
        <>
          <rect x="1.5" y="1.5" width="13" height="13" rx="1.5" fill={colour} />
          <path d="M5 5l6 6M11 5l-6 6" stroke="#fff" strokeWidth="2" strokeLinecap="round" />
        </>
      )}
      {state === 'retired' && (
        <>
          <circle cx="8" cy="8" r="6" fill="none" stroke={colour} strokeWidth="1.5" strokeDasharray="2 2" />
          <path d="M3.5 12.5l9-9" stroke={colour} strokeWidth="1.5" />
        </>
      )}
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
