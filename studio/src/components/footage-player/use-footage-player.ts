import { useRef, useState, type RefObject } from 'react';
import { createPlaybackClock, type PlaybackClock } from '@/lib/playback-clock';

/** How pages drive the shared footage player: one stable object, so passing it along re-renders nothing. */
export interface FootagePlayerControl {
  videoRef: RefObject<HTMLVideoElement | null>;
  /** Where the video is; subscribe with `usePlaybackMs(control.clock)` where the time is shown. */
  clock: PlaybackClock;
  /** The video's position at this instant (more exact than the last time update). */
  readPositionMs: () => number;
  /** Moves the video (and the clock at once); `play` starts it too (browsers may refuse until the viewer interacts). */
  seek: (ms: number, options?: { play?: boolean }) => void;
  pause: () => void;
}

export function useFootagePlayer(): FootagePlayerControl {
  const videoRef = useRef<HTMLVideoElement>(null);
  const [control] = useState<FootagePlayerControl>(() => {
    const clock = createPlaybackClock();
    return {
      videoRef,
      clock,
      readPositionMs: () => (videoRef.current ? Math.round(videoRef.current.currentTime * 1000) : clock.getMs()),
      seek: (ms, options) => {
        const video = videoRef.current;
        if (!video) return;
        video.currentTime = ms / 1000;
        clock.set(ms);
        if (options?.play) {
          video.play().catch(() => {
            // Autoplay may be refused until the viewer interacts; the position is set either way.
          });
        }
      },
      pause: () => videoRef.current?.pause(),
    };
  });
  return control;
}
