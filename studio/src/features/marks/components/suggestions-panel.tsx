import { Badge, Button, Group, Modal, Paper, Select, Stack, Text, TextInput, Title } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import { memo, useState } from 'react';
import { BackToNow } from '@/components/back-to-now';
import { notifyDone, notifyError } from '@/lib/notify';
import { usePlaybackSelect, type PlaybackClock } from '@/lib/playback-clock';
import { useFollowingList } from '@/lib/use-follow-playback';
import { useStableHandler } from '@/lib/use-stable-handler';
import { useAcceptSuggestion, useDismissSuggestion } from '../api/mutations';
import { markQueries, type MarkSuggestion } from '../api/queries';
import { formatClock } from '@/lib/clock';
import { KindShape } from './kind-shape';
import { lastStartedAt } from './marks-list';
import { INSTRUMENT_CHOICES } from './reading-choices';
import classes from './virtual-list.module.css';
import { useWorkshopReadOnly } from '@/lib/workshop-access';

/** A first guess at a row's height; rows are measured once drawn. */
const SUGGESTION_ROW_ESTIMATE_PX = 34;

export interface SuggestionsPanelProps {
  workshopId: string;
  footageId: string;
  /** The playing moment: the last suggestion at or before it is highlighted and kept in view while following. */
  clock: PlaybackClock;
  onSeek: (ms: number) => void;
}

/**
 * What the transcript miner found: accept to make the mark (and the reading), dismiss for good. Only the rows in
 * view are drawn, and the list follows playback until the person scrolls it.
 */
export function SuggestionsPanel({ workshopId, footageId, clock, onSeek }: SuggestionsPanelProps) {
  const suggestions = useQuery(markQueries.suggestions(workshopId, footageId));
  const accept = useAcceptSuggestion(workshopId, footageId);
  const dismiss = useDismissSuggestion(workshopId, footageId);
  // Site admins (not members) and disabled workshops read the suggestions without Accept and Dismiss.
  const readOnly = useWorkshopReadOnly();
  const [reading, setReading] = useState<MarkSuggestion | null>(null);
  const items = suggestions.data ?? NO_SUGGESTIONS;
  // Re-renders when the highlighted row changes, not on every time update.
  const active = usePlaybackSelect(clock, (ms) => lastStartedAt(items, ms));
  const acceptingId = accept.isPending ? (accept.variables?.id ?? null) : null;

  const seek = useStableHandler(onSeek);
  const handleAccept = useStableHandler((suggestion: MarkSuggestion) => {
    if (suggestion.kind === 'measurement') {
      setReading(suggestion);
      return;
    }
    accept.mutate({ id: suggestion.id }, { onError: (error) => notifyError('The suggestion was not accepted', error) });
  });
  const handleDismiss = useStableHandler((suggestion: MarkSuggestion) =>
    dismiss.mutate(suggestion.id, { onError: (error) => notifyError('The suggestion was not dismissed', error) }),
  );
  const { following, box, rows, resume } = useFollowingList<HTMLDivElement>({
    count: items.length,
    currentIndex: active,
    estimateRowHeight: SUGGESTION_ROW_ESTIMATE_PX,
    place: 'third',
  });

  return (
    <Paper withBorder p="md" data-testid="suggestions-panel">
      <Stack gap="sm">
        <Group justify="space-between">
          <Title order={4}>Suggested from the transcript</Title>
          <Group gap="xs">
            {!following && items.length > 0 && <BackToNow onClick={resume} />}
            {suggestions.data && <Badge variant="default">{suggestions.data.length}</Badge>}
          </Group>
        </Group>
        {suggestions.isError && (
          <Text size="sm" c="red">
            {suggestions.error.message}
          </Text>
        )}
        {suggestions.data?.length === 0 && (
          <Text size="sm" c="dimmed">
            Nothing waiting. Spoken measurements and your parts’ numbers show up here a moment after a transcript is attached.
          </Text>
        )}
        {items.length > 0 && (
          <div ref={box} className={classes.scroller} data-testid="suggestions">
            <div className={classes.spacer} style={{ height: rows.getTotalSize() }}>
              {rows.getVirtualItems().map((row) => (
                <div
                  key={items[row.index].id}
                  data-index={row.index}
                  ref={rows.measureElement}
                  className={classes.row}
                  style={{ transform: `translateY(${row.start}px)` }}
                  data-active={row.index === active || undefined}
                >
                  <SuggestionRow
                    suggestion={items[row.index]}
                    accepting={acceptingId === items[row.index].id}
                    onSeek={seek}
                    onAccept={handleAccept}
                    onDismiss={handleDismiss}
                    readOnly={readOnly}
                  />
                </div>
              ))}
            </div>
          </div>
        )}
      </Stack>
      <Modal opened={reading !== null} onClose={() => setReading(null)} title="Record the spoken reading">
        {reading && (
          <ReadingFields
            workshopId={workshopId}
            suggestion={reading}
            pending={accept.isPending}
            onCancel={() => setReading(null)}
            onAccept={(input) =>
              accept.mutate(
                { id: reading.id, ...input },
                {
                  onSuccess: (result) => {
                    setReading(null);
                    notifyDone(`Reading ${result.measurement?.shown ?? ''} recorded at ${formatClock(reading.startMs, { tenths: true })}`);
                  },
                  onError: (error) => notifyError('The reading was not recorded', error),
                },
              )
            }
          />
        )}
      </Modal>
    </Paper>
  );
}

