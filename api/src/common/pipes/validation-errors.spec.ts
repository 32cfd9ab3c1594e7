import { IsEmail, IsString, MinLength, validateSync } from 'class-validator';
import { validationException } from './validation-errors';

class Form {
  @IsEmail({}, { message: 'Enter a valid e-mail address' })
  email = 'not an address';

  @IsString()
  @MinLength(10, { message: 'Password must be at least 10 characters' })
  password = 'short';
}

describe('validationException', () => {
  it('keeps every sentence in message and puts the first per field under errors', () => {
    const exception = validationException(validateSync(new Form()));
    expect(exception.getStatus()).toBe(400);
    expect(exception.getResponse()).toEqual({
      message: ['Enter a valid e-mail address', 'Password must be at least 10 characters'],
      errors: { email: 'Enter a valid e-mail address', password: 'Password must be at least 10 characters' },
      error: 'Bad Request',
    });
  });
});
