import { act, fireEvent, screen, waitFor } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { formatClock } from '@/lib/clock';
import { createPlaybackClock } from '@/lib/playback-clock';
import { stubApi } from '@/testing/api-stub';
import { fakeScrollLayout } from '@/testing/fake-scroll-layout';
import { renderWithProviders } from '@/testing/render';
import { WorkshopAccessProvider } from '@/lib/workshop-access';
import type { CueMatch, SearchResults, Transcript } from '../api/types';
import { TranscriptPane } from './transcript-pane';

// Each drawn cue formats its time once: counting the calls counts the cues drawn.
vi.mock('@/lib/clock', async (importOriginal) => {
  const clock = await importOriginal<typeof import('@/lib/clock')>();
  return { ...clock, formatClock: vi.fn(clock.formatClock) };
});

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

describe('TranscriptPane read-only (a site admin, or a disabled workshop)', () => {
  afterEach(() => vi.restoreAllMocks());

  it('offers the WebVTT download but not Replace; a member gets Replace', () => {
    stubApi([]);
    const pane = (readOnly: boolean) => (
      <WorkshopAccessProvider readOnly={readOnly}>
        <TranscriptPane workshopId="w1" footageId="f1" transcript={TRANSCRIPT} clock={createPlaybackClock()} transcriptMaxBytes={1_000_000} onSeek={() => {}} />
      </WorkshopAccessProvider>
    );
    const { rerender } = renderWithProviders(pane(true));
    expect(screen.getByRole('link', { name: 'WebVTT' })).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Replace' })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Attach transcript' })).toBeNull();
    rerender(pane(false));
    expect(screen.getByRole('button', { name: 'Replace' })).toBeTruthy();
  });
});

describe('TranscriptPane search', () => {
  afterEach(() => vi.restoreAllMocks());

  it('says how many hits there are in all and fetches the rest on request', async () => {
    // 18 hits; the stub answers pages of 10 (the studio asks for 50), so a small list still has a second page.
    const seen = stubApi([{ path: /\/transcript\/search\?/, body: (request: { url: URL }) => searchPage({ url: withLimit(request.url, 10) }) }]);
    renderWithProviders(
      <TranscriptPane workshopId="w1" footageId="f1" transcript={TRANSCRIPT} clock={createPlaybackClock()} transcriptMaxBytes={1_000_000} onSeek={() => {}} />,
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

// An invented three-hour session: 3,000 cues, one every 3.6 s.
const LONG_TRANSCRIPT: Transcript = {
  ...TRANSCRIPT,
  cueCount: 3_000,
  cues: Array.from({ length: 3_000 }, (_, index) => ({ index, startMs: index * 3_600, endMs: index * 3_600 + 3_000, text: `Long cue ${index}` })),
};
const BOX_HEIGHT = 300;

function cueBox(): HTMLElement {
  return screen.getByTestId('transcript-cues').parentElement as HTMLElement;
}

function drawnCues(): HTMLElement[] {
  return [...screen.getByTestId('transcript-cues').querySelectorAll<HTMLElement>('button')];
}

/** How far below the top of the box the playing cue sits, in px. */
function playingCueDepth(): number {
  const row = screen.getByTestId('transcript-cues').querySelector('[data-active]')?.parentElement as HTMLElement;
  const start = Number(/translateY\((-?[\d.]+)px\)/.exec(row.style.transform)?.[1]);
  return start - cueBox().scrollTop;
}

describe('TranscriptPane cues', () => {
  let layout: ReturnType<typeof fakeScrollLayout>;
  beforeEach(() => {
    layout = fakeScrollLayout({ boxHeight: BOX_HEIGHT, rowHeight: 40 });
  });
  afterEach(() => vi.restoreAllMocks());

  const clock = createPlaybackClock();
  /** The pane with the video at `currentMs`: the clock moves first (as the player moves it), then the pane renders. */
  function pane(currentMs: number, onSeek: (ms: number) => void = () => {}) {
    act(() => clock.set(currentMs));
    return <TranscriptPane workshopId="w1" footageId="f1" transcript={LONG_TRANSCRIPT} clock={clock} transcriptMaxBytes={1_000_000} onSeek={onSeek} />;
  }

  it('draws only the cues in view of a 3,000-cue transcript, follows playback to the last cue, and lets the person scroll away', async () => {
    const seeks: number[] = [];
    const { rerender } = renderWithProviders(pane(0, (ms) => seeks.push(ms)));
    expect(drawnCues().length).toBeGreaterThan(0);
    // A 300 px box shows 8 rows of 40 px; with the rows kept above and below it stays far under 3,000.
    expect(drawnCues().length).toBeLessThan(40);
    expect(Number.parseFloat(screen.getByTestId('transcript-cues').style.height)).toBeGreaterThan(3_000 * 30);

    // Playback reaches the end of the session: the box follows, so the last cue is drawn and playing.
    rerender(pane(2_999 * 3_600 + 1_000, (ms) => seeks.push(ms)));
    const last = await screen.findByRole('button', { name: /Long cue 2999/ });
    expect(last.hasAttribute('data-active')).toBe(true);
    expect(drawnCues().length).toBeLessThan(40);
    fireEvent.click(last);
    expect(seeks).toEqual([2_999 * 3_600]);

    // The person scrolls to the start by hand: playback moving on no longer moves the box, until Back to now.
    layout.scrollByHand(cueBox(), 0);
    expect(await screen.findByRole('button', { name: /Long cue 0$/ })).toBeTruthy();
    const moves = layout.moves.length;
    rerender(pane(1_500 * 3_600 + 1_000));
    await new Promise((resolve) => setTimeout(resolve, 50));
    expect(layout.moves.length).toBe(moves);
    expect(cueBox().scrollTop).toBe(0);
    fireEvent.click(screen.getByRole('button', { name: 'Back to now' }));
    expect(await screen.findByRole('button', { name: /Long cue 1500$/ })).toBeTruthy();
    await waitFor(() => expect(playingCueDepth()).toBe(BOX_HEIGHT / 3));
    expect(screen.queryByRole('button', { name: 'Back to now' })).toBeNull();
  }, 20_000);

  it('draws again only the cue that stops playing and the one that starts as the video plays on', async () => {
    const { rerender } = renderWithProviders(pane(1_000));
    expect(await screen.findByRole('button', { name: /Long cue 0$/ })).toBeTruthy();
    vi.mocked(formatClock).mockClear();
    // A new onSeek each time, as the player page passes: the rows still do not draw again for it.
    rerender(pane(2_000, () => {}));
    expect(formatClock).not.toHaveBeenCalled();
    rerender(pane(3_700, () => {}));
    expect(vi.mocked(formatClock).mock.calls.map(([ms]) => ms).sort((a, b) => a - b)).toEqual([0, 3_600]);
    expect(screen.getByRole('button', { name: /Long cue 1$/ }).hasAttribute('data-active')).toBe(true);
  });
});

function withLimit(url: URL, limit: number): URL {
  const copy = new URL(url);
  copy.searchParams.set('limit', String(limit));
  return copy;
}
