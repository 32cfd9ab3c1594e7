import { NestExpressApplication } from '@nestjs/platform-express';
import { ListObjectsV2Command, S3Client } from '@aws-sdk/client-s3';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { createTestApp } from './create-test-app';
import { ONE_PIXEL_PNG as PNG } from './support/images';
import { signUpAndSignIn, TestAccount, uniqueSlug } from './support/accounts';
import { makeClip, removeScratch, uploadFile, waitUntilProcessed } from './support/footage';
import { tokenFrom, waitForMail } from './support/mail-inbox';

jest.setTimeout(120_000);


/** Keys stored under a prefix, read straight from the S3 fake. */
async function storedKeys(prefix: string): Promise<string[]> {
  const client = new S3Client({
    endpoint: process.env.S3_ENDPOINT,
    region: process.env.S3_REGION ?? 'us-east-1',
    forcePathStyle: true,
    credentials: { accessKeyId: process.env.S3_ACCESS_KEY_ID!, secretAccessKey: process.env.S3_SECRET_ACCESS_KEY! },
  });
  const page = await client.send(new ListObjectsV2Command({ Bucket: process.env.S3_BUCKET, Prefix: prefix }));
  client.destroy();
  return (page.Contents ?? []).map((item) => item.Key!);
}

describe('deleting a workshop (real MariaDB, S3 fake)', () => {
  let app: NestExpressApplication;
  let owner: TestAccount;
  let editor: TestAccount;
  let reader: TestAccount;
  let workshopId: string;
  let workshopSlug: string;

  beforeAll(async () => {
    app = await createTestApp();
    [owner, editor, reader] = await Promise.all([signUpAndSignIn(app), signUpAndSignIn(app), signUpAndSignIn(app)]);
    workshopSlug = uniqueSlug('doomed');
    workshopId = (await owner.agent.post('/api/workshops').send({ name: 'Doomed Shop', slug: workshopSlug }).expect(201)).body.id;
    const base = `/api/workshops/${workshopId}`;
    await owner.agent.post(`${base}/invitations`).send({ email: editor.email, role: 'editor' }).expect(201);
    const token = tokenFrom(await waitForMail(editor.email, { subject: /invited you/ }), '/invitations/accept');
    await editor.agent.post('/api/invitations/accept').send({ token }).expect(200);

    // Something of every kind, with files in storage.
    await owner.agent.put(`${base}/logo`).attach('logo', PNG, 'logo.png').expect(200);
    const buildId = (await owner.agent.post(`${base}/builds`).send({ title: 'Everything build' }).expect(201)).body.id;
    const part = (await owner.agent.post(`${base}/parts`).send({ partNumber: 'DX-1', title: 'Doomed part', category: 'other' }).expect(201)).body;
    await owner.agent.post(`${base}/parts/${part.id}/photos`).attach('photo', PNG, 'part.png').expect(201);
    const assemblyId = (await owner.agent.post(`${base}/builds/${buildId}/assemblies`).send({ name: 'Doomed stack' }).expect(201)).body.id;
    await owner.agent.put(`${base}/assemblies/${assemblyId}/parts/${part.id}`).send({ position: 'only' }).expect(204);
    const checkId = (await owner.agent.post(`${base}/assemblies/${assemblyId}/checks`).send({ title: 'Fits' }).expect(201)).body.id;
    await owner.agent.post(`${base}/checks/${checkId}/photos`).attach('photo', PNG, 'fit.png').expect(201);
    const footageId = await uploadFile(owner.agent, workshopId, buildId, makeClip('doomed.mp4', { seconds: 4, width: 160, height: 120, rate: 10 }));
    await waitUntilProcessed(owner.agent, workshopId, footageId);
    await owner.agent.put(`${base}/footage/${footageId}/transcript`).send({ text: 'WEBVTT\n\n00:00:01.000 --> 00:00:02.000\nThe bore reads fifteen thousandths.\n' }).expect(200);
    await owner.agent.post(`${base}/footage/${footageId}/marks`).send({ kind: 'check_evidence', startMs: 1000, fitCheckId: checkId }).expect(201);
    const guideId = (await owner.agent.post(`${base}/builds/${buildId}/guides`).send({ title: 'Doomed guide', footageId, assemblyId }).expect(201)).body.id;
    await owner.agent.post(`${base}/guides/${guideId}/steps`).send({ title: 'Do it', startMs: 1000 }).expect(201);
    await owner.agent.post(`${base}/guides/${guideId}/revisions`).send({}).expect(201);
    await reader.agent.post('/api/follows').send({ targetKind: 'assembly', targetId: assemblyId }).expect(201);
    const report = (await reader.agent.post(`/api/guides/${workshopSlug}/doomed-guide/fit-reports`).send({ outcome: 'fit', parts: 'DX-1' }).expect(201)).body;
    await reader.agent.post(`/api/fit-reports/${report.id}/photos`).attach('photo', PNG, 'mine.png').expect(201);
    await owner.agent.post(`${base}/checks/${checkId}/transitions`).send({ to: 'confirmed', reason: 'done' }).expect(201);
  });
  afterAll(async () => {
    removeScratch();
    await app.close();
  });

  it('deleting a build removes its stored files (footage, poster, evidence photos) and keeps the rest', async () => {
    const base = `/api/workshops/${workshopId}`;
    const buildId = (await owner.agent.post(`${base}/builds`).send({ title: 'Short-lived build' }).expect(201)).body.id;
    const footageId = await uploadFile(owner.agent, workshopId, buildId, makeClip('short-lived.mp4', { seconds: 3, width: 160, height: 120, rate: 10 }));
    await waitUntilProcessed(owner.agent, workshopId, footageId);
    const assemblyId = (await owner.agent.post(`${base}/builds/${buildId}/assemblies`).send({ name: 'Short-lived stack' }).expect(201)).body.id;
    const checkId = (await owner.agent.post(`${base}/assemblies/${assemblyId}/checks`).send({ title: 'Fits' }).expect(201)).body.id;
    await owner.agent.post(`${base}/checks/${checkId}/photos`).attach('photo', PNG, 'fit.png').expect(201);
    const before = await storedKeys(`workshops/${workshopId}/`);
    expect((await storedKeys(`workshops/${workshopId}/footage/${footageId}/`)).sort()).toEqual([
      `workshops/${workshopId}/footage/${footageId}/original.mp4`,
      `workshops/${workshopId}/footage/${footageId}/poster.jpg`,
    ]);

    await owner.agent.delete(`${base}/builds/${buildId}`).expect(204);
    expect(await storedKeys(`workshops/${workshopId}/footage/${footageId}/`)).toEqual([]);
    expect(await storedKeys(`workshops/${workshopId}/checks/${checkId}/`)).toEqual([]);
    // Everything else of the workshop is still there.
    expect((await storedKeys(`workshops/${workshopId}/`)).length).toBe(before.length - 3);
  });

  it('is for owners only, and asks for the name typed again', async () => {
    await editor.agent.delete(`/api/workshops/${workshopId}`).send({ confirmName: 'Doomed Shop' }).expect(403);
    await reader.agent.delete(`/api/workshops/${workshopId}`).send({ confirmName: 'Doomed Shop' }).expect(404);
    const wrong = await owner.agent.delete(`/api/workshops/${workshopId}`).send({ confirmName: 'Doomed shop' }).expect(422);
    expect(wrong.body).toMatchObject({ message: "Type the workshop's name, Doomed Shop, to delete it.", errors: { confirmName: expect.any(String) } });
  });

  it('removes every row and every stored file of the workshop, and nothing of anyone else', async () => {
    expect((await storedKeys(`workshops/${workshopId}/`)).length).toBeGreaterThanOrEqual(6);
    await owner.agent.delete(`/api/workshops/${workshopId}`).send({ confirmName: 'Doomed Shop' }).expect(204);

    await owner.agent.get(`/api/workshops/${workshopId}`).expect(404);
    await request(app.getHttpServer()).get(`/api/guides/${workshopSlug}/doomed-guide`).expect(404);
    expect(await storedKeys(`workshops/${workshopId}/`)).toEqual([]);
    expect((await reader.agent.get('/api/follows').expect(200)).body).toEqual([]);
    expect((await reader.agent.get('/api/fit-reports').expect(200)).body).toEqual([]);
    // No table keeps a row pointing at the workshop.
    const database = app.get(DataSource);
    const tables: { TABLE_NAME: string }[] = await database.query(
      "SELECT TABLE_NAME FROM information_schema.COLUMNS WHERE TABLE_SCHEMA = DATABASE() AND COLUMN_NAME = 'workshop_id'",
    );
    for (const { TABLE_NAME } of tables) {
      const [{ count }] = await database.query(`SELECT COUNT(*) AS count FROM \`${TABLE_NAME}\` WHERE workshop_id = ?`, [workshopId]);
      expect({ table: TABLE_NAME, rows: Number(count) }).toEqual({ table: TABLE_NAME, rows: 0 });
    }
    // The accounts stay.
    await owner.agent.get('/api/auth/me').expect(200);
    await reader.agent.get('/api/auth/me').expect(200);
  });
});
