import { Alert, Button, Group, Text } from '@mantine/core';
import { useEffect, useLayoutEffect, useRef, useState, type CSSProperties, type SyntheticEvent } from 'react';
import { ScrubBar } from '../scrub-preview';
import classes from './footage-player.module.css';
import { attachHls, type HlsAttachment } from './hls-attachment';
import { browserAbilities, chooseStream, playerAspect, type BrowserAbilities, type StreamKind, type StreamSources } from './stream-source';
import type { FootagePlayerControl } from './use-footage-player';

export interface FootagePlayerProps {
  control: FootagePlayerControl;
  sources: StreamSources;
  posterUrl: string | null;
  /** The transcript as a WebVTT captions track (same timeline on every rendition), on by default. */
  captions: { src: string; label: string } | null;
  /** The video's accessible name, e.g. "Video: <title>". */
  label: string;
  /** The footage as shown (after rotation); the frame keeps this shape. */
  displayWidth: number | null | undefined;
  displayHeight: number | null | undefined;
  /** The tallest the picture may be (a CSS length), so a portrait clip never pushes the tools below off screen. */
  maxHeight?: string;
  /** Where the first load starts (e.g. `?t=` from a search hit). */
  startAtMs?: number;
  /** When the file link is short-lived: its expiry, and how to fetch a fresh one (playback resumes where it was). */
  fileLinkExpiresAt?: string;
  onRenewFileLink?: () => void;
  /** What to tell the viewer when nothing plays. */
  cannotPlayMessage: string;
  /** A seek bar under the video with scrub previews from this WebVTT thumbnails track. */
  scrubBar?: { durationMs: number; thumbnailsUrl: string | null };
  testId?: string;
}

/** A link within this long of its expiry is taken to have run out when the video fails. */
const EXPIRY_MARGIN_MS = 60_000;

/**
 * The one footage player (footage page, marking workspace, guide editor, public guide): the HLS master
 * natively or through hls.js, the progressive file otherwise or when HLS fails, captions on every
 * rendition, sized to the footage's shape within `maxHeight`. Time goes to `control.clock`, not to state.
 */
