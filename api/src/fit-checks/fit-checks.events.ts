import type { FitCheckState } from '../engine/checklist';

/** Emitted whenever a fit check changes state; notifications e-mail followers on confirmed and no_fit. */
export const FIT_CHECK_CHANGED = 'fit-check.changed';

export interface FitCheckChangedEvent {
  /** The history row of this change: one notification per change, however often it is delivered. */
  eventId: string;
  workshopId: string;
  assemblyId: string;
  fitCheckId: string;
  title: string;
  from: FitCheckState | null;
  to: FitCheckState;
  reason: string;
  /** Null when a re-evaluation changed it. */
  actorId: string | null;
  /** When the change was stored (ISO 8601): digests list changes in this order. */
  occurredAt?: string;
}
