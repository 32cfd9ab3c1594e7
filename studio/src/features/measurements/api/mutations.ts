import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { LengthUnit } from '@/lib/units';
import { measurementQueries, type InstrumentKind, type Measurement, type MeasurementSubject, type Quantity } from './queries';

export interface MeasurementInput {
  quantity: Quantity;
  value: string;
  unit: LengthUnit;
  instrumentKind: InstrumentKind;
  resolution: string;
  calibratedOn?: string;
  instrumentNote?: string;
  temperatureC?: number;
  note?: string;
}

/** A reading re-evaluates the fit checks of its subject on the server: refresh them too (by their root key). */
function useRefresh() {
  const queryClient = useQueryClient();
  return () =>
    Promise.all([
      queryClient.invalidateQueries({ queryKey: measurementQueries.all() }),
      queryClient.invalidateQueries({ queryKey: ['fit-checks'] }),
    ]);
}

export function useAddMeasurement(workshopId: string, subject: MeasurementSubject) {
  const refresh = useRefresh();
  return useMutation({
    mutationFn: (input: MeasurementInput) =>
      apiRequest<Measurement>(`/workshops/${workshopId}/measurements`, { method: 'POST', body: { ...subject, ...input } }),
    onSuccess: refresh,
  });
}

export function useRemoveMeasurement(workshopId: string) {
  const refresh = useRefresh();
  return useMutation({
    mutationFn: (measurementId: string) =>
      apiRequest<null>(`/workshops/${workshopId}/measurements/${measurementId}`, { method: 'DELETE' }),
    onSuccess: refresh,
  });
}
