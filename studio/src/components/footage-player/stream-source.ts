/**
 * Which stream a player loads: the HLS master where the browser plays HLS itself, through hls.js where it
 * has Media Source Extensions but no native HLS, and the progressive file otherwise or once HLS has failed.
 * Plain functions, so the choice is tested without a browser.
 */

export interface StreamSources {
  /** The HLS master playlist (same-origin API path), null until renditions are ready. */
  hlsUrl: string | null;
  /** A progressive file the browser can play directly (the MP4 rendition, or the original before it exists). */
  fileUrl: string | null;
}

export interface BrowserAbilities {
  nativeHls: boolean;
  mediaSource: boolean;
}

export type StreamChoice = { kind: 'native-hls' | 'hls.js' | 'file'; url: string };

export function chooseStream(sources: StreamSources, abilities: BrowserAbilities, hlsFailed: boolean): StreamChoice | null {
  if (sources.hlsUrl !== null && !hlsFailed) {
    if (abilities.nativeHls) return { kind: 'native-hls', url: sources.hlsUrl };
    if (abilities.mediaSource) return { kind: 'hls.js', url: sources.hlsUrl };
  }
  return sources.fileUrl === null ? null : { kind: 'file', url: sources.fileUrl };
}

/** H.264 High + AAC-LC, what every rendition is encoded as. */
const RENDITION_CODECS = 'video/mp4; codecs="avc1.640028,mp4a.40.2"';

export function browserAbilities(video: HTMLVideoElement): BrowserAbilities {
  const mediaSource = typeof window.MediaSource === 'function' && window.MediaSource.isTypeSupported(RENDITION_CODECS);
  return { nativeHls: video.canPlayType('application/vnd.apple.mpegurl') !== '', mediaSource };
}

/** The footage's shape as a CSS ratio ("1080 / 1920"): the shown size (after rotation) where known, 16 / 9 otherwise. */
export function playerAspect(width: number | null | undefined, height: number | null | undefined): string {
  return width && height && width > 0 && height > 0 ? `${width} / ${height}` : '16 / 9';
}
