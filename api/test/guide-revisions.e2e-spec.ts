import { NestExpressApplication } from '@nestjs/platform-express';
import request from 'supertest';
import { createTestApp } from './create-test-app';
import { signUpAndSignIn, TestAccount, uniqueSlug } from './support/accounts';

jest.setTimeout(60_000);

describe('published guide revisions: list, read, compare, and the reader’s last-read record (real MariaDB)', () => {
  let app: NestExpressApplication;
  let owner: TestAccount;
  let reader: TestAccount;
  let base: string;
  let guideId: string;
  let path: string;
  const stepIds: Record<string, string> = {};

  beforeAll(async () => {
    app = await createTestApp();
    owner = await signUpAndSignIn(app);
    reader = await signUpAndSignIn(app);
    const workshopSlug = uniqueSlug('revisions');
    const workshopId = (await owner.agent.post('/api/workshops').send({ name: 'Revision Test Shop', slug: workshopSlug }).expect(201)).body.id;
    base = `/api/workshops/${workshopId}`;
    const buildId = (await owner.agent.post(`${base}/builds`).send({ title: 'Revision build' }).expect(201)).body.id;
    guideId = (await owner.agent.post(`${base}/builds/${buildId}/guides`).send({ title: 'Coupler swap' }).expect(201)).body.id;
    for (const [key, title, body] of [
      ['lift', 'Lift the truck', '<p>Set the axle stands under the frame.</p>'],
      ['bore', 'Measure the bore', '<p>Measure the bore at two depths.</p>'],
      ['old', 'Clean the spline', '<p>Wipe the spline dry.</p>'],
      ['fit', 'Fit the coupler', '<p>Slide the coupler on.</p>'],
    ]) {
      stepIds[key] = (await owner.agent.post(`${base}/guides/${guideId}/steps`).send({ title, body }).expect(201)).body.id;
    }
    await owner.agent.post(`${base}/guides/${guideId}/revisions`).send({ note: 'First' }).expect(201);
    // Revision 2: one step reworded, one removed, one added, and the fitting moved before the measuring.
    await owner.agent.patch(`${base}/guides/${guideId}/steps/${stepIds.bore}`).send({ body: '<p>Measure the bore at three depths.</p>' }).expect(200);
    await owner.agent.delete(`${base}/guides/${guideId}/steps/${stepIds.old}`).expect(204);
    stepIds.grease = (await owner.agent.post(`${base}/guides/${guideId}/steps`).send({ title: 'Grease the spline' }).expect(201)).body.id;
    await owner.agent
      .put(`${base}/guides/${guideId}/steps/order`)
      .send({ stepIds: [stepIds.lift, stepIds.fit, stepIds.bore, stepIds.grease] })
      .expect(200);
    await owner.agent.post(`${base}/guides/${guideId}/revisions`).send({ note: 'Second' }).expect(201);
    path = `/api/guides/${workshopSlug}/coupler-swap`;
  });
  afterAll(async () => app.close());

  const anonymous = () => request(app.getHttpServer());

  it('lists the published revisions newest first, for anyone', async () => {
    const list = (await anonymous().get(`${path}/revisions`).expect(200)).body;
    expect(list.currentRevision).toBe(2);
    expect(list.guide).toMatchObject({ title: 'Coupler swap', workshopName: 'Revision Test Shop' });
    expect(list.revisions.map((revision: { number: number; note: string; current: boolean }) => [revision.number, revision.note, revision.current])).toEqual([
      [2, 'Second', true],
      [1, 'First', false],
    ]);
  });

  it('opens an old revision read-only, as it was published', async () => {
    const old = (await anonymous().get(`${path}/revisions/1`).expect(200)).body;
    expect(old).toMatchObject({ number: 1, note: 'First', currentRevision: 2, checklist: [] });
    expect(old.steps.map((step: { title: string; number: number }) => [step.number, step.title])).toEqual([
      [1, 'Lift the truck'],
      [2, 'Measure the bore'],
      [3, 'Clean the spline'],
      [4, 'Fit the coupler'],
    ]);
    expect(old.steps[1].body).toBe('<p>Measure the bore at two depths.</p>');
  });

  it('compares two revisions: added, removed, moved and changed steps with word pieces', async () => {
    const diff = (await anonymous().get(`${path}/revisions/compare`).query({ from: 1, to: 2 }).expect(200)).body;
    expect(diff.from).toMatchObject({ number: 1, note: 'First' });
    expect(diff.to).toMatchObject({ number: 2, note: 'Second' });
    expect(diff.added).toEqual([{ id: stepIds.grease, title: 'Grease the spline', number: 4 }]);
    expect(diff.removed).toEqual([{ id: stepIds.old, title: 'Clean the spline', number: 3 }]);
    expect(diff.moved).toEqual([expect.objectContaining({ id: expect.any(String), fromNumber: expect.any(Number), toNumber: expect.any(Number) })]);
    expect(diff.changed).toHaveLength(1);
    expect(diff.changed[0]).toMatchObject({ id: stepIds.bore, fromNumber: 2, toNumber: 3 });
    expect(diff.changed[0].changes[0].pieces).toEqual([
      { change: 'same', text: 'Measure the bore at ' },
      { change: 'removed', text: 'two' },
      { change: 'added', text: 'three' },
      { change: 'same', text: ' depths.' },
    ]);
    // The other way round is a comparison too: what was added is now removed.
    const back = (await anonymous().get(`${path}/revisions/compare`).query({ from: 2, to: 1 }).expect(200)).body;
    expect(back.removed.map((step: { id: string }) => step.id)).toEqual([stepIds.grease]);
  });

  it('refuses bad numbers with 400 and missing revisions with 404, naming the field', async () => {
    const missing = await anonymous().get(`${path}/revisions/compare`).query({ from: 1 }).expect(400);
    expect(missing.body.errors.to).toBeDefined();
    const notWhole = await anonymous().get(`${path}/revisions/compare`).query({ from: 'one', to: 2 }).expect(400);
    expect(notWhole.body.errors.from).toEqual(expect.any(String));
    await anonymous().get(`${path}/revisions/0`).expect(400);
    const absent = await anonymous().get(`${path}/revisions/compare`).query({ from: 1, to: 9 }).expect(404);
    expect(absent.body).toMatchObject({ code: 'revision_not_found', errors: { to: expect.stringContaining('no published revision 9') } });
    await anonymous().get(`${path}/revisions/9`).expect(404);
    await anonymous().get('/api/guides/no-such-shop/coupler-swap/revisions').expect(404);
  });

  it('records what a signed-in reader last opened; signed out there is nothing to read', async () => {
    const anon = await anonymous().get(`${path}/reading`).expect(401);
    expect(anon.body.code).toBe('sign_in_required');
    const first = await reader.agent.get(`${path}/reading`).expect(200);
    expect(first.headers['cache-control']).toContain('no-store');
    expect(first.body).toEqual({ currentRevision: 2, lastReadRevision: null, lastReadAt: null });
    const recorded = (await reader.agent.put(`${path}/reading`).expect(200)).body;
    expect(recorded).toMatchObject({ currentRevision: 2, lastReadRevision: 2 });
    // The creator publishes revision 3: the reader's record still says 2, so the guide can say "updated since".
    await owner.agent.patch(`${base}/guides/${guideId}/steps/${stepIds.lift}`).send({ title: 'Lift the truck safely' }).expect(200);
    await owner.agent.post(`${base}/guides/${guideId}/revisions`).send({ note: 'Third' }).expect(201);
    expect((await reader.agent.get(`${path}/reading`).expect(200)).body).toMatchObject({ currentRevision: 3, lastReadRevision: 2 });
    // The shared follow-along answer carries nobody's reading.
    expect(JSON.stringify((await reader.agent.get(path).expect(200)).body)).not.toContain('lastRead');
  });

  it('never shows a draft, and a withdrawn guide has no revisions to show', async () => {
    await owner.agent.patch(`${base}/guides/${guideId}/steps/${stepIds.lift}`).send({ title: 'A draft title nobody published' }).expect(200);
    const latest = (await anonymous().get(`${path}/revisions/3`).expect(200)).body;
    expect(JSON.stringify(latest)).not.toContain('A draft title nobody published');
    await anonymous().get(`${path}/revisions/4`).expect(404);

    await owner.agent.delete(`${base}/guides/${guideId}/publication`).expect(204);
    await anonymous().get(`${path}/revisions`).expect(404);
    await anonymous().get(`${path}/revisions/1`).expect(404);
    await anonymous().get(`${path}/revisions/compare`).query({ from: 1, to: 2 }).expect(404);
    await reader.agent.get(`${path}/reading`).expect(404);
    await reader.agent.put(`${path}/reading`).expect(404);
  });
});
