/**
 * Emitted (and awaited) after an interface of an assembly is added or changed; fit checks re-evaluate the
 * assembly on it. An event rather than a call, so assemblies need not know the fit-check domain (which reads them).
 */
export const ASSEMBLY_INTERFACES_CHANGED = 'assembly.interfaces-changed';

export interface AssemblyInterfacesChangedEvent {
  workshopId: string;
  assemblyId: string;
  actorId: string | null;
  /** Why the assembly's checks may change, in words, e.g. 'interface "spline" added'. */
  reason: string;
}
