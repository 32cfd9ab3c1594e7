import { Button, Group, Input, NumberInput, SegmentedControl, Select, SimpleGrid, Stack, Text, TextInput } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { splitApiErrors } from '@/lib/form-errors';
import { LENGTH_UNITS, unitLabel, type LengthUnit } from '@/lib/units';
import type { FeatureInput } from '../api/mutations';
import {
  FEATURE_KINDS,
  SPLINE_CLASSES,
  SPLINE_FITS,
  SPLINE_PRESSURE_ANGLES,
  type FeatureKind,
  type PartFeature,
  type SplineClass,
  type SplineFit,
  type SplinePressureAngle,
} from '../api/queries';
import { FEATURE_KIND_LABELS } from './part-labels';
import { SplineIdentifyOffer } from './spline-identify-offer';
import { FormProblems } from '@/components/form-problems';

const LABELS = {
  name: 'Name',
  kind: 'Kind',
  unit: 'Unit',
  teeth: 'Teeth',
  gender: 'Internal or external',
  diametralPitch: 'Diametral pitch',
  stubPitch: 'Stub pitch',
  module: 'Module',
  pressureAngle: 'Pressure angle',
  splineFit: 'Fit',
  splineClass: 'Tolerance class',
  majorDiameter: 'Major diameter',
  role: 'Hole or shaft',
  nominal: 'Nominal size',
  toleranceClass: 'ISO 286 class',
  max: 'Largest size',
  min: 'Smallest size',
  length: 'Overall length',
  compressed: 'Fully compressed',
  extended: 'Fully extended',
  value: 'Value',
  freeUnit: 'Unit of the value',
};

type PitchSystem = 'diametral' | 'module' | 'unknown';
/** Segmented controls hold strings; "unknown" stands for a spline attribute nobody has read off a drawing yet. */
type Known<T extends string | number> = `${T}` | 'unknown';
type ToleranceMode = 'class' | 'limits' | 'none';

export interface FeatureFormValues {
  name: string;
  kind: FeatureKind;
  unit: LengthUnit;
  teeth: number | string;
  gender: 'internal' | 'external';
  pitchSystem: PitchSystem;
  diametralPitch: number | string;
  stubPitch: number | string;
  module: number | string;
  pressureAngle: Known<SplinePressureAngle>;
  splineFit: Known<SplineFit>;
  splineClass: Known<SplineClass>;
  majorDiameter: string;
  role: 'hole' | 'shaft';
  nominal: string;
  toleranceMode: ToleranceMode;
  toleranceClass: string;
  max: string;
  min: string;
  length: string;
  compressed: string;
  extended: string;
  value: string;
  freeUnit: string;
}

const UNIT_OPTIONS = LENGTH_UNITS.map((unit) => ({
  value: unit,
  label: unit === 'thou' ? 'thou (0.001 in)' : unit === 'tenths' ? 'tenths (0.0001 in)' : unitLabel(unit),
}));

function initialValues(feature?: PartFeature): FeatureFormValues {
  const values: FeatureFormValues = {
    name: feature?.name ?? '',
    kind: feature?.kind ?? 'spline',
    unit: feature?.unit ?? 'mm',
    teeth: '',
    gender: 'external',
    pitchSystem: 'unknown',
    diametralPitch: '',
    stubPitch: '',
    module: '',
    pressureAngle: 'unknown',
    splineFit: 'unknown',
    splineClass: 'unknown',
    majorDiameter: feature?.shown.majorDiameter ?? '',
    role: 'hole',
    nominal: feature?.shown.nominal ?? '',
    toleranceMode: 'class',
    toleranceClass: '',
    max: feature?.shown.max ?? '',
    min: feature?.shown.min ?? '',
    length: feature?.shown.length ?? '',
    compressed: feature?.shown.compressed ?? '',
    extended: feature?.shown.extended ?? '',
    value: '',
    freeUnit: '',
  };
  if (!feature) return values;
  switch (feature.kind) {
    case 'spline':
      values.teeth = feature.spec.teeth;
      values.gender = feature.spec.gender;
      values.pitchSystem = feature.spec.diametralPitch !== undefined ? 'diametral' : feature.spec.module !== undefined ? 'module' : 'unknown';
      values.diametralPitch = feature.spec.diametralPitch ?? '';
      values.stubPitch = feature.spec.stubPitch ?? '';
      values.module = feature.spec.module ?? '';
      values.pressureAngle = feature.spec.pressureAngle !== undefined ? `${feature.spec.pressureAngle}` : 'unknown';
      values.splineFit = feature.spec.fit ?? 'unknown';
      values.splineClass = feature.spec.toleranceClass !== undefined ? `${feature.spec.toleranceClass}` : 'unknown';
      break;
    case 'diameter':
      values.role = feature.spec.role;
      values.toleranceMode = feature.spec.toleranceClass ? 'class' : feature.spec.maxNm !== undefined ? 'limits' : 'none';
      values.toleranceClass = feature.spec.toleranceClass ?? '';
      break;
    case 'free':
      values.value = feature.spec.value;
      values.freeUnit = feature.spec.unit ?? '';
      break;
    case 'length':
      break;
  }
  return values;
}

