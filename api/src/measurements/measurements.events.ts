/** Emitted after a reading is added or removed; fit checks re-evaluate on it. */
export const MEASUREMENT_CHANGED = 'measurement.changed';

export interface MeasurementChangedEvent {
  workshopId: string;
  featureId: string | null;
  interfaceId: string | null;
  actorId: string | null;
  reason: string;
}
