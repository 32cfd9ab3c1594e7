import { Group, Highlight, Paper, Stack, Text, TextInput, Title, UnstyledButton } from '@mantine/core';
import { useQueries, useQuery } from '@tanstack/react-query';
import { memo, useCallback, useDeferredValue, useMemo, useState } from 'react';
import { BackToNow } from '@/components/back-to-now';
import { ApiError } from '@/lib/api-client';
import { usePlaybackSelect, type PlaybackClock } from '@/lib/playback-clock';
import { useFollowingList } from '@/lib/use-follow-playback';
import { useStableHandler } from '@/lib/use-stable-handler';
import { CUE_PAGE_SIZE, CUE_SLICE_MS, guideViewQueries, type WindowCue } from '../api/queries';
import type { Cue } from '../api/types';
import classes from './guide-view.module.css';
import { formatClock } from '@/lib/clock';
import { currentCueIndex, filterCues, searchWords } from './playback';

export interface TranscriptPanelProps {
  /** Whose transcript: the published guide's, read a window at a time from `/api/guides/:workshop/:guide/cues`. */
  workshopSlug: string;
  guideSlug: string;
  /**
   * The video's clock. The panel listens for the playing minute and the playing cue only, so it draws again when
   * another cue starts (and then only the two rows that change), not on every time update.
   */
  clock: PlaybackClock;
  onSeek: (ms: number) => void;
}

/** The guide's video has no transcript (the cues route answers 404). */
const isMissing = (error: Error) => error instanceof ApiError && error.status === 404;

/** A guess at one cue's height (one line of small text and its padding); each drawn row is measured. */
const CUE_ROW_ESTIMATE_PX = 30;

/**
 * What is said in the video: the cue playing now stands out; a search keeps the cues holding every word; a click
 * plays from there. The transcript arrives a window at a time: the rows in view (pages of CUE_PAGE_SIZE cues as the
 * list scrolls) and the minute playing now (to know which row plays), so a three-hour transcript costs a reader
 * what a short one does. Only a search fetches every cue, once.
 */
