/**
 * hls.js behind a dynamic import, so only a browser that needs it downloads it (the public viewer's first
 * bundle stays without it). Segments come from storage with short-lived links; the API's playlists need
 * the session cookie, which same-origin requests carry without `withCredentials`.
 */
export interface HlsAttachment {
  destroy: () => void;
}

/** `onFatal(network)` is told once hls.js gives up; `network` says a link or the connection failed (a fresh playlist may help). */
export async function attachHls(video: HTMLVideoElement, masterUrl: string, onFatal: (network: boolean) => void): Promise<HlsAttachment> {
  const { default: Hls } = await import('hls.js');
  // No worker: the page's Content-Security-Policy allows no blob: workers, and the renditions need no transmuxing.
  const hls = new Hls({ enableWorker: false, capLevelToPlayerSize: true });
  hls.on(Hls.Events.ERROR, (_event, data) => {
    if (data.fatal) onFatal(data.type === Hls.ErrorTypes.NETWORK_ERROR);
  });
  hls.loadSource(masterUrl);
  hls.attachMedia(video);
  return { destroy: () => hls.destroy() };
}
