import type { INestApplication } from '@nestjs/common';
import { randomBytes } from 'node:crypto';
import request from 'supertest';
import { tokenFrom, waitForMail } from './mail-inbox';

/**
 * Test helpers for anything behind sign-in. Every agent keeps its cookies, sends the CSRF header the
 * studio would send, and comes from its own client address (X-Forwarded-For; the test profile sets
 * TRUST_PROXY=loopback) so the per-address rate limits of one test never trip another.
 */

export type Agent = ReturnType<typeof request.agent>;

export interface TestAccount {
  id: string;
  email: string;
  password: string;
  displayName: string;
  /** Signed in: carries the session cookie and the CSRF header. */
  agent: Agent;
}

export const TEST_PASSWORD = 'correct horse battery staple';

/** An address nobody else in this run uses (the mail fake keeps old messages between runs). */
export function uniqueEmail(label = 'user'): string {
  return `${label}-${Date.now().toString(36)}-${randomBytes(3).toString('hex')}@fitwright.test`;
}

/** A workshop web address nobody else in this run uses. */
export function uniqueSlug(label: string): string {
  return `${label}-${Date.now().toString(36)}-${Math.floor(Math.random() * 1e6)}`;
}

/** A random address in 10.0.0.0/8, as seen by the rate limiter. */
export function uniqueClientIp(): string {
  const bytes = randomBytes(3);
  return `10.${bytes[0]}.${bytes[1]}.${bytes[2]}`;
}

function cookieValue(setCookie: string[] | string | undefined, name: string): string | undefined {
  const list = Array.isArray(setCookie) ? setCookie : setCookie ? [setCookie] : [];
  for (const cookie of list) {
    const [pair] = cookie.split(';');
    const [key, ...rest] = pair.split('=');
    if (key.trim() === name) return decodeURIComponent(rest.join('='));
  }
  return undefined;
}

/**
 * Makes `agent` act as the studio does: it fetches `GET /api/auth/me` once (getting the `fw_csrf`
 * cookie) and echoes the cookie's current value in `X-CSRF-Token` on every request (the token changes
 * at sign-in and sign-out). A test may still `.set()` its own header on one request.
 */
export async function echoingCsrf(agent: Agent): Promise<Agent> {
  let csrf: string | undefined;
  agent.on('response', (response: request.Response) => {
    csrf = cookieValue(response.headers['set-cookie'], 'fw_csrf') || csrf;
  });
  agent.use((outgoing: request.Test) => {
    if (csrf) outgoing.set('X-CSRF-Token', csrf);
  });
  await agent.get('/api/auth/me').expect(200);
  if (!csrf) throw new Error('GET /api/auth/me did not set the fw_csrf cookie');
  return agent;
}

/** A browser-like agent with no session yet, from its own client address, echoing the CSRF cookie. */
export async function browserAgent(app: INestApplication, clientIp = uniqueClientIp()): Promise<Agent> {
  return echoingCsrf(request.agent(app.getHttpServer()).set('X-Forwarded-For', clientIp));
}

/** Signs in on a fresh browser agent (or the one given) and returns it. */
export async function signIn(app: INestApplication, email: string, password = TEST_PASSWORD, agent?: Agent): Promise<Agent> {
  const browser = agent ?? (await browserAgent(app));
  await browser.post('/api/auth/login').send({ email, password }).expect(200);
  return browser;
}

export interface SignUpOptions {
  email?: string;
  password?: string;
  displayName?: string;
  /** Follow the e-mailed link (default true). */
  verify?: boolean;
}

/** Registers through the API, confirms the address from the real verification mail, signs in. */
export async function signUpAndSignIn(app: INestApplication, options: SignUpOptions = {}): Promise<TestAccount> {
  const email = options.email ?? uniqueEmail();
  const password = options.password ?? TEST_PASSWORD;
  const displayName = options.displayName ?? `Tester ${email.split('@')[0].slice(-6)}`;
  const agent = await browserAgent(app);
  await agent.post('/api/auth/register').send({ email, password, displayName }).expect(202);
  if (options.verify ?? true) {
    const mail = await waitForMail(email, { subject: /Confirm your e-mail/ });
    await agent.post('/api/auth/verify-email').send({ token: tokenFrom(mail, '/verify-email') }).expect(200);
  }
  await signIn(app, email, password, agent);
  const me = await agent.get('/api/auth/me').expect(200);
  return { id: me.body.user.id, email, password, displayName, agent };
}
