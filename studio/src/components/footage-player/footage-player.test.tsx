import { act, fireEvent, screen } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { renderWithProviders } from '@/testing/render';
import { usePlaybackMs } from '@/lib/playback-clock';
import { FootagePlayer, type FootagePlayerProps } from './footage-player';
import { chooseStream, playerAspect, type StreamKind } from './stream-source';
import { useFootagePlayer, type FootagePlayerControl } from './use-footage-player';

// hls.js needs Media Source Extensions, which jsdom lacks: the attachment is replaced by a recorder so the
// wiring around it (which stream, what happens when it fails) is tested here, and the real thing in the browser journey.
const hlsAttachments = vi.hoisted(() => ({
  calls: [] as { url: string; onFatal: (network: boolean) => void; destroyed: boolean }[],
}));
vi.mock('./hls-attachment', () => ({
  attachHls: (_video: HTMLVideoElement, url: string, onFatal: (network: boolean) => void) => {
    const call = { url, onFatal, destroyed: false };
    hlsAttachments.calls.push(call);
    return Promise.resolve({ destroy: () => (call.destroyed = true) });
  },
}));

const HLS = '/api/workshops/w1/footage/f1/hls/master.m3u8';
const FILE = 'https://storage.example/bucket/f1/web.mp4?X-Amz-Signature=abc';
const CAPTIONS = '/api/workshops/w1/footage/f1/transcript/webvtt?revision=2';

type Harness = Partial<Omit<FootagePlayerProps, 'control'>> & { control?: FootagePlayerControl };

function Player({ control, ...props }: Harness) {
  const own = useFootagePlayer();
  return (
    <FootagePlayer
      control={control ?? own}
      sources={{ hlsUrl: HLS, fileUrl: FILE }}
      posterUrl={null}
      captions={{ src: CAPTIONS, label: 'Transcript (revision 2)' }}
      label="Video: Spline check"
      displayWidth={1920}
      displayHeight={1080}
      cannotPlayMessage="This browser cannot play the video."
      testId="video"
      {...props}
    />
  );
}

const video = () => screen.getByTestId('video') as HTMLVideoElement;

function withNativeHls() {
  vi.spyOn(HTMLMediaElement.prototype, 'canPlayType').mockImplementation((type) => (type === 'application/vnd.apple.mpegurl' ? 'maybe' : ''));
}

function withMediaSource() {
  vi.stubGlobal('MediaSource', class {
    static isTypeSupported = (type: string) => type.startsWith('video/mp4');
  });
}

beforeEach(() => {
  hlsAttachments.calls.length = 0;
});

afterEach(() => {
  vi.restoreAllMocks();
  vi.unstubAllGlobals();
});

describe('chooseStream', () => {
  const sources = { hlsUrl: HLS, fileUrl: FILE };
  const none = new Set<StreamKind>();
  it('streams HLS through hls.js where the browser has MSE, natively where it has only native HLS, else plays the file', () => {
    expect(chooseStream(sources, { nativeHls: true, mediaSource: true }, none)).toEqual({ kind: 'hls.js', url: HLS });
    expect(chooseStream(sources, { nativeHls: true, mediaSource: false }, none)).toEqual({ kind: 'native-hls', url: HLS });
    expect(chooseStream(sources, { nativeHls: false, mediaSource: false }, none)).toEqual({ kind: 'file', url: FILE });
  });

  it('moves on to the next stream once one has failed, takes the file while there are no renditions, and gives up after the file', () => {
    const abilities = { nativeHls: true, mediaSource: true };
    expect(chooseStream(sources, abilities, new Set<StreamKind>(['hls.js']))).toEqual({ kind: 'native-hls', url: HLS });
    expect(chooseStream(sources, abilities, new Set<StreamKind>(['hls.js', 'native-hls']))).toEqual({ kind: 'file', url: FILE });
    expect(chooseStream(sources, abilities, new Set<StreamKind>(['hls.js', 'native-hls', 'file']))).toBeNull();
    expect(chooseStream({ hlsUrl: null, fileUrl: FILE }, abilities, none)).toEqual({ kind: 'file', url: FILE });
    expect(chooseStream({ hlsUrl: HLS, fileUrl: null }, { nativeHls: false, mediaSource: false }, none)).toBeNull();
  });
});

