import '@mantine/dropzone/styles.css';
import { Alert, CloseButton, Group, List, Skeleton, Stack, Text } from '@mantine/core';
import { Dropzone, type FileRejection } from '@mantine/dropzone';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { footageQueries } from '../api/queries';
import { acceptMap, checkFootageFile } from '../upload/check-file';
import { formatBytes } from './format';

export interface FootageDropzoneProps {
  workshopId: string;
  onFiles: (files: File[]) => void;
}

const TYPE_NAMES: Record<string, string> = { mp4: 'MP4', mov: 'MOV', webm: 'WebM', mkv: 'MKV' };

function FilmIcon() {
  return (
    <svg width="44" height="44" viewBox="0 0 24 24" fill="none" stroke="currentColor" strokeWidth="1.5" aria-hidden="true">
      <rect x="3" y="4" width="18" height="16" rx="2" />
      <path d="M7 4v16M17 4v16M3 8h4M3 12h4M3 16h4M17 8h4M17 12h4M17 16h4" />
    </svg>
  );
}

/**
 * Where a creator drops video files. Wrong types and sizes are refused here, before a byte is
 * sent, with a sentence per file; accepted files start uploading straight to storage.
 */
export function FootageDropzone({ workshopId, onFiles }: FootageDropzoneProps) {
  const limits = useQuery(footageQueries.limits(workshopId));
  const [problems, setProblems] = useState<string[]>([]);

  if (limits.isPending) return <Skeleton height={150} />;
  if (limits.isError) return <Alert color="red" title="Uploads are unavailable">{limits.error.message}</Alert>;
  const rules = limits.data;

  const handleDrop = (files: File[]) => {
    setProblems([]);
    onFiles(files);
  };

  const handleReject = (rejections: FileRejection[]) => {
    setProblems(
      rejections.map(
        ({ file, errors }) =>
          checkFootageFile(file, rules) ?? `"${file.name}" was refused: ${errors.map((error) => error.message).join('; ')}`,
      ),
    );
  };

  const names = rules.types.map((type) => TYPE_NAMES[type.extension] ?? type.extension.toUpperCase());
  const kinds = names.length > 1 ? `${names.slice(0, -1).join(', ')} or ${names[names.length - 1]}` : names.join('');
  return (
    <Stack gap="xs">
      <Dropzone
        onDrop={handleDrop}
        onReject={handleReject}
        accept={acceptMap(rules)}
        maxSize={rules.maxBytes}
        validator={(file) => {
          const problem = checkFootageFile(file, rules);
          return problem ? { code: 'footage-rules', message: problem } : null;
        }}
        multiple
        aria-label="Upload footage"
        data-testid="footage-dropzone"
      >
        <Group justify="center" gap="lg" mih={130} style={{ pointerEvents: 'none' }}>
          <Dropzone.Accept>
            <Text c="patina">
              <FilmIcon />
            </Text>
          </Dropzone.Accept>
          <Dropzone.Reject>
            <Text c="red">
              <FilmIcon />
            </Text>
          </Dropzone.Reject>
          <Dropzone.Idle>
            <Text c="dimmed">
              <FilmIcon />
            </Text>
          </Dropzone.Idle>
          <div>
            <Text size="lg" fw={500}>
              Drop footage here, or click to choose files
            </Text>
            <Text size="sm" c="dimmed">
              {kinds} video, up to {formatBytes(rules.maxBytes)} each. Files go straight to storage in parts; you can pause and
              resume.
            </Text>
          </div>
        </Group>
      </Dropzone>
      {problems.length > 0 && (
        <Alert
          color="red"
          title={problems.length === 1 ? 'This file was not uploaded' : 'These files were not uploaded'}
          data-testid="dropzone-problems"
          withCloseButton={false}
        >
          <Group align="flex-start" wrap="nowrap" justify="space-between">
            <List size="sm">
              {problems.map((problem) => (
                <List.Item key={problem}>{problem}</List.Item>
              ))}
            </List>
            <CloseButton aria-label="Dismiss" onClick={() => setProblems([])} />
          </Group>
        </Alert>
      )}
    </Stack>
  );
}
