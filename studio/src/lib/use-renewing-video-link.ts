import { useRef, useState, type SyntheticEvent } from 'react';

/** A presigned video link, and the query that can fetch a fresh one. */
export interface ExpiringVideoLink {
  data?: { expiresAt: string };
  refetch: () => unknown;
}

/**
 * Keeps a `<video>` on a short-lived storage link playing: when the link has run out (an error within
 * a minute of its expiry), a new one is fetched and playback carries on from the same place. Any other
 * error (a codec the browser lacks) is reported, not retried. `startAtMs` is where the first load begins.
 */
export function useRenewingVideoLink(
  link: ExpiringVideoLink,
  { cannotPlay, startAtMs, onResumed }: { cannotPlay: string; startAtMs?: number; onResumed?: (ms: number) => void },
) {
  const [videoError, setVideoError] = useState<string | null>(null);
  const resumeAt = useRef<number | undefined>(startAtMs);

  const onLoadedMetadata = (event: SyntheticEvent<HTMLVideoElement>) => {
    if (resumeAt.current === undefined) return;
    event.currentTarget.currentTime = resumeAt.current / 1000;
    onResumed?.(resumeAt.current);
    resumeAt.current = undefined;
  };

  const onError = (event: SyntheticEvent<HTMLVideoElement>) => {
    const expired = link.data !== undefined && Date.parse(link.data.expiresAt) - Date.now() < 60_000;
    if (!expired) {
      setVideoError(cannotPlay);
      return;
    }
    resumeAt.current = event.currentTarget.currentTime * 1000;
    void link.refetch();
  };

  return { videoError, onLoadedMetadata, onError };
}
