import { Group, Highlight, Paper, Stack, Text, TextInput, Title, UnstyledButton } from '@mantine/core';
import { memo, useCallback, useDeferredValue, useMemo, useState } from 'react';
import { BackToNow } from '@/components/back-to-now';
import { useFollowingList } from '@/lib/use-follow-playback';
import { useStableHandler } from '@/lib/use-stable-handler';
import type { Cue } from '../api/types';
import classes from './guide-view.module.css';
import { formatClock } from '@/lib/clock';
import { currentCueIndex, filterCues, searchWords } from './playback';

export interface TranscriptPanelProps {
  cues: Cue[];
  currentMs: number;
  onSeek: (ms: number) => void;
}

/** A guess at one cue's height (one line of small text and its padding); each drawn row is measured. */
const CUE_ROW_ESTIMATE_PX = 30;

/**
 * What is said in the video: the cue playing now stands out; a search keeps the cues holding every word; a click
 * plays from there. Only the cues in view are drawn, so a three-hour transcript costs what a short one does.
 */
export function TranscriptPanel({ cues, currentMs, onSeek }: TranscriptPanelProps) {
  const [query, setQuery] = useState('');
  // Filtering a long transcript on every key press must not hold up typing.
  const deferredQuery = useDeferredValue(query);
  const words = useMemo(() => searchWords(deferredQuery), [deferredQuery]);
  const matches = useMemo(() => filterCues(cues, deferredQuery), [cues, deferredQuery]);
  const current = currentCueIndex(cues, currentMs);
  const searching = words.length > 0;
  const seek = useStableHandler(onSeek);
  // A row keeps its cue's measured height when a search changes which cues are rows.
  const rowKey = useCallback((row: number) => matches[row].index, [matches]);
  const { following, box, rows, resume } = useFollowingList<HTMLDivElement>({
    count: matches.length,
    // Without a search the rows are the whole transcript, so a cue's index is its row.
    currentIndex: searching ? -1 : current,
    estimateRowHeight: CUE_ROW_ESTIMATE_PX,
    rowKey,
    place: 'third',
  });

  return (
    <Paper withBorder p="md" component="section" aria-labelledby="guide-transcript-heading" className={classes.transcript} data-testid="guide-transcript">
      <Stack gap="sm">
        <Title order={2} size="h4" id="guide-transcript-heading">
          Transcript
        </Title>
        {cues.length === 0 ? (
          <Text size="sm" c="dimmed">
            This video has no transcript.
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
                {searching ? `${matches.length} of ${cues.length} cues mention “${deferredQuery.trim()}”` : `${cues.length} cues`}
              </Text>
              {!searching && !following && <BackToNow onClick={resume} />}
            </Group>
            <div ref={box} className={classes.cueBox}>
              <ul className={classes.plainList} style={{ height: rows.getTotalSize(), position: 'relative' }}>
                {rows.getVirtualItems().map((row) => {
                  const { index, cue } = matches[row.index];
                  return (
                    <li
                      key={row.key}
                      data-index={row.index}
                      ref={rows.measureElement}
                      className={classes.cueRow}
                      style={{ transform: `translateY(${row.start}px)` }}
                      aria-setsize={matches.length}
                      aria-posinset={row.index + 1}
                    >
                      <GuideCue cue={cue} current={index === current} words={searching ? words : null} onSeek={seek} />
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