const text = (value: string) => (value.trim() === '' ? undefined : value.trim());
const number = (value: number | string) => (value === '' ? undefined : Number(value));
/** The typed choice back from its control's string, or undefined when not known. */
const chosen = <T extends string | number>(choices: readonly T[], value: Known<T>): T | undefined =>
  choices.find((choice) => `${choice}` === value);

/**
 * The request body for the kind chosen. On an update every optional field of the kind is sent,
 * null when empty, so switching (module instead of diametral pitch, limits instead of a class)
 * clears what no longer applies.
 */
export function toFeatureInput(values: FeatureFormValues, editing: boolean): FeatureInput {
  const cleared = <T,>(value: T | undefined): T | null | undefined => (value === undefined && editing ? null : value);
  const base = { name: values.name.trim(), kind: values.kind };
  switch (values.kind) {
    case 'spline': {
      const diametral = values.pitchSystem === 'diametral';
      const metric = values.pitchSystem === 'module';
      return {
        ...base,
        unit: values.unit,
        teeth: number(values.teeth),
        gender: values.gender,
        diametralPitch: cleared(diametral ? number(values.diametralPitch) : undefined),
        stubPitch: cleared(diametral ? number(values.stubPitch) : undefined),
        module: cleared(metric ? number(values.module) : undefined),
        pressureAngle: cleared(chosen(SPLINE_PRESSURE_ANGLES, values.pressureAngle)),
        splineFit: cleared(chosen(SPLINE_FITS, values.splineFit)),
        splineClass: cleared(chosen(SPLINE_CLASSES, values.splineClass)),
        majorDiameter: cleared(text(values.majorDiameter)),
      };
    }
    case 'diameter':
      return {
        ...base,
        unit: values.unit,
        role: values.role,
        nominal: values.nominal.trim(),
        toleranceClass: cleared(values.toleranceMode === 'class' ? text(values.toleranceClass) : undefined),
        max: cleared(values.toleranceMode === 'limits' ? text(values.max) : undefined),
        min: cleared(values.toleranceMode === 'limits' ? text(values.min) : undefined),
      };
    case 'length':
      return {
        ...base,
        unit: values.unit,
        length: values.length.trim(),
        compressed: cleared(text(values.compressed)),
        extended: cleared(text(values.extended)),
      };
    case 'free':
      return { ...base, value: values.value.trim(), freeUnit: cleared(text(values.freeUnit)) };
  }
}

export interface FeatureFormProps {
  feature?: PartFeature;
  pending: boolean;
  onSubmit: (input: FeatureInput, callbacks: { onError: (error: unknown) => void }) => void;
  onCancel?: () => void;
}

