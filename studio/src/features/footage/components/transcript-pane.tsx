import { Anchor, Button, Group, Loader, Paper, Stack, Text, TextInput, Title, UnstyledButton } from '@mantine/core';
import { useDebouncedValue, useDisclosure } from '@mantine/hooks';
import { useInfiniteQuery } from '@tanstack/react-query';
import { memo, useEffect, useState } from 'react';
import { BackToNow } from '@/components/back-to-now';
import { usePlaybackSelect, type PlaybackClock } from '@/lib/playback-clock';
import { useFollowingList } from '@/lib/use-follow-playback';
import { useStableHandler } from '@/lib/use-stable-handler';
import { useWorkshopReadOnly } from '@/lib/workshop-access';
import { downloadUrl, transcriptQueries } from '../api/queries';
import type { Cue, Transcript } from '../api/types';
import { formatClock } from '@/lib/clock';
import { HighlightTerms } from './highlight-terms';
import { SearchHitsFooter } from './search-hits-footer';
import { TranscriptAttach } from './transcript-attach';
import classes from './transcript-pane.module.css';

const FORMAT_NAMES = { webvtt: 'WebVTT', srt: 'SubRip', timestamped: 'timestamped lines' } as const;

/** A guess at one cue's height (one line of small text, its padding and the gap); each drawn row is measured. */
const CUE_ROW_ESTIMATE_PX = 32;

export interface TranscriptPaneProps {
  workshopId: string;
  footageId: string;
  transcript: Transcript | null;
  /** Where the video is; the pane re-renders only when the playing cue changes, not on every time update. */
  clock: PlaybackClock;
  transcriptMaxBytes: number;
  onSeek: (ms: number) => void;
  /** Told the search words once typing settles ('' when the search is cleared), e.g. to mark hits on a timeline. */
  onSearchChange?: (query: string) => void;
}

const NO_CUES: Cue[] = [];

/** The cue playing now, if any (cues are in time order). */
export function activeCueIndex(cues: Cue[], ms: number): number {
  const row = activeCueRow(cues, ms);
  return row === -1 ? -1 : cues[row].index;
}

/** Where the cue playing now sits in `cues`, or -1. */
function activeCueRow(cues: Cue[], ms: number): number {
  let found = -1;
  for (let row = 0; row < cues.length; row += 1) {
    if (cues[row].startMs > ms) break;
    if (cues[row].endMs > ms) found = row;
  }
  return found;
}

/**
 * The transcript beside the player: cues that follow playback, search that jumps the player, attach and replace.
 * Only the cues in view are drawn, so a three-hour transcript costs what a short one does.
 */
