import { Anchor, Badge, Button, Card, FileButton, Group, List, Stack, Text } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import type { DeviationUnit } from '@/components/diagrams/tolerance-zone-geometry';
import type { ChecklistAssembly, FitCheck, FitCheckState, Reading } from '../api/queries';
import { checkSummary } from './check-detail';
import { CheckDiagram } from './check-diagram';
import { CheckStateBadge, STATE_LOOK } from '@/components/check-state';
import { EvidenceForm, type ReadingChoice } from './evidence-form';
import { ACTION_LABELS } from './transition-modal';
import { WhatIfPanel } from './what-if-panel';
import { useAddPhotoEvidence } from '../api/mutations';
import { notifyError } from '@/lib/notify';
import { formatDate } from '@/lib/dates';
import { useWorkshopReadOnly } from '@/lib/workshop-access';

const KIND_LABELS: Record<FitCheck['kind'], string> = {
  spline_match: 'Computed: spline match',
  fit: 'Computed: bore and shaft',
  length_window: 'Computed: length window',
  manual: 'Checked by hand',
};

/** The changes a person may ask for from each state; the API still has the last word. */
function actionsFor(check: FitCheck): FitCheckState[] {
  switch (check.state) {
    case 'open':
    case 'bench_pass':
      // A derived check that does not pass by the numbers cannot be confirmed: do not offer it.
      return check.derived && check.outcome !== 'pass' ? ['no_fit', 'retired'] : ['confirmed', 'no_fit', 'retired'];
    case 'confirmed':
      return ['open', 'no_fit', 'retired'];
    case 'no_fit':
      // A derived check that fails by the numbers would only fail again: re-opening it changes nothing.
      return check.derived && check.outcome === 'fail' ? ['retired'] : ['open', 'retired'];
    case 'retired':
      return ['open'];
  }
}

export interface CheckCardProps {
  workshopId: string;
  check: FitCheck;
  assembly: ChecklistAssembly;
  readings: Reading[];
  readingChoices: { group: string; items: ReadingChoice[] }[];
  describeReading: (measurementId: string | null) => string;
  deviationUnit: DeviationUnit;
  onTransition: (check: FitCheck, to: FitCheckState) => void;
  onHistory: (check: FitCheck) => void;
}

export function CheckCard(props: CheckCardProps) {
  const { workshopId, check, assembly, readings, deviationUnit } = props;
  const [attaching, attachForm] = useDisclosure(false);
  const [askingWhatIf, whatIf] = useDisclosure(false);
  const addPhoto = useAddPhotoEvidence(workshopId);
  // Site admins (not members) and disabled workshops read the check: evidence and state changes would be refused.
  const readOnly = useWorkshopReadOnly();
  const { summary, reasons } = checkSummary(check);
  const look = STATE_LOOK[check.state];
  const assemblyInterface = assembly.interfaces.find((candidate) => candidate.id === check.interfaceId);

  return (
    <Card
      withBorder
      padding="md"
      data-testid="check-card"
      data-state={check.state}
      aria-label={`Check: ${check.title}`}
      style={{ borderLeft: `6px ${check.state === 'retired' ? 'dashed' : 'solid'} ${look.colour}` }}
    >
      <Stack gap="sm">
        <Group justify="space-between" align="flex-start" wrap="wrap" gap="xs">
          <div style={{ minWidth: 0, flex: '1 1 320px' }}>
            <Text fw={600}>{check.title}</Text>
            <Group gap={6}>
              <Text size="xs" c="dimmed">
                {KIND_LABELS[check.kind]}
              </Text>
              {!check.required && (
                <Badge size="xs" variant="outline" color="gray">
                  optional
                </Badge>
              )}
            </Group>
          </div>
          <CheckStateBadge state={check.state} />
        </Group>

        {(summary || reasons.length > 0) && (
          <div>
            {summary && (
              <Text size="sm" fw={500}>
                The numbers: {summary}
              </Text>
            )}
            {reasons.length > 0 && (
              <List size="sm" spacing={2} aria-label="Why">
                {reasons.map((reason) => (
                  <List.Item key={reason}>{reason}</List.Item>
                ))}
              </List>
            )}
          </div>
        )}
        {check.reason && check.reason !== summary && (
          <Text size="xs" c="dimmed">
            Last change: {check.reason}
          </Text>
        )}

        <CheckDiagram check={check} assembly={assembly} readings={readings} deviationUnit={deviationUnit} />

        <div>
          <Text size="sm" fw={500}>
            Evidence
          </Text>
          {check.evidence.length === 0 ? (
            <Text size="sm" c="dimmed">
              None yet{check.state !== 'confirmed' ? ': confirming needs at least one piece.' : '.'}
            </Text>
          ) : (
            <List size="sm" spacing={2} aria-label="Evidence" data-testid="evidence-list">
              {check.evidence.map((item) => (
                <List.Item key={item.id}>
                  {item.kind === 'measurement'
                    ? props.describeReading(item.measurementId)
                    : item.kind === 'mark'
                      ? 'A mark in the footage'
                      : (
                        <Anchor href={item.photoUrl ?? undefined} target="_blank" rel="noreferrer">
                          A photo
                        </Anchor>
                      )}
                  {item.note && ` — ${item.note}`}
                  <Text span size="xs" c="dimmed">
                    {' '}
                    (attached {formatDate(item.createdAt)})
                  </Text>
                </List.Item>
              ))}
            </List>
          )}
        </div>
        {attaching && !readOnly && (
          <EvidenceForm workshopId={workshopId} check={check} choices={props.readingChoices} onDone={attachForm.close} />
        )}
        {askingWhatIf && assemblyInterface && (
          <WhatIfPanel workshopId={workshopId} interfaceId={assemblyInterface.id} defaultUnit={assemblyInterface.unit} />
        )}

        <Group gap="xs" wrap="wrap">
          {!readOnly && !attaching && check.state !== 'retired' && (
            <Button size="xs" variant="light" onClick={attachForm.open}>
              Attach a reading as evidence
            </Button>
          )}
          {!readOnly && check.state !== 'retired' && (
            <FileButton
              accept="image/png,image/jpeg,image/webp"
              onChange={(file) =>
                file &&
                addPhoto.mutate({ checkId: check.id, file }, { onError: (failure) => notifyError('The photo was not attached', failure) })
              }
            >
              {(buttonProps) => (
                <Button {...buttonProps} size="xs" variant="light" loading={addPhoto.isPending}>
                  Attach a photo
                </Button>
              )}
            </FileButton>
          )}
          {!readOnly &&
            actionsFor(check).map((to) => (
            <Button
              key={to}
              size="xs"
              variant={to === 'confirmed' ? 'filled' : 'default'}
              color={to === 'no_fit' ? 'red' : undefined}
              onClick={() => props.onTransition(check, to)}
            >
              {ACTION_LABELS[to]}
            </Button>
          ))}
          {check.kind === 'fit' && (
            <Button size="xs" variant="subtle" onClick={whatIf.toggle}>
              {askingWhatIf ? 'Hide what-if' : 'What if…'}
            </Button>
          )}
          <Button size="xs" variant="subtle" onClick={() => props.onHistory(check)}>
            History
          </Button>
        </Group>
      </Stack>
    </Card>
  );
}
