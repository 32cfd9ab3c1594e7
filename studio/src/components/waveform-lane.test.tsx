import { screen } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { renderWithProviders } from '@/testing/render';
import { WaveformLane, waveformColumns, type Waveform } from './waveform-lane';

// Ten seconds at 10 peaks a second: silence, then talking from 4 s (0.8), a loud knock at 7.05 s.
const peaks = Array.from({ length: 100 }, (_, index) => (index === 70 ? 1 : index >= 40 ? 0.8 : 0));
const waveform: Waveform = { durationMs: 10_000, peaksPerSecond: 10, hasAudio: true, peaks };

afterEach(() => vi.restoreAllMocks());

describe('waveformColumns', () => {
  it('gives each column the loudest peak it covers, so one loud moment survives zooming out', () => {
    expect(waveformColumns(waveform, 0, 10_000, 5)).toEqual([0, 0, 0.8, 1, 0.8]);
    expect(waveformColumns(waveform, 0, 10_000, 10)).toEqual([0, 0, 0, 0, 0.8, 0.8, 0.8, 1, 0.8, 0.8]);
  });

  it('follows the visible window, and zoomed past one peak a column shows the peak each column falls in', () => {
    // 6.9 s to 7.2 s over 6 columns (50 ms each): peaks 69, 69, 70, 70, 71, 71.
    expect(waveformColumns(waveform, 6900, 7200, 6)).toEqual([0.8, 0.8, 1, 1, 0.8, 0.8]);
  });

  it('draws nothing past the end, for an empty window or no columns', () => {
    expect(waveformColumns(waveform, 10_000, 12_000, 2)).toEqual([0, 0]);
    expect(waveformColumns(waveform, 5000, 5000, 3)).toEqual([0, 0, 0]);
    expect(waveformColumns(waveform, 0, 10_000, 0)).toEqual([]);
  });
});

describe('WaveformLane', () => {
  function recordingCanvas(width: number) {
    const bars: { x: number; height: number }[] = [];
    const context = {
      clearRect: vi.fn(),
      fillRect: (x: number, _y: number, _w: number, height: number) => bars.push({ x, height }),
      fillStyle: '',
    };
    vi.spyOn(HTMLCanvasElement.prototype, 'getContext').mockReturnValue(context as unknown as CanvasRenderingContext2D);
    vi.spyOn(HTMLCanvasElement.prototype, 'clientWidth', 'get').mockReturnValue(width);
    return bars;
  }

  it('draws one bar per pixel column of the visible window, taller where it is louder', () => {
    const bars = recordingCanvas(10);
    renderWithProviders(<WaveformLane waveform={waveform} fromMs={0} toMs={10_000} height={20} />);
    expect(bars).toHaveLength(10);
    // Silence draws a hairline; talking 0.8 of the lane; the knock the full height.
    expect(bars[0].height).toBe(1);
    expect(bars[5].height).toBeCloseTo(16);
    expect(bars[7].height).toBe(20);
    expect(screen.getByRole('img').getAttribute('aria-label')).toBe('Sound level along the footage');
  });

  it('says so when the footage has no sound', () => {
    recordingCanvas(10);
    renderWithProviders(<WaveformLane waveform={{ ...waveform, hasAudio: false, peaks: [] }} fromMs={0} toMs={10_000} />);
    expect(screen.getByText('No sound in this footage')).toBeTruthy();
  });
});
