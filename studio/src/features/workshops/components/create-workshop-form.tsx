import { Button, Group, Stack, Textarea, TextInput } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { splitApiErrors } from '@/lib/form-errors';
import { useCreateWorkshop } from '../api/mutations';
import type { Workshop } from '../api/queries';
import { FormProblems } from '@/components/form-problems';

const LABELS = { name: 'Workshop name', slug: 'Web address', description: 'Short description' };

/** "Harrow Lane Garage" → "harrow-lane-garage". */
export function slugFromName(name: string): string {
  return name
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 60)
    .replace(/-+$/g, '');
}

export function CreateWorkshopForm({ onCreated }: { onCreated: (workshop: Workshop) => void }) {
  const create = useCreateWorkshop();
  const [problem, setProblem] = useState<string | null>(null);
  const [slugEdited, setSlugEdited] = useState(false);
  const form = useForm({
    initialValues: { name: '', slug: '', description: '' },
    validate: {
      name: (value) => (value.trim().length >= 2 ? null : 'Give the workshop a name'),
      slug: (value) =>
        /^[a-z0-9]+(?:-[a-z0-9]+)*$/.test(value) && value.length >= 3
          ? null
          : 'Use at least 3 lower-case letters, digits or single hyphens',
    },
  });

  const handleNameChange = (name: string) => {
    form.setFieldValue('name', name);
    if (!slugEdited) form.setFieldValue('slug', slugFromName(name));
  };

  return (
    <form
      noValidate
      aria-label="Create a workshop"
      onSubmit={form.onSubmit((values) => {
        setProblem(null);
        create.mutate(values, {
          onSuccess: onCreated,
          onError: (error) => {
            const { fields, general } = splitApiErrors(error, LABELS);
            form.setErrors(fields);
            setProblem(general.join(' ') || null);
          },
        });
      })}
    >
      <Stack gap="sm">
        <FormProblems messages={problem} />
        <TextInput
          label={LABELS.name}
          required
          {...form.getInputProps('name')}
          onChange={(event) => handleNameChange(event.currentTarget.value)}
        />
        <TextInput
          label={LABELS.slug}
          description="Lower-case letters, digits and hyphens; it appears in your guides' addresses"
          required
          {...form.getInputProps('slug')}
          onChange={(event) => {
            setSlugEdited(true);
            form.setFieldValue('slug', event.currentTarget.value.toLowerCase());
          }}
        />
        <Textarea label={LABELS.description} autosize minRows={2} maxLength={500} {...form.getInputProps('description')} />
        <Group>
          <Button type="submit" loading={create.isPending}>
            Create workshop
          </Button>
        </Group>
      </Stack>
    </form>
  );
}
