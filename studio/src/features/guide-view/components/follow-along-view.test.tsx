import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { stubApi, type StubRoute } from '@/testing/api-stub';
import { fakeScrollLayout } from '@/testing/fake-scroll-layout';
import { renderWithProviders } from '@/testing/render';
import { FollowAlongView } from './follow-along-view';
import { TEST_CUES, cueWindowRoute, testGuide } from './test-guide';
import { formatDate } from '@/lib/dates';

const GUIDE_PATH = /^\/guides\/harrow-lane-garage\/motor-to-gearbox-coupler$/;

/** The guide's answer, and its transcript a window at a time as the public cues route gives it. */
function guideRoutes(guide: ReturnType<typeof testGuide>, transcript = TEST_CUES): StubRoute[] {
  return [{ path: GUIDE_PATH, body: guide }, cueWindowRoute(/^\/guides\/harrow-lane-garage\/motor-to-gearbox-coupler\/cues\?/, transcript)];
}

function renderGuide() {
  return renderWithProviders(<FollowAlongView workshopSlug="harrow-lane-garage" guideSlug="motor-to-gearbox-coupler" />);
}

/** What the browser does as the video plays: move the position and say so. */
function playTo(video: HTMLVideoElement, seconds: number) {
  video.currentTime = seconds;
  fireEvent.timeUpdate(video);
}

