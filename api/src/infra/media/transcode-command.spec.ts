import { constantFrameRate, renditionLadder, spriteLayout } from '../../engine/media-renditions';
import { ProgressReader, type TranscodeProgress, transcodeArguments } from './transcode-command';

describe('ProgressReader', () => {
  it('reports each -progress block with the frames of the first output, across split chunks (ffmpeg 5.1 key=value format)', () => {
    const blocks: TranscodeProgress[] = [];
    const reader = new ProgressReader((progress) => blocks.push(progress));
    reader.push('frame=12\nfps=24.0\nstream_0_0_q=28.0\nout_time_us=200000000\nprogr');
    reader.push('ess=continue\nframe=2');
    reader.push('25\nprogress=end\n');
    expect(blocks).toEqual([
      { frames: 12, done: false },
      { frames: 225, done: true },
    ]);
  });
});

describe('transcodeArguments', () => {
  const display = { width: 1920, height: 1080 };
  const base = {
    input: '/tmp/in.mov',
    outputDir: '/tmp/out',
    renditions: renditionLadder(display),
    frameRate: constantFrameRate(29.97),
    durationMs: 9000,
    sprites: spriteLayout(9000, display),
  };

  it('maps every rendition with the source audio and a fixed, aligned GOP', () => {
    const args = transcodeArguments({ ...base, hasAudio: true });
    expect(args.join(' ')).toContain('-var_stream_map v:0,a:0 v:1,a:1 v:2,a:2');
    expect(args.filter((arg) => arg === '0:a:0')).toHaveLength(4); // three renditions and the waveform PCM
    expect(args.slice(args.indexOf('-g'), args.indexOf('-g') + 6)).toEqual(['-g', '60', '-keyint_min', '60', '-sc_threshold', '0']);
    expect(args).toContain('expr:gte(t,n_forced*2)');
    expect(args.join(' ')).toContain('split=4[s0][s1][s2][sp]');
  });

  it('adds a silent stereo track of the source length when there is no audio', () => {
    const args = transcodeArguments({ ...base, hasAudio: false });
    expect(args.join(' ')).toContain('-f lavfi -t 9.000 -i anullsrc=r=48000:cl=stereo');
    expect(args).not.toContain('0:a:0');
    expect(args.filter((arg) => arg === '1:a:0')).toHaveLength(4);
  });
});
