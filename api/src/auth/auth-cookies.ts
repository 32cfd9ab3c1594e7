import { Inject, Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { CookieOptions, Request, Response } from 'express';
import type { AppConfig } from '../config/app-config';
import { sameSecret } from '../common/secret-token';
import { CSRF_COOKIE, CSRF_HEADER, SESSION_COOKIE, SESSION_TTL_MS } from './auth.constants';
import { csrfTokenFits, makeCsrfToken } from './csrf-token';

/**
 * The two cookies of a browser session: `fw_session` (httpOnly, the session token) and `fw_csrf`
 * (readable by the studio, echoed in `X-CSRF-Token`). Both SameSite=Lax, Secure when the site is https.
 * The CSRF token is signed to the session it belongs to (see csrf-token.ts), so it is replaced whenever
 * the session changes: at sign-in, at sign-out and when a session is found to be over.
 */
@Injectable()
export class AuthCookies {
  private readonly secure: boolean;
  private readonly csrfKey: string;

  constructor(@Inject(ConfigService) config: ConfigService<AppConfig, true>) {
    this.secure = config.get('appOrigin', { infer: true }).startsWith('https:');
    this.csrfKey = config.get('auth', { infer: true }).csrfSecret;
  }

  private base(): CookieOptions {
    return { sameSite: 'lax', secure: this.secure, path: '/' };
  }

  readSessionToken(request: Request): string | undefined {
    return boundedToken(request.cookies?.[SESSION_COOKIE]);
  }

  /** Sets the session cookie and a CSRF token signed to that session (rotation at sign-in). */
  startSession(response: Response, token: string): void {
    this.setSession(response, token);
    this.issueCsrf(response, token);
  }

  /** Pushes the session cookie's expiry forward; the CSRF token stays. */
  setSession(response: Response, token: string): void {
    response.cookie(SESSION_COOKIE, token, { ...this.base(), httpOnly: true, maxAge: SESSION_TTL_MS });
  }

  /** Clears the session cookie and hands out a fresh signed-out CSRF token (rotation at sign-out). */
  clearSession(response: Response): void {
    response.clearCookie(SESSION_COOKIE, { ...this.base(), httpOnly: true });
    this.issueCsrf(response, undefined);
  }

  /** A CSRF token for the given session token (or for a signed-out browser); tests use it to act as a browser would. */
  csrfTokenFor(sessionToken: string | undefined): string {
    return makeCsrfToken(this.csrfKey, sessionToken);
  }

  private issueCsrf(response: Response, sessionToken: string | undefined): void {
    response.cookie(CSRF_COOKIE, this.csrfTokenFor(sessionToken), { ...this.base(), httpOnly: false, maxAge: SESSION_TTL_MS });
  }

  /** Hands out a CSRF token unless the browser already holds one that fits its current session cookie. */
  ensureCsrf(request: Request, response: Response): void {
    if (csrfCookieSetOn(response)) return; // this answer already changes the session (and its token)
    const cookie = this.readCsrfCookie(request);
    const sessionToken = this.readSessionToken(request);
    if (cookie === undefined || !csrfTokenFits(this.csrfKey, sessionToken, cookie)) this.issueCsrf(response, sessionToken);
  }

  /** Signed double-submit check: the header repeats the cookie, and the token was made for this request's session. */
  csrfMatches(request: Request): boolean {
    const cookie = this.readCsrfCookie(request);
    const header = request.headers[CSRF_HEADER];
    return (
      cookie !== undefined &&
      typeof header === 'string' &&
      sameSecret(cookie, header) &&
      csrfTokenFits(this.csrfKey, this.readSessionToken(request), cookie)
    );
  }

  private readCsrfCookie(request: Request): string | undefined {
    return boundedToken(request.cookies?.[CSRF_COOKIE]);
  }
}

function csrfCookieSetOn(response: Response): boolean {
  const header = response.getHeader('Set-Cookie');
  const lines = Array.isArray(header) ? header : typeof header === 'string' ? [header] : [];
  return lines.some((line) => line.startsWith(`${CSRF_COOKIE}=`));
}

function boundedToken(token: unknown): string | undefined {
  return typeof token === 'string' && token.length >= 20 && token.length <= 128 ? token : undefined;
}
