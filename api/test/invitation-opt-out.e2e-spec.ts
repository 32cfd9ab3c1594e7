import { NestExpressApplication } from '@nestjs/platform-express';
import { createHash } from 'node:crypto';
import { DataSource } from 'typeorm';
import { createTestApp } from './create-test-app';
import { browserAgent, signUpAndSignIn, TestAccount, uniqueEmail, uniqueSlug } from './support/accounts';
import { inboxSnapshot, linkFrom, tokenFrom, waitForMail } from './support/mail-inbox';

jest.setTimeout(60_000);

const sha256 = (value: string) => createHash('sha256').update(value).digest('hex');

describe('"stop invitations to this address" (real MariaDB, mail fake, relay)', () => {
  let app: NestExpressApplication;
  let db: DataSource;
  let owner: TestAccount;
  let otherOwner: TestAccount;
  let workshopId: string;
  let otherWorkshopId: string;

  const workshop = async (account: TestAccount, name: string) =>
    (await account.agent.post('/api/workshops').send({ name, slug: uniqueSlug('optout') }).expect(201)).body.id as string;
  const invitationMails = async (email: string) =>
    Number((await db.query("SELECT COUNT(*) AS n FROM mail_deliveries WHERE kind = 'invitation' AND recipient = ?", [email]))[0].n);

  beforeAll(async () => {
    app = await createTestApp();
    db = app.get(DataSource);
    owner = await signUpAndSignIn(app, { displayName: 'Rowan Avery' });
    otherOwner = await signUpAndSignIn(app, { displayName: 'Imogen Tarrant' });
    workshopId = await workshop(owner, 'Harrow Lane Garage');
    otherWorkshopId = await workshop(otherOwner, 'Copperfield Bench');
  });
  afterAll(async () => app.close());

  it('the invitation mail carries the link; after it is used, inviting the address answers 409 and sends nothing; the same page undoes it', async () => {
    const email = uniqueEmail('no-invites');
    const before = await inboxSnapshot(email);
    await owner.agent.post(`/api/workshops/${workshopId}/invitations`).send({ email, role: 'editor' }).expect(201);
    const mail = await waitForMail(email, { subject: /invited you/, excluding: before });
    const link = linkFrom(mail, '/invitations/stop');
    expect(link.origin).toBe(process.env.APP_ORIGIN);
    expect(mail.text).toMatch(/Do not want invitations to this address from anyone on Fitwright\? Stop them here, no account needed/);
    const token = tokenFrom(mail, '/invitations/stop');
    // 256 bits, and only its hash is kept.
    expect(Buffer.from(token, 'base64url')).toHaveLength(32);
    expect(await db.query('SELECT email FROM invitation_opt_out_links WHERE token_hash = ?', [sha256(token)])).toEqual([{ email }]);
    expect(await db.query('SELECT id FROM invitation_opt_out_links WHERE token_hash = ?', [token])).toEqual([]);

    // Signed out, as from the mail. Opening the link changes nothing.
    const visitor = await browserAgent(app);
    const shown = await visitor.get('/api/invitations/opt-out').query({ token }).expect(200);
    expect(shown.body).toEqual({ email, stopped: false, stoppedSince: null });
    const stopped = await visitor.put('/api/invitations/opt-out').query({ token }).send({ stopped: true }).expect(200);
    expect(stopped.body).toMatchObject({ email, stopped: true });
    expect(new Date(stopped.body.stoppedSince).getTime()).toBeGreaterThan(Date.now() - 60_000);
    // Repeating it is harmless.
    await visitor.put('/api/invitations/opt-out').query({ token }).send({ stopped: true }).expect(200);

    const sentBefore = await invitationMails(email);
    const pendingBefore = (await owner.agent.get(`/api/workshops/${workshopId}/invitations`).expect(200)).body;
    const refused = await owner.agent.post(`/api/workshops/${workshopId}/invitations`).send({ email: email.toUpperCase(), role: 'owner' }).expect(409);
    expect(refused.body).toMatchObject({
      statusCode: 409,
      code: 'invitations_stopped',
      message: 'This address has asked not to receive invitations. Nothing was sent.',
      errors: { email: 'This address has asked not to receive invitations. Nothing was sent.' },
    });
    // Any workshop: the stop is the address's, not one inviter's.
    await otherOwner.agent.post(`/api/workshops/${otherWorkshopId}/invitations`).send({ email, role: 'editor' }).expect(409);
    expect(await invitationMails(email)).toBe(sentBefore);
    expect((await owner.agent.get(`/api/workshops/${workshopId}/invitations`).expect(200)).body).toEqual(pendingBefore);
    expect((await otherOwner.agent.get(`/api/workshops/${otherWorkshopId}/invitations`).expect(200)).body).toEqual([]);

    // Undone from the same page: invitations go out again, each with a link of its own; the old link still works.
    const allowed = await visitor.put('/api/invitations/opt-out').query({ token }).send({ stopped: false }).expect(200);
    expect(allowed.body).toEqual({ email, stopped: false, stoppedSince: null });
    const beforeSecond = await inboxSnapshot(email);
    await otherOwner.agent.post(`/api/workshops/${otherWorkshopId}/invitations`).send({ email, role: 'editor' }).expect(201);
    const second = await waitForMail(email, { subject: 'Imogen Tarrant invited you to Copperfield Bench', excluding: beforeSecond });
    const secondToken = tokenFrom(second, '/invitations/stop');
    expect(secondToken).not.toBe(token);
    expect((await visitor.get('/api/invitations/opt-out').query({ token: secondToken }).expect(200)).body.stopped).toBe(false);
    expect(await invitationMails(email)).toBe(sentBefore + 1);
  });

  it('refuses unknown and malformed links and bad bodies, naming what is wrong', async () => {
    const visitor = await browserAgent(app);
    const unknown = await visitor.get('/api/invitations/opt-out').query({ token: 'x'.repeat(43) }).expect(404);
    expect(unknown.body.message).toMatch(/We do not know this link/);
    await visitor.put('/api/invitations/opt-out').query({ token: 'x'.repeat(43) }).send({ stopped: true }).expect(404);
    const short = await visitor.get('/api/invitations/opt-out').query({ token: 'abc' }).expect(400);
    expect(JSON.stringify(short.body)).toMatch(/The link is incomplete/);

    const email = uniqueEmail('no-invites-bad');
    const before = await inboxSnapshot(email);
    await owner.agent.post(`/api/workshops/${workshopId}/invitations`).send({ email, role: 'editor' }).expect(201);
    const token = tokenFrom(await waitForMail(email, { subject: /invited you/, excluding: before }), '/invitations/stop');
    for (const body of [{}, { stopped: 'yes' }, { stopped: 1 }, { stopped: true, email: 'someone@else.test' }]) {
      const refused = await visitor.put('/api/invitations/opt-out').query({ token }).send(body).expect(400);
      expect(JSON.stringify(refused.body)).toMatch(/stopped|email/);
    }
    expect((await visitor.get('/api/invitations/opt-out').query({ token }).expect(200)).body.stopped).toBe(false);
  });
});
