import { act, fireEvent, screen } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { formatClock } from '@/lib/clock';
import { createPlaybackClock } from '@/lib/playback-clock';
import { renderWithProviders } from '@/testing/render';
import type { Mark } from '../api/queries';
import { MarksTimeline } from './marks-timeline';

// Every drawn marker formats its time: counting the calls counts the markers drawn.
vi.mock('@/lib/clock', async (importOriginal) => {
  const clock = await importOriginal<typeof import('@/lib/clock')>();
  return { ...clock, formatClock: vi.fn(clock.formatClock) };
});

const THREE_HOURS = 3 * 3_600_000;
const STRIP_WIDTH = 1_000;

// Invented marks: 400 over three hours, 27 s apart, kinds in turn.
const KINDS = ['part', 'measurement', 'check_evidence', 'step', 'caution', 'note'] as const;
const MARKS: Mark[] = Array.from({ length: 400 }, (_, index) => ({
  id: `m${String(index).padStart(3, '0')}`,
  footageId: 'f1',
  startMs: index * 27_000,
  endMs: null,
  kind: KINDS[index % KINDS.length],
  partId: null,
  measurementId: null,
  fitCheckId: null,
  guideStepId: null,
  label: `Mark ${index}`,
  createdBy: null,
  createdAt: '2026-12-01T10:00:00.000Z',
  updatedAt: '2026-12-01T10:00:00.000Z',
}));

const clock = createPlaybackClock();

/** The timeline with the video at `currentMs`: the clock moves first (as the player moves it), then it renders. */
function timeline(currentMs: number, props: Partial<Parameters<typeof MarksTimeline>[0]> = {}) {
  act(() => clock.set(currentMs));
  return <MarksTimeline marks={MARKS} durationMs={THREE_HOURS} clock={clock} onSeek={() => {}} {...props} />;
}

const strip = () => screen.getByTestId('marks-timeline');
const range = () => screen.getByTestId('timeline-range').textContent;
/** How many marks the drawn markers stand for: a lone marker is one, a cluster says its count. */
function marksDrawn(): number {
  const lone = strip().querySelectorAll('button[data-kind]').length;
  const clustered = screen.queryAllByTestId('timeline-cluster').reduce((sum, cluster) => sum + Number(cluster.textContent), 0);
  return lone + clustered;
}

