/**
 * Rewriting the playlists ffmpeg writes (RFC 8216, HTTP Live Streaming) so they can be served from a
 * private bucket: the API serves every playlist itself and replaces each URI in it, variant
 * playlists by API paths and segments (and the fMP4 init section) by short-lived storage links.
 * Pure string work over ffmpeg's own output, line by line, in linear time.
 */

const URI_ATTRIBUTE = /URI="([^"]*)"/u;

/** The URIs a playlist names: its URI lines and the URI attribute of EXT-X-MAP / EXT-X-MEDIA tags. */
export function playlistUris(playlist: string): string[] {
  const uris: string[] = [];
  for (const rawLine of playlist.split('\n')) {
    const line = rawLine.trim();
    if (line === '') continue;
    if (line.startsWith('#')) {
      const attribute = line.startsWith('#EXT-X-MAP:') || line.startsWith('#EXT-X-MEDIA:') ? URI_ATTRIBUTE.exec(line) : null;
      if (attribute) uris.push(attribute[1]);
      continue;
    }
    uris.push(line);
  }
  return uris;
}

/** The playlist with each URI replaced by `replacement(uri)`; tags, durations and order stay. */
export function rewritePlaylist(playlist: string, replacement: (uri: string) => string): string {
  return playlist
    .split('\n')
    .map((rawLine) => {
      const line = rawLine.trim();
      if (line === '') return '';
      if (line.startsWith('#')) {
        if (!line.startsWith('#EXT-X-MAP:') && !line.startsWith('#EXT-X-MEDIA:')) return line;
        return line.replace(URI_ATTRIBUTE, (_match, uri: string) => `URI="${replacement(uri)}"`);
      }
      return replacement(line);
    })
    .filter((line, index, lines) => line !== '' || (index > 0 && lines[index - 1] !== ''))
    .join('\n');
}

/** ffmpeg names variant playlists `v<N>/index.m3u8`; N is the rendition index, 0 the highest. */
export function variantIndexOf(uri: string): number | null {
  const match = /^v(\d{1,2})\/index\.m3u8$/u.exec(uri);
  return match ? Number(match[1]) : null;
}

/** The index in an API variant path's last part, `v<N>.m3u8`; null for anything else. */
export function variantIndexFromName(name: string): number | null {
  const match = /^v(\d{1,2})\.m3u8$/u.exec(name);
  return match ? Number(match[1]) : null;
}
