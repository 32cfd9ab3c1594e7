import { BadRequestException } from '@nestjs/common';
import { findControlCharacter, RejectControlCharactersPipe } from './control-characters';

describe('control characters in text (C0 set of ISO/IEC 6429, and DEL)', () => {
  it('names the first string holding NUL, ESC, DEL or another C0 character', () => {
    expect(findControlCharacter({ title: 'Coupler\u0000' })).toBe('title');
    expect(findControlCharacter({ features: [{ name: 'ok' }, { name: 'bore\u001b[31m' }] })).toBe('features[1].name');
    expect(findControlCharacter({ note: 'x\u007f' })).toBe('note');
    expect(findControlCharacter({ note: 'x\u000b' })).toBe('note');
    expect(findControlCharacter({ ['bad\u0001key']: 'fine' })).toBe('bad\u0001key');
  });

  it('lets tab, line feed and carriage return through, and anything that is not text', () => {
    expect(findControlCharacter({ text: 'WEBVTT\r\n\r\n00:01.000 --> 00:02.000\n\tcue', n: 3, ok: true, none: null })).toBeUndefined();
    expect(findControlCharacter({ text: 'µm, ±, —, «», \u0085 and \u2028 are not C0' })).toBeUndefined();
  });

  it('refuses with a 400 naming the field, for bodies and for query parameters by name', () => {
    const pipe = new RejectControlCharactersPipe();
    expect(() => pipe.transform({ title: 'a\u0000b' }, { type: 'body' })).toThrow(BadRequestException);
    try {
      pipe.transform('x\u0000', { type: 'query', data: 'search' });
      throw new Error('not refused');
    } catch (error) {
      expect((error as BadRequestException).getResponse()).toMatchObject({ errors: { search: expect.stringMatching(/search contains a control character/) } });
    }
    const user = { displayName: 'a\u0000' };
    expect(pipe.transform(user, { type: 'custom' })).toBe(user);
  });
});
