import { useFootagePlayer } from '@/components/footage-player/use-footage-player';
import { usePlaybackMs } from '@/lib/playback-clock';

/** The follow-along view's one video: where it is, and how steps, cues, marks and evidence move it. */
export function useGuidePlayer() {
  const control = useFootagePlayer();
  const currentMs = usePlaybackMs(control.clock);

  const seek = (ms: number) => {
    const video = control.videoRef.current;
    if (!video) return;
    // A reader who clicked a step further down wants to see it: bring the video back if it is out of view.
    const box = video.getBoundingClientRect();
    if (box.bottom < 64 || box.top > window.innerHeight) video.scrollIntoView({ behavior: 'smooth', block: 'start' });
    control.seek(ms, { play: true });
  };

  return { control, currentMs, seek };
}

export type GuidePlayer = ReturnType<typeof useGuidePlayer>;
