/**
 * Which stream a player loads, best first: the HLS master through hls.js where the browser has Media Source
 * Extensions (hls.js's own advice, and what every desktop browser and iPadOS have), the browser's own HLS where it
 * has no MSE (iPhone Safari), and the progressive file otherwise or once the others have failed. Native HLS comes
 * second on purpose: Chromium 156 answers "maybe" to canPlayType for HLS yet refused our fMP4 playlists with
 * MEDIA_ERR_SRC_NOT_SUPPORTED (seen in the playback journey). Plain functions, so the choice is tested without a browser.
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

export type StreamKind = 'hls.js' | 'native-hls' | 'file';
export type StreamChoice = { kind: StreamKind; url: string };

export function chooseStream(sources: StreamSources, abilities: BrowserAbilities, failed: ReadonlySet<StreamKind>): StreamChoice | null {
  const { hlsUrl, fileUrl } = sources;
  if (hlsUrl !== null) {
    if (abilities.mediaSource && !failed.has('hls.js')) return { kind: 'hls.js', url: hlsUrl };
    if (abilities.nativeHls && !failed.has('native-hls')) return { kind: 'native-hls', url: hlsUrl };
  }
  return fileUrl === null || failed.has('file') ? null : { kind: 'file', url: fileUrl };
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
