import { NestExpressApplication } from '@nestjs/platform-express';
import request from 'supertest';
import { createTestApp } from './create-test-app';
import { signUpAndSignIn, TestAccount, uniqueSlug } from './support/accounts';
import { ONE_PIXEL_PNG } from './support/images';

jest.setTimeout(60_000);

describe('public guide: who confirmed a check, only where the workshop shows member names (real MariaDB)', () => {
  let app: NestExpressApplication;
  let owner: TestAccount;
  let base: string;
  let path: string;

  beforeAll(async () => {
    app = await createTestApp();
    owner = await signUpAndSignIn(app, { displayName: 'Rowan Fettle' });
    const slug = uniqueSlug('names');
    const workshopId = (await owner.agent.post('/api/workshops').send({ name: 'Names Shop', slug }).expect(201)).body.id;
    base = `/api/workshops/${workshopId}`;
    const buildId = (await owner.agent.post(`${base}/builds`).send({ title: 'Names build' }).expect(201)).body.id;
    const assemblyId = (await owner.agent.post(`${base}/builds/${buildId}/assemblies`).send({ name: 'Names stack' }).expect(201)).body.id;
    const checkId = (await owner.agent.post(`${base}/assemblies/${assemblyId}/checks`).send({ title: 'Test-fitted on the truck' }).expect(201)).body.id;
    await owner.agent.post(`${base}/checks/${checkId}/photos`).attach('photo', ONE_PIXEL_PNG, { filename: 'fit.png', contentType: 'image/png' }).expect(201);
    await owner.agent.post(`${base}/checks/${checkId}/transitions`).send({ to: 'confirmed', reason: 'Fitted on the truck' }).expect(201);
    const guideId = (await owner.agent.post(`${base}/builds/${buildId}/guides`).send({ title: 'Names guide', assemblyId }).expect(201)).body.id;
    await owner.agent.post(`${base}/guides/${guideId}/steps`).send({ title: 'Fit it' }).expect(201);
    await owner.agent.post(`${base}/guides/${guideId}/revisions`).send({}).expect(201);
    path = `/api/guides/${slug}/names-guide`;
  });
  afterAll(async () => app.close());

  it('keeps the name out by default, and shows it once the workshop turns member names on', async () => {
    const hidden = (await request(app.getHttpServer()).get(path).expect(200)).body;
    expect(hidden.checklist.checks[0]).toMatchObject({ state: 'confirmed', confirmedBy: null });
    expect(JSON.stringify(hidden)).not.toContain('Rowan Fettle');

    await owner.agent.patch(base).send({ showMemberNames: true }).expect(200);
    const shown = (await request(app.getHttpServer()).get(path).expect(200)).body;
    expect(shown.checklist.checks[0]).toMatchObject({ state: 'confirmed', confirmedBy: 'Rowan Fettle' });

    // Turned off again within the same second: the names go at once (the answer's tag carries the setting).
    await owner.agent.patch(base).send({ showMemberNames: false }).expect(200);
    expect((await request(app.getHttpServer()).get(path).expect(200)).body.checklist.checks[0].confirmedBy).toBeNull();
  });
});
