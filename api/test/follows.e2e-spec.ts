import { NestExpressApplication } from '@nestjs/platform-express';
import request from 'supertest';
import { createTestApp } from './create-test-app';
import { signUpAndSignIn, TestAccount, uniqueSlug } from './support/accounts';
import { inboxSnapshot, linkFrom, listMail, tokenFrom, waitForMail } from './support/mail-inbox';

jest.setTimeout(90_000);


/** Resolves when the mail job has had time to send anything queued (the fan-out runs on the Bull worker). */
const settle = () => new Promise((resolve) => setTimeout(resolve, 3000));

describe('follows and fit-news e-mails (real MariaDB, Redis, mail fake)', () => {
  let app: NestExpressApplication;
  let owner: TestAccount;
  let viewer: TestAccount;
  let unconfirmed: TestAccount;
  let base: string;
  let workshopId: string;
  let workshopSlug: string;
  let buildId: string;
  let assemblyId: string;
  let checkId: string;
  let otherCheckId: string;
  let draftBuildId: string;
  let measurementId: string;

  beforeAll(async () => {
    app = await createTestApp();
    [owner, viewer, unconfirmed] = await Promise.all([signUpAndSignIn(app), signUpAndSignIn(app), signUpAndSignIn(app, { verify: false })]);
    workshopSlug = uniqueSlug('follows');
    workshopId = (await owner.agent.post('/api/workshops').send({ name: 'Follow Test Shop', slug: workshopSlug }).expect(201)).body.id;
    base = `/api/workshops/${workshopId}`;
    buildId = (await owner.agent.post(`${base}/builds`).send({ title: 'Coupler build' }).expect(201)).body.id;
    draftBuildId = (await owner.agent.post(`${base}/builds`).send({ title: 'Secret build' }).expect(201)).body.id;
    const part = (
      await owner.agent
        .post(`${base}/parts`)
        .send({ partNumber: 'FT-1', title: 'Test coupler', category: 'coupler', features: [{ name: 'bore', kind: 'diameter', role: 'hole', nominal: '15', unit: 'mm' }] })
        .expect(201)
    ).body;
    assemblyId = (await owner.agent.post(`${base}/builds/${buildId}/assemblies`).send({ name: 'Test stack' }).expect(201)).body.id;
    await owner.agent.put(`${base}/assemblies/${assemblyId}/parts/${part.id}`).send({ position: 'input side' }).expect(204);
    checkId = (await owner.agent.post(`${base}/assemblies/${assemblyId}/checks`).send({ title: 'Test-fitted on the truck' }).expect(201)).body.id;
    otherCheckId = (await owner.agent.post(`${base}/assemblies/${assemblyId}/checks`).send({ title: 'Boot clears the frame' }).expect(201)).body.id;
    measurementId = (
      await owner.agent
        .post(`${base}/measurements`)
        .send({ featureId: part.features[0].id, quantity: 'diameter', value: '15.008', unit: 'mm', instrumentKind: 'bore_gauge', resolution: '0.001' })
        .expect(201)
    ).body.id;
    const guideId = (await owner.agent.post(`${base}/builds/${buildId}/guides`).send({ title: 'Follow test guide', assemblyId }).expect(201)).body.id;
    await owner.agent.post(`${base}/guides/${guideId}/steps`).send({ title: 'Fit it' }).expect(201);
    await owner.agent.post(`${base}/guides/${guideId}/revisions`).send({}).expect(201);
  });
  afterAll(async () => app.close());

  it('lets signed-in people follow what a published guide shows, once, and nothing private', async () => {
    const guide = await request(app.getHttpServer()).get(`/api/guides/${workshopSlug}/follow-test-guide`).expect(200);
    expect(guide.body.followTargets).toEqual({
      workshop: { id: workshopId, label: 'Follow Test Shop' },
      build: { id: buildId, label: 'Coupler build' },
      assembly: { id: assemblyId, label: 'Test stack' },
    });
    const first = await viewer.agent.post('/api/follows').send({ targetKind: 'assembly', targetId: assemblyId }).expect(201);
    const again = await viewer.agent.post('/api/follows').send({ targetKind: 'assembly', targetId: assemblyId }).expect(200);
    expect(again.body.id).toBe(first.body.id);
    // The same person also follows the workshop: they will still hear once.
    await viewer.agent.post('/api/follows').send({ targetKind: 'workshop', targetId: workshopId }).expect(201);
    const secret = await viewer.agent.post('/api/follows').send({ targetKind: 'build', targetId: draftBuildId }).expect(404);
    expect(secret.body.message).toBe('Nothing to follow here');
    await request(app.getHttpServer()).post('/api/follows').send({ targetKind: 'build', targetId: buildId }).expect(401);
    await viewer.agent.post('/api/follows').send({ targetKind: 'galaxy', targetId: buildId }).expect(400);
    // Members may follow their own unpublished things; an unconfirmed address may follow but gets no mail.
    await owner.agent.post('/api/follows').send({ targetKind: 'build', targetId: draftBuildId }).expect(201);
    await owner.agent.post('/api/follows').send({ targetKind: 'assembly', targetId: assemblyId }).expect(201);
    await unconfirmed.agent.post('/api/follows').send({ targetKind: 'build', targetId: buildId }).expect(201);

    const mine = await viewer.agent.get('/api/follows').expect(200);
    expect(mine.body.map((follow: { targetKind: string; label: string }) => [follow.targetKind, follow.label]).sort()).toEqual([
      ['assembly', 'Test stack'],
      ['workshop', 'Follow Test Shop'],
    ]);
    expect(mine.body[0].workshop).toEqual({ name: 'Follow Test Shop', slug: workshopSlug });
  });

  it('e-mails each follower once when a check is confirmed, with the evidence, the checklist link and a one-click way out', async () => {
    const before = await inboxSnapshot(viewer.email);
    await owner.agent.post(`${base}/checks/${checkId}/evidence`).send({ kind: 'measurement', measurementId }).expect(201);
    await owner.agent.post(`${base}/checks/${checkId}/transitions`).send({ to: 'confirmed', reason: 'Bolted up, turns by hand' }).expect(201);

    const mail = await waitForMail(viewer.email, { subject: 'Fit confirmed: Test-fitted on the truck', excluding: before });
    expect(mail.text).toContain('Follow Test Shop has confirmed it fits, test-fitted on the vehicle: “Test-fitted on the truck” in “Test stack” (Coupler build).');
    expect(mail.text).toContain('Their note: Bolted up, turns by hand');
    expect(mail.text).toContain('Evidence: a reading of 15.008 mm.');
    expect(mail.text).toContain('You get this because you follow Test stack.');
    expect(linkFrom(mail, '/guides/').toString()).toMatch(new RegExp(`/guides/${workshopSlug}/follow-test-guide#checklist$`));
    expect(mail.headers?.['list-unsubscribe-post']).toBe('List-Unsubscribe=One-Click');
    expect(mail.headers?.['list-unsubscribe']).toMatch(/^<http.*\/api\/follows\/unsubscribe\?token=[\w-]+>$/);

    await settle();
    const all = await listMail();
    const about = (address: string) => all.filter((message) => message.to.some((to) => to.address === address) && message.subject.startsWith('Fit confirmed: Test-fitted'));
    expect(about(viewer.email)).toHaveLength(1); // follows the assembly and the workshop: one mail
    expect(about(owner.email)).toHaveLength(0); // made the change
    expect(about(unconfirmed.email)).toHaveLength(0); // address not confirmed
  });

  it('says nothing for a change that is not news, and e-mails "no fit" too', async () => {
    const before = await inboxSnapshot(viewer.email);
    await owner.agent.post(`${base}/checks/${otherCheckId}/transitions`).send({ to: 'no_fit', reason: 'Boot rubs the frame rail' }).expect(201);
    const mail = await waitForMail(viewer.email, { subject: 'No fit: Boot clears the frame', excluding: before });
    expect(mail.text).toContain('found that it does not fit');
    // Re-opening is not news.
    await owner.agent.post(`${base}/checks/${otherCheckId}/transitions`).send({ to: 'open', reason: 'New boot on order' }).expect(201);
    await settle();
    const after = (await listMail()).filter((message) => !before.has(message.id) && message.to.some((to) => to.address === viewer.email));
    expect(after.map((message) => message.subject)).toEqual(['No fit: Boot clears the frame']);
  });

  it('unfollows from the e-mail without signing in: one-click POST, then "already"; unknown tokens are refused', async () => {
    const mail = await waitForMail(viewer.email, { subject: 'Fit confirmed: Test-fitted on the truck' });
    const token = tokenFrom(mail, '/unsubscribe');
    const anonymous = request(app.getHttpServer());
    // What a mail client sends for RFC 8058 one-click unsubscribe.
    const first = await anonymous
      .post(`/api/follows/unsubscribe?token=${encodeURIComponent(token)}`)
      .type('form')
      .send('List-Unsubscribe=One-Click')
      .expect(200);
    expect(first.body).toMatchObject({ status: 'unfollowed', stopped: 'follow', label: 'Test stack' });
    // The workshop follow would still bring news of this assembly: the page names it.
    expect(first.body.stillFollowing.map((follow: { targetKind: string; label: string }) => [follow.targetKind, follow.label])).toEqual([
      ['workshop', 'Follow Test Shop'],
    ]);
    const second = await anonymous.post('/api/follows/unsubscribe').send({ token }).expect(200);
    expect(second.body).toMatchObject({ status: 'already', label: 'Test stack' });
    await anonymous.post('/api/follows/unsubscribe').send({ token: 'x'.repeat(43) }).expect(404);
    const mine = await viewer.agent.get('/api/follows').expect(200);
    expect(mine.body.map((follow: { targetKind: string }) => follow.targetKind)).toEqual(['workshop']);
  });

  it('unfollows from the account, only one’s own', async () => {
    const [follow] = (await viewer.agent.get('/api/follows').expect(200)).body;
    await owner.agent.delete(`/api/follows/${follow.id}`).expect(404);
    await viewer.agent.delete(`/api/follows/${follow.id}`).expect(204);
    expect((await viewer.agent.get('/api/follows').expect(200)).body).toEqual([]);
  });
});
