import '@mantine/dropzone/styles.css';
import { Alert, CloseButton, Group, Image, Input, List, Paper, Stack, Text } from '@mantine/core';
import { Dropzone, type FileRejection } from '@mantine/dropzone';
import { useEffect, useRef, useState } from 'react';
import { FIT_REPORT_LIMITS } from '../api/queries';
import { addPhotos, formatSize, PHOTO_TYPES } from './photo-rules';

function CameraIcon() {
  return (
    <svg width="36" height="36" viewBox="0 0 24 24" fill="none" stroke="currentColor" strokeWidth="1.5" aria-hidden="true">
      <path d="M3 8h3l2-3h8l2 3h3v11H3z" />
      <circle cx="12" cy="13" r="4" />
    </svg>
  );
}

/** A chosen photo's preview, made from the file in this browser (nothing is sent yet). */
function Preview({ file }: { file: File }) {
  const image = useRef<HTMLImageElement>(null);
  // The object URL holds the file in memory: make it while shown, release it after.
  useEffect(() => {
    if (!image.current || typeof URL.createObjectURL !== 'function') return;
    const made = URL.createObjectURL(file);
    image.current.src = made;
    return () => URL.revokeObjectURL(made);
  }, [file]);
  return <Image ref={image} alt="" w={48} h={48} radius="sm" fit="cover" />;
}

export interface PhotoPickerProps {
  photos: File[];
  onChange: (photos: File[]) => void;
}

/**
 * Photos for a fit report: images only, up to six, each checked for type and size here so a wrong
 * file is refused with a sentence before anything is sent.
 */
export function PhotoPicker({ photos, onChange }: PhotoPickerProps) {
  const [problems, setProblems] = useState<string[]>([]);
  const full = photos.length >= FIT_REPORT_LIMITS.photosMax;

  const handleFiles = (files: File[]) => {
    const result = addPhotos(photos, files);
    setProblems(result.problems);
    if (result.photos.length !== photos.length) onChange(result.photos);
  };
  // One drop, one decision: the dropzone's own refusals (other types) are told in our words with the rest.
  const handleDrop = (accepted: File[], rejections: FileRejection[]) =>
    handleFiles([...accepted, ...rejections.map((rejection) => rejection.file)]);

  const handleRemove = (index: number) => {
    setProblems([]);
    onChange(photos.filter((_, position) => position !== index));
  };

  return (
    <Input.Wrapper
      label="Photos"
      description={`Optional: up to ${FIT_REPORT_LIMITS.photosMax} JPEG, PNG or WebP images, ${formatSize(FIT_REPORT_LIMITS.photoMaxBytes)} each. They are sent once the report is made.`}
    >
      <Stack gap="xs" mt={6}>
        <Dropzone
          onDropAny={handleDrop}
          onDrop={() => {}}
          accept={PHOTO_TYPES}
          multiple
          disabled={full}
          aria-label="Add photos"
          data-testid="report-photos-dropzone"
          p="sm"
        >
          <Group justify="center" gap="md" mih={70} style={{ pointerEvents: 'none' }}>
            <Text c="dimmed">
              <CameraIcon />
            </Text>
            <Text size="sm">
              {full ? `${FIT_REPORT_LIMITS.photosMax} photos chosen: that is the most a report takes.` : 'Drop photos here, or click to choose'}
            </Text>
          </Group>
        </Dropzone>
        {problems.length > 0 && (
          <Alert color="red" p="xs" data-testid="report-photo-problems" withCloseButton={false}>
            <Group align="flex-start" wrap="nowrap" justify="space-between">
              <List size="sm">
                {problems.map((problem) => (
                  <List.Item key={problem}>{problem}</List.Item>
                ))}
              </List>
              <CloseButton aria-label="Dismiss" size="sm" onClick={() => setProblems([])} />
            </Group>
          </Alert>
        )}
        {photos.length > 0 && (
          <Stack gap={4} component="ul" aria-label="Chosen photos" style={{ listStyle: 'none', margin: 0, padding: 0 }}>
            {photos.map((photo, index) => (
              <Paper component="li" key={`${index}:${photo.name}`} withBorder p={4} data-testid="chosen-photo">
                <Group gap="sm" wrap="nowrap">
                  <Preview file={photo} />
                  <Text size="sm" truncate style={{ flex: 1 }}>
                    {photo.name}
                  </Text>
                  <Text size="xs" c="dimmed">
                    {formatSize(photo.size)}
                  </Text>
                  <CloseButton aria-label={`Remove ${photo.name}`} onClick={() => handleRemove(index)} />
                </Group>
              </Paper>
            ))}
          </Stack>
        )}
      </Stack>
    </Input.Wrapper>
  );
}