export function TranscriptPane({ workshopId, footageId, transcript, clock, transcriptMaxBytes, onSeek, onSearchChange }: TranscriptPaneProps) {
  const [attaching, { open, close }] = useDisclosure(false);
  // Site admins (not members) and disabled workshops read and download the transcript; attaching one would be refused.
  const readOnly = useWorkshopReadOnly();
  const [query, setQuery] = useState('');
  const [debounced] = useDebouncedValue(query.trim(), 250);
  const search = useInfiniteQuery({
    ...transcriptQueries.search(workshopId, footageId, debounced),
    enabled: debounced !== '' && transcript !== null,
  });
  const hits = search.data?.pages.flatMap((page) => page.results) ?? [];
  const firstPage = search.data?.pages[0];
  const cues = transcript?.cues ?? NO_CUES;
  const showingCues = transcript !== null && debounced === '';
  const active = usePlaybackSelect(clock, (ms) => activeCueRow(cues, ms));
  const seek = useStableHandler(onSeek);
  const reportSearch = useStableHandler((words: string) => onSearchChange?.(words));
  const searched = transcript !== null ? debounced : '';
  useEffect(() => reportSearch(searched), [reportSearch, searched]);
  const { following, box, rows, resume } = useFollowingList<HTMLDivElement>({
    count: cues.length,
    currentIndex: showingCues ? active : -1,
    estimateRowHeight: CUE_ROW_ESTIMATE_PX,
    place: 'third',
    // The same box shows search results while there is a search.
    enabled: showingCues,
  });

  return (
    <Paper withBorder p="md" h="100%">
      <Stack gap="sm" h="100%">
        <Group justify="space-between" align="flex-start">
          <div>
            <Title order={4}>Transcript</Title>
            {transcript ? (
              <Text size="xs" c="dimmed">
                Revision {transcript.revision} · {transcript.cueCount} cues · {FORMAT_NAMES[transcript.format]}
                {transcript.sourceName ? ` · ${transcript.sourceName}` : ''}
              </Text>
            ) : (
              <Text size="xs" c="dimmed">
                None yet
              </Text>
            )}
          </div>
          <Group gap="xs">
            {transcript && (
              <Anchor href={downloadUrl(workshopId, footageId, transcript.revision)} size="sm">
                WebVTT
              </Anchor>
            )}
            {!readOnly && (
              <Button size="xs" variant={transcript ? 'default' : 'filled'} onClick={open}>
                {transcript ? 'Replace' : 'Attach transcript'}
              </Button>
            )}
          </Group>
        </Group>
        {transcript && (
          <TextInput
            placeholder="Search this transcript"
            aria-label="Search this transcript"
            value={query}
            onChange={(event) => setQuery(event.currentTarget.value)}
            rightSection={search.isFetching ? <Loader size="xs" /> : null}
          />
        )}
        {showingCues && !following && (
          <Group justify="flex-end">
            <BackToNow onClick={resume} />
          </Group>
        )}
        {search.isError && debounced !== '' && (
          <Text size="sm" c="red">
            {search.error.message}
          </Text>
        )}
        <div ref={box} className={classes.scroller}>
          {!transcript && (
            <Text size="sm" c="dimmed">
              Attach the transcript of this video to follow along, search it, and show captions in the player.
            </Text>
          )}
          {transcript && debounced !== '' && firstPage && (
            <Stack gap={4} data-testid="transcript-search-results">
              {hits.length === 0 && (
                <Text size="sm" c="dimmed">
                  No cue mentions “{debounced}”.
                </Text>
              )}
              {hits.map((result) => (
                <UnstyledButton key={result.cueIndex} className={classes.cue} onClick={() => onSeek(result.startMs)}>
                  <Text span size="xs" c="dimmed" className={classes.time}>
                    {formatClock(result.startMs)}
                  </Text>
                  <HighlightTerms text={result.text} terms={firstPage.terms} />
                </UnstyledButton>
              ))}
              <SearchHitsFooter
                total={firstPage.total}
                shown={hits.length}
                hasMore={search.hasNextPage}
                loadingMore={search.isFetchingNextPage}
                onMore={() => void search.fetchNextPage()}
              />
            </Stack>
          )}
          {showingCues && (
            <div className={classes.cueList} style={{ height: rows.getTotalSize() }} data-testid="transcript-cues">
              {rows.getVirtualItems().map((row) => (
                <div
                  key={row.key}
                  data-index={row.index}
                  ref={rows.measureElement}
                  className={classes.cueRow}
                  style={{ transform: `translateY(${row.start}px)` }}
                >
                  <CueRow cue={cues[row.index]} active={row.index === active} onSeek={seek} />
                </div>
              ))}
            </div>
          )}
        </div>
      </Stack>
      <TranscriptAttach
        workshopId={workshopId}
        footageId={footageId}
        opened={attaching && !readOnly}
        replacing={transcript !== null}
        maxBytes={transcriptMaxBytes}
        onClose={close}
      />
    </Paper>
  );
}

interface CueRowProps {
  cue: Cue;
  active: boolean;
  onSeek: (ms: number) => void;
}

/** One cue; memoised, so a time update draws again only the cue that starts or stops playing. */
const CueRow = memo(function CueRow({ cue, active, onSeek }: CueRowProps) {
  return (
    <UnstyledButton className={classes.cue} data-active={active || undefined} onClick={() => onSeek(cue.startMs)}>
      <Text span size="xs" c="dimmed" className={classes.time}>
        {formatClock(cue.startMs)}
      </Text>
      <Text span size="sm" style={{ whiteSpace: 'pre-line' }}>
        {cue.text}
      </Text>
    </UnstyledButton>
  );
});
