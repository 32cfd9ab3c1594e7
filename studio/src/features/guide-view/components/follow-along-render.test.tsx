import { act, fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { stubApi } from '@/testing/api-stub';
import { fakeScrollLayout } from '@/testing/fake-scroll-layout';
import { renderWithProviders } from '@/testing/render';
import { FollowAlongView } from './follow-along-view';
import { TEST_CUES, cueWindowRoute, testGuide } from './test-guide';

// Counts how often each part of the public guide runs, whoever asks it to (the document passing new props or the
// part's own subscription to the video's clock). Called as plain functions, so their hooks count as the wrapper's.
// The cautions, the checklist and the parts list take only the guide: they run again only when the document does.
const renders = vi.hoisted(() => ({ cautions: 0, checklist: 0, parts: 0, steps: 0, nowPlaying: 0, marks: 0, transcript: 0 }));
vi.mock('./cautions-block', async (importOriginal) => {
  const real = await importOriginal<typeof import('./cautions-block')>();
  return {
    ...real,
    CautionsBlock: (props: Parameters<typeof real.CautionsBlock>[0]) => {
      renders.cautions += 1;
      return real.CautionsBlock(props);
    },
  };
});
vi.mock('./checklist-panel', async (importOriginal) => {
  const real = await importOriginal<typeof import('./checklist-panel')>();
  return {
    ...real,
    ChecklistPanel: (props: Parameters<typeof real.ChecklistPanel>[0]) => {
      renders.checklist += 1;
      return real.ChecklistPanel(props);
    },
  };
});
vi.mock('./parts-panel', async (importOriginal) => {
  const real = await importOriginal<typeof import('./parts-panel')>();
  return {
    ...real,
    PartsPanel: (props: Parameters<typeof real.PartsPanel>[0]) => {
      renders.parts += 1;
      return real.PartsPanel(props);
    },
  };
});
vi.mock('./step-list', async (importOriginal) => {
  const real = await importOriginal<typeof import('./step-list')>();
  return {
    ...real,
    StepList: (props: Parameters<typeof real.StepList>[0]) => {
      renders.steps += 1;
      return real.StepList(props);
    },
  };
});
vi.mock('./now-playing', async (importOriginal) => {
  const real = await importOriginal<typeof import('./now-playing')>();
  return {
    ...real,
    NowPlaying: (props: Parameters<typeof real.NowPlaying>[0]) => {
      renders.nowPlaying += 1;
      return real.NowPlaying(props);
    },
  };
});
vi.mock('./marks-strip', async (importOriginal) => {
  const real = await importOriginal<typeof import('./marks-strip')>();
  return {
    ...real,
    MarksStrip: (props: Parameters<typeof real.MarksStrip>[0]) => {
      renders.marks += 1;
      return real.MarksStrip(props);
    },
  };
});
vi.mock('./transcript-panel', async (importOriginal) => {
  const real = await importOriginal<typeof import('./transcript-panel')>();
  return {
    ...real,
    TranscriptPanel: (props: Parameters<typeof real.TranscriptPanel>[0]) => {
      renders.transcript += 1;
      return real.TranscriptPanel(props);
    },
  };
});

const guide = testGuide();

function renderGuide() {
  stubApi([
    { path: /^\/guides\/harrow-lane-garage\/motor-to-gearbox-coupler$/, body: guide },
    cueWindowRoute(/^\/guides\/harrow-lane-garage\/motor-to-gearbox-coupler\/cues\?/, TEST_CUES),
  ]);
  renderWithProviders(<FollowAlongView workshopSlug="harrow-lane-garage" guideSlug="motor-to-gearbox-coupler" />);
}

/** What the browser does as the video plays: move the position and say so. */
function playTo(ms: number) {
  const video = screen.getByTestId('guide-video') as HTMLVideoElement;
  video.currentTime = ms / 1000;
  fireEvent.timeUpdate(video);
}

describe('the public guide while its video plays', () => {
  beforeEach(() => {
    for (const part of Object.keys(renders) as (keyof typeof renders)[]) renders[part] = 0;
    vi.spyOn(HTMLMediaElement.prototype, 'play').mockResolvedValue(undefined);
    fakeScrollLayout({ boxHeight: 300, rowHeight: 40 });
  });
  afterEach(() => vi.restoreAllMocks());

  it('re-renders neither the guide document nor its lists on a time update; only the time, the playhead, and the playing step and cue when they change', async () => {
    renderGuide();
    await screen.findAllByTestId('guide-step');
    // The playing minute's window is in: the first cue plays from 0.
    await waitFor(() => expect(screen.getAllByTestId('transcript-cue')[0].getAttribute('aria-current')).toBe('time'));
    // Let the list settle before counting.
    await act(() => new Promise((resolve) => setTimeout(resolve, 100)));
    const before = { ...renders };
    expect(before.cautions).toBeGreaterThan(0);

    // Fifteen time updates inside step 1 and the first cue (0–4 s), as a browser sends them four times a second.
    for (let tick = 1; tick <= 15; tick += 1) act(() => playTo(tick * 250));
    expect(screen.getByTestId('video-position').textContent).toMatch(/^0:03 of 0:20/);
    expect(screen.getByTestId('guide-marks-playhead').style.left).toBe(`${(3_750 / 20_000) * 100}%`);
    expect(renders).toEqual(before);

    // Step 2 and the second cue start playing: the step list, the line under the video and the transcript each draw
    // once to move their highlight; the document, its cautions, checklist and parts and the marks strip not at all.
    act(() => playTo(8_500));
    const steps = screen.getAllByTestId('guide-step');
    expect(steps[1].getAttribute('aria-current')).toBe('step');
    expect(within(steps[1]).getByTestId('step-now')).toBeTruthy();
    expect(steps[0].getAttribute('aria-current')).toBeNull();
    expect(screen.getByTestId('now-playing').textContent).toBe('Step 2 of 3 · from 0:08 · CAUTIONSlide the coupler on');
    expect(screen.getByRole('button', { current: 'time' }).textContent).toContain('twenty-one tooth spline');
    expect(renders).toEqual({ ...before, steps: before.steps + 1, nowPlaying: before.nowPlaying + 1, transcript: before.transcript + 1 });
  });
});
