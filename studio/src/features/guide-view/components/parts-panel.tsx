import { List, Paper, Stack, Table, Text, Title } from '@mantine/core';
import type { GuidePart } from '../api/types';

/** The parts of the guide's assembly, where each one goes. */
export function PartsPanel({ parts }: { parts: GuidePart[] }) {
  return (
    <Paper withBorder p="md" component="section" aria-labelledby="guide-parts-heading" data-testid="guide-parts">
      <Stack gap="sm">
        <Title order={2} size="h4" id="guide-parts-heading">
          Parts
        </Title>
        {parts.length === 0 ? (
          <Text size="sm" c="dimmed">
            This guide lists no parts.
          </Text>
        ) : (
          <Table.ScrollContainer minWidth={300}>
            <Table striped verticalSpacing={6} aria-labelledby="guide-parts-heading">
              <Table.Thead>
                <Table.Tr>
                  <Table.Th scope="col">Part number</Table.Th>
                  <Table.Th scope="col">Part</Table.Th>
                  <Table.Th scope="col">Where it goes</Table.Th>
                </Table.Tr>
              </Table.Thead>
              <Table.Tbody>
                {parts.map((part, index) => (
                  <Table.Tr key={`${part.partNumber}-${index}`}>
                    <Table.Td style={{ fontVariantNumeric: 'tabular-nums', whiteSpace: 'nowrap' }}>{part.partNumber}</Table.Td>
                    <Table.Td>
                      <Text size="sm">{part.title}</Text>
                      <Text size="xs" c="dimmed">
                        {[part.maker, part.category].filter(Boolean).join(' · ')}
                      </Text>
                    </Table.Td>
                    <Table.Td>{part.position}</Table.Td>
                  </Table.Tr>
                ))}
              </Table.Tbody>
            </Table>
          </Table.ScrollContainer>
        )}
      </Stack>
    </Paper>
  );
}

function ItemList({ id, title, items, empty }: { id: string; title: string; items: string[]; empty: string }) {
  return (
    <Stack gap={6}>
      <Title order={3} size="h5" id={id}>
        {title}
      </Title>
      {items.length === 0 ? (
        <Text size="sm" c="dimmed">
          {empty}
        </Text>
      ) : (
        <List size="sm" spacing={2} aria-labelledby={id}>
          {items.map((item, index) => (
            <List.Item key={`${item}-${index}`}>{item}</List.Item>
          ))}
        </List>
      )}
    </Stack>
  );
}

/** What to have at hand: tools, and what gets used up. */
export function SuppliesPanel({ tools, consumables }: { tools: string[]; consumables: string[] }) {
  return (
    <Paper withBorder p="md" component="section" aria-labelledby="guide-supplies-heading" data-testid="guide-supplies">
      <Stack gap="sm">
        <Title order={2} size="h4" id="guide-supplies-heading">
          Tools and consumables
        </Title>
        <ItemList id="guide-tools-heading" title="Tools" items={tools} empty="No tools listed." />
        <ItemList id="guide-consumables-heading" title="Consumables" items={consumables} empty="No consumables listed." />
      </Stack>
    </Paper>
  );
}
