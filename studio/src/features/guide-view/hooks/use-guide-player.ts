import { useCallback } from 'react';
import { useFootagePlayer } from '@/components/footage-player/use-footage-player';

/**
 * The follow-along view's one video and how steps, cues, marks and evidence move it. It does not read the time:
 * the parts that show it (the step list, the line under the video, the marks' playhead, the playing cue) subscribe
 * to `control.clock` themselves, so a time update leaves the rest of the guide alone.
 */
export function useGuidePlayer() {
  const control = useFootagePlayer();

  const seek = useCallback(
    (ms: number) => {
      const video = control.videoRef.current;
      if (!video) return;
      // A reader who clicked a step further down wants to see it: bring the video back if it is out of view.
      const box = video.getBoundingClientRect();
      if (box.bottom < 64 || box.top > window.innerHeight) video.scrollIntoView({ behavior: 'smooth', block: 'start' });
      control.seek(ms, { play: true });
    },
    [control],
  );

  return { control, clock: control.clock, seek };
}

export type GuidePlayer = ReturnType<typeof useGuidePlayer>;
