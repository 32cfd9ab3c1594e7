import { NestExpressApplication } from '@nestjs/platform-express';
import { createTestApp } from './create-test-app';
import { signUpAndSignIn, TestAccount, uniqueSlug } from './support/accounts';

jest.setTimeout(60_000);

describe('deletion impact: what a delete takes with it, counted before asking (real MariaDB)', () => {
  let app: NestExpressApplication;
  let owner: TestAccount;
  let stranger: TestAccount;
  let base: string;
  let buildId: string;
  let assemblyId: string;
  let footageId: string;

  beforeAll(async () => {
    app = await createTestApp();
    owner = await signUpAndSignIn(app);
    stranger = await signUpAndSignIn(app);
    const workshopId = (await owner.agent.post('/api/workshops').send({ name: 'Impact Shop', slug: uniqueSlug('impact') }).expect(201)).body.id;
    base = `/api/workshops/${workshopId}`;
    buildId = (await owner.agent.post(`${base}/builds`).send({ title: 'Impact build' }).expect(201)).body.id;
    assemblyId = (await owner.agent.post(`${base}/builds/${buildId}/assemblies`).send({ name: 'Impact stack' }).expect(201)).body.id;
    await owner.agent.post(`${base}/assemblies/${assemblyId}/checks`).send({ title: 'Test-fitted' }).expect(201);
    await owner.agent.post(`${base}/assemblies/${assemblyId}/checks`).send({ title: 'Runout under 0.05 mm' }).expect(201);
    // A footage row waiting for its upload is enough for a guide and a step to point at it.
    footageId = (
      await owner.agent
        .post(`${base}/builds/${buildId}/footage`)
        .send({ fileName: 'impact.mp4', contentType: 'video/mp4', sizeBytes: 1_000_000, title: 'Impact clip' })
        .expect(201)
    ).body.footage.id;
    const guideId = (await owner.agent.post(`${base}/builds/${buildId}/guides`).send({ title: 'Impact guide', assemblyId, footageId }).expect(201)).body.id;
    await owner.agent.post(`${base}/guides/${guideId}/steps`).send({ title: 'Only step' }).expect(201);
    await owner.agent.post(`${base}/guides/${guideId}/revisions`).send({}).expect(201);
  });
  afterAll(async () => app.close());

  it('counts what goes with a build: its assemblies, checks, footage and guides, saying how many are published', async () => {
    const impact = (await owner.agent.get(`${base}/builds/${buildId}/deletion-impact`).expect(200)).body;
    expect(impact.name).toBe('Impact build');
    expect(impact.items.map((item: { text: string }) => item.text)).toEqual([
      '1 assembly',
      '2 fit checks',
      '1 footage',
      '1 guide',
      '1 of them published (readers lose it)',
    ]);
  });

  it('says what an assembly takes and which guides lose their checklist', async () => {
    const impact = (await owner.agent.get(`${base}/assemblies/${assemblyId}/deletion-impact`).expect(200)).body;
    expect(impact.items).toEqual([
      { key: 'fitChecks', count: 2, effect: 'deleted', text: '2 fit checks' },
      { key: 'guides', count: 1, effect: 'unlinked', text: '1 guide loses its checklist and parts list' },
    ]);
  });

  it('says which guides lose their video with a footage, and the counts follow the data', async () => {
    const before = (await owner.agent.get(`${base}/footage/${footageId}/deletion-impact`).expect(200)).body;
    expect(before).toEqual({ name: 'Impact clip', items: [{ key: 'guides', count: 1, effect: 'unlinked', text: '1 guide loses its video' }] });
    // Deleting the assembly really unlinks the guide the count named, and the build's count follows.
    await owner.agent.delete(`${base}/assemblies/${assemblyId}`).expect(204);
    const build = (await owner.agent.get(`${base}/builds/${buildId}/deletion-impact`).expect(200)).body;
    expect(build.items.map((item: { key: string }) => item.key)).toEqual(['footage', 'guides', 'publishedGuides']);
  });

  it('answers 404 for another workshop’s caller and for an id it does not know', async () => {
    await stranger.agent.get(`${base}/builds/${buildId}/deletion-impact`).expect(404);
    await owner.agent.get(`${base}/footage/00000000-0000-4000-8000-000000000000/deletion-impact`).expect(404);
  });
});
