import { act, fireEvent, screen, waitFor } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { formatClock } from '@/lib/clock';
import { createPlaybackClock, type PlaybackClock } from '@/lib/playback-clock';
import { stubApi } from '@/testing/api-stub';
import { fakeScrollLayout } from '@/testing/fake-scroll-layout';
import { renderWithProviders } from '@/testing/render';
import type { Cue } from '../api/types';
import { cueWindowRoute } from './test-guide';
import { TranscriptPanel } from './transcript-panel';

// Each drawn cue formats its time once: counting the calls counts the cues drawn.
vi.mock('@/lib/clock', async (importOriginal) => {
  const clock = await importOriginal<typeof import('@/lib/clock')>();
  return { ...clock, formatClock: vi.fn(clock.formatClock) };
});

// Invented cues, one every ten seconds.
const CUES: Cue[] = Array.from({ length: 40 }, (_, index) => ({ startMs: index * 10_000, endMs: index * 10_000 + 9_000, text: `Cue ${index}` }));
// An invented three-hour session: 3,000 cues, one every 3.6 s.
const LONG_CUES: Cue[] = Array.from({ length: 3_000 }, (_, index) => ({ startMs: index * 3_600, endMs: index * 3_600 + 3_000, text: `Long cue ${index}` }));

const BOX_HEIGHT = 300;
const SOURCE = { workshopSlug: 'harrow-lane', guideSlug: 'coupler-fit' };

/** Answers the public cues windows from `cues` as the API does: by time (fromMs, toMs) or by position (fromIndex, limit). */
function stubCues(cues: Cue[]) {
  return stubApi([cueWindowRoute(/^\/guides\/harrow-lane\/coupler-fit\/cues\?/, cues)]);
}

let clock: PlaybackClock;

/** The panel with the video at `ms`: the clock moves first (as the player moves it), then the panel renders. */
function panelAt(ms: number, onSeek: (ms: number) => void = () => {}) {
  act(() => clock.set(ms));
  return <TranscriptPanel {...SOURCE} clock={clock} onSeek={onSeek} />;
}

function cueBox(): HTMLElement {
  return screen.getByTestId('guide-transcript').querySelector('ul')?.parentElement as HTMLElement;
}

/** How far below the top of the box the playing cue sits, in px. */
function playingCueDepth(): number {
  const row = screen.getByRole('button', { current: 'time' }).closest('li') as HTMLElement;
  const start = Number(/translateY\((-?[\d.]+)px\)/.exec(row.style.transform)?.[1]);
  return start - cueBox().scrollTop;
}

