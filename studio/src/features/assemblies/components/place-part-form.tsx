import { Autocomplete, Button, Group, Select } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useQuery } from '@tanstack/react-query';
import { notifyError } from '@/lib/notify';
import { usePlacePart } from '../api/mutations';
import { assemblyQueries, type AssemblyDetail } from '../api/queries';

const POSITIONS = ['input side', 'shaft', 'output side', 'between', 'housing'];

/** Puts one of the workshop's parts into the assembly at a named position. */
export function PlacePartForm({ workshopId, assembly }: { workshopId: string; assembly: AssemblyDetail }) {
  const parts = useQuery(assemblyQueries.partChoices(workshopId));
  const placePart = usePlacePart(workshopId, assembly.id);
  const form = useForm({
    initialValues: { partId: null as string | null, position: '' },
    validate: {
      partId: (value) => (value ? null : 'Pick a part'),
      position: (value) => (value.trim() ? null : 'Say where it sits, e.g. "input side"'),
    },
  });
  const placed = new Set(assembly.parts.map(({ part }) => part.id));
  const choices = (parts.data ?? [])
    .filter((part) => !placed.has(part.id))
    .map((part) => ({ value: part.id, label: `${part.partNumber} · ${part.title}` }));

  const handleSubmit = (values: typeof form.values) =>
    placePart.mutate(
      { partId: values.partId!, position: values.position.trim(), sortOrder: assembly.parts.length },
      { onSuccess: () => form.reset(), onError: (error) => notifyError('The part was not placed', error) },
    );

  return (
    <form onSubmit={form.onSubmit(handleSubmit)} aria-label="Place a part" noValidate>
      <Group align="flex-start" gap="sm" wrap="wrap">
        <Select
          label="Part"
          placeholder={parts.isPending ? 'Loading parts…' : choices.length ? 'Pick a part' : 'Every part is placed'}
          data={choices}
          searchable
          w={320}
          nothingFoundMessage="No part matches"
          {...form.getInputProps('partId')}
        />
        <Autocomplete label="Position" placeholder="input side" data={POSITIONS} w={200} {...form.getInputProps('position')} />
        <Button type="submit" mt={25} loading={placePart.isPending}>
          Place part
        </Button>
      </Group>
    </form>
  );
}