describe('FollowAlongView', () => {
  beforeEach(() => {
    // jsdom has no media playback.
    vi.spyOn(HTMLMediaElement.prototype, 'play').mockResolvedValue(undefined);
    // The transcript draws only the cues in its box, so the box needs a height.
    fakeScrollLayout({ boxHeight: 300, rowHeight: 40 });
  });
  afterEach(() => vi.restoreAllMocks());

  it('lays out the guide: revision, cautions first, video with captions, steps, transcript, checklist, parts and supplies', async () => {
    const requests = stubApi(guideRoutes(testGuide()));
    renderGuide();
    expect(await screen.findByRole('heading', { level: 1, name: 'Fitting the motor-to-gearbox coupler' })).toBeTruthy();
    expect(screen.getByTestId('guide-revision').textContent).toBe(
      `Revision 3 · published ${formatDate('2026-03-02T10:00:00.000Z')} · Longer driveshaft · Revision history`,
    );
    expect(within(screen.getByTestId('guide-revision')).getByRole('link', { name: 'Revision history' }).getAttribute('href')).toBe(
      '/guides/harrow-lane-garage/motor-to-gearbox-coupler/revisions',
    );
    expect(screen.getAllByTestId('caution')[0].getAttribute('data-level')).toBe('DANGER');
    const video = screen.getByTestId('guide-video') as HTMLVideoElement;
    expect(video.getAttribute('src')).toBe('/api/guides/harrow-lane-garage/motor-to-gearbox-coupler/video');
    const track = video.querySelector('track');
    expect(track?.getAttribute('kind')).toBe('captions');
    expect(track?.hasAttribute('default')).toBe(true);
    expect(screen.getAllByTestId('guide-step')).toHaveLength(3);
    // What the guide asks of the reader, under its title, and each step's own time where its author gave one.
    expect(screen.getByTestId('guide-skill').textContent).toBe('Skill: Shop regular (2 of 3)');
    expect(screen.getByTestId('guide-time').textContent).toBe('Time: about 2 h 30 min');
    expect(screen.getAllByTestId('guide-step').map((step) => within(step).queryByTestId('step-minutes')?.textContent ?? null)).toEqual([
      'about 20 min',
      null,
      'about 45 min',
    ]);
    expect(screen.getByRole('table', { name: 'Parts' })).toBeTruthy();
    expect(screen.getByText('Trolley jack')).toBeTruthy();
    expect(screen.getByText('Thread locker, medium strength')).toBeTruthy();
    // The guide's answer, then its transcript in windows: the first rows, and the minute playing now.
    await screen.findAllByTestId('transcript-cue');
    expect(requests.map((request) => `${request.url.pathname}${request.url.search}`)).toEqual([
      '/api/guides/harrow-lane-garage/motor-to-gearbox-coupler',
      '/api/guides/harrow-lane-garage/motor-to-gearbox-coupler/cues?fromIndex=0&limit=100',
      '/api/guides/harrow-lane-garage/motor-to-gearbox-coupler/cues?fromMs=0&toMs=60000',
    ]);
  });

  it('highlights the playing step and cue, and a step’s time seeks the video', async () => {
    stubApi(guideRoutes(testGuide()));
    renderGuide();
    const video = (await screen.findByTestId('guide-video')) as HTMLVideoElement;
    const steps = screen.getAllByTestId('guide-step');

    playTo(video, 1);
    expect(steps[0].getAttribute('aria-current')).toBe('step');
    // Under the video (shown on phones): the playing step's number and title.
    expect(screen.getByTestId('now-playing').textContent).toBe('Step 1 of 3 · from 0:00Lift the cab');
    expect(within(steps[0]).getByText('Playing now')).toBeTruthy();
    expect(steps[1].getAttribute('aria-current')).toBeNull();
    await waitFor(() => expect(screen.getAllByTestId('transcript-cue')[0].getAttribute('aria-current')).toBe('time'));

    fireEvent.click(screen.getByRole('button', { name: 'Play step 2 from 0:08' }));
    expect(video.currentTime).toBe(8);
    expect(HTMLMediaElement.prototype.play).toHaveBeenCalled();
    expect(steps[1].getAttribute('aria-current')).toBe('step');
    expect(steps[0].getAttribute('aria-current')).toBeNull();

    // Step 3 has no time: nothing to click.
    expect(within(steps[2]).queryByTestId('step-time')).toBeNull();
  });

  it('searches the transcript and plays from a found cue', async () => {
    stubApi(guideRoutes(testGuide()));
    renderGuide();
    const video = (await screen.findByTestId('guide-video')) as HTMLVideoElement;
    fireEvent.change(await screen.findByRole('searchbox', { name: 'Search the transcript' }), { target: { value: 'Spigot' } });
    await screen.findByText('1 of 3 cues mention “Spigot”');
    const cues = await screen.findAllByTestId('transcript-cue');
    expect(cues).toHaveLength(1);
    expect(cues[0].textContent).toMatch(/0:12.*fifteen thousandths/);
    expect(screen.getByTestId('transcript-count').textContent).toBe('1 of 3 cues mention “Spigot”');
    fireEvent.click(cues[0]);
    expect(video.currentTime).toBe(12);
  });

  it('seeks from check evidence and from the marks under the video', async () => {
    stubApi(guideRoutes(testGuide()));
    renderGuide();
    const video = (await screen.findByTestId('guide-video')) as HTMLVideoElement;
    fireEvent.click(screen.getByRole('button', { name: 'Watch the evidence at 0:09: Slides on by hand' }));
    expect(video.currentTime).toBe(9);
    const marks = within(screen.getByRole('list', { name: 'Marks in the video' })).getAllByRole('button');
    expect(marks.map((mark) => mark.textContent)).toEqual(['Check evidence 0:09Slides on by hand', 'Measurement 0:12Spigot 0.015 in over']);
    fireEvent.click(marks[1]);
    expect(video.currentTime).toBe(12.5);
  });

  it('the Print button opens the browser’s print dialog (what goes on paper is checked in the browser journey)', async () => {
    stubApi(guideRoutes(testGuide()));
    const printSpy = vi.spyOn(window, 'print').mockImplementation(() => {});
    renderGuide();
    fireEvent.click(await screen.findByRole('button', { name: 'Print' }));
    expect(printSpy).toHaveBeenCalled();
  });

  it('without a video, lists the steps with their times and no player', async () => {
    stubApi(guideRoutes(testGuide({ footage: null, marks: [] }), []));
    renderGuide();
    await screen.findAllByTestId('guide-step');
    expect(screen.queryByTestId('guide-video')).toBeNull();
    expect(screen.queryByTestId('guide-transcript')).toBeNull();
    expect(screen.queryByRole('button', { name: /Play step/ })).toBeNull();
    expect(screen.getByText('0:08')).toBeTruthy();
    expect(screen.queryByRole('button', { name: /Watch the evidence/ })).toBeNull();
  });

  it('leaves out the parts list when the guide follows no assembly', async () => {
    stubApi([{ path: GUIDE_PATH, body: testGuide({ checklist: null, parts: [] }) }]);
    renderGuide();
    await screen.findAllByTestId('guide-step');
    expect(screen.queryByTestId('guide-parts')).toBeNull();
    expect(screen.queryByTestId('guide-checklist')).toBeNull();
    expect(screen.getByTestId('guide-supplies')).toBeTruthy();
  });

  it('says so in words when the guide is not published', async () => {
    stubApi([{ path: GUIDE_PATH, status: 404, body: { statusCode: 404, message: 'Guide not found' } }]);
    renderGuide();
    expect(await screen.findByRole('heading', { name: 'This guide is not published' })).toBeTruthy();
    expect(screen.getByRole('link', { name: 'Browse published guides' }).getAttribute('href')).toBe('/guides');
  });
});
