import { NestExpressApplication } from '@nestjs/platform-express';
import { createHash } from 'node:crypto';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { createTestApp } from './create-test-app';
import { ONE_PIXEL_PNG as PNG } from './support/images';
import { browserAgent, signUpAndSignIn, TestAccount, uniqueEmail, uniqueSlug } from './support/accounts';
import { inboxSnapshot, linkFrom, tokenFrom, waitForMail } from './support/mail-inbox';

jest.setTimeout(30_000);

const sha256 = (value: string) => createHash('sha256').update(value).digest('hex');

describe('workshops, members and invitations (real MariaDB, S3 fake, mail fake)', () => {
  let app: NestExpressApplication;
  let db: DataSource;
  let owner: TestAccount;
  let workshopId: string;

  beforeAll(async () => {
    app = await createTestApp();
    db = app.get(DataSource);
    owner = await signUpAndSignIn(app, { displayName: 'Rowan Avery' });
    const created = await owner.agent
      .post('/api/workshops')
      .send({ name: 'Harrow Lane Garage', slug: uniqueSlug('harrow'), description: 'Electric conversions' })
      .expect(201);
    workshopId = created.body.id;
  });
  afterAll(async () => app.close());

  /** Invites `email` as `role` and returns the token from the real e-mail. */
  async function invite(email: string, role: 'owner' | 'editor' = 'editor'): Promise<string> {
    const before = await inboxSnapshot(email);
    await owner.agent.post(`/api/workshops/${workshopId}/invitations`).send({ email, role }).expect(201);
    return tokenFrom(await waitForMail(email, { subject: /invited you/, excluding: before }), '/invitations/accept');
  }

  async function addMember(role: 'owner' | 'editor' = 'editor'): Promise<TestAccount> {
    const account = await signUpAndSignIn(app);
    const token = await invite(account.email, role);
    await account.agent.post('/api/invitations/accept').send({ token }).expect(200);
    return account;
  }

  describe('creating', () => {
    it('makes the creator the owner and lists the workshop as theirs', async () => {
      const created = await owner.agent.get(`/api/workshops/${workshopId}`).expect(200);
      expect(created.body).toMatchObject({ name: 'Harrow Lane Garage', description: 'Electric conversions', role: 'owner', logoUrl: null, disabled: false });
      const mine = await owner.agent.get('/api/workshops').expect(200);
      expect(mine.body.map((workshop: { id: string }) => workshop.id)).toContain(workshopId);
      const members = await owner.agent.get(`/api/workshops/${workshopId}/members`).expect(200);
      expect(members.body).toEqual([expect.objectContaining({ userId: expect.any(String), role: 'owner', displayName: 'Rowan Avery' })]);
    });

    it('validates the web address and keeps it unique', async () => {
      const bad = await owner.agent.post('/api/workshops').send({ name: 'X Y', slug: 'Not A Slug!' }).expect(400);
      expect(bad.body.errors.slug).toMatch(/lower-case letters, digits and single hyphens/);
      const reserved = await owner.agent.post('/api/workshops').send({ name: 'Admin shop', slug: 'admin' }).expect(400);
      expect(reserved.body.errors.slug).toMatch(/reserved/);
      const slug = (await owner.agent.get(`/api/workshops/${workshopId}`)).body.slug;
      const taken = await owner.agent.post('/api/workshops').send({ name: 'Copy', slug: slug.toUpperCase() }).expect(409);
      expect(taken.body.errors).toEqual({ slug: 'That web address is taken; choose another' });
    });

    it('needs a confirmed e-mail address', async () => {
      const unverified = await signUpAndSignIn(app, { verify: false });
      const refused = await unverified.agent.post('/api/workshops').send({ name: 'Too soon', slug: uniqueSlug('soon') }).expect(403);
      expect(refused.body.message).toMatch(/Confirm your e-mail address/);
    });

    it('is not possible signed out', async () => {
      await (await browserAgent(app)).post('/api/workshops').send({ name: 'Nobody', slug: uniqueSlug('nobody') }).expect(401);
    });
  });

  describe('settings and logo', () => {
    it('lets an editor rename the workshop', async () => {
      const editor = await addMember('editor');
      const renamed = await editor.agent.patch(`/api/workshops/${workshopId}`).send({ description: 'EV conversions of compact pickups' }).expect(200);
      expect(renamed.body).toMatchObject({ description: 'EV conversions of compact pickups', role: 'editor' });
    });

    it('stores a PNG logo in S3 and serves it through a presigned link', async () => {
      const uploaded = await owner.agent
        .put(`/api/workshops/${workshopId}/logo`)
        .attach('logo', PNG, { filename: 'logo.txt', contentType: 'text/plain' })
        .expect(200);
      expect(uploaded.body.logoUrl).toMatch(/X-Amz-Signature=/);
      const image = await fetch(uploaded.body.logoUrl);
      expect(image.status).toBe(200);
      expect(Buffer.from(await image.arrayBuffer()).equals(PNG)).toBe(true);
      const [row] = await db.query('SELECT logo_key FROM workshops WHERE id = ?', [workshopId]);
      expect(row.logo_key).toMatch(new RegExp(`^workshops/${workshopId}/logo-[0-9a-f-]+\\.png$`));

      await owner.agent.delete(`/api/workshops/${workshopId}/logo`).expect(204);
      expect((await owner.agent.get(`/api/workshops/${workshopId}`)).body.logoUrl).toBeNull();
      expect((await fetch(uploaded.body.logoUrl)).status).toBe(404);
    });

    it('refuses a file that is not a PNG, JPEG or WebP image, whatever its name says', async () => {
      const svg = Buffer.from('<svg xmlns="http://www.w3.org/2000/svg"><script>alert(1)</script></svg>');
      const refused = await owner.agent
        .put(`/api/workshops/${workshopId}/logo`)
        .attach('logo', svg, { filename: 'logo.png', contentType: 'image/png' })
        .expect(400);
      expect(refused.body.message).toBe('The logo must be a PNG, JPEG or WebP image');
      await owner.agent.put(`/api/workshops/${workshopId}/logo`).expect(400);
    });

    it('refuses a logo over 2 MB', async () => {
      const big = Buffer.concat([PNG, Buffer.alloc(2 * 1024 * 1024)]);
      const refused = await owner.agent
        .put(`/api/workshops/${workshopId}/logo`)
        .attach('logo', big, { filename: 'big.png', contentType: 'image/png' })
        .expect(413);
      expect(refused.body.message).toBe('The logo must be 2 MB or smaller');
    });
  });

  describe('invitations', () => {
    it('invites by e-mail; the invitee signs up afterwards with that address and accepts', async () => {
      const email = uniqueEmail('invitee');
      const token = await invite(email, 'editor');
      const mail = await waitForMail(email, { subject: /invited you/ });
      expect(linkFrom(mail, '/invitations/accept').origin).toBe(process.env.APP_ORIGIN);
      expect(mail.subject).toBe('Rowan Avery invited you to Harrow Lane Garage on Fitwright');
      // Sent to an address with no account: it says who entered the address and why, and where mail is managed.
      expect(mail.text).toContain('Why you got this: Rowan Avery entered this address to invite you to "Harrow Lane Garage".');
      expect(mail.text).toContain(`Your account and the mail Fitwright sends you: ${process.env.APP_ORIGIN}/account`);

      const preview = await request(app.getHttpServer()).get('/api/invitations/lookup').query({ token }).expect(200);
      expect(preview.body).toMatchObject({ email, role: 'editor', status: 'pending', invitedBy: 'Rowan Avery', workshop: { id: workshopId } });
      const pending = await owner.agent.get(`/api/workshops/${workshopId}/invitations`).expect(200);
      expect(pending.body).toEqual(expect.arrayContaining([expect.objectContaining({ email, role: 'editor', expired: false })]));

      // Signs up after the invitation, without confirming the address first: the link confirms it.
      const invitee = await signUpAndSignIn(app, { email, verify: false });
      const accepted = await invitee.agent.post('/api/invitations/accept').send({ token }).expect(200);
      expect(accepted.body).toEqual({ workshopId, role: 'editor' });
      expect((await invitee.agent.get('/api/auth/me')).body.user.emailVerified).toBe(true);
      expect((await invitee.agent.get(`/api/workshops/${workshopId}`).expect(200)).body.role).toBe('editor');
      expect((await request(app.getHttpServer()).get('/api/invitations/lookup').query({ token })).body.status).toBe('accepted');
      const stillPending = await owner.agent.get(`/api/workshops/${workshopId}/invitations`).expect(200);
      expect(stillPending.body.map((invitation: { email: string }) => invitation.email)).not.toContain(email);
    });

    it('stores only a hash of the token, and expires after 7 days', async () => {
      const email = uniqueEmail('later');
      const token = await invite(email);
      const [row] = await db.query('SELECT token_hash, expires_at, created_at FROM invitations WHERE token_hash = ?', [sha256(token)]);
      const days = (new Date(row.expires_at).getTime() - new Date(row.created_at).getTime()) / 86_400_000;
      expect(days).toBeCloseTo(7, 2);
      await db.query('UPDATE invitations SET expires_at = NOW(3) - INTERVAL 1 SECOND WHERE token_hash = ?', [sha256(token)]);
      const invitee = await signUpAndSignIn(app, { email });
      const refused = await invitee.agent.post('/api/invitations/accept').send({ token }).expect(410);
      expect(refused.body.message).toMatch(/expired/);
    });

    it('refuses an account with another address, and a reused link', async () => {
      const email = uniqueEmail('right');
      const token = await invite(email);
      const someoneElse = await signUpAndSignIn(app);
      const refused = await someoneElse.agent.post('/api/invitations/accept').send({ token }).expect(403);
      expect(refused.body.message).toBe(`This invitation was sent to ${email}. Sign in with that address to accept it.`);
      const invitee = await signUpAndSignIn(app, { email });
      await invitee.agent.post('/api/invitations/accept').send({ token }).expect(200);
      await someoneElse.agent.post('/api/invitations/accept').send({ token }).expect(410);
      await request(app.getHttpServer()).get('/api/invitations/lookup').query({ token: 'x'.repeat(43) }).expect(404);
    });

    it('replaces an earlier invitation to the same address, and lets the owner revoke one', async () => {
      const email = uniqueEmail('twice');
      const first = await invite(email);
      const second = await invite(email);
      const invitee = await signUpAndSignIn(app, { email });
      await invitee.agent.post('/api/invitations/accept').send({ token: first }).expect(404);

      const pending = (await owner.agent.get(`/api/workshops/${workshopId}/invitations`)).body as { id: string; email: string }[];
      const invitation = pending.find((candidate) => candidate.email === email)!;
      await owner.agent.delete(`/api/workshops/${workshopId}/invitations/${invitation.id}`).expect(204);
      await invitee.agent.post('/api/invitations/accept').send({ token: second }).expect(404);
    });

    it('refuses to invite someone who is already a member', async () => {
      const member = await addMember();
      const refused = await owner.agent.post(`/api/workshops/${workshopId}/invitations`).send({ email: member.email, role: 'editor' }).expect(409);
      expect(refused.body.errors).toEqual({ email: 'This person is already a member of the workshop' });
    });
  });

  describe('roles', () => {
    it('lets only owners manage members; editors may read the list', async () => {
      const editor = await addMember('editor');
      await editor.agent.get(`/api/workshops/${workshopId}/members`).expect(200);
      const refused = await editor.agent.post(`/api/workshops/${workshopId}/invitations`).send({ email: uniqueEmail(), role: 'editor' }).expect(403);
      expect(refused.body.code).toBe('forbidden');
      await editor.agent.patch(`/api/workshops/${workshopId}/members/${owner.id}`).send({ role: 'editor' }).expect(403);
      await editor.agent.get(`/api/workshops/${workshopId}/invitations`).expect(403);
    });

    it('changes a role and removes a member, who then sees the workshop as not found', async () => {
      const member = await addMember('editor');
      const promoted = await owner.agent.patch(`/api/workshops/${workshopId}/members/${member.id}`).send({ role: 'owner' }).expect(200);
      expect(promoted.body).toMatchObject({ userId: member.id, role: 'owner' });
      await owner.agent.patch(`/api/workshops/${workshopId}/members/${member.id}`).send({ role: 'editor' }).expect(200);
      await owner.agent.patch(`/api/workshops/${workshopId}/members/${member.id}`).send({ role: 'admin' }).expect(400);
      await owner.agent.delete(`/api/workshops/${workshopId}/members/${member.id}`).expect(204);
      const gone = await member.agent.get(`/api/workshops/${workshopId}`).expect(404);
      expect(gone.body.message).toBe('Workshop not found');
      await owner.agent.delete(`/api/workshops/${workshopId}/members/${member.id}`).expect(404);
    });

    it('never leaves a workshop without an owner', async () => {
      const lone = await signUpAndSignIn(app);
      const own = await lone.agent.post('/api/workshops').send({ name: 'Lone Shop', slug: uniqueSlug('lone') }).expect(201);
      const id = own.body.id as string;
      const leave = await lone.agent.post(`/api/workshops/${id}/leave`).expect(409);
      expect(leave.body.message).toMatch(/only owner/);
      await lone.agent.patch(`/api/workshops/${id}/members/${lone.id}`).send({ role: 'editor' }).expect(409);
      await lone.agent.delete(`/api/workshops/${id}/members/${lone.id}`).expect(409);
    });

    it('transfers ownership: the member becomes owner and the caller an editor, who may then leave', async () => {
      const first = await signUpAndSignIn(app);
      const id = (await first.agent.post('/api/workshops').send({ name: 'Handover Shop', slug: uniqueSlug('handover') }).expect(201)).body.id;
      const heir = await signUpAndSignIn(app);
      const before = await inboxSnapshot(heir.email);
      await first.agent.post(`/api/workshops/${id}/invitations`).send({ email: heir.email, role: 'editor' }).expect(201);
      const token = tokenFrom(await waitForMail(heir.email, { subject: /invited you/, excluding: before }), '/invitations/accept');
      await heir.agent.post('/api/invitations/accept').send({ token }).expect(200);

      await first.agent.post(`/api/workshops/${id}/transfer-ownership`).send({ userId: first.id }).expect(400);
      const members = await first.agent.post(`/api/workshops/${id}/transfer-ownership`).send({ userId: heir.id }).expect(200);
      expect(Object.fromEntries(members.body.map((member: { userId: string; role: string }) => [member.userId, member.role]))).toEqual({
        [first.id]: 'editor',
        [heir.id]: 'owner',
      });
      await first.agent.post(`/api/workshops/${id}/invitations`).send({ email: uniqueEmail(), role: 'editor' }).expect(403);
      await first.agent.post(`/api/workshops/${id}/leave`).expect(204);
      await first.agent.get(`/api/workshops/${id}`).expect(404);
    });
  });

  describe('who sees a workshop', () => {
    it('answers a non-member 404, exactly as for a workshop that does not exist', async () => {
      const stranger = await signUpAndSignIn(app);
      const hidden = await stranger.agent.get(`/api/workshops/${workshopId}`).expect(404);
      const missing = await stranger.agent.get('/api/workshops/00000000-0000-4000-8000-000000000000').expect(404);
      expect(hidden.body).toEqual(missing.body);
      await stranger.agent.get(`/api/workshops/${workshopId}/members`).expect(404);
      await stranger.agent.get('/api/workshops/not-a-uuid').expect(404);
      await (await browserAgent(app)).get(`/api/workshops/${workshopId}`).expect(401);
    });

    it('lets a site admin read, but not change, a workshop they are not a member of', async () => {
      const admin = await signUpAndSignIn(app);
      await db.query('UPDATE users SET is_admin = 1 WHERE id = ?', [admin.id]);
      const read = await admin.agent.get(`/api/workshops/${workshopId}`).expect(200);
      expect(read.body.role).toBe('admin');
      await admin.agent.get(`/api/workshops/${workshopId}/members`).expect(200);
      await admin.agent.patch(`/api/workshops/${workshopId}`).send({ name: 'Taken over' }).expect(404);
    });

    it('keeps a disabled workshop readable by its members but refuses changes', async () => {
      const lone = await signUpAndSignIn(app);
      const id = (await lone.agent.post('/api/workshops').send({ name: 'Paused Shop', slug: uniqueSlug('paused') }).expect(201)).body.id;
      await db.query('UPDATE workshops SET disabled_at = NOW(3) WHERE id = ?', [id]);
      expect((await lone.agent.get(`/api/workshops/${id}`).expect(200)).body.disabled).toBe(true);
      const refused = await lone.agent.patch(`/api/workshops/${id}`).send({ name: 'Still here' }).expect(403);
      expect(refused.body.code).toBe('workshop_disabled');
    });
  });
});
