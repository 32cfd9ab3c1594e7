import { useSyncExternalStore } from 'react';

/**
 * Where a video is, held outside React state: the player writes every time update here, and only the
 * components that show the time subscribe (`usePlaybackMs`), so a tick re-renders the clock and the
 * playhead, not the page around them.
 */
export interface PlaybackClock {
  getMs: () => number;
  set: (ms: number) => void;
  subscribe: (listener: () => void) => () => void;
}

export function createPlaybackClock(startMs = 0): PlaybackClock {
  let currentMs = startMs;
  const listeners = new Set<() => void>();
  return {
    getMs: () => currentMs,
    set: (ms) => {
      if (ms === currentMs) return;
      currentMs = ms;
      for (const listener of listeners) listener();
    },
    subscribe: (listener) => {
      listeners.add(listener);
      return () => listeners.delete(listener);
    },
  };
}

/** The clock's time; the calling component re-renders on every change. */
export function usePlaybackMs(clock: PlaybackClock): number {
  return useSyncExternalStore(clock.subscribe, clock.getMs, clock.getMs);
}

/**
 * Something derived from the clock's time (the playing row, whether the playhead left the view); the calling
 * component re-renders only when that value changes (compared with `Object.is`), not on every tick.
 * `select` may change between renders (e.g. it closes over the rows shown).
 */
export function usePlaybackSelect<T>(clock: PlaybackClock, select: (ms: number) => T): T {
  const snapshot = () => select(clock.getMs());
  return useSyncExternalStore(clock.subscribe, snapshot, snapshot);
}
