import { Alert, Button, Group, Modal, NumberInput, SegmentedControl, Select, Stack, TextInput } from '@mantine/core';
import { useState } from 'react';
import { splitApiErrors } from '@/lib/form-errors';
import { notifyDone, notifyError } from '@/lib/notify';
import { useDismissSuggestion, useRecordReading, useSaveMark } from '../api/mutations';
import { MARK_KINDS, type Mark, type MarkKind } from '../api/queries';
import { formatClock } from '@/lib/clock';
import { FitCheckPicker, GuideStepPicker, PartPicker, ReadingPicker } from './link-pickers';
import { KIND_LOOK, LINK_FIELDS, LINK_OF_KIND, type MarkLinkField } from './mark-kinds';
import {
  emptyReading,
  NewReadingFields,
  READING_LABELS,
  resolutionOf,
  type NewReading,
  type ReadingErrors,
  type SpokenReading,
} from './new-reading-fields';
import { isDecimal } from './reading-choices';

export type { SpokenReading } from './new-reading-fields';

export interface MarkDraft {
  id?: string;
  startMs: number;
  kind: MarkKind;
  label: string;
  partId: string | null;
  measurementId: string | null;
  fitCheckId: string | null;
  guideStepId: string | null;
  /** A measurement spoken at this moment: the form offers to record it, value and unit filled in. */
  spoken?: SpokenReading | null;
}

export const emptyLinks = { partId: null, measurementId: null, fitCheckId: null, guideStepId: null } as const;

export const draftOf = (mark: Mark): MarkDraft => ({
  id: mark.id,
  startMs: mark.startMs,
  kind: mark.kind,
  label: mark.label,
  partId: mark.partId,
  measurementId: mark.measurementId,
  fitCheckId: mark.fitCheckId,
  guideStepId: mark.guideStepId,
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
    <Modal
      opened={draft !== null}
      onClose={onClose}
      size="lg"
      title={draft?.id ? 'Edit mark' : `New mark at ${formatClock(draft?.startMs ?? 0, { tenths: true })}`}
    >
      {draft && <MarkFields key={draft.id ?? draft.startMs} workshopId={workshopId} footageId={footageId} draft={draft} onClose={onClose} />}
    </Modal>
  );
}

type ReadingMode = 'existing' | 'new';

