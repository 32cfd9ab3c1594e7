import { describe, expect, it } from 'vitest';
import { ApiError } from './api-client';
import { splitApiErrors } from './form-errors';

describe('splitApiErrors', () => {
  const labels = { teeth: 'Teeth', nominal: 'Nominal size', majorDiameter: 'Major diameter' };

  it('puts a validation error under its field, with the field label', () => {
    const error = new ApiError(400, 'teeth must be a whole number', {
      message: ['teeth must be a whole number', 'teeth must not be less than 4'],
      errors: { teeth: 'teeth must be a whole number' },
    });
    expect(splitApiErrors(error, labels)).toEqual({ fields: { teeth: 'Teeth must be a whole number' }, general: [] });
  });

  it('reads the field from a service message that starts with it', () => {
    const error = new ApiError(400, 'x', { message: 'nominal: cannot read "abc" as a length' });
    expect(splitApiErrors(error, labels).fields.nominal).toBe('Nominal size: cannot read "abc" as a length');
  });

  it('keeps a message naming no field of the form for the whole form', () => {
    const error = new ApiError(409, 'x', { message: 'HL-2107 already has a feature named "pilot bore"' });
    expect(splitApiErrors(error, labels)).toEqual({ fields: {}, general: ['HL-2107 already has a feature named "pilot bore"'] });
  });

  it('does not take a longer field name for a shorter one', () => {
    const error = new ApiError(400, 'x', { message: ['majorDiameter must be a number such as 25.4, 0.6690 or 3/8'] });
    expect(splitApiErrors(error, { major: 'Major', ...labels }).fields).toEqual({
      majorDiameter: 'Major diameter must be a number such as 25.4, 0.6690 or 3/8',
    });
  });
});
