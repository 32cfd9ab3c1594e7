import { Button, Group, NumberInput, Select, SimpleGrid, Stack, TextInput } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useRef, useState } from 'react';
import { splitApiErrors } from '@/lib/form-errors';
import { unitLabel, type LengthUnit } from '@/lib/units';
import { useAddMeasurement } from '../api/mutations';
import { INSTRUMENT_KINDS, QUANTITIES, type InstrumentKind, type MeasurementSubject, type Quantity } from '../api/queries';
import { INSTRUMENT_LABELS, QUANTITY_LABELS, typicalResolution, UNIT_OPTIONS } from './measurement-labels';
import { FormProblems } from '@/components/form-problems';

const LABELS = {
  value: 'Reading',
  unit: 'Unit',
  quantity: 'Quantity',
  instrumentKind: 'Instrument',
  resolution: 'Resolution',
  calibratedOn: 'Last calibrated',
  instrumentNote: 'Instrument note',
  temperatureC: 'Temperature (°C)',
  note: 'Note',
};

/** Digits line up in a monospace input; the label keeps the app's font. */
const MONO = { input: { fontFamily: 'ui-monospace, monospace' } };

interface ReadingFormValues {
  value: string;
  unit: LengthUnit;
  quantity: Quantity;
  instrumentKind: InstrumentKind;
  resolution: string;
  calibratedOn: string;
  instrumentNote: string;
  temperatureC: number | string;
  note: string;
}

export interface ReadingFormProps {
  workshopId: string;
  subject: MeasurementSubject;
  defaultUnit: LengthUnit;
  defaultQuantity: Quantity;
  /** Called after a reading is saved. */
  onDone?: () => void;
  /** Shows a Cancel button when the form can be put away from inside it. */
  onCancel?: () => void;
}

export function ReadingForm({ workshopId, subject, defaultUnit, defaultQuantity, onDone, onCancel }: ReadingFormProps) {
  const addMeasurement = useAddMeasurement(workshopId, subject);
  const [general, setGeneral] = useState<string[]>([]);
  // The suggested resolution follows instrument and unit until the person types their own.
  const resolutionTouched = useRef(false);
  const defaultInstrument: InstrumentKind = defaultQuantity === 'clearance' ? 'feeler_gauge' : 'outside_micrometer';
  const form = useForm<ReadingFormValues>({
    initialValues: {
      value: '',
      unit: defaultUnit,
      quantity: defaultQuantity,
      instrumentKind: defaultInstrument,
      resolution: typicalResolution(defaultInstrument, defaultUnit),
      calibratedOn: '',
      instrumentNote: '',
      temperatureC: '',
      note: '',
    },
    validate: {
      value: (value) => (/^\s*-?(\d+(\.\d*)?|\.\d+)\s*$/.test(value) ? null : 'Write the reading as a decimal number, e.g. 0.6692'),
      resolution: (value) => (value.trim() ? null : "Give the instrument's smallest step"),
    },
    onValuesChange: (values, previous) => {
      if (resolutionTouched.current) return;
      if (values.instrumentKind !== previous.instrumentKind || values.unit !== previous.unit) {
        form.setFieldValue('resolution', typicalResolution(values.instrumentKind, values.unit));
      }
    },
  });

  const handleSubmit = (values: ReadingFormValues) => {
    setGeneral([]);
    addMeasurement.mutate(
      {
        quantity: values.quantity,
        value: values.value.trim(),
        unit: values.unit,
        instrumentKind: values.instrumentKind,
        resolution: values.resolution.trim(),
        calibratedOn: values.calibratedOn || undefined,
        instrumentNote: values.instrumentNote.trim() || undefined,
        temperatureC: typeof values.temperatureC === 'number' ? values.temperatureC : undefined,
        note: values.note.trim() || undefined,
      },
      {
        onSuccess: () => {
          form.setFieldValue('value', '');
          form.setFieldValue('note', '');
          onDone?.();
        },
        onError: (error) => {
          const split = splitApiErrors(error, LABELS);
          form.setErrors(split.fields);
          setGeneral(split.general);
        },
      },
    );
  };

  const resolutionProps = form.getInputProps('resolution');
  return (
    <form onSubmit={form.onSubmit(handleSubmit)} aria-label="New reading" noValidate>
      <Stack gap="sm">
        <FormProblems messages={general} title="The reading was not saved" />
        <SimpleGrid cols={{ base: 1, xs: 3 }}>
          <TextInput label={LABELS.value} placeholder="0.6692" withAsterisk styles={MONO} {...form.getInputProps('value')} />
          <Select label={LABELS.unit} data={UNIT_OPTIONS} allowDeselect={false} {...form.getInputProps('unit')} />
          <Select
            label={LABELS.quantity}
            allowDeselect={false}
            data={QUANTITIES.map((value) => ({ value, label: QUANTITY_LABELS[value] }))}
            {...form.getInputProps('quantity')}
          />
        </SimpleGrid>
        <SimpleGrid cols={{ base: 1, xs: 3 }}>
          <Select
            label={LABELS.instrumentKind}
            description="what it was read with"
            allowDeselect={false}
            data={INSTRUMENT_KINDS.map((value) => ({ value, label: INSTRUMENT_LABELS[value] }))}
            {...form.getInputProps('instrumentKind')}
          />
          <TextInput
            label={LABELS.resolution}
            description={`smallest step, in ${unitLabel(form.values.unit)}`}
            withAsterisk
            styles={MONO}
            {...resolutionProps}
            onChange={(event) => {
              resolutionTouched.current = true;
              resolutionProps.onChange(event);
            }}
          />
          <TextInput label={LABELS.calibratedOn} type="date" description="optional" {...form.getInputProps('calibratedOn')} />
        </SimpleGrid>
        <SimpleGrid cols={{ base: 1, xs: 3 }}>
          <NumberInput label={LABELS.temperatureC} decimalScale={1} min={-60} max={200} {...form.getInputProps('temperatureC')} />
          <TextInput label={LABELS.instrumentNote} placeholder="0–1 in, ratchet stop" {...form.getInputProps('instrumentNote')} />
          <TextInput label={LABELS.note} placeholder="at the seal land" {...form.getInputProps('note')} />
        </SimpleGrid>
        <Group justify="flex-end">
          {onCancel && (
            <Button variant="default" onClick={onCancel}>
              Cancel
            </Button>
          )}
          <Button type="submit" loading={addMeasurement.isPending}>
            Save reading
          </Button>
        </Group>
      </Stack>
    </form>
  );
}
