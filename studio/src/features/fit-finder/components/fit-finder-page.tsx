import {
  Alert,
  Anchor,
  Badge,
  Button,
  Card,
  Fieldset,
  Group,
  List,
  Pagination,
  SegmentedControl,
  Select,
  SimpleGrid,
  Skeleton,
  Stack,
  Text,
  TextInput,
  Title,
} from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import { useState, type FormEvent } from 'react';
import { Link, useSearchParams } from 'react-router-dom';
import { STATE_LOOK, StateIcon, type FitCheckState } from '@/components/check-state';
import { ApiError } from '@/lib/api-client';
import { formatDate } from '@/lib/dates';
import { FINDER_PAGE_SIZE, fitFinderQueries, type FinderCheck, type FitFinderQuery, type FitFinderResult } from '../api/queries';

/** The form's fields, in the order the address carries them. */
const FIELDS = [
  'partNumber',
  'maker',
  'vehicle',
  'splineTeeth',
  'splinePitch',
  'pressureAngle',
  'splineFit',
  'diameter',
  'toleranceClass',
  'fit',
  'lengthMin',
  'lengthMax',
] as const;
type Field = (typeof FIELDS)[number];
type FormValues = Record<Field, string>;

/** What each check answers; shown for the part-number case, where the title alone would not say why it is there. */
const CRITERION_WORDS: Record<FinderCheck['criterion'], string> = {
  spline: 'Spline',
  diameter: 'Diameter',
  clearance: 'Clearance',
  length: 'Length window',
  part: 'The assembly',
};

function valuesFrom(params: URLSearchParams): FormValues {
  return Object.fromEntries(FIELDS.map((field) => [field, params.get(field) ?? ''])) as FormValues;
}

function queryFrom(params: URLSearchParams): FitFinderQuery | null {
  const query: FitFinderQuery = {};
  for (const field of FIELDS) {
    const value = params.get(field)?.trim();
    if (value) query[field] = value;
  }
  if (Object.keys(query).length === 0) return null;
  const unit = params.get('unit');
  if (unit === 'mm' || unit === 'in') query.unit = unit;
  const offset = Number(params.get('offset'));
  if (Number.isInteger(offset) && offset > 0) query.offset = String(offset);
  return query;
}