describe('MarksTimeline', () => {
  beforeEach(() => {
    // jsdom does not lay out: the strip is 1,000 px wide, starting at the left edge.
    vi.spyOn(HTMLElement.prototype, 'clientWidth', 'get').mockReturnValue(STRIP_WIDTH);
    vi.spyOn(HTMLElement.prototype, 'getBoundingClientRect').mockReturnValue(new DOMRect(0, 0, STRIP_WIDTH, 30));
  });
  afterEach(() => vi.restoreAllMocks());

  it('shows all 400 marks of three hours in one row of clusters, never more markers than fit', () => {
    renderWithProviders(timeline(0));
    expect(range()).toBe('Whole footage, 3:00:00');
    const markers = strip().querySelectorAll('button');
    // 20 px a marker at most: 50 clusters of 8 (216 s each), evenly spread marks never chained into one.
    expect(markers).toHaveLength(50);
    expect(marksDrawn()).toBe(400);
    // One row: every marker sits at the same height.
    expect(new Set(Array.from(markers, (marker) => marker.style.top)).size).toBe(1);
    // The minimap shows a hairline for each of the 400 marks, all in one path element.
    const ticks = screen.getByTestId('timeline-minimap-ticks');
    expect(ticks.querySelectorAll('*')).toHaveLength(1);
    expect(ticks.querySelector('path')?.getAttribute('d')?.match(/M/g)).toHaveLength(400);
  });

  it('zooms in with the wheel around the pointer, down to seconds, where every mark stands alone', () => {
    renderWithProviders(timeline(0));
    // The wheel over the middle of the strip, forty notches in (0.8 each).
    for (let notch = 0; notch < 40; notch += 1) fireEvent.wheel(strip(), { deltaY: -100, clientX: 500 });
    expect(range()).toBe('1:29:57.5 – 1:30:02.5');
    expect(screen.queryAllByTestId('timeline-cluster')).toHaveLength(0);
    // 90:00 is 200 × 27 s: the one mark in these five seconds.
    expect(screen.getByRole('button', { name: 'Check evidence at 1:30:00.0: Mark 200' })).toBeTruthy();
  });

  it('zooms with + and −, pans with the arrow keys, and 0 shows the whole footage again', () => {
    renderWithProviders(timeline(3_600_000));
    const box = strip();
    fireEvent.keyDown(box, { key: '+' });
    // Around the playhead at 1:00:00, a third across: it stays a third across.
    expect(range()).toBe('30:00.0 – 2:00:00.0');
    fireEvent.keyDown(box, { key: 'ArrowRight' });
    expect(range()).toBe('52:30.0 – 2:22:30.0');
    fireEvent.keyDown(box, { key: 'ArrowLeft' });
    fireEvent.keyDown(box, { key: 'ArrowLeft' });
    fireEvent.keyDown(box, { key: 'ArrowLeft' });
    expect(range()).toBe('0:00.0 – 1:30:00.0');
    fireEvent.keyDown(box, { key: '-' });
    expect(range()).toBe('Whole footage, 3:00:00');
    fireEvent.keyDown(box, { key: '+' });
    fireEvent.keyDown(box, { key: '0' });
    expect(range()).toBe('Whole footage, 3:00:00');
  });

  it('opens a cluster into a view where its marks stand apart, and seeks when a lone mark is pressed', () => {
    const onSeek = vi.fn();
    renderWithProviders(timeline(0, { onSeek }));
    const [first] = screen.getAllByTestId('timeline-cluster');
    const count = Number(first.textContent);
    fireEvent.click(first);
    expect(screen.queryAllByTestId('timeline-cluster')).toHaveLength(0);
    expect(strip().querySelectorAll('button[data-kind]').length).toBeGreaterThanOrEqual(count);
    fireEvent.click(screen.getByRole('button', { name: 'Measurement at 0:27.0: Mark 1' }));
    expect(onSeek).toHaveBeenCalledWith(27_000);
    expect(onSeek).toHaveBeenCalledTimes(1);
  });

  it('moves the view to where the minimap is pressed, keeping the zoom', () => {
    renderWithProviders(timeline(0));
    for (let notch = 0; notch < 3; notch += 1) fireEvent.keyDown(strip(), { key: '+' });
    expect(range()).toBe('0:00.0 – 22:30.0');
    // Three quarters along the minimap is 2:15:00.
    fireEvent.pointerDown(screen.getByTestId('timeline-minimap'), { clientX: 750, pointerId: 1 });
    expect(range()).toBe('2:03:45.0 – 2:26:15.0');
  });

  it('turns the page as playback runs past the right edge of a zoomed view', () => {
    const { rerender } = renderWithProviders(timeline(0));
    for (let notch = 0; notch < 3; notch += 1) fireEvent.keyDown(strip(), { key: '+' });
    rerender(timeline(22 * 60_000));
    expect(range()).toBe('0:00.0 – 22:30.0');
    rerender(timeline(22 * 60_000 + 45_000));
    expect(range()).toBe('22:45.0 – 45:15.0');
  });

  it('draws the search hits as density, with the count in view', () => {
    const hits = Array.from({ length: 791 }, (_, index) => (index < 700 ? index * 1_000 : 7_200_000 + index * 1_000));
    renderWithProviders(timeline(0, { hitStartsMs: hits }));
    expect(screen.getByRole('img', { name: '791 search hits in view' })).toBeTruthy();
    fireEvent.keyDown(strip(), { key: '+' });
    fireEvent.keyDown(strip(), { key: '+' });
    expect(screen.getByRole('img', { name: '700 search hits in view' })).toBeTruthy();
  });

  it('moves only the playhead on a time update, drawing no marker again', () => {
    const { rerender } = renderWithProviders(timeline(0));
    vi.mocked(formatClock).mockClear();
    rerender(timeline(250, { onSeek: () => {} }));
    rerender(timeline(500, { onSeek: () => {} }));
    // The range label alone formats a time (the footage's length); no marker's time is formatted again.
    const formatted = vi.mocked(formatClock).mock.calls.map(([ms]) => ms);
    expect(formatted.length).toBeGreaterThan(0);
    expect(formatted.every((ms) => ms === THREE_HOURS)).toBe(true);
    expect(screen.getByTestId('timeline-playhead').style.left).toBe(`${(500 / THREE_HOURS) * 100}%`);
    // Time updates alone (no new props): the strip does not render at all, only the playhead moves.
    vi.mocked(formatClock).mockClear();
    act(() => clock.set(750));
    act(() => clock.set(1_000));
    expect(formatClock).not.toHaveBeenCalled();
    expect(screen.getByTestId('timeline-playhead').style.left).toBe(`${(1_000 / THREE_HOURS) * 100}%`);
  });
});
