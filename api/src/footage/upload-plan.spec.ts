import fc from 'fast-check';
import {
  checkFileSize,
  formatBytes,
  MAX_PART_BYTES,
  MAX_PARTS,
  MIN_PART_BYTES,
  partLength,
  planParts,
  resolveFootageType,
  sanitiseFileName,
  titleFromFileName,
} from './upload-plan';

const MiB = 1024 * 1024;

describe('resolveFootageType', () => {
  it('accepts mp4, mov, webm and mkv by extension, whatever their case', () => {
    expect(resolveFootageType('a.MP4', 'video/mp4').contentType).toBe('video/mp4');
    expect(resolveFootageType('a.mov', 'video/quicktime').contentType).toBe('video/quicktime');
    expect(resolveFootageType('a.webm', 'video/webm').contentType).toBe('video/webm');
    expect(resolveFootageType('a.mkv', 'video/x-matroska').contentType).toBe('video/x-matroska');
  });

  it('accepts an unknown browser type (browsers often send none for .mkv) but refuses a contradicting one', () => {
    expect(resolveFootageType('a.mkv', '').extension).toBe('mkv');
    expect(resolveFootageType('a.mp4', 'application/octet-stream').extension).toBe('mp4');
    expect(() => resolveFootageType('a.mp4', 'text/plain')).toThrow('"a.mp4" ends in .mp4 but its type is text/plain; expected video/mp4.');
    expect(() => resolveFootageType('a.mov', 'video/mp4')).toThrow(/expected video\/quicktime/);
  });

  it('refuses other extensions and names the accepted ones', () => {
    expect(() => resolveFootageType('clip.avi', 'video/x-msvideo')).toThrow('"clip.avi" is a .avi file; upload a video file: .mp4, .mov, .webm, .mkv.');
    expect(() => resolveFootageType('README', '')).toThrow('"README" has no extension; upload a video file: .mp4, .mov, .webm, .mkv.');
  });
});

describe('checkFileSize and formatBytes', () => {
  it('refuses empty and oversized files in decimal units, as file managers show them', () => {
    expect(() => checkFileSize(0, 100)).toThrow('The file is empty.');
    expect(() => checkFileSize(25_300_000_000, 20_000_000_000)).toThrow('The file is 25.3 GB; the largest accepted is 20 GB.');
    expect(() => checkFileSize(20_000_000_000, 20_000_000_000)).not.toThrow();
    expect(formatBytes(999)).toBe('999 bytes');
    expect(formatBytes(1_500_000)).toBe('1.5 MB');
    expect(formatBytes(734_003_200)).toBe('734 MB');
  });
});

describe('planParts', () => {
  it('uses 8 MiB parts up to about 8 GB, larger ones after, at most 64 MiB', () => {
    expect(planParts(1)).toEqual({ partSizeBytes: 8 * MiB, partCount: 1 });
    expect(planParts(1_000_000_000)).toEqual({ partSizeBytes: 8 * MiB, partCount: 120 });
    expect(planParts(20_000_000_000)).toEqual({ partSizeBytes: 20 * MiB, partCount: 954 });
    expect(planParts(200_000_000_000).partSizeBytes).toBe(64 * MiB);
  });

  it('refuses a file that would need more than 10,000 parts', () => {
    expect(() => planParts(MAX_PART_BYTES * MAX_PARTS + 1)).toThrow(/10000 parts/);
  });

  it('always covers the file exactly with parts of 8–64 MiB (property)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: MAX_PART_BYTES * MAX_PARTS }), (size) => {
        const plan = planParts(size);
        expect(plan.partSizeBytes).toBeGreaterThanOrEqual(MIN_PART_BYTES);
        expect(plan.partSizeBytes).toBeLessThanOrEqual(MAX_PART_BYTES);
        expect(plan.partSizeBytes % MiB).toBe(0);
        expect(plan.partCount).toBeLessThanOrEqual(MAX_PARTS);
        const last = partLength(plan, size, plan.partCount);
        expect(last).toBeGreaterThan(0);
        expect(last).toBeLessThanOrEqual(plan.partSizeBytes);
        expect(plan.partSizeBytes * (plan.partCount - 1) + last).toBe(size);
      }),
    );
  });
});

describe('sanitiseFileName', () => {
  it('keeps the last path segment and drops control, bidi and reserved characters', () => {
    expect(sanitiseFileName('C:\\Users\\me\\clip.mp4')).toBe('clip.mp4');
    expect(sanitiseFileName('../../etc/passwd.mp4')).toBe('passwd.mp4');
    expect(sanitiseFileName('evil\u202E4pm.exe')).toBe('evil4pm.exe');
    expect(sanitiseFileName('a\u0000b\tc.mkv')).toBe('abc.mkv');
    expect(sanitiseFileName('what? "this" <is>.mov')).toBe('what_ _this_ _is_.mov');
    expect(sanitiseFileName('  ...hidden.webm ')).toBe('hidden.webm');
    expect(sanitiseFileName('.mp4')).toBe('video.mp4');
    expect(sanitiseFileName('Spline cafe\u0301.mp4')).toBe('Spline caf\u00e9.mp4');
  });

  it('shortens long names to 200 characters and keeps the extension', () => {
    const name = sanitiseFileName(`${'ü'.repeat(300)}.mp4`);
    expect([...name]).toHaveLength(200);
    expect(name.endsWith('.mp4')).toBe(true);
  });

  it('never yields path separators or control characters, at most 200 characters, and is idempotent (property)', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'binary', maxLength: 400 }), (raw) => {
        const name = sanitiseFileName(raw);
        // eslint-disable-next-line no-control-regex
        expect(name).not.toMatch(/[\\/\u0000-\u001f\u007f]/u);
        expect([...name].length).toBeLessThanOrEqual(200);
        expect(name.length).toBeGreaterThan(0);
        expect(sanitiseFileName(name)).toBe(name);
      }),
    );
  });
});

describe('titleFromFileName', () => {
  it('drops the extension and reads underscores as spaces', () => {
    expect(titleFromFileName('pilot_bearing_bore.mp4')).toBe('pilot bearing bore');
    expect(titleFromFileName('.mp4')).toBe('Untitled footage');
  });
});
