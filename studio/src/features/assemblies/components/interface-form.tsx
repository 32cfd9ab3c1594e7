import { Button, Group, Input, SegmentedControl, Select, SimpleGrid, Stack, Text, TextInput } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { splitApiErrors } from '@/lib/form-errors';
import { LENGTH_UNITS, unitLabel, type LengthUnit } from '@/lib/units';
import { useAddInterface } from '../api/mutations';
import { INTERFACE_KINDS, type AssemblyDetail, type InterfaceKind } from '../api/queries';
import { INTERFACE_KIND_LABELS, interfaceChoices } from './interface-choices';
import { FormProblems } from '@/components/form-problems';

const LABELS = {
  kind: 'Kind',
  name: 'Name',
  featureAId: 'First feature',
  featureBId: 'Mating feature',
  unit: 'Unit',
  installedMin: 'Shortest installed length',
  installedMax: 'Longest installed length',
  margin: 'Margin',
};

interface InterfaceFormValues {
  kind: InterfaceKind;
  name: string;
  featureAId: string | null;
  featureBId: string | null;
  unit: LengthUnit;
  installedMin: string;
  installedMax: string;
  margin: string;
}

function unitOfFeature(assembly: AssemblyDetail, featureId: string | null): LengthUnit | null {
  for (const { part } of assembly.parts) {
    const feature = part.features.find((candidate) => candidate.id === featureId);
    if (feature) return feature.unit;
  }
  return null;
}

export function InterfaceForm({
  workshopId,
  assembly,
  onDone,
}: {
  workshopId: string;
  assembly: AssemblyDetail;
  onDone: () => void;
}) {
  const addInterface = useAddInterface(workshopId, assembly.id);
  const [general, setGeneral] = useState<string[]>([]);
  const form = useForm<InterfaceFormValues>({
    initialValues: { kind: 'spline', name: '', featureAId: null, featureBId: null, unit: 'mm', installedMin: '', installedMax: '', margin: '' },
    validate: {
      name: (value) => (value.trim() ? null : 'Name the interface, e.g. "coupler to gearbox input"'),
      featureAId: (value) => (value ? null : 'Pick a feature'),
      featureBId: (value, values) => (values.kind === 'length_window' || value ? null : 'Pick the feature it mates with'),
      installedMin: (value, values) => (values.kind !== 'length_window' || value.trim() ? null : 'Give the shortest installed length'),
      installedMax: (value, values) => (values.kind !== 'length_window' || value.trim() ? null : 'Give the longest installed length'),
    },
    onValuesChange: (values, previous) => {
      // A new kind or a new first side invalidates the choices made after it.
      if (values.kind !== previous.kind) {
        form.setValues({ featureAId: null, featureBId: null });
      } else if (values.featureAId !== previous.featureAId) {
        form.setFieldValue('featureBId', null);
        // Window and margin are usually written in the unit the part is specified in.
        const unit = unitOfFeature(assembly, values.featureAId);
        if (unit) form.setFieldValue('unit', unit);
      }
    },
  });
  const values = form.values;
  const choices = interfaceChoices(values.kind, assembly.parts, values.featureAId);

  const handleSubmit = (submitted: InterfaceFormValues) => {
    setGeneral([]);
    const lengths = submitted.kind === 'length_window';
    addInterface.mutate(
      {
        kind: submitted.kind,
        name: submitted.name.trim(),
        featureAId: submitted.featureAId!,
        featureBId: lengths ? undefined : submitted.featureBId!,
        unit: submitted.unit,
        installedMin: lengths ? submitted.installedMin.trim() : undefined,
        installedMax: lengths ? submitted.installedMax.trim() : undefined,
        margin: submitted.margin.trim() || undefined,
      },
      {
        onSuccess: () => {
          form.reset();
          onDone();
        },
        onError: (error) => {
          const split = splitApiErrors(error, LABELS);
          form.setErrors(split.fields);
          setGeneral(split.general);
        },
      },
    );
  };

  const noFeatures = choices.first.length === 0;
  return (
    <form onSubmit={form.onSubmit(handleSubmit)} aria-label="New interface" noValidate>
      <Stack gap="sm">
        <FormProblems messages={general} title="The interface was not saved" />
        <Input.Wrapper label="Where the parts mate">
          <SegmentedControl
            fullWidth
            data={INTERFACE_KINDS.map((kind) => ({ value: kind, label: INTERFACE_KIND_LABELS[kind] }))}
            {...form.getInputProps('kind')}
          />
        </Input.Wrapper>
        <TextInput label={LABELS.name} placeholder="coupler to gearbox input" withAsterisk {...form.getInputProps('name')} />
        {noFeatures ? (
          <Text c="dimmed" size="sm">
            No placed part has a {values.kind === 'spline' ? 'spline' : values.kind === 'bore_shaft' ? 'diameter' : 'length'} feature.
            Place the parts first, and give them their features on their part pages.
          </Text>
        ) : (
          <SimpleGrid cols={{ base: 1, sm: values.kind === 'length_window' ? 1 : 2 }}>
            <Select
              label={values.kind === 'length_window' ? 'Length feature' : LABELS.featureAId}
              placeholder="Pick a feature"
              data={choices.first}
              searchable
              withAsterisk
              {...form.getInputProps('featureAId')}
            />
            {values.kind !== 'length_window' && (
              <Select
                label={LABELS.featureBId}
                placeholder={values.featureAId ? 'Pick its partner' : 'Pick the first feature first'}
                description={values.kind === 'spline' ? 'splines of the other gender' : 'diameters of the other role'}
                data={choices.second}
                disabled={!values.featureAId}
                searchable
                withAsterisk
                nothingFoundMessage="No placed part has a feature that can mate with it"
                {...form.getInputProps('featureBId')}
              />
            )}
          </SimpleGrid>
        )}
        {values.kind !== 'spline' && (
          <SimpleGrid cols={{ base: 1, sm: values.kind === 'length_window' ? 4 : 2 }}>
            <Select
              label={LABELS.unit}
              data={LENGTH_UNITS.map((unit) => ({ value: unit, label: unitLabel(unit) }))}
              allowDeselect={false}
              {...form.getInputProps('unit')}
            />
            {values.kind === 'length_window' && (
              <>
                <TextInput label={LABELS.installedMin} placeholder="530" withAsterisk {...form.getInputProps('installedMin')} />
                <TextInput label={LABELS.installedMax} placeholder="555" withAsterisk {...form.getInputProps('installedMax')} />
              </>
            )}
            <TextInput
              label={values.kind === 'length_window' ? 'Travel to keep each way' : 'Least clearance you accept'}
              placeholder={values.kind === 'length_window' ? '5' : '0.01'}
              description="optional"
              {...form.getInputProps('margin')}
            />
          </SimpleGrid>
        )}
        <Group justify="flex-end">
          <Button variant="default" onClick={onDone}>
            Cancel
          </Button>
          <Button type="submit" loading={addInterface.isPending} disabled={noFeatures}>
            Add interface
          </Button>
        </Group>
      </Stack>
    </form>
  );
}
