import { describe, expect, it } from 'vitest';
import { addPhotos, formatSize, photoProblem } from './photo-rules';

const file = (name: string, type: string, size = 2048) => ({ name, type, size });

describe('photo rules', () => {
  it('accepts JPEG, PNG and WebP by type, or by name when the browser gives no type', () => {
    expect(photoProblem(file('a.jpg', 'image/jpeg'))).toBeNull();
    expect(photoProblem(file('a.png', 'image/png'))).toBeNull();
    expect(photoProblem(file('a.webp', 'image/webp'))).toBeNull();
    expect(photoProblem(file('a.JPEG', ''))).toBeNull();
    expect(photoProblem(file('a.gif', 'image/gif'))).toBe('"a.gif" is not a photo we accept. Choose JPEG, PNG or WebP images.');
    expect(photoProblem(file('a.heic', ''))).toMatch(/not a photo we accept/);
  });

  it('refuses empty files and files over 15 MB', () => {
    expect(photoProblem(file('a.jpg', 'image/jpeg', 0))).toBe('"a.jpg" is empty.');
    expect(photoProblem(file('a.jpg', 'image/jpeg', 15 * 1024 * 1024))).toBeNull();
    expect(photoProblem(file('a.jpg', 'image/jpeg', 15 * 1024 * 1024 + 1))).toBe('"a.jpg" is 15.0 MB; each photo may be at most 15 MB.');
  });

  it('keeps six at most and names those left out', () => {
    const chosen = Array.from({ length: 8 }, (_, index) => new File(['x'], `p${index}.png`, { type: 'image/png' }));
    const { photos, problems } = addPhotos(chosen.slice(0, 4), chosen.slice(4));
    expect(photos.map((photo) => photo.name)).toEqual(['p0.png', 'p1.png', 'p2.png', 'p3.png', 'p4.png', 'p5.png']);
    expect(problems).toEqual(['A report takes up to 6 photos; "p6.png", "p7.png" were left out.']);
  });

  it('writes sizes as the server states its limit', () => {
    expect(formatSize(850 * 1024)).toBe('850 kB');
    expect(formatSize(2.4 * 1024 * 1024)).toBe('2.4 MB');
    expect(formatSize(15 * 1024 * 1024)).toBe('15 MB');
  });
});
