import {
  CompleteMultipartUploadCommand,
  CreateMultipartUploadCommand,
  GetObjectCommand,
  HeadBucketCommand,
  S3Client,
  S3ServiceException,
  UploadPartCommand,
} from '@aws-sdk/client-s3';
import { NestExpressApplication } from '@nestjs/platform-express';
import { randomBytes } from 'node:crypto';
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import request from 'supertest';
import { StorageService } from '../src/infra/storage/storage.service';
import { createTestApp } from './create-test-app';
import { signUpAndSignIn, TestAccount, uniqueSlug } from './support/accounts';
import { removeScratch, scratchDir, startUpload, uploadParts } from './support/footage';

jest.setTimeout(60_000);

const MiB = 1024 * 1024;
/** Well-formed (32 hex digits) but belonging to no part ever uploaded. */
const INVENTED_ETAG = '"0123456789abcdef0123456789abcdef"';

function required(name: string): string {
  const value = process.env[name];
  if (!value) throw new Error(`${name} is not set: run through scripts/with-test-services.sh or npm test`);
  return value;
}

/** The S3 error a storage call was refused with (fails the test when the call succeeded). */
async function refusal(call: Promise<unknown>): Promise<S3ServiceException & { PartNumber?: string }> {
  try {
    await call;
  } catch (error) {
    if (error instanceof S3ServiceException) return error;
    throw error;
  }
  throw new Error('storage accepted a request it should have refused');
}

