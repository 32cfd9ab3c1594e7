import { Alert, Anchor, Badge, Button, Card, Chip, Group, NativeSelect, Pagination, SegmentedControl, Skeleton, Stack, Text, TextInput, Title } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import { useState, type FormEvent } from 'react';
import { Link, useSearchParams } from 'react-router-dom';
import { CheckStateBadge, STATE_LOOK } from '@/components/check-state';
import { ApiError } from '@/lib/api-client';
import { formatClock } from '@/lib/clock';
import { useSession } from '@/lib/session';
import { SEARCH_PAGE_SIZE, searchQueries } from '../api/queries';
import { SEARCH_CHECK_STATES, SEARCH_KINDS, type SearchCheckState, type SearchFilters, type SearchHit, type SearchKind, type SearchState } from '../api/types';
import { Snippet } from './snippet';

export const KIND_LABELS: Record<SearchKind, string> = {
  guide: 'Guide',
  part: 'Part',
  cue: 'Transcript',
  build: 'Build',
  footage: 'Footage',
  mark: 'Mark',
  fit_check: 'Fit check',
  draft_guide: 'Draft guide',
};

const isKind = (value: string | null): value is SearchKind => SEARCH_KINDS.some((kind) => kind === value);
const isState = (value: string | null): value is SearchState => value === 'published' || value === 'unpublished';
const isCheckState = (value: string | null): value is SearchCheckState => SEARCH_CHECK_STATES.some((state) => state === value);

/** A count as the API gives it: a capped one is a lower bound ("1,000+"). */
export function countText(count: number, capped: boolean): string {
  return `${count.toLocaleString('en')}${capped ? '+' : ''}`;
}

/** The filters as the address holds them, so a search can be shared, reloaded and walked back. */
function useSearchFilters() {
  const [params, setParams] = useSearchParams();
  const kind = params.get('kind');
  const state = params.get('state');
  const checkState = params.get('checkState');
  const page = Math.max(1, Math.floor(Number(params.get('page') ?? '1')) || 1);
  const filters: SearchFilters = {
    q: params.get('q') ?? '',
    kind: isKind(kind) ? kind : undefined,
    workshop: params.get('workshop') || undefined,
    state: isState(state) ? state : undefined,
    vehicle: params.get('vehicle') || undefined,
    checkState: isCheckState(checkState) ? checkState : undefined,
    offset: (page - 1) * SEARCH_PAGE_SIZE,
  };
  /** Sets some filters; any change but the page goes back to the first page. */
  const update = (changes: Record<string, string | undefined>) => {
    const next = new URLSearchParams(params);
    for (const [key, value] of Object.entries(changes)) {
      if (value) next.set(key, value);
      else next.delete(key);
    }
    if (!('page' in changes)) next.delete('page');
    setParams(next);
  };
  return { filters, page, update };
}

function HitCard({ hit }: { hit: SearchHit }) {
  return (
    <Card withBorder padding="sm" component="li" data-testid="search-hit">
      <Stack gap={4}>
        <Group gap="xs" wrap="wrap">
          <Badge variant="light" color={hit.published ? 'teal' : 'gray'}>
            {KIND_LABELS[hit.kind]}
          </Badge>
          {!hit.published && (
            <Text size="xs" c="dimmed">
              Your workshop · not public
            </Text>
          )}
          {hit.checkState && <CheckStateBadge state={hit.checkState} />}
        </Group>
        <Anchor component={Link} to={hit.link} fw={600}>
          {hit.title}
          {hit.startMs !== null && ` at ${formatClock(hit.startMs)}`}
        </Anchor>
        <Snippet segments={hit.snippet} />
        <Text size="xs" c="dimmed">
          {hit.workshop.name}
          {hit.vehicle ? ` · ${hit.vehicle}` : ''}
        </Text>
      </Stack>
    </Card>
  );
}

