import { Anchor, Loader, Popover, ScrollArea, Stack, Text, TextInput } from '@mantine/core';
import { useDebouncedValue } from '@mantine/hooks';
import { useInfiniteQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { transcriptQueries } from '../api/queries';
import { formatClock } from '@/lib/clock';
import { HighlightTerms } from './highlight-terms';
import { SearchHitsFooter } from './search-hits-footer';

/** Searches every transcript of the workshop; each result opens the player at that moment. */
export function WorkshopTranscriptSearch({ workshopId }: { workshopId: string }) {
  const [query, setQuery] = useState('');
  const [debounced] = useDebouncedValue(query.trim(), 300);
  const search = useInfiniteQuery(transcriptQueries.workshopSearch(workshopId, debounced));
  const hits = search.data?.pages.flatMap((page) => page.results) ?? [];
  const firstPage = search.data?.pages[0];
  const opened = debounced.length > 0;

  return (
    <Popover opened={opened} position="bottom-end" width={420} shadow="md" onDismiss={() => setQuery('')}>
      <Popover.Target>
        <TextInput
          placeholder="Search all transcripts"
          aria-label="Search all transcripts in this workshop"
          value={query}
          onChange={(event) => setQuery(event.currentTarget.value)}
          w={260}
          rightSection={search.isFetching ? <Loader size="xs" /> : null}
        />
      </Popover.Target>
      <Popover.Dropdown>
        {search.isError && (
          <Text size="sm" c="red">
            {search.error.message}
          </Text>
        )}
        {firstPage && hits.length === 0 && (
          <Text size="sm" c="dimmed">
            No cue mentions “{debounced}”.
          </Text>
        )}
        {firstPage && hits.length > 0 && (
          <ScrollArea.Autosize mah={360}>
            <Stack gap="sm">
              {hits.map((result) => (
                <div key={`${result.footageId}-${result.cueIndex}`}>
                  <Anchor
                    component={Link}
                    to={paths.footage.to(workshopId, result.footageId, result.startMs)}
                    size="sm"
                    fw={500}
                  >
                    {result.footageTitle} · {formatClock(result.startMs)}
                  </Anchor>
                  <Text size="xs" c="dimmed">
                    {result.buildTitle}
                  </Text>
                  <HighlightTerms text={result.text} terms={firstPage.terms} />
                </div>
              ))}
              <SearchHitsFooter
                total={firstPage.total}
                shown={hits.length}
                hasMore={search.hasNextPage}
                loadingMore={search.isFetchingNextPage}
                onMore={() => void search.fetchNextPage()}
              />
            </Stack>
          </ScrollArea.Autosize>
        )}
      </Popover.Dropdown>
    </Popover>
  );
}
