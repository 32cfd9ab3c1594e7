import { Alert, Button, Group, Skeleton, Stack, Text } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { ConfirmButton } from '@/components/confirm-button';
import { UnitToggle } from '@/components/unit-toggle';
import { notifyError } from '@/lib/notify';
import { useWorkshopReadOnly } from '@/lib/workshop-access';
import { formatLength, type LengthUnit } from '@/lib/units';
import { useRemoveMeasurement } from '../api/mutations';
import { measurementQueries, type MeasurementSubject, type Quantity } from '../api/queries';
import { UNIT_OPTIONS } from './measurement-labels';
import { ReadingForm } from './reading-form';
import { ReadingsTable } from './readings-table';

export interface SubjectReadingsProps {
  workshopId: string;
  subject: MeasurementSubject;
  /** The unit the subject is specified in: the first choice for new readings and for the toggle. */
  defaultUnit: LengthUnit;
  defaultQuantity: Quantity;
  /** Names the subject for people, e.g. "pilot bore". */
  label: string;
}

/** The readings of one feature or interface: the table with its unit toggle, the summary, and a form for one more. */
export function SubjectReadings({ workshopId, subject, defaultUnit, defaultQuantity, label }: SubjectReadingsProps) {
  const readings = useQuery(measurementQueries.list(workshopId, subject));
  const removeMeasurement = useRemoveMeasurement(workshopId);
  const [unit, setUnit] = useState<LengthUnit>(defaultUnit);
  const [adding, { toggle, close }] = useDisclosure(false);
  // Site admins (not members) and disabled workshops read the readings; recording or removing one would be refused.
  const readOnly = useWorkshopReadOnly();

  if (readings.isPending) return <Skeleton height={40} />;
  if (readings.isError) return <Alert color="red" title="Readings could not be loaded">{readings.error.message}</Alert>;
  const { measurements, summary } = readings.data;
  // The summary keeps the coarsest instrument's decimals: the mean is no finer than its worst reading.
  const coarsest = Math.max(...measurements.map((measurement) => measurement.instrument.resolutionNm));

  return (
    <Stack gap="xs" aria-label={`Readings of ${label}`} role="region">
      <Group justify="space-between" gap="xs">
        <Text size="sm" fw={500} data-testid="readings-summary">
          {summary === null || measurements.length === 0
            ? `No readings of ${label} yet`
            : `${summary.count} reading${summary.count === 1 ? '' : 's'} · mean ${summary.mean} · spread ${summary.spread}${
                unit !== summary.unit
                  ? ` (mean ${formatLength(summary.meanNm, unit, coarsest)}, spread ${formatLength(summary.spreadNm, unit, coarsest)})`
                  : ''
              }`}
        </Text>
        <Group gap="sm">
          {measurements.length > 0 && <UnitToggle label="Show in" value={unit} options={UNIT_OPTIONS} onChange={setUnit} />}
          {!readOnly && (
            <Button size="xs" variant={adding ? 'default' : 'light'} onClick={toggle}>
              {adding ? 'Close form' : 'Add reading'}
            </Button>
          )}
        </Group>
      </Group>
      {adding && !readOnly && (
        <ReadingForm workshopId={workshopId} subject={subject} defaultUnit={defaultUnit} defaultQuantity={defaultQuantity} onDone={close} />
      )}
      {measurements.length > 0 && (
        <ReadingsTable
          measurements={measurements}
          unit={unit}
          renderActions={
            readOnly
              ? undefined
              : (measurement) => (
            <ConfirmButton
              size="compact-xs"
              variant="subtle"
              color="red"
              question={`Remove the reading ${measurement.shown}?`}
              detail="Checks that used it are evaluated again, and may re-open."
              confirmLabel="Remove reading"
              onConfirm={() =>
                removeMeasurement.mutate(measurement.id, { onError: (error) => notifyError('The reading was not removed', error) })
              }
            >
              Remove
            </ConfirmButton>
          )
          }
        />
      )}
    </Stack>
  );
}
