import { ActionIcon, Button, FileButton, Group, Image, Paper, SimpleGrid, Stack, Text, Title } from '@mantine/core';
import { notifyError } from '@/lib/notify';
import { useAddPartPhoto, useRemovePartPhoto } from '../api/mutations';
import type { Part } from '../api/queries';
import { useWorkshopReadOnly } from '@/lib/workshop-access';

const ACCEPTED = 'image/png,image/jpeg,image/webp';

/** The part's photos (stamped numbers, damage, a box label), with upload and removal. */
export function PartPhotos({ workshopId, part }: { workshopId: string; part: Part }) {
  const addPhoto = useAddPartPhoto(workshopId, part.id);
  const removePhoto = useRemovePartPhoto(workshopId, part.id);
  const readOnly = useWorkshopReadOnly();

  const handleFile = (file: File | null) => {
    if (file) addPhoto.mutate(file, { onError: (error) => notifyError('Photo not added', error) });
  };

  return (
    <Stack gap="xs">
      <Group justify="space-between">
        <Title order={3}>Photos</Title>
        {!readOnly && (
          <FileButton onChange={handleFile} accept={ACCEPTED}>
            {(props) => (
              <Button {...props} variant="light" loading={addPhoto.isPending}>
                Add a photo
              </Button>
            )}
          </FileButton>
        )}
      </Group>
      {part.photos.length === 0 ? (
        <Text c="dimmed" size="sm">
          No photos yet. PNG, JPEG or WebP, up to 15 MB each.
        </Text>
      ) : (
        <SimpleGrid cols={{ base: 2, sm: 4 }}>
          {part.photos.map((photo, index) => (
            <Paper key={photo.id} withBorder p={4} pos="relative">
              <Image src={photo.url} alt={`${part.partNumber} photo ${index + 1}`} h={140} fit="cover" radius="sm" />
              {!readOnly && (
              <ActionIcon
                pos="absolute"
                top={8}
                right={8}
                variant="white"
                color="red"
                aria-label={`Remove photo ${index + 1}`}
                loading={removePhoto.isPending && removePhoto.variables === photo.id}
                onClick={() => removePhoto.mutate(photo.id, { onError: (error) => notifyError('Photo not removed', error) })}
              >
                ✕
              </ActionIcon>
              )}
            </Paper>
          ))}
        </SimpleGrid>
      )}
    </Stack>
  );
}
