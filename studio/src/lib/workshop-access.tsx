import { createContext, useContext, type ReactNode } from 'react';

/**
 * Whether the workshop on screen may be changed by the person looking at it. A site admin who is not a
 * member reads with the role `admin`, and a disabled workshop refuses every change: the API answers
 * both with a refusal, so the studio offers no edit controls rather than controls that fail.
 * Shared here (not in a feature) because every workshop feature asks it.
 */
const WorkshopReadOnlyContext = createContext(false);

export function WorkshopAccessProvider({ readOnly, children }: { readOnly: boolean; children: ReactNode }) {
  return <WorkshopReadOnlyContext.Provider value={readOnly}>{children}</WorkshopReadOnlyContext.Provider>;
}

/** True when the workshop on screen is only to be read (site admin, not a member; or a disabled workshop). */
export function useWorkshopReadOnly(): boolean {
  return useContext(WorkshopReadOnlyContext);
}

/** The rule in one place: the role `admin` never changes anything; a disabled workshop refuses changes. */
export function isWorkshopReadOnly(workshop: { role?: string | null; disabled: boolean }): boolean {
  return workshop.role === 'admin' || workshop.disabled;
}
