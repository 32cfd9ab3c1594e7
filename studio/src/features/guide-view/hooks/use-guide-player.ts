import { useRef, useState, type SyntheticEvent } from 'react';

/** The follow-along view's one video: where it is, and how steps, cues, marks and evidence move it. */
export function useGuidePlayer() {
  const videoRef = useRef<HTMLVideoElement>(null);
  const [currentMs, setCurrentMs] = useState(0);
  const [failed, setFailed] = useState(false);
  const resumeAtMs = useRef<number | undefined>(undefined);

  const seek = (ms: number) => {
    const video = videoRef.current;
    if (!video) return;
    video.currentTime = ms / 1000;
    setCurrentMs(ms);
    // A reader who clicked a step further down wants to see it: bring the video back if it is out of view.
    const box = video.getBoundingClientRect();
    if (box.bottom < 64 || box.top > window.innerHeight) video.scrollIntoView({ behavior: 'smooth', block: 'start' });
    video.play().catch(() => {
      // The browser may refuse to play until the reader interacts with the video; the position is set either way.
    });
  };

  const handleTime = (event: SyntheticEvent<HTMLVideoElement>) => setCurrentMs(event.currentTarget.currentTime * 1000);

  const handleLoadedMetadata = (event: SyntheticEvent<HTMLVideoElement>) => {
    if (resumeAtMs.current === undefined) return;
    event.currentTarget.currentTime = resumeAtMs.current / 1000;
    resumeAtMs.current = undefined;
  };

  const handleError = () => setFailed(true);

  /** The video address redirects to a short-lived storage link; loading it again fetches a fresh one. */
  const retry = () => {
    const video = videoRef.current;
    if (!video) return;
    resumeAtMs.current = video.currentTime * 1000 || currentMs;
    setFailed(false);
    video.load();
  };

  return {
    videoRef,
    currentMs,
    failed,
    seek,
    retry,
    videoEvents: { onTimeUpdate: handleTime, onSeeked: handleTime, onLoadedMetadata: handleLoadedMetadata, onError: handleError },
  };
}
