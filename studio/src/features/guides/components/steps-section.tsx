import { Button, Grid, Group, Stack, Text, Title } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { guideQueries } from '../api/queries';
import type { Guide } from '../api/types';
import { StepForm } from './step-form';
import { StepList } from './step-list';
import { StepPlayer, useStepPlayer } from './step-player';
import { useWorkshopReadOnly } from '@/lib/workshop-access';

/** The guide's steps beside a small player of its main footage, to find and set each step's moment. */
export function StepsSection({ workshopId, guide }: { workshopId: string; guide: Guide }) {
  const footage = useQuery({ ...guideQueries.footageChoices(workshopId, guide.buildId), enabled: guide.footageId !== null });
  const mainFootage = footage.data?.find((item) => item.id === guide.footageId) ?? null;
  const player = useStepPlayer();
  const playable = mainFootage?.state === 'ready';
  // 'new' while adding a step, a step's id while changing it.
  const [editing, setEditing] = useState<string | null>(null);
  // Site admins (not members) and disabled workshops read the guide without the controls the API would refuse.
  const readOnly = useWorkshopReadOnly();
  const editingStep = guide.steps.find((step) => step.id === editing) ?? null;

  const form =
    editing === null ? null : (
      <StepForm
        key={editing}
        workshopId={workshopId}
        guideId={guide.id}
        step={editingStep}
        mainFootage={mainFootage}
        readPositionMs={playable ? player.readPositionMs : null}
        onDone={() => setEditing(null)}
      />
    );

  return (
    <Stack gap="sm">
      <Group justify="space-between">
        <Title order={3}>Steps</Title>
        <Text size="sm" c="dimmed">
          {guide.steps.length === 1 ? '1 step' : `${guide.steps.length} steps`}
        </Text>
      </Group>
      <Grid gap="md">
        <Grid.Col span={{ base: 12, md: mainFootage ? 7 : 12 }}>
          <Stack gap="sm">
            <StepList
              workshopId={workshopId}
              guideId={guide.id}
              steps={guide.steps}
              mainFootageId={guide.footageId}
              onSeek={playable ? player.seek : undefined}
              onEdit={(step) => setEditing(step.id)}
              editingStepId={editing}
              editor={form}
            />
            {editing === null && !readOnly && (
              <Group>
                <Button onClick={() => setEditing('new')}>Add step</Button>
              </Group>
            )}
          </Stack>
        </Grid.Col>
        {mainFootage && (
          <Grid.Col span={{ base: 12, md: 5 }}>
            {/* Stays in view while the steps scroll, so a moment can be found for any of them. */}
            <div style={{ position: 'sticky', top: 'calc(var(--app-shell-header-height, 60px) + var(--mantine-spacing-md))' }}>
              <StepPlayer workshopId={workshopId} footage={mainFootage} control={player} />
            </div>
          </Grid.Col>
        )}
      </Grid>
    </Stack>
  );
}
