import { Inject, Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import type { Request, Response } from 'express';
import { LessThan, Not, Repository } from 'typeorm';
import { hashSecretToken, newSecretToken } from '../common/secret-token';
import type { SessionUser } from '../common/types/access-context';
import { User } from '../users/entities/user.entity';
import { toSessionUser } from '../users/users.mapper';
import { AuthCookies } from './auth-cookies';
import { SESSION_MAX_AGE_MS, SESSION_REFRESH_AFTER_MS, SESSION_TTL_MS } from './auth.constants';
import { Session } from './entities/session.entity';

/** Server-side sessions in MariaDB, so any API process can serve any request. */
@Injectable()
export class SessionService {
  constructor(
    @InjectRepository(Session) private readonly sessions: Repository<Session>,
    @InjectRepository(User) private readonly users: Repository<User>,
    @Inject(AuthCookies) private readonly cookies: AuthCookies,
  ) {}

  /** Starts a session and sets its cookie and a new CSRF token signed to it (any earlier token stops working). */
  async start(userId: string, request: Request, response: Response): Promise<void> {
    const token = newSecretToken();
    const now = new Date();
    const session = this.sessions.create({
      userId,
      tokenHash: hashSecretToken(token),
      expiresAt: new Date(now.getTime() + SESSION_TTL_MS),
      lastSeenAt: now,
      userAgent: request.headers['user-agent']?.slice(0, 255) ?? null,
    });
    await this.sessions.insert(session);
    this.cookies.startSession(response, token);
  }

  /**
   * The user behind the request's session cookie, or null when there is none, it expired, or the
   * account is disabled. Slides the expiry forward (at most one write an hour), never past the
   * session's maximum age.
   */
  async resolve(request: Request, response: Response): Promise<SessionUser | null> {
    const token = this.cookies.readSessionToken(request);
    if (!token) return null;
    const session = await this.sessions.findOneBy({ tokenHash: hashSecretToken(token) });
    const now = Date.now();
    if (!session || session.expiresAt.getTime() <= now || session.createdAt.getTime() + SESSION_MAX_AGE_MS <= now) {
      if (session) await this.sessions.delete({ id: session.id });
      this.cookies.clearSession(response);
      return null;
    }
    const user = await this.users.findOneBy({ id: session.userId });
    if (!user || user.disabledAt) {
      await this.sessions.delete({ id: session.id });
      this.cookies.clearSession(response);
      return null;
    }
    if (now - session.lastSeenAt.getTime() > SESSION_REFRESH_AFTER_MS) {
      await this.sessions.update(
        { id: session.id },
        { lastSeenAt: new Date(now), expiresAt: new Date(Math.min(now + SESSION_TTL_MS, session.createdAt.getTime() + SESSION_MAX_AGE_MS)) },
      );
      this.cookies.setSession(response, token);
    }
    return toSessionUser(user);
  }

  /** Ends the request's session (if any) and clears its cookie. */
  async end(request: Request, response: Response): Promise<void> {
    const token = this.cookies.readSessionToken(request);
    if (token) await this.sessions.delete({ tokenHash: hashSecretToken(token) });
    this.cookies.clearSession(response);
  }

  /** Signs a user out everywhere, except (optionally) the session making this request. */
  async endAllFor(userId: string, keep?: Request): Promise<void> {
    const token = keep ? this.cookies.readSessionToken(keep) : undefined;
    if (token) {
      await this.sessions.delete({ userId, tokenHash: Not(hashSecretToken(token)) });
    } else {
      await this.sessions.delete({ userId });
    }
  }

  /** Housekeeping: expired sessions are useless; called on sign-in. */
  async deleteExpired(): Promise<void> {
    await this.sessions.delete({ expiresAt: LessThan(new Date()) });
  }
}
