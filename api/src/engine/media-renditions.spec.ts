import {
  constantFrameRate,
  displaySize,
  framesPerKeyframe,
  MAX_PEAKS,
  MAX_THUMBNAILS,
  PeakAccumulator,
  progressEstimate,
  renditionJobFraction,
  renditionLadder,
  samplesPerPeak,
  spriteLayout,
  thumbnailsTrack,
  vttTimestamp,
} from './media-renditions';

describe('displaySize', () => {
  it('swaps width and height for a quarter turn either way (ISO/IEC 14496-12 display matrix, as ffprobe reports rotation)', () => {
    expect(displaySize(1920, 1080, 90)).toEqual({ width: 1080, height: 1920 });
    expect(displaySize(1920, 1080, -90)).toEqual({ width: 1080, height: 1920 });
    expect(displaySize(1920, 1080, 270)).toEqual({ width: 1080, height: 1920 });
    expect(displaySize(1920, 1080, 180)).toEqual({ width: 1920, height: 1080 });
    expect(displaySize(1920, 1080, 0)).toEqual({ width: 1920, height: 1080 });
  });
});

describe('renditionLadder', () => {
  it('caps a 4K source at 1080p and adds 720p and 360p (16:9 sizes, common practice)', () => {
    expect(renditionLadder({ width: 3840, height: 2160 }).map(({ width, height }) => `${width}x${height}`)).toEqual([
      '1920x1080',
      '1280x720',
      '640x360',
    ]);
  });

  it('keeps portrait as portrait, sizing by the short side', () => {
    expect(renditionLadder({ width: 1080, height: 1920 }).map(({ width, height }) => `${width}x${height}`)).toEqual([
      '1080x1920',
      '720x1280',
      '360x640',
    ]);
  });

  it('never upscales: a 720p source gets 720p and 360p; a 240-line source one 240-line rendition', () => {
    expect(renditionLadder({ width: 1280, height: 720 }).map(({ height }) => height)).toEqual([720, 360]);
    expect(renditionLadder({ width: 320, height: 240 }).map(({ width, height }) => `${width}x${height}`)).toEqual(['320x240']);
  });

  it('keeps an odd source height as the top rendition and rounds every size to even numbers (4:2:0 chroma needs even sizes)', () => {
    const ladder = renditionLadder({ width: 1000, height: 562 });
    expect(ladder.map(({ width, height }) => `${width}x${height}`)).toEqual(['1000x562', '640x360']);
    for (const size of renditionLadder({ width: 853, height: 481 })) {
      expect(size.width % 2).toBe(0);
      expect(size.height % 2).toBe(0);
    }
  });

  it('gives each rung a lower bit-rate cap than the one above', () => {
    const caps = renditionLadder({ width: 1920, height: 1080 }).map(({ maxKbits }) => maxKbits);
    expect(caps).toEqual([5000, 2800, 800]);
    expect(renditionLadder({ width: 320, height: 240 })[0].maxKbits).toBeLessThan(800);
  });
});

describe('constantFrameRate', () => {
  it('snaps a variable phone rate to the nearest standard rate (NTSC 30000/1001 per SMPTE ST 12-1)', () => {
    expect(constantFrameRate(29.87).ffmpeg).toBe('30000/1001');
    expect(constantFrameRate(25.02).ffmpeg).toBe('25');
    expect(constantFrameRate(23.9).ffmpeg).toBe('24000/1001');
  });

  it('caps slow-motion rates at 60 and treats unknown rates as 30', () => {
    expect(constantFrameRate(240).ffmpeg).toBe('60');
    expect(constantFrameRate(null)).toEqual({ value: 30, ffmpeg: '30' });
    expect(constantFrameRate(0).ffmpeg).toBe('30');
  });

  it('gives a two-second GOP in frames', () => {
    expect(framesPerKeyframe(constantFrameRate(25))).toBe(50);
    expect(framesPerKeyframe(constantFrameRate(29.97))).toBe(60);
  });
});

