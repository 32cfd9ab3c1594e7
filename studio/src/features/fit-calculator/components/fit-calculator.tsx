import { Autocomplete, Button, Checkbox, Chip, Group, Input, Paper, SegmentedControl, SimpleGrid, Stack, Table, Text, TextInput, Title } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import { ToleranceZoneDiagram } from '@/components/diagrams/tolerance-zone-diagram';
import type { DeviationUnit } from '@/components/diagrams/tolerance-zone-geometry';
import { UnitToggle } from '@/components/unit-toggle';
import { splitApiErrors } from '@/lib/form-errors';
import { formatLength, formatReadableLength, toNanometres } from '@/lib/units';
import { fitCalculatorQueries, type FitAnswer, type FitQuery } from '../api/queries';
import { SplineSection } from './spline-section';
import { SignalNote } from '@/components/signal-word';
import { FormProblems } from '@/components/form-problems';

const LABELS = { size: 'Nominal size', unit: 'Unit', hole: 'Hole class', shaft: 'Shaft class' };
const HOLE_CLASSES = ['H6', 'H7', 'H8', 'H9', 'H11', 'G7', 'F8', 'E9', 'D10', 'JS7', 'K7', 'M7', 'N7', 'P7', 'R7', 'S7'];
const SHAFT_CLASSES = ['h6', 'h7', 'h9', 'g6', 'f7', 'e8', 'd9', 'c11', 'js6', 'k6', 'm6', 'n6', 'p6', 'r6', 's6', 'u6'];
// Names of the common hole-basis fits as shop practice uses them (ISO 286-2's preferred fits):
// H8/f7 is close running, H7/g6 sliding — two different classes.
const COMMON_PAIRS = [
  { hole: 'H8', shaft: 'f7', label: 'H8/f7 close running' },
  { hole: 'H7', shaft: 'g6', label: 'H7/g6 sliding' },
  { hole: 'H7', shaft: 'h6', label: 'H7/h6 locational clearance' },
  { hole: 'H7', shaft: 'k6', label: 'H7/k6 locational transition' },
  { hole: 'H7', shaft: 'p6', label: 'H7/p6 locational interference' },
];
const KIND_WORDS: Record<FitAnswer['kind'], string> = {
  clearance: 'Clearance fit: the shaft is always smaller than the hole.',
  transition: 'Transition fit: a pair may have clearance or interference.',
  interference: 'Interference fit: the shaft is always larger than the hole; it is pressed or shrunk in.',
};
const DEVIATION_UNITS = [
  { value: 'um' as const, label: 'µm' },
  { value: 'thou' as const, label: 'thou' },
];

function queryFromParams(params: URLSearchParams): FitQuery | null {
  const size = params.get('size');
  const hole = params.get('hole');
  const shaft = params.get('shaft');
  const unit = params.get('unit') === 'in' ? 'in' : 'mm';
  const rounding = params.get('jsRounding') === 'even' ? { jsRounding: 'even' as const } : {};
  return size && hole && shaft ? { size, unit, hole, shaft, ...rounding } : null;
}

// ISO 286 tabulates nominal sizes over 0 up to 500 mm; 500 mm = 19.685 in (to the 0.001 in below).
const SIZE_RULE = { mm: 'greater than 0 mm and at most 500 mm', in: 'greater than 0 in and at most 19.685 in (500 mm)' };
const MAX_SIZE = { mm: 500, in: 500 / 25.4 };

/** The checks the API makes too, so a plain slip is named before a request; each names the field and its rule. */
function localCheck(query: FitQuery): Partial<Record<keyof FitQuery, string>> {
  const errors: Partial<Record<keyof FitQuery, string>> = {};
  if (!/^\s*(\d+(\.\d*)?|\.\d+)\s*$/.test(query.size)) {
    errors.size = `${LABELS.size} must be a number such as 25 or 0.984, ${SIZE_RULE[query.unit]}`;
  } else if (Number(query.size) <= 0 || Number(query.size) > MAX_SIZE[query.unit]) {
    errors.size = `${LABELS.size} must be ${SIZE_RULE[query.unit]}`;
  }
  if (!/^[A-Z]{1,2}\d{1,2}$/.test(query.hole.trim())) {
    errors.hole = `${LABELS.hole} must be capital letters and an IT grade, such as H7`;
  }
  if (!/^[a-z]{1,2}\d{1,2}$/.test(query.shaft.trim())) {
    errors.shaft = `${LABELS.shaft} must be lower-case letters and an IT grade, such as g6`;
  }
  return errors;
}