describe('TranscriptPanel following playback', () => {
  let layout: ReturnType<typeof fakeScrollLayout>;
  beforeEach(() => {
    layout = fakeScrollLayout({ boxHeight: BOX_HEIGHT, rowHeight: 40 });
    clock = createPlaybackClock();
  });
  afterEach(() => vi.restoreAllMocks());

  it('keeps the playing cue in view until the reader scrolls, then offers to go back to now', async () => {
    stubCues(CUES);
    const { rerender } = renderWithProviders(panelAt(200_000));
    // Cue 20 is below the box: the box scrolls it to a third of the way down (300 / 3), once its windows arrive.
    await waitFor(() => expect(playingCueDepth()).toBe(BOX_HEIGHT / 3), { timeout: 5_000 });
    expect(screen.getByRole('button', { current: 'time' }).textContent).toContain('Cue 20');
    expect(screen.queryByRole('button', { name: 'Back to now' })).toBeNull();
    const movesByList = layout.moves.length;
    expect(movesByList).toBeGreaterThan(0);

    layout.scrollByHand(cueBox(), 0);
    rerender(panelAt(300_000));
    // The reader scrolled: playback moved on to cue 30 but the box stays where the reader put it.
    fireEvent.click(await screen.findByRole('button', { name: 'Back to now' }));
    expect(layout.moves.length).toBeGreaterThan(movesByList);
    // Back to now: cue 30 a third of the way down, and the offer is gone.
    await waitFor(() => expect(playingCueDepth()).toBe(BOX_HEIGHT / 3));
    expect(screen.getByRole('button', { current: 'time' }).textContent).toContain('Cue 30');
    expect(screen.queryByRole('button', { name: 'Back to now' })).toBeNull();
  });

  it('stays where the reader put it while playback moves on', async () => {
    stubCues(CUES);
    const { rerender } = renderWithProviders(panelAt(200_000));
    await waitFor(() => expect(playingCueDepth()).toBe(BOX_HEIGHT / 3));
    layout.scrollByHand(cueBox(), 40);
    await waitFor(() => expect(screen.getByRole('button', { name: 'Back to now' })).toBeTruthy());
    const moves = layout.moves.length;
    rerender(panelAt(300_000));
    rerender(panelAt(390_000));
    await new Promise((resolve) => setTimeout(resolve, 50));
    expect(layout.moves.length).toBe(moves);
    expect(cueBox().scrollTop).toBe(40);
  });

  it('draws only the cues in view of a 3,000-cue transcript, and reaches the last cue', async () => {
    const seeks: number[] = [];
    const requests = stubCues(LONG_CUES);
    const { rerender } = renderWithProviders(panelAt(0, (ms) => seeks.push(ms)));
    expect(await screen.findByText('3000 cues')).toBeTruthy();
    await screen.findByRole('button', { name: /Long cue 0$/ });
    const drawn = screen.getAllByTestId('transcript-cue').length;
    // A 300 px box shows 8 rows of 40 px; with the rows kept above and below it stays far under 3,000.
    expect(drawn).toBeGreaterThan(0);
    expect(drawn).toBeLessThan(40);
    // The list still has the height of every cue, so its scrollbar covers the whole session.
    expect(Number.parseFloat((cueBox().firstElementChild as HTMLElement).style.height)).toBeGreaterThan(3_000 * 30);
    expect(screen.getAllByRole('listitem')[0].getAttribute('aria-setsize')).toBe('3000');

    // Following playback to the end of the session brings the last cue in.
    rerender(panelAt(2_999 * 3_600 + 1_000, (ms) => seeks.push(ms)));
    // The playing minute's window names the row; the row's own window follows.
    const last = await screen.findByRole('button', { name: /Long cue 2999/ }, { timeout: 5_000 });
    expect(last.getAttribute('aria-current')).toBe('time');
    expect(screen.getAllByTestId('transcript-cue').length).toBeLessThan(40);
    fireEvent.click(last);
    expect(seeks).toEqual([2_999 * 3_600]);

    // A reader scrolling back to the top by hand finds the first cue drawn again, and still far fewer rows.
    layout.scrollByHand(cueBox(), 0);
    expect(await screen.findByRole('button', { name: /Long cue 0$/ })).toBeTruthy();
    expect(screen.queryByRole('button', { name: /Long cue 2999/ })).toBeNull();

    // Only windows were asked for: rows by the hundred, the playing minute by time; never the whole transcript.
    const windows = requests.map((request) => request.url.searchParams);
    expect(windows.every((query) => (query.has('fromMs') ? Number(query.get('toMs')) - Number(query.get('fromMs')) === 60_000 : Number(query.get('limit')) === 100))).toBe(true);
    expect(new Set(windows.filter((query) => query.has('fromIndex')).map((query) => query.get('fromIndex')))).toEqual(new Set(['0', '2900']));
  });

  it('fetches the whole transcript only to search it, and finds cues anywhere in the three hours', async () => {
    const requests = stubCues(LONG_CUES);
    renderWithProviders(panelAt(0));
    await screen.findByText('3000 cues');
    expect(requests.some((request) => request.url.searchParams.get('limit') === '500')).toBe(false);
    fireEvent.change(screen.getByRole('searchbox', { name: 'Search the transcript' }), { target: { value: 'cue 2999' } });
    expect(await screen.findByText('1 of 3000 cues mention “cue 2999”')).toBeTruthy();
    // The found words are highlighted, each its own element.
    expect((await screen.findByTestId('transcript-cue')).textContent).toBe('2:59:56Long cue 2999');
    // Six windows of 500 make the 3,000 cues.
    expect(requests.filter((request) => request.url.searchParams.get('limit') === '500').map((request) => request.url.searchParams.get('fromIndex'))).toEqual([
      '0',
      '500',
      '1000',
      '1500',
      '2000',
      '2500',
    ]);
  });

  it('says when the video has no transcript', async () => {
    stubApi([{ path: /\/cues\?/, status: 404, body: { statusCode: 404, message: 'This guide has no transcript' } }]);
    renderWithProviders(panelAt(0));
    expect(await screen.findByText('This video has no transcript.')).toBeTruthy();
  });

  it('draws again only the cue that stops playing and the one that starts as the video plays on', async () => {
    stubCues(CUES);
    const { rerender } = renderWithProviders(panelAt(200_000));
    await waitFor(() => expect(playingCueDepth()).toBe(BOX_HEIGHT / 3));
    // Let the list settle (the scroll's last frames) before counting.
    await new Promise((resolve) => setTimeout(resolve, 100));
    vi.mocked(formatClock).mockClear();
    // A new function each time, as a player passes: the rows still do not draw again for it.
    rerender(panelAt(205_000));
    expect(formatClock).not.toHaveBeenCalled();
    rerender(panelAt(210_000));
    expect(vi.mocked(formatClock).mock.calls.map(([ms]) => ms).sort()).toEqual([200_000, 210_000]);
    expect(screen.getByRole('button', { current: 'time' }).textContent).toContain('Cue 21');
  });
});