function MarkFields({ workshopId, footageId, draft, onClose }: { workshopId: string; footageId: string; draft: MarkDraft; onClose: () => void }) {
  const [value, setValue] = useState(draft);
  // A spoken measurement at this moment is most likely what is being marked: offer to record it.
  const [readingMode, setReadingMode] = useState<ReadingMode>(draft.spoken && !draft.measurementId ? 'new' : 'existing');
  const [reading, setReading] = useState<NewReading>(() => emptyReading(draft.spoken));
  const [readingErrors, setReadingErrors] = useState<ReadingErrors>({});
  const [problems, setProblems] = useState<string[]>([]);
  const save = useSaveMark(workshopId, footageId);
  const recordReading = useRecordReading(workshopId);
  const dismiss = useDismissSuggestion(workshopId, footageId);
  const link = LINK_OF_KIND[value.kind];
  const recordingNew = link === 'measurementId' && readingMode === 'new';
  const spoken = value.kind === 'measurement' ? (draft.spoken ?? null) : null;

  const setLink = (field: MarkLinkField) => (id: string | null) => setValue((current) => ({ ...current, [field]: id }));

  const saveMark = (links: Partial<Record<MarkLinkField, string | null>>, recorded?: NewReading) => {
    // Only the kind's own link is sent; the others are cleared, as the API expects.
    const sent = Object.fromEntries(LINK_FIELDS.map((field) => [field, field === link ? (links[field] ?? null) : null]));
    save.mutate(
      { id: value.id, startMs: value.startMs, kind: value.kind, label: value.label, ...sent },
      {
        onSuccess: () => {
          // The spoken reading was recorded by hand: its suggestion is settled, so it cannot be accepted twice.
          if (recorded && spoken && recorded.value.trim() === spoken.value && recorded.unit === spoken.unit) {
            dismiss.mutate(spoken.suggestionId, { onError: (error) => notifyError('The suggestion heard here is still waiting', error) });
          }
          onClose();
        },
        onError: (error) => notifyError('The mark was not saved', error),
      },
    );
  };

  const handleRecordAndSave = () => {
    const errors: ReadingErrors = {};
    if (!reading.subject) errors.subject = 'Choose the part feature or interface measured';
    if (!isDecimal(reading.value)) errors.value = 'Write the reading as a decimal number, e.g. 0.015';
    if (!isDecimal(resolutionOf(reading))) errors.resolution = "Give the instrument's smallest step, e.g. 0.001";
    setReadingErrors(errors);
    if (Object.keys(errors).length > 0 || !reading.subject) return;
    const [subjectKind, subjectId] = reading.subject.split(':');
    recordReading.mutate(
      {
        ...(subjectKind === 'interface' ? { interfaceId: subjectId } : { featureId: subjectId }),
        quantity: reading.quantity,
        value: reading.value.trim(),
        unit: reading.unit,
        instrumentKind: reading.instrumentKind,
        resolution: resolutionOf(reading),
        footageId,
        footageTimeMs: value.startMs,
      },
      {
        onSuccess: (recorded) => {
          notifyDone(`Reading ${recorded.shown} recorded at ${formatClock(value.startMs, { tenths: true })}`);
          // From here the reading exists: a retry after a failed mark links it rather than recording it again.
          setValue((current) => ({ ...current, measurementId: recorded.id }));
          setReadingMode('existing');
          saveMark({ measurementId: recorded.id }, reading);
        },
        onError: (error) => {
          const split = splitApiErrors(error, READING_LABELS);
          setReadingErrors(split.fields);
          setProblems(split.general);
        },
      },
    );
  };

  const handleSubmit = () => {
    setProblems([]);
    if (recordingNew) handleRecordAndSave();
    else saveMark(value);
  };

  return (
    <form
      aria-label={value.id ? 'Edit mark' : 'New mark'}
      onSubmit={(event) => {
        event.preventDefault();
        handleSubmit();
      }}
    >
      <Stack>
        {problems.length > 0 && (
          <Alert color="red" title="The reading was not recorded" role="alert">
            {problems.join(' ')}
          </Alert>
        )}
        <Select
          label="Kind"
          data={MARK_KINDS.map((kind) => ({ value: kind, label: KIND_LOOK[kind].name }))}
          value={value.kind}
          onChange={(kind) => kind && setValue({ ...value, kind: kind as MarkKind })}
          allowDeselect={false}
          data-autofocus
        />
        {link === 'partId' && <PartPicker workshopId={workshopId} footageId={footageId} value={value.partId} onChange={setLink('partId')} />}
        {link === 'measurementId' && (
          <>
            <SegmentedControl
              aria-label="Reading"
              value={readingMode}
              onChange={(mode) => setReadingMode(mode as ReadingMode)}
              data={[
                { value: 'existing', label: 'Pick a recorded reading' },
                { value: 'new', label: 'Record a new reading' },
              ]}
            />
            {readingMode === 'existing' ? (
              <ReadingPicker workshopId={workshopId} footageId={footageId} value={value.measurementId} onChange={setLink('measurementId')} />
            ) : (
              <NewReadingFields
                workshopId={workshopId}
                footageId={footageId}
                atMs={value.startMs}
                reading={reading}
                spoken={spoken}
                errors={readingErrors}
                onChange={setReading}
              />
            )}
          </>
        )}
        {link === 'fitCheckId' && (
          <FitCheckPicker workshopId={workshopId} footageId={footageId} value={value.fitCheckId} onChange={setLink('fitCheckId')} />
        )}
        {link === 'guideStepId' && (
          <GuideStepPicker workshopId={workshopId} footageId={footageId} value={value.guideStepId} onChange={setLink('guideStepId')} />
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
          <Button type="submit" loading={save.isPending || recordReading.isPending}>
            {recordingNew ? 'Record reading and save mark' : 'Save mark'}
          </Button>
        </Group>
      </Stack>
    </form>
  );
}