describe('completing a multipart upload with parts storage does not hold (real S3 fake, MariaDB)', () => {
  let app: NestExpressApplication;
  let storage: StorageService;
  let s3: S3Client;
  let bucket: string;
  let owner: TestAccount;
  let workshopId: string;
  let buildId: string;

  beforeAll(async () => {
    app = await createTestApp();
    storage = app.get(StorageService);
    bucket = required('S3_BUCKET');
    // The same client settings as the app's StorageService (STACK.md: checksums only when required).
    s3 = new S3Client({
      endpoint: required('S3_ENDPOINT'),
      region: required('S3_REGION'),
      forcePathStyle: true,
      credentials: { accessKeyId: required('S3_ACCESS_KEY_ID'), secretAccessKey: required('S3_SECRET_ACCESS_KEY') },
      requestChecksumCalculation: 'WHEN_REQUIRED',
      responseChecksumValidation: 'WHEN_REQUIRED',
    });
    owner = await signUpAndSignIn(app, { displayName: 'Ines Okafor' });
    const workshop = await owner.agent.post('/api/workshops').send({ name: 'Okafor Bench', slug: uniqueSlug('parts') }).expect(201);
    workshopId = workshop.body.id;
    const build = await owner.agent.post(`/api/workshops/${workshopId}/builds`).send({ title: 'Lathe tailstock' }).expect(201);
    buildId = build.body.id;
  });
  afterAll(async () => {
    removeScratch();
    s3.destroy();
    await app.close();
  });

  it('the S3 fake answers a part never uploaded, or a wrong ETag, with InvalidPart naming the part, as S3 does, and keeps serving', async () => {
    const key = `test/invalid-parts/${uniqueSlug('object')}`;
    const created = await s3.send(new CreateMultipartUploadCommand({ Bucket: bucket, Key: key }));
    const uploadId = created.UploadId ?? '';
    const bytes = Buffer.from('part one of a test object');
    const part = await s3.send(new UploadPartCommand({ Bucket: bucket, Key: key, UploadId: uploadId, PartNumber: 1, Body: bytes }));
    const complete = (parts: { PartNumber: number; ETag: string }[], id = uploadId) =>
      s3.send(new CompleteMultipartUploadCommand({ Bucket: bucket, Key: key, UploadId: id, MultipartUpload: { Parts: parts } }));

    // The hostile sequence of issue 14: a made-up ETag for part 2, which was never uploaded. Before the
    // fix the fake's process died here on an unhandled missing-file error.
    const neverUploaded = await refusal(complete([{ PartNumber: 1, ETag: part.ETag ?? '' }, { PartNumber: 2, ETag: INVENTED_ETAG }]));
    expect({ name: neverUploaded.name, status: neverUploaded.$metadata.httpStatusCode, part: neverUploaded.PartNumber }).toEqual({
      name: 'InvalidPart',
      status: 400,
      part: '2',
    });

    const wrongEtag = await refusal(complete([{ PartNumber: 1, ETag: INVENTED_ETAG }]));
    expect({ name: wrongEtag.name, status: wrongEtag.$metadata.httpStatusCode, part: wrongEtag.PartNumber }).toEqual({
      name: 'InvalidPart',
      status: 400,
      part: '1',
    });

    const unknownUpload = await refusal(complete([{ PartNumber: 1, ETag: part.ETag ?? '' }], 'ffffffffffffffffffffffffffffffff'));
    expect({ name: unknownUpload.name, status: unknownUpload.$metadata.httpStatusCode }).toEqual({ name: 'NoSuchUpload', status: 404 });

    // Still serving, and the refused attempts cost nothing: the same upload completes with its real part.
    await s3.send(new HeadBucketCommand({ Bucket: bucket }));
    await complete([{ PartNumber: 1, ETag: part.ETag ?? '' }]);
    const stored = await s3.send(new GetObjectCommand({ Bucket: bucket, Key: key }));
    expect(Buffer.from((await stored.Body?.transformToByteArray()) ?? [])).toEqual(bytes);
    await storage.deleteObject(key);
  });

  it('the API refuses an ETag no part can have, with 400 naming the field, and stores nothing', async () => {
    const file = join(scratchDir(), 'one-part.mp4');
    writeFileSync(file, randomBytes(MiB));
    const plan = await startUpload(owner.agent, workshopId, buildId, file);
    const partUrl = `/api/workshops/${workshopId}/footage/${plan.footageId}/upload/parts/1`;
    for (const etag of ['made-up', '"0123456789abcdef0123456789abcdef', '0123456789abcdef0123456789abcdeg', `"${'a'.repeat(33)}"`, '"abc-2"']) {
      const refused = await owner.agent.put(partUrl).send({ etag }).expect(400);
      expect(JSON.stringify(refused.body.message)).toMatch(/etag must be the ETag storage answered for the part/);
    }
    const state = await owner.agent.get(`/api/workshops/${workshopId}/footage/${plan.footageId}/upload`).expect(200);
    expect(state.body.completedParts).toEqual([]);
    // Bare and quoted, in either case, are what S3 and the fake send.
    await owner.agent.put(partUrl).send({ etag: '0123456789ABCDEF0123456789abcdef' }).expect(200);
    await owner.agent.delete(`/api/workshops/${workshopId}/footage/${plan.footageId}/upload`).expect(204);
  });

  it('the API answers 422 naming the part storage does not hold, forgets that record, and the upload resumes to the end', async () => {
    const file = join(scratchDir(), 'two-parts.mp4');
    const bytes = randomBytes(9 * MiB);
    writeFileSync(file, bytes);
    const plan = await startUpload(owner.agent, workshopId, buildId, file);
    expect(plan.partCount).toBe(2);
    const upload = `/api/workshops/${workshopId}/footage/${plan.footageId}/upload`;

    // Part 1 really sent; part 2 only claimed, with an invented ETag (the crash of issue 14, item 2).
    await uploadParts(owner.agent, workshopId, plan, file, [1]);
    await owner.agent.put(`${upload}/parts/2`).send({ etag: INVENTED_ETAG }).expect(200);
    const refused = await owner.agent.post(`${upload}/complete`).expect(422);
    expect(refused.body).toMatchObject({ statusCode: 422, code: 'part_invalid', invalidParts: [2] });
    expect(refused.body.message).toMatch(/does not hold part 2 as recorded/);

    // Storage still answers (the fake did not die), and nothing but the bad record is gone.
    const health = await request(app.getHttpServer()).get('/api/health');
    expect(health.body.checks.storage).toBe('up');
    let state = await owner.agent.get(upload).expect(200);
    expect(state.body.completedParts.map((part: { partNumber: number }) => part.partNumber)).toEqual([1]);

    // A part sent, but recorded with another part's ETag: refused and named too.
    await uploadParts(owner.agent, workshopId, plan, file, [2]);
    const partTwoEtag = (await owner.agent.get(upload).expect(200)).body.completedParts[1].etag as string;
    await owner.agent.put(`${upload}/parts/1`).send({ etag: partTwoEtag }).expect(200);
    const wrong = await owner.agent.post(`${upload}/complete`).expect(422);
    expect(wrong.body).toMatchObject({ code: 'part_invalid', invalidParts: [1] });
    state = await owner.agent.get(upload).expect(200);
    expect(state.body.completedParts.map((part: { partNumber: number }) => part.partNumber)).toEqual([2]);

    // Resuming sends the missing part again and finishes with every byte in place.
    await uploadParts(owner.agent, workshopId, plan, file, [1]);
    const completed = await owner.agent.post(`${upload}/complete`).expect(200);
    expect(completed.body.state).toBe('processing');
    // The size is storage's own HEAD of the assembled object (the media job may delete it soon: it is no video).
    expect(completed.body.sizeBytes).toBe(bytes.length);
    await owner.agent.delete(`/api/workshops/${workshopId}/footage/${plan.footageId}`).expect(204);
  });
});
