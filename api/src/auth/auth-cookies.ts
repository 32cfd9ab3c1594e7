import { Inject, Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { CookieOptions, Request, Response } from 'express';
import type { AppConfig } from '../config/app-config';
import { newSecretToken, sameSecret } from '../common/secret-token';
import { CSRF_COOKIE, CSRF_HEADER, SESSION_COOKIE, SESSION_TTL_MS } from './auth.constants';

/**
 * The two cookies of a browser session: `fw_session` (httpOnly, the session token) and `fw_csrf`
 * (readable by the studio, echoed in `X-CSRF-Token`). Both SameSite=Lax, Secure when the site is https.
 */
@Injectable()
export class AuthCookies {
  private readonly secure: boolean;

  constructor(@Inject(ConfigService) config: ConfigService<AppConfig, true>) {
    this.secure = config.get('appOrigin', { infer: true }).startsWith('https:');
  }

  private base(): CookieOptions {
    return { sameSite: 'lax', secure: this.secure, path: '/' };
  }

  readSessionToken(request: Request): string | undefined {
    const token: unknown = request.cookies?.[SESSION_COOKIE];
    return typeof token === 'string' && token.length >= 20 && token.length <= 128 ? token : undefined;
  }

  setSession(response: Response, token: string): void {
    response.cookie(SESSION_COOKIE, token, { ...this.base(), httpOnly: true, maxAge: SESSION_TTL_MS });
  }

  clearSession(response: Response): void {
    response.clearCookie(SESSION_COOKIE, { ...this.base(), httpOnly: true });
  }

  /**
   * Issues a CSRF token. It is not tied to the session, so it is not rotated on sign-in: a client
   * keeps echoing the same cookie value for as long as the cookie lives.
   */
  private issueCsrf(response: Response): string {
    const token = newSecretToken();
    response.cookie(CSRF_COOKIE, token, { ...this.base(), httpOnly: false, maxAge: SESSION_TTL_MS });
    return token;
  }

  ensureCsrf(request: Request, response: Response): void {
    if (!this.readCsrfCookie(request)) this.issueCsrf(response);
  }

  /** Double-submit check: the header must repeat the cookie exactly. */
  csrfMatches(request: Request): boolean {
    const cookie = this.readCsrfCookie(request);
    const header = request.headers[CSRF_HEADER];
    return cookie !== undefined && typeof header === 'string' && sameSecret(cookie, header);
  }

  private readCsrfCookie(request: Request): string | undefined {
    const token: unknown = request.cookies?.[CSRF_COOKIE];
    return typeof token === 'string' && token.length >= 20 && token.length <= 128 ? token : undefined;
  }
}
