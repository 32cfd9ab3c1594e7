import { Alert, Anchor, Button, Card, Group, Skeleton, Stack, Text, TextInput, Textarea, Title } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useDisclosure } from '@mantine/hooks';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { splitApiErrors } from '@/lib/form-errors';
import { useWorkshopReadOnly } from '@/lib/workshop-access';
import { DeleteWithImpact } from '@/components/delete-with-impact';
import { RenameButton } from '@/components/rename-button';
import { useCreateAssembly, useDeleteAssembly, useRenameAssembly } from '../api/mutations';
import { assemblyQueries } from '../api/queries';
import { FormProblems } from '@/components/form-problems';

/** A build's assemblies: each a candidate combination of parts with its own checklist. */
export function AssembliesList({ workshopId, buildId }: { workshopId: string; buildId: string }) {
  const assemblies = useQuery(assemblyQueries.list(workshopId, buildId));
  const createAssembly = useCreateAssembly(workshopId, buildId);
  const renameAssembly = useRenameAssembly(workshopId);
  const deleteAssembly = useDeleteAssembly(workshopId);
  const [creating, createForm] = useDisclosure(false);
  const [general, setGeneral] = useState<string[]>([]);
  const navigate = useNavigate();
  const readOnly = useWorkshopReadOnly();
  const form = useForm({
    initialValues: { name: '', notes: '' },
    validate: { name: (value) => (value.trim() ? null : 'Name the combination, e.g. "21-tooth coupler with the long shaft"') },
  });

  const handleSubmit = (values: typeof form.values) => {
    setGeneral([]);
    createAssembly.mutate(
      { name: values.name.trim(), notes: values.notes.trim() || undefined },
      {
        onSuccess: (assembly) => navigate(paths.assembly.to(workshopId, assembly.id)),
        onError: (error) => {
          const split = splitApiErrors(error, { name: 'Name', notes: 'Notes' });
          form.setErrors(split.fields);
          setGeneral(split.general);
        },
      },
    );
  };

  return (
    <Stack gap="sm">
      <Group justify="space-between">
        <Title order={3}>Assemblies</Title>
        <Group>
          <Button component={Link} to={paths.parts.to(workshopId)} variant="default">
            Parts of this workshop
          </Button>
          {!creating && !readOnly && <Button onClick={createForm.open}>New assembly</Button>}
        </Group>
      </Group>
      {creating && (
        <Card withBorder>
          <form onSubmit={form.onSubmit(handleSubmit)} aria-label="New assembly" noValidate>
            <Stack gap="sm">
              <FormProblems messages={general} />
              <TextInput label="Name" placeholder="21-tooth coupler with the long shaft" withAsterisk {...form.getInputProps('name')} />
              <Textarea label="Notes" autosize minRows={2} {...form.getInputProps('notes')} />
              <Group justify="flex-end">
                <Button variant="default" onClick={createForm.close}>
                  Cancel
                </Button>
                <Button type="submit" loading={createAssembly.isPending}>
                  Create assembly
                </Button>
              </Group>
            </Stack>
          </form>
        </Card>
      )}
      {assemblies.isPending && <Skeleton height={80} />}
      {assemblies.isError && <Alert color="red">{assemblies.error.message}</Alert>}
      {assemblies.data?.length === 0 && !creating && (
        <Text c="dimmed">No assemblies yet. An assembly is one combination of parts you want to prove.</Text>
      )}
      {assemblies.data?.map((assembly) => (
        <Card key={assembly.id} withBorder padding="sm" data-testid="assembly-card">
          <Group justify="space-between" wrap="nowrap" align="flex-start">
            <Anchor component={Link} to={paths.assembly.to(workshopId, assembly.id)} fw={600}>
              {assembly.name}
            </Anchor>
            {!readOnly && (
              <Group gap={4} wrap="nowrap">
                <RenameButton
                  size="compact-xs"
                  what="assembly"
                  label="Name"
                  current={assembly.name}
                  maxLength={200}
                  aria-label={`Rename ${assembly.name}`}
                  onRename={(name) => renameAssembly.mutateAsync({ assemblyId: assembly.id, name })}
                />
                <DeleteWithImpact
                  size="compact-xs"
                  what="assembly"
                  name={assembly.name}
                  aria-label={`Delete ${assembly.name}`}
                  impactPath={`/workshops/${workshopId}/assemblies/${assembly.id}/deletion-impact`}
                  onDelete={() => deleteAssembly.mutateAsync(assembly.id)}
                >
                  Delete
                </DeleteWithImpact>
              </Group>
            )}
          </Group>
          {assembly.notes && (
            <Text size="sm" c="dimmed" lineClamp={2}>
              {assembly.notes}
            </Text>
          )}
        </Card>
      ))}
    </Stack>
  );
}