describe('spriteLayout and thumbnailsTrack', () => {
  it('takes a thumbnail every 2 s for short footage', () => {
    const layout = spriteLayout(9_000, { width: 1280, height: 720 });
    expect(layout).toMatchObject({ intervalSeconds: 2, tileWidth: 160, tileHeight: 90, count: 5, sheets: 1 });
  });

  it('bounds a 3-hour footage to at most MAX_THUMBNAILS tiles', () => {
    const layout = spriteLayout(3 * 3600 * 1000, { width: 1920, height: 1080 });
    expect(layout.count).toBeLessThanOrEqual(MAX_THUMBNAILS);
    expect(layout.intervalSeconds).toBe(27);
    expect(layout.sheets).toBe(4);
  });

  it('sizes portrait tiles taller than wide', () => {
    expect(spriteLayout(10_000, { width: 1080, height: 1920 })).toMatchObject({ tileWidth: 160, tileHeight: 284 });
  });

  it('writes one cue per tile with a #xywh fragment (W3C Media Fragments URI 1.0, section 4.2.2), the last cue ending at the duration', () => {
    const layout = spriteLayout(250_000, { width: 1280, height: 720 });
    const track = thumbnailsTrack(layout, 250_000, (sheet) => `https://s3.example/sprite-${sheet}.jpg?sig=1`);
    const lines = track.split('\n');
    expect(lines[0]).toBe('WEBVTT');
    expect(lines.slice(2, 4)).toEqual(['00:00:00.000 --> 00:00:02.000', 'https://s3.example/sprite-0.jpg?sig=1#xywh=0,0,160,90']);
    // Tile 11 (index 11): second row, second column of the first sheet.
    expect(track).toContain('00:00:22.000 --> 00:00:24.000\nhttps://s3.example/sprite-0.jpg?sig=1#xywh=160,90,160,90');
    // Tile 100 starts the second sheet at its top left.
    expect(track).toContain('00:03:20.000 --> 00:03:22.000\nhttps://s3.example/sprite-1.jpg?sig=1#xywh=0,0,160,90');
    expect(track.trimEnd().split('\n').slice(-2)[0]).toBe('00:04:08.000 --> 00:04:10.000');
  });

  it('formats WebVTT time stamps as hh:mm:ss.ttt (W3C WebVTT, section 4.1)', () => {
    expect(vttTimestamp(3_723_004)).toBe('01:02:03.004');
  });
});

describe('waveform peaks', () => {
  it('gives 20 peaks a second for short footage and at most MAX_PEAKS for three hours', () => {
    expect(samplesPerPeak(60_000)).toBe(400);
    const perPeak = samplesPerPeak(3 * 3600 * 1000);
    expect((3 * 3600 * 8000) / perPeak).toBeLessThanOrEqual(MAX_PEAKS);
  });

  function pcm(samples: number[]): Buffer {
    const buffer = Buffer.alloc(samples.length * 2);
    samples.forEach((sample, index) => buffer.writeInt16LE(sample, index * 2));
    return buffer;
  }

  it('takes the largest absolute sample of each bucket, as a fraction of full scale (16-bit signed PCM)', () => {
    const accumulator = new PeakAccumulator(4);
    accumulator.push(pcm([0, 16384, -100, 5, -32768, 0, 0, 0, 3277]));
    expect(accumulator.finish()).toEqual([0.5, 1, 0.1]);
  });

  it('reads samples split across chunks', () => {
    const bytes = pcm([1000, -16384, 8192, 0]);
    const whole = new PeakAccumulator(2);
    whole.push(bytes);
    const split = new PeakAccumulator(2);
    split.push(bytes.subarray(0, 3));
    split.push(bytes.subarray(3, 5));
    split.push(bytes.subarray(5));
    expect(split.finish()).toEqual(whole.finish());
    expect(whole.finish()).toEqual([0.5, 0.25]);
  });

  it('gives zeros for silence', () => {
    const accumulator = new PeakAccumulator(10);
    accumulator.push(Buffer.alloc(200));
    expect(accumulator.finish()).toEqual(Array.from({ length: 10 }, () => 0));
  });
});

describe('renditionJobFraction and progressEstimate', () => {
  it('gives percent and a straight-line estimate of the time left', () => {
    expect(progressEstimate(0.25, 10_000)).toEqual({ percent: 25, secondsLeft: 30 });
    expect(progressEstimate(0, 500)).toEqual({ percent: 0, secondsLeft: null });
    expect(progressEstimate(1.5, 9000)).toEqual({ percent: 100, secondsLeft: 0 });
  });

  it('keeps moving through packing and storing, and reaches 100 % only when storing ends', () => {
    expect(renditionJobFraction('starting', 0)).toBe(0);
    expect(renditionJobFraction('starting', 1)).toBeCloseTo(renditionJobFraction('converting', 0), 10);
    expect(renditionJobFraction('converting', 1)).toBeCloseTo(renditionJobFraction('packing', 0), 10);
    expect(renditionJobFraction('packing', 1)).toBeCloseTo(renditionJobFraction('storing', 0), 10);
    expect(renditionJobFraction('storing', 1)).toBeCloseTo(1, 10);
    expect(renditionJobFraction('storing', 0.5)).toBeGreaterThan(renditionJobFraction('storing', 0.25));
    // Out-of-range inputs (a frame count past the probe's estimate) stay inside their phase.
    expect(renditionJobFraction('converting', 1.2)).toBeCloseTo(renditionJobFraction('converting', 1), 10);
  });
});
