import { Select, SimpleGrid, Stack, Text, TextInput } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import type { LengthUnit } from '@/lib/units';
import { markQueries } from '../api/queries';
import { formatClock } from '@/lib/clock';
import { buildFirst, subjectChoices } from './link-labels';
import { INSTRUMENT_CHOICES, QUANTITY_CHOICES, stepOfDigits, UNIT_CHOICES } from './reading-choices';

/** A reading being recorded from the mark form; `subject` is "feature:<id>" or "interface:<id>". */
export interface NewReading {
  subject: string | null;
  quantity: string;
  value: string;
  unit: LengthUnit;
  instrumentKind: string;
  /** Empty: one step of the value's last digit (shown as the placeholder). */
  resolution: string;
}

/** A measurement heard at the pinned moment (a pending suggestion from the transcript). */
export interface SpokenReading {
  suggestionId: string;
  phrase: string;
  value: string;
  unit: LengthUnit;
}

export const emptyReading = (spoken?: SpokenReading | null): NewReading => ({
  subject: null,
  quantity: 'other',
  value: spoken?.value ?? '',
  unit: spoken?.unit ?? 'mm',
  instrumentKind: 'other',
  resolution: '',
});

/** The resolution sent: the one typed, else one step of the value's last digit. */
export const resolutionOf = (reading: NewReading): string => reading.resolution.trim() || stepOfDigits(reading.value) || '';

export const READING_LABELS = {
  subject: 'Measured',
  quantity: 'Quantity',
  value: 'Reading',
  unit: 'Unit',
  instrumentKind: 'Instrument',
  resolution: 'Resolution',
} as const;

export type ReadingErrors = Partial<Record<keyof typeof READING_LABELS | 'featureId' | 'interfaceId', string>>;

export interface NewReadingFieldsProps {
  workshopId: string;
  footageId: string;
  atMs: number;
  reading: NewReading;
  spoken: SpokenReading | null;
  errors: ReadingErrors;
  onChange: (reading: NewReading) => void;
}

/** Subject, quantity, value and unit, instrument: the reading is linked to the footage at the mark's time. */
export function NewReadingFields({ workshopId, footageId, atMs, reading, spoken, errors, onChange }: NewReadingFieldsProps) {
  const parts = useQuery(markQueries.parts(workshopId));
  const assemblies = useQuery(markQueries.assemblies(workshopId));
  const footage = useQuery(markQueries.footage(workshopId, footageId));
  const loading = parts.isPending || assemblies.isPending;
  const choices = subjectChoices(parts.data ?? [], buildFirst(assemblies.data ?? [], footage.data?.buildId));
  const set = (change: Partial<NewReading>) => onChange({ ...reading, ...change });

  const handleSubjectChange = (subject: string | null) => {
    // A clearance is read across an interface; a feature's reading is usually its own kind of size.
    const featureKind = parts.data?.flatMap((part) => part.features).find((feature) => `feature:${feature.id}` === subject)?.kind;
    const quantity = subject?.startsWith('interface:')
      ? 'clearance'
      : featureKind === 'diameter' || featureKind === 'length'
        ? featureKind
        : reading.quantity;
    set({ subject, quantity });
  };

  return (
    <Stack gap="sm" data-testid="new-reading">
      {spoken && (
        <Text size="xs" c="dimmed">
          Heard here: “{spoken.phrase}”. Saving records it and settles that suggestion.
        </Text>
      )}
      <Select
        label={READING_LABELS.subject}
        description="a part feature, or an interface where two parts mate"
        placeholder={loading ? 'Loading parts and interfaces…' : 'Choose what was measured'}
        searchable
        withAsterisk
        data={choices}
        value={reading.subject}
        onChange={handleSubjectChange}
        error={errors.subject ?? errors.featureId ?? errors.interfaceId}
        nothingFoundMessage="No part features or interfaces yet: add them on the part's or assembly's page"
      />
      <SimpleGrid cols={3}>
        <TextInput
          label={READING_LABELS.value}
          placeholder="0.015"
          withAsterisk
          value={reading.value}
          onChange={(event) => set({ value: event.currentTarget.value })}
          error={errors.value}
          styles={{ input: { fontFamily: 'ui-monospace, monospace' } }}
        />
        <Select
          label={READING_LABELS.unit}
          data={UNIT_CHOICES}
          allowDeselect={false}
          value={reading.unit}
          onChange={(unit) => unit && set({ unit: unit as LengthUnit })}
          error={errors.unit}
        />
        <Select
          label={READING_LABELS.quantity}
          data={QUANTITY_CHOICES}
          allowDeselect={false}
          value={reading.quantity}
          onChange={(quantity) => quantity && set({ quantity })}
          error={errors.quantity}
        />
      </SimpleGrid>
      <SimpleGrid cols={2}>
        <Select
          label={READING_LABELS.instrumentKind}
          data={INSTRUMENT_CHOICES}
          allowDeselect={false}
          value={reading.instrumentKind}
          onChange={(instrumentKind) => instrumentKind && set({ instrumentKind })}
          error={errors.instrumentKind}
        />
        <TextInput
          label={READING_LABELS.resolution}
          description="the instrument's smallest step"
          placeholder={stepOfDigits(reading.value) ?? '0.001'}
          value={reading.resolution}
          onChange={(event) => set({ resolution: event.currentTarget.value })}
          error={errors.resolution}
          styles={{ input: { fontFamily: 'ui-monospace, monospace' } }}
        />
      </SimpleGrid>
      <Text size="xs" c="dimmed">
        The reading is linked to this footage at {formatClock(atMs, { tenths: true })}.
      </Text>
    </Stack>
  );
}
