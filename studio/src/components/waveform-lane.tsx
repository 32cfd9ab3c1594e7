import { Text } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import { useEffect, useRef, useState } from 'react';
import classes from './waveform-lane.module.css';

/** The audio's peaks as the media pipeline stores them (0..1, the loudest sample of each bucket). */
export interface Waveform {
  durationMs: number;
  peaksPerSecond: number;
  hasAudio: boolean;
  peaks: number[];
}

/** A footage's waveform (same-origin JSON; a private one goes with the session). Made once, so kept for the page's life. */
export function useWaveform(waveformUrl: string | null | undefined): Waveform | undefined {
  const waveform = useQuery({
    queryKey: ['media', 'waveform', waveformUrl] as const,
    queryFn: async ({ signal }) => {
      const response = await fetch(waveformUrl ?? '', { signal, credentials: 'same-origin', headers: { Accept: 'application/json' } });
      if (!response.ok) throw new Error(`The waveform answered ${response.status}`);
      return (await response.json()) as Waveform;
    },
    enabled: Boolean(waveformUrl),
    staleTime: Infinity,
    retry: 1,
  });
  return waveform.data;
}

/**
 * One height (0..1) per column for the window `fromMs`..`toMs`: the loudest peak the column covers, so a
 * short word never disappears when zoomed out; zoomed in past one peak per column, each column shows the
 * peak it falls in. Linear in the columns plus the peaks in the window.
 */
export function waveformColumns(waveform: Waveform, fromMs: number, toMs: number, columns: number): number[] {
  const { peaks, peaksPerSecond } = waveform;
  const count = Math.max(0, Math.floor(columns));
  const heights = new Array<number>(count).fill(0);
  if (count === 0 || !(toMs > fromMs) || !(peaksPerSecond > 0)) return heights;
  const peakAt = (ms: number) => Math.floor((ms / 1000) * peaksPerSecond);
  const spanMs = (toMs - fromMs) / count;
  for (let column = 0; column < count; column += 1) {
    const first = Math.max(0, peakAt(fromMs + column * spanMs));
    const end = Math.min(peaks.length, Math.max(first + 1, peakAt(fromMs + (column + 1) * spanMs)));
    let loudest = 0;
    for (let index = first; index < end; index += 1) loudest = Math.max(loudest, peaks[index]);
    heights[column] = Math.min(1, loudest);
  }
  return heights;
}

export interface WaveformLaneProps {
  waveform: Waveform | undefined;
  /** The visible window of the timeline above, so the lane zooms and pans with it. */
  fromMs: number;
  toMs: number;
  height?: number;
}

/** The audio under a timeline: a bar per pixel column, drawn on a canvas in the lane's text colour. */
export function WaveformLane({ waveform, fromMs, toMs, height = 32 }: WaveformLaneProps) {
  const canvas = useRef<HTMLCanvasElement>(null);
  const [width, setWidth] = useState(0);

  // The canvas draws in device pixels, so it follows the lane's laid-out width.
  useEffect(() => {
    const element = canvas.current;
    if (!element) return;
    const observer = new ResizeObserver(() => setWidth(element.clientWidth));
    observer.observe(element);
    setWidth(element.clientWidth);
    return () => observer.disconnect();
  }, []);

  useEffect(() => {
    const element = canvas.current;
    const context = element?.getContext('2d');
    if (!element || !context || !waveform || width === 0) return;
    const scale = window.devicePixelRatio || 1;
    const columns = Math.round(width * scale);
    const pixelHeight = Math.round(height * scale);
    element.width = columns;
    element.height = pixelHeight;
    context.clearRect(0, 0, columns, pixelHeight);
    context.fillStyle = getComputedStyle(element).color;
    const middle = pixelHeight / 2;
    waveformColumns(waveform, fromMs, toMs, columns).forEach((peak, column) => {
      // At least a hairline, so silence reads as a line rather than a gap in the lane.
      const half = Math.max(0.5, (peak * pixelHeight) / 2);
      context.fillRect(column, middle - half, 1, half * 2);
    });
  }, [waveform, fromMs, toMs, width, height]);

  const silent = waveform !== undefined && !waveform.hasAudio;
  return (
    <div className={classes.lane} style={{ height }} data-testid="waveform-lane">
      <canvas ref={canvas} className={classes.canvas} style={{ height }} role="img" aria-label={silent ? 'No sound in this footage' : 'Sound level along the footage'} />
      {silent && (
        <Text size="xs" c="dimmed" className={classes.note}>
          No sound in this footage
        </Text>
      )}
    </div>
  );
}
