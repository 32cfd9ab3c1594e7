import { act, fireEvent, screen, waitFor } from '@testing-library/react';
import { Route, Routes } from 'react-router-dom';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { stubApi, type StubRoute } from '@/testing/api-stub';
import { fakeScrollLayout } from '@/testing/fake-scroll-layout';
import { renderWithProviders } from '@/testing/render';
import { FootagePlayerRoute } from './footage';

// Counts how often the marking workspace and the transcript pane run, whoever asks them to (the page passing new
// props or their own subscriptions). Called as plain functions, so their hooks count as the wrapper's.
const renders = vi.hoisted(() => ({ workspace: 0, transcriptPane: 0 }));
vi.mock('@/features/marks/components/marks-workspace', async (importOriginal) => {
  const real = await importOriginal<typeof import('@/features/marks/components/marks-workspace')>();
  return {
    ...real,
    MarksWorkspace: (props: Parameters<typeof real.MarksWorkspace>[0]) => {
      renders.workspace += 1;
      return real.MarksWorkspace(props);
    },
  };
});
vi.mock('@/features/footage/components/transcript-pane', async (importOriginal) => {
  const real = await importOriginal<typeof import('@/features/footage/components/transcript-pane')>();
  return {
    ...real,
    TranscriptPane: (props: Parameters<typeof real.TranscriptPane>[0]) => {
      renders.transcriptPane += 1;
      return real.TranscriptPane(props);
    },
  };
});

const THREE_HOURS = 3 * 3_600_000;
const STRIP_WIDTH = 1_000;
// Invented test transcript: a cue every 3.6 s for three hours, every tenth about the spline.
const CUES = Array.from({ length: 3_000 }, (_, index) => ({
  index,
  startMs: index * 3_600,
  endMs: index * 3_600 + 3_000,
  text: index % 10 === 0 ? `Spline count check ${index}` : `Shop talk ${index}`,
}));
const SPLINE_STARTS = CUES.filter((cue) => cue.text.startsWith('Spline')).map((cue) => cue.startMs);

const ROUTES: StubRoute[] = [
  {
    path: /^\/workshops\/w1$/,
    body: { id: 'w1', slug: 'harrow-lane', name: 'Harrow Lane Garage', description: '', logoUrl: null, disabled: false, role: 'owner', createdAt: '2026-12-01T00:00:00.000Z' },
  },
  {
    path: /^\/workshops\/w1\/footage\/f1$/,
    body: {
      id: 'f1',
      workshopId: 'w1',
      buildId: 'b1',
      title: 'Long bench session',
      originalName: 'bench.mp4',
      contentType: 'video/mp4',
      sizeBytes: 1_000_000,
      state: 'ready',
      failureReason: null,
      durationMs: THREE_HOURS,
      width: 1280,
      height: 720,
      frameRate: 30,
      container: 'mp4',
      videoCodec: 'h264',
      audioCodec: 'aac',
      posterUrl: null,
      upload: null,
      transcript: { revision: 1, cueCount: CUES.length },
      createdAt: '2026-12-01T00:00:00.000Z',
      updatedAt: '2026-12-01T00:00:00.000Z',
    },
  },
  {
    path: /^\/workshops\/w1\/footage\/f1\/playback$/,
    body: { url: 'https://storage.example/bucket/f1/web.mp4?X-Amz-Signature=abc', expiresAt: '2026-12-01T01:00:00.000Z', contentType: 'video/mp4' },
  },
  {
    path: /^\/workshops\/w1\/footage\/f1\/transcript$/,
    body: { id: 't1', footageId: 'f1', revision: 1, format: 'webvtt', sourceName: null, cueCount: CUES.length, isActive: true, createdAt: '2026-12-01T00:00:00.000Z', cues: CUES },
  },
  {
    path: /^\/workshops\/w1\/footage\/f1\/transcript\/search\/moments\?q=spline$/,
    body: { terms: ['spline'], total: SPLINE_STARTS.length, startMs: SPLINE_STARTS },
  },
  {
    path: /^\/workshops\/w1\/footage\/f1\/transcript\/search\?/,
    body: ({ url }: { url: URL }) => {
      const offset = Number(url.searchParams.get('offset') ?? 0);
      const results = CUES.filter((cue) => cue.text.startsWith('Spline'))
        .slice(offset, offset + 50)
        .map((cue) => ({ cueIndex: cue.index, startMs: cue.startMs, endMs: cue.endMs, text: cue.text }));
      return { terms: ['spline'], total: SPLINE_STARTS.length, offset, results };
    },
  },
  { path: /^\/workshops\/w1\/footage\/f1\/marks$/, body: [] },
  { path: /^\/workshops\/w1\/footage\/f1\/mark-suggestions$/, body: [] },
  { path: /^\/workshops\/w1\/footage-limits$/, body: { maxBytes: 10 * 1024 ** 3, types: [], transcriptMaxBytes: 5 * 1024 ** 2 } },
];

