import { Button, Group, Select, SimpleGrid, Stack, TextInput, Textarea } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { ApiError } from '@/lib/api-client';
import { splitApiErrors } from '@/lib/form-errors';
import type { PartInput } from '../api/mutations';
import { PART_CATEGORIES, PART_SOURCES, type Part, type PartCategory, type PartSource } from '../api/queries';
import { CATEGORY_LABELS, SOURCE_LABELS } from './part-labels';
import { FormProblems } from '@/components/form-problems';

const LABELS = {
  partNumber: 'Part number',
  maker: 'Maker',
  title: 'Title',
  category: 'Category',
  source: 'Source',
  notes: 'Notes',
};

interface PartFormValues {
  partNumber: string;
  maker: string;
  title: string;
  category: PartCategory | '';
  source: PartSource;
  notes: string;
}

export interface PartFormProps {
  initial?: Part;
  submitLabel: string;
  pending: boolean;
  onSubmit: (input: PartInput, callbacks: { onError: (error: unknown) => void }) => void;
}

/** The part's own fields; features are added on the part page, each with its own form. */
export function PartForm({ initial, submitLabel, pending, onSubmit }: PartFormProps) {
  const [general, setGeneral] = useState<string[]>([]);
  const form = useForm<PartFormValues>({
    initialValues: {
      partNumber: initial?.partNumber ?? '',
      maker: initial?.maker ?? '',
      title: initial?.title ?? '',
      category: initial?.category ?? '',
      source: initial?.source ?? 'new',
      notes: initial?.notes ?? '',
    },
    validate: {
      partNumber: (value) => (value.trim() ? null : 'Write the part number as the maker prints it'),
      title: (value) => (value.trim() ? null : 'Give the part a short title'),
      category: (value) => (value ? null : 'Pick a category'),
    },
  });

  const handleError = (error: unknown) => {
    const split = splitApiErrors(error, LABELS);
    // A duplicate part number comes back as a 409 sentence; it belongs under the part number.
    if (error instanceof ApiError && error.status === 409) {
      split.fields.partNumber = error.message;
      split.general = [];
    }
    form.setErrors(split.fields);
    setGeneral(split.general);
  };

  const handleSubmit = (values: PartFormValues) => {
    setGeneral([]);
    onSubmit(
      {
        partNumber: values.partNumber.trim(),
        maker: values.maker.trim(),
        title: values.title.trim(),
        category: values.category as PartCategory,
        source: values.source,
        notes: values.notes,
      },
      { onError: handleError },
    );
  };

  return (
    <form onSubmit={form.onSubmit(handleSubmit)} aria-label={submitLabel} noValidate>
      <Stack gap="sm">
        <FormProblems messages={general} title="The part was not saved" />
        <SimpleGrid cols={{ base: 1, sm: 2 }}>
          <TextInput label={LABELS.partNumber} placeholder="HL-2107" withAsterisk {...form.getInputProps('partNumber')} />
          <TextInput label={LABELS.maker} placeholder="Brackwater Driveline" {...form.getInputProps('maker')} />
        </SimpleGrid>
        <TextInput label={LABELS.title} placeholder="27-tooth motor coupler" withAsterisk {...form.getInputProps('title')} />
        <SimpleGrid cols={{ base: 1, sm: 2 }}>
          <Select
            label={LABELS.category}
            withAsterisk
            data={PART_CATEGORIES.map((value) => ({ value, label: CATEGORY_LABELS[value] }))}
            {...form.getInputProps('category')}
          />
          <Select
            label={LABELS.source}
            allowDeselect={false}
            data={PART_SOURCES.map((value) => ({ value, label: SOURCE_LABELS[value] }))}
            {...form.getInputProps('source')}
          />
        </SimpleGrid>
        <Textarea label={LABELS.notes} autosize minRows={2} {...form.getInputProps('notes')} />
        <Group justify="flex-end">
          <Button type="submit" loading={pending}>
            {submitLabel}
          </Button>
        </Group>
      </Stack>
    </form>
  );
}
