import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { act, renderHook, waitFor } from '@testing-library/react';
import type { ReactNode } from 'react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { PROVISIONAL_MARK_PREFIX, useRemoveMark, useSaveMark } from './mutations';
import { markQueries, type Mark } from './queries';

const mark = (id: string, startMs: number, label = `Mark ${id}`): Mark => ({
  id,
  footageId: 'f1',
  startMs,
  endMs: null,
  kind: 'note',
  partId: null,
  measurementId: null,
  fitCheckId: null,
  guideStepId: null,
  label,
  createdBy: null,
  createdAt: '2026-12-01T10:00:00.000Z',
  updatedAt: '2026-12-01T10:00:00.000Z',
});

const LIST = [mark('a', 1_000), mark('b', 5_000), mark('c', 9_000)];
const listKey = markQueries.list('w1', 'f1').queryKey;

/** A query client holding the footage's marks, and a link list a row may have loaded, as the workspace would. */
function withCache() {
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false, staleTime: Infinity } } });
  queryClient.setQueryData(listKey, LIST);
  queryClient.setQueryData(markQueries.parts('w1').queryKey, []);
  const wrapper = ({ children }: { children: ReactNode }) => <QueryClientProvider client={queryClient}>{children}</QueryClientProvider>;
  return { queryClient, wrapper };
}

/**
 * The API as a test holds it: the CSRF read (GET /auth/me) answers at once, every other request waits until
 * `answer` gives its response. Records the requests other than the CSRF read.
 */
function holdApi() {
  const held: { method: string; path: string; answer: (status: number, body?: unknown) => void }[] = [];
  vi.spyOn(globalThis, 'fetch').mockImplementation((input, init) => {
    const url = new URL(input instanceof Request ? input.url : String(input));
    if (url.pathname.endsWith('/auth/me')) return Promise.resolve(new Response('{}', { status: 200, headers: { 'Content-Type': 'application/json' } }));
    return new Promise<Response>((resolve) => {
      held.push({
        method: init?.method ?? 'GET',
        path: url.pathname.replace(/^\/api/, ''),
        answer: (status, body) =>
          resolve(status === 204 ? new Response(null, { status }) : new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } })),
      });
    });
  });
  return held;
}

const labels = (queryClient: QueryClient) => queryClient.getQueryData(listKey)?.map((item) => item.label);

describe('saving and removing a mark change only the cached list', () => {
  afterEach(() => vi.restoreAllMocks());

  it('a pinned mark is in the list, in time order, before the API answers; then it takes the saved id; nothing is read again', async () => {
    const held = holdApi();
    const { queryClient, wrapper } = withCache();
    const { result } = renderHook(() => useSaveMark('w1', 'f1'), { wrapper });
    act(() => result.current.mutate({ startMs: 6_000, kind: 'note', label: 'Pinned' }));
    await waitFor(() => expect(labels(queryClient)).toEqual(['Mark a', 'Mark b', 'Pinned', 'Mark c']));
    expect(queryClient.getQueryData(listKey)?.[2].id.startsWith(PROVISIONAL_MARK_PREFIX)).toBe(true);
    await waitFor(() => expect(held).toHaveLength(1));

    act(() => held[0].answer(201, mark('saved', 6_000, 'Pinned')));
    await waitFor(() => expect(result.current.isSuccess).toBe(true));
    expect(queryClient.getQueryData(listKey)?.map((item) => item.id)).toEqual(['a', 'b', 'saved', 'c']);
    // Only the POST: no list of marks, links or suggestions is read again for one pin.
    expect(held.map(({ method, path }) => `${method} ${path}`)).toEqual(['POST /workshops/w1/footage/f1/marks']);
    expect(queryClient.getQueryState(listKey)?.isInvalidated).toBe(false);
    expect(queryClient.getQueryState(markQueries.parts('w1').queryKey)?.isInvalidated).toBe(false);
  });

  it('an edited mark moves to its new time at once; a refused edit puts the list back', async () => {
    const held = holdApi();
    const { queryClient, wrapper } = withCache();
    const { result } = renderHook(() => useSaveMark('w1', 'f1'), { wrapper });
    act(() => result.current.mutate({ id: 'a', startMs: 7_000, kind: 'note', label: 'Moved' }));
    await waitFor(() => expect(labels(queryClient)).toEqual(['Mark b', 'Moved', 'Mark c']));
    await waitFor(() => expect(held).toHaveLength(1));
    expect(held[0].method).toBe('PATCH');
    act(() => held[0].answer(400, { statusCode: 400, message: 'startMs must lie inside the footage' }));
    await waitFor(() => expect(result.current.isError).toBe(true));
    expect(queryClient.getQueryData(listKey)).toEqual(LIST);
  });

  it('a removed mark leaves the list at once, without a read; a refused removal brings it back', async () => {
    const held = holdApi();
    const { queryClient, wrapper } = withCache();
    const { result } = renderHook(() => useRemoveMark('w1', 'f1'), { wrapper });
    act(() => result.current.mutate('b'));
    await waitFor(() => expect(labels(queryClient)).toEqual(['Mark a', 'Mark c']));
    await waitFor(() => expect(held).toHaveLength(1));
    act(() => held[0].answer(204));
    await waitFor(() => expect(result.current.isSuccess).toBe(true));
    expect(labels(queryClient)).toEqual(['Mark a', 'Mark c']);
    expect(held.map(({ method, path }) => `${method} ${path}`)).toEqual(['DELETE /workshops/w1/footage/f1/marks/b']);

    act(() => result.current.mutate('c'));
    await waitFor(() => expect(labels(queryClient)).toEqual(['Mark a']));
    await waitFor(() => expect(held).toHaveLength(2));
    act(() => held[1].answer(404, { statusCode: 404, message: 'Mark not found' }));
    await waitFor(() => expect(result.current.isError).toBe(true));
    expect(labels(queryClient)).toEqual(['Mark a', 'Mark c']);
  });
});
