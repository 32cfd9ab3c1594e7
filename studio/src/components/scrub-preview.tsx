import { useQuery } from '@tanstack/react-query';
import { useRef, useState, type KeyboardEvent, type PointerEvent } from 'react';
import { formatClock } from '@/lib/clock';
import { usePlaybackMs, type PlaybackClock } from '@/lib/playback-clock';
import { parseThumbnailTrack, tileAt, type ThumbnailTile } from '@/lib/vtt-thumbnails';
import classes from './scrub-preview.module.css';

const NO_TILES: ThumbnailTile[] = [];

/**
 * The tiles of a footage's WebVTT thumbnails track (fetched once per address; same-origin, so a private
 * track goes with the session). Its sprite links are short-lived, so the track is fetched again after a while.
 */
export function useThumbnailTiles(thumbnailsUrl: string | null | undefined): ThumbnailTile[] {
  const tiles = useQuery({
    queryKey: ['media', 'thumbnails', thumbnailsUrl] as const,
    queryFn: async ({ signal }) => {
      const trackUrl = new URL(thumbnailsUrl ?? '', window.location.href).toString();
      const response = await fetch(trackUrl, { signal, credentials: 'same-origin' });
      if (!response.ok) throw new Error(`The thumbnails track answered ${response.status}`);
      return parseThumbnailTrack(await response.text(), trackUrl);
    },
    enabled: Boolean(thumbnailsUrl),
    staleTime: 4 * 60_000,
    // Previews are decoration: a failed track leaves the bar working without them.
    retry: 1,
  });
  return tiles.data ?? NO_TILES;
}

/** The frame at a moment (a tile of the sprite sheet, when there is one) and its time: for a container that places it. */
export function ScrubFrame({ tiles, atMs }: { tiles: readonly ThumbnailTile[]; atMs: number }) {
  const tile = tileAt(tiles, atMs);
  return (
    <div className={classes.frame} data-testid="scrub-frame">
      {tile && (
        <div
          className={classes.tile}
          data-testid="scrub-preview-tile"
          style={{
            width: tile.width,
            height: tile.height,
            backgroundImage: `url("${tile.imageUrl}")`,
            backgroundPosition: `${-tile.x}px ${-tile.y}px`,
          }}
        />
      )}
      <span className={classes.time}>{formatClock(atMs)}</span>
    </div>
  );
}

export interface ScrubPreviewProps {
  tiles: readonly ThumbnailTile[];
  /** The moment under the pointer, or null when nothing is hovered or dragged. */
  atMs: number | null;
  /** The pointer's x within the container (px) and the container's width: the preview stays inside it. */
  x: number;
  containerWidth: number;
}

/** The frame at the hovered moment floating above a bar that is `position: relative`, kept within the bar's width. */
export function ScrubPreview({ tiles, atMs, x, containerWidth }: ScrubPreviewProps) {
  if (atMs === null) return null;
  const width = tileAt(tiles, atMs)?.width ?? 56;
  const left = Math.max(0, Math.min(containerWidth - width, x - width / 2));
  return (
    <div className={classes.preview} style={{ left, width }} data-testid="scrub-preview" aria-hidden="true">
      <ScrubFrame tiles={tiles} atMs={atMs} />
    </div>
  );
}

/** Where a pointer is on a bar of `width` px showing `durationMs`, in ms (clamped to the footage). */
export function moment(offsetX: number, width: number, durationMs: number): number {
  if (!(width > 0)) return 0;
  return Math.round(Math.max(0, Math.min(1, offsetX / width)) * durationMs);
}

const KEY_STEP_MS = 5_000;

export interface ScrubBarProps {
  clock: PlaybackClock;
  durationMs: number;
  thumbnailsUrl: string | null;
  onSeek: (ms: number) => void;
}

/** A seek bar under a video: hover or drag shows the frame there, a click or a drag moves the video, arrows step 5 s. */
export function ScrubBar({ clock, durationMs, thumbnailsUrl, onSeek }: ScrubBarProps) {
  const currentMs = usePlaybackMs(clock);
  const tiles = useThumbnailTiles(thumbnailsUrl);
  const [hover, setHover] = useState<{ ms: number; x: number; width: number } | null>(null);
  const dragging = useRef(false);

  const pointAt = (event: PointerEvent<HTMLDivElement>) => {
    const box = event.currentTarget.getBoundingClientRect();
    const x = event.clientX - box.left;
    return { ms: moment(x, box.width, durationMs), x, width: box.width };
  };

  const handlePointerDown = (event: PointerEvent<HTMLDivElement>) => {
    dragging.current = true;
    event.currentTarget.setPointerCapture?.(event.pointerId);
    const point = pointAt(event);
    setHover(point);
    onSeek(point.ms);
  };

  const handlePointerMove = (event: PointerEvent<HTMLDivElement>) => {
    const point = pointAt(event);
    setHover(point);
    if (dragging.current) onSeek(point.ms);
  };

  const handlePointerUp = (event: PointerEvent<HTMLDivElement>) => {
    dragging.current = false;
    event.currentTarget.releasePointerCapture?.(event.pointerId);
  };

  const handleKeyDown = (event: KeyboardEvent<HTMLDivElement>) => {
    const target =
      event.key === 'ArrowRight'
        ? currentMs + KEY_STEP_MS
        : event.key === 'ArrowLeft'
          ? currentMs - KEY_STEP_MS
          : event.key === 'Home'
            ? 0
            : event.key === 'End'
              ? durationMs
              : null;
    if (target === null) return;
    event.preventDefault();
    onSeek(Math.max(0, Math.min(durationMs, target)));
  };

  const played = Math.min(100, (currentMs / durationMs) * 100);
  return (
    <div className={classes.barArea}>
      <div
        className={classes.bar}
        role="slider"
        tabIndex={0}
        aria-label="Seek in the video"
        aria-valuemin={0}
        aria-valuemax={Math.round(durationMs / 1000)}
        aria-valuenow={Math.round(currentMs / 1000)}
        aria-valuetext={`${formatClock(currentMs)} of ${formatClock(durationMs)}`}
        data-testid="scrub-bar"
        onPointerDown={handlePointerDown}
        onPointerMove={handlePointerMove}
        onPointerUp={handlePointerUp}
        onPointerCancel={handlePointerUp}
        onPointerLeave={() => {
          if (!dragging.current) setHover(null);
        }}
        onKeyDown={handleKeyDown}
      >
        <div className={classes.played} style={{ width: `${played}%` }} />
      </div>
      <ScrubPreview tiles={tiles} atMs={hover?.ms ?? null} x={hover?.x ?? 0} containerWidth={hover?.width ?? 0} />
    </div>
  );
}
