import { fireEvent, screen } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { renderWithProviders } from '@/testing/render';
import type { Cue } from '../api/types';
import { TranscriptPanel } from './transcript-panel';

// Invented cues, one every ten seconds.
const CUES: Cue[] = Array.from({ length: 40 }, (_, index) => ({ startMs: index * 10_000, endMs: index * 10_000 + 9_000, text: `Cue ${index}` }));

describe('TranscriptPanel following playback', () => {
  const scrolls: number[] = [];
  beforeEach(() => {
    scrolls.length = 0;
    // jsdom does not lay out: give the box a viewport smaller than its content, and every row a height and place.
    vi.spyOn(HTMLElement.prototype, 'scrollHeight', 'get').mockReturnValue(4_000);
    vi.spyOn(HTMLElement.prototype, 'clientHeight', 'get').mockReturnValue(300);
    vi.spyOn(HTMLElement.prototype, 'offsetHeight', 'get').mockReturnValue(40);
    vi.spyOn(HTMLElement.prototype, 'offsetTop', 'get').mockImplementation(function offsetTop(this: HTMLElement) {
      const row = this.closest('li');
      return row ? [...(row.parentElement?.children ?? [])].indexOf(row) * 40 : 0;
    });
    Element.prototype.scrollTo = vi.fn(function scrollTo(options?: ScrollToOptions | number) {
      if (typeof options === 'object' && options.top !== undefined) scrolls.push(options.top);
    }) as typeof Element.prototype.scrollTo;
  });
  afterEach(() => vi.restoreAllMocks());

  it('keeps the playing cue in view until the reader scrolls, then offers to go back to now', async () => {
    const { rerender } = renderWithProviders(<TranscriptPanel cues={CUES} currentMs={200_000} onSeek={() => {}} />);
    // Cue 20 sits at 800 px: the box scrolls it to a third of the way down (800 − 100).
    expect(scrolls).toEqual([700]);
    expect(screen.queryByRole('button', { name: 'Back to now' })).toBeNull();

    fireEvent.wheel(screen.getAllByTestId('transcript-cue')[0].closest('div') as HTMLElement);
    rerender(<TranscriptPanel cues={CUES} currentMs={300_000} onSeek={() => {}} />);
    // The reader scrolled: playback moved on to cue 30 but the box stays where the reader put it.
    expect(scrolls).toEqual([700]);

    fireEvent.click(await screen.findByRole('button', { name: 'Back to now' }));
    expect(scrolls).toEqual([700, 1_100]);
    expect(screen.queryByRole('button', { name: 'Back to now' })).toBeNull();
  });
});
