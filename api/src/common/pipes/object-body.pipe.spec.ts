import { BadRequestException } from '@nestjs/common';
import { ObjectBodyPipe } from './object-body.pipe';

class ExampleDto {
  title!: string;
}

describe('ObjectBodyPipe', () => {
  const pipe = new ObjectBodyPipe();
  const body = { type: 'body' as const, metatype: ExampleDto };

  it('refuses an array, null or a bare value where a DTO object is declared', () => {
    for (const value of [[], [{ title: 'x' }], null, 42, 'text', true]) {
      expect(() => pipe.transform(value, body)).toThrow(BadRequestException);
    }
  });

  it('passes objects, absent bodies, and parameters that are not DTO bodies', () => {
    const object = { title: 'x' };
    expect(pipe.transform(object, body)).toBe(object);
    expect(pipe.transform(undefined, body)).toBeUndefined();
    expect(pipe.transform([1], { type: 'body', metatype: Array })).toEqual([1]);
    expect(pipe.transform('7', { type: 'param', metatype: String, data: 'id' })).toBe('7');
  });
});
