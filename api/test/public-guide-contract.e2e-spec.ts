import { NestExpressApplication } from '@nestjs/platform-express';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { loadDemoAccounts } from '../src/database/demo/demo-accounts';
import { loadDemoFitData } from '../src/database/demo/demo-fit-data';
import { loadDemoFootage } from '../src/database/demo/demo-footage';
import { DEMO_GUIDE_TITLE, loadDemoGuide } from '../src/database/demo/demo-guide';
import { loadDemoMarks } from '../src/database/demo/demo-marks';
import { createTestApp } from './create-test-app';
import { answerSchema, shapeProblems, type OpenApiDocument } from './support/openapi-shape';

// The demo clip may have to be generated first (about 15 s); later runs reuse it from .data/.
jest.setTimeout(180_000);

/** The public guide answers are exactly what the contract (and so the studio's generated types) says. */
describe('public guide answers match the OpenAPI contract (real MariaDB, Redis, S3 fake)', () => {
  let app: NestExpressApplication;
  let document: OpenApiDocument;
  let guidePath: string;
  beforeAll(async () => {
    app = await createTestApp();
    const accounts = await loadDemoAccounts(app.get(DataSource));
    const ids = { workshopId: accounts.workshopId, creatorId: accounts.ownerId };
    await loadDemoFitData(app, ids);
    await loadDemoFootage(app, ids);
    await loadDemoMarks(app, ids);
    await loadDemoGuide(app, ids);
    document = (await request(app.getHttpServer()).get('/api/docs/openapi.json').expect(200)).body;
    const index = (await request(app.getHttpServer()).get('/api/guides').query({ q: 'coupler stack' }).expect(200)).body;
    guidePath = index.find((item: { title: string }) => item.title === DEMO_GUIDE_TITLE).path;
  });
  afterAll(async () => app.close());

  it('the index: every card as PublishedGuideSummaryDto declares it', async () => {
    const index = (await request(app.getHttpServer()).get('/api/guides').expect(200)).body;
    expect(index.length).toBeGreaterThan(0);
    expect(shapeProblems(document, answerSchema(document, '/api/guides', 'get'), index)).toEqual([]);
  });

  it('the follow-along read: workshop, guide, footage, steps, parts, live checklist, follow targets and marks', async () => {
    const guide = (await request(app.getHttpServer()).get(`/api${guidePath}`).expect(200)).body;
    // The demo fills every part of the answer, so each nested schema is checked against real data.
    expect(guide.footage).not.toBeNull();
    expect(guide.checklist.checks.flatMap((check: { evidence: unknown[] }) => check.evidence).length).toBeGreaterThan(0);
    expect(guide.marks.length).toBeGreaterThan(0);
    expect(shapeProblems(document, answerSchema(document, '/api/guides/{workshopSlug}/{guideSlug}', 'get'), guide)).toEqual([]);
  });

  it('names a field the contract lacks, a missing one and a wrong enum', async () => {
    const guide = (await request(app.getHttpServer()).get(`/api${guidePath}`).expect(200)).body;
    const schema = answerSchema(document, '/api/guides/{workshopSlug}/{guideSlug}', 'get');
    const { disclaimer: _disclaimer, ...withoutDisclaimer } = guide;
    const drifted = { ...withoutDisclaimer, extra: 1, guide: { ...guide.guide, skillLevel: 'expert' } };
    expect(shapeProblems(document, schema, drifted).sort()).toEqual([
      '$.disclaimer is missing',
      '$.extra is not in the contract',
      '$.guide.skillLevel is "expert", not one of ["bench_starter","shop_regular","seasoned_fitter"]',
    ]);
  });
});
