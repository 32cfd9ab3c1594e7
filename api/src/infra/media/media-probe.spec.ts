import { interpretProbe, isNotMediaMessage, NotAVideoError, posterTimeMs } from './media-probe';

// Shapes of `ffprobe -v error -print_format json -show_format -show_streams` output (ffmpeg 5.1,
// Debian 12) for clips generated with ffmpeg's lavfi test sources; trimmed to the fields we read.
const MP4_CLIP = {
  format: { format_name: 'mov,mp4,m4a,3gp,3g2,mj2', format_long_name: 'QuickTime / MOV', duration: '3.019000', tags: { major_brand: 'isom' } },
  streams: [
    { codec_type: 'video', codec_name: 'h264', width: 320, height: 240, avg_frame_rate: '25/1', r_frame_rate: '25/1', duration: '3.000000', disposition: { attached_pic: 0 } },
    { codec_type: 'audio', codec_name: 'aac', avg_frame_rate: '0/0', r_frame_rate: '0/0', duration: '3.018005', disposition: { attached_pic: 0 } },
  ],
};

describe('interpretProbe', () => {
  it('reads duration, size, frame rate and codecs of an MP4', () => {
    expect(interpretProbe(MP4_CLIP, 'mp4')).toEqual({
      durationMs: 3019,
      width: 320,
      height: 240,
      frameRate: 25,
      container: 'mp4',
      videoCodec: 'h264',
      audioCodec: 'aac',
      rotation: 0,
    });
  });

  it('reads the rotation from the display matrix (ffmpeg 5.1 side data) or the older rotate tag', () => {
    // Shape from ffprobe of a clip remuxed with `-metadata:s:v:0 rotate=90` (ffmpeg 5.1).
    const matrix = { ...MP4_CLIP, streams: [{ ...MP4_CLIP.streams[0], side_data_list: [{ side_data_type: 'Display Matrix', rotation: -90 }] }] };
    expect(interpretProbe(matrix).rotation).toBe(-90);
    const tagged = { ...MP4_CLIP, streams: [{ ...MP4_CLIP.streams[0], tags: { rotate: '270' } }] };
    expect(interpretProbe(tagged).rotation).toBe(270);
    const flipped = { ...MP4_CLIP, streams: [{ ...MP4_CLIP.streams[0], side_data_list: [{ side_data_type: 'Display Matrix', rotation: 180 }] }] };
    expect(interpretProbe(flipped).rotation).toBe(180);
  });

  it('tells QuickTime from MP4 by the brand, and WebM from Matroska by the extension (they share demuxers)', () => {
    const mov = { ...MP4_CLIP, format: { ...MP4_CLIP.format, tags: { major_brand: 'qt  ' } } };
    expect(interpretProbe(mov).container).toBe('mov');
    const matroska = { ...MP4_CLIP, format: { format_name: 'matroska,webm', duration: '1.000000' } };
    expect(interpretProbe(matroska, 'webm').container).toBe('webm');
    expect(interpretProbe(matroska, 'mkv').container).toBe('matroska');
  });

  it('gives NTSC rates to three decimals and falls back to r_frame_rate', () => {
    const ntsc = { ...MP4_CLIP, streams: [{ ...MP4_CLIP.streams[0], avg_frame_rate: '30000/1001' }] };
    expect(interpretProbe(ntsc).frameRate).toBe(29.97);
    const unknownAverage = { ...MP4_CLIP, streams: [{ ...MP4_CLIP.streams[0], avg_frame_rate: '0/0', r_frame_rate: '24/1' }] };
    expect(interpretProbe(unknownAverage).frameRate).toBe(24);
  });

  it('takes the stream duration when the container gives none, and a video without audio', () => {
    const noFormatDuration = { format: { format_name: 'matroska,webm' }, streams: [{ ...MP4_CLIP.streams[0], duration: '2.5' }] };
    expect(interpretProbe(noFormatDuration)).toMatchObject({ durationMs: 2500, audioCodec: null });
  });

  it('refuses images, audio with cover art and unknown containers with a readable reason', () => {
    const png = { format: { format_name: 'png_pipe', format_long_name: 'piped png sequence' }, streams: [{ codec_type: 'video', width: 64, height: 64 }] };
    expect(() => interpretProbe(png)).toThrow(new NotAVideoError('The file is not an MP4, MOV, WebM or MKV video (it reads as piped png sequence).'));
    const coverArt = {
      format: { format_name: 'mov,mp4,m4a,3gp,3g2,mj2', duration: '180.0' },
      streams: [
        { codec_type: 'audio', codec_name: 'aac' },
        { codec_type: 'video', codec_name: 'mjpeg', width: 600, height: 600, disposition: { attached_pic: 1 } },
      ],
    };
    expect(() => interpretProbe(coverArt)).toThrow('The file has no video track.');
    const noDuration = { format: { format_name: 'matroska,webm' }, streams: [{ codec_type: 'video', width: 10, height: 10 }] };
    expect(() => interpretProbe(noDuration)).toThrow(/no readable duration/);
    expect(() => interpretProbe(null)).toThrow(/it reads as an unknown format/);
  });
});

describe('isNotMediaMessage', () => {
  it('recognises what ffprobe says about files that are not media, and not network trouble', () => {
    expect(isNotMediaMessage('<input>: Invalid data found when processing input')).toBe(true);
    expect(isNotMediaMessage('[mov,mp4,m4a,3gp,3g2,mj2 @ 0x55] moov atom not found')).toBe(true);
    expect(isNotMediaMessage('<input>: Connection refused')).toBe(false);
    expect(isNotMediaMessage('HTTP error 503 Service Unavailable')).toBe(false);
  });
});

describe('posterTimeMs', () => {
  it('takes a frame a tenth of the way in, at most 10 s', () => {
    expect(posterTimeMs(3000)).toBe(300);
    expect(posterTimeMs(600_000)).toBe(10_000);
  });
});
