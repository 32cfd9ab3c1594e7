import { Button, Group, Kbd, Modal, Stack, Table, Text } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { markQueries, type Mark, type MarkSuggestion } from '../api/queries';
import { MARKING_SHORTCUTS, useMarkingShortcuts } from '../hooks/marking-shortcuts';
import { ScrubFrame, useThumbnailTiles } from '@/components/scrub-preview';
import { useWaveform, WaveformLane } from '@/components/waveform-lane';
import { PlaybackTime } from '@/components/playback-time';
import type { PlaybackClock } from '@/lib/playback-clock';
import { draftOf, emptyLinks, MarkForm, type MarkDraft, type SpokenReading } from './mark-form';
import { MarksList } from './marks-list';
import { MarksTimeline } from './marks-timeline';
import { SuggestionsPanel } from './suggestions-panel';
import { useWorkshopReadOnly } from '@/lib/workshop-access';

/** What the workspace needs from the player it sits under (the footage feature's page, composed in app/routes). */
export interface MarkingPlayer {
  /** Where the video is, as a subscription: only the playhead, the pin button's time and the playing rows read it. */
  clock: PlaybackClock;
  durationMs: number | null;
  /** Reads the video's position at this instant (more exact than the last time update). */
  readPositionMs: () => number;
  seek: (ms: number) => void;
  pause: () => void;
  /** Scrub previews (WebVTT thumbnails) and the audio's peaks, once the media pipeline has made them. */
  media?: { thumbnailsUrl: string | null; waveformUrl: string | null };
  /** Where every hit of the transcript search starts, while there is a search: drawn as a density band. */
  hitStartsMs?: readonly number[];
}

export interface MarksWorkspaceProps {
  workshopId: string;
  footageId: string;
  player: MarkingPlayer;
}

/** One empty list, so memoised parts see the same array while the marks load. */
const NO_MARKS: Mark[] = [];

/** The measurement spoken in the cue playing at `atMs`, if the miner found one still waiting there. */
export function spokenAt(suggestions: MarkSuggestion[], atMs: number): SpokenReading | null {
  for (const suggestion of suggestions) {
    const { kind, status, value, unit, startMs, endMs } = suggestion;
    if (kind === 'measurement' && status === 'pending' && value !== null && unit !== null && startMs <= atMs && atMs <= endMs) {
      return { suggestionId: suggestion.id, phrase: suggestion.phrase, value, unit };
    }
  }
  return null;
}

/** Marking one footage: pin a moment (key or button), the timeline strip, the marks and the suggestions. */
export function MarksWorkspace({ workshopId, footageId, player }: MarksWorkspaceProps) {
  const marks = useQuery(markQueries.list(workshopId, footageId));
  const suggestions = useQuery(markQueries.suggestions(workshopId, footageId));
  const [draft, setDraft] = useState<MarkDraft | null>(null);
  const [helpOpen, help] = useDisclosure(false);
  const thumbnailTiles = useThumbnailTiles(player.media?.thumbnailsUrl);
  const waveform = useWaveform(player.media?.waveformUrl);
  // Site admins (not members) and disabled workshops watch and read the marks; pinning one would be refused.
  const readOnly = useWorkshopReadOnly();

  const handlers = {
    pin: () => {
      if (readOnly) return;
      // Pausing keeps the moment on screen while the form is filled in.
      const startMs = Math.round(player.readPositionMs());
      player.pause();
      const spoken = spokenAt(suggestions.data ?? [], startMs);
      setDraft({ startMs, kind: spoken ? 'measurement' : 'note', label: '', ...emptyLinks, spoken });
    },
    help: help.open,
  };
  useMarkingShortcuts(draft === null && !helpOpen, handlers);

  return (
    <Stack gap="md" mt="sm">
      {player.durationMs !== null && (
        <MarksTimeline
          key={player.durationMs}
          marks={marks.data ?? NO_MARKS}
          durationMs={player.durationMs}
          clock={player.clock}
          onSeek={player.seek}
          hitStartsMs={player.hitStartsMs}
          renderLanes={waveform ? (view) => <WaveformLane waveform={waveform} fromMs={view.startMs} toMs={view.endMs} /> : undefined}
          renderHoverPreview={thumbnailTiles.length > 0 ? (atMs) => <ScrubFrame tiles={thumbnailTiles} atMs={atMs} /> : undefined}
        />
      )}
      <Group gap="xs">
        {!readOnly && (
          <Button onClick={handlers.pin} data-testid="pin-mark">
            Pin a mark at <PlaybackTime clock={player.clock} tenths />
          </Button>
        )}
        <Button variant="subtle" onClick={help.open}>
          Keys <Kbd ml={6}>?</Kbd>
        </Button>
      </Group>
      <MarksList
        workshopId={workshopId}
        footageId={footageId}
        marks={marks.data ?? NO_MARKS}
        clock={player.clock}
        onSeek={player.seek}
        onEdit={(mark) => setDraft(draftOf(mark))}
      />
      <SuggestionsPanel workshopId={workshopId} footageId={footageId} clock={player.clock} onSeek={player.seek} />
      <MarkForm workshopId={workshopId} footageId={footageId} draft={draft} onClose={() => setDraft(null)} />
      <Modal opened={helpOpen} onClose={help.close} title="Marking keys">
        <Table>
          <Table.Tbody>
            {MARKING_SHORTCUTS.map((shortcut) => (
              <Table.Tr key={shortcut.key}>
                <Table.Td>
                  <Kbd>{shortcut.key}</Kbd>
                </Table.Td>
                <Table.Td>{shortcut.description}</Table.Td>
              </Table.Tr>
            ))}
          </Table.Tbody>
        </Table>
        <Text size="xs" c="dimmed" mt="sm">
          Keys do nothing while you type in a field. Space and the arrow keys work the video as usual when it has focus.
        </Text>
      </Modal>
    </Stack>
  );
}
