import { NestExpressApplication } from '@nestjs/platform-express';
import request from 'supertest';
import { createTestApp } from './create-test-app';
import { signUpAndSignIn, TestAccount, uniqueSlug } from './support/accounts';
import { makeClip, removeScratch, uploadFile, waitUntilProcessed } from './support/footage';

jest.setTimeout(90_000);


/** Invented narration written for this test. */
const CAPTIONS = `WEBVTT

00:00:01.000 --> 00:00:04.000
First we put the pickup on axle stands.

00:00:06.000 --> 00:00:09.000
Then the coupler slides onto the motor shaft.
`;

describe('guides: writing, publishing and the public follow-along view (real MariaDB, S3 fake)', () => {
  let app: NestExpressApplication;
  let owner: TestAccount;
  let workshopId: string;
  let workshopSlug: string;
  let buildId: string;
  let footageId: string;
  let assemblyId: string;
  let checkId: string;
  let base: string;

  beforeAll(async () => {
    app = await createTestApp();
    owner = await signUpAndSignIn(app);
    workshopSlug = uniqueSlug('guides');
    workshopId = (await owner.agent.post('/api/workshops').send({ name: 'Guide Test Shop', slug: workshopSlug }).expect(201)).body.id;
    base = `/api/workshops/${workshopId}`;
    buildId = (await owner.agent.post(`${base}/builds`).send({ title: 'Coupler install', vehicle: 'Test pickup' }).expect(201)).body.id;
    const clip = makeClip('guides-twelve-seconds.mp4', { seconds: 12, width: 160, height: 120, rate: 10 });
    footageId = await uploadFile(owner.agent, workshopId, buildId, clip);
    await waitUntilProcessed(owner.agent, workshopId, footageId);
    await owner.agent.put(`${base}/footage/${footageId}/transcript`).send({ text: CAPTIONS }).expect(200);
    const part = (await owner.agent.post(`${base}/parts`).send({ partNumber: 'GT-21', maker: 'Test Maker', title: 'Test coupler', category: 'coupler' }).expect(201)).body;
    assemblyId = (await owner.agent.post(`${base}/builds/${buildId}/assemblies`).send({ name: 'Test stack' }).expect(201)).body.id;
    await owner.agent.put(`${base}/assemblies/${assemblyId}/parts/${part.id}`).send({ position: 'input side' }).expect(204);
    checkId = (await owner.agent.post(`${base}/assemblies/${assemblyId}/checks`).send({ title: 'Test-fitted on the vehicle' }).expect(201)).body.id;
  });
  afterAll(async () => {
    removeScratch();
    await app.close();
  });

  let guideId: string;
  let stepIds: string[] = [];

  it('creates a draft with a slug from its title and sanitised rich text', async () => {
    const created = await owner.agent
      .post(`${base}/builds/${buildId}/guides`)
      .send({
        title: 'Fitting the test coupler',
        summary: '<p>Bench to truck.</p><script>alert(1)</script>',
        footageId,
        assemblyId,
        tools: ['Torque wrench'],
      })
      .expect(201);
    guideId = created.body.id;
    expect(created.body).toMatchObject({
      slug: 'fitting-the-test-coupler',
      summary: '<p>Bench to truck.</p>',
      status: 'draft',
      hasUnpublishedChanges: true,
      publishedRevision: null,
      publicPath: null,
      steps: [],
    });
    // A second guide with the same title gets the next free slug in the workshop.
    const twin = await owner.agent.post(`${base}/builds/${buildId}/guides`).send({ title: 'Fitting the test coupler' }).expect(201);
    expect(twin.body.slug).toBe('fitting-the-test-coupler-2');
    await owner.agent.delete(`${base}/guides/${twin.body.id}`).expect(204);
  });

  it('refuses footage or assemblies from elsewhere and bad step times, naming the field', async () => {
    const otherBuild = (await owner.agent.post(`${base}/builds`).send({ title: 'Other build' }).expect(201)).body.id;
    const otherAssembly = (await owner.agent.post(`${base}/builds/${otherBuild}/assemblies`).send({ name: 'Elsewhere' }).expect(201)).body.id;
    const wrongAssembly = await owner.agent.patch(`${base}/guides/${guideId}`).send({ assemblyId: otherAssembly }).expect(422);
    expect(wrongAssembly.body.errors).toHaveProperty('assemblyId');
    const pastTheEnd = await owner.agent.post(`${base}/guides/${guideId}/steps`).send({ title: 'Too late', startMs: 60_000 }).expect(422);
    expect(pastTheEnd.body.message).toMatch(/only 0:1\d long/);
    const backwards = await owner.agent.post(`${base}/guides/${guideId}/steps`).send({ title: 'Backwards', startMs: 5000, endMs: 4000 }).expect(422);
    expect(backwards.body.errors).toHaveProperty('endMs');
    const badCaution = await owner.agent.post(`${base}/guides/${guideId}/steps`).send({ title: 'x', caution: { level: 'DANGEROUS', text: 'x' } }).expect(400);
    expect(JSON.stringify(badCaution.body)).toMatch(/caution/);
  });

  it('refuses to publish a guide without steps', async () => {
    const refused = await owner.agent.post(`${base}/guides/${guideId}/revisions`).send({}).expect(422);
    expect(refused.body.message).toMatch(/at least one step/);
  });

  it('adds steps anchored in the footage (the guide’s footage by default), reorders them and finds safety topics in the text', async () => {
    const lift = await owner.agent
      .post(`${base}/guides/${guideId}/steps`)
      .send({ title: 'Raise the truck', body: '<p>Put the pickup on axle stands.</p>', startMs: 1000, caution: { level: 'WARNING', text: 'Never work under a truck held only by a jack.' } })
      .expect(201);
    expect(lift.body).toMatchObject({ position: 1, footageId, startMs: 1000, caution: { level: 'WARNING' } });
    const seat = await owner.agent.post(`${base}/guides/${guideId}/steps`).send({ title: 'Seat the coupler', startMs: 6000, endMs: 9000 }).expect(201);
    const check = await owner.agent.post(`${base}/guides/${guideId}/steps`).send({ title: 'Check the fit' }).expect(201);
    expect(check.body).toMatchObject({ position: 3, footageId: null, startMs: null });
    stepIds = [lift.body.id, seat.body.id, check.body.id];

    const incomplete = await owner.agent.put(`${base}/guides/${guideId}/steps/order`).send({ stepIds: stepIds.slice(0, 2) }).expect(422);
    expect(incomplete.body.message).toMatch(/exactly once/);
    const reordered = await owner.agent.put(`${base}/guides/${guideId}/steps/order`).send({ stepIds: [stepIds[1], stepIds[0], stepIds[2]] }).expect(200);
    expect(reordered.body.steps.map((step: { title: string; position: number }) => [step.position, step.title])).toEqual([
      [1, 'Seat the coupler'],
      [2, 'Raise the truck'],
      [3, 'Check the fit'],
    ]);
    // Axle stands mean lifting; seating a coupler means a part that turns with the drive line (common practice).
    expect(reordered.body.detectedSafetyTopics).toEqual(['lifting', 'rotating_parts']);

    await owner.agent.delete(`${base}/guides/${guideId}/steps/${stepIds[2]}`).expect(204);
    const afterDelete = await owner.agent.get(`${base}/guides/${guideId}`).expect(200);
    expect(afterDelete.body.steps.map((step: { position: number }) => step.position)).toEqual([1, 2]);
    stepIds = [stepIds[1], stepIds[0]];
  });

  it('ties marks to steps and checks; the step picker lists steps anchored in a footage', async () => {
    const choices = await owner.agent.get(`${base}/guide-steps`).query({ footageId }).expect(200);
    expect(choices.body.map((choice: { title: string; startMs: number }) => [choice.title, choice.startMs])).toEqual([
      ['Seat the coupler', 6000],
      ['Raise the truck', 1000],
    ]);
    await owner.agent
      .post(`${base}/footage/${footageId}/marks`)
      .send({ kind: 'step', startMs: 6500, label: 'Coupler slides home', guideStepId: stepIds[0] })
      .expect(201);
    const evidenceMark = await owner.agent
      .post(`${base}/footage/${footageId}/marks`)
      .send({ kind: 'check_evidence', startMs: 8000, label: 'Fits on the truck', fitCheckId: checkId })
      .expect(201);
    // A check-evidence mark is the check's evidence at once; made into a note, it is not any more.
    const evidenceOf = async () =>
      (await owner.agent.get(`${base}/assemblies/${assemblyId}/checklist`).expect(200)).body.checks[0].evidence.map(
        (item: { kind: string; markId: string }) => [item.kind, item.markId],
      );
    expect(await evidenceOf()).toEqual([['mark', evidenceMark.body.id]]);
    await owner.agent.patch(`${base}/footage/${footageId}/marks/${evidenceMark.body.id}`).send({ kind: 'note' }).expect(200);
    expect(await evidenceOf()).toEqual([]);
    await owner.agent.patch(`${base}/footage/${footageId}/marks/${evidenceMark.body.id}`).send({ kind: 'check_evidence', fitCheckId: checkId }).expect(200);
    expect(await evidenceOf()).toEqual([['mark', evidenceMark.body.id]]);
    const stranger = await owner.agent
      .post(`${base}/footage/${footageId}/marks`)
      .send({ kind: 'step', startMs: 100, guideStepId: '00000000-0000-4000-8000-000000000000' })
      .expect(404);
    expect(stranger.body.message).toBe('Guide step not found');
    const guide = await owner.agent.get(`${base}/guides/${guideId}`).expect(200);
    expect(guide.body.steps[0].marks.map((mark: { label: string }) => mark.label)).toEqual(['Coupler slides home']);
  });

  it('publishes revision 1, serves it to anyone, and tracks unpublished changes', async () => {
    const published = await owner.agent.post(`${base}/guides/${guideId}/revisions`).send({ note: 'First cut' }).expect(201);
    expect(published.body).toMatchObject({ number: 1, note: 'First cut' });
    const guide = await owner.agent.get(`${base}/guides/${guideId}`).expect(200);
    expect(guide.body).toMatchObject({
      status: 'published',
      hasUnpublishedChanges: false,
      publishedRevision: { number: 1 },
      publicPath: `/guides/${workshopSlug}/fitting-the-test-coupler`,
    });

    const anonymous = request(app.getHttpServer());
    const view = await anonymous.get(`/api/guides/${workshopSlug}/fitting-the-test-coupler`).expect(200);
    expect(view.body).toMatchObject({
      workshop: { name: 'Guide Test Shop', slug: workshopSlug },
      guide: { title: 'Fitting the test coupler', buildTitle: 'Coupler install', vehicle: 'Test pickup', tools: ['Torque wrench'], safetyTopics: ['lifting', 'rotating_parts'] },
      revision: { number: 1, note: 'First cut' },
      parts: [{ partNumber: 'GT-21', maker: 'Test Maker', position: 'input side' }],
      checklist: {
        assemblyName: 'Test stack',
        verdict: 'open',
        checks: [{ title: 'Test-fitted on the vehicle', state: 'open', evidence: [{ kind: 'mark', label: 'Fits on the truck', startMs: 8000 }] }],
      },
    });
    expect(view.body.cautions.map((caution: { topic: string; level: string }) => [caution.topic, caution.level])).toEqual([
      ['lifting', 'WARNING'],
      ['rotating_parts', 'WARNING'],
    ]);
    expect(view.body.disclaimer).toMatch(/manufacturer’s service information/);
    expect(view.body.steps.map((step: { title: string; startMs: number }) => [step.title, step.startMs])).toEqual([
      ['Seat the coupler', 6000],
      ['Raise the truck', 1000],
    ]);
    // The transcript is read a window at a time, never sent whole with the guide.
    expect(view.body).not.toHaveProperty('cues');
    const cues = await anonymous.get(`/api/guides/${workshopSlug}/fitting-the-test-coupler/cues`).query({ fromIndex: 0, limit: 100 }).expect(200);
    expect(cues.body.total).toBe(2);
    expect(cues.body.cues.map((cue: { startMs: number }) => cue.startMs)).toEqual([1000, 6000]);
    // The marks the guide uses: the one on its step and the one evidencing its check.
    expect(view.body.marks.map((mark: { kind: string; startMs: number; label: string }) => [mark.kind, mark.startMs, mark.label])).toEqual([
      ['step', 6500, 'Coupler slides home'],
      ['check_evidence', 8000, 'Fits on the truck'],
    ]);

    // The media routes redirect to short-lived storage links; the captions are WebVTT.
    const video = await anonymous.get(view.body.footage.videoUrl).expect(302);
    const range = await fetch(video.headers.location, { headers: { Range: 'bytes=0-99' } });
    expect(range.status).toBe(206);
    await anonymous.get(view.body.footage.posterUrl).expect(302);
    const captions = await anonymous.get(view.body.footage.captionsUrl).expect(200);
    expect(captions.headers['content-type']).toMatch(/text\/vtt/);
    expect(captions.text).toContain('axle stands');

    // An edit after publishing shows as unpublished; viewers still read revision 1.
    await owner.agent.patch(`${base}/guides/${guideId}/steps/${stepIds[1]}`).send({ title: 'Raise and support the truck' }).expect(200);
    expect((await owner.agent.get(`${base}/guides/${guideId}`).expect(200)).body.hasUnpublishedChanges).toBe(true);
    const stillOld = await anonymous.get(`/api/guides/${workshopSlug}/fitting-the-test-coupler`).expect(200);
    expect(stillOld.body.steps[1].title).toBe('Raise the truck');
  });

  it('shows the live checklist: a confirmation after publishing appears without a new revision', async () => {
    // The check-evidence mark made earlier is already the check's evidence; attaching it again adds nothing.
    const markId = (await owner.agent.get(`${base}/footage/${footageId}/marks`).expect(200)).body.find(
      (mark: { kind: string }) => mark.kind === 'check_evidence',
    ).id;
    await owner.agent.post(`${base}/checks/${checkId}/evidence`).send({ kind: 'mark', markId }).expect(201);
    await owner.agent.post(`${base}/checks/${checkId}/transitions`).send({ to: 'confirmed', reason: 'Fitted on the truck' }).expect(201);
    const view = await request(app.getHttpServer()).get(`/api/guides/${workshopSlug}/fitting-the-test-coupler`).expect(200);
    expect(view.body.checklist).toMatchObject({
      verdict: 'confirmed',
      checks: [{ state: 'confirmed', evidence: [{ kind: 'mark', label: 'Fits on the truck', startMs: 8000 }] }],
    });
  });

  it('lists published guides for anyone, searchable, and keeps the slug when a published guide is renamed', async () => {
    await owner.agent.patch(`${base}/guides/${guideId}`).send({ title: 'Fitting the test coupler, revised' }).expect(200);
    await owner.agent.post(`${base}/guides/${guideId}/revisions`).send({}).expect(201);
    const index = await request(app.getHttpServer()).get('/api/guides').query({ q: 'test coupler revised' }).expect(200);
    const entry = index.body.find((item: { workshop: { slug: string } }) => item.workshop.slug === workshopSlug);
    expect(entry).toMatchObject({
      title: 'Fitting the test coupler, revised',
      buildTitle: 'Coupler install',
      revision: 2,
      stepCount: 2,
      path: `/guides/${workshopSlug}/fitting-the-test-coupler`,
    });
    expect(entry.posterUrl).toBe(`/api/guides/${workshopSlug}/fitting-the-test-coupler/poster`);
    const nothing = await request(app.getHttpServer()).get('/api/guides').query({ q: 'no-such-words-anywhere' }).expect(200);
    expect(nothing.body).toEqual([]);
    const revisions = await owner.agent.get(`${base}/guides/${guideId}/revisions`).expect(200);
    expect(revisions.body.map((revision: { number: number }) => revision.number)).toEqual([2, 1]);
    expect(revisions.body[0].publishedBy).toEqual({ displayName: owner.displayName });
  });

  it('withdraws a guide from public view and keeps its revisions', async () => {
    await owner.agent.delete(`${base}/guides/${guideId}/publication`).expect(204);
    const gone = await request(app.getHttpServer()).get(`/api/guides/${workshopSlug}/fitting-the-test-coupler`).expect(404);
    expect(gone.body.message).toBe('This guide is not published.');
    await request(app.getHttpServer()).get(`/api/guides/${workshopSlug}/fitting-the-test-coupler/video`).expect(404);
    const guide = await owner.agent.get(`${base}/guides/${guideId}`).expect(200);
    expect(guide.body).toMatchObject({ status: 'draft', publishedRevision: null, hasUnpublishedChanges: false });
    expect((await owner.agent.get(`${base}/guides/${guideId}/revisions`).expect(200)).body).toHaveLength(2);
  });

  it('keeps drafts private: another account cannot reach the editor routes', async () => {
    const stranger = await signUpAndSignIn(app);
    await stranger.agent.get(`${base}/guides/${guideId}`).expect(404);
    await stranger.agent.get(`${base}/builds/${buildId}/guides`).expect(404);
  });
});
