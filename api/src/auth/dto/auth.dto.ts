import { applyDecorators } from '@nestjs/common';
import { ApiProperty } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsEmail, IsString, Length, MaxLength, MinLength } from 'class-validator';
import { PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH } from '../auth.constants';

const trim = ({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value);

const NewPassword = (label = 'Password') =>
  applyDecorators(
    IsString({ message: `${label} is required` }),
    MinLength(PASSWORD_MIN_LENGTH, { message: `${label} must be at least ${PASSWORD_MIN_LENGTH} characters` }),
    MaxLength(PASSWORD_MAX_LENGTH, { message: `${label} must be at most ${PASSWORD_MAX_LENGTH} characters` }),
  );

/** Trimmed here; lower-cased by the service (normalizeEmail) so sign-up and sign-in agree. */
export const EmailAddress = () =>
  applyDecorators(
    Transform(trim),
    IsEmail({}, { message: 'Enter a valid e-mail address' }),
    MaxLength(254, { message: 'E-mail address is too long' }),
  );

const EmailedToken = () =>
  applyDecorators(
    IsString({ message: 'The link is incomplete' }),
    Length(20, 128, { message: 'The link is incomplete' }),
  );

export class RegisterDto {
  @ApiProperty({ example: 'rowan@harrow-lane.example' })
  @EmailAddress()
  email!: string;

  @ApiProperty({ minLength: PASSWORD_MIN_LENGTH, maxLength: PASSWORD_MAX_LENGTH })
  @NewPassword()
  password!: string;

  @ApiProperty({ example: 'Rowan Avery', maxLength: 80 })
  @Transform(trim)
  @IsString({ message: 'Display name is required' })
  @Length(1, 80, { message: 'Display name must be 1 to 80 characters' })
  displayName!: string;
}

export class LoginDto {
  @ApiProperty({ example: 'rowan@harrow-lane.example' })
  @EmailAddress()
  email!: string;

  @ApiProperty()
  @IsString({ message: 'Password is required' })
  @Length(1, PASSWORD_MAX_LENGTH, { message: 'Password is required' })
  password!: string;
}

export class EmailTokenDto {
  @ApiProperty({ description: 'The token from the e-mailed link' })
  @EmailedToken()
  token!: string;
}

export class ForgotPasswordDto {
  @ApiProperty({ example: 'rowan@harrow-lane.example' })
  @EmailAddress()
  email!: string;
}

export class ResetPasswordDto {
  @ApiProperty({ description: 'The token from the e-mailed link' })
  @EmailedToken()
  token!: string;

  @ApiProperty({ minLength: PASSWORD_MIN_LENGTH })
  @NewPassword()
  password!: string;
}

export class ChangePasswordDto {
  @ApiProperty()
  @IsString({ message: 'Current password is required' })
  @Length(1, PASSWORD_MAX_LENGTH, { message: 'Current password is required' })
  currentPassword!: string;

  @ApiProperty({ minLength: PASSWORD_MIN_LENGTH })
  @NewPassword('New password')
  newPassword!: string;
}

export class ChangeEmailDto {
  @ApiProperty({ example: 'rowan.avery@harrow-lane.example' })
  @EmailAddress()
  newEmail!: string;

  @ApiProperty({ description: 'The current password, to confirm it is you' })
  @IsString({ message: 'Password is required' })
  @Length(1, PASSWORD_MAX_LENGTH, { message: 'Password is required' })
  password!: string;
}

export class MessageDto {
  @ApiProperty({ example: 'Check your inbox for a link to confirm your e-mail address.' })
  message!: string;
}
