import { Group, Highlight, Paper, Stack, Text, TextInput, Title, UnstyledButton } from '@mantine/core';
import { useDeferredValue, useState } from 'react';
import { BackToNow } from '@/components/back-to-now';
import { useFollowPlayback } from '@/lib/use-follow-playback';
import type { Cue } from '../api/types';
import classes from './guide-view.module.css';
import { formatClock } from '@/lib/clock';
import { currentCueIndex, filterCues, searchWords } from './playback';

export interface TranscriptPanelProps {
  cues: Cue[];
  currentMs: number;
  onSeek: (ms: number) => void;
}

/** What is said in the video: the cue playing now stands out; a search keeps the cues holding every word; a click plays from there. */
export function TranscriptPanel({ cues, currentMs, onSeek }: TranscriptPanelProps) {
  const [query, setQuery] = useState('');
  // Filtering a long transcript on every key press must not hold up typing.
  const deferredQuery = useDeferredValue(query);
  const words = searchWords(deferredQuery);
  const matches = filterCues(cues, deferredQuery);
  const current = currentCueIndex(cues, currentMs);
  const { following, box, currentRow, resume } = useFollowPlayback<HTMLDivElement>('third');

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
                {words.length === 0 ? `${cues.length} cues` : `${matches.length} of ${cues.length} cues mention “${deferredQuery.trim()}”`}
              </Text>
              {words.length === 0 && !following && <BackToNow onClick={resume} />}
            </Group>
            <div ref={box} className={classes.cueBox}>
              <ul className={classes.plainList}>
                {matches.map(({ index, cue }) => (
                  <li key={index}>
                    <UnstyledButton
                      className={classes.cue}
                      data-current={index === current || undefined}
                      aria-current={index === current ? 'time' : undefined}
                      ref={index === current && words.length === 0 ? currentRow : undefined}
                      onClick={() => onSeek(cue.startMs)}
                      data-testid="transcript-cue"
                    >
                      <span className={classes.cueTime}>{formatClock(cue.startMs)}</span>
                      {words.length > 0 ? (
                        <Highlight component="span" size="sm" highlight={words}>
                          {cue.text}
                        </Highlight>
                      ) : (
                        <Text span size="sm" style={{ whiteSpace: 'pre-line' }}>
                          {cue.text}
                        </Text>
                      )}
                    </UnstyledButton>
                  </li>
                ))}
              </ul>
            </div>
          </>
        )}
      </Stack>
    </Paper>
  );
}
