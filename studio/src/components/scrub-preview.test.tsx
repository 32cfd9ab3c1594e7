import { fireEvent, screen } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { renderWithProviders } from '@/testing/render';
import { createPlaybackClock } from '@/lib/playback-clock';
import { moment, ScrubBar, ScrubPreview } from './scrub-preview';
import type { ThumbnailTile } from '@/lib/vtt-thumbnails';

const TRACK = 'WEBVTT\n\n00:00:00.000 --> 00:00:05.000\nsprite.jpg#xywh=0,0,160,90\n\n00:00:05.000 --> 00:00:10.000\nsprite.jpg#xywh=160,0,160,90\n';

const tiles: ThumbnailTile[] = [
  { startMs: 0, endMs: 5000, imageUrl: 'https://s.example/sprite.jpg', x: 0, y: 0, width: 160, height: 90 },
  { startMs: 5000, endMs: 10_000, imageUrl: 'https://s.example/sprite.jpg', x: 160, y: 0, width: 160, height: 90 },
];

afterEach(() => {
  vi.restoreAllMocks();
  vi.unstubAllGlobals();
});

describe('moment', () => {
  it('maps the pointer to a time on the bar, clamped to the footage', () => {
    expect(moment(50, 200, 10_000)).toBe(2500);
    expect(moment(-5, 200, 10_000)).toBe(0);
    expect(moment(250, 200, 10_000)).toBe(10_000);
    expect(moment(10, 0, 10_000)).toBe(0);
  });
});

describe('ScrubPreview', () => {
  it('shows the sprite tile for the hovered moment and its time, kept inside the container', () => {
    renderWithProviders(<ScrubPreview tiles={tiles} atMs={6200} x={395} containerWidth={400} />);
    const tile = screen.getByTestId('scrub-preview-tile');
    expect(tile.style.backgroundPosition).toBe('-160px 0px');
    expect(tile.style.width).toBe('160px');
    expect(screen.getByTestId('scrub-preview').textContent).toBe('0:06');
    // 395 - 80 would overflow a 400 px container: the preview stops at its right edge.
    expect(screen.getByTestId('scrub-preview').style.left).toBe('240px');
  });

  it('shows only the time where there is no tile, and nothing when nothing is hovered', () => {
    const { rerender } = renderWithProviders(<ScrubPreview tiles={tiles} atMs={12_000} x={10} containerWidth={400} />);
    expect(screen.queryByTestId('scrub-preview-tile')).toBeNull();
    expect(screen.getByTestId('scrub-preview').textContent).toBe('0:12');
    rerender(<ScrubPreview tiles={tiles} atMs={null} x={10} containerWidth={400} />);
    expect(screen.queryByTestId('scrub-preview')).toBeNull();
  });
});

describe('ScrubBar', () => {
  it('fetches the thumbnails track, previews on hover, seeks on press and with the arrow keys', async () => {
    const fetchMock = vi.fn(async () => new Response(TRACK, { status: 200 }));
    vi.stubGlobal('fetch', fetchMock);
    const clock = createPlaybackClock(20_000);
    const onSeek = vi.fn();
    renderWithProviders(<ScrubBar clock={clock} durationMs={60_000} thumbnailsUrl="/api/guides/w/g/thumbnails.vtt" onSeek={onSeek} />);
    const bar = screen.getByTestId('scrub-bar');
    vi.spyOn(bar, 'getBoundingClientRect').mockReturnValue({ left: 100, width: 600, top: 0, height: 8, right: 700, bottom: 8, x: 100, y: 0, toJSON: () => ({}) });
    await vi.waitFor(() => expect(fetchMock).toHaveBeenCalledTimes(1));

    // 60 px into a 600 px bar of one minute: 6 s, the second tile.
    fireEvent.pointerMove(bar, { clientX: 160 });
    await vi.waitFor(() => expect(screen.getByTestId('scrub-preview-tile').style.backgroundPosition).toBe('-160px 0px'));
    expect(onSeek).not.toHaveBeenCalled();

    fireEvent.pointerDown(bar, { clientX: 400, pointerId: 1 });
    expect(onSeek).toHaveBeenLastCalledWith(30_000);
    fireEvent.pointerMove(bar, { clientX: 430, pointerId: 1 });
    expect(onSeek).toHaveBeenLastCalledWith(33_000);
    fireEvent.pointerUp(bar, { pointerId: 1 });
    fireEvent.pointerMove(bar, { clientX: 500 });
    expect(onSeek).toHaveBeenCalledTimes(2);

    expect(bar.getAttribute('aria-valuetext')).toBe('0:20 of 1:00');
    fireEvent.keyDown(bar, { key: 'ArrowRight' });
    expect(onSeek).toHaveBeenLastCalledWith(25_000);
    fireEvent.keyDown(bar, { key: 'Home' });
    expect(onSeek).toHaveBeenLastCalledWith(0);
    fireEvent.pointerLeave(bar);
    expect(screen.queryByTestId('scrub-preview')).toBeNull();
  });
});
