import { Button, Group, Stack, TextInput, Textarea } from '@mantine/core';
import { useForm } from '@mantine/form';
import { splitApiErrors } from '@/lib/form-errors';
import { useState } from 'react';
import { useCreateBuild } from '../api/mutations';
import type { Build } from '../api/queries';
import { FormProblems } from '@/components/form-problems';

const LABELS = { title: 'Title', vehicle: 'Vehicle', goal: 'Goal' };

export function BuildCreateForm({ workshopId, onCreated }: { workshopId: string; onCreated?: (build: Build) => void }) {
  const createBuild = useCreateBuild(workshopId);
  const [general, setGeneral] = useState<string[]>([]);
  const form = useForm({
    initialValues: { title: '', vehicle: '', goal: '' },
    validate: { title: (value) => (value.trim() ? null : 'Give the build a title') },
  });

  const handleSubmit = (values: typeof form.values) => {
    setGeneral([]);
    createBuild.mutate(
      { title: values.title.trim(), vehicle: values.vehicle.trim() || undefined, goal: values.goal.trim() || undefined },
      {
        onSuccess: (build) => {
          form.reset();
          onCreated?.(build);
        },
        onError: (error) => {
          const split = splitApiErrors(error, LABELS);
          form.setErrors(split.fields);
          setGeneral(split.general);
        },
      },
    );
  };

  return (
    <form onSubmit={form.onSubmit(handleSubmit)} aria-label="New build">
      <Stack gap="sm">
        <FormProblems messages={general} title="The build was not saved" />
        <TextInput label={LABELS.title} placeholder="Motor-to-gearbox coupler" withAsterisk {...form.getInputProps('title')} />
        <TextInput label={LABELS.vehicle} placeholder="1980s compact pickup, electric conversion" {...form.getInputProps('vehicle')} />
        <Textarea label={LABELS.goal} autosize minRows={2} {...form.getInputProps('goal')} />
        <Group justify="flex-end">
          <Button type="submit" loading={createBuild.isPending}>
            Create build
          </Button>
        </Group>
      </Stack>
    </form>
  );
}
