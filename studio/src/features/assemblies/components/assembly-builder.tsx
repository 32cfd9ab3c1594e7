import { Alert, Anchor, Badge, Breadcrumbs, Button, Card, Group, Skeleton, Stack, Table, Text, Title } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { useQuery } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { ConfirmButton } from '@/components/confirm-button';
import { paths } from '@/config/paths';
import { notifyError } from '@/lib/notify';
import { useWorkshopReadOnly } from '@/lib/workshop-access';
import { useRemoveInterface, useRemovePlacedPart } from '../api/mutations';
import { assemblyQueries, type AssemblyInterface } from '../api/queries';
import { featureLabel, featureSummary, INTERFACE_KIND_LABELS } from './interface-choices';
import { InterfaceForm } from './interface-form';
import { PlacePartForm } from './place-part-form';

export interface AssemblyHeaderProps {
  workshopId: string;
  assemblyId: string;
  /** The build's title for the breadcrumb, when the page knows it (builds are another part of the studio). */
  buildTitle?: string;
  children?: ReactNode;
}

export function AssemblyHeader({ workshopId, assemblyId, buildTitle, children }: AssemblyHeaderProps) {
  const assembly = useQuery(assemblyQueries.detail(workshopId, assemblyId));
  if (assembly.isPending) return <Skeleton height={60} />;
  if (assembly.isError) return <Alert color="red" title="Assembly not found">{assembly.error.message}</Alert>;
  return (
    <Stack gap={4}>
      <Breadcrumbs>
        <Anchor component={Link} to={paths.builds.to(workshopId)}>
          Builds
        </Anchor>
        <Anchor component={Link} to={paths.build.to(workshopId, assembly.data.buildId)}>
          {buildTitle ?? 'Build'}
        </Anchor>
        <Text>{assembly.data.name}</Text>
      </Breadcrumbs>
      <Group justify="space-between">
        <Title order={2}>{assembly.data.name}</Title>
        {children}
      </Group>
      {assembly.data.notes && <Text maw={760}>{assembly.data.notes}</Text>}
    </Stack>
  );
}

export interface AssemblyBuilderProps {
  workshopId: string;
  assemblyId: string;
  /** Readings taken across an interface (a feeler-gauge clearance), supplied by the page. */
  renderInterfaceReadings?: (assemblyInterface: AssemblyInterface) => ReactNode;
}

