import {
  BadRequestException,
  ConflictException,
  ForbiddenException,
  HttpException,
  HttpStatus,
  Inject,
  Injectable,
  Logger,
  UnauthorizedException,
} from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { Request, Response } from 'express';
import type { AppConfig } from '../config/app-config';
import type { SessionUser } from '../common/types/access-context';
import { InjectJobQueue, type JobQueue } from '../infra/jobs/job-queue';
import { QUEUES } from '../infra/jobs/queues';
import { MailOutbox } from '../outbox/mail-outbox.service';
import { normalizeEmail } from '../users/email-address';
import { User } from '../users/entities/user.entity';
import { toSessionUser } from '../users/users.mapper';
import { UsersService } from '../users/users.service';
import {
  accountExistsMail,
  changeEmailMail,
  emailChangedMail,
  emailTakenMail,
  passwordChangedMail,
  resetPasswordMail,
  verifyEmailMail,
} from './auth-mails';
import { ACCOUNTS_JOBS, type PasswordResetRequestedJob } from './accounts-jobs';
import { EmailTokenService } from './email-token.service';
import type {
  ChangeEmailDto,
  ChangePasswordDto,
  LoginDto,
  RegisterDto,
  ResetPasswordDto,
} from './dto/auth.dto';
import { hashPassword, spendPasswordCheck, verifyPassword } from './password-hasher';
import { SessionService } from './session.service';
import { SignInAttemptsStore } from './sign-in-attempts.store';
import { isDuplicateKey } from '../common/database/errors';

/** One sentence for every failed sign-in, so the answer never tells whether an account exists. */
export const LOGIN_FAILED = 'The e-mail address or password is incorrect.';
const LINK_INVALID = 'This link is invalid, already used or expired. Ask for a new one.';

@Injectable()
export class AuthService {
  private readonly logger = new Logger(AuthService.name);
  private readonly appOrigin: string;
  private readonly adminEmails: ReadonlySet<string>;

  constructor(
    @Inject(UsersService) private readonly users: UsersService,
    @Inject(SessionService) private readonly sessions: SessionService,
    @Inject(EmailTokenService) private readonly tokens: EmailTokenService,
    @Inject(MailOutbox) private readonly mail: MailOutbox,
    @Inject(SignInAttemptsStore) private readonly signInAttempts: SignInAttemptsStore,
    @InjectJobQueue(QUEUES.accounts) private readonly accountsQueue: JobQueue<PasswordResetRequestedJob>,
    @Inject(ConfigService) config: ConfigService<AppConfig, true>,
  ) {
    this.appOrigin = config.get('appOrigin', { infer: true });
    this.adminEmails = new Set(config.get('auth', { infer: true }).adminEmails);
  }

  private link(path: string, token?: string): string {
    return token ? `${this.appOrigin}${path}?token=${encodeURIComponent(token)}` : `${this.appOrigin}${path}`;
  }

  /**
   * Creates an account and e-mails a verification link. For an address that already has an account
   * the answer is the same and the owner is told by e-mail instead (no account enumeration).
   */
  async register(dto: RegisterDto): Promise<void> {
    const email = normalizeEmail(dto.email);
    const passwordHash = await hashPassword(dto.password);
    const existing = await this.users.findByEmail(email);
    if (existing) {
      await this.mail.send({ kind: 'account', mail: accountExistsMail(email, this.link('/sign-in'), this.link('/forgot-password'), this.link('/account')) });
      return;
    }
    let user: User;
    try {
      user = await this.users.create({ email, passwordHash, displayName: dto.displayName });
    } catch (error) {
      if (!isDuplicateKey(error)) throw error;
      await this.mail.send({ kind: 'account', mail: accountExistsMail(email, this.link('/sign-in'), this.link('/forgot-password'), this.link('/account')) });
      return;
    }
    await this.sendVerification(user);
  }

  /**
   * Signs in. Every attempt counts against the address first (known or not, so a pause reveals nothing);
   * after a few failures the address pauses with 429 and Retry-After, and the right password clears the count.
   */
  async login(dto: LoginDto, request: Request, response: Response): Promise<SessionUser> {
    const email = normalizeEmail(dto.email);
    const pausedMs = await this.signInAttempts.take(email);
    if (pausedMs > 0) {
      const seconds = Math.ceil(pausedMs / 1000);
      response.setHeader('Retry-After', String(seconds));
      throw new HttpException(
        {
          message: `Too many failed sign-ins for this address. Try again in ${waitInWords(seconds)}, or reset the password.`,
          code: 'sign_in_paused',
          retryAfterSeconds: seconds,
        },
        HttpStatus.TOO_MANY_REQUESTS,
      );
    }
    const user = await this.users.findByEmail(email);
    if (!user) {
      await spendPasswordCheck(dto.password);
      throw new UnauthorizedException({ message: LOGIN_FAILED, code: 'login_failed' });
    }
    if (!(await verifyPassword(user.passwordHash, dto.password))) {
      throw new UnauthorizedException({ message: LOGIN_FAILED, code: 'login_failed' });
    }
    await this.signInAttempts.clear(email);
    // Only now, with the right password, may the answer differ.
    if (user.disabledAt) {
      throw new ForbiddenException({
        message: 'This account has been disabled. Contact the site administrators.',
        code: 'account_disabled',
      });
    }
    await this.promoteConfiguredAdmin(user);
    await this.sessions.deleteExpired();
    await this.sessions.start(user.id, request, response);
    return toSessionUser(user);
  }

  async logout(request: Request, response: Response): Promise<void> {
    await this.sessions.end(request, response);
  }