/** "Has anyone proven this fits?": describe what you have in trade terms; see published, proven combinations. */
export function FitFinderPage() {
  const [params, setParams] = useSearchParams();
  const [values, setValues] = useState<FormValues>(() => valuesFrom(params));
  const [unit, setUnit] = useState(params.get('unit') === 'in' ? 'in' : 'mm');
  const query = queryFrom(params);
  const answer = useQuery({ ...fitFinderQueries.find(query ?? {}), enabled: query !== null });

  const field = (name: Field) => ({
    value: values[name],
    onChange: (event: { currentTarget: { value: string } }) => {
      const { value } = event.currentTarget;
      setValues((current) => ({ ...current, [name]: value }));
    },
  });

  const handleSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const next = new URLSearchParams();
    for (const name of FIELDS) if (values[name].trim()) next.set(name, values[name].trim());
    if ([...next.keys()].length > 0) next.set('unit', unit);
    setParams(next);
  };

  const handlePage = (page: number) => {
    const next = new URLSearchParams(params);
    next.set('offset', String((page - 1) * FINDER_PAGE_SIZE));
    setParams(next);
  };

  return (
    <Stack gap="lg">
      <div>
        <Title order={1}>Fit finder</Title>
        <Text c="dimmed">
          Has anyone proven it fits? Describe what you have; the finder looks through every published guide for assemblies whose fit checks match
          by the numbers (tooth count and pitch, ISO 286 limits, clearances, length windows), proven ones first.
        </Text>
      </div>

      <form onSubmit={handleSubmit} aria-label="What you have">
        <Stack gap="md">
          <SimpleGrid cols={{ base: 1, sm: 3 }}>
            <TextInput label="Part number" placeholder="HL-2107" {...field('partNumber')} />
            <TextInput label="Maker" placeholder="Ostler Motor Works" {...field('maker')} />
            <TextInput label="Vehicle" placeholder="compact pickup" {...field('vehicle')} />
          </SimpleGrid>
          <Fieldset legend="Spline">
            <SimpleGrid cols={{ base: 2, sm: 4 }}>
              <TextInput label="Teeth" inputMode="numeric" placeholder="21" {...field('splineTeeth')} />
              <TextInput label="Pitch" description="16/32, 20 DP or m1.25" placeholder="16/32" {...field('splinePitch')} />
              <Select
                label="Pressure angle"
                placeholder="any"
                clearable
                data={[
                  { value: '30', label: '30°' },
                  { value: '37.5', label: '37.5°' },
                  { value: '45', label: '45°' },
                ]}
                value={values.pressureAngle || null}
                onChange={(value) => setValues((current) => ({ ...current, pressureAngle: value ?? '' }))}
              />
              <Select
                label="Fit"
                placeholder="any"
                clearable
                data={[
                  { value: 'side', label: 'Side fit' },
                  { value: 'major', label: 'Major-diameter fit' },
                ]}
                value={values.splineFit || null}
                onChange={(value) => setValues((current) => ({ ...current, splineFit: value ?? '' }))}
              />
            </SimpleGrid>
          </Fieldset>
          <Fieldset legend="Diameter">
            <SimpleGrid cols={{ base: 1, sm: 3 }}>
              <TextInput label="Size" description="as you would say it: 0.750 in, 19.05 mm, 3/4&quot;" placeholder="0.750 in" {...field('diameter')} />
              <TextInput label="Tolerance class" description="ISO 286: H7 for a bore, g6 for a shaft; empty for a measured size" placeholder="H7" {...field('toleranceClass')} />
              <TextInput label="Fit to check clearance against" description="hole/shaft, e.g. H7/g6" placeholder="H7/g6" {...field('fit')} />
            </SimpleGrid>
          </Fieldset>
          <Fieldset legend="Length window">
            <SimpleGrid cols={{ base: 1, sm: 2 }}>
              <TextInput label="Shortest" placeholder="520 mm" {...field('lengthMin')} />
              <TextInput label="Longest" placeholder="22.25 in" {...field('lengthMax')} />
            </SimpleGrid>
          </Fieldset>
          <Group justify="space-between" align="flex-end">
            <div>
              <Text size="sm" fw={500}>
                Numbers written without a unit are
              </Text>
              <SegmentedControl
                value={unit}
                onChange={setUnit}
                data={[
                  { value: 'mm', label: 'millimetres' },
                  { value: 'in', label: 'inches' },
                ]}
              />
            </div>
            <Button type="submit">Find proven fits</Button>
          </Group>
        </Stack>
      </form>

      {query === null && <Text c="dimmed">Give at least one thing you have: a part number, a vehicle, a spline, a diameter or a length.</Text>}
      {query !== null && answer.isPending && <Skeleton height={160} />}
      {answer.isError && (
        <Alert color="red" title="The finder could not read that">
          {answer.error instanceof ApiError ? answer.error.message : 'Please try again.'}
        </Alert>
      )}
      {query !== null && answer.data && (
        <Stack gap="lg" aria-live="polite">
          <Text size="sm" c="dimmed" data-testid="finder-understood">
            Looking for {answer.data.understood.join('; ')}
          </Text>
          <section aria-labelledby="finder-matches">
            <Title order={2} size="h3" id="finder-matches">
              {answer.data.total === 0
                ? 'No proven match yet'
                : // A capped count is the best-ranked candidates' share: more may match ("1,000+ matches").
                  `${answer.data.total.toLocaleString('en')}${answer.data.totalCapped ? '+' : ''} ${answer.data.total === 1 && !answer.data.totalCapped ? 'match' : 'matches'}`}
            </Title>
            <Stack gap="sm" mt="sm">
              {answer.data.results.map((result) => (
                <ResultCard key={`${result.workshop.slug}/${result.guide.slug}`} result={result} />
              ))}
            </Stack>
            {answer.data.total > answer.data.limit && (
              <Pagination
                mt="md"
                total={Math.ceil(answer.data.total / answer.data.limit)}
                value={Math.floor(answer.data.offset / answer.data.limit) + 1}
                onChange={handlePage}
                aria-label="Pages of matches"
              />
            )}
          </section>
          {answer.data.nearMissTotal > 0 && (
            <section aria-labelledby="finder-near-misses">
              <Title order={2} size="h3" id="finder-near-misses">
                Near misses
              </Title>
              <Text size="sm" c="dimmed">
                Close, but not the same: each says what differs. These do not fit what you described.
              </Text>
              <Stack gap="sm" mt="sm">
                {answer.data.nearMisses.map((result) => (
                  <ResultCard key={`${result.workshop.slug}/${result.guide.slug}`} result={result} />
                ))}
              </Stack>
            </section>
          )}
        </Stack>
      )}
    </Stack>
  );
}

