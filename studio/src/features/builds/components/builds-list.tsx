import { Alert, Anchor, Badge, Button, Group, Modal, Skeleton, Stack, Table, Text, Title } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { useQuery } from '@tanstack/react-query';
import { Link, useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { buildQueries } from '../api/queries';
import { BuildCreateForm } from './build-create-form';
import { BUILD_STATUS_LABELS } from './build-labels';
import { formatDate } from '@/lib/dates';
import { useWorkshopReadOnly } from '@/lib/workshop-access';

export function BuildsList({ workshopId }: { workshopId: string }) {
  const builds = useQuery(buildQueries.list(workshopId));
  const [creating, { open, close }] = useDisclosure(false);
  const navigate = useNavigate();
  const readOnly = useWorkshopReadOnly();

  return (
    <Stack>
      <Group justify="space-between">
        <Title order={3}>Builds</Title>
        {!readOnly && <Button onClick={open}>New build</Button>}
      </Group>
      {builds.isPending && <Skeleton height={120} />}
      {builds.isError && <Alert color="red" title="Builds could not be loaded">{builds.error.message}</Alert>}
      {builds.data?.length === 0 && (
        <Text c="dimmed">No builds yet. A build holds the parts, assemblies and checks of one project.</Text>
      )}
      {builds.data && builds.data.length > 0 && (
        <Table.ScrollContainer minWidth={560}>
          <Table striped highlightOnHover>
            <Table.Thead>
              <Table.Tr>
                <Table.Th>Title</Table.Th>
                <Table.Th>Vehicle</Table.Th>
                <Table.Th>Status</Table.Th>
                <Table.Th>Updated</Table.Th>
              </Table.Tr>
            </Table.Thead>
            <Table.Tbody>
              {builds.data.map((build) => (
                <Table.Tr key={build.id}>
                  <Table.Td>
                    <Anchor component={Link} to={paths.build.to(workshopId, build.id)} fw={500}>
                      {build.title}
                    </Anchor>
                  </Table.Td>
                  <Table.Td>{build.vehicle || '—'}</Table.Td>
                  <Table.Td>
                    <Badge variant="light">{BUILD_STATUS_LABELS[build.status]}</Badge>
                  </Table.Td>
                  <Table.Td>{formatDate(build.updatedAt)}</Table.Td>
                </Table.Tr>
              ))}
            </Table.Tbody>
          </Table>
        </Table.ScrollContainer>
      )}
      <Modal opened={creating} onClose={close} title="New build">
        <BuildCreateForm
          workshopId={workshopId}
          onCreated={(build) => {
            close();
            navigate(paths.build.to(workshopId, build.id));
          }}
        />
      </Modal>
    </Stack>
  );
}
