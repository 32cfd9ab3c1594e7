import { formatClock } from '@/lib/clock';
import { usePlaybackMs, type PlaybackClock } from '@/lib/playback-clock';

/**
 * The playing time as text. The one place a page shows the time: it subscribes to the clock itself, so a time
 * update re-renders this text alone, not the page around it.
 */
export function PlaybackTime({ clock, tenths = false }: { clock: PlaybackClock; tenths?: boolean }) {
  const ms = usePlaybackMs(clock);
  return <>{formatClock(ms, { tenths })}</>;
}
