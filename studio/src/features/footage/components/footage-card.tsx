import { Anchor, AspectRatio, Badge, Box, Button, Card, FileButton, Group, Image, Progress, Stack, Text } from '@mantine/core';
import { Link } from 'react-router-dom';
import { ConfirmButton } from '@/components/confirm-button';
import { DeleteWithImpact } from '@/components/delete-with-impact';
import { RenameButton } from '@/components/rename-button';
import { paths } from '@/config/paths';
import { notifyError } from '@/lib/notify';
import { useWorkshopReadOnly } from '@/lib/workshop-access';
import { useDeleteFootage, useRenameFootage } from '../api/mutations';
import type { Footage } from '../api/types';
import { FootageStateBadge } from './footage-state-badge';
import { formatClock } from '@/lib/clock';
import { formatBytes } from './format';
import { RenditionsStatus } from './renditions-status';

export interface FootageCardProps {
  footage: Footage;
  /** This tab is sending the file right now (its progress shows above the list). */
  uploadingHere: boolean;
  onResume: (footage: Footage, file: File) => void;
}

function PosterArea({ footage, uploadingHere }: { footage: Footage; uploadingHere: boolean }) {
  return (
    <AspectRatio ratio={16 / 9}>
      {footage.posterUrl ? (
        <Image src={footage.posterUrl} alt={`Poster frame of ${footage.title}`} fit="cover" />
      ) : (
        <Box bg="gray.1" style={{ display: 'flex', alignItems: 'center', justifyContent: 'center' }}>
          <Text size="sm" c="dimmed">
            {footage.state === 'failed'
              ? 'No picture'
              : footage.state === 'processing'
                ? 'Checking the video and making a poster frame…'
                : uploadingHere
                  ? 'Uploading: progress above'
                  : 'Upload interrupted'}
          </Text>
        </Box>
      )}
    </AspectRatio>
  );
}

/** One footage of a build: poster, length, size and its state as it changes. */
export function FootageCard({ footage, uploadingHere, onResume }: FootageCardProps) {
  const deleteFootage = useDeleteFootage(footage.workshopId);
  const renameFootage = useRenameFootage(footage.workshopId, footage.id);
  const playerPath = paths.footage.to(footage.workshopId, footage.id);
  const readOnly = useWorkshopReadOnly();
  const interrupted = footage.state === 'uploading' && !uploadingHere && footage.upload !== null;

  const handleDelete = () =>
    deleteFootage.mutate(footage.id, { onError: (error) => notifyError('The footage could not be deleted', error) });

  return (
    <Card withBorder padding="sm" data-testid="footage-card" data-footage-id={footage.id}>
      <Card.Section pos="relative">
        {footage.state === 'ready' ? (
          <Link to={playerPath} aria-label={`Play ${footage.title}`}>
            <PosterArea footage={footage} uploadingHere={uploadingHere} />
          </Link>
        ) : (
          <PosterArea footage={footage} uploadingHere={uploadingHere} />
        )}
        {footage.durationMs !== null && (
          <Badge pos="absolute" bottom={8} right={8} color="dark" variant="filled" radius="sm">
            {formatClock(footage.durationMs)}
          </Badge>
        )}
      </Card.Section>
      <Stack gap={6} mt="sm">
        <Group justify="space-between" wrap="nowrap" gap="xs">
          {footage.state === 'ready' ? (
            <Anchor component={Link} to={playerPath} fw={500} lineClamp={1}>
              {footage.title}
            </Anchor>
          ) : (
            <Text fw={500} lineClamp={1}>
              {footage.title}
            </Text>
          )}
          <FootageStateBadge state={footage.state} interrupted={interrupted} />
        </Group>
        <Text size="xs" c="dimmed">
          {formatBytes(footage.sizeBytes)}
          {footage.width && footage.height ? ` · ${footage.width}×${footage.height}` : ''}
          {footage.frameRate ? ` · ${footage.frameRate} fps` : ''}
          {footage.transcript ? ` · transcript, ${footage.transcript.cueCount} cues` : ''}
        </Text>
        <RenditionsStatus footage={footage} compact />
        {footage.state === 'failed' && footage.failureReason && (
          <Text size="sm" c="red">
            {footage.failureReason}
          </Text>
        )}
        {interrupted && !readOnly && footage.upload && (
          <Stack gap={4}>
            <Progress value={(footage.upload.uploadedBytes / footage.sizeBytes) * 100} color="gray" size="sm" />
            <Text size="sm">
              Upload interrupted at {Math.floor((footage.upload.uploadedBytes / footage.sizeBytes) * 100)} % (
              {footage.upload.completedPartCount} of {footage.upload.partCount} parts). Choose “{footage.originalName}” again to
              continue: browsers cannot reopen a file by themselves.
            </Text>
            <FileButton onChange={(file) => file && onResume(footage, file)}>
              {(props) => (
                <Button size="xs" {...props}>
                  Resume: choose the file
                </Button>
              )}
            </FileButton>
          </Stack>
        )}
        {!uploadingHere && !readOnly && (
          <Group gap="xs" justify="flex-end">
            {footage.state === 'uploading' ? (
              <ConfirmButton
                size="xs"
                variant="subtle"
                color="red"
                question={`Cancel the upload of “${footage.title}”?`}
                detail="The parts sent so far are discarded and the footage is removed."
                confirmLabel="Cancel upload"
                onConfirm={handleDelete}
                loading={deleteFootage.isPending}
              >
                Cancel upload
              </ConfirmButton>
            ) : (
              <>
                <RenameButton
                  size="xs"
                  what="footage"
                  label="Title"
                  current={footage.title}
                  maxLength={200}
                  aria-label={`Rename ${footage.title}`}
                  onRename={(title) => renameFootage.mutateAsync(title)}
                />
                <DeleteWithImpact
                  size="xs"
                  what="footage"
                  name={footage.title}
                  aria-label={`Delete ${footage.title}`}
                  impactPath={`/workshops/${footage.workshopId}/footage/${footage.id}/deletion-impact`}
                  onDelete={() => deleteFootage.mutateAsync(footage.id)}
                >
                  Delete
                </DeleteWithImpact>
              </>
            )}
          </Group>
        )}
      </Stack>
    </Card>
  );
}