/** Search results: a box of its own (the header's is hidden on a phone), kind chips with counts, filters, pages. */
export function SearchPage() {
  const { filters, page, update } = useSearchFilters();
  const { user } = useSession();
  const [text, setText] = useState(filters.q);
  const [vehicle, setVehicle] = useState(filters.vehicle ?? '');
  // The boxes follow the address when it changes (the header's box, Back): adjusted while rendering, not in an effect.
  const [shown, setShown] = useState({ q: filters.q, vehicle: filters.vehicle });
  if (shown.q !== filters.q || shown.vehicle !== filters.vehicle) {
    setShown({ q: filters.q, vehicle: filters.vehicle });
    setText(filters.q);
    setVehicle(filters.vehicle ?? '');
  }
  const query = useQuery(searchQueries.results(filters));
  const data = query.data;

  const handleSubmit = (event: FormEvent) => {
    event.preventDefault();
    update({ q: text.trim() || undefined, vehicle: vehicle.trim() || undefined });
  };

  const allCount = data?.counts.reduce((sum, entry) => sum + entry.count, 0) ?? 0;
  const allCapped = data?.counts.some((entry) => entry.capped) ?? false;
  // The workshops the answer names, and the chosen one (the API filters by slug), for the workshop choice.
  const workshops = new Map<string, string>();
  if (filters.workshop) workshops.set(filters.workshop, filters.workshop);
  for (const hit of data?.results ?? []) workshops.set(hit.workshop.slug, hit.workshop.name);
  const pages = data ? Math.max(1, Math.ceil(data.total / SEARCH_PAGE_SIZE)) : 1;
  const first = data && data.total > 0 ? data.offset + 1 : 0;
  const last = data ? data.offset + data.results.length : 0;

  return (
    <Stack gap="md" maw={860}>
      <Title order={1}>Search</Title>
      <form role="search" onSubmit={handleSubmit} aria-label="Search guides, parts and transcripts">
        <Stack gap="xs">
          <Group gap="xs" align="flex-end" wrap="wrap">
            <TextInput
              type="search"
              label="Words or a part number"
              placeholder="pilot bearing, HL-21-CPL…"
              value={text}
              onChange={(event) => setText(event.currentTarget.value)}
              autoFocus={!filters.q}
              style={{ flex: '1 1 16rem' }}
              data-testid="search-page-input"
            />
            <TextInput
              label="Vehicle"
              placeholder="pickup"
              value={vehicle}
              onChange={(event) => setVehicle(event.currentTarget.value)}
              style={{ flex: '0 1 12rem' }}
            />
            <Button type="submit">Search</Button>
          </Group>
          <Group gap="xs" align="flex-end" wrap="wrap">
            <NativeSelect
              label="Workshop"
              value={filters.workshop ?? ''}
              onChange={(event) => update({ workshop: event.currentTarget.value || undefined })}
              data={[{ value: '', label: 'All workshops' }, ...[...workshops].map(([slug, name]) => ({ value: slug, label: name }))]}
              style={{ flex: '0 1 14rem' }}
            />
            <NativeSelect
              label="Fit check"
              value={filters.checkState ?? ''}
              onChange={(event) => update({ checkState: event.currentTarget.value || undefined })}
              data={[{ value: '', label: 'Any state' }, ...SEARCH_CHECK_STATES.map((state) => ({ value: state, label: STATE_LOOK[state].label }))]}
              style={{ flex: '0 1 14rem' }}
            />
          </Group>
          {user && (
            <SegmentedControl
              aria-label="Which results"
              value={filters.state ?? 'all'}
              onChange={(value) => update({ state: value === 'all' ? undefined : value })}
              data={[
                { value: 'all', label: 'Everything' },
                { value: 'published', label: 'Published' },
                { value: 'unpublished', label: 'My workshops' },
              ]}
            />
          )}
        </Stack>
      </form>

      {!filters.q && <Text c="dimmed">Search published guides — titles, steps, parts and part numbers, what is said in the videos{user ? ' — and your own workshops' : ''}.</Text>}

      {query.isError && (
        <Alert color="red" title="Search failed">
          {query.error instanceof ApiError ? query.error.message : 'Please try again.'}
        </Alert>
      )}

      {filters.q && query.isPending && !data && <Skeleton height={120} />}

      {data && (
        <>
          <Chip.Group multiple={false} value={filters.kind ?? 'all'} onChange={(value) => update({ kind: value === 'all' ? undefined : value })}>
            <Group gap="xs" aria-label="Kinds of result" role="group">
              <Chip value="all">All ({countText(allCount, allCapped)})</Chip>
              {data.counts
                .filter((entry) => entry.count > 0 || entry.kind === filters.kind)
                .map((entry) => (
                  <Chip key={entry.kind} value={entry.kind}>
                    {KIND_LABELS[entry.kind]} ({countText(entry.count, entry.capped)})
                  </Chip>
                ))}
            </Group>
          </Chip.Group>
          <Text size="sm" c="dimmed" aria-live="polite" data-testid="search-summary">
            {data.total === 0
              ? `Nothing matches “${filters.q}”.`
              : `${countText(data.total, data.totalCapped)} ${data.total === 1 && !data.totalCapped ? 'result' : 'results'} — showing ${first}–${last}`}
          </Text>
          <Stack component="ol" gap="sm" p={0} m={0} style={{ listStyle: 'none' }} opacity={query.isPlaceholderData ? 0.6 : 1}>
            {data.results.map((hit) => (
              <HitCard key={`${hit.kind}:${hit.id}`} hit={hit} />
            ))}
          </Stack>
          {pages > 1 && (
            <Pagination
              total={pages}
              value={page}
              onChange={(next) => update({ page: next > 1 ? String(next) : undefined })}
              getControlProps={(control) => ({ 'aria-label': `${control} page` })}
              aria-label="Result pages"
            />
          )}
        </>
      )}
    </Stack>
  );
}