function renderFootagePage() {
  const seen = stubApi(ROUTES);
  renderWithProviders(
    <Routes>
      <Route path="/workshops/:workshopId/footage/:footageId" element={<FootagePlayerRoute />} />
    </Routes>,
    { route: '/workshops/w1/footage/f1' },
  );
  return seen;
}

const video = () => screen.getByTestId('footage-video') as HTMLVideoElement;

/** What the browser does as the video plays: move `currentTime` and fire a time update. */
function playTo(ms: number) {
  Object.defineProperty(video(), 'currentTime', { configurable: true, writable: true, value: ms / 1000 });
  fireEvent.timeUpdate(video());
}

describe('the footage page at three hours', () => {
  beforeEach(() => {
    renders.workspace = 0;
    renders.transcriptPane = 0;
    // jsdom does not lay out: every box is 1,000 px wide (the timeline has columns to draw density into) and the
    // lists have rows and a box to scroll.
    fakeScrollLayout({ boxHeight: 300, rowHeight: 32 });
    vi.spyOn(HTMLElement.prototype, 'clientWidth', 'get').mockReturnValue(STRIP_WIDTH);
  });
  afterEach(() => vi.restoreAllMocks());

  it('shows where every transcript search hit falls on the marking timeline while there is a search', async () => {
    const seen = renderFootagePage();
    await screen.findByTestId('marks-timeline');
    expect(screen.queryByTestId('hit-density')).toBeNull();

    fireEvent.change(await screen.findByLabelText('Search this transcript'), { target: { value: 'spline' } });
    // All 300 hits, not the first page of 50 the list shows.
    expect(await screen.findByRole('img', { name: '300 search hits in view' }, { timeout: 3_000 })).toBeTruthy();
    expect(seen.filter((request) => request.url.pathname.endsWith('/transcript/search/moments')).map((request) => request.url.searchParams.get('q'))).toEqual(['spline']);

    // Zoomed to the first quarter (+ twice, around the playhead at 0): the band counts the hits in view only.
    fireEvent.keyDown(screen.getByTestId('marks-timeline'), { key: '+' });
    fireEvent.keyDown(screen.getByTestId('marks-timeline'), { key: '+' });
    expect(screen.getByRole('img', { name: `${SPLINE_STARTS.filter((ms) => ms <= THREE_HOURS / 4).length} search hits in view` })).toBeTruthy();

    fireEvent.change(screen.getByLabelText('Search this transcript'), { target: { value: '' } });
    await waitFor(() => expect(screen.queryByTestId('hit-density')).toBeNull(), { timeout: 3_000 });
  }, 20_000);

  it('re-renders neither the page, the marking workspace nor the transcript pane on a time update; only the time, the playhead and the playing rows move', async () => {
    renderFootagePage();
    await screen.findByTestId('marks-timeline');
    await screen.findByTestId('transcript-cues');
    const before = { ...renders };

    // Ten time updates inside the first cue (0–3 s), as a browser sends them four times a second.
    for (let tick = 1; tick <= 10; tick += 1) act(() => playTo(tick * 250));
    expect(screen.getByTestId('player-position').textContent).toBe('0:02');
    expect(screen.getByTestId('pin-mark').textContent).toBe('Pin a mark at 0:02.5');
    expect(screen.getByTestId('timeline-playhead').style.left).toBe(`${(2_500 / THREE_HOURS) * 100}%`);
    expect(renders).toEqual(before);

    // The next cue starts playing: the pane draws once to move the highlight; the workspace still not at all.
    act(() => playTo(3_700));
    expect(screen.getByRole('button', { name: /Shop talk 1$/ }).hasAttribute('data-active')).toBe(true);
    expect(renders.workspace).toBe(before.workspace);
    expect(renders.transcriptPane).toBe(before.transcriptPane + 1);
  }, 20_000);
});
