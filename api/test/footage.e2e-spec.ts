import { NestExpressApplication } from '@nestjs/platform-express';
import { createHash } from 'node:crypto';
import { readFileSync, statSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { DataSource } from 'typeorm';
import { StorageService } from '../src/infra/storage/storage.service';
import { createTestApp } from './create-test-app';
import { browserAgent, signUpAndSignIn, TestAccount, uniqueSlug } from './support/accounts';
import { makeClip, removeScratch, scratchDir, startUpload, uploadFile, uploadParts, waitUntilProcessed } from './support/footage';

jest.setTimeout(60_000);

const md5 = (bytes: Buffer) => createHash('md5').update(bytes).digest('hex');
const MiB = 1024 * 1024;

describe('footage: direct-to-storage multipart uploads, media processing, playback (real MariaDB, Redis, S3 fake, ffmpeg)', () => {
  let app: NestExpressApplication;
  let storage: StorageService;
  let db: DataSource;
  let owner: TestAccount;
  let workshopId: string;
  let buildId: string;
  let clip: string;

  beforeAll(async () => {
    app = await createTestApp();
    storage = app.get(StorageService);
    db = app.get(DataSource);
    owner = await signUpAndSignIn(app, { displayName: 'Rowan Avery' });
    const workshop = await owner.agent.post('/api/workshops').send({ name: 'Harrow Lane Garage', slug: uniqueSlug('footage') }).expect(201);
    workshopId = workshop.body.id;
    const build = await owner.agent.post(`/api/workshops/${workshopId}/builds`).send({ title: 'Motor-to-gearbox coupler' }).expect(201);
    buildId = build.body.id;
    clip = makeClip('clip.mp4');
  });
  afterAll(async () => {
    removeScratch();
    await app.close();
  });

  const footageUrl = (footageId: string, suffix = '') => `/api/workshops/${workshopId}/footage/${footageId}${suffix}`;

  describe('starting an upload', () => {
    it('plans parts of 8 to 64 MiB from the file size and answers the upload state', async () => {
      const small = await owner.agent
        .post(`/api/workshops/${workshopId}/builds/${buildId}/footage`)
        .send({ fileName: 'spline check.mp4', contentType: 'video/mp4', sizeBytes: 3 * MiB })
        .expect(201);
      expect(small.body.footage).toMatchObject({
        title: 'spline check',
        originalName: 'spline check.mp4',
        contentType: 'video/mp4',
        state: 'uploading',
        sizeBytes: 3 * MiB,
        upload: { partCount: 1, completedPartCount: 0, uploadedBytes: 0 },
      });
      expect(small.body.upload).toEqual({ partSizeBytes: 8 * MiB, partCount: 1, sizeBytes: 3 * MiB, fileName: 'spline check.mp4', completedParts: [] });

      // 20 GB: about a thousand parts of 20 MiB; far under S3's 10,000.
      const large = await owner.agent
        .post(`/api/workshops/${workshopId}/builds/${buildId}/footage`)
        .send({ fileName: 'whole day.mkv', contentType: '', sizeBytes: 20_000_000_000 })
        .expect(201);
      expect(large.body.upload).toMatchObject({ partSizeBytes: 20 * MiB, partCount: 954 });
      expect(large.body.footage.contentType).toBe('video/x-matroska');
      for (const id of [small.body.footage.id, large.body.footage.id]) await owner.agent.delete(footageUrl(id, '/upload')).expect(204);
    });

    it('sanitises the file name and never uses it in the storage key', async () => {
      // Control characters are refused in all text the API takes (common/pipes/control-characters.ts), file names included.
      const withBell = await owner.agent
        .post(`/api/workshops/${workshopId}/builds/${buildId}/footage`)
        .send({ fileName: 'bad\u0007 name.mov', contentType: 'video/quicktime', sizeBytes: 1000 })
        .expect(400);
      expect(withBell.body.errors).toHaveProperty('fileName');
      const created = await owner.agent
        .post(`/api/workshops/${workshopId}/builds/${buildId}/footage`)
        .send({ fileName: 'C:\\Users\\me\\..\\clips\\\u202Ebad name?.mov', contentType: 'video/quicktime', sizeBytes: 1000 })
        .expect(201);
      expect(created.body.footage.originalName).toBe('bad name_.mov');
      const [row] = await db.query('SELECT object_key FROM footage WHERE id = ?', [created.body.footage.id]);
      expect(row.object_key).toBe(`workshops/${workshopId}/footage/${created.body.footage.id}/original.mov`);
      await owner.agent.delete(footageUrl(created.body.footage.id, '/upload')).expect(204);
    });

    it('refuses wrong types and sizes with a clear message before any byte is sent', async () => {
      const create = (body: object) => owner.agent.post(`/api/workshops/${workshopId}/builds/${buildId}/footage`).send(body);
      const wrongExtension = await create({ fileName: 'notes.txt', contentType: 'text/plain', sizeBytes: 100 }).expect(400);
      expect(wrongExtension.body.message).toBe('"notes.txt" is a .txt file; upload a video file: .mp4, .mov, .webm, .mkv.');
      const wrongMime = await create({ fileName: 'clip.mp4', contentType: 'image/png', sizeBytes: 100 }).expect(400);
      expect(wrongMime.body.message).toBe('"clip.mp4" ends in .mp4 but its type is image/png; expected video/mp4.');
      const tooLarge = await create({ fileName: 'huge.mp4', contentType: 'video/mp4', sizeBytes: 20_000_000_001 }).expect(400);
      expect(tooLarge.body.message).toBe('The file is 20.0 GB; the largest accepted is 20 GB.');
      const malformed = await create({ fileName: '', contentType: 'video/mp4', sizeBytes: -1, extra: true }).expect(400);
      expect(malformed.body.message).toEqual(
        expect.arrayContaining(['property extra should not exist', 'fileName must be longer than or equal to 1 characters', 'sizeBytes must not be less than 1']),
      );
      const limits = await owner.agent.get(`/api/workshops/${workshopId}/footage-limits`).expect(200);
      expect(limits.body).toMatchObject({ maxBytes: 20_000_000_000, transcriptMaxBytes: 2_000_000, transcriptMaxCues: 10_000 });
      expect(limits.body.types.map((type: { extension: string }) => type.extension)).toEqual(['mp4', 'mov', 'webm', 'mkv']);
    });

    it('answers 404 for a build of another workshop', async () => {
      const other = await owner.agent.post('/api/workshops').send({ name: 'Other shop', slug: uniqueSlug('other') }).expect(201);
      await owner.agent
        .post(`/api/workshops/${other.body.id}/builds/${buildId}/footage`)
        .send({ fileName: 'a.mp4', contentType: 'video/mp4', sizeBytes: 100 })
        .expect(404);
    });
  });

  describe('uploading', () => {
    it('uploads a clip through presigned part URLs, probes it with ffprobe and makes a poster with ffmpeg', async () => {
      const footageId = await uploadFile(owner.agent, workshopId, buildId, clip, 'coupler-spline.mp4');
      const footage = await waitUntilProcessed(owner.agent, workshopId, footageId);
      expect(footage).toMatchObject({
        state: 'ready',
        failureReason: null,
        width: 320,
        height: 240,
        frameRate: 25,
        container: 'mp4',
        videoCodec: 'h264',
        audioCodec: 'aac',
        sizeBytes: statSync(clip).size,
        upload: null,
      });
      // testsrc=duration=3 with a 3 s sine: ffprobe reports about 3 s (AAC priming adds a few ms).
      expect(footage.durationMs).toBeGreaterThanOrEqual(3000);
      expect(footage.durationMs).toBeLessThan(3100);

      const poster = await fetch(footage.posterUrl as string);
      expect(poster.status).toBe(200);
      const posterBytes = Buffer.from(await poster.arrayBuffer());
      expect(posterBytes.subarray(0, 3)).toEqual(Buffer.from([0xff, 0xd8, 0xff]));

      const list = await owner.agent.get(`/api/workshops/${workshopId}/builds/${buildId}/footage`).expect(200);
      expect(list.body).toEqual(expect.arrayContaining([expect.objectContaining({ id: footageId, state: 'ready', durationMs: footage.durationMs })]));
    });

    it('serves playback through a short-lived link that answers HTTP Range requests (seeking)', async () => {
      const footageId = await uploadFile(owner.agent, workshopId, buildId, clip);
      await waitUntilProcessed(owner.agent, workshopId, footageId);
      const playback = await owner.agent.get(footageUrl(footageId, '/playback')).expect(200);
      expect(playback.body.contentType).toBe('video/mp4');
      expect(new Date(playback.body.expiresAt).getTime()).toBeGreaterThan(Date.now());
      const whole = readFileSync(clip);
      const ranged = await fetch(playback.body.url, { headers: { Range: 'bytes=1000-1999' } });
      expect(ranged.status).toBe(206);
      expect(ranged.headers.get('content-range')).toBe(`bytes 1000-1999/${whole.length}`);
      expect(Buffer.from(await ranged.arrayBuffer())).toEqual(whole.subarray(1000, 2000));
    });

    it('resumes after an interruption: finished parts are recorded, a broken part is not, the rest continues', async () => {
      const large = makeClip('large.mp4', { seconds: 12, width: 1280, height: 720, large: true });
      const whole = readFileSync(large);
      const plan = await startUpload(owner.agent, workshopId, buildId, large);
      expect(plan.partCount).toBeGreaterThanOrEqual(3);

      await uploadParts(owner.agent, workshopId, plan, large, [1]);
      // The connection drops in the middle of part 2: the PUT never finishes, so nothing is recorded.
      const [{ url }] = (await owner.agent.post(footageUrl(plan.footageId, '/upload/part-urls')).send({ partNumbers: [2] }).expect(200)).body.urls;
      const controller = new AbortController();
      const halfPart = whole.subarray(plan.partSizeBytes, plan.partSizeBytes + plan.partSizeBytes / 2);
      const stream = new ReadableStream<Uint8Array>({
        start(streamController) {
          streamController.enqueue(halfPart);
          setTimeout(() => controller.abort(), 100);
        },
      });
      await expect(
        fetch(url, { method: 'PUT', body: stream, signal: controller.signal, duplex: 'half' } as RequestInit & { duplex: 'half' }),
      ).rejects.toThrow();

      // After a reload the studio asks what is done.
      const state = await owner.agent.get(footageUrl(plan.footageId, '/upload')).expect(200);
      expect(state.body.completedParts).toEqual([{ partNumber: 1, etag: expect.any(String) }]);
      const listed = await owner.agent.get(footageUrl(plan.footageId)).expect(200);
      expect(listed.body.upload).toEqual({ partCount: plan.partCount, completedPartCount: 1, uploadedBytes: plan.partSizeBytes });

      // Completing early names the missing parts.
      const early = await owner.agent.post(footageUrl(plan.footageId, '/upload/complete')).expect(409);
      expect(early.body.missingParts).toEqual(Array.from({ length: plan.partCount - 1 }, (_, index) => index + 2));

      const rest = Array.from({ length: plan.partCount - 1 }, (_, index) => index + 2);
      await uploadParts(owner.agent, workshopId, plan, large, rest);
      await owner.agent.post(footageUrl(plan.footageId, '/upload/complete')).expect(200);
      // Completing again (a retry after a lost answer) is harmless.
      await owner.agent.post(footageUrl(plan.footageId, '/upload/complete')).expect(200);

      const footage = await waitUntilProcessed(owner.agent, workshopId, plan.footageId);
      expect(footage).toMatchObject({ state: 'ready', width: 1280, height: 720, sizeBytes: whole.length });
      const playback = await owner.agent.get(footageUrl(plan.footageId, '/playback')).expect(200);
      const stored = Buffer.from(await (await fetch(playback.body.url)).arrayBuffer());
      expect(md5(stored)).toBe(md5(whole));
      // The finished upload's bookkeeping is gone.
      await owner.agent.get(footageUrl(plan.footageId, '/upload')).expect(409);
      expect(await db.query('SELECT * FROM footage_upload_parts WHERE footage_id = ?', [plan.footageId])).toEqual([]);
    });

    it('refuses part numbers outside the plan', async () => {
      const plan = await startUpload(owner.agent, workshopId, buildId, clip);
      const refused = await owner.agent.post(footageUrl(plan.footageId, '/upload/part-urls')).send({ partNumbers: [1, 2] }).expect(400);
      expect(refused.body.message).toBe('Part 2 is outside this upload, which has parts 1 to 1');
      await owner.agent.put(footageUrl(plan.footageId, '/upload/parts/0')).send({ etag: '"x"' }).expect(400);
      await owner.agent.put(footageUrl(plan.footageId, '/upload/parts/1')).send({ etag: 'has space' }).expect(400);
      await owner.agent.delete(footageUrl(plan.footageId, '/upload')).expect(204);
    });

    it('aborts an upload: the footage and its parts are gone', async () => {
      const plan = await startUpload(owner.agent, workshopId, buildId, clip);
      await uploadParts(owner.agent, workshopId, plan, clip, [1]);
      await owner.agent.delete(footageUrl(plan.footageId, '/upload')).expect(204);
      await owner.agent.get(footageUrl(plan.footageId)).expect(404);
      await owner.agent.get(footageUrl(plan.footageId, '/upload')).expect(404);
      await owner.agent.post(footageUrl(plan.footageId, '/upload/part-urls')).send({ partNumbers: [1] }).expect(404);
      expect(await db.query('SELECT * FROM footage_uploads WHERE footage_id = ?', [plan.footageId])).toEqual([]);
      const [{ object_key: key } = { object_key: undefined }] = await db.query('SELECT object_key FROM footage WHERE id = ?', [plan.footageId]);
      expect(key).toBeUndefined();
    });

    it('marks a file that is not a video as failed with a reason, and removes it from storage', async () => {
      const fake = join(scratchDir(), 'holiday.mp4');
      writeFileSync(fake, 'These are shop notes, not a video.\n'.repeat(200));
      const footageId = await uploadFile(owner.agent, workshopId, buildId, fake);
      const footage = await waitUntilProcessed(owner.agent, workshopId, footageId);
      expect(footage.state).toBe('failed');
      expect(footage.failureReason).toMatch(/^The file could not be read as a video \(.+\)\. The file was removed\.$/);
      expect(footage.failureReason).not.toMatch(/X-Amz|http/);
      const [row] = await db.query('SELECT object_key FROM footage WHERE id = ?', [footageId]);
      expect(await storage.headObject(row.object_key)).toBeNull();
      await owner.agent.get(footageUrl(footageId, '/playback')).expect(409);
    });

    it('rejects a readable file that is not an accepted video (a PNG renamed .mp4)', async () => {
      const png = join(scratchDir(), 'frame.mp4');
      const { execFileSync } = await import('node:child_process');
      execFileSync('ffmpeg', ['-v', 'error', '-y', '-f', 'lavfi', '-i', 'testsrc=size=64x64', '-frames:v', '1', '-f', 'image2', '-c:v', 'png', png]);
      const footageId = await uploadFile(owner.agent, workshopId, buildId, png);
      const footage = await waitUntilProcessed(owner.agent, workshopId, footageId);
      expect(footage.state).toBe('failed');
      expect(footage.failureReason).toMatch(/not an MP4, MOV, WebM or MKV video|could not be read as a video/);
    });
  });

  describe('managing', () => {
    it('renames and deletes footage with its stored file and poster', async () => {
      const footageId = await uploadFile(owner.agent, workshopId, buildId, clip);
      await waitUntilProcessed(owner.agent, workshopId, footageId);
      const renamed = await owner.agent.patch(footageUrl(footageId)).send({ title: 'Pilot bearing bore' }).expect(200);
      expect(renamed.body.title).toBe('Pilot bearing bore');
      const [row] = await db.query('SELECT object_key, poster_key FROM footage WHERE id = ?', [footageId]);
      expect(await storage.headObject(row.poster_key)).not.toBeNull();
      await owner.agent.delete(footageUrl(footageId)).expect(204);
      expect(await storage.headObject(row.object_key)).toBeNull();
      expect(await storage.headObject(row.poster_key)).toBeNull();
      await owner.agent.get(footageUrl(footageId)).expect(404);
    });
  });

  describe('access', () => {
    let footageId: string;
    beforeAll(async () => {
      footageId = await uploadFile(owner.agent, workshopId, buildId, clip);
      await waitUntilProcessed(owner.agent, workshopId, footageId);
    });

    it('answers 404 to a signed-in non-member for every footage route', async () => {
      const stranger = await signUpAndSignIn(app);
      await stranger.agent.get(`/api/workshops/${workshopId}/builds/${buildId}/footage`).expect(404);
      await stranger.agent.get(footageUrl(footageId)).expect(404);
      await stranger.agent.get(footageUrl(footageId, '/playback')).expect(404);
      await stranger.agent
        .post(`/api/workshops/${workshopId}/builds/${buildId}/footage`)
        .send({ fileName: 'a.mp4', contentType: 'video/mp4', sizeBytes: 100 })
        .expect(404);
      await stranger.agent.delete(footageUrl(footageId)).expect(404);
    });

    it("answers 404 when a member names footage through another of their workshops", async () => {
      const other = await owner.agent.post('/api/workshops').send({ name: 'Second shop', slug: uniqueSlug('second') }).expect(201);
      await owner.agent.get(`/api/workshops/${other.body.id}/footage/${footageId}`).expect(404);
      await owner.agent.get(`/api/workshops/${other.body.id}/footage/${footageId}/playback`).expect(404);
    });

    it('answers 401 to anonymous callers', async () => {
      const anonymous = await browserAgent(app);
      await anonymous.get(`/api/workshops/${workshopId}/builds/${buildId}/footage`).expect(401);
      await anonymous.get(footageUrl(footageId, '/playback')).expect(401);
      await anonymous.post(`/api/workshops/${workshopId}/builds/${buildId}/footage`).send({}).expect(401);
    });
  });
});
