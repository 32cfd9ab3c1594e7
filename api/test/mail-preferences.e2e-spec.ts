import { NestExpressApplication } from '@nestjs/platform-express';
import request from 'supertest';
import { MailClock } from '../src/outbox/mail-clock';
import { createTestApp } from './create-test-app';
import { signUpAndSignIn, TestAccount, uniqueSlug } from './support/accounts';
import { inboxSnapshot, listMail, tokenFrom, waitForMail, type InboxMessage } from './support/mail-inbox';

jest.setTimeout(150_000);

/** Time for the relay (and its digest round, every 5 s) to send anything still due, before counting what arrived. */
const settle = () => new Promise((resolve) => setTimeout(resolve, 7000));

async function mailsTo(address: string, subject?: RegExp): Promise<InboxMessage[]> {
  return (await listMail()).filter(
    (message) => message.to.some((to) => to.address.toLowerCase() === address.toLowerCase()) && (!subject || subject.test(message.subject)),
  );
}

/**
 * Mail preferences per follow (at once, daily or weekly digest, paused) with a settable clock: a daily
 * digest of three changes is one mail listing them in order, grouped per guide, before → after; a paused
 * follow brings nothing; preferences and unsubscribe links work signed out and carry unguessable tokens.
 */
describe('mail preferences and digests (real MariaDB, mail fake)', () => {
  let app: NestExpressApplication;
  let owner: TestAccount;
  let atOnce: TestAccount;
  let daily: TestAccount;
  let paused: TestAccount;
  let base: string;
  let workshopId: string;
  let workshopSlug: string;
  let buildId: string;
  const checkTitles = ['Coupler seats on the shaft', 'Adapter plate clears the starter', 'Shaft turns by hand'];
  const checkIds: string[] = [];

  beforeAll(async () => {
    app = await createTestApp();
    [owner, atOnce, daily, paused] = await Promise.all([signUpAndSignIn(app), signUpAndSignIn(app), signUpAndSignIn(app), signUpAndSignIn(app)]);
    workshopSlug = uniqueSlug('digest');
    workshopId = (await owner.agent.post('/api/workshops').send({ name: 'Digest Shop', slug: workshopSlug }).expect(201)).body.id;
    base = `/api/workshops/${workshopId}`;
    buildId = (await owner.agent.post(`${base}/builds`).send({ title: 'Digest build' }).expect(201)).body.id;
    const part = (
      await owner.agent
        .post(`${base}/parts`)
        .send({ partNumber: 'DG-1', title: 'Digest coupler', category: 'coupler', features: [{ name: 'bore', kind: 'diameter', role: 'hole', nominal: '15', unit: 'mm' }] })
        .expect(201)
    ).body;
    const assemblyId = (await owner.agent.post(`${base}/builds/${buildId}/assemblies`).send({ name: 'Digest stack' }).expect(201)).body.id;
    await owner.agent.put(`${base}/assemblies/${assemblyId}/parts/${part.id}`).send({ position: 'input side' }).expect(204);
    const measurementId = (
      await owner.agent
        .post(`${base}/measurements`)
        .send({ featureId: part.features[0].id, quantity: 'diameter', value: '15.006', unit: 'mm', instrumentKind: 'bore_gauge', resolution: '0.001' })
        .expect(201)
    ).body.id;
    for (const title of checkTitles) {
      const id = (await owner.agent.post(`${base}/assemblies/${assemblyId}/checks`).send({ title }).expect(201)).body.id as string;
      await owner.agent.post(`${base}/checks/${id}/evidence`).send({ kind: 'measurement', measurementId }).expect(201);
      checkIds.push(id);
    }
    const guideId = (await owner.agent.post(`${base}/builds/${buildId}/guides`).send({ title: 'Digest guide', assemblyId }).expect(201)).body.id;
    await owner.agent.post(`${base}/guides/${guideId}/steps`).send({ title: 'Fit it' }).expect(201);
    await owner.agent.post(`${base}/guides/${guideId}/revisions`).send({}).expect(201);
    for (const follower of [atOnce, daily, paused]) {
      await follower.agent.post('/api/follows').send({ targetKind: 'assembly', targetId: assemblyId }).expect(201);
    }
  });
  afterAll(async () => app.close());

  it('refuses an unknown time zone naming the field, and stores nothing', async () => {
    const before = (await daily.agent.get('/api/follows/preferences').expect(200)).body;
    const refused = await daily.agent.put('/api/follows/preferences').send({ timeZone: 'Mars/Olympus_Mons', digestHour: 6 }).expect(400);
    expect(refused.body.errors).toHaveProperty('timeZone');
    expect((await daily.agent.get('/api/follows/preferences').expect(200)).body).toEqual(before);
    await daily.agent.put('/api/follows/preferences').send({ digestHour: 24 }).expect(400);
  });

  it('a daily digest of three changes is one mail, in order; a paused follow gets nothing', async () => {
    const dailyFollow = (await daily.agent.get('/api/follows/preferences').expect(200)).body.follows[0];
    const set = await daily.agent
      .put('/api/follows/preferences')
      .send({ timeZone: 'America/New_York', digestHour: 8, follows: [{ followId: dailyFollow.id, delivery: 'daily' }] })
      .expect(200);
    expect(set.body).toMatchObject({ timeZone: 'America/New_York', digestHour: 8, follows: [{ id: dailyFollow.id, delivery: 'daily' }] });
    const pausedFollow = (await paused.agent.get('/api/follows').expect(200)).body[0];
    expect((await paused.agent.patch(`/api/follows/${pausedFollow.id}`).send({ delivery: 'paused' }).expect(200)).body.follows[0].delivery).toBe('paused');

    for (const [index, id] of checkIds.entries()) {
      await owner.agent.post(`${base}/checks/${id}/transitions`).send({ to: 'confirmed', reason: `step ${index + 1}`, from: 'open' }).expect(201);
    }
    // The at-once follower hears of each change; the digest follower not yet (its 8:00 has not come).
    for (const title of checkTitles) await waitForMail(atOnce.email, { subject: `Fit confirmed: ${title}` });
    await settle();
    expect(await mailsTo(daily.email, /Fit confirmed|fit news/)).toHaveLength(0);

    // A day later by the clock: the digest that fell due at 08:00 New York time goes out.
    app.get(MailClock).set(new Date(Date.now() + 25 * 3_600_000));
    const digest = await waitForMail(daily.email, { subject: 'Your daily fit news: 3 changes', timeoutMs: 30_000 });
    const positions = checkTitles.map((title) => digest.text.indexOf(`- ${title}: open → confirmed`));
    expect(positions.every((position) => position > 0)).toBe(true);
    expect([...positions].sort((a, b) => a - b)).toEqual(positions);
    expect(digest.text).toContain('Digest guide (');
    expect(digest.headers?.['list-unsubscribe']).toMatch(/^<https?:\/\/[^>]+\/api\/follows\/unsubscribe\?token=[^>]+>$/);
    expect(digest.headers?.['list-unsubscribe-post']).toBe('List-Unsubscribe=One-Click');

    await settle();
    expect(await mailsTo(daily.email, /fit news|Fit confirmed/)).toHaveLength(1);
    expect(await mailsTo(paused.email, /fit news|Fit confirmed/)).toHaveLength(0);
    app.get(MailClock).set(new Date());
  });

  it('the creator sees how many followers were told of a change, and how many wait for a digest', async () => {
    const record = (await owner.agent.get(`${base}/checks/${checkIds[0]}/fit-news`).expect(200)).body;
    expect(record).toEqual([
      expect.objectContaining({ to: 'confirmed', told: 1, pending: 0, failed: 0, inDigests: 1, refusals: [] }),
    ]);
    expect(record[0].firstSentAt).not.toBeNull();
    // A follower is not a member: the record is the workshop's.
    await atOnce.agent.get(`${base}/checks/${checkIds[0]}/fit-news`).expect(404);
    expect((await owner.agent.post(`${base}/checks/${checkIds[0]}/fit-news/retry`).expect(200)).body[0]).toMatchObject({ told: 1, failed: 0 });
  });

  it('the build page’s record sums the news of every check of the build, latest change first', async () => {
    const record = (await owner.agent.get(`${base}/builds/${buildId}/fit-news`).expect(200)).body;
    expect(record).toMatchObject({ buildId, followersTold: 1, told: 3, pending: 0, failed: 0, inDigests: 3, uncertain: 0 });
    expect(record.checks.map((check: { checkId: string }) => check.checkId)).toEqual([...checkIds].reverse());
    expect(record.checks[0]).toMatchObject({
      checkTitle: checkTitles[2],
      assemblyName: 'Digest stack',
      changes: 1,
      lastChangeTo: 'confirmed',
      told: 1,
      inDigests: 1,
      uncertain: 0,
    });
    expect(Date.parse(record.firstSentAt)).toBeLessThanOrEqual(Date.parse(record.lastSentAt));
    // The workshop's record: a follower who is not a member does not see it; an unknown build is 404 naming it.
    await atOnce.agent.get(`${base}/builds/${buildId}/fit-news`).expect(404);
    const unknown = await owner.agent.get(`${base}/builds/00000000-0000-4000-8000-000000000000/fit-news`).expect(404);
    expect(unknown.body).toMatchObject({ code: 'build_not_found', errors: { buildId: expect.any(String) } });
    expect((await owner.agent.post(`${base}/builds/${buildId}/fit-news/retry`).expect(200)).body).toMatchObject({ told: 3, failed: 0 });
  });

  it('preferences and unsubscribe links work signed out, with tokens of at least 128 bits', async () => {
    const mails = await mailsTo(atOnce.email, /Fit confirmed/);
    expect(mails).toHaveLength(3);
    const tokens = mails.map((mail) => tokenFrom(mail, '/mail-preferences'));
    expect(new Set(tokens).size).toBe(3);
    for (const token of tokens) {
      // base64url: 6 bits a character; the raw bytes are what a guesser must find.
      expect(Buffer.from(token, 'base64url').length * 8).toBeGreaterThanOrEqual(128);
      expect(tokenFrom(mails[0], '/unsubscribe')).not.toBe('');
    }
    const signedOut = request(app.getHttpServer());
    const seen = await signedOut.get('/api/follows/preferences/link').query({ token: tokens[0] }).expect(200);
    expect(seen.body).toMatchObject({ email: atOnce.email, follows: [{ delivery: 'at_once' }] });
    const changed = await signedOut
      .put('/api/follows/preferences/link')
      .query({ token: tokens[0] })
      .send({ follows: [{ followId: seen.body.follows[0].id, delivery: 'weekly' }], digestWeekday: 5 })
      .expect(200);
    expect(changed.body).toMatchObject({ digestWeekday: 5, follows: [{ delivery: 'weekly' }] });
    const guessed = Buffer.from(tokens[0], 'base64url');
    guessed[0] ^= 1;
    await signedOut.get('/api/follows/preferences/link').query({ token: guessed.toString('base64url') }).expect(404);
  });

  it('the unsubscribe link can stop all fit news from the workshop, and says so', async () => {
    const mail = (await mailsTo(atOnce.email, /Fit confirmed/))[0];
    const answer = await request(app.getHttpServer())
      .post('/api/follows/unsubscribe')
      .send({ token: tokenFrom(mail, '/unsubscribe'), scope: 'workshop' })
      .expect(200);
    expect(answer.body).toMatchObject({ status: 'unfollowed', stopped: 'workshop', label: 'all fit news from Digest Shop', stillFollowing: [] });
    expect((await atOnce.agent.get('/api/follows').expect(200)).body).toEqual([]);
  });

  it('a digest’s unsubscribe link also stops the other follows it lists, one at a time, and refuses a workshop scope', async () => {
    const digest = (await mailsTo(daily.email, /Your daily fit news/))[0];
    const token = tokenFrom(digest, '/unsubscribe');
    const workshopFollow = (await daily.agent.post('/api/follows').send({ targetKind: 'workshop', targetId: workshopId }).expect(201)).body;
    const signedOut = request(app.getHttpServer());
    const first = await signedOut.post('/api/follows/unsubscribe').send({ token }).expect(200);
    expect(first.body).toMatchObject({ status: 'unfollowed', stopped: 'digest', label: 'your daily digest' });
    expect(first.body.stillFollowing.map((follow: { id: string }) => follow.id)).toEqual([workshopFollow.id]);

    // The page's "Stop" button beside that follow: the same digest link, with its id.
    const stopped = await signedOut.post('/api/follows/unsubscribe').send({ token, followId: workshopFollow.id }).expect(200);
    expect(stopped.body).toMatchObject({ status: 'unfollowed', stopped: 'follow', stillFollowing: [] });
    const left = (await daily.agent.get('/api/follows').expect(200)).body as { id: string; delivery: string }[];
    expect(left.map((follow) => follow.id)).not.toContain(workshopFollow.id);
    expect(left).toEqual([expect.objectContaining({ delivery: 'paused' })]);
    // Pressed twice, or a follow of someone else: nothing this link can stop.
    const again = await signedOut.post('/api/follows/unsubscribe').send({ token, followId: workshopFollow.id }).expect(404);
    expect(again.body.errors).toHaveProperty('followId');
    const othersFollow = (await paused.agent.get('/api/follows').expect(200)).body[0];
    await signedOut.post('/api/follows/unsubscribe').send({ token, followId: othersFollow.id }).expect(404);
    expect((await paused.agent.get('/api/follows').expect(200)).body).toHaveLength(1);

    const refused = await signedOut.post('/api/follows/unsubscribe').send({ token, scope: 'workshop' }).expect(400);
    expect(refused.body.errors).toHaveProperty('scope');
    const everything = await signedOut.post('/api/follows/unsubscribe').send({ token, scope: 'everything' }).expect(200);
    expect(everything.body).toMatchObject({ status: 'unfollowed', stopped: 'everything', label: 'all fit news', stillFollowing: [] });
    expect((await daily.agent.get('/api/follows').expect(200)).body).toEqual([]);
  });

  it('the mail telling the workshop of a new fit report carries the stop and preferences links and one-click headers', async () => {
    const before = await inboxSnapshot(owner.email);
    await paused.agent.post(`/api/guides/${workshopSlug}/digest-guide/fit-reports`).send({ outcome: 'fit', parts: 'DG-1 coupler' }).expect(201);
    const told = await waitForMail(owner.email, { subject: 'New fit report on “Digest guide”: it fit', excluding: before });
    const token = tokenFrom(told, '/unsubscribe');
    expect(Buffer.from(token, 'base64url').length * 8).toBeGreaterThanOrEqual(128);
    expect(told.headers?.['list-unsubscribe']).toMatch(/^<https?:\/\/[^>]+\/api\/follows\/unsubscribe\?token=[^>]+>$/);
    expect(told.headers?.['list-unsubscribe-post']).toBe('List-Unsubscribe=One-Click');

    const signedOut = request(app.getHttpServer());
    const preferencesToken = tokenFrom(told, '/mail-preferences');
    expect((await signedOut.get('/api/follows/preferences/link').query({ token: preferencesToken }).expect(200)).body).toMatchObject({
      email: owner.email,
      fitReportMail: 'at_once',
    });
    // The mail client's one-click POST (RFC 8058): the token in the address, the fixed body.
    const oneClick = new URL(told.headers!['list-unsubscribe'].slice(1, -1));
    const answer = await signedOut
      .post(`${oneClick.pathname}${oneClick.search}`)
      .type('form')
      .send('List-Unsubscribe=One-Click')
      .expect(200);
    expect(answer.body).toMatchObject({ status: 'unfollowed', stopped: 'fit_report_mail', label: 'mail about new fit reports' });
    expect((await owner.agent.get('/api/follows/preferences').expect(200)).body.fitReportMail).toBe('off');
    expect((await signedOut.post('/api/follows/unsubscribe').send({ token }).expect(200)).body.status).toBe('already');

    // Off means off: the next report brings the owner nothing.
    const quiet = await inboxSnapshot(owner.email);
    await paused.agent.post(`/api/guides/${workshopSlug}/digest-guide/fit-reports`).send({ outcome: 'no_fit', parts: 'DG-1 coupler' }).expect(201);
    await settle();
    expect((await mailsTo(owner.email, /New fit report/)).filter((mail) => !quiet.has(mail.id))).toHaveLength(0);
  });
});