/**
 * ISO 286 limits and fits for anyone, signed in or not. The question lives in the address, so a
 * result can be shared as a link.
 */
export function FitCalculator() {
  const [params, setParams] = useSearchParams();
  const asked = queryFromParams(params);
  const [values, setValues] = useState<FitQuery>(asked ?? { size: '25', unit: 'mm', hole: 'H7', shaft: 'g6' });
  const [localErrors, setLocalErrors] = useState<Partial<Record<keyof FitQuery, string>>>({});
  const [deviationUnit, setDeviationUnit] = useState<DeviationUnit>('um');
  const answer = useQuery({ ...fitCalculatorQueries.limits(asked ?? values), enabled: asked !== null });
  const apiErrors = answer.isError ? splitApiErrors(answer.error, LABELS) : { fields: {}, general: [] };
  const errorOf = (field: keyof FitQuery) => localErrors[field] ?? (apiErrors.fields as Partial<Record<string, string>>)[field];

  const handleSubmit = (next: FitQuery) => {
    const errors = localCheck(next);
    setLocalErrors(errors);
    if (Object.keys(errors).length > 0) {
      // The answer on screen belongs to the previous question: take it away with that question.
      setParams({});
      return;
    }
    setParams({
      size: next.size.trim(),
      unit: next.unit,
      hole: next.hole.trim(),
      shaft: next.shaft.trim(),
      ...(next.jsRounding ? { jsRounding: next.jsRounding } : {}),
    });
  };

  const change = (field: keyof FitQuery, value: string) => {
    setValues((current) => ({ ...current, [field]: value }));
    setLocalErrors((current) => ({ ...current, [field]: undefined }));
  };

  return (
    <Stack maw={900}>
      <div>
        <Title order={2}>Fit calculator</Title>
        <Text c="dimmed">
          Limits and clearances of a hole and shaft pair by ISO 286, for sizes up to 500 mm. Deviations are in micrometres (µm) from
          the nominal size; 1 thou = 0.001 in = 25.4 µm.
        </Text>
      </div>
      <Paper withBorder p="md">
        <form
          aria-label="Fit calculator"
          noValidate
          onSubmit={(event) => {
            event.preventDefault();
            handleSubmit(values);
          }}
        >
          <Stack gap="sm">
            <SimpleGrid cols={{ base: 1, xs: 2, md: 4 }}>
              <TextInput
                label={LABELS.size}
                value={values.size}
                onChange={(event) => change('size', event.currentTarget.value)}
                error={errorOf('size')}
                inputMode="decimal"
              />
              <Input.Wrapper label={LABELS.unit} labelProps={{ id: 'fit-unit-label' }}>
                <SegmentedControl
                  aria-labelledby="fit-unit-label"
                  fullWidth
                  data={[
                    { value: 'mm', label: 'mm' },
                    { value: 'in', label: 'in' },
                  ]}
                  value={values.unit}
                  onChange={(value) => change('unit', value)}
                />
              </Input.Wrapper>
              <Autocomplete
                label={LABELS.hole}
                data={HOLE_CLASSES}
                value={values.hole}
                onChange={(value) => change('hole', value)}
                error={errorOf('hole')}
              />
              <Autocomplete
                label={LABELS.shaft}
                data={SHAFT_CLASSES}
                value={values.shaft}
                onChange={(value) => change('shaft', value)}
                error={errorOf('shaft')}
              />
            </SimpleGrid>
            <Checkbox
              label="js/JS: round odd IT7–IT11 down to even (older practice; the current ISO 286-2 tables give ±IT/2)"
              checked={values.jsRounding === 'even'}
              onChange={(event) => {
                const checked = event.currentTarget.checked;
                setValues(({ jsRounding: _previous, ...current }) => (checked ? { ...current, jsRounding: 'even' } : current));
              }}
            />
            <Group justify="space-between" wrap="wrap">
              <Group gap={6} aria-label="Common pairs">
                {COMMON_PAIRS.map((pair) => (
                  <Chip
                    key={pair.label}
                    size="xs"
                    checked={values.hole === pair.hole && values.shaft === pair.shaft}
                    onChange={() => {
                      const next = { ...values, hole: pair.hole, shaft: pair.shaft };
                      setValues(next);
                      handleSubmit(next);
                    }}
                  >
                    {pair.label}
                  </Chip>
                ))}
              </Group>
              <Button type="submit" loading={answer.isFetching}>
                Calculate
              </Button>
            </Group>
          </Stack>
        </form>
      </Paper>

      <FormProblems messages={apiErrors.general} title="No answer for this pair" />
      {answer.data && asked && <FitResult query={asked} answer={answer.data} deviationUnit={deviationUnit} onUnit={setDeviationUnit} />}
      <SplineSection />
    </Stack>
  );
}