function StateLine({ state }: { state: string }) {
  const look = STATE_LOOK[state as FitCheckState] ?? STATE_LOOK.open;
  return (
    <Group gap={6} wrap="nowrap">
      <StateIcon state={(state as FitCheckState) in STATE_LOOK ? (state as FitCheckState) : 'open'} />
      <Text size="sm" fw={600} c={look.colour}>
        {look.label}
      </Text>
    </Group>
  );
}

function ResultCard({ result }: { result: FitFinderResult }) {
  const near = result.verdict === 'near_miss';
  return (
    <Card withBorder padding="md" component="article" data-testid={near ? 'finder-near-miss' : 'finder-result'}>
      <Stack gap="xs">
        <Group justify="space-between" align="flex-start">
          <div>
            <Title order={3} size="h4">
              <Anchor component={Link} to={result.link}>
                {result.guide.title}
              </Anchor>
            </Title>
            <Text size="sm">
              {result.workshop.name} · {result.assembly}
            </Text>
            <Text size="xs" c="dimmed">
              {result.buildTitle}
              {result.vehicle ? ` · ${result.vehicle}` : ''}
            </Text>
          </div>
          {near ? <Badge color="orange" variant="light">Near miss</Badge> : <StateLine state={result.state} />}
        </Group>
        {result.checks.map((check) => (
          <CheckLine key={`${check.criterion}-${check.id}`} check={check} />
        ))}
        <Group gap="md">
          <Text size="xs" c="dimmed">
            Fit reports: {result.fitReports.fit} it fit · {result.fitReports.noFit} it did not
          </Text>
          <Anchor component={Link} to={result.link} size="sm">
            {result.link.includes('?t=') ? 'Open the guide at the evidence' : 'Open the guide'}
          </Anchor>
        </Group>
      </Stack>
    </Card>
  );
}

function CheckLine({ check }: { check: FinderCheck }) {
  return (
    <Stack gap={4} pl="sm" style={{ borderLeft: '3px solid var(--mantine-color-gray-3)' }}>
      <Group gap="xs">
        <Text size="sm" fw={500}>
          {check.criterion === 'part' ? `${CRITERION_WORDS.part}'s best check: ` : ''}
          {check.title}
        </Text>
        <StateLine state={check.state} />
      </Group>
      <List size="sm" spacing={2}>
        {check.reasons.map((reason) => (
          <List.Item key={reason}>{reason}</List.Item>
        ))}
      </List>
      {check.measurements.length > 0 && (
        <Text size="xs">
          Measured: {check.measurements.map((reading) => `${reading.feature} ${reading.value}`).join(' · ')}
        </Text>
      )}
      {check.confirmedAt && (
        <Text size="xs" c="dimmed">
          Confirmed {check.confirmedBy ? `by ${check.confirmedBy} ` : ''}on {formatDate(check.confirmedAt)}
        </Text>
      )}
    </Stack>
  );
}
