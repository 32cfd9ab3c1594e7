import { act, fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { formatClock } from '@/lib/clock';
import { createPlaybackClock } from '@/lib/playback-clock';
import { stubApi } from '@/testing/api-stub';
import { fakeScrollLayout } from '@/testing/fake-scroll-layout';
import { renderWithProviders } from '@/testing/render';
import { WorkshopAccessProvider } from '@/lib/workshop-access';
import type { Mark, MarkSuggestion } from '../api/queries';
import { lastStartedAt, MarksList } from './marks-list';
import { SuggestionsPanel } from './suggestions-panel';

// Each drawn row formats its time once: counting the calls counts the rows drawn.
vi.mock('@/lib/clock', async (importOriginal) => {
  const clock = await importOriginal<typeof import('@/lib/clock')>();
  return { ...clock, formatClock: vi.fn(clock.formatClock) };
});

const BOX_HEIGHT = 360;
const ROW_HEIGHT = 48;

// Invented marks: 400 notes over three hours, 27 s apart.
const MARKS: Mark[] = Array.from({ length: 400 }, (_, index) => ({
  id: `m${String(index).padStart(3, '0')}`,
  footageId: 'f1',
  startMs: index * 27_000,
  endMs: null,
  kind: 'note',
  partId: null,
  measurementId: null,
  fitCheckId: null,
  guideStepId: null,
  label: `Note ${index}`,
  createdBy: null,
  createdAt: '2026-12-01T10:00:00.000Z',
  updatedAt: '2026-12-01T10:00:00.000Z',
}));

// Invented suggestions: 289 spoken readings, 37 s apart.
const SUGGESTIONS: MarkSuggestion[] = Array.from({ length: 289 }, (_, index) => ({
  id: `s${index}`,
  footageId: 'f1',
  cueIndex: index * 10,
  startMs: index * 37_000,
  endMs: index * 37_000 + 3_000,
  kind: 'measurement',
  phrase: `reading ${index}`,
  value: '0.015',
  unit: 'in',
  millimetres: 0.381,
  partId: null,
  status: 'pending',
  markId: null,
}));

const clock = createPlaybackClock();

/** The list with the video at `currentMs`: the clock moves first (as the player moves it), then the list renders. */
function list(currentMs: number, onSeek: (ms: number) => void = () => {}) {
  act(() => clock.set(currentMs));
  return <MarksList workshopId="w1" footageId="f1" marks={MARKS} clock={clock} onSeek={onSeek} onEdit={() => {}} />;
}

const rowsDrawn = () => screen.queryAllByTestId('mark-row');

describe('MarksList at three hours', () => {
  let layout: ReturnType<typeof fakeScrollLayout>;
  beforeEach(() => {
    layout = fakeScrollLayout({ boxHeight: BOX_HEIGHT, rowHeight: ROW_HEIGHT });
  });
  afterEach(() => vi.restoreAllMocks());

  it('draws only the rows in view of 400, and the last mark is reachable by scrolling', async () => {
    renderWithProviders(list(0));
    expect(await screen.findByText('Note 0')).toBeTruthy();
    expect(rowsDrawn().length).toBeGreaterThan(0);
    expect(rowsDrawn().length).toBeLessThan(40);
    layout.scrollByHand(screen.getByTestId('marks-list'), 400 * ROW_HEIGHT);
    expect(await screen.findByText('Note 399')).toBeTruthy();
    expect(rowsDrawn().length).toBeLessThan(40);
  }, 20_000);

  it('highlights the last mark started and follows it, until the person scrolls; Back to now resumes', async () => {
    const { rerender } = renderWithProviders(list(0));
    await screen.findByText('Note 0');
    rerender(list(200 * 27_000 + 5_000));
    await waitFor(() => expect(screen.getByText('Note 200').closest('[data-active]')).toBeTruthy());
    const box = screen.getByTestId('marks-list');
    layout.scrollByHand(box, 0);
    rerender(list(300 * 27_000));
    await new Promise((resolve) => setTimeout(resolve, 30));
    expect(box.scrollTop).toBe(0);
    fireEvent.click(screen.getByRole('button', { name: 'Back to now' }));
    expect(await screen.findByText('Note 300')).toBeTruthy();
  }, 20_000);

  it('a drawn row puts no dialog and watches no query in the page until it needs one', async () => {
    const requests = stubApi([{ method: 'DELETE', path: /\/marks\/m000$/, status: 204 }]);
    const { queryClient } = renderWithProviders(list(0));
    await screen.findByText('Note 0');
    expect(rowsDrawn().length).toBeGreaterThan(5);
    // Each row's Remove used to keep a closed dialog (its portal, scroll lock and key listener) in the page.
    expect(document.querySelector('[data-mantine-shared-portal-node]')?.childElementCount ?? 0).toBe(0);
    // Notes link nothing: no row made a (disabled) query for the parts, readings, assemblies or guide steps.
    expect(queryClient.getQueryCache().findAll({ queryKey: ['marks'] })).toHaveLength(0);

    fireEvent.click(screen.getAllByRole('button', { name: 'Remove' })[0]);
    const dialog = await screen.findByRole('dialog', { name: 'Remove this mark?' });
    fireEvent.click(within(dialog).getByRole('button', { name: 'Remove mark' }));
    await waitFor(() => expect(requests.filter((request) => request.method === 'DELETE').map((request) => request.url.pathname)).toEqual(['/api/workshops/w1/footage/f1/marks/m000']));
  });

  it('draws again only the rows whose highlight changes as the video plays on', async () => {
    const { rerender } = renderWithProviders(list(1_000));
    await screen.findByText('Note 0');
    vi.mocked(formatClock).mockClear();
    // A new onSeek each time, as the player page passes: rows do not draw again for it.
    rerender(list(2_000, () => {}));
    expect(formatClock).not.toHaveBeenCalled();
    // The playing moment passes mark 1: still no row draws again (the highlight is on the row's frame).
    rerender(list(28_000, () => {}));
    expect(formatClock).not.toHaveBeenCalled();
    expect(screen.getByText('Note 1').closest('[data-active]')).toBeTruthy();
    expect(screen.getByText('Note 0').closest('[data-active]')).toBeNull();
  });
});

describe('SuggestionsPanel at three hours', () => {
  let layout: ReturnType<typeof fakeScrollLayout>;
  beforeEach(() => {
    layout = fakeScrollLayout({ boxHeight: BOX_HEIGHT, rowHeight: 34 });
  });
  afterEach(() => vi.restoreAllMocks());

  it('draws only the suggestions in view of 289 and reaches the last one', async () => {
    stubApi([{ path: /\/mark-suggestions/, body: SUGGESTIONS }]);
    renderWithProviders(<SuggestionsPanel workshopId="w1" footageId="f1" clock={createPlaybackClock()} onSeek={() => {}} />);
    expect(await screen.findByText('“reading 0”')).toBeTruthy();
    expect(screen.getByText('289')).toBeTruthy();
    expect(screen.getAllByTestId('suggestion-row').length).toBeLessThan(40);
    layout.scrollByHand(screen.getByTestId('suggestions'), 289 * 34);
    expect(await screen.findByText('“reading 288”')).toBeTruthy();
  }, 20_000);
});

describe('marks and suggestions read-only (a site admin, or a disabled workshop)', () => {
  beforeEach(() => {
    fakeScrollLayout({ boxHeight: BOX_HEIGHT, rowHeight: ROW_HEIGHT });
  });
  afterEach(() => vi.restoreAllMocks());

  it('lists marks and suggestions without Edit, Remove, Accept or Dismiss; a member keeps them', async () => {
    stubApi([{ path: /\/mark-suggestions/, body: SUGGESTIONS.slice(0, 3) }]);
    const panels = (readOnly: boolean) => (
      <WorkshopAccessProvider readOnly={readOnly}>
        {list(0)}
        <SuggestionsPanel workshopId="w1" footageId="f1" clock={createPlaybackClock()} onSeek={() => {}} />
      </WorkshopAccessProvider>
    );
    const { rerender } = renderWithProviders(panels(true));
    expect(await screen.findByText('“reading 0”')).toBeTruthy();
    expect(rowsDrawn().length).toBeGreaterThan(0);
    expect(screen.getByText('Note 0')).toBeTruthy();
    for (const name of ['Edit', 'Remove', 'Accept', 'Dismiss']) expect(screen.queryAllByRole('button', { name })).toHaveLength(0);
    // Seeking stays: reading a footage's marks is allowed.
    expect(screen.getAllByRole('button', { name: /^Jump to / }).length).toBeGreaterThan(0);

    rerender(panels(false));
    expect((await screen.findAllByRole('button', { name: 'Edit' })).length).toBe(rowsDrawn().length);
    expect(screen.getAllByRole('button', { name: 'Accept' })).toHaveLength(3);
  }, 20_000);
});

describe('lastStartedAt', () => {
  it('finds the last row started at or before a time', () => {
    const rows = [{ startMs: 0 }, { startMs: 1_000 }, { startMs: 1_000 }, { startMs: 5_000 }];
    expect(lastStartedAt(rows, -1)).toBe(-1);
    expect(lastStartedAt(rows, 0)).toBe(0);
    expect(lastStartedAt(rows, 1_000)).toBe(2);
    expect(lastStartedAt(rows, 4_999)).toBe(2);
    expect(lastStartedAt(rows, 60_000)).toBe(3);
    expect(lastStartedAt([], 10)).toBe(-1);
  });
});
