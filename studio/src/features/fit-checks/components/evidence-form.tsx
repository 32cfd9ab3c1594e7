import { Button, Group, Select, TextInput } from '@mantine/core';
import { useState } from 'react';
import { notifyError } from '@/lib/notify';
import { useAddEvidence } from '../api/mutations';
import type { FitCheck } from '../api/queries';

export interface ReadingChoice {
  value: string;
  label: string;
}

/** Attaches one of the assembly's readings to a check as its evidence. */
export function EvidenceForm({
  workshopId,
  check,
  choices,
  onDone,
}: {
  workshopId: string;
  check: FitCheck;
  choices: { group: string; items: ReadingChoice[] }[];
  onDone: () => void;
}) {
  const addEvidence = useAddEvidence(workshopId);
  const [measurementId, setMeasurementId] = useState<string | null>(null);
  const [note, setNote] = useState('');
  const [error, setError] = useState<string | undefined>();
  const attached = new Set(check.evidence.map((item) => item.measurementId));
  const available = choices
    .map((group) => ({ ...group, items: group.items.filter((item) => !attached.has(item.value)) }))
    .filter((group) => group.items.length > 0);

  const handleSubmit = () => {
    if (!measurementId) {
      setError('Pick a reading');
      return;
    }
    addEvidence.mutate(
      { checkId: check.id, measurementId, note: note.trim() || undefined },
      {
        onSuccess: () => {
          setMeasurementId(null);
          setNote('');
          onDone();
        },
        onError: (failure) => notifyError('The evidence was not attached', failure),
      },
    );
  };

  return (
    <form
      aria-label={`Attach evidence to ${check.title}`}
      onSubmit={(event) => {
        event.preventDefault();
        handleSubmit();
      }}
    >
      <Group align="flex-start" gap="sm" wrap="wrap">
        <Select
          label="Reading"
          placeholder={available.length ? 'Pick a reading' : 'No reading of these parts yet'}
          data={available}
          value={measurementId}
          onChange={(value) => {
            setMeasurementId(value);
            setError(undefined);
          }}
          error={error}
          searchable
          w={360}
          nothingFoundMessage="No reading matches"
        />
        <TextInput label="Note" placeholder="after the test fit" value={note} onChange={(event) => setNote(event.currentTarget.value)} w={220} />
        <Group gap="xs" mt={25}>
          <Button type="submit" loading={addEvidence.isPending} disabled={available.length === 0}>
            Attach
          </Button>
          <Button variant="default" onClick={onDone}>
            Cancel
          </Button>
        </Group>
      </Group>
    </form>
  );
}
