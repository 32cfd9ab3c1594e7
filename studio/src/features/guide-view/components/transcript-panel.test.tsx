import { fireEvent, screen, waitFor } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { formatClock } from '@/lib/clock';
import { fakeScrollLayout } from '@/testing/fake-scroll-layout';
import { renderWithProviders } from '@/testing/render';
import type { Cue } from '../api/types';
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
  });
  afterEach(() => vi.restoreAllMocks());

  it('keeps the playing cue in view until the reader scrolls, then offers to go back to now', async () => {
    const { rerender } = renderWithProviders(<TranscriptPanel cues={CUES} currentMs={200_000} onSeek={() => {}} />);
    // Cue 20 is below the box: the box scrolls it to a third of the way down (300 / 3).
    await waitFor(() => expect(playingCueDepth()).toBe(BOX_HEIGHT / 3));
    expect(screen.getByRole('button', { current: 'time' }).textContent).toContain('Cue 20');
    expect(screen.queryByRole('button', { name: 'Back to now' })).toBeNull();
    const movesByList = layout.moves.length;
    expect(movesByList).toBeGreaterThan(0);

    layout.scrollByHand(cueBox(), 0);
    rerender(<TranscriptPanel cues={CUES} currentMs={300_000} onSeek={() => {}} />);
    // The reader scrolled: playback moved on to cue 30 but the box stays where the reader put it.
    fireEvent.click(await screen.findByRole('button', { name: 'Back to now' }));
    expect(layout.moves.length).toBeGreaterThan(movesByList);
    // Back to now: cue 30 a third of the way down, and the offer is gone.
    await waitFor(() => expect(playingCueDepth()).toBe(BOX_HEIGHT / 3));
    expect(screen.getByRole('button', { current: 'time' }).textContent).toContain('Cue 30');
    expect(screen.queryByRole('button', { name: 'Back to now' })).toBeNull();
  });

  it('stays where the reader put it while playback moves on', async () => {
    const { rerender } = renderWithProviders(<TranscriptPanel cues={CUES} currentMs={200_000} onSeek={() => {}} />);
    await waitFor(() => expect(playingCueDepth()).toBe(BOX_HEIGHT / 3));
    layout.scrollByHand(cueBox(), 40);
    await waitFor(() => expect(screen.getByRole('button', { name: 'Back to now' })).toBeTruthy());
    const moves = layout.moves.length;
    rerender(<TranscriptPanel cues={CUES} currentMs={300_000} onSeek={() => {}} />);
    rerender(<TranscriptPanel cues={CUES} currentMs={390_000} onSeek={() => {}} />);
    await new Promise((resolve) => setTimeout(resolve, 50));
    expect(layout.moves.length).toBe(moves);
    expect(cueBox().scrollTop).toBe(40);
  });

  it('draws only the cues in view of a 3,000-cue transcript, and reaches the last cue', async () => {
    const seeks: number[] = [];
    const { rerender } = renderWithProviders(<TranscriptPanel cues={LONG_CUES} currentMs={0} onSeek={(ms) => seeks.push(ms)} />);
    expect(screen.getByTestId('transcript-count').textContent).toBe('3000 cues');
    const drawn = screen.getAllByTestId('transcript-cue').length;
    // A 300 px box shows 8 rows of 40 px; with the rows kept above and below it stays far under 3,000.
    expect(drawn).toBeGreaterThan(0);
    expect(drawn).toBeLessThan(40);
    // The list still has the height of every cue, so its scrollbar covers the whole session.
    expect(Number.parseFloat((cueBox().firstElementChild as HTMLElement).style.height)).toBeGreaterThan(3_000 * 30);
    expect(screen.getAllByRole('listitem')[0].getAttribute('aria-setsize')).toBe('3000');

    // Following playback to the end of the session brings the last cue in.
    rerender(<TranscriptPanel cues={LONG_CUES} currentMs={2_999 * 3_600 + 1_000} onSeek={(ms) => seeks.push(ms)} />);
    const last = await screen.findByRole('button', { name: /Long cue 2999/ });
    expect(last.getAttribute('aria-current')).toBe('time');
    expect(screen.getAllByTestId('transcript-cue').length).toBeLessThan(40);
    fireEvent.click(last);
    expect(seeks).toEqual([2_999 * 3_600]);

    // A reader scrolling back to the top by hand finds the first cue drawn again, and still far fewer rows.
    layout.scrollByHand(cueBox(), 0);
    expect(await screen.findByRole('button', { name: /Long cue 0$/ })).toBeTruthy();
    expect(screen.queryByRole('button', { name: /Long cue 2999/ })).toBeNull();
  });

  it('draws again only the cue that stops playing and the one that starts as the video plays on', async () => {
    const { rerender } = renderWithProviders(<TranscriptPanel cues={CUES} currentMs={200_000} onSeek={() => {}} />);
    await waitFor(() => expect(playingCueDepth()).toBe(BOX_HEIGHT / 3));
    // Let the list settle (the scroll's last frames) before counting.
    await new Promise((resolve) => setTimeout(resolve, 100));
    vi.mocked(formatClock).mockClear();
    // A new function each time, as a player passes: the rows still do not draw again for it.
    rerender(<TranscriptPanel cues={CUES} currentMs={205_000} onSeek={() => {}} />);
    expect(formatClock).not.toHaveBeenCalled();
    rerender(<TranscriptPanel cues={CUES} currentMs={210_000} onSeek={() => {}} />);
    expect(vi.mocked(formatClock).mock.calls.map(([ms]) => ms).sort()).toEqual([200_000, 210_000]);
    expect(screen.getByRole('button', { current: 'time' }).textContent).toContain('Cue 21');
  });
});
