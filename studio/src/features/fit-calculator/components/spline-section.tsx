import { Autocomplete, Button, Group, Input, List, Paper, SegmentedControl, SimpleGrid, Stack, Table, Text, TextInput, Title } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { formatSplineDiameter, SplineDiametersDiagram } from '@/components/diagrams/spline-diameters-diagram';
import { splitApiErrors } from '@/lib/form-errors';
import { fitCalculatorQueries, type SplineDimensionName, type SplineLength, type SplineQuery } from '../api/queries';
import { FormProblems } from '@/components/form-problems';

const LABELS = { teeth: 'Teeth', pitch: 'Pitch', pressureAngle: 'Pressure angle', root: 'Root', fit: 'Fit' };
const COMMON_PITCHES = ['12/24', '16/32', '20/40', '24/48', '10/20', '8/16', 'm1', 'm1.25', 'm1.5', 'm2', 'm2.5'];
const ROWS: readonly { name: SplineDimensionName; label: string }[] = [
  { name: 'pitchDiameter', label: 'Pitch diameter' },
  { name: 'baseDiameter', label: 'Base diameter' },
  { name: 'circularPitch', label: 'Circular pitch' },
  { name: 'basicSpaceWidth', label: 'Basic space width (hub)' },
  { name: 'basicToothThickness', label: 'Basic tooth thickness (shaft)' },
  { name: 'internalMajorDiameter', label: 'Internal major diameter (hub)' },
  { name: 'externalMajorDiameter', label: 'External major diameter (shaft)' },
  { name: 'internalMinorDiameter', label: 'Internal minor diameter (hub)' },
  { name: 'externalMinorDiameter', label: 'External minor diameter (shaft)' },
  { name: 'internalFormDiameter', label: 'Internal form diameter' },
  { name: 'externalFormDiameter', label: 'External form diameter' },
  { name: 'formClearance', label: 'Form clearance (radial)' },
];

function show(length: Pick<SplineLength, 'value' | 'unit'>): string {
  return `${formatSplineDiameter(length.value, length.unit)} ${length.unit}`;
}

/**
 * Basic dimensions of an involute spline by ANSI B92.1 (inch) or ISO 4156 / ANSI B92.2M (metric),
 * computed by the API; the studio only lays them out and draws them.
 */