/** Add or edit one typed attribute of a part; the fields follow the kind. */
export function FeatureForm({ feature, pending, onSubmit, onCancel }: FeatureFormProps) {
  const editing = feature !== undefined;
  const [general, setGeneral] = useState<string[]>([]);
  const form = useForm<FeatureFormValues>({
    initialValues: initialValues(feature),
    validate: {
      name: (value) => (value.trim() ? null : 'Name the feature, e.g. "input spline" or "pilot bore"'),
    },
  });
  const values = form.values;
  const kind = values.kind;

  const handleSubmit = (submitted: FeatureFormValues) => {
    setGeneral([]);
    onSubmit(toFeatureInput(submitted, editing), {
      onError: (error) => {
        const split = splitApiErrors(error, LABELS);
        form.setErrors(split.fields);
        setGeneral(split.general);
      },
    });
  };

  const unitSelect = (
    <Select
      label="Unit of the lengths"
      data={UNIT_OPTIONS}
      allowDeselect={false}
      {...form.getInputProps('unit')}
      error={form.errors.unit}
    />
  );

  return (
    <form onSubmit={form.onSubmit(handleSubmit)} aria-label={editing ? 'Edit feature' : 'New feature'} noValidate>
      <Stack gap="sm">
        <FormProblems messages={general} title="The feature was not saved" />
        <TextInput label={LABELS.name} placeholder="input spline" withAsterisk {...form.getInputProps('name')} />
        {editing ? (
          <Text size="sm">
            Kind: <strong>{FEATURE_KIND_LABELS[kind]}</strong>
          </Text>
        ) : (
          <Input.Wrapper label={LABELS.kind}>
            <SegmentedControl
              fullWidth
              data={FEATURE_KINDS.map((value) => ({ value, label: FEATURE_KIND_LABELS[value] }))}
              {...form.getInputProps('kind')}
            />
          </Input.Wrapper>
        )}

        {kind === 'spline' && (
          <>
            <SimpleGrid cols={{ base: 1, sm: 2 }}>
              <NumberInput label={LABELS.teeth} min={4} max={200} allowDecimal={false} withAsterisk {...form.getInputProps('teeth')} />
              <Input.Wrapper label={LABELS.gender} error={form.errors.gender}>
                <SegmentedControl
                  fullWidth
                  data={[
                    { value: 'external', label: 'External (shaft)' },
                    { value: 'internal', label: 'Internal (hub)' },
                  ]}
                  {...form.getInputProps('gender')}
                />
              </Input.Wrapper>
            </SimpleGrid>
            <Input.Wrapper label="Pitch" description="Diametral pitch (ANSI B92.1, e.g. 16/32) or module (ISO 4156)">
              <SegmentedControl
                fullWidth
                data={[
                  { value: 'diametral', label: 'Diametral pitch' },
                  { value: 'module', label: 'Module' },
                  { value: 'unknown', label: 'Not known' },
                ]}
                {...form.getInputProps('pitchSystem')}
              />
            </Input.Wrapper>
            {values.pitchSystem === 'diametral' && (
              <SimpleGrid cols={2}>
                <NumberInput label={LABELS.diametralPitch} description="the 16 of 16/32" min={0} {...form.getInputProps('diametralPitch')} />
                <NumberInput label={LABELS.stubPitch} description="the 32 of 16/32" min={0} {...form.getInputProps('stubPitch')} />
              </SimpleGrid>
            )}
            {values.pitchSystem === 'module' && (
              <NumberInput label={LABELS.module} description="millimetres" min={0} decimalScale={4} {...form.getInputProps('module')} />
            )}
            <Input.Wrapper label={LABELS.pressureAngle} description="Degrees, as the drawing or catalogue gives it" error={form.errors.pressureAngle}>
              <SegmentedControl
                fullWidth
                data={[
                  ...SPLINE_PRESSURE_ANGLES.map((angle) => ({ value: `${angle}`, label: `${angle}°` })),
                  { value: 'unknown', label: 'Not known' },
                ]}
                aria-label={LABELS.pressureAngle}
                {...form.getInputProps('pressureAngle')}
              />
            </Input.Wrapper>
            <SimpleGrid cols={{ base: 1, sm: 2 }}>
              <Input.Wrapper label={LABELS.splineFit} description="Which surfaces locate the mating parts" error={form.errors.splineFit}>
                <SegmentedControl
                  fullWidth
                  data={[
                    { value: 'side', label: 'Side fit' },
                    { value: 'major', label: 'Major diameter' },
                    { value: 'unknown', label: 'Not known' },
                  ]}
                  aria-label={LABELS.splineFit}
                  {...form.getInputProps('splineFit')}
                />
              </Input.Wrapper>
              <Input.Wrapper label={LABELS.splineClass} description="ANSI B92.1 / ISO 4156 class" error={form.errors.splineClass}>
                <SegmentedControl
                  fullWidth
                  data={[
                    ...SPLINE_CLASSES.map((value) => ({ value: `${value}`, label: `${value}` })),
                    { value: 'unknown', label: 'Not known' },
                  ]}
                  aria-label={LABELS.splineClass}
                  {...form.getInputProps('splineClass')}
                />
              </Input.Wrapper>
            </SimpleGrid>
            <SimpleGrid cols={{ base: 1, sm: 2 }}>
              <TextInput label={LABELS.majorDiameter} placeholder="optional" {...form.getInputProps('majorDiameter')} />
              {unitSelect}
            </SimpleGrid>
            <SplineIdentifyOffer
              teeth={values.teeth}
              gender={values.gender}
              majorDiameter={values.majorDiameter}
              unit={values.unit}
              onUse={(pitch) =>
                form.setValues(
                  pitch.system === 'diametral'
                    ? { pitchSystem: 'diametral', diametralPitch: pitch.diametralPitch, stubPitch: pitch.stubPitch }
                    : { pitchSystem: 'module', module: pitch.module },
                )
              }
            />
          </>
        )}

        {kind === 'diameter' && (
          <>
            <SimpleGrid cols={{ base: 1, sm: 2 }}>
              <Input.Wrapper label={LABELS.role} error={form.errors.role}>
                <SegmentedControl
                  fullWidth
                  data={[
                    { value: 'hole', label: 'Hole (bore)' },
                    { value: 'shaft', label: 'Shaft' },
                  ]}
                  {...form.getInputProps('role')}
                />
              </Input.Wrapper>
              {unitSelect}
            </SimpleGrid>
            <TextInput label={LABELS.nominal} placeholder="15" withAsterisk {...form.getInputProps('nominal')} />
            <Input.Wrapper label="Tolerance">
              <SegmentedControl
                fullWidth
                data={[
                  { value: 'class', label: 'ISO 286 class' },
                  { value: 'limits', label: 'Largest and smallest' },
                  { value: 'none', label: 'Not given' },
                ]}
                {...form.getInputProps('toleranceMode')}
              />
            </Input.Wrapper>
            {values.toleranceMode === 'class' && (
              <TextInput
                label={LABELS.toleranceClass}
                description={values.role === 'hole' ? 'capitals for a hole, e.g. H7' : 'lower case for a shaft, e.g. g6'}
                placeholder={values.role === 'hole' ? 'H7' : 'g6'}
                {...form.getInputProps('toleranceClass')}
              />
            )}
            {values.toleranceMode === 'limits' && (
              <SimpleGrid cols={2}>
                <TextInput label={LABELS.max} placeholder="15.018" {...form.getInputProps('max')} />
                <TextInput label={LABELS.min} placeholder="15.000" {...form.getInputProps('min')} />
              </SimpleGrid>
            )}
          </>
        )}

        {kind === 'length' && (
          <>
            <SimpleGrid cols={{ base: 1, sm: 2 }}>
              <TextInput label={LABELS.length} placeholder="540" withAsterisk {...form.getInputProps('length')} />
              {unitSelect}
            </SimpleGrid>
            <SimpleGrid cols={2}>
              <TextInput label={LABELS.compressed} description="plunging parts only" placeholder="520" {...form.getInputProps('compressed')} />
              <TextInput label={LABELS.extended} description="plunging parts only" placeholder="565" {...form.getInputProps('extended')} />
            </SimpleGrid>
          </>
        )}

        {kind === 'free' && (
          <SimpleGrid cols={{ base: 1, sm: 2 }}>
            <TextInput label={LABELS.value} placeholder="M10 × 1.25" withAsterisk {...form.getInputProps('value')} />
            <TextInput label={LABELS.freeUnit} placeholder="N·m" {...form.getInputProps('freeUnit')} />
          </SimpleGrid>
        )}

        <Group justify="flex-end">
          {onCancel && (
            <Button variant="default" onClick={onCancel}>
              Cancel
            </Button>
          )}
          <Button type="submit" loading={pending}>
            {editing ? 'Save feature' : 'Add feature'}
          </Button>
        </Group>
      </Stack>
    </form>
  );
}
