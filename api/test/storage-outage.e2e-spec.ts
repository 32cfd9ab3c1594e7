import { NestExpressApplication } from '@nestjs/platform-express';
import { randomBytes } from 'node:crypto';
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import request from 'supertest';
import { createTestApp } from './create-test-app';
import { signUpAndSignIn, TestAccount, uniqueSlug } from './support/accounts';
import { removeScratch, scratchDir, startUpload, uploadParts, waitUntilProcessed } from './support/footage';
import { OwnS3Fake } from './support/own-s3-fake';

jest.setTimeout(90_000);

const MiB = 1024 * 1024;

/**
 * Storage stopped in the middle of an upload. The test starts its own S3 fake (its own port and
 * folder) and an app pointed at it, so stopping storage here never disturbs the fake other tests share.
 */
describe('the S3 fake stopped during an upload (own S3 fake, real MariaDB, Redis)', () => {
  let fake: OwnS3Fake;
  let app: NestExpressApplication;
  let owner: TestAccount;
  let workshopId: string;
  let buildId: string;

  beforeAll(async () => {
    fake = await OwnS3Fake.start();
    app = await createTestApp(fake.appEnv);
    owner = await signUpAndSignIn(app, { displayName: 'Tomasz Reyes' });
    const workshop = await owner.agent.post('/api/workshops').send({ name: 'Reyes Fabrication', slug: uniqueSlug('outage') }).expect(201);
    workshopId = workshop.body.id;
    const build = await owner.agent.post(`/api/workshops/${workshopId}/builds`).send({ title: 'Trailer hitch' }).expect(201);
    buildId = build.body.id;
  });
  afterAll(async () => {
    removeScratch();
    await app?.close();
    await fake?.remove();
  });

  const health = () => request(app.getHttpServer()).get('/api/health');

  it('answers 503 (never 500) while storage is down, reports storage down, loses no part and finishes once storage is back', async () => {
    const file = join(scratchDir(), 'hitch.mp4');
    const bytes = randomBytes(9 * MiB);
    writeFileSync(file, bytes);
    const plan = await startUpload(owner.agent, workshopId, buildId, file);
    expect(plan.partCount).toBe(2);
    const upload = `/api/workshops/${workshopId}/footage/${plan.footageId}/upload`;
    await uploadParts(owner.agent, workshopId, plan, file, [1]);

    await fake.stop();

    const down = await health().expect(503);
    expect(down.body).toMatchObject({ status: 'down', checks: { database: 'up', storage: 'down', mail: 'up', queue: 'up' } });

    // Starting another upload needs storage: a clear 503, and no footage row is left behind.
    const listBefore = await owner.agent.get(`/api/workshops/${workshopId}/builds/${buildId}/footage`).expect(200);
    const refusedStart = await owner.agent
      .post(`/api/workshops/${workshopId}/builds/${buildId}/footage`)
      .send({ fileName: 'second take.mp4', contentType: 'video/mp4', sizeBytes: MiB })
      .expect(503);
    expect(refusedStart.body).toEqual({
      statusCode: 503,
      code: 'storage_unavailable',
      message: 'Storage is not answering right now. Nothing was lost; try again in a moment.',
    });
    const listDuring = await owner.agent.get(`/api/workshops/${workshopId}/builds/${buildId}/footage`).expect(200);
    expect(listDuring.body).toHaveLength(listBefore.body.length);

    // The browser's part PUT cannot reach storage (signing needs no storage, sending does).
    await expect(uploadParts(owner.agent, workshopId, plan, file, [2])).rejects.toThrow(/fetch failed/);
    expect((await owner.agent.get(upload).expect(200)).body.completedParts.map((part: { partNumber: number }) => part.partNumber)).toEqual([1]);

    await fake.start();
    expect((await health().expect(200)).body.checks.storage).toBe('up');
    await uploadParts(owner.agent, workshopId, plan, file, [2]);

    // Down again just as the upload is completed: 503, and the upload is kept as it was.
    await fake.stop();
    const refusedComplete = await owner.agent.post(`${upload}/complete`).expect(503);
    expect(refusedComplete.body.code).toBe('storage_unavailable');
    const kept = await owner.agent.get(upload).expect(200);
    expect(kept.body.completedParts.map((part: { partNumber: number }) => part.partNumber)).toEqual([1, 2]);

    // Storage back: the same request finishes it, with each part once (storage's size is the file's).
    await fake.start();
    const completed = await owner.agent.post(`${upload}/complete`).expect(200);
    expect(completed.body).toMatchObject({ state: 'processing', sizeBytes: bytes.length });
    // Random bytes are no video: the media job (through the same storage) marks it failed, which shows it read the object.
    const processed = await waitUntilProcessed(owner.agent, workshopId, plan.footageId);
    expect(processed.state).toBe('failed');
  });
});