export function TranscriptPanel({ workshopSlug, guideSlug, clock, onSeek }: TranscriptPanelProps) {
  const [query, setQuery] = useState('');
  // Filtering a long transcript on every key press must not hold up typing.
  const deferredQuery = useDeferredValue(query);
  const words = useMemo(() => searchWords(deferredQuery), [deferredQuery]);
  const searching = words.length > 0;

  const first = useQuery(guideViewQueries.cuePage(workshopSlug, guideSlug, 0));
  const total = first.data?.total ?? 0;
  const playingMinute = usePlaybackSelect(clock, (ms) => Math.floor(ms / CUE_SLICE_MS));
  const playingSlice = useQuery({ ...guideViewQueries.cueSlice(workshopSlug, guideSlug, playingMinute), enabled: total > 0 });
  const sliceCues = playingSlice.data?.cues;
  const current = usePlaybackSelect(clock, (ms) => {
    if (!sliceCues) return -1;
    const at = currentCueIndex(sliceCues, ms);
    return at === -1 ? -1 : sliceCues[at].index;
  });
  const everything = useQuery({ ...guideViewQueries.allCues(workshopSlug, guideSlug), enabled: searching && total > 0 });
  const matches = useMemo(() => (searching && everything.data ? filterCues(everything.data, deferredQuery) : null), [searching, everything.data, deferredQuery]);

  const count = searching ? (matches?.length ?? 0) : total;
  const seek = useStableHandler(onSeek);
  // A row keeps its cue's measured height when a search changes which cues are rows.
  const rowKey = useCallback((row: number) => (matches ? matches[row].cue.index : row), [matches]);
  const { following, box, rows, resume } = useFollowingList<HTMLDivElement>({
    count,
    // Without a search the rows are the whole transcript, so a cue's index is its row.
    currentIndex: searching ? -1 : current,
    estimateRowHeight: CUE_ROW_ESTIMATE_PX,
    rowKey,
    place: 'third',
  });

  // The pages holding the rows drawn now (and page 0, which is always held for the total).
  const drawn = rows.getVirtualItems();
  const pages = searching ? [] : [...new Set(drawn.map((row) => Math.floor(row.index / CUE_PAGE_SIZE)))].filter((page) => page > 0);
  const pageAnswers = useQueries({ queries: pages.map((page) => guideViewQueries.cuePage(workshopSlug, guideSlug, page)) });
  const cueAtRow = (row: number): WindowCue | null => {
    if (matches) return matches[row]?.cue ?? null;
    const page = Math.floor(row / CUE_PAGE_SIZE);
    const answer = page === 0 ? first.data : pageAnswers[pages.indexOf(page)]?.data;
    return answer?.cues[row - page * CUE_PAGE_SIZE] ?? null;
  };

  if (first.isPending) {
    return (
      <Paper withBorder p="md" component="section" aria-labelledby="guide-transcript-heading" className={classes.transcript} data-testid="guide-transcript">
        <Title order={2} size="h4" id="guide-transcript-heading">
          Transcript
        </Title>
        <Text size="sm" c="dimmed">
          Loading the transcript…
        </Text>
      </Paper>
    );
  }

  return (
    <Paper withBorder p="md" component="section" aria-labelledby="guide-transcript-heading" className={classes.transcript} data-testid="guide-transcript">
      <Stack gap="sm">
        <Title order={2} size="h4" id="guide-transcript-heading">
          Transcript
        </Title>
        {total === 0 ? (
          <Text size="sm" c={first.isError && !isMissing(first.error) ? 'red' : 'dimmed'}>
            {first.isError && !isMissing(first.error) ? 'The transcript could not be loaded.' : 'This video has no transcript.'}
          </Text>
        ) : (
          <>
            <TextInput
              type="search"
              label="Search the transcript"
              placeholder="e.g. spline, thousandths"
              value={query}
              onChange={(event) => setQuery(event.currentTarget.value)}
            />
            <Group justify="space-between" gap="xs">
              <Text size="xs" c="dimmed" aria-live="polite" data-testid="transcript-count">
                {!searching
                  ? `${total} cues`
                  : matches
                    ? `${matches.length} of ${total} cues mention “${deferredQuery.trim()}”`
                    : everything.isError
                      ? 'The transcript could not be searched.'
                      : 'Searching the transcript…'}
              </Text>
              {!searching && !following && <BackToNow onClick={resume} />}
            </Group>
            <div ref={box} className={classes.cueBox}>
              <ul className={classes.plainList} style={{ height: rows.getTotalSize(), position: 'relative' }}>
                {drawn.map((row) => {
                  const cue = cueAtRow(row.index);
                  return (
                    <li
                      key={row.key}
                      data-index={row.index}
                      ref={rows.measureElement}
                      className={classes.cueRow}
                      style={{ transform: `translateY(${row.start}px)` }}
                      aria-setsize={count}
                      aria-posinset={row.index + 1}
                    >
                      {cue ? (
                        <GuideCue cue={cue} current={cue.index === current} words={searching ? words : null} onSeek={seek} />
                      ) : (
                        // The row's window is on its way: a placeholder of one line's height, so the list does not jump.
                        <Text size="sm" c="dimmed" className={classes.cue} data-testid="transcript-cue-loading">
                          …
                        </Text>
                      )}
                    </li>
                  );
                })}
              </ul>
            </div>
          </>
        )}
      </Stack>
    </Paper>
  );
}

interface GuideCueProps {
  cue: Cue;
  current: boolean;
  /** The search's words to highlight, or null without a search. */
  words: string[] | null;
  onSeek: (ms: number) => void;
}

/** One cue; memoised, so a time update draws again only the cue that starts or stops playing. */
const GuideCue = memo(function GuideCue({ cue, current, words, onSeek }: GuideCueProps) {
  return (
    <UnstyledButton
      className={classes.cue}
      data-current={current || undefined}
      aria-current={current ? 'time' : undefined}
      onClick={() => onSeek(cue.startMs)}
      data-testid="transcript-cue"
    >
      <span className={classes.cueTime}>{formatClock(cue.startMs)}</span>
      {words ? (
        <Highlight component="span" size="sm" highlight={words}>
          {cue.text}
        </Highlight>
      ) : (
        <Text span size="sm" style={{ whiteSpace: 'pre-line' }}>
          {cue.text}
        </Text>
      )}
    </UnstyledButton>
  );
});
