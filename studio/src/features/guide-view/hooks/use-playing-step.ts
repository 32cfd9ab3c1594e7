import { usePlaybackSelect, type PlaybackClock } from '@/lib/playback-clock';
import { currentStepId, type TimedStep } from '../components/playback';

/**
 * The id of the step playing now. The calling component re-renders when another step starts playing, not on every
 * time update.
 */
export function usePlayingStepId(clock: PlaybackClock, steps: readonly TimedStep[], mainFootageId: string | null): string | null {
  return usePlaybackSelect(clock, (ms) => currentStepId(steps, ms, mainFootageId));
}
