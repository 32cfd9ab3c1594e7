import { Alert, Button, Group, List, Loader, Modal, Stack, Text, type ButtonProps } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { useQuery } from '@tanstack/react-query';
import { useState, type ReactNode } from 'react';
import { apiRequest } from '@/lib/api-client';
import type { ApiSchema } from '@/lib/api-types';

export type DeletionImpact = ApiSchema<'DeletionImpactDto'>;

export interface DeleteWithImpactProps extends ButtonProps {
  /** "build", "assembly", "footage": said in the question. */
  what: string;
  name: string;
  /** The API path of the counts (…/deletion-impact, after /api). */
  impactPath: string;
  /** Deletes; a rejection keeps the dialog open with its message. */
  onDelete: () => Promise<unknown>;
  children?: ReactNode;
}

/**
 * Delete, asked again in a dialog that says what goes with it (counted by the API when the dialog
 * opens): what is deleted along, and what is kept but loses its link. Nothing is deleted until the
 * red button is pressed.
 */
export function DeleteWithImpact({ what, name, impactPath, onDelete, children, ...buttonProps }: DeleteWithImpactProps) {
  const [opened, { open, close }] = useDisclosure(false);
  const [problem, setProblem] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const impact = useQuery({
    queryKey: ['deletion-impact', impactPath],
    queryFn: ({ signal }) => apiRequest<DeletionImpact>(impactPath, { signal }),
    enabled: opened,
    // Counts change with every edit elsewhere: ask afresh each time the question is asked.
    staleTime: 0,
    gcTime: 0,
  });
  const deleted = impact.data?.items.filter((item) => item.effect === 'deleted') ?? [];
  const unlinked = impact.data?.items.filter((item) => item.effect === 'unlinked') ?? [];

  const confirm = async () => {
    setProblem(null);
    setBusy(true);
    try {
      await onDelete();
      close();
    } catch (error) {
      setProblem(error instanceof Error ? error.message : String(error));
    } finally {
      setBusy(false);
    }
  };

  return (
    <>
      <Button color="red" variant="subtle" {...buttonProps} onClick={open}>
        {children ?? `Delete ${what}`}
      </Button>
      <Modal opened={opened} onClose={close} title={`Delete the ${what} “${name}”?`} size="md">
        <Stack gap="sm">
          {impact.isPending ? (
            <Group gap="xs">
              <Loader size="xs" />
              <Text size="sm">Counting what goes with it…</Text>
            </Group>
          ) : impact.isError ? (
            <Alert color="yellow" title="What goes with it could not be counted">
              {impact.error.message}
            </Alert>
          ) : (
            <>
              {deleted.length > 0 ? (
                <div>
                  <Text size="sm" fw={600}>
                    Deleted with it:
                  </Text>
                  <List size="sm" aria-label="Deleted with it">
                    {deleted.map((item) => (
                      <List.Item key={item.key}>{item.text}</List.Item>
                    ))}
                  </List>
                </div>
              ) : (
                <Text size="sm">Nothing else is deleted with it.</Text>
              )}
              {unlinked.length > 0 && (
                <div>
                  <Text size="sm" fw={600}>
                    Kept, but no longer linked:
                  </Text>
                  <List size="sm" aria-label="Kept, but no longer linked">
                    {unlinked.map((item) => (
                      <List.Item key={item.key}>{item.text}</List.Item>
                    ))}
                  </List>
                </div>
              )}
            </>
          )}
          <Text size="sm">This cannot be undone.</Text>
          {problem && (
            <Alert color="red" title={`The ${what} was not deleted`}>
              {problem}
            </Alert>
          )}
          <Group justify="flex-end">
            <Button variant="default" onClick={close}>
              Keep it
            </Button>
            <Button color="red" onClick={confirm} loading={busy} disabled={impact.isPending}>
              Delete {what}
            </Button>
          </Group>
        </Stack>
      </Modal>
    </>
  );
}