export function FootagePlayer({
  control,
  sources,
  posterUrl,
  captions,
  label,
  displayWidth,
  displayHeight,
  maxHeight = '60dvh',
  startAtMs,
  fileLinkExpiresAt,
  onRenewFileLink,
  cannotPlayMessage,
  scrubBar,
  testId,
}: FootagePlayerProps) {
  const { videoRef, clock } = control;
  const [abilities, setAbilities] = useState<BrowserAbilities | null>(null);
  // Streams that failed on this page, so the next best is tried (a retry clears them).
  const [failedStreams, setFailedStreams] = useState<ReadonlySet<StreamKind>>(() => new Set());
  const [failure, setFailure] = useState<string | null>(null);
  const [attempt, setAttempt] = useState(0);
  const resumeAtMs = useRef<number | undefined>(startAtMs);
  const networkRetries = useRef(0);

  // What the browser can play is known only with a video element in the page.
  useEffect(() => {
    if (videoRef.current) setAbilities(browserAbilities(videoRef.current));
  }, [videoRef]);

  const choice = abilities ? chooseStream(sources, abilities, failedStreams) : null;
  const hlsJsUrl = choice?.kind === 'hls.js' ? choice.url : null;

  // A new stream (the web renditions became ready while the original played) starts where the old one was:
  // the clock still holds that time, since the element's reset reaches it only in a later task.
  const streamUrl = choice?.url ?? null;
  const shownStream = useRef(streamUrl);
  const playing = useRef(false);
  const resumePlaying = useRef(false);
  useLayoutEffect(() => {
    if (shownStream.current !== null && streamUrl !== shownStream.current && resumeAtMs.current === undefined && clock.getMs() > 0) {
      resumeAtMs.current = clock.getMs();
      resumePlaying.current = playing.current;
    }
    shownStream.current = streamUrl;
  }, [streamUrl, clock]);

  const rememberPosition = () => {
    const video = videoRef.current;
    if (video && video.currentTime > 0) resumeAtMs.current = video.currentTime * 1000;
  };

  const giveUpOn = (kind: StreamKind) => {
    rememberPosition();
    setFailedStreams((current) => new Set(current).add(kind));
  };

  // hls.js owns the element's source while attached; a fatal network error (a playlist's segment links ran
  // out, a dropped connection) gets one fresh start, anything else moves on to the next stream.
  useEffect(() => {
    const video = videoRef.current;
    if (!video || hlsJsUrl === null) return;
    let attachment: HlsAttachment | null = null;
    let cancelled = false;
    void attachHls(video, hlsJsUrl, (network) => {
      if (cancelled) return;
      rememberPosition();
      if (network && networkRetries.current === 0) {
        networkRetries.current += 1;
        setAttempt((value) => value + 1);
      } else {
        giveUpOn('hls.js');
      }
    })
      .then((attached) => {
        if (cancelled) attached.destroy();
        else attachment = attached;
      })
      .catch(() => {
        if (!cancelled) giveUpOn('hls.js');
      });
    return () => {
      cancelled = true;
      attachment?.destroy();
    };
    // rememberPosition and giveUpOn read refs and set state only.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [hlsJsUrl, attempt, videoRef]);

  const handleTime = (event: SyntheticEvent<HTMLVideoElement>) => clock.set(event.currentTarget.currentTime * 1000);

  const handleLoadedMetadata = (event: SyntheticEvent<HTMLVideoElement>) => {
    if (resumeAtMs.current === undefined) return;
    event.currentTarget.currentTime = resumeAtMs.current / 1000;
    clock.set(resumeAtMs.current);
    resumeAtMs.current = undefined;
    if (resumePlaying.current) {
      resumePlaying.current = false;
      // A browser may refuse to play on its own (autoplay rules); the reader then presses play.
      event.currentTarget.play().catch(() => undefined);
    }
  };

  const handleError = () => {
    if (choice === null) return;
    if (choice.kind !== 'file') {
      giveUpOn(choice.kind);
      return;
    }
    const expired = fileLinkExpiresAt !== undefined && Date.parse(fileLinkExpiresAt) - Date.now() < EXPIRY_MARGIN_MS;
    if (expired && onRenewFileLink) {
      rememberPosition();
      onRenewFileLink();
      return;
    }
    setFailure(cannotPlayMessage);
  };

  const handleRetry = () => {
    rememberPosition();
    networkRetries.current = 0;
    setFailure(null);
    setFailedStreams(new Set());
    setAttempt((value) => value + 1);
    onRenewFileLink?.();
    // A redirecting file address gives a fresh storage link on every load.
    if (choice?.kind !== 'hls.js') videoRef.current?.load();
  };

  const aspect = playerAspect(displayWidth, displayHeight);
  const frameStyle = { '--player-aspect': aspect, '--player-max-height': maxHeight } as CSSProperties;

  return (
    <div className={classes.player}>
      {failure && (
        <Alert color="red" title="The video did not load" mb="xs" role="alert">
          <Group justify="space-between" gap="xs">
            <Text size="sm">{failure}</Text>
            <Button size="xs" variant="default" onClick={handleRetry}>
              Try again
            </Button>
          </Group>
        </Alert>
      )}
      <div className={classes.frame} style={frameStyle} data-testid="player-frame" data-aspect={aspect}>
        <video
          ref={videoRef}
          src={choice && choice.kind !== 'hls.js' ? choice.url : undefined}
          poster={posterUrl ?? undefined}
          controls
          preload="metadata"
          playsInline
          className={classes.video}
          aria-label={label}
          data-testid={testId}
          data-stream={choice?.kind}
          onTimeUpdate={handleTime}
          onSeeked={handleTime}
          onLoadedMetadata={handleLoadedMetadata}
          onPlay={() => {
            playing.current = true;
          }}
          onPause={() => {
            playing.current = false;
          }}
          onError={handleError}
        >
          {captions && <track key={captions.src} kind="captions" srcLang="en" label={captions.label} src={captions.src} default />}
        </video>
        {scrubBar && scrubBar.durationMs > 0 && (
          <ScrubBar clock={clock} durationMs={scrubBar.durationMs} thumbnailsUrl={scrubBar.thumbnailsUrl} onSeek={control.seek} />
        )}
      </div>
    </div>
  );
}
