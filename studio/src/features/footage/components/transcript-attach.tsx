import { Alert, Button, FileInput, Group, Modal, SegmentedControl, Select, Stack, Text, Textarea } from '@mantine/core';
import { useState } from 'react';
import { notifyDone } from '@/lib/notify';
import { useAttachTranscript } from '../api/mutations';
import type { TranscriptFormat } from '../api/types';
import { formatBytes } from './format';

const FORMATS: { value: TranscriptFormat | 'auto'; label: string }[] = [
  { value: 'auto', label: 'Detect automatically' },
  { value: 'webvtt', label: 'WebVTT (.vtt)' },
  { value: 'srt', label: 'SubRip (.srt)' },
  { value: 'timestamped', label: 'Timestamped lines ([1:02] text)' },
];

export interface TranscriptAttachProps {
  workshopId: string;
  footageId: string;
  opened: boolean;
  replacing: boolean;
  maxBytes: number;
  onClose: () => void;
}

/** Attach or replace a transcript by pasting it or choosing a file; a bad line is named, nothing is stored. */
export function TranscriptAttach({ workshopId, footageId, opened, replacing, maxBytes, onClose }: TranscriptAttachProps) {
  const attach = useAttachTranscript(workshopId, footageId);
  const [mode, setMode] = useState<'file' | 'paste'>('file');
  const [text, setText] = useState('');
  const [file, setFile] = useState<File | null>(null);
  const [format, setFormat] = useState<TranscriptFormat | 'auto'>('auto');
  const tooLarge = file !== null && file.size > maxBytes;
  const ready = mode === 'paste' ? text.trim() !== '' : file !== null && !tooLarge;

  const handleClose = () => {
    attach.reset();
    onClose();
  };

  const handleSubmit = () => {
    const input = mode === 'paste' ? { kind: 'paste' as const, text, format } : file && { kind: 'file' as const, file, format };
    if (!input) return;
    attach.mutate(input, {
      onSuccess: (transcript) => {
        notifyDone(`Transcript revision ${transcript.revision} attached: ${transcript.cueCount} cues.`);
        setText('');
        setFile(null);
        handleClose();
      },
    });
  };

  return (
    <Modal opened={opened} onClose={handleClose} title={replacing ? 'Replace the transcript' : 'Attach a transcript'} size="lg">
      <Stack>
        <Text size="sm" c="dimmed">
          WebVTT, SubRip or lines that start with a time (“[1:02] text”), up to {formatBytes(maxBytes)}.
          {replacing && ' The current transcript is kept as an earlier revision.'}
        </Text>
        <SegmentedControl
          value={mode}
          onChange={(value) => setMode(value as 'file' | 'paste')}
          data={[
            { value: 'file', label: 'Choose a file' },
            { value: 'paste', label: 'Paste text' },
          ]}
        />
        {mode === 'file' ? (
          <FileInput
            label="Transcript file"
            placeholder="Choose a .vtt, .srt or .txt file"
            accept=".vtt,.srt,.txt,text/vtt,text/plain,application/x-subrip"
            value={file}
            onChange={setFile}
            clearable
            error={tooLarge ? `The file is ${formatBytes(file.size)}; the largest accepted is ${formatBytes(maxBytes)}.` : undefined}
          />
        ) : (
          <Textarea
            label="Transcript"
            placeholder={'WEBVTT\n\n00:00:01.000 --> 00:00:04.000\nFirst line…'}
            autosize
            minRows={8}
            maxRows={16}
            value={text}
            onChange={(event) => setText(event.currentTarget.value)}
            styles={{ input: { fontFamily: 'ui-monospace, monospace', fontSize: 13 } }}
          />
        )}
        <Select
          label="Format"
          data={FORMATS}
          value={format}
          allowDeselect={false}
          onChange={(value) => value && setFormat(value as TranscriptFormat | 'auto')}
        />
        {attach.isError && (
          <Alert color="red" title="The transcript was not attached" data-testid="transcript-error">
            {attach.error.message}
          </Alert>
        )}
        <Group justify="flex-end">
          <Button variant="default" onClick={handleClose}>
            Close
          </Button>
          <Button onClick={handleSubmit} disabled={!ready} loading={attach.isPending}>
            {replacing ? 'Replace transcript' : 'Attach transcript'}
          </Button>
        </Group>
      </Stack>
    </Modal>
  );
}