function signed(value: number): string {
  return value > 0 ? `+${value}` : value < 0 ? `−${Math.abs(value)}` : '0';
}

function FitResult({
  query,
  answer,
  deviationUnit,
  onUnit,
}: {
  query: FitQuery;
  answer: FitAnswer;
  deviationUnit: DeviationUnit;
  onUnit: (unit: DeviationUnit) => void;
}) {
  const nominalNm = toNanometres(query.size, query.unit);
  // Limits to the micrometre (half a micrometre where the table has halves), written with fixed decimals so the column lines up.
  const deviations = [answer.hole.upper, answer.hole.lower, answer.shaft.upper, answer.shaft.lower];
  const stepNm = query.unit === 'in' ? 254 : deviations.every(Number.isInteger) ? 1000 : 100;
  const size = (deviationUm: number) => formatLength(nominalNm + Math.round(deviationUm * 1000), query.unit, stepNm);
  const nominal = formatReadableLength(nominalNm, query.unit);
  return (
    <Stack gap="md" data-testid="fit-result">
      <Paper withBorder p="md">
        <Stack gap="xs">
          <Title order={3}>
            {nominal} {query.hole}/{query.shaft}
          </Title>
          <Text fw={600} data-testid="fit-kind">
            {KIND_WORDS[answer.kind]}
          </Text>
          {answer.kind === 'interference' && (
            <SignalNote level="WARNING" testId="press-caution">
              Pressing or shrinking a part in stores great force and heat: a part can shatter or fly out. Wear eye protection,
              support the part on the correct adapters, stay within the press’s rating and keep clear of the line of force;
              handle heated parts with heat-resistant gloves.
            </SignalNote>
          )}
          <Text size="sm" c="dimmed" data-testid="fit-convention">
            Convention: {answer.convention.description}.
          </Text>
          <Text>
            Clearance from <strong>{signed(answer.clearance.min)} µm</strong> to <strong>{signed(answer.clearance.max)} µm</strong>
            {answer.clearance.min < 0 ? ' (below zero: interference)' : ''}.
          </Text>
          <Table.ScrollContainer minWidth={480}>
            <Table withTableBorder aria-label="Limits">
              <Table.Thead>
                <Table.Tr>
                  <Table.Th />
                  <Table.Th>Upper deviation</Table.Th>
                  <Table.Th>Lower deviation</Table.Th>
                  <Table.Th>Largest size</Table.Th>
                  <Table.Th>Smallest size</Table.Th>
                </Table.Tr>
              </Table.Thead>
              <Table.Tbody>
                <Table.Tr>
                  <Table.Th>Hole {query.hole}</Table.Th>
                  <Table.Td>{signed(answer.hole.upper)} µm</Table.Td>
                  <Table.Td>{signed(answer.hole.lower)} µm</Table.Td>
                  <Table.Td ff="monospace">{size(answer.hole.upper)}</Table.Td>
                  <Table.Td ff="monospace">{size(answer.hole.lower)}</Table.Td>
                </Table.Tr>
                <Table.Tr>
                  <Table.Th>Shaft {query.shaft}</Table.Th>
                  <Table.Td>{signed(answer.shaft.upper)} µm</Table.Td>
                  <Table.Td>{signed(answer.shaft.lower)} µm</Table.Td>
                  <Table.Td ff="monospace">{size(answer.shaft.upper)}</Table.Td>
                  <Table.Td ff="monospace">{size(answer.shaft.lower)}</Table.Td>
                </Table.Tr>
              </Table.Tbody>
            </Table>
          </Table.ScrollContainer>
        </Stack>
      </Paper>
      <Paper withBorder p="md">
        <Stack gap="xs">
          <Group justify="space-between">
            <Text fw={600}>Tolerance zones</Text>
            <UnitToggle label="Axis in" value={deviationUnit} options={DEVIATION_UNITS} onChange={onUnit} />
          </Group>
          <ToleranceZoneDiagram
            nominal={nominal}
            hole={answer.hole}
            shaft={answer.shaft}
            holeClass={query.hole}
            shaftClass={query.shaft}
            unit={deviationUnit}
          />
        </Stack>
      </Paper>
    </Stack>
  );
}
