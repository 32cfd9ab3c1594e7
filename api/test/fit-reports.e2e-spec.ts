import { NestExpressApplication } from '@nestjs/platform-express';
import request from 'supertest';
import { createTestApp } from './create-test-app';
import { ONE_PIXEL_PNG as PNG } from './support/images';
import { signUpAndSignIn, TestAccount, uniqueSlug } from './support/accounts';
import { inboxSnapshot, linkFrom, waitForMail } from './support/mail-inbox';

jest.setTimeout(90_000);


describe('fit reports (real MariaDB, S3 fake, mail fake)', () => {
  let app: NestExpressApplication;
  let owner: TestAccount;
  let reporter: TestAccount;
  let stranger: TestAccount;
  let base: string;
  let workshopSlug: string;
  let checkId: string;
  let measurementId: string;
  let reportPath: string;
  let reportId: string;

  beforeAll(async () => {
    app = await createTestApp();
    [owner, reporter, stranger] = await Promise.all([signUpAndSignIn(app), signUpAndSignIn(app), signUpAndSignIn(app)]);
    workshopSlug = uniqueSlug('reports');
    const workshopId = (await owner.agent.post('/api/workshops').send({ name: 'Report Test Shop', slug: workshopSlug }).expect(201)).body.id;
    base = `/api/workshops/${workshopId}`;
    const buildId = (await owner.agent.post(`${base}/builds`).send({ title: 'Coupler build' }).expect(201)).body.id;
    const part = (
      await owner.agent
        .post(`${base}/parts`)
        .send({ partNumber: 'RT-1', title: 'Test coupler', category: 'coupler', features: [{ name: 'bore', kind: 'diameter', role: 'hole', nominal: '15', unit: 'mm' }] })
        .expect(201)
    ).body;
    const assemblyId = (await owner.agent.post(`${base}/builds/${buildId}/assemblies`).send({ name: 'Reported stack' }).expect(201)).body.id;
    checkId = (await owner.agent.post(`${base}/assemblies/${assemblyId}/checks`).send({ title: 'Follower combination fits' }).expect(201)).body.id;
    measurementId = (
      await owner.agent
        .post(`${base}/measurements`)
        .send({ featureId: part.features[0].id, quantity: 'diameter', value: '15.010', unit: 'mm', instrumentKind: 'bore_gauge', resolution: '0.001' })
        .expect(201)
    ).body.id;
    const guideId = (await owner.agent.post(`${base}/builds/${buildId}/guides`).send({ title: 'Reported guide' }).expect(201)).body.id;
    await owner.agent.post(`${base}/guides/${guideId}/steps`).send({ title: 'Fit it' }).expect(201);
    await owner.agent.post(`${base}/guides/${guideId}/revisions`).send({}).expect(201);
    await owner.agent.post(`${base}/builds/${buildId}/guides`).send({ title: 'Unpublished guide' }).expect(201);
    reportPath = `/api/guides/${workshopSlug}/reported-guide/fit-reports`;
  });
  afterAll(async () => app.close());

  it('takes a signed-in reader’s report from a published guide, checked field by field', async () => {
    await request(app.getHttpServer()).post(reportPath).send({ outcome: 'fit', parts: 'x' }).expect(401);
    const missing = await reporter.agent.post(reportPath).send({ outcome: 'maybe' }).expect(400);
    expect(JSON.stringify(missing.body)).toMatch(/outcome/);
    expect(JSON.stringify(missing.body)).toMatch(/parts/);
    await reporter.agent.post(`/api/guides/${workshopSlug}/unpublished-guide/fit-reports`).send({ outcome: 'fit', parts: 'x' }).expect(404);

    const ownerInboxBefore = await inboxSnapshot(owner.email);
    const created = await reporter.agent
      .post(reportPath)
      .send({ outcome: 'fit', parts: '  RT-1 coupler on a 5-speed input shaft  ', vehicle: '1986 compact pickup', notes: 'Slid on by hand.' })
      .expect(201);
    reportId = created.body.id;
    // The workshop hears of it by e-mail (queued as a mail job), with a link to its Fit reports page.
    const told = await waitForMail(owner.email, { subject: 'New fit report on “Reported guide”: it fit', excluding: ownerInboxBefore });
    expect(told.text).toContain('Parts: RT-1 coupler on a 5-speed input shaft');
    expect(told.text).not.toContain(reporter.email);
    expect(linkFrom(told, `${base.replace('/api', '')}/fit-reports`).pathname).toBe(`${base.replace('/api', '')}/fit-reports`);
    expect(created.body).toMatchObject({
      outcome: 'fit',
      parts: 'RT-1 coupler on a 5-speed input shaft',
      status: 'new',
      fitCheck: null,
      guide: { title: 'Reported guide', path: `/guides/${workshopSlug}/reported-guide` },
      build: { title: 'Coupler build' },
      workshop: { name: 'Report Test Shop', slug: workshopSlug },
      photos: [],
    });
  });

  it('stores the reporter’s photos (images only) and shows them to the reporter and the workshop, nobody else', async () => {
    const withPhoto = await reporter.agent.post(`/api/fit-reports/${reportId}/photos`).attach('photo', PNG, 'fitted.png').expect(201);
    expect(withPhoto.body.photos).toHaveLength(1);
    const refused = await reporter.agent
      .post(`/api/fit-reports/${reportId}/photos`)
      .attach('photo', Buffer.from('<svg xmlns="http://www.w3.org/2000/svg"/>'), 'sneaky.png')
      .expect(400);
    expect(refused.body.message).toBe('The photo must be a PNG, JPEG or WebP image');
    await stranger.agent.post(`/api/fit-reports/${reportId}/photos`).attach('photo', PNG, 'x.png').expect(404);

    const photoId = withPhoto.body.photos[0].id;
    const mine = await reporter.agent.get(`/api/fit-reports/${reportId}/photos/${photoId}`).expect(302);
    const stored = await fetch(mine.headers.location);
    expect(Buffer.from(await stored.arrayBuffer()).equals(PNG)).toBe(true);
    await stranger.agent.get(`/api/fit-reports/${reportId}/photos/${photoId}`).expect(404);
    await owner.agent.get(`${base}/fit-reports/${reportId}/photos/${photoId}`).expect(302);
  });

  it('lists reports for the workshop by status, with the reporter’s name but never their address', async () => {
    const inbox = await owner.agent.get(`${base}/fit-reports`).query({ status: 'new' }).expect(200);
    expect(inbox.body.map((report: { id: string }) => report.id)).toEqual([reportId]);
    expect(inbox.body[0].reporter).toEqual({ displayName: reporter.displayName });
    expect(JSON.stringify(inbox.body)).not.toContain(reporter.email);
    expect(inbox.body[0].photos[0].url).toMatch(new RegExp(`^${base}/fit-reports/${reportId}/photos/`));
    expect((await owner.agent.get(`${base}/fit-reports`).query({ status: 'verified' }).expect(200)).body).toEqual([]);
    await stranger.agent.get(`${base}/fit-reports`).expect(404);
    const mine = await reporter.agent.get('/api/fit-reports').expect(200);
    expect(mine.body.map((report: { id: string }) => report.id)).toEqual([reportId]);
    expect((await stranger.agent.get('/api/fit-reports').expect(200)).body).toEqual([]);
  });

  it('ties a report to a check (new becomes investigating) and e-mails the reporter when the check is confirmed', async () => {
    await owner.agent.patch(`${base}/fit-reports/${reportId}`).send({ fitCheckId: '00000000-0000-4000-8000-000000000000' }).expect(404);
    const tied = await owner.agent.patch(`${base}/fit-reports/${reportId}`).send({ fitCheckId: checkId, creatorNote: 'Testing it on our truck this week.' }).expect(200);
    expect(tied.body).toMatchObject({
      status: 'investigating',
      creatorNote: 'Testing it on our truck this week.',
      fitCheck: { id: checkId, title: 'Follower combination fits', state: 'open', assemblyName: 'Reported stack' },
    });

    const before = await inboxSnapshot(reporter.email);
    await owner.agent.post(`${base}/checks/${checkId}/evidence`).send({ kind: 'measurement', measurementId }).expect(201);
    await owner.agent.post(`${base}/checks/${checkId}/transitions`).send({ to: 'confirmed', reason: 'Fits our truck too' }).expect(201);
    const mail = await waitForMail(reporter.email, { subject: 'Fit confirmed: Follower combination fits', excluding: before });
    expect(mail.text).toContain('You get this because you sent a fit report that this check verifies.');
    expect(mail.text).toContain('Evidence: a reading of 15.010 mm.');
    // No guide shows this assembly, so the link goes to the reporter's own reports; the mail still carries its way out.
    expect(linkFrom(mail, '/account').pathname).toBe('/account');
    expect(mail.headers?.['list-unsubscribe']).toMatch(/^<http.*\/api\/follows\/unsubscribe\?token=[\w-]+>$/);

    const verified = await owner.agent.patch(`${base}/fit-reports/${reportId}`).send({ status: 'verified' }).expect(200);
    expect(verified.body.status).toBe('verified');
    await reporter.agent.post(`/api/fit-reports/${reportId}/photos`).attach('photo', PNG, 'late.png').expect(400);
  });

  it('limits a person to 10 reports an hour with a readable 429', async () => {
    for (let sent = 1; sent < 10; sent++) await reporter.agent.post(reportPath).send({ outcome: 'no_fit', parts: `try ${sent}` }).expect(201);
    const limited = await reporter.agent.post(reportPath).send({ outcome: 'no_fit', parts: 'one too many' }).expect(429);
    expect(limited.body.message).toMatch(/10 fit reports in the last hour/);
  });
});