export function SplineSection() {
  const [values, setValues] = useState<SplineQuery>({ teeth: '21', pitch: '16/32', pressureAngle: '30', root: 'flat', fit: 'side' });
  const [asked, setAsked] = useState<SplineQuery | null>(null);
  const [localErrors, setLocalErrors] = useState<Partial<Record<keyof SplineQuery, string>>>({});
  const answer = useQuery({ ...fitCalculatorQueries.splineDimensions(asked ?? values), enabled: asked !== null });
  const apiErrors = answer.isError ? splitApiErrors(answer.error, LABELS) : { fields: {}, general: [] };
  const errorOf = (field: keyof SplineQuery) => localErrors[field] ?? (apiErrors.fields as Partial<Record<string, string>>)[field];

  const change = <K extends keyof SplineQuery>(field: K, value: SplineQuery[K]) => {
    setValues((current) => {
      const next = { ...current, [field]: value };
      // 37.5° and 45° splines have fillet roots only, and only the 30° flat root has a major-diameter fit.
      if (field === 'pressureAngle' && value !== '30') return { ...next, root: 'fillet', fit: 'side' };
      if (field === 'root' && value === 'fillet') return { ...next, fit: 'side' };
      return next;
    });
    setLocalErrors((current) => ({ ...current, [field]: undefined }));
  };

  const handleSubmit = () => {
    const errors: Partial<Record<keyof SplineQuery, string>> = {};
    if (!/^\s*\d+\s*$/.test(values.teeth)) errors.teeth = 'Count the teeth: a whole number such as 21';
    if (!values.pitch.trim()) errors.pitch = 'Write the pitch as on the drawing: 16/32, 20 DP or m1.25';
    setLocalErrors(errors);
    if (Object.keys(errors).length > 0) return;
    setAsked({ ...values, teeth: values.teeth.trim(), pitch: values.pitch.trim() });
  };

  const data = answer.data;
  return (
    <Stack gap="sm" data-testid="spline-section">
      <div>
        <Title order={2}>Spline dimensions</Title>
        <Text c="dimmed">
          Basic dimensions of an involute spline by ANSI B92.1 (inch, diametral pitch such as 16/32) or ISO 4156 / ANSI B92.2M (metric
          module such as m1.25), in the standard&apos;s own unit with the exact conversion (1 in = 25.4 mm).
        </Text>
      </div>
      <Paper withBorder p="md">
        <form
          aria-label="Spline dimensions"
          noValidate
          onSubmit={(event) => {
            event.preventDefault();
            handleSubmit();
          }}
        >
          <Stack gap="sm">
            <SimpleGrid cols={{ base: 1, xs: 2, md: 3 }}>
              <TextInput label={LABELS.teeth} value={values.teeth} inputMode="numeric" error={errorOf('teeth')} onChange={(event) => change('teeth', event.currentTarget.value)} />
              <Autocomplete label={LABELS.pitch} data={COMMON_PITCHES} value={values.pitch} error={errorOf('pitch')} onChange={(value) => change('pitch', value)} />
              <Input.Wrapper label={LABELS.pressureAngle} labelProps={{ id: 'spline-angle-label' }} error={errorOf('pressureAngle')}>
                <SegmentedControl
                  aria-labelledby="spline-angle-label"
                  fullWidth
                  data={[
                    { value: '30', label: '30°' },
                    { value: '37.5', label: '37.5°' },
                    { value: '45', label: '45°' },
                  ]}
                  value={values.pressureAngle}
                  onChange={(value) => change('pressureAngle', value as SplineQuery['pressureAngle'])}
                />
              </Input.Wrapper>
              <Input.Wrapper label={LABELS.root} labelProps={{ id: 'spline-root-label' }} error={errorOf('root')}>
                <SegmentedControl
                  aria-labelledby="spline-root-label"
                  fullWidth
                  data={[
                    { value: 'flat', label: 'Flat root', disabled: values.pressureAngle !== '30' },
                    { value: 'fillet', label: 'Fillet root' },
                  ]}
                  value={values.root}
                  onChange={(value) => change('root', value as SplineQuery['root'])}
                />
              </Input.Wrapper>
              <Input.Wrapper label={LABELS.fit} labelProps={{ id: 'spline-fit-label' }} error={errorOf('fit')}>
                <SegmentedControl
                  aria-labelledby="spline-fit-label"
                  fullWidth
                  data={[
                    { value: 'side', label: 'Side fit' },
                    { value: 'major', label: 'Major-diameter fit', disabled: values.root !== 'flat' },
                  ]}
                  value={values.fit}
                  onChange={(value) => change('fit', value as SplineQuery['fit'])}
                />
              </Input.Wrapper>
            </SimpleGrid>
            <Group justify="flex-end">
              <Button type="submit" loading={answer.isFetching}>
                Show dimensions
              </Button>
            </Group>
          </Stack>
        </form>
      </Paper>

      <FormProblems messages={apiErrors.general} title="No dimensions for this spline" />
      {data && (
        <Paper withBorder p="md" data-testid="spline-result">
          <Stack gap="xs">
            <Title order={3}>{data.designation}</Title>
            <Table.ScrollContainer minWidth={420}>
              <Table withTableBorder aria-label="Spline basic dimensions">
                <Table.Thead>
                  <Table.Tr>
                    <Table.Th />
                    <Table.Th>{data.standard}</Table.Th>
                    <Table.Th>Converted</Table.Th>
                  </Table.Tr>
                </Table.Thead>
                <Table.Tbody>
                  {ROWS.map((row) => (
                    <Table.Tr key={row.name}>
                      <Table.Th>{row.label}</Table.Th>
                      <Table.Td ff="monospace">{show(data.dimensions[row.name])}</Table.Td>
                      <Table.Td ff="monospace" c="dimmed">
                        {show(data.dimensions[row.name].converted)}
                      </Table.Td>
                    </Table.Tr>
                  ))}
                </Table.Tbody>
              </Table>
            </Table.ScrollContainer>
            <SplineDiametersDiagram
              designation={data.designation}
              unit={data.unit}
              diameters={{
                internalMajorDiameter: data.dimensions.internalMajorDiameter.value,
                externalMajorDiameter: data.dimensions.externalMajorDiameter.value,
                pitchDiameter: data.dimensions.pitchDiameter.value,
                internalMinorDiameter: data.dimensions.internalMinorDiameter.value,
                externalMinorDiameter: data.dimensions.externalMinorDiameter.value,
                baseDiameter: data.dimensions.baseDiameter.value,
              }}
            />
            <List size="sm" c="dimmed">
              {data.notes.map((note) => (
                <List.Item key={note}>{note}</List.Item>
              ))}
            </List>
          </Stack>
        </Paper>
      )}
    </Stack>
  );
}
