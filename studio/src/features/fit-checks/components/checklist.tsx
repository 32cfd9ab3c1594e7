import { Alert, Button, Card, Group, Paper, Skeleton, Stack, Text, Title } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import type { DeviationUnit } from '@/components/diagrams/tolerance-zone-geometry';
import { UnitToggle } from '@/components/unit-toggle';
import { fitCheckQueries, type ChecklistAssembly, type ChecklistVerdict, type FitCheck, type FitCheckState, type Reading } from '../api/queries';
import { CheckCard } from './check-card';
import { StateIcon, STATE_LOOK, VERDICT_LOOK } from '@/components/check-state';
import type { ReadingChoice } from './evidence-form';
import { HistoryDrawer } from './history-drawer';
import { ManualCheckForm } from './manual-check-form';
import { TransitionModal, type TransitionRequest } from './transition-modal';
import { formatDate } from '@/lib/dates';
import { useWorkshopReadOnly } from '@/lib/workshop-access';

const DEVIATION_UNITS = [
  { value: 'um' as const, label: 'µm' },
  { value: 'thou' as const, label: 'thou' },
];

/** Names for every reading subject of the assembly: "pilot bore on HL-2107", or an interface's name. */
function subjectNames(assembly: ChecklistAssembly): Map<string, string> {
  const names = new Map<string, string>();
  for (const { part } of assembly.parts) {
    for (const feature of part.features) names.set(feature.id, `${feature.name} on ${part.partNumber}`);
  }
  for (const assemblyInterface of assembly.interfaces) names.set(assemblyInterface.id, `across ${assemblyInterface.name}`);
  return names;
}

function readingLabel(reading: Reading): string {
  return `${reading.shown} · ${reading.instrument.kind.replace(/_/g, ' ')} · ${formatDate(reading.takenAt)}`;
}

/** Readings worth attaching to a check: those of its own interface's parts first, or any in the assembly for a manual check. */
function choicesFor(check: FitCheck, assembly: ChecklistAssembly, readings: Reading[], names: Map<string, string>) {
  const assemblyInterface = assembly.interfaces.find((candidate) => candidate.id === check.interfaceId);
  const subjects = assemblyInterface
    ? [assemblyInterface.featureAId, assemblyInterface.featureBId, assemblyInterface.id].filter((id): id is string => Boolean(id))
    : [...names.keys()];
  return subjects
    .map((subject) => ({
      group: names.get(subject) ?? 'reading',
      items: readings
        .filter((reading) => (reading.featureId ?? reading.interfaceId) === subject)
        .map((reading): ReadingChoice => ({ value: reading.id, label: readingLabel(reading) })),
    }))
    .filter((group) => group.items.length > 0);
}

export function VerdictBanner({ verdict, checks }: { verdict: ChecklistVerdict; checks: FitCheck[] }) {
  const look = VERDICT_LOOK[verdict];
  const counted = checks.filter((check) => check.required && check.state !== 'retired');
  const confirmed = counted.filter((check) => check.state === 'confirmed').length;
  return (
    <Paper
      withBorder
      p="md"
      data-testid="checklist-verdict"
      data-verdict={verdict}
      style={{ borderColor: STATE_LOOK[verdict].colour, borderWidth: 2 }}
      role="status"
    >
      <Group gap="md" wrap="nowrap" align="flex-start">
        <StateIcon state={verdict} size={32} />
        <div>
          <Text fw={700} size="lg" c={STATE_LOOK[verdict].colour}>
            {look.label}
          </Text>
          <Text size="sm">{look.explanation}</Text>
          {counted.length > 0 && (
            <Text size="sm" c="dimmed">
              {confirmed} of {counted.length} required check{counted.length === 1 ? '' : 's'} confirmed on the vehicle.
            </Text>
          )}
        </div>
      </Group>
    </Paper>
  );
}

/** The verified-fit checklist of one assembly: the roll-up verdict, then each check with its numbers, picture and evidence. */
export function Checklist({
  workshopId,
  assemblyId,
  canRetryFitNews = false,
}: {
  workshopId: string;
  assemblyId: string;
  /** Owners may send a check's failed fit news again, from its history. */
  canRetryFitNews?: boolean;
}) {
  const checklist = useQuery(fitCheckQueries.checklist(workshopId, assemblyId));
  const assembly = useQuery(fitCheckQueries.assembly(workshopId, assemblyId));
  const readings = useQuery(fitCheckQueries.readings(workshopId));
  const [deviationUnit, setDeviationUnit] = useState<DeviationUnit>('um');
  const [adding, manualForm] = useDisclosure(false);
  const readOnly = useWorkshopReadOnly();
  const [transition, setTransition] = useState<TransitionRequest | null>(null);
  const [historyOf, setHistoryOf] = useState<FitCheck | null>(null);

  if (checklist.isPending || assembly.isPending || readings.isPending) return <Skeleton height={200} />;
  const failure = checklist.error ?? assembly.error ?? readings.error;
  if (failure) return <Alert color="red" title="The checklist could not be loaded">{failure.message}</Alert>;
  if (!checklist.data || !assembly.data || !readings.data) return null;

  const names = subjectNames(assembly.data);
  const ownIds = new Set(names.keys());
  const assemblyReadings = readings.data.filter((reading) => ownIds.has(reading.featureId ?? reading.interfaceId ?? ''));
  const byId = new Map(readings.data.map((reading) => [reading.id, reading]));
  const describeReading = (measurementId: string | null) => {
    const reading = measurementId ? byId.get(measurementId) : undefined;
    if (!reading) return 'A reading';
    return `${names.get(reading.featureId ?? reading.interfaceId ?? '') ?? 'Reading'}: ${readingLabel(reading)}`;
  };
  const handleTransition = (check: FitCheck, to: FitCheckState) => setTransition({ check, to });

  return (
    <Stack gap="md">
      <Group justify="space-between" wrap="wrap">
        <Title order={3}>Verified-fit checklist</Title>
        <Group gap="md">
          <UnitToggle label="Tolerance axis in" value={deviationUnit} options={DEVIATION_UNITS} onChange={setDeviationUnit} />
          {!adding && !readOnly && (
            <Button variant="light" onClick={manualForm.open}>
              Add a check by hand
            </Button>
          )}
        </Group>
      </Group>
      <VerdictBanner verdict={checklist.data.verdict} checks={checklist.data.checks} />
      {adding && !readOnly && (
        <Card withBorder>
          <ManualCheckForm workshopId={workshopId} assemblyId={assemblyId} onDone={manualForm.close} />
        </Card>
      )}
      {checklist.data.checks.length === 0 && (
        <Text c="dimmed">
          No checks yet. Each interface of the assembly brings a computed check; add the ones only a test fit can settle by hand.
        </Text>
      )}
      {checklist.data.checks.map((check) => (
        <CheckCard
          key={check.id}
          workshopId={workshopId}
          check={check}
          assembly={assembly.data}
          readings={assemblyReadings}
          readingChoices={choicesFor(check, assembly.data, assemblyReadings, names)}
          describeReading={describeReading}
          deviationUnit={deviationUnit}
          onTransition={handleTransition}
          onHistory={setHistoryOf}
        />
      ))}
      <TransitionModal workshopId={workshopId} request={transition} onClose={() => setTransition(null)} />
      <HistoryDrawer workshopId={workshopId} check={historyOf} onClose={() => setHistoryOf(null)} canRetryFitNews={canRetryFitNews} />
    </Stack>
  );
}
