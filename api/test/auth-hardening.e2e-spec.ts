import { getQueueToken } from '@nestjs/bull';
import { NestExpressApplication } from '@nestjs/platform-express';
import type { Job, Queue } from 'bull';
import Redis from 'ioredis';
import { randomBytes } from 'node:crypto';
import request from 'supertest';
import { ACCOUNTS_JOBS } from '../src/auth/accounts-jobs';
import { SignInAttemptsStore } from '../src/auth/sign-in-attempts.store';
import { QUEUES } from '../src/infra/jobs/queues';
import { UsersService } from '../src/users/users.service';
import { createTestApp } from './create-test-app';
import { browserAgent, signUpAndSignIn, TEST_PASSWORD, uniqueClientIp, uniqueEmail } from './support/accounts';
import { inboxSnapshot, tokenFrom, waitForMail } from './support/mail-inbox';

jest.setTimeout(60_000);

type SetCookie = string[] | string | undefined;

function cookieValue(setCookie: SetCookie, name: string): string | undefined {
  const list = Array.isArray(setCookie) ? setCookie : setCookie ? [setCookie] : [];
  for (const cookie of list) {
    const [pair] = cookie.split(';');
    const [key, ...rest] = pair.split('=');
    if (key.trim() === name) return decodeURIComponent(rest.join('='));
  }
  return undefined;
}

const setCookies = (response: request.Response): SetCookie => response.headers['set-cookie'] as unknown as SetCookie;

function redisClient(): Redis {
  return new Redis({ host: process.env.REDIS_HOST, port: Number(process.env.REDIS_PORT), password: process.env.REDIS_PASSWORD });
}

/** Deletes every Redis key under a prefix (a throwaway app's rate-limit counters and queues). */
async function dropPrefix(redis: Redis, prefix: string): Promise<void> {
  let cursor = '0';
  do {
    const [next, keys] = await redis.scan(cursor, 'MATCH', `${prefix}:*`, 'COUNT', 500);
    if (keys.length > 0) await redis.del(...keys);
    cursor = next;
  } while (cursor !== '0');
}

