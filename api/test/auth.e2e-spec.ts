import { NestExpressApplication } from '@nestjs/platform-express';
import { createHash } from 'node:crypto';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { createTestApp } from './create-test-app';
import {
  browserAgent,
  signIn,
  signUpAndSignIn,
  TEST_PASSWORD,
  uniqueClientIp,
  uniqueEmail,
} from './support/accounts';
import { inboxSnapshot, linkFrom, tokenFrom, waitForMail } from './support/mail-inbox';

jest.setTimeout(30_000);

const sha256 = (value: string) => createHash('sha256').update(value).digest('hex');

function cookieHeader(response: request.Response, name: string): string | undefined {
  const cookies = (response.headers['set-cookie'] as unknown as string[] | undefined) ?? [];
  return cookies.find((cookie) => cookie.startsWith(`${name}=`));
}

describe('accounts (real MariaDB, Redis and mail fake)', () => {
  let app: NestExpressApplication;
  let db: DataSource;
  beforeAll(async () => {
    app = await createTestApp();
    db = app.get(DataSource);
  });
  afterAll(async () => app.close());

  it('signs up, confirms the address from the e-mailed link, signs in and out', async () => {
    const email = uniqueEmail('journey');
    const browser = await browserAgent(app);
    const registered = await browser
      .post('/api/auth/register')
      .send({ email: `  ${email.toUpperCase()} `, password: TEST_PASSWORD, displayName: ' Rowan Avery ' })
      .expect(202);
    expect(registered.body.message).toMatch(/Check your inbox/);

    const mail = await waitForMail(email, { subject: /Confirm your e-mail/ });
    const link = linkFrom(mail, '/verify-email');
    expect(link.origin).toBe(process.env.APP_ORIGIN);
    expect(mail.text).toContain('Hello Rowan Avery');
    // Transactional: no unsubscribe header, but it says why it came and where the account's mail is managed.
    expect(mail.text).toContain('Why you got this: this address was used to create a Fitwright account.');
    expect(mail.text).toContain(`Your account and the mail Fitwright sends you: ${process.env.APP_ORIGIN}/account`);
    expect(mail.headers?.['list-unsubscribe']).toBeUndefined();

    const verified = await browser.post('/api/auth/verify-email').send({ token: link.searchParams.get('token') }).expect(200);
    expect(verified.body.user).toMatchObject({ email, displayName: 'Rowan Avery', emailVerified: true, isAdmin: false });
    // Single use.
    await browser.post('/api/auth/verify-email').send({ token: link.searchParams.get('token') }).expect(400);

    expect((await browser.get('/api/auth/me').expect(200)).body).toEqual({ user: null });
    const login = await browser.post('/api/auth/login').send({ email: email.toUpperCase(), password: TEST_PASSWORD }).expect(200);
    expect(login.body.user).toEqual({
      id: expect.any(String),
      email,
      displayName: 'Rowan Avery',
      isAdmin: false,
      preferredUnits: 'metric',
      emailVerified: true,
    });
    const me = await browser.get('/api/auth/me').expect(200);
    expect(me.body.user.id).toBe(login.body.user.id);

    await browser.post('/api/auth/logout').expect(204);
    expect((await browser.get('/api/auth/me').expect(200)).body).toEqual({ user: null });
  });

  it('stores an argon2id hash, never the password, and only a SHA-256 of the session token', async () => {
    const account = await signUpAndSignIn(app);
    const [user] = await db.query('SELECT password_hash FROM users WHERE id = ?', [account.id]);
    expect(user.password_hash).toMatch(/^\$argon2id\$v=19\$m=19456,t=2,p=1\$/);
    expect(user.password_hash).not.toContain(account.password);

    const response = await account.agent.post('/api/auth/login').send({ email: account.email, password: account.password });
    const token = /^fw_session=([^;]+)/.exec(cookieHeader(response, 'fw_session') ?? '')?.[1];
    expect(token).toBeDefined();
    const rows = await db.query('SELECT token_hash FROM sessions WHERE user_id = ?', [account.id]);
    const hashes = rows.map((row: { token_hash: string }) => row.token_hash);
    expect(hashes).toContain(sha256(decodeURIComponent(token!)));
    expect(hashes).not.toContain(token);
  });

  it('slides a session forward with use, but never past 90 days after sign-in', async () => {
    const account = await signUpAndSignIn(app);
    // Signed in 89 days ago and last seen two hours ago: this request slides the expiry, capped at day 90.
    await db.query(
      'UPDATE sessions SET created_at = NOW(3) - INTERVAL 89 DAY, last_seen_at = NOW(3) - INTERVAL 2 HOUR WHERE user_id = ?',
      [account.id],
    );
    await account.agent.get('/api/auth/me').expect(200);
    const [slid] = await db.query('SELECT TIMESTAMPDIFF(SECOND, created_at, expires_at) AS lifetime FROM sessions WHERE user_id = ?', [account.id]);
    expect(Number(slid.lifetime)).toBe(90 * 24 * 3600);
    // Past day 90 the session is over, whatever its expiry says.
    await db.query(
      'UPDATE sessions SET created_at = NOW(3) - INTERVAL 90 DAY - INTERVAL 1 MINUTE, expires_at = NOW(3) + INTERVAL 1 DAY WHERE user_id = ?',
      [account.id],
    );
    const me = await account.agent.get('/api/auth/me').expect(200);
    expect(me.body.user).toBeNull();
    expect(await db.query('SELECT id FROM sessions WHERE user_id = ?', [account.id])).toEqual([]);
  });

  it('sets an httpOnly, SameSite=Lax session cookie, not Secure over http', async () => {
    const account = await signUpAndSignIn(app);
    const response = await account.agent.post('/api/auth/login').send({ email: account.email, password: account.password });
    const cookie = cookieHeader(response, 'fw_session')!;
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/SameSite=Lax/);
    expect(cookie).toMatch(/Path=\//);
    expect(cookie).not.toMatch(/Secure/);
    const csrf = cookieHeader(await request(app.getHttpServer()).get('/api/auth/me'), 'fw_csrf')!;
    expect(csrf).not.toMatch(/HttpOnly/);
    expect(csrf).toMatch(/SameSite=Lax/);
  });

  it('marks cookies Secure when the site is served over https', async () => {
    const httpsApp = await createTestApp({ APP_ORIGIN: 'https://fitwright.example' });
    try {
      const me = await request(httpsApp.getHttpServer()).get('/api/auth/me').expect(200);
      expect(cookieHeader(me, 'fw_csrf')).toMatch(/Secure/);
    } finally {
      await httpsApp.close();
    }
  });

  it('answers a sign-up for a taken address exactly like a new one, and tells the owner by e-mail', async () => {
    const account = await signUpAndSignIn(app);
    const fresh = await (await browserAgent(app))
      .post('/api/auth/register')
      .send({ email: uniqueEmail('fresh'), password: TEST_PASSWORD, displayName: 'Someone' })
      .expect(202);
    const taken = await (await browserAgent(app))
      .post('/api/auth/register')
      .send({ email: account.email, password: 'another password entirely', displayName: 'Impostor' })
      .expect(202);
    expect(taken.body).toEqual(fresh.body);
    const notice = await waitForMail(account.email, { subject: /tried to sign up/ });
    expect(notice.text).toContain('already has one');
    // The account is untouched: the old password still works.
    await signIn(app, account.email, account.password);
  });

  it('gives one answer for an unknown address and a wrong password', async () => {
    const account = await signUpAndSignIn(app);
    const browser = await browserAgent(app);
    const unknown = await browser.post('/api/auth/login').send({ email: uniqueEmail('nobody'), password: TEST_PASSWORD }).expect(401);
    const wrong = await browser.post('/api/auth/login').send({ email: account.email, password: 'not the password' }).expect(401);
    expect(unknown.body).toEqual(wrong.body);
    expect(wrong.body.message).toBe('The e-mail address or password is incorrect.');
  });

  it('lets an unconfirmed account sign in, says so, and resends the link on request', async () => {
    const account = await signUpAndSignIn(app, { verify: false });
    const me = await account.agent.get('/api/auth/me').expect(200);
    expect(me.body.user.emailVerified).toBe(false);
    // Mail goes out from a job: let the sign-up mail land before noting what the inbox already holds.
    await waitForMail(account.email, { subject: /Confirm your e-mail/ });
    const before = await inboxSnapshot(account.email);
    await account.agent.post('/api/auth/verify-email/resend').expect(202);
    const mail = await waitForMail(account.email, { subject: /Confirm your e-mail/, excluding: before });
    await account.agent.post('/api/auth/verify-email').send({ token: tokenFrom(mail, '/verify-email') }).expect(200);
    expect((await account.agent.get('/api/auth/me')).body.user.emailVerified).toBe(true);
  });

  it('validates every field and names it', async () => {
    const response = await (await browserAgent(app))
      .post('/api/auth/register')
      .send({ email: 'not-an-address', password: 'short', displayName: '' })
      .expect(400);
    expect(response.body.errors).toEqual({
      email: 'Enter a valid e-mail address',
      password: 'Password must be at least 10 characters',
      displayName: 'Display name must be 1 to 80 characters',
    });
    expect(response.body.message).toEqual(expect.arrayContaining(['Enter a valid e-mail address']));
    const extra = await (await browserAgent(app))
      .post('/api/auth/login')
      .send({ email: uniqueEmail(), password: 'x', isAdmin: true })
      .expect(400);
    expect(extra.body.message).toEqual(['property isAdmin should not exist']);
  });

  describe('CSRF (double-submit cookie)', () => {
    it('refuses a sign-in form without the token, or with a token that does not match the cookie', async () => {
      const server = app.getHttpServer();
      const ip = uniqueClientIp();
      const bare = await request(server)
        .post('/api/auth/login')
        .set('X-Forwarded-For', ip)
        .send({ email: uniqueEmail(), password: TEST_PASSWORD })
        .expect(403);
      expect(bare.body.code).toBe('csrf_invalid');
      const browser = await browserAgent(app);
      const forged = await browser
        .post('/api/auth/login')
        .set('X-CSRF-Token', 'a'.repeat(43))
        .send({ email: uniqueEmail(), password: TEST_PASSWORD })
        .expect(403);
      expect(forged.body.code).toBe('csrf_invalid');
    });

    it('refuses a state change by a signed-in browser without the header', async () => {
      const account = await signUpAndSignIn(app);
      const response = await account.agent.patch('/api/users/me').set('X-CSRF-Token', '').send({ displayName: 'Changed' }).expect(403);
      expect(response.body.code).toBe('csrf_invalid');
      await account.agent.patch('/api/users/me').send({ displayName: 'Changed' }).expect(200);
    });

    it('leaves the public calculators callable without a token', async () => {
      const response = await request(app.getHttpServer())
        .post('/api/tools/transcripts/parse')
        .send({ text: 'WEBVTT\n\n00:00:01.000 --> 00:00:02.000\nhello\n', format: 'auto' });
      expect([401, 403]).not.toContain(response.status);
    });
  });

  describe('password reset', () => {
    it('always answers 202, and e-mails a single-use link only to an existing account', async () => {
      const account = await signUpAndSignIn(app);
      const browser = await browserAgent(app);
      const unknown = await browser.post('/api/auth/password/forgot').send({ email: uniqueEmail('nobody') }).expect(202);
      const known = await browser.post('/api/auth/password/forgot').send({ email: account.email }).expect(202);
      expect(unknown.body).toEqual(known.body);

      const mail = await waitForMail(account.email, { subject: /new Fitwright password/ });
      const token = tokenFrom(mail, '/reset-password');
      await browser.post('/api/auth/password/reset').send({ token, password: 'a brand new password' }).expect(200);
      const again = await browser.post('/api/auth/password/reset').send({ token, password: 'yet another password' }).expect(400);
      expect(again.body.message).toMatch(/invalid, already used or expired/);

      // The old session was signed out; the new password works, the old one does not.
      expect((await account.agent.get('/api/auth/me')).body.user).toBeNull();
      await (await browserAgent(app)).post('/api/auth/login').send({ email: account.email, password: account.password }).expect(401);
      await signIn(app, account.email, 'a brand new password');
    });

    it('refuses an expired link', async () => {
      const account = await signUpAndSignIn(app);
      const browser = await browserAgent(app);
      await browser.post('/api/auth/password/forgot').send({ email: account.email }).expect(202);
      const mail = await waitForMail(account.email, { subject: /new Fitwright password/ });
      // A reset is sent only when asked: nothing to unsubscribe from, and the mail says so and links the account page.
      expect(mail.text).toContain('Why you got this: a password reset was asked for this address on the sign-in page.');
      expect(mail.text).toContain('so there is nothing to unsubscribe from');
      expect(mail.html).toContain(`${process.env.APP_ORIGIN}/account`);
      expect(mail.headers?.['list-unsubscribe']).toBeUndefined();
      const token = tokenFrom(mail, '/reset-password');
      await db.query('UPDATE email_tokens SET expires_at = NOW(3) - INTERVAL 1 MINUTE WHERE token_hash = ?', [sha256(token)]);
      await browser.post('/api/auth/password/reset').send({ token, password: 'a brand new password' }).expect(400);
    });
  });

  describe('signed-in account changes', () => {
    it('changes the password only with the current one, and signs out other browsers', async () => {
      const account = await signUpAndSignIn(app);
      const otherBrowser = await signIn(app, account.email, account.password);
      const wrong = await account.agent
        .post('/api/auth/password/change')
        .send({ currentPassword: 'not it at all', newPassword: 'a second good password' })
        .expect(400);
      expect(wrong.body.errors).toEqual({ currentPassword: 'Current password is incorrect' });
      await account.agent
        .post('/api/auth/password/change')
        .send({ currentPassword: account.password, newPassword: 'a second good password' })
        .expect(200);
      expect((await account.agent.get('/api/auth/me')).body.user?.id).toBe(account.id);
      expect((await otherBrowser.get('/api/auth/me')).body.user).toBeNull();
      await waitForMail(account.email, { subject: /password was changed/ });
    });

    it('changes the e-mail address only after the link sent to the new address is followed', async () => {
      const account = await signUpAndSignIn(app);
      const newEmail = uniqueEmail('moved');
      await account.agent.post('/api/auth/email/change').send({ newEmail, password: account.password }).expect(202);
      expect((await account.agent.get('/api/auth/me')).body.user.email).toBe(account.email);
      const token = tokenFrom(await waitForMail(newEmail, { subject: /new e-mail address/ }), '/confirm-email');
      const confirmed = await (await browserAgent(app)).post('/api/auth/email/confirm').send({ token }).expect(200);
      expect(confirmed.body.user).toMatchObject({ id: account.id, email: newEmail, emailVerified: true });
      await waitForMail(account.email, { subject: /e-mail address was changed/ });
      await signIn(app, newEmail, account.password);
    });

    it('does not reveal that the new address already has an account', async () => {
      const account = await signUpAndSignIn(app);
      const other = await signUpAndSignIn(app);
      await account.agent.post('/api/auth/email/change').send({ newEmail: other.email, password: account.password }).expect(202);
      await waitForMail(other.email, { subject: /already on Fitwright/ });
    });

    it('updates display name and preferred units, validating both', async () => {
      const account = await signUpAndSignIn(app);
      const updated = await account.agent.patch('/api/users/me').send({ displayName: 'Sam Okafor', preferredUnits: 'inch' }).expect(200);
      expect(updated.body).toMatchObject({ displayName: 'Sam Okafor', preferredUnits: 'inch' });
      const bad = await account.agent.patch('/api/users/me').send({ preferredUnits: 'furlong' }).expect(400);
      expect(bad.body.errors).toEqual({ preferredUnits: 'Preferred units must be metric or inch' });
      await request(app.getHttpServer()).patch('/api/users/me').send({ displayName: 'x' }).expect(401);
    });
  });

  it('refuses sign-in to a disabled account, and its sessions stop working at once', async () => {
    const account = await signUpAndSignIn(app);
    await db.query('UPDATE users SET disabled_at = NOW(3) WHERE id = ?', [account.id]);
    expect((await account.agent.get('/api/auth/me')).body.user).toBeNull();
    await account.agent.get('/api/workshops').expect(401);
    const refused = await (await browserAgent(app))
      .post('/api/auth/login')
      .send({ email: account.email, password: account.password })
      .expect(403);
    expect(refused.body.message).toMatch(/disabled/);
  });

  it('makes a verified account whose address is in ADMIN_EMAILS a site admin', async () => {
    const email = uniqueEmail('first-admin');
    const adminApp = await createTestApp({ ADMIN_EMAILS: `someone@else.example, ${email.toUpperCase()}` });
    try {
      const unverified = await signUpAndSignIn(adminApp, { email, verify: false });
      expect((await unverified.agent.get('/api/auth/me')).body.user.isAdmin).toBe(false);
      await waitForMail(email, { subject: /Confirm/ });
      const before = await inboxSnapshot(email);
      await unverified.agent.post('/api/auth/verify-email/resend').expect(202);
      const token = tokenFrom(await waitForMail(email, { subject: /Confirm/, excluding: before }), '/verify-email');
      const verified = await unverified.agent.post('/api/auth/verify-email').send({ token }).expect(200);
      expect(verified.body.user.isAdmin).toBe(true);
    } finally {
      await adminApp.close();
    }
  });

  it('answers 429 with a readable message once an address makes too many attempts', async () => {
    const limitedApp = await createTestApp({ AUTH_RATE_LIMIT: '3' });
    try {
      const browser = await browserAgent(limitedApp);
      const attempt = () => browser.post('/api/auth/login').send({ email: uniqueEmail(), password: TEST_PASSWORD });
      for (let i = 0; i < 3; i += 1) expect((await attempt()).status).toBe(401);
      const limited = await attempt().expect(429);
      expect(limited.body).toMatchObject({ statusCode: 429, message: 'Too many attempts. Please wait a minute and try again.' });
      expect(limited.headers['retry-after-auth']).toBeDefined();
      // Another address is not affected.
      const elsewhere = await browserAgent(limitedApp);
      expect((await elsewhere.post('/api/auth/login').send({ email: uniqueEmail(), password: TEST_PASSWORD })).status).toBe(401);
    } finally {
      await limitedApp.close();
    }
  });
});
