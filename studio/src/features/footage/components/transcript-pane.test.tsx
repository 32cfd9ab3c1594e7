import { fireEvent, screen, waitFor } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { stubApi } from '@/testing/api-stub';
import { renderWithProviders } from '@/testing/render';
import type { CueMatch, SearchResults, Transcript } from '../api/types';
import { TranscriptPane } from './transcript-pane';

// Invented test transcript: one cue a minute for three hours, every tenth one about the spline.
const CUES = Array.from({ length: 180 }, (_, index) => ({
  index,
  startMs: index * 60_000,
  endMs: index * 60_000 + 5_000,
  text: index % 10 === 0 ? `Spline count check number ${index}` : `Cue ${index}`,
}));
const SPLINE_HITS: CueMatch[] = CUES.filter((cue) => cue.text.startsWith('Spline')).map((cue) => ({
  cueIndex: cue.index,
  startMs: cue.startMs,
  endMs: cue.endMs,
  text: cue.text,
}));
const TRANSCRIPT: Transcript = {
  id: 't1',
  footageId: 'f1',
  revision: 1,
  format: 'webvtt',
  sourceName: null,
  cueCount: CUES.length,
  isActive: true,
  createdAt: '2026-12-01T10:00:00.000Z',
  cues: CUES,
};

/** Answers searches from SPLINE_HITS a page at a time, as the API does. */
function searchPage({ url }: { url: URL }): SearchResults<CueMatch> {
  const offset = Number(url.searchParams.get('offset') ?? 0);
  const limit = Number(url.searchParams.get('limit') ?? 50);
  return { terms: ['spline'], total: SPLINE_HITS.length, offset, results: SPLINE_HITS.slice(offset, offset + limit) };
}

describe('TranscriptPane search', () => {
  afterEach(() => vi.restoreAllMocks());

  it('says how many hits there are in all and fetches the rest on request', async () => {
    // 18 hits; the stub answers pages of 10 (the studio asks for 50), so a small list still has a second page.
    const seen = stubApi([{ path: /\/transcript\/search\?/, body: (request: { url: URL }) => searchPage({ url: withLimit(request.url, 10) }) }]);
    renderWithProviders(
      <TranscriptPane workshopId="w1" footageId="f1" transcript={TRANSCRIPT} currentMs={0} transcriptMaxBytes={1_000_000} onSeek={() => {}} />,
    );
    fireEvent.change(screen.getByLabelText('Search this transcript'), { target: { value: 'spline' } });

    // Generous waits: the debounce, then two answers, on a busy machine.
    expect(await screen.findByText('18 hits — showing 1–10', {}, { timeout: 5_000 })).toBeTruthy();
    expect(screen.getAllByText(/number/)).toHaveLength(10);

    fireEvent.click(screen.getByRole('button', { name: 'Show more' }));
    await waitFor(() => expect(screen.getAllByText(/number/)).toHaveLength(18), { timeout: 5_000 });
    expect(screen.getByText('18 hits')).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Show more' })).toBeNull();
    // The second page started where the first ended.
    const offsets = seen.map((request) => request.url.searchParams.get('offset'));
    expect(offsets).toEqual(['0', '10']);
    // Times past the hour read as hours: the last hit is at 2 h 50 min.
    expect(screen.getByText('2:50:00')).toBeTruthy();
  }, 20_000);
});

function withLimit(url: URL, limit: number): URL {
  const copy = new URL(url);
  copy.searchParams.set('limit', String(limit));
  return copy;
}
