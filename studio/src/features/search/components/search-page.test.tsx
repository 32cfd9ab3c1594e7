import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { stubApi } from '@/testing/api-stub';
import { renderWithProviders } from '@/testing/render';
import type { SearchHit, SearchResults } from '../api/types';
import { SearchPage } from './search-page';

const CUE_HIT: SearchHit = {
  kind: 'cue',
  id: 'g1:t1:4',
  published: true,
  title: 'Fitting the motor-to-gearbox coupler',
  snippet: [
    { text: 'the ', match: false },
    { text: 'spline', match: true },
    { text: ' <b>engages</b> here', match: false },
  ],
  workshop: { name: 'Harrow Lane Garage', slug: 'harrow-lane-garage' },
  vehicle: 'compact pickup',
  startMs: 42_000,
  checkState: null,
  link: '/guides/harrow-lane-garage/motor-coupler?t=42.0',
};

function results(overrides: Partial<SearchResults> = {}): SearchResults {
  return {
    terms: ['spline'],
    partNumbers: [],
    total: 1,
    totalCapped: false,
    offset: 0,
    limit: 20,
    counts: [
      { kind: 'guide', count: 0, capped: false },
      { kind: 'cue', count: 1, capped: false },
      { kind: 'part', count: 0, capped: false },
    ],
    results: [CUE_HIT],
    ...overrides,
  };
}

describe('SearchPage', () => {
  afterEach(() => vi.restoreAllMocks());

  it('shows a cue hit with its moment, a link that opens the guide there, and the matched word marked as text', async () => {
    stubApi([{ path: /^\/search\?/, body: results() }, { path: /^\/auth\/me$/, status: 401, body: { statusCode: 401, message: 'Sign in' } }]);
    renderWithProviders(<SearchPage />, { route: '/search?q=spline' });
    const hit = await screen.findByTestId('search-hit');
    const link = within(hit).getByRole('link', { name: 'Fitting the motor-to-gearbox coupler at 0:42' });
    expect(link.getAttribute('href')).toBe('/guides/harrow-lane-garage/motor-coupler?t=42.0');
    const marked = within(hit).getByText('spline');
    expect(marked.tagName).toBe('MARK');
    // Text that looks like markup stays text.
    expect(within(hit).getByText('<b>engages</b> here', { exact: false })).toBeTruthy();
    expect(hit.querySelector('b')).toBeNull();
    expect(screen.getByTestId('search-summary').textContent).toBe('1 result — showing 1–1');
  });

  it('asks again with the kind chosen from the chips, and pages with the offset', async () => {
    const requests = stubApi([
      { path: /^\/search\?/, body: ({ url }: { url: URL }) => results({ total: 45, offset: Number(url.searchParams.get('offset') ?? 0) }) },
      { path: /^\/auth\/me$/, status: 401, body: { statusCode: 401, message: 'Sign in' } },
    ]);
    renderWithProviders(<SearchPage />, { route: '/search?q=spline' });
    fireEvent.click(await screen.findByRole('radio', { name: 'Transcript (1)' }));
    await waitFor(() => expect(requests.filter((r) => r.url.pathname === '/api/search').at(-1)?.url.searchParams.get('kind')).toBe('cue'));
    fireEvent.click(await screen.findByRole('button', { name: '2' }));
    await waitFor(() => expect(requests.filter((r) => r.url.pathname === '/api/search').at(-1)?.url.searchParams.get('offset')).toBe('20'));
    expect(requests.filter((r) => r.url.pathname === '/api/search').at(-1)?.url.searchParams.get('kind')).toBe('cue');
  });

  it('shows a capped count as "1,000+" on the chips and the summary', async () => {
    stubApi([
      {
        path: /^\/search\?/,
        body: results({
          total: 1_000,
          totalCapped: true,
          counts: [
            { kind: 'guide', count: 12, capped: false },
            { kind: 'cue', count: 1_000, capped: true },
          ],
        }),
      },
      { path: /^\/auth\/me$/, status: 401, body: { statusCode: 401, message: 'Sign in' } },
    ]);
    renderWithProviders(<SearchPage />, { route: '/search?q=spline' });
    expect(await screen.findByRole('radio', { name: 'Transcript (1,000+)' })).toBeTruthy();
    expect(screen.getByRole('radio', { name: 'Guide (12)' })).toBeTruthy();
    expect(screen.getByRole('radio', { name: 'All (1,012+)' })).toBeTruthy();
    expect(screen.getByTestId('search-summary').textContent).toBe('1,000+ results — showing 1–1');
  });

  it('asks again with a workshop from the answer and a fit-check state', async () => {
    const requests = stubApi([
      { path: /^\/search\?/, body: results() },
      { path: /^\/auth\/me$/, status: 401, body: { statusCode: 401, message: 'Sign in' } },
    ]);
    renderWithProviders(<SearchPage />, { route: '/search?q=spline' });
    await screen.findByTestId('search-hit');
    const last = () => requests.filter((r) => r.url.pathname === '/api/search').at(-1)?.url.searchParams;
    fireEvent.change(screen.getByLabelText('Workshop'), { target: { value: 'harrow-lane-garage' } });
    await waitFor(() => expect(last()?.get('workshop')).toBe('harrow-lane-garage'));
    fireEvent.change(screen.getByLabelText('Fit check'), { target: { value: 'confirmed' } });
    await waitFor(() => expect(last()?.get('checkState')).toBe('confirmed'));
    expect(last()?.get('workshop')).toBe('harrow-lane-garage');
    fireEvent.change(screen.getByLabelText('Workshop'), { target: { value: '' } });
    await waitFor(() => expect(last()?.get('workshop')).toBeNull());
  });

  it("says what the API refused, naming the field", async () => {
    stubApi([
      { path: /^\/search\?/, status: 400, body: { statusCode: 400, message: 'q: nothing to search for; use words of three letters or more' } },
      { path: /^\/auth\/me$/, status: 401, body: { statusCode: 401, message: 'Sign in' } },
    ]);
    renderWithProviders(<SearchPage />, { route: '/search?q=the' });
    expect(await screen.findByText(/^q: nothing to search for/u)).toBeTruthy();
  });
});
