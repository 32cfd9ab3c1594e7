/** Emitted after a part feature is created, changed or removed; fit checks re-evaluate on it. */
export const PART_FEATURE_CHANGED = 'part-feature.changed';

export interface PartFeatureChangedEvent {
  workshopId: string;
  featureId: string;
  actorId: string | null;
  /** Why the checks it touches may change, in words, e.g. 'pilot bore on HL-2107 changed'. */
  reason: string;
}
