import { Anchor, Button, Group, Loader, Paper, ScrollArea, Stack, Text, TextInput, Title, UnstyledButton } from '@mantine/core';
import { useDebouncedValue, useDisclosure } from '@mantine/hooks';
import { useInfiniteQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { BackToNow } from '@/components/back-to-now';
import { useFollowPlayback } from '@/lib/use-follow-playback';
import { downloadUrl, transcriptQueries } from '../api/queries';
import type { Cue, Transcript } from '../api/types';
import { formatClock } from '@/lib/clock';
import { HighlightTerms } from './highlight-terms';
import { SearchHitsFooter } from './search-hits-footer';
import { TranscriptAttach } from './transcript-attach';
import classes from './transcript-pane.module.css';

const FORMAT_NAMES = { webvtt: 'WebVTT', srt: 'SubRip', timestamped: 'timestamped lines' } as const;

export interface TranscriptPaneProps {
  workshopId: string;
  footageId: string;
  transcript: Transcript | null;
  currentMs: number;
  transcriptMaxBytes: number;
  onSeek: (ms: number) => void;
}

/** The cue playing now, if any (cues are in time order). */
export function activeCueIndex(cues: Cue[], ms: number): number {
  let found = -1;
  for (const cue of cues) {
    if (cue.startMs > ms) break;
    if (cue.endMs > ms) found = cue.index;
  }
  return found;
}

/** The transcript beside the player: cues that follow playback, search that jumps the player, attach and replace. */
export function TranscriptPane({ workshopId, footageId, transcript, currentMs, transcriptMaxBytes, onSeek }: TranscriptPaneProps) {
  const [attaching, { open, close }] = useDisclosure(false);
  const [query, setQuery] = useState('');
  const [debounced] = useDebouncedValue(query.trim(), 250);
  const search = useInfiniteQuery({
    ...transcriptQueries.search(workshopId, footageId, debounced),
    enabled: debounced !== '' && transcript !== null,
  });
  const hits = search.data?.pages.flatMap((page) => page.results) ?? [];
  const firstPage = search.data?.pages[0];
  const { following, box, currentRow, resume } = useFollowPlayback<HTMLDivElement>('third');
  const active = transcript ? activeCueIndex(transcript.cues, currentMs) : -1;

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
            <Button size="xs" variant={transcript ? 'default' : 'filled'} onClick={open}>
              {transcript ? 'Replace' : 'Attach transcript'}
            </Button>
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
        {transcript && debounced === '' && !following && (
          <Group justify="flex-end">
            <BackToNow onClick={resume} />
          </Group>
        )}
        {search.isError && debounced !== '' && (
          <Text size="sm" c="red">
            {search.error.message}
          </Text>
        )}
        <ScrollArea viewportRef={box} style={{ flex: 1 }} mah={520} type="auto">
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
          {transcript && debounced === '' && (
            <Stack gap={2}>
              {transcript.cues.map((cue) => (
                <UnstyledButton
                  key={cue.index}
                  className={classes.cue}
                  data-active={cue.index === active || undefined}
                  ref={cue.index === active ? currentRow : undefined}
                  onClick={() => onSeek(cue.startMs)}
                >
                  <Text span size="xs" c="dimmed" className={classes.time}>
                    {formatClock(cue.startMs)}
                  </Text>
                  <Text span size="sm" style={{ whiteSpace: 'pre-line' }}>
                    {cue.text}
                  </Text>
                </UnstyledButton>
              ))}
            </Stack>
          )}
        </ScrollArea>
      </Stack>
      <TranscriptAttach
        workshopId={workshopId}
        footageId={footageId}
        opened={attaching}
        replacing={transcript !== null}
        maxBytes={transcriptMaxBytes}
        onClose={close}
      />
    </Paper>
  );
}
