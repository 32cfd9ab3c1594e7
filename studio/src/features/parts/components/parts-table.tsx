import { Alert, Anchor, Badge, Button, Group, Modal, NumberInput, Select, Skeleton, Stack, Table, Text, TextInput, Title } from '@mantine/core';
import { useDebouncedValue, useDisclosure } from '@mantine/hooks';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useWorkshopReadOnly } from '@/lib/workshop-access';
import { useCreatePart } from '../api/mutations';
import { FEATURE_KINDS, PART_CATEGORIES, partQueries, type FeatureKind, type PartCategory, type PartFilters } from '../api/queries';
import { PartForm } from './part-form';
import { CATEGORY_LABELS, describeFeature, FEATURE_KIND_LABELS, SOURCE_LABELS } from './part-labels';

export function PartsTable({ workshopId }: { workshopId: string }) {
  const [search, setSearch] = useState('');
  const [category, setCategory] = useState<PartCategory | null>(null);
  const [featureKind, setFeatureKind] = useState<FeatureKind | null>(null);
  const [teeth, setTeeth] = useState<number | string>('');
  const [debouncedSearch] = useDebouncedValue(search.trim(), 250);
  const filters: PartFilters = {
    q: debouncedSearch || undefined,
    category: category ?? undefined,
    featureKind: featureKind ?? undefined,
    splineTeeth: typeof teeth === 'number' ? teeth : undefined,
  };
  const parts = useQuery(partQueries.list(workshopId, filters));
  const [creating, { open, close }] = useDisclosure(false);
  const createPart = useCreatePart(workshopId);
  const navigate = useNavigate();
  const readOnly = useWorkshopReadOnly();

  return (
    <Stack>
      <Group justify="space-between">
        <Title order={3}>Parts</Title>
        {!readOnly && <Button onClick={open}>New part</Button>}
      </Group>
      <Group align="flex-end" gap="sm" wrap="wrap" role="search" aria-label="Filter parts">
        <TextInput
          label="Part number, title or maker"
          placeholder="hl 2107"
          value={search}
          onChange={(event) => setSearch(event.currentTarget.value)}
          w={240}
        />
        <Select
          label="Category"
          placeholder="Any"
          clearable
          data={PART_CATEGORIES.map((value) => ({ value, label: CATEGORY_LABELS[value] }))}
          value={category}
          onChange={(value) => setCategory(value as PartCategory | null)}
          w={170}
        />
        <Select
          label="Has a feature of kind"
          placeholder="Any"
          clearable
          data={FEATURE_KINDS.map((value) => ({ value, label: FEATURE_KIND_LABELS[value] }))}
          value={featureKind}
          onChange={(value) => setFeatureKind(value as FeatureKind | null)}
          w={190}
        />
        <NumberInput label="Spline teeth" placeholder="Any" min={1} allowDecimal={false} value={teeth} onChange={setTeeth} w={130} />
      </Group>

      {parts.isPending && <Skeleton height={160} />}
      {parts.isError && <Alert color="red" title="Parts could not be loaded">{parts.error.message}</Alert>}
      {parts.data?.length === 0 && (
        <Text c="dimmed">
          {filters.q || filters.category || filters.featureKind || filters.splineTeeth
            ? 'No part matches these filters.'
            : 'No parts yet. Record each candidate part with its part number and the features that decide the fit.'}
        </Text>
      )}
      {parts.data && parts.data.length > 0 && (
        <Table.ScrollContainer minWidth={720}>
          <Table striped highlightOnHover aria-label="Parts">
            <Table.Thead>
              <Table.Tr>
                <Table.Th>Part number</Table.Th>
                <Table.Th>Title</Table.Th>
                <Table.Th>Maker</Table.Th>
                <Table.Th>Category</Table.Th>
                <Table.Th>Source</Table.Th>
                <Table.Th>Features</Table.Th>
              </Table.Tr>
            </Table.Thead>
            <Table.Tbody>
              {parts.data.map((part) => (
                <Table.Tr key={part.id}>
                  <Table.Td>
                    <Anchor component={Link} to={paths.part.to(workshopId, part.id)} fw={600} ff="monospace" style={{ whiteSpace: 'nowrap' }}>
                      {part.partNumber}
                    </Anchor>
                  </Table.Td>
                  <Table.Td>{part.title}</Table.Td>
                  <Table.Td>{part.maker || '—'}</Table.Td>
                  <Table.Td>
                    <Badge variant="light" style={{ minWidth: 'max-content' }}>
                      {CATEGORY_LABELS[part.category]}
                    </Badge>
                  </Table.Td>
                  <Table.Td>{SOURCE_LABELS[part.source]}</Table.Td>
                  <Table.Td>
                    {part.features.length === 0 ? (
                      <Text size="sm" c="dimmed">
                        none yet
                      </Text>
                    ) : (
                      <Stack gap={2}>
                        {part.features.map((feature) => (
                          <Text key={feature.id} size="sm">
                            <Text span fw={500} size="sm">
                              {feature.name}:
                            </Text>{' '}
                            {describeFeature(feature)}
                          </Text>
                        ))}
                      </Stack>
                    )}
                  </Table.Td>
                </Table.Tr>
              ))}
            </Table.Tbody>
          </Table>
        </Table.ScrollContainer>
      )}

      <Modal opened={creating} onClose={close} title="New part" size="lg">
        <PartForm
          submitLabel="Create part"
          pending={createPart.isPending}
          onSubmit={(input, { onError }) =>
            createPart.mutate(input, {
              onSuccess: (part) => {
                close();
                navigate(paths.part.to(workshopId, part.id));
              },
              onError,
            })
          }
        />
      </Modal>
    </Stack>
  );
}