describe('auth hardening (real MariaDB, Redis and mail fake)', () => {
  let app: NestExpressApplication;
  let redis: Redis;
  beforeAll(async () => {
    app = await createTestApp();
    redis = redisClient();
  });
  afterAll(async () => {
    redis.disconnect();
    await app.close();
  });

  describe('client address for rate limits (TRUST_PROXY)', () => {
    it('ignores X-Forwarded-For by default: a burst with a new header each time is still throttled', async () => {
      // Its own Redis prefix, so the counters of loopback's one address start at zero on every run.
      const prefix = `fitwright-test-trust-${randomBytes(4).toString('hex')}`;
      const direct = await createTestApp({ TRUST_PROXY: '', AUTH_RATE_LIMIT: '3', QUEUE_PREFIX: prefix });
      try {
        const browser = await browserAgent(direct);
        const statuses: number[] = [];
        for (let attempt = 0; attempt < 5; attempt += 1) {
          const response = await browser
            .post('/api/auth/login')
            .set('X-Forwarded-For', uniqueClientIp())
            .send({ email: uniqueEmail('spoofer'), password: TEST_PASSWORD });
          statuses.push(response.status);
        }
        expect(statuses).toEqual([401, 401, 401, 429, 429]);
      } finally {
        await direct.close();
        await dropPrefix(redis, prefix);
      }
    });

    it('honours X-Forwarded-For from a configured proxy (loopback here): each client has its own count', async () => {
      const behindProxy = await createTestApp({ TRUST_PROXY: 'loopback', AUTH_RATE_LIMIT: '3' });
      try {
        const browser = await browserAgent(behindProxy);
        const fromManyClients: number[] = [];
        for (let attempt = 0; attempt < 5; attempt += 1) {
          const response = await browser
            .post('/api/auth/login')
            .set('X-Forwarded-For', uniqueClientIp())
            .send({ email: uniqueEmail('client'), password: TEST_PASSWORD });
          fromManyClients.push(response.status);
        }
        expect(fromManyClients).toEqual([401, 401, 401, 401, 401]);
        // One client named by the proxy is still limited.
        const oneClient = uniqueClientIp();
        const fromOneClient: number[] = [];
        for (let attempt = 0; attempt < 4; attempt += 1) {
          const response = await browser
            .post('/api/auth/login')
            .set('X-Forwarded-For', oneClient)
            .send({ email: uniqueEmail('client'), password: TEST_PASSWORD });
          fromOneClient.push(response.status);
        }
        expect(fromOneClient).toEqual([401, 401, 401, 429]);
      } finally {
        await behindProxy.close();
      }
    });
  });

  describe('failed sign-ins per account (OWASP ASVS V2.2.1)', () => {
    /** One sign-in from a new client address each time, as an attacker rotating addresses would. */
    async function attempt(email: string, password: string): Promise<request.Response> {
      return (await browserAgent(app)).post('/api/auth/login').send({ email, password });
    }

    it('pauses an address after five failures from any client, even for the right password, and says for how long', async () => {
      const account = await signUpAndSignIn(app);
      const statuses: number[] = [];
      for (let failure = 0; failure < 5; failure += 1) statuses.push((await attempt(account.email, 'not the password')).status);
      expect(statuses).toEqual([401, 401, 401, 401, 401]);

      const paused = await attempt(account.email, account.password);
      expect(paused.status).toBe(429);
      expect(paused.body).toMatchObject({ statusCode: 429, code: 'sign_in_paused' });
      expect(paused.body.message).toMatch(/Too many failed sign-ins for this address\. Try again in \d+ seconds/);
      const retryAfter = Number(paused.headers['retry-after']);
      expect(retryAfter).toBeGreaterThanOrEqual(1);
      expect(retryAfter).toBeLessThanOrEqual(30);
      expect(paused.body.retryAfterSeconds).toBe(retryAfter);
    });

    it('answers an unknown address exactly as a known one, so a pause reveals nothing', async () => {
      const account = await signUpAndSignIn(app);
      const known: Array<[number, string]> = [];
      const unknown: Array<[number, string]> = [];
      const nobody = uniqueEmail('nobody');
      for (let index = 0; index < 7; index += 1) {
        const a = await attempt(account.email, 'not the password');
        const b = await attempt(nobody, 'not the password');
        known.push([a.status, a.body.code]);
        unknown.push([b.status, b.body.code]);
      }
      expect(unknown).toEqual(known);
      expect(known.map(([status]) => status)).toEqual([401, 401, 401, 401, 401, 429, 429]);
    });

    it('lets the owner in once the pause is over, and a successful sign-in forgets the failures', async () => {
      const account = await signUpAndSignIn(app);
      for (let failure = 0; failure < 5; failure += 1) expect((await attempt(account.email, 'not the password')).status).toBe(401);
      expect((await attempt(account.email, account.password)).status).toBe(429);
      // Time passes: the pause ends (as Redis would after Retry-After seconds).
      const keys = app.get(SignInAttemptsStore).keysFor(account.email);
      await redis.pexpire(keys.pause, 1);
      await new Promise((resolve) => setTimeout(resolve, 20));
      expect((await attempt(account.email, account.password)).status).toBe(200);
      expect(await redis.exists(keys.failures, keys.pause)).toBe(0);
      // The count starts again from zero: four more failures pass without a pause.
      const statuses: number[] = [];
      for (let failure = 0; failure < 4; failure += 1) statuses.push((await attempt(account.email, 'not the password')).status);
      expect(statuses).toEqual([401, 401, 401, 401]);
      expect((await attempt(account.email, account.password)).status).toBe(200);
    });

    it('documents the pause in the OpenAPI document', async () => {
      const document = (await request(app.getHttpServer()).get('/api/docs/openapi.json').expect(200)).body;
      const tooMany = document.paths['/api/auth/login'].post.responses['429'];
      expect(tooMany.description).toMatch(/sign_in_paused/);
      expect(tooMany.headers['Retry-After']).toBeDefined();
    });

    it('counts simultaneous attempts too: a parallel burst of 12 gets at most five password checks', async () => {
      const email = uniqueEmail('burst');
      const browsers = await Promise.all(Array.from({ length: 12 }, () => browserAgent(app)));
      const responses = await Promise.all(browsers.map((browser) => browser.post('/api/auth/login').send({ email, password: 'guess' })));
      const statuses = responses.map((response) => response.status).sort();
      expect(statuses.filter((status) => status === 401)).toHaveLength(5);
      expect(statuses.filter((status) => status === 429)).toHaveLength(7);
    });
  });

  describe('forgot password: no account-dependent work on the request path', () => {
    it('answers alike for a known and an unknown address, queues exactly one job for each, and looks nobody up while answering', async () => {
      const account = await signUpAndSignIn(app);
      const queue = app.get<Queue>(getQueueToken(QUEUES.accounts));
      const users = app.get(UsersService);
      const added = jest.spyOn(queue, 'add');
      const lookups = jest.spyOn(users, 'findByEmail');
      const before = await inboxSnapshot(account.email);
      const nobody = uniqueEmail('nobody');
      // This process's worker stops taking jobs, so whatever happens during the requests is the request path.
      await queue.pause(true);
      let jobs: Array<Promise<Job>> = [];
      try {
        const browser = await browserAgent(app);
        const unknown = await browser.post('/api/auth/password/forgot').send({ email: nobody.toUpperCase() });
        const known = await browser.post('/api/auth/password/forgot').send({ email: ` ${account.email} ` });
        expect([unknown.status, known.status]).toEqual([202, 202]);
        expect(unknown.body).toEqual(known.body);
        expect(unknown.headers['content-length']).toBe(known.headers['content-length']);
        expect(lookups).not.toHaveBeenCalled();
        expect(added.mock.calls).toEqual([
          [ACCOUNTS_JOBS.passwordResetRequested, { email: nobody }],
          [ACCOUNTS_JOBS.passwordResetRequested, { email: account.email }],
        ]);
        jobs = added.mock.results.map((result) => result.value as Promise<Job>);
      } finally {
        await queue.resume(true);
        added.mockRestore();
        lookups.mockRestore();
      }
      // The jobs do the lookup: a link for the account, nothing for the unknown address.
      const finished = await Promise.all(jobs.map(async (job) => (await job).finished()));
      expect(finished).toEqual([false, true]);
      const mail = await waitForMail(account.email, { subject: /new Fitwright password/, excluding: before });
      const token = tokenFrom(mail, '/reset-password');
      await (await browserAgent(app)).post('/api/auth/password/reset').send({ token, password: 'a brand new password' }).expect(200);
    });
  });

  describe('CSRF token signed to the session', () => {
    const server = () => app.getHttpServer();

    /** A signed-out browser's token, then a sign-in with it; returns every cookie value along the way. */
    async function signInByHand(email: string, password: string) {
      const ip = uniqueClientIp();
      const me = await request(server()).get('/api/auth/me').set('X-Forwarded-For', ip).expect(200);
      const anonymousCsrf = cookieValue(setCookies(me), 'fw_csrf')!;
      const login = await request(server())
        .post('/api/auth/login')
        .set('X-Forwarded-For', ip)
        .set('Cookie', `fw_csrf=${anonymousCsrf}`)
        .set('X-CSRF-Token', anonymousCsrf)
        .send({ email, password })
        .expect(200);
      return {
        ip,
        anonymousCsrf,
        session: cookieValue(setCookies(login), 'fw_session')!,
        csrf: cookieValue(setCookies(login), 'fw_csrf')!,
      };
    }

    function rename(session: string, csrf: string, ip: string, displayName: string): request.Test {
      return request(server())
        .patch('/api/users/me')
        .set('X-Forwarded-For', ip)
        .set('Cookie', `fw_session=${session}; fw_csrf=${csrf}`)
        .set('X-CSRF-Token', csrf)
        .send({ displayName });
    }

    it('refuses a token from another session, even when cookie and header agree', async () => {
      const alice = await signUpAndSignIn(app);
      const bob = await signUpAndSignIn(app);
      const aliceBrowser = await signInByHand(alice.email, alice.password);
      const bobBrowser = await signInByHand(bob.email, bob.password);
      const refused = await rename(aliceBrowser.session, bobBrowser.csrf, aliceBrowser.ip, 'Planted').expect(403);
      expect(refused.body.code).toBe('csrf_invalid');
      await rename(aliceBrowser.session, aliceBrowser.csrf, aliceBrowser.ip, 'Alice Again').expect(200);
    });

    it('rotates the token at sign-in: the one from before no longer works', async () => {
      const account = await signUpAndSignIn(app);
      const browser = await signInByHand(account.email, account.password);
      expect(browser.csrf).toBeDefined();
      expect(browser.csrf).not.toBe(browser.anonymousCsrf);
      const stale = await rename(browser.session, browser.anonymousCsrf, browser.ip, 'Stale').expect(403);
      expect(stale.body.code).toBe('csrf_invalid');
      await rename(browser.session, browser.csrf, browser.ip, 'Fresh').expect(200);
    });

    it('rotates the token at sign-out: the signed-in one does not work on the sign-in form afterwards', async () => {
      const account = await signUpAndSignIn(app);
      const browser = await signInByHand(account.email, account.password);
      const logout = await request(server())
        .post('/api/auth/logout')
        .set('X-Forwarded-For', browser.ip)
        .set('Cookie', `fw_session=${browser.session}; fw_csrf=${browser.csrf}`)
        .set('X-CSRF-Token', browser.csrf)
        .expect(204);
      const signedOutCsrf = cookieValue(setCookies(logout), 'fw_csrf')!;
      expect(signedOutCsrf).toBeDefined();
      expect(signedOutCsrf).not.toBe(browser.csrf);
      const signIn = (csrf: string) =>
        request(server())
          .post('/api/auth/login')
          .set('X-Forwarded-For', browser.ip)
          .set('Cookie', `fw_csrf=${csrf}`)
          .set('X-CSRF-Token', csrf)
          .send({ email: account.email, password: account.password });
      expect((await signIn(browser.csrf)).body.code).toBe('csrf_invalid');
      await signIn(signedOutCsrf).expect(200);
    });

    it('answers a refusal for a token that does not fit with one that does, so the studio can simply try again', async () => {
      const account = await signUpAndSignIn(app);
      const browser = await signInByHand(account.email, account.password);
      const refused = await rename(browser.session, browser.anonymousCsrf, browser.ip, 'Refused').expect(403);
      const replacement = cookieValue(setCookies(refused), 'fw_csrf')!;
      expect(replacement).toBeDefined();
      await rename(browser.session, replacement, browser.ip, 'Second try').expect(200);
    });

    it('hands out a fitting token on GET /api/auth/me when the browser holds one that does not fit', async () => {
      const account = await signUpAndSignIn(app);
      const browser = await signInByHand(account.email, account.password);
      const cookie = (csrf: string) => `fw_session=${browser.session}; fw_csrf=${csrf}`;
      const fitting = await request(server()).get('/api/auth/me').set('Cookie', cookie(browser.csrf)).expect(200);
      expect(cookieValue(setCookies(fitting), 'fw_csrf')).toBeUndefined();
      const misfit = await request(server()).get('/api/auth/me').set('Cookie', cookie(browser.anonymousCsrf)).expect(200);
      const replacement = cookieValue(setCookies(misfit), 'fw_csrf')!;
      expect(replacement).toBeDefined();
      await rename(browser.session, replacement, browser.ip, 'Replaced').expect(200);
    });
  });
});
