import { detectImage } from './image-file';

// Signatures from the format specifications: PNG (RFC 2083 §3.1), JPEG/JFIF (SOI marker FF D8 then a marker FF xx),
// WebP (RIFF container: "RIFF", 4-byte size, "WEBP").
describe('detectImage', () => {
  it('recognises PNG, JPEG and WebP by their first bytes', () => {
    expect(detectImage(Uint8Array.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0]))?.extension).toBe('png');
    expect(detectImage(Uint8Array.from([0xff, 0xd8, 0xff, 0xe0, 0, 0x10]))?.contentType).toBe('image/jpeg');
    const webp = Buffer.concat([Buffer.from('RIFF'), Buffer.from([0x24, 0, 0, 0]), Buffer.from('WEBPVP8 ')]);
    expect(detectImage(webp)?.contentType).toBe('image/webp');
  });

  it('refuses other files, even when named like an image', () => {
    expect(detectImage(Buffer.from('<svg xmlns="http://www.w3.org/2000/svg"></svg>'))).toBeNull();
    expect(detectImage(Buffer.from('GIF89a'))).toBeNull();
    expect(detectImage(Buffer.from('RIFF\x24\x00\x00\x00WAVEfmt '))).toBeNull();
    expect(detectImage(new Uint8Array())).toBeNull();
  });
});
