import { Button, Checkbox, Group, Stack, TextInput } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { splitApiErrors } from '@/lib/form-errors';
import { useCreateManualCheck } from '../api/mutations';
import { FormProblems } from '@/components/form-problems';

/** A check the engine cannot compute: test-fitted on the vehicle, boot and seal, retention. */
export function ManualCheckForm({ workshopId, assemblyId, onDone }: { workshopId: string; assemblyId: string; onDone: () => void }) {
  const createCheck = useCreateManualCheck(workshopId, assemblyId);
  const [general, setGeneral] = useState<string[]>([]);
  const form = useForm({
    initialValues: { title: '', required: true },
    validate: { title: (value) => (value.trim() ? null : 'Say what is to be checked') },
  });

  const handleSubmit = (values: typeof form.values) => {
    setGeneral([]);
    createCheck.mutate(
      { title: values.title.trim(), required: values.required },
      {
        onSuccess: () => {
          form.reset();
          onDone();
        },
        onError: (error) => {
          const split = splitApiErrors(error, { title: 'Check', required: 'Required' });
          form.setErrors(split.fields);
          setGeneral(split.general);
        },
      },
    );
  };

  return (
    <form onSubmit={form.onSubmit(handleSubmit)} aria-label="New manual check" noValidate>
      <Stack gap="sm">
        <FormProblems messages={general} />
        <TextInput
          label="Check"
          placeholder="Test-fitted on the vehicle: coupler engages fully"
          withAsterisk
          {...form.getInputProps('title')}
        />
        <Checkbox
          label="Required for the assembly to count as verified"
          {...form.getInputProps('required', { type: 'checkbox' })}
        />
        <Group justify="flex-end">
          <Button variant="default" onClick={onDone}>
            Cancel
          </Button>
          <Button type="submit" loading={createCheck.isPending}>
            Add check
          </Button>
        </Group>
      </Stack>
    </form>
  );
}
