import { Alert, Anchor, Badge, Button, Card, Group, Skeleton, Stack, Table, Text, TextInput, Title } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useDisclosure } from '@mantine/hooks';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { splitApiErrors } from '@/lib/form-errors';
import { useWorkshopReadOnly } from '@/lib/workshop-access';
import { useCreateGuide } from '../api/mutations';
import { guideQueries } from '../api/queries';
import { GuideStatusBadges } from './guide-status';
import { formatDateTime } from '@/lib/dates';
import { FormProblems } from '@/components/form-problems';

/** A build's guides on its page: where each stands, and a new one by its title. */
export function BuildGuides({ workshopId, buildId }: { workshopId: string; buildId: string }) {
  const guides = useQuery(guideQueries.list(workshopId, buildId));
  const create = useCreateGuide(workshopId, buildId);
  const [creating, createForm] = useDisclosure(false);
  const [general, setGeneral] = useState<string[]>([]);
  const navigate = useNavigate();
  const readOnly = useWorkshopReadOnly();
  const form = useForm({
    initialValues: { title: '' },
    validate: { title: (value) => (value.trim() ? null : 'Name the guide, e.g. "Fitting the motor-to-gearbox coupler"') },
  });

  const handleSubmit = ({ title }: { title: string }) => {
    setGeneral([]);
    create.mutate(
      { title: title.trim() },
      {
        onSuccess: (guide) => navigate(paths.guide.to(workshopId, guide.id)),
        onError: (error) => {
          const split = splitApiErrors(error, { title: 'Title' });
          form.setErrors(split.fields);
          setGeneral(split.general);
        },
      },
    );
  };

  return (
    <Stack gap="sm" data-testid="build-guides">
      <Group justify="space-between">
        <Title order={3}>Guides</Title>
        {!creating && !readOnly && <Button onClick={createForm.open}>New guide</Button>}
      </Group>
      {creating && (
        <Card withBorder>
          <form onSubmit={form.onSubmit(handleSubmit)} aria-label="New guide" noValidate>
            <Stack gap="sm">
              <FormProblems messages={general} />
              <TextInput label="Title" placeholder="Fitting the motor-to-gearbox coupler" withAsterisk data-autofocus {...form.getInputProps('title')} />
              <Group justify="flex-end">
                <Button variant="default" onClick={createForm.close}>
                  Cancel
                </Button>
                <Button type="submit" loading={create.isPending}>
                  Create and edit
                </Button>
              </Group>
            </Stack>
          </form>
        </Card>
      )}
      {guides.isPending && <Skeleton height={80} />}
      {guides.isError && <Alert color="red">{guides.error.message}</Alert>}
      {guides.data?.length === 0 && !creating && (
        <Text c="dimmed">No guides yet. A guide turns this build into written steps beside the video, with its verified-fit checklist.</Text>
      )}
      {guides.data && guides.data.length > 0 && (
        <Table.ScrollContainer minWidth={560}>
          <Table verticalSpacing="xs">
            <Table.Thead>
              <Table.Tr>
                <Table.Th>Guide</Table.Th>
                <Table.Th>Status</Table.Th>
                <Table.Th>Steps</Table.Th>
                <Table.Th>Revision</Table.Th>
                <Table.Th>Changed</Table.Th>
              </Table.Tr>
            </Table.Thead>
            <Table.Tbody>
              {guides.data.map((guide) => (
                <Table.Tr key={guide.id} data-testid="guide-row">
                  <Table.Td>
                    <Anchor component={Link} to={paths.guide.to(workshopId, guide.id)} fw={600}>
                      {guide.title}
                    </Anchor>
                  </Table.Td>
                  <Table.Td>
                    <GuideStatusBadges status={guide.status} hasUnpublishedChanges={guide.hasUnpublishedChanges} />
                  </Table.Td>
                  <Table.Td>{guide.stepCount}</Table.Td>
                  <Table.Td>
                    {guide.publishedRevision ? (
                      <Badge variant="default">Revision {guide.publishedRevision.number}</Badge>
                    ) : (
                      <Text size="sm" c="dimmed">
                        none
                      </Text>
                    )}
                  </Table.Td>
                  <Table.Td>
                    <Text size="sm">{formatDateTime(guide.updatedAt)}</Text>
                  </Table.Td>
                </Table.Tr>
              ))}
            </Table.Tbody>
          </Table>
        </Table.ScrollContainer>
      )}
    </Stack>
  );
}
