import { Button, Group, Modal, NumberInput, Select, Stack, TextInput } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { notifyError } from '@/lib/notify';
import { useSaveMark } from '../api/mutations';
import { MARK_KINDS, markQueries, type Mark, type MarkKind } from '../api/queries';
import { formatMarkTime } from './format-time';
import { KIND_LOOK, LINK_OF_KIND } from './mark-kinds';

export interface MarkDraft {
  id?: string;
  startMs: number;
  kind: MarkKind;
  label: string;
  partId: string | null;
  measurementId: string | null;
}

export const draftOf = (mark: Mark): MarkDraft => ({
  id: mark.id,
  startMs: mark.startMs,
  kind: mark.kind,
  label: mark.label,
  partId: mark.partId,
  measurementId: mark.measurementId,
});

export interface MarkFormProps {
  workshopId: string;
  footageId: string;
  draft: MarkDraft | null;
  onClose: () => void;
}

/** Kind, link and label of a new or existing mark; opened by the pin key or button, or by Edit. */
export function MarkForm({ workshopId, footageId, draft, onClose }: MarkFormProps) {
  return (
    <Modal opened={draft !== null} onClose={onClose} title={draft?.id ? 'Edit mark' : `New mark at ${formatMarkTime(draft?.startMs ?? 0)}`}>
      {draft && <MarkFields key={draft.id ?? draft.startMs} workshopId={workshopId} footageId={footageId} draft={draft} onClose={onClose} />}
    </Modal>
  );
}

function MarkFields({ workshopId, footageId, draft, onClose }: { workshopId: string; footageId: string; draft: MarkDraft; onClose: () => void }) {
  const [value, setValue] = useState(draft);
  const save = useSaveMark(workshopId, footageId);
  const link = LINK_OF_KIND[value.kind];
  const parts = useQuery({ ...markQueries.parts(workshopId), enabled: link === 'partId' });
  const measurements = useQuery({ ...markQueries.measurements(workshopId), enabled: link === 'measurementId' });

  const handleSubmit = () => {
    save.mutate(
      {
        id: value.id,
        startMs: value.startMs,
        kind: value.kind,
        label: value.label,
        partId: link === 'partId' ? value.partId : null,
        measurementId: link === 'measurementId' ? value.measurementId : null,
      },
      { onSuccess: onClose, onError: (error) => notifyError('The mark was not saved', error) },
    );
  };

  return (
    <form
      onSubmit={(event) => {
        event.preventDefault();
        handleSubmit();
      }}
    >
      <Stack>
        <Select
          label="Kind"
          data={MARK_KINDS.map((kind) => ({ value: kind, label: KIND_LOOK[kind].name }))}
          value={value.kind}
          onChange={(kind) => kind && setValue({ ...value, kind: kind as MarkKind })}
          allowDeselect={false}
          data-autofocus
        />
        {link === 'partId' && (
          <Select
            label="Part shown"
            placeholder={parts.isPending ? 'Loading parts…' : 'Choose a part'}
            searchable
            clearable
            data={(parts.data ?? []).map((part) => ({ value: part.id, label: `${part.partNumber} — ${part.title}` }))}
            value={value.partId}
            onChange={(partId) => setValue({ ...value, partId })}
          />
        )}
        {link === 'measurementId' && (
          <Select
            label="Reading shown"
            placeholder={measurements.isPending ? 'Loading readings…' : 'Choose a reading'}
            searchable
            clearable
            data={(measurements.data ?? []).map((reading) => ({ value: reading.id, label: `${reading.shown} (${reading.quantity})` }))}
            value={value.measurementId}
            onChange={(measurementId) => setValue({ ...value, measurementId })}
            description="Readings spoken in the transcript are easier to take from the suggestions."
          />
        )}
        <TextInput label="Label" maxLength={200} value={value.label} onChange={(event) => setValue({ ...value, label: event.currentTarget.value })} />
        <NumberInput
          label="Time (seconds)"
          min={0}
          decimalScale={1}
          value={value.startMs / 1000}
          onChange={(seconds) => setValue({ ...value, startMs: Math.round(Number(seconds) * 1000) })}
        />
        <Group justify="flex-end">
          <Button variant="default" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" loading={save.isPending}>
            Save mark
          </Button>
        </Group>
      </Stack>
    </form>
  );
}