describe('FootagePlayer', () => {
  it('plays the file where the browser has neither native HLS nor MSE, with the captions track on', () => {
    renderWithProviders(<Player />);
    expect(video().dataset.stream).toBe('file');
    expect(video().getAttribute('src')).toBe(FILE);
    const track = video().querySelector('track');
    expect(track?.getAttribute('kind')).toBe('captions');
    expect(track?.getAttribute('src')).toBe(CAPTIONS);
    expect(track?.hasAttribute('default')).toBe(true);
    expect(hlsAttachments.calls).toHaveLength(0);
  });

  it('gives the master playlist to a browser with native HLS but no MSE, and falls back to the file on an error', () => {
    withNativeHls();
    renderWithProviders(<Player />);
    expect(video().dataset.stream).toBe('native-hls');
    expect(video().getAttribute('src')).toBe(HLS);
    fireEvent.error(video());
    expect(video().dataset.stream).toBe('file');
    expect(video().getAttribute('src')).toBe(FILE);
    expect(screen.queryByRole('alert')).toBeNull();
  });

  it('loads hls.js where there is MSE but no native HLS, keeps the captions track, and falls back to the file when hls.js gives up', async () => {
    withMediaSource();
    renderWithProviders(<Player />);
    await vi.waitFor(() => expect(hlsAttachments.calls).toHaveLength(1));
    expect(hlsAttachments.calls[0].url).toBe(HLS);
    expect(video().dataset.stream).toBe('hls.js');
    // hls.js owns the source: the element carries no src of its own.
    expect(video().hasAttribute('src')).toBe(false);
    expect(video().querySelector('track[kind="captions"]')?.getAttribute('src')).toBe(CAPTIONS);

    act(() => hlsAttachments.calls[0].onFatal(false));
    expect(video().dataset.stream).toBe('file');
    expect(video().getAttribute('src')).toBe(FILE);
    expect(hlsAttachments.calls[0].destroyed).toBe(true);
    expect(video().querySelector('track[kind="captions"]')?.getAttribute('src')).toBe(CAPTIONS);
  });

  it('tries the browser’s own HLS after hls.js where it has both, then the file', async () => {
    withMediaSource();
    withNativeHls();
    renderWithProviders(<Player />);
    await vi.waitFor(() => expect(hlsAttachments.calls).toHaveLength(1));
    act(() => hlsAttachments.calls[0].onFatal(false));
    expect(video().dataset.stream).toBe('native-hls');
    expect(video().getAttribute('src')).toBe(HLS);
    fireEvent.error(video());
    expect(video().dataset.stream).toBe('file');
  });

  it('gives hls.js one fresh start after a network failure (expired segment links), then falls back', async () => {
    withMediaSource();
    renderWithProviders(<Player />);
    await vi.waitFor(() => expect(hlsAttachments.calls).toHaveLength(1));
    act(() => hlsAttachments.calls[0].onFatal(true));
    await vi.waitFor(() => expect(hlsAttachments.calls).toHaveLength(2));
    expect(hlsAttachments.calls[0].destroyed).toBe(true);
    expect(video().dataset.stream).toBe('hls.js');
    act(() => hlsAttachments.calls[1].onFatal(true));
    expect(video().dataset.stream).toBe('file');
  });

  it('asks for a fresh file link when the old one has run out, and says so in words when the file cannot play', () => {
    const onRenewFileLink = vi.fn();
    const { unmount } = renderWithProviders(
      <Player sources={{ hlsUrl: null, fileUrl: FILE }} fileLinkExpiresAt={new Date(Date.now() + 10_000).toISOString()} onRenewFileLink={onRenewFileLink} />,
    );
    fireEvent.error(video());
    expect(onRenewFileLink).toHaveBeenCalledTimes(1);
    expect(screen.queryByRole('alert')).toBeNull();
    unmount();

    renderWithProviders(
      <Player sources={{ hlsUrl: null, fileUrl: FILE }} fileLinkExpiresAt={new Date(Date.now() + 3_600_000).toISOString()} onRenewFileLink={onRenewFileLink} />,
    );
    fireEvent.error(video());
    expect(screen.getByRole('alert').textContent).toContain('This browser cannot play the video.');
    expect(onRenewFileLink).toHaveBeenCalledTimes(1);
  });

  it('keeps the footage shape (portrait stays portrait) and bounds the height, so the frame narrows instead', () => {
    renderWithProviders(<Player displayWidth={1080} displayHeight={1920} maxHeight="40dvh" />);
    const frame = screen.getByTestId('player-frame');
    expect(frame.dataset.aspect).toBe('1080 / 1920');
    expect(frame.style.getPropertyValue('--player-aspect')).toBe('1080 / 1920');
    expect(frame.style.getPropertyValue('--player-max-height')).toBe('40dvh');
    expect(playerAspect(null, 1080)).toBe('16 / 9');
    expect(playerAspect(1920, 1080)).toBe('1920 / 1080');
  });

  it('puts the time in the clock: what shows the time re-renders, the page around the player does not', () => {
    const pageRendered = vi.fn();
    function TimeShown({ control }: { control: FootagePlayerControl }) {
      return <span data-testid="time">{usePlaybackMs(control.clock)}</span>;
    }
    function Page() {
      pageRendered();
      const control = useFootagePlayer();
      return (
        <>
          <Player control={control} />
          <TimeShown control={control} />
        </>
      );
    }
    renderWithProviders(<Page />);
    const rendersBefore = pageRendered.mock.calls.length;
    Object.defineProperty(video(), 'currentTime', { configurable: true, value: 12.5, writable: true });
    fireEvent.timeUpdate(video());
    expect(screen.getByTestId('time').textContent).toBe('12500');
    expect(pageRendered).toHaveBeenCalledTimes(rendersBefore);
  });

  it('when the renditions arrive mid-play, the new stream starts where the old one was and plays on', () => {
    const play = vi.spyOn(HTMLMediaElement.prototype, 'play').mockResolvedValue(undefined);
    const { rerender } = renderWithProviders(<Player sources={{ hlsUrl: null, fileUrl: FILE }} />);
    Object.defineProperty(video(), 'currentTime', { configurable: true, value: 42, writable: true });
    fireEvent.play(video());
    fireEvent.timeUpdate(video());
    // The renditions are ready: a new answer names them and a fresh file link (this browser plays the file).
    rerender(<Player sources={{ hlsUrl: HLS, fileUrl: `${FILE}&fresh` }} />);
    const element = video();
    expect(element.getAttribute('src')).toBe(`${FILE}&fresh`);
    element.currentTime = 0;
    fireEvent.loadedMetadata(element);
    expect(element.currentTime).toBe(42);
    expect(play).toHaveBeenCalledTimes(1);
  });
});