const NO_SUGGESTIONS: MarkSuggestion[] = [];

interface SuggestionRowProps {
  suggestion: MarkSuggestion;
  accepting: boolean;
  onSeek: (ms: number) => void;
  onAccept: (suggestion: MarkSuggestion) => void;
  onDismiss: (suggestion: MarkSuggestion) => void;
  readOnly: boolean;
}

/** One suggestion; memoised, so the playing moment moving on does not draw it again. */
const SuggestionRow = memo(function SuggestionRow({ suggestion, accepting, onSeek, onAccept, onDismiss, readOnly }: SuggestionRowProps) {
  return (
    <div className={classes.suggestionRow} data-testid="suggestion-row">
      <Button
        className={classes.time}
        size="compact-xs"
        variant="subtle"
        ff="monospace"
        onClick={() => onSeek(suggestion.startMs)}
        data-testid="suggestion-time"
      >
        {formatClock(suggestion.startMs, { tenths: true })}
      </Button>
      <span className={classes.kind}>
        <KindShape kind={suggestion.kind} />
      </span>
      <Text className={classes.text} size="sm" data-testid="suggestion-phrase">
        “{suggestion.phrase}”
        {suggestion.kind === 'measurement' && (
          <Text span c="dimmed" size="sm">
            {' '}
            = {suggestion.value} {suggestion.unit}
          </Text>
        )}
      </Text>
      {!readOnly && (
      <Group className={classes.actions} gap={4} wrap="nowrap">
        <Button size="compact-xs" onClick={() => onAccept(suggestion)} loading={accepting}>
          Accept
        </Button>
        <Button size="compact-xs" variant="default" onClick={() => onDismiss(suggestion)}>
          Dismiss
        </Button>
      </Group>
      )}
    </div>
  );
});

interface ReadingFieldsProps {
  workshopId: string;
  suggestion: MarkSuggestion;
  pending: boolean;
  onCancel: () => void;
  onAccept: (input: { featureId: string; instrumentKind: string; resolution?: string }) => void;
}

/** The value and unit come from the transcript; the person says which feature it was and, if known, the instrument. */
function ReadingFields({ workshopId, suggestion, pending, onCancel, onAccept }: ReadingFieldsProps) {
  const parts = useQuery(markQueries.parts(workshopId));
  const [featureId, setFeatureId] = useState<string | null>(null);
  const [instrumentKind, setInstrumentKind] = useState('other');
  const [resolution, setResolution] = useState('');
  const features = (parts.data ?? []).flatMap((part) =>
    part.features.map((feature) => ({ value: feature.id, label: `${part.partNumber} — ${feature.name}` })),
  );
  return (
    <Stack>
      <Group grow>
        <TextInput label="Value" value={suggestion.value ?? ''} readOnly />
        <TextInput label="Unit" value={suggestion.unit ?? ''} readOnly />
      </Group>
      <Text size="xs" c="dimmed">
        Heard at {formatClock(suggestion.startMs, { tenths: true })}: “{suggestion.phrase}”. The reading is linked to this moment.
      </Text>
      <Select
        label="Feature measured"
        placeholder={parts.isPending ? 'Loading parts…' : 'Choose a part feature'}
        searchable
        data={features}
        value={featureId}
        onChange={setFeatureId}
        nothingFoundMessage="No part features yet: add them on the part's page"
      />
      <Group grow>
        <Select label="Instrument" data={INSTRUMENT_CHOICES} value={instrumentKind} onChange={(kind) => setInstrumentKind(kind ?? 'other')} allowDeselect={false} />
        <TextInput
          label="Resolution"
          placeholder="from the spoken digits"
          value={resolution}
          onChange={(event) => setResolution(event.currentTarget.value)}
        />
      </Group>
      <Group justify="flex-end">
        <Button variant="default" onClick={onCancel}>
          Cancel
        </Button>
        <Button
          disabled={!featureId}
          loading={pending}
          onClick={() => featureId && onAccept({ featureId, instrumentKind, ...(resolution.trim() ? { resolution: resolution.trim() } : {}) })}
        >
          Record reading
        </Button>
      </Group>
    </Stack>
  );
}
