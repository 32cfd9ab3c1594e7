/**
 * The verified-fit checklist's rules: how a check's state follows the engine's verdict, which
 * changes a person may make, and how an assembly's checks roll up into one verdict.
 */

export const FIT_CHECK_STATES = ['open', 'bench_pass', 'confirmed', 'no_fit', 'retired'] as const;
export type FitCheckState = (typeof FIT_CHECK_STATES)[number];

/** The engine's verdict on what it can compute: numbers pass, fail, or are not yet known. */
export type CheckOutcome = 'pass' | 'fail' | 'unknown';

export interface CheckSnapshot {
  state: FitCheckState;
  required: boolean;
  /** Evidence attached (measurements, marks, photos). */
  evidenceCount: number;
}

/**
 * The state a derived check moves to when the engine's verdict changes from `previous` to `next`;
 * null when nothing changes. A confirmed check whose numbers change is re-opened: its test fit
 * was made with other parts or readings, so it must be looked at again.
 */
export function stateAfterOutcome(
  current: FitCheckState,
  previous: CheckOutcome | null,
  next: CheckOutcome,
): FitCheckState | null {
  if (current === 'retired' || previous === next) return null;
  if (current === 'confirmed') return 'open';
  const target = stateForOutcome(next);
  return target === current ? null : target;
}

export function stateForOutcome(outcome: CheckOutcome): FitCheckState {
  if (outcome === 'pass') return 'bench_pass';
  if (outcome === 'fail') return 'no_fit';
  return 'open';
}

export type TransitionRefusal = { allowed: false; message: string };
export type TransitionVerdict = { allowed: true } | TransitionRefusal;

/**
 * Whether a person may move a check to `target`. Confirming needs evidence, and a derived check
 * must pass on the bench first: numbers that do not fit are never confirmed by hand.
 */
export function canTransition(
  check: CheckSnapshot & { derived: boolean; outcome: CheckOutcome | null },
  target: FitCheckState,
): TransitionVerdict {
  if (check.state === target) return { allowed: false, message: `The check is already ${target}.` };
  switch (target) {
    case 'confirmed':
      if (check.state === 'retired') return { allowed: false, message: 'Re-open a retired check before confirming it.' };
      if (check.derived && check.outcome !== 'pass') {
        return { allowed: false, message: 'The computed check does not pass; it cannot be confirmed until the numbers fit.' };
      }
      if (check.evidenceCount === 0) {
        return { allowed: false, message: 'Attach evidence (a measurement, a mark or a photo) before confirming.' };
      }
      return { allowed: true };
    case 'bench_pass':
      return { allowed: false, message: 'Bench pass is set by the computed checks, not by hand.' };
    case 'no_fit':
    case 'retired':
    case 'open':
      return { allowed: true };
  }
}

export type ChecklistVerdict = 'open' | 'bench_pass' | 'confirmed' | 'no_fit';

/**
 * An assembly is confirmed only when every required, non-retired check is confirmed with evidence;
 * one no-fit makes it no-fit; all passing on the bench (some perhaps confirmed) makes it bench-pass.
 */
export function rollUpChecklist(checks: readonly CheckSnapshot[]): ChecklistVerdict {
  const counted = checks.filter((check) => check.required && check.state !== 'retired');
  if (counted.length === 0) return 'open';
  if (counted.some((check) => check.state === 'no_fit')) return 'no_fit';
  if (counted.every((check) => check.state === 'confirmed' && check.evidenceCount > 0)) return 'confirmed';
  if (counted.every((check) => check.state === 'bench_pass' || check.state === 'confirmed')) return 'bench_pass';
  return 'open';
}
