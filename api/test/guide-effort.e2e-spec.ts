import { NestExpressApplication } from '@nestjs/platform-express';
import request from 'supertest';
import { createTestApp } from './create-test-app';
import { signUpAndSignIn, TestAccount, uniqueSlug } from './support/accounts';

jest.setTimeout(60_000);

describe('guides: skill level and estimated time (real MariaDB)', () => {
  let app: NestExpressApplication;
  let owner: TestAccount;
  let base: string;
  let buildId: string;
  let workshopSlug: string;

  beforeAll(async () => {
    app = await createTestApp();
    owner = await signUpAndSignIn(app);
    workshopSlug = uniqueSlug('effort');
    const workshopId = (await owner.agent.post('/api/workshops').send({ name: 'Effort Test Shop', slug: workshopSlug }).expect(201)).body.id;
    base = `/api/workshops/${workshopId}`;
    buildId = (await owner.agent.post(`${base}/builds`).send({ title: 'Effort build', vehicle: 'Test pickup' }).expect(201)).body.id;
  });
  afterAll(async () => app.close());

  it('refuses a level off the scale and times that are not whole minutes in range, naming the field', async () => {
    const guideId = (await owner.agent.post(`${base}/builds/${buildId}/guides`).send({ title: 'Refusals' }).expect(201)).body.id;
    const offScale = await owner.agent.patch(`${base}/guides/${guideId}`).send({ skillLevel: 'expert' }).expect(400);
    expect(offScale.body.errors.skillLevel).toBe('skillLevel must be one of bench_starter, shop_regular, seasoned_fitter');
    for (const [value, words] of [
      [0, 'at least 1 minute'],
      [6001, 'at most 6000 minutes'],
      [12.5, 'a whole number of minutes'],
    ] as const) {
      const refused = await owner.agent.patch(`${base}/guides/${guideId}`).send({ estimatedMinutes: value }).expect(400);
      expect(refused.body.errors.estimatedMinutes).toContain(`estimatedMinutes must be ${words}`);
    }
    const longStep = await owner.agent.post(`${base}/guides/${guideId}/steps`).send({ title: 'Too long', estimatedMinutes: 1441 }).expect(400);
    expect(longStep.body.errors.estimatedMinutes).toContain('estimatedMinutes must be at most 1440 minutes');
    // Nothing was stored by the refusals.
    expect((await owner.agent.get(`${base}/guides/${guideId}`).expect(200)).body).toMatchObject({ skillLevel: null, estimatedMinutes: null, steps: [] });
  });

  it('stores the level and times on the draft, publishes them in the revision and shows them on the index and the guide', async () => {
    const created = await owner.agent
      .post(`${base}/builds/${buildId}/guides`)
      .send({ title: 'Effort guide', skillLevel: 'shop_regular', estimatedMinutes: 90 })
      .expect(201);
    const guideId = created.body.id;
    expect(created.body).toMatchObject({ skillLevel: 'shop_regular', estimatedMinutes: 90 });
    const timed = await owner.agent.post(`${base}/guides/${guideId}/steps`).send({ title: 'Press the bearing', estimatedMinutes: 25 }).expect(201);
    expect(timed.body.estimatedMinutes).toBe(25);
    const untimed = await owner.agent.post(`${base}/guides/${guideId}/steps`).send({ title: 'Look it over' }).expect(201);
    expect(untimed.body.estimatedMinutes).toBeNull();

    const summary = (await owner.agent.get(`${base}/builds/${buildId}/guides`).expect(200)).body.find((guide: { id: string }) => guide.id === guideId);
    expect(summary).toMatchObject({ skillLevel: 'shop_regular', estimatedMinutes: 90 });

    await owner.agent.post(`${base}/guides/${guideId}/revisions`).send({}).expect(201);
    const path = `/api/guides/${workshopSlug}/effort-guide`;
    const read = (await request(app.getHttpServer()).get(path).expect(200)).body;
    expect(read.guide).toMatchObject({ skillLevel: 'shop_regular', estimatedMinutes: 90 });
    expect(read.steps.map((step: { title: string; estimatedMinutes: number | null }) => [step.title, step.estimatedMinutes])).toEqual([
      ['Press the bearing', 25],
      ['Look it over', null],
    ]);
    const index = (await request(app.getHttpServer()).get('/api/guides').query({ q: 'Effort Test Shop' }).expect(200)).body;
    expect(index.find((entry: { slug: string }) => entry.slug === 'effort-guide')).toMatchObject({ skillLevel: 'shop_regular', estimatedMinutes: 90 });

    // A draft change is an unpublished change; readers keep the published snapshot until the next publish.
    const edited = await owner.agent.patch(`${base}/guides/${guideId}`).send({ skillLevel: 'seasoned_fitter', estimatedMinutes: null }).expect(200);
    expect(edited.body).toMatchObject({ skillLevel: 'seasoned_fitter', estimatedMinutes: null, hasUnpublishedChanges: true });
    expect((await request(app.getHttpServer()).get(path).expect(200)).body.guide).toMatchObject({ skillLevel: 'shop_regular', estimatedMinutes: 90 });
    await owner.agent.patch(`${base}/guides/${guideId}/steps/${timed.body.id}`).send({ estimatedMinutes: null }).expect(200);
    await owner.agent.post(`${base}/guides/${guideId}/revisions`).send({}).expect(201);
    const republished = (await request(app.getHttpServer()).get(path).expect(200)).body;
    expect(republished.guide).toMatchObject({ skillLevel: 'seasoned_fitter', estimatedMinutes: null });
    expect(republished.steps.map((step: { estimatedMinutes: number | null }) => step.estimatedMinutes)).toEqual([null, null]);
  });

  it('a guide without a level or times publishes as before: no unpublished changes right after publishing', async () => {
    const guideId = (await owner.agent.post(`${base}/builds/${buildId}/guides`).send({ title: 'Plain guide' }).expect(201)).body.id;
    await owner.agent.post(`${base}/guides/${guideId}/steps`).send({ title: 'One step' }).expect(201);
    await owner.agent.post(`${base}/guides/${guideId}/revisions`).send({}).expect(201);
    const guide = (await owner.agent.get(`${base}/guides/${guideId}`).expect(200)).body;
    expect(guide).toMatchObject({ hasUnpublishedChanges: false, skillLevel: null, estimatedMinutes: null });
    const read = (await request(app.getHttpServer()).get(`/api/guides/${workshopSlug}/plain-guide`).expect(200)).body;
    expect(read.guide).toMatchObject({ skillLevel: null, estimatedMinutes: null });
  });
});
