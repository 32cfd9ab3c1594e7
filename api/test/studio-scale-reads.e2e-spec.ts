import { NestExpressApplication } from '@nestjs/platform-express';
import request from 'supertest';
import { createTestApp } from './create-test-app';
import { signUpAndSignIn, TestAccount, uniqueSlug } from './support/accounts';
import { makeClip, removeScratch, uploadFile, waitUntilProcessed } from './support/footage';

/** Invented transcript: 300 cues 0.4 s apart (0.3 s long), every seventh one about the spline. */
const CUE_COUNT = 300;
const clock = (ms: number) => new Date(ms).toISOString().slice(11, 23);
const cueText = (index: number) => (index % 7 === 0 ? `Count the spline teeth, pass ${index}` : `Bench talk line ${index}`);
const TRANSCRIPT = `WEBVTT\n\n${Array.from({ length: CUE_COUNT }, (_, index) => `${clock(index * 400)} --> ${clock(index * 400 + 300)}\n${cueText(index)}`).join('\n\n')}\n`;

/** The big reads of a long footage, a page or a window at a time: marks, suggestions, hit moments, public cues. */
describe('long footage reads: paged marks and suggestions, hit moments, public cue windows (real MariaDB)', () => {
  let app: NestExpressApplication;
  let owner: TestAccount;
  let workshopSlug: string;
  let base: string;
  let publicBase: string;

  beforeAll(async () => {
    app = await createTestApp();
    owner = await signUpAndSignIn(app);
    workshopSlug = uniqueSlug('scale');
    const workshopId = (await owner.agent.post('/api/workshops').send({ name: 'Scale Test Shop', slug: workshopSlug }).expect(201)).body.id;
    const buildId = (await owner.agent.post(`/api/workshops/${workshopId}/builds`).send({ title: 'Long session' }).expect(201)).body.id;
    // Two minutes, so the 300 cues fit inside it; tiny, so its media jobs are quick.
    const clip = makeClip('scale-two-minutes.mp4', { seconds: 120, width: 64, height: 48, rate: 1 });
    const footageId = await uploadFile(owner.agent, workshopId, buildId, clip);
    // A shared, busy machine may take a while over the media job.
    await waitUntilProcessed(owner.agent, workshopId, footageId, 150_000);
    base = `/api/workshops/${workshopId}/footage/${footageId}`;
    await owner.agent.put(`${base}/transcript`).send({ text: TRANSCRIPT }).expect(200);
    for (let index = 0; index < 30; index += 1) {
      await owner.agent.post(`${base}/marks`).send({ startMs: (29 - index) * 4_000, kind: 'note', label: `Note ${29 - index}` }).expect(201);
    }
    const guide = (
      await owner.agent.post(`/api/workshops/${workshopId}/builds/${buildId}/guides`).send({ title: 'Long session guide', footageId }).expect(201)
    ).body;
    await owner.agent.post(`/api/workshops/${workshopId}/guides/${guide.id}/steps`).send({ title: 'Count the teeth', startMs: 0 }).expect(201);
    await owner.agent.post(`/api/workshops/${workshopId}/guides/${guide.id}/revisions`).send({ note: 'First cut' }).expect(201);
    publicBase = `/api/guides/${workshopSlug}/${guide.slug}`;
  }, 240_000);
  // Closing waits for the footage's media jobs, which a busy machine may still be running.
  afterAll(async () => {
    removeScratch();
    await app.close();
  }, 120_000);

  it('pages marks in time order with the count in all, and still answers the whole list without paging', async () => {
    const whole = await owner.agent.get(`${base}/marks`).expect(200);
    expect(whole.body).toHaveLength(30);
    expect(whole.headers['x-total-count']).toBe('30');
    const pages: string[] = [];
    for (let offset = 0; offset < 30; offset += 12) {
      const page = await owner.agent.get(`${base}/marks`).query({ limit: 12, offset }).expect(200);
      expect(page.headers['x-total-count']).toBe('30');
      pages.push(...page.body.map((mark: { label: string }) => mark.label));
    }
    expect(pages).toEqual(Array.from({ length: 30 }, (_, index) => `Note ${index}`));
    const refused = await owner.agent.get(`${base}/marks`).query({ limit: 0 }).expect(400);
    expect(JSON.stringify(refused.body.message)).toMatch(/limit/);
    const tooMany = await owner.agent.get(`${base}/mark-suggestions`).query({ limit: 501 }).expect(400);
    expect(JSON.stringify(tooMany.body.message)).toMatch(/limit/);
  });

  it('answers every hit moment of a search at once, in time order, and refuses a search of no words', async () => {
    const moments = await owner.agent.get(`${base}/transcript/search/moments`).query({ q: 'spline' }).expect(200);
    const expected = Array.from({ length: CUE_COUNT }, (_, index) => index)
      .filter((index) => index % 7 === 0)
      .map((index) => index * 400);
    expect(moments.body).toEqual({ terms: ['spline'], total: expected.length, startMs: expected });
    const pageOfHits = await owner.agent.get(`${base}/transcript/search`).query({ q: 'spline' }).expect(200);
    expect(pageOfHits.body.total).toBe(expected.length);
    await owner.agent.get(`${base}/transcript/search/moments`).query({ q: 'a' }).expect(400);
    await owner.agent.get(`${base}/transcript/search/moments`).expect(400);
  });

  it('serves a published transcript a window at a time, by time or by position, to anyone', async () => {
    const anyone = request(app.getHttpServer());
    // 12–14 s: cues 30 to 34 play then; cue 29 (11.6–11.9 s) has ended and cue 35 starts at 14 s.
    const byTime = await anyone.get(`${publicBase}/cues`).query({ fromMs: 12_000, toMs: 14_000 }).expect(200);
    expect(byTime.body.total).toBe(CUE_COUNT);
    expect(byTime.body.cues.map((cue: { index: number }) => cue.index)).toEqual([30, 31, 32, 33, 34]);
    expect(byTime.body.cues[0]).toEqual({ index: 30, startMs: 12_000, endMs: 12_300, text: cueText(30) });
    expect(byTime.headers['cache-control']).toBe('public, max-age=60');
    // A window starting mid-cue includes the cue still playing.
    const midCue = await anyone.get(`${publicBase}/cues`).query({ fromMs: 12_100, toMs: 12_500 }).expect(200);
    expect(midCue.body.cues.map((cue: { index: number }) => cue.index)).toEqual([30, 31]);
    // The last rows of the list by position: the last cue is reachable.
    const last = await anyone.get(`${publicBase}/cues`).query({ fromIndex: 290, limit: 50 }).expect(200);
    expect(last.body.cues.map((cue: { index: number }) => cue.index)).toEqual(Array.from({ length: 10 }, (_, index) => 290 + index));
    // Neither pair, both pairs, a backwards stretch, too many: 400 naming what to give.
    expect((await anyone.get(`${publicBase}/cues`).expect(400)).body.message).toMatch(/fromMs and toMs, or fromIndex/);
    await anyone.get(`${publicBase}/cues`).query({ fromMs: 0, toMs: 10, fromIndex: 0 }).expect(400);
    expect((await anyone.get(`${publicBase}/cues`).query({ fromMs: 9_000, toMs: 9_000 }).expect(400)).body.message).toMatch(/toMs must be greater/);
    await anyone.get(`${publicBase}/cues`).query({ fromIndex: 0, limit: 501 }).expect(400);
    await anyone.get(`/api/guides/${workshopSlug}/no-such-guide/cues`).query({ fromIndex: 0 }).expect(404);
  });
});