/** Which parts make up the assembly, where each sits, and where they mate. */
export function AssemblyBuilder({ workshopId, assemblyId, renderInterfaceReadings }: AssemblyBuilderProps) {
  const assembly = useQuery(assemblyQueries.detail(workshopId, assemblyId));
  const removePart = useRemovePlacedPart(workshopId, assemblyId);
  const removeInterface = useRemoveInterface(workshopId, assemblyId);
  const [addingInterface, interfaceForm] = useDisclosure(false);
  // A site admin (not a member) or a disabled workshop reads the assembly without the controls that would fail.
  const readOnly = useWorkshopReadOnly();

  if (assembly.isPending) return <Skeleton height={240} />;
  if (assembly.isError) return <Alert color="red" title="Assembly could not be loaded">{assembly.error.message}</Alert>;
  const data = assembly.data;

  return (
    <Stack gap="lg">
      <Stack gap="sm">
        <Title order={3}>Parts</Title>
        {data.parts.length === 0 ? (
          <Text c="dimmed">No parts placed yet.</Text>
        ) : (
          <Table.ScrollContainer minWidth={560}>
            <Table withTableBorder aria-label="Placed parts">
              <Table.Thead>
                <Table.Tr>
                  <Table.Th>Position</Table.Th>
                  <Table.Th>Part</Table.Th>
                  <Table.Th>Features</Table.Th>
                  {!readOnly && <Table.Th aria-label="Actions" />}
                </Table.Tr>
              </Table.Thead>
              <Table.Tbody>
                {data.parts.map(({ position, part }) => (
                  <Table.Tr key={part.id}>
                    <Table.Td fw={500}>{position}</Table.Td>
                    <Table.Td>
                      <Anchor component={Link} to={paths.part.to(workshopId, part.id)} ff="monospace" fw={600}>
                        {part.partNumber}
                      </Anchor>{' '}
                      {part.title}
                    </Table.Td>
                    <Table.Td>
                      <Text size="sm">
                        {part.features.length === 0
                          ? '—'
                          : part.features.map((feature) => `${feature.name} (${featureSummary(feature) || feature.kind})`).join('; ')}
                      </Text>
                    </Table.Td>
                    {!readOnly && (
                      <Table.Td>
                        <Button
                          size="compact-xs"
                          variant="subtle"
                          color="red"
                          onClick={() => removePart.mutate(part.id, { onError: (error) => notifyError('The part stays in the assembly', error) })}
                        >
                          Take out
                        </Button>
                      </Table.Td>
                    )}
                  </Table.Tr>
                ))}
              </Table.Tbody>
            </Table>
          </Table.ScrollContainer>
        )}
        {!readOnly && <PlacePartForm workshopId={workshopId} assembly={data} />}
      </Stack>

      <Stack gap="sm">
        <Group justify="space-between">
          <Title order={3}>Interfaces</Title>
          {!addingInterface && !readOnly && (
            <Button onClick={interfaceForm.open} disabled={data.parts.length === 0}>
              Add interface
            </Button>
          )}
        </Group>
        {addingInterface && !readOnly && (
          <Card withBorder>
            <InterfaceForm workshopId={workshopId} assembly={data} onDone={interfaceForm.close} />
          </Card>
        )}
        {data.interfaces.length === 0 && !addingInterface && (
          <Text c="dimmed">No interfaces yet. Each interface where two parts mate becomes a check on the checklist.</Text>
        )}
        {data.interfaces.map((assemblyInterface) => (
          <Card key={assemblyInterface.id} withBorder data-testid="interface-card" aria-label={`Interface ${assemblyInterface.name}`}>
            <Group justify="space-between" align="flex-start" wrap="nowrap">
              <div>
                <Group gap="xs">
                  <Text fw={600}>{assemblyInterface.name}</Text>
                  <Badge variant="light" color="gray">
                    {INTERFACE_KIND_LABELS[assemblyInterface.kind]}
                  </Badge>
                </Group>
                <Text size="sm">
                  {assemblyInterface.kind === 'length_window'
                    ? `${featureLabel(data.parts, assemblyInterface.featureAId)} installed between ${assemblyInterface.installedMin} and ${assemblyInterface.installedMax} ${assemblyInterface.unit === 'um' ? 'µm' : assemblyInterface.unit}`
                    : `${featureLabel(data.parts, assemblyInterface.featureAId)} with ${featureLabel(data.parts, assemblyInterface.featureBId)}`}
                </Text>
                {assemblyInterface.margin && (
                  <Text size="sm" c="dimmed">
                    {assemblyInterface.kind === 'length_window' ? 'Travel to keep each way' : 'Least clearance accepted'}:{' '}
                    {assemblyInterface.margin} {assemblyInterface.unit === 'um' ? 'µm' : assemblyInterface.unit}
                  </Text>
                )}
              </div>
              {!readOnly && (
              <ConfirmButton
                size="compact-xs"
                variant="subtle"
                color="red"
                question={`Remove the interface "${assemblyInterface.name}"?`}
                detail="Its fit check, with the evidence and history attached to it, goes too."
                confirmLabel="Remove interface"
                onConfirm={() =>
                  removeInterface.mutate(assemblyInterface.id, {
                    onError: (error) => notifyError('The interface was not removed', error),
                  })
                }
              >
                Remove
              </ConfirmButton>
              )}
            </Group>
            {renderInterfaceReadings && assemblyInterface.kind === 'bore_shaft' && (
              <div style={{ marginTop: 12 }}>{renderInterfaceReadings(assemblyInterface)}</div>
            )}
          </Card>
        ))}
      </Stack>
    </Stack>
  );
}
