import { Alert, Anchor, Badge, Breadcrumbs, Button, Card, Group, Modal, Skeleton, Stack, Text, Title } from '@mantine/core';
import { PartPhotos } from './part-photos';
import { useDisclosure } from '@mantine/hooks';
import { useQuery } from '@tanstack/react-query';
import { useState, type ReactNode } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { ConfirmButton } from '@/components/confirm-button';
import { paths } from '@/config/paths';
import { notifyError } from '@/lib/notify';
import { useAddFeature, useDeletePart, useRemoveFeature, useUpdateFeature, useUpdatePart } from '../api/mutations';
import { partQueries, type PartFeature } from '../api/queries';
import { FeatureForm } from './feature-form';
import { PartForm } from './part-form';
import { CATEGORY_LABELS, describeFeature, FEATURE_KIND_LABELS, SOURCE_LABELS } from './part-labels';
import { useWorkshopReadOnly } from '@/lib/workshop-access';

export interface PartDetailProps {
  workshopId: string;
  partId: string;
  /** Readings of a feature, supplied by the page (measurements are their own part of the studio). */
  renderReadings?: (feature: PartFeature) => ReactNode;
}

export function PartDetail({ workshopId, partId, renderReadings }: PartDetailProps) {
  const part = useQuery(partQueries.detail(workshopId, partId));
  const [editingPart, editPartModal] = useDisclosure(false);
  const [addingFeature, addFeatureModal] = useDisclosure(false);
  const [editedFeature, setEditedFeature] = useState<PartFeature | null>(null);
  const updatePart = useUpdatePart(workshopId, partId);
  const deletePart = useDeletePart(workshopId);
  const addFeature = useAddFeature(workshopId, partId);
  const updateFeature = useUpdateFeature(workshopId, partId);
  const removeFeature = useRemoveFeature(workshopId, partId);
  const navigate = useNavigate();
  // Site admins (not members) and disabled workshops read the part without controls the API would refuse.
  const readOnly = useWorkshopReadOnly();

  if (part.isPending) return <Skeleton height={240} />;
  if (part.isError) return <Alert color="red" title="Part not found">{part.error.message}</Alert>;
  const data = part.data;

  return (
    <Stack>
      <Breadcrumbs>
        <Anchor component={Link} to={paths.parts.to(workshopId)}>
          Parts
        </Anchor>
        <Text ff="monospace">{data.partNumber}</Text>
      </Breadcrumbs>
      <Group justify="space-between" align="flex-start">
        <div>
          <Title order={2}>
            <Text span inherit ff="monospace">
              {data.partNumber}
            </Text>{' '}
            {data.title}
          </Title>
          <Group gap="xs" mt={4}>
            {data.maker && <Text c="dimmed">{data.maker}</Text>}
            <Badge variant="light">{CATEGORY_LABELS[data.category]}</Badge>
            <Badge variant="outline" color="gray">
              {SOURCE_LABELS[data.source]}
            </Badge>
          </Group>
        </div>
        {!readOnly && (
        <Group>
          <Button variant="default" onClick={editPartModal.open}>
            Edit part
          </Button>
          <ConfirmButton
            variant="subtle"
            color="red"
            question={`Remove ${data.partNumber}?`}
            detail="Its features and their readings go with it. A part used in an assembly cannot be removed."
            confirmLabel="Remove part"
            onConfirm={() =>
              deletePart.mutate(partId, {
                onSuccess: () => navigate(paths.parts.to(workshopId)),
                onError: (error) => notifyError('The part was not removed', error),
              })
            }
          >
            Remove
          </ConfirmButton>
        </Group>
        )}
      </Group>
      {data.notes && (
        <Text maw={760} style={{ whiteSpace: 'pre-wrap' }}>
          {data.notes}
        </Text>
      )}

      <PartPhotos workshopId={workshopId} part={data} />

      <Group justify="space-between" mt="md">
        <Title order={3}>Features</Title>
        {!readOnly && <Button onClick={addFeatureModal.open}>Add feature</Button>}
      </Group>
      {data.features.length === 0 && (
        <Text c="dimmed">
          No features yet. Add what decides the fit: a spline, a bore or shaft diameter, an overall length.
        </Text>
      )}
      {data.features.map((feature) => (
        <Card key={feature.id} withBorder padding="md" data-testid="feature-card" aria-label={`Feature ${feature.name}`}>
          <Group justify="space-between" align="flex-start" wrap="nowrap">
            <div>
              <Group gap="xs">
                <Text fw={600}>{feature.name}</Text>
                <Badge variant="light" color="gray">
                  {FEATURE_KIND_LABELS[feature.kind]}
                </Badge>
              </Group>
              <Text size="sm">{describeFeature(feature)}</Text>
            </div>
            {!readOnly && (
            <Group gap="xs" wrap="nowrap">
              <Button size="xs" variant="default" onClick={() => setEditedFeature(feature)}>
                Edit
              </Button>
              <ConfirmButton
                size="xs"
                variant="subtle"
                color="red"
                question={`Remove the feature "${feature.name}"?`}
                detail="Its readings are removed with it. A feature used by an assembly interface cannot be removed."
                confirmLabel="Remove feature"
                onConfirm={() =>
                  removeFeature.mutate(feature.id, { onError: (error) => notifyError('The feature was not removed', error) })
                }
              >
                Remove
              </ConfirmButton>
            </Group>
            )}
          </Group>
          {renderReadings && feature.kind !== 'free' && <div style={{ marginTop: 12 }}>{renderReadings(feature)}</div>}
        </Card>
      ))}

      <Modal opened={editingPart} onClose={editPartModal.close} title={`Edit ${data.partNumber}`} size="lg">
        <PartForm
          initial={data}
          submitLabel="Save part"
          pending={updatePart.isPending}
          onSubmit={(input, { onError }) => updatePart.mutate(input, { onSuccess: editPartModal.close, onError })}
        />
      </Modal>
      <Modal opened={addingFeature} onClose={addFeatureModal.close} title={`New feature of ${data.partNumber}`} size="lg">
        <FeatureForm
          pending={addFeature.isPending}
          onCancel={addFeatureModal.close}
          onSubmit={(input, { onError }) => addFeature.mutate(input, { onSuccess: addFeatureModal.close, onError })}
        />
      </Modal>
      <Modal opened={editedFeature !== null} onClose={() => setEditedFeature(null)} title={`Edit ${editedFeature?.name ?? 'feature'}`} size="lg">
        {editedFeature && (
          <FeatureForm
            key={editedFeature.id}
            feature={editedFeature}
            pending={updateFeature.isPending}
            onCancel={() => setEditedFeature(null)}
            onSubmit={(input, { onError }) =>
              updateFeature.mutate({ featureId: editedFeature.id, input }, { onSuccess: () => setEditedFeature(null), onError })
            }
          />
        )}
      </Modal>
    </Stack>
  );
}
