import fc from 'fast-check';
import { playlistUris, rewritePlaylist, variantIndexFromName, variantIndexOf } from './hls-playlist';

// As ffmpeg 5.1 writes them (hls muxer, fMP4 segments, var_stream_map with two renditions).
const MASTER = `#EXTM3U
#EXT-X-VERSION:7
#EXT-X-STREAM-INF:BANDWIDTH=3220800,RESOLUTION=1280x720,CODECS="avc1.64001f,mp4a.40.2"
v0/index.m3u8

#EXT-X-STREAM-INF:BANDWIDTH=1020800,RESOLUTION=640x360,CODECS="avc1.64001e,mp4a.40.2"
v1/index.m3u8
`;
const MEDIA = `#EXTM3U
#EXT-X-VERSION:7
#EXT-X-TARGETDURATION:4
#EXT-X-MEDIA-SEQUENCE:0
#EXT-X-PLAYLIST-TYPE:VOD
#EXT-X-INDEPENDENT-SEGMENTS
#EXT-X-MAP:URI="init_0.mp4"
#EXTINF:4.000000,
seg-00000.m4s
#EXTINF:1.000000,
seg-00001.m4s
#EXT-X-ENDLIST
`;

describe('HLS playlist rewriting (RFC 8216)', () => {
  it('finds the URIs of a media playlist, the EXT-X-MAP init section first', () => {
    expect(playlistUris(MEDIA)).toEqual(['init_0.mp4', 'seg-00000.m4s', 'seg-00001.m4s']);
    expect(playlistUris(MASTER)).toEqual(['v0/index.m3u8', 'v1/index.m3u8']);
  });

  it('replaces every URI and keeps tags, durations and order', () => {
    const rewritten = rewritePlaylist(MEDIA, (uri) => `https://storage.example/${uri}?X-Amz-Signature=abc`);
    expect(rewritten).toContain('#EXT-X-MAP:URI="https://storage.example/init_0.mp4?X-Amz-Signature=abc"');
    expect(rewritten).toContain('#EXTINF:4.000000,\nhttps://storage.example/seg-00000.m4s?X-Amz-Signature=abc\n#EXTINF:1.000000,');
    expect(rewritten.endsWith('#EXT-X-ENDLIST\n')).toBe(true);
    const tags = (playlist: string) => playlist.split('\n').filter((line) => line.startsWith('#') && !line.startsWith('#EXT-X-MAP'));
    expect(tags(rewritten)).toEqual(tags(MEDIA));
  });

  it('maps variant playlists to their index, and API names back', () => {
    expect(variantIndexOf('v1/index.m3u8')).toBe(1);
    expect(variantIndexOf('../secret/index.m3u8')).toBeNull();
    expect(variantIndexFromName('v0.m3u8')).toBe(0);
    expect(variantIndexFromName('v0.m3u8/../x')).toBeNull();
    expect(variantIndexFromName('6b1f1a70-0000-4000-8000-000000000000')).toBeNull();
  });

  it('keeps a playlist unchanged under the identity and finishes quickly on long input (linear time)', () => {
    fc.assert(
      fc.property(fc.array(fc.oneof(fc.constant('#EXTINF:4.0,'), fc.constant(''), fc.stringMatching(/^[a-z0-9-]{1,12}\.m4s$/u)), { maxLength: 200 }), (lines) => {
        const playlist = `#EXTM3U\n${lines.join('\n')}\n`;
        const uris = playlistUris(playlist);
        expect(uris).toEqual(lines.filter((line) => line !== '' && !line.startsWith('#')));
        expect(playlistUris(rewritePlaylist(playlist, (uri) => uri))).toEqual(uris);
      }),
    );
    const long = `#EXTM3U\n${'#EXTINF:4.0,\nseg.m4s\n'.repeat(50_000)}`;
    expect(playlistUris(long)).toHaveLength(50_000);
  });
});
