import { Body, Controller, Get, HttpCode, HttpStatus, Inject, Post, Req, Res, UseGuards } from '@nestjs/common';
import {
  ApiAcceptedResponse,
  ApiNoContentResponse,
  ApiOkResponse,
  ApiTags,
  ApiTooManyRequestsResponse,
  ApiUnauthorizedResponse,
} from '@nestjs/swagger';
import { ThrottlerGuard } from '@nestjs/throttler';
import type { Request, Response } from 'express';
import { Public, SignedIn } from '../common/decorators/access.decorator';
import { RequireCsrf } from '../common/decorators/csrf.decorator';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { SessionUser } from '../common/types/access-context';
import { MeResponseDto } from '../users/dto/session-user.dto';
import { AuthCookies } from './auth-cookies';
import { AuthService } from './auth.service';
import {
  ChangeEmailDto,
  ChangePasswordDto,
  EmailTokenDto,
  ForgotPasswordDto,
  LoginDto,
  MessageDto,
  RegisterDto,
  ResetPasswordDto,
} from './dto/auth.dto';

/** Rate-limited per client address (AUTH_RATE_LIMIT a minute per route); answers 429 "Too many attempts…". */
const RateLimited = () => UseGuards(ThrottlerGuard);

@ApiTags('auth')
@ApiTooManyRequestsResponse({ description: 'Too many attempts from this address; wait a minute' })
@Controller('auth')
export class AuthController {
  constructor(
    @Inject(AuthService) private readonly auth: AuthService,
    @Inject(AuthCookies) private readonly cookies: AuthCookies,
  ) {}

  /** The signed-in user, or `{ user: null }` (never 401). Also hands out the CSRF cookie. */
  @Public()
  @Get('me')
  @ApiOkResponse({ type: MeResponseDto })
  me(
    @CurrentUser({ optional: true }) user: SessionUser | undefined,
    @Req() request: Request,
    @Res({ passthrough: true }) response: Response,
  ): MeResponseDto {
    this.cookies.ensureCsrf(request, response);
    return { user: user ?? null };
  }

  @Public()
  @RequireCsrf()
  @RateLimited()
  @Post('register')
  @HttpCode(HttpStatus.ACCEPTED)
  @ApiAcceptedResponse({ type: MessageDto, description: 'Same answer whether or not the address had an account' })
  async register(@Body() dto: RegisterDto): Promise<MessageDto> {
    await this.auth.register(dto);
    return { message: 'Check your inbox: we sent a link to confirm your e-mail address.' };
  }

  @Public()
  @RequireCsrf()
  @RateLimited()
  @Post('login')
  @HttpCode(HttpStatus.OK)
  @ApiOkResponse({ type: MeResponseDto, description: 'Signed in; the session cookie is set' })
  @ApiUnauthorizedResponse({ description: 'The e-mail address or password is incorrect (one answer for both)' })
  @ApiTooManyRequestsResponse({
    description:
      'Too many attempts from this client address a minute, or (code `sign_in_paused`) too many failed sign-ins for ' +
      'this e-mail address: after five, each failure pauses it twice as long (30 s up to 15 min), known address or not',
    headers: { 'Retry-After': { description: 'Seconds until this address may try again', schema: { type: 'integer' } } },
  })
  async login(
    @Body() dto: LoginDto,
    @Req() request: Request,
    @Res({ passthrough: true }) response: Response,
  ): Promise<MeResponseDto> {
    return { user: await this.auth.login(dto, request, response) };
  }

  @Public()
  @RequireCsrf()
  @Post('logout')
  @HttpCode(HttpStatus.NO_CONTENT)
  @ApiNoContentResponse({ description: 'Signed out (also when there was no session)' })
  async logout(@Req() request: Request, @Res({ passthrough: true }) response: Response): Promise<void> {
    await this.auth.logout(request, response);
  }

  @Public()
  @RequireCsrf()
  @RateLimited()
  @Post('verify-email')
  @HttpCode(HttpStatus.OK)
  @ApiOkResponse({ type: MeResponseDto, description: 'The address is confirmed' })
  async verifyEmail(@Body() dto: EmailTokenDto): Promise<MeResponseDto> {
    return { user: await this.auth.verifyEmail(dto.token) };
  }

  @SignedIn()
  @RateLimited()
  @Post('verify-email/resend')
  @HttpCode(HttpStatus.ACCEPTED)
  @ApiAcceptedResponse({ type: MessageDto })
  async resendVerification(@CurrentUser() user: SessionUser): Promise<MessageDto> {
    await this.auth.resendVerification(user);
    return { message: 'If your address still needs confirming, a new link is on its way.' };
  }

  @Public()
  @RequireCsrf()
  @RateLimited()
  @Post('password/forgot')
  @HttpCode(HttpStatus.ACCEPTED)
  @ApiAcceptedResponse({
    type: MessageDto,
    description: 'Same answer, after the same work, whether or not the address has an account: a job looks it up and mails a link',
  })
  async forgotPassword(@Body() dto: ForgotPasswordDto): Promise<MessageDto> {
    await this.auth.forgotPassword(dto.email);
    return { message: 'If an account uses this address, a link to choose a new password is on its way.' };
  }

  @Public()
  @RequireCsrf()
  @RateLimited()
  @Post('password/reset')
  @HttpCode(HttpStatus.OK)
  @ApiOkResponse({ type: MessageDto })
  async resetPassword(@Body() dto: ResetPasswordDto): Promise<MessageDto> {
    await this.auth.resetPassword(dto);
    return { message: 'Your password was changed. Sign in with the new one.' };
  }

  @SignedIn()
  @RateLimited()
  @Post('password/change')
  @HttpCode(HttpStatus.OK)
  @ApiOkResponse({ type: MessageDto, description: 'Changed; other browsers are signed out' })
  async changePassword(
    @CurrentUser() user: SessionUser,
    @Body() dto: ChangePasswordDto,
    @Req() request: Request,
  ): Promise<MessageDto> {
    await this.auth.changePassword(user, dto, request);
    return { message: 'Your password was changed. Other browsers were signed out.' };
  }

  @SignedIn()
  @RateLimited()
  @Post('email/change')
  @HttpCode(HttpStatus.ACCEPTED)
  @ApiAcceptedResponse({ type: MessageDto, description: 'A link was sent to the new address' })
  async changeEmail(@CurrentUser() user: SessionUser, @Body() dto: ChangeEmailDto): Promise<MessageDto> {
    await this.auth.requestEmailChange(user, dto);
    return { message: 'Check the inbox of the new address: the change happens when you follow the link.' };
  }

  @Public()
  @RequireCsrf()
  @RateLimited()
  @Post('email/confirm')
  @HttpCode(HttpStatus.OK)
  @ApiOkResponse({ type: MeResponseDto })
  async confirmEmail(@Body() dto: EmailTokenDto): Promise<MeResponseDto> {
    return { user: await this.auth.confirmEmailChange(dto.token) };
  }
}