  async verifyEmail(token: string): Promise<SessionUser> {
    const used = await this.tokens.consume(token, 'verify-email');
    if (!used) throw new BadRequestException({ message: LINK_INVALID, code: 'link_invalid' });
    const user = await this.users.getById(used.userId);
    if (!user.emailVerifiedAt) {
      user.emailVerifiedAt = new Date();
      await this.users.save(user);
    }
    await this.promoteConfiguredAdmin(user);
    return toSessionUser(user);
  }

  async resendVerification(sessionUser: SessionUser): Promise<void> {
    const user = await this.users.getById(sessionUser.id);
    if (user.emailVerifiedAt) return;
    await this.sendVerification(user);
  }

  /**
   * Queues the request and returns: the request path does the same work for every address, so neither
   * the answer nor its timing tells whether an account exists. The job does the lookup.
   */
  async forgotPassword(email: string): Promise<void> {
    await this.accountsQueue.enqueue(ACCOUNTS_JOBS.passwordResetRequested, { email: normalizeEmail(email) });
  }

  /** The job's half of a reset request: only an existing, enabled account gets a link. Returns whether one was sent. */
  async sendPasswordResetLink(email: string): Promise<boolean> {
    const user = await this.users.findByEmail(email);
    if (!user || user.disabledAt) return false;
    const token = await this.tokens.issue(user.id, 'reset-password');
    await this.mail.send({ kind: 'account', mail: resetPasswordMail(user.email, this.link('/reset-password', token), this.link('/account')) });
    return true;
  }

  /** Sets the new password, confirms the address (the link proved it) and signs out every browser. */
  async resetPassword(dto: ResetPasswordDto): Promise<void> {
    const used = await this.tokens.consume(dto.token, 'reset-password');
    if (!used) throw new BadRequestException({ message: LINK_INVALID, code: 'link_invalid' });
    const user = await this.users.getById(used.userId);
    user.passwordHash = await hashPassword(dto.password);
    user.emailVerifiedAt ??= new Date();
    await this.users.save(user);
    await this.sessions.endAllFor(user.id);
    await this.mail.send({ kind: 'account', mail: passwordChangedMail(user.email, this.link('/account')) });
  }

  async changePassword(sessionUser: SessionUser, dto: ChangePasswordDto, request: Request): Promise<void> {
    const user = await this.users.getById(sessionUser.id);
    if (!(await verifyPassword(user.passwordHash, dto.currentPassword))) {
      throw new BadRequestException({
        message: 'Current password is incorrect',
        errors: { currentPassword: 'Current password is incorrect' },
      });
    }
    user.passwordHash = await hashPassword(dto.newPassword);
    await this.users.save(user);
    await this.sessions.endAllFor(user.id, request);
    await this.mail.send({ kind: 'account', mail: passwordChangedMail(user.email, this.link('/account')) });
  }

  /** E-mails a confirmation link to the new address; the address changes only when it is followed. */
  async requestEmailChange(sessionUser: SessionUser, dto: ChangeEmailDto): Promise<void> {
    const user = await this.users.getById(sessionUser.id);
    if (!(await verifyPassword(user.passwordHash, dto.password))) {
      throw new BadRequestException({ message: 'Password is incorrect', errors: { password: 'Password is incorrect' } });
    }
    const newEmail = normalizeEmail(dto.newEmail);
    if (newEmail === user.email) {
      throw new BadRequestException({
        message: 'That is already your e-mail address',
        errors: { newEmail: 'That is already your e-mail address' },
      });
    }
    if (await this.users.findByEmail(newEmail)) {
      await this.mail.send({ kind: 'account', mail: emailTakenMail(newEmail, this.link('/account')) });
      return;
    }
    const token = await this.tokens.issue(user.id, 'change-email', newEmail);
    await this.mail.send({ kind: 'account', mail: changeEmailMail(newEmail, this.link('/confirm-email', token), this.link('/account')) });
  }

  async confirmEmailChange(token: string): Promise<SessionUser> {
    const used = await this.tokens.consume(token, 'change-email');
    if (!used?.newEmail) throw new BadRequestException({ message: LINK_INVALID, code: 'link_invalid' });
    const user = await this.users.getById(used.userId);
    const oldEmail = user.email;
    user.email = used.newEmail;
    user.emailVerifiedAt = new Date();
    try {
      await this.users.save(user);
    } catch (error) {
      if (!isDuplicateKey(error)) throw error;
      throw new ConflictException('Another account took this address in the meantime; nothing was changed.');
    }
    await this.mail.send({ kind: 'account', mail: emailChangedMail(oldEmail, user.email, this.link('/account')) });
    this.logger.log(`user ${user.id} changed e-mail address`);
    return toSessionUser(user);
  }

  private async sendVerification(user: User): Promise<void> {
    const token = await this.tokens.issue(user.id, 'verify-email');
    await this.mail.send({ kind: 'account', mail: verifyEmailMail(user.email, user.displayName, this.link('/verify-email', token), this.link('/account')) });
  }

  /** ADMIN_EMAILS names the first admins; an address counts only once its owner has verified it. */
  private async promoteConfiguredAdmin(user: User): Promise<void> {
    if (user.isAdmin || !user.emailVerifiedAt || !this.adminEmails.has(user.email)) return;
    user.isAdmin = true;
    await this.users.save(user);
    this.logger.log(`user ${user.id} is a site admin (ADMIN_EMAILS)`);
  }
}

function waitInWords(seconds: number): string {
  if (seconds < 90) return `${seconds} seconds`;
  return `${Math.ceil(seconds / 60)} minutes`;
}
