import { Alert, Group, SimpleGrid, Skeleton, Stack, Text, Title } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import { notifyError } from '@/lib/notify';
import { useWorkshopReadOnly } from '@/lib/workshop-access';
import { footageQueries } from '../api/queries';
import type { Footage } from '../api/types';
import { useFootageUploads } from '../hooks/use-footage-uploads';
import { FootageCard } from './footage-card';
import { FootageDropzone } from './footage-dropzone';
import { UploadProgress } from './upload-progress';
import { WorkshopTranscriptSearch } from './workshop-transcript-search';

/** A build's footage: drop files to upload, watch them upload and process, open one to play it. */
export function BuildFootage({ workshopId, buildId }: { workshopId: string; buildId: string }) {
  const list = useQuery(footageQueries.list(workshopId, buildId));
  const { uploads, upload, resume } = useFootageUploads(workshopId, buildId);
  const activeHere = new Set(uploads.map((item) => item.plan.footageId));
  const readOnly = useWorkshopReadOnly();

  const handleFiles = (files: File[]) => {
    for (const file of files) {
      upload(file).catch((error: unknown) => notifyError(`“${file.name}” could not be uploaded`, error));
    }
  };

  const handleResume = (footage: Footage, file: File) => {
    resume(footage, file).catch((error: unknown) => notifyError('The upload could not be resumed', error));
  };

  return (
    <Stack gap="md">
      <Group justify="space-between" align="flex-end">
        <Title order={3}>Footage</Title>
        <WorkshopTranscriptSearch workshopId={workshopId} />
      </Group>
      {!readOnly && <FootageDropzone workshopId={workshopId} onFiles={handleFiles} />}
      {uploads.length > 0 && (
        <Stack gap="xs" aria-label="Uploads in progress">
          {uploads.map((item) => (
            <UploadProgress key={item.plan.footageId} upload={item} />
          ))}
        </Stack>
      )}
      {list.isPending && <Skeleton height={200} />}
      {list.isError && <Alert color="red" title="Footage could not be loaded">{list.error.message}</Alert>}
      {list.data?.length === 0 && uploads.length === 0 && (
        <Text c="dimmed">No footage yet. Drop the videos of this build above; each gets a poster frame and can carry a transcript.</Text>
      )}
      {list.data && list.data.length > 0 && (
        <SimpleGrid cols={{ base: 1, sm: 2, lg: 3 }} spacing="md">
          {list.data.map((footage) => (
            <FootageCard key={footage.id} footage={footage} uploadingHere={activeHere.has(footage.id)} onResume={handleResume} />
          ))}
        </SimpleGrid>
      )}
    </Stack>
  );
}
