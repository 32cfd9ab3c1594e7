import { NestExpressApplication } from '@nestjs/platform-express';
import { parseTranscript } from '../src/engine/transcript-formats';
import { createTestApp } from './create-test-app';
import { browserAgent, signUpAndSignIn, TestAccount, uniqueSlug } from './support/accounts';
import { makeClip, removeScratch, uploadFile, waitUntilProcessed } from './support/footage';

jest.setTimeout(60_000);


/** Invented demo narration (DESIGN.md's scenario), never from a real video. */
const SPLINE_VTT = `WEBVTT - coupler check

intro
00:00:01.000 --> 00:00:04.000
Today we check the coupler spline against the gearbox input shaft.

00:00:04.500 --> 00:00:08.000 align:start
<v Rowan>The twenty-one tooth coupler slides on &amp; seats fully.

NOTE the 27-tooth candidate is measured later

00:00:09.000 --> 00:00:13.000
The pilot bearing bore measures fifteen thousandths over.
`;

const BEARING_SRT = `1
00:00:02,000 --> 00:00:05,000
Pilot bearing out, bore cleaned.

2
00:00:06,000 --> 00:00:10,000
Driveshaft length sits inside the window.
`;

describe('transcripts: attach, replace (revisions kept), export WebVTT, FULLTEXT search (real MariaDB)', () => {
  let app: NestExpressApplication;
  let owner: TestAccount;
  let workshopId: string;
  let buildId: string;
  let footageId: string;
  let secondFootageId: string;
  let durationMs: number;

  beforeAll(async () => {
    app = await createTestApp();
    owner = await signUpAndSignIn(app);
    const workshop = await owner.agent.post('/api/workshops').send({ name: 'Harrow Lane Garage', slug: uniqueSlug('transcripts') }).expect(201);
    workshopId = workshop.body.id;
    const build = await owner.agent.post(`/api/workshops/${workshopId}/builds`).send({ title: 'Motor-to-gearbox coupler' }).expect(201);
    buildId = build.body.id;
    const clip = makeClip('twenty-seconds.mp4', { seconds: 20, width: 160, height: 120, rate: 10 });
    footageId = await uploadFile(owner.agent, workshopId, buildId, clip);
    secondFootageId = await uploadFile(owner.agent, workshopId, buildId, clip);
    durationMs = (await waitUntilProcessed(owner.agent, workshopId, footageId)).durationMs as number;
    await waitUntilProcessed(owner.agent, workshopId, secondFootageId);
  });
  afterAll(async () => {
    removeScratch();
    await app.close();
  });

  const transcriptUrl = (id: string, suffix = '') => `/api/workshops/${workshopId}/footage/${id}/transcript${suffix}`;

  it('attaches a pasted WebVTT transcript, detected automatically, as revision 1', async () => {
    const attached = await owner.agent.put(transcriptUrl(footageId)).send({ text: SPLINE_VTT }).expect(200);
    expect(attached.body).toMatchObject({ revision: 1, format: 'webvtt', sourceName: null, cueCount: 3, isActive: true });
    expect(attached.body.cues).toEqual([
      { index: 0, startMs: 1000, endMs: 4000, text: 'Today we check the coupler spline against the gearbox input shaft.' },
      { index: 1, startMs: 4500, endMs: 8000, text: 'The twenty-one tooth coupler slides on & seats fully.' },
      { index: 2, startMs: 9000, endMs: 13000, text: 'The pilot bearing bore measures fifteen thousandths over.' },
    ]);
    const read = await owner.agent.get(transcriptUrl(footageId)).expect(200);
    expect(read.body.cues).toHaveLength(3);
    const listed = await owner.agent.get(`/api/workshops/${workshopId}/builds/${buildId}/footage`).expect(200);
    expect(listed.body.find((footage: { id: string }) => footage.id === footageId).transcript).toEqual({ revision: 1, cueCount: 3 });
  });

  it('exports WebVTT for a <track>: text/vtt that parses back to the same cues', async () => {
    const exported = await owner.agent.get(transcriptUrl(footageId, '/webvtt')).expect(200);
    expect(exported.headers['content-type']).toBe('text/vtt; charset=utf-8');
    expect(exported.headers['content-disposition']).toBeUndefined();
    const reparsed = parseTranscript(exported.text, 'webvtt');
    expect(reparsed.cues.map(({ startMs, endMs, text }) => ({ startMs, endMs, text }))).toEqual([
      { startMs: 1000, endMs: 4000, text: 'Today we check the coupler spline against the gearbox input shaft.' },
      { startMs: 4500, endMs: 8000, text: 'The twenty-one tooth coupler slides on & seats fully.' },
      { startMs: 9000, endMs: 13000, text: 'The pilot bearing bore measures fifteen thousandths over.' },
    ]);
    expect(reparsed.cues[0].identifier).toBe('intro');
    const download = await owner.agent.get(transcriptUrl(footageId, '/webvtt?download=true')).expect(200);
    expect(download.headers['content-disposition']).toMatch(/^attachment; filename=".+-r1\.vtt"$/);
  });

  it('replaces the transcript by file upload (SubRip) and keeps the previous revision', async () => {
    const replaced = await owner.agent
      .post(transcriptUrl(footageId, '/file'))
      .attach('file', Buffer.from(BEARING_SRT, 'utf8'), { filename: 'bearing.srt', contentType: 'application/x-subrip' })
      .expect(201);
    expect(replaced.body).toMatchObject({ revision: 2, format: 'srt', sourceName: 'bearing.srt', cueCount: 2, isActive: true });
    const revisions = await owner.agent.get(transcriptUrl(footageId, '/revisions')).expect(200);
    expect(revisions.body.map((revision: { revision: number; isActive: boolean }) => [revision.revision, revision.isActive])).toEqual([
      [2, true],
      [1, false],
    ]);
    const first = await owner.agent.get(transcriptUrl(footageId, '?revision=1')).expect(200);
    expect(first.body.cues[0].text).toMatch(/coupler spline/);
    const firstExport = await owner.agent.get(transcriptUrl(footageId, '/webvtt?revision=1')).expect(200);
    expect(firstExport.text).toMatch(/coupler spline/);
    await owner.agent.get(transcriptUrl(footageId, '?revision=9')).expect(404);
  });

  it('ends the last timestamped line at the end of the footage', async () => {
    const text = '[0:01] Measure the driveshaft installed length.\n[0:05] Compress it to the bump stop.\ncontinued on a second line\n[0:12] Check the plunge margin.\n';
    const attached = await owner.agent.put(transcriptUrl(secondFootageId)).send({ text, format: 'auto' }).expect(200);
    expect(attached.body.format).toBe('timestamped');
    expect(attached.body.cues).toEqual([
      { index: 0, startMs: 1000, endMs: 5000, text: 'Measure the driveshaft installed length.' },
      { index: 1, startMs: 5000, endMs: 12000, text: 'Compress it to the bump stop.\ncontinued on a second line' },
      { index: 2, startMs: 12000, endMs: durationMs, text: 'Check the plunge margin.' },
    ]);
  });

  describe('bad input', () => {
    it('answers 422 naming the first bad line, and stores nothing', async () => {
      const bad = 'WEBVTT\n\n00:00:01.000 --> 00:00:02.000\nfine\n\n00:00:03.000 -> 00:00:04.000\nbroken arrow\n';
      const refused = await owner.agent.put(transcriptUrl(footageId)).send({ text: bad }).expect(422);
      expect(refused.body).toMatchObject({ statusCode: 422, line: 6, message: expect.stringMatching(/^Line 6: expected a cue timing/) });
      const srt = '1\n00:00:01,000 --> 00:00:02,000\nok\n\n2\n00:00:03,000 --> 00:00:02,000\nbackwards\n';
      const backwards = await owner.agent.put(transcriptUrl(footageId)).send({ text: srt }).expect(422);
      expect(backwards.body).toMatchObject({ line: 6, message: expect.stringMatching(/ends .* before or when it starts/) });
      const stamped = await owner.agent.put(transcriptUrl(footageId)).send({ text: '[0:01] a\n[0:25] past the end\n' }).expect(422);
      expect(stamped.body).toMatchObject({ line: 2, message: expect.stringMatching(/at or after the end of the footage/) });
      const current = await owner.agent.get(transcriptUrl(footageId)).expect(200);
      expect(current.body.revision).toBe(2);
    });

    it('refuses a file that is not UTF-8 text, naming the line', async () => {
      const bytes = Buffer.concat([Buffer.from('WEBVTT\n\n00:00:01.000 --> 00:00:02.000\n'), Buffer.from([0x63, 0x61, 0x66, 0xe9, 0x0a])]);
      const refused = await owner.agent.post(transcriptUrl(footageId, '/file')).attach('file', bytes, 'latin1.vtt').expect(422);
      expect(refused.body).toMatchObject({ line: 4, message: 'Line 4: the file is not UTF-8 text; save it as UTF-8 and attach it again' });
    });

    it('refuses cues after the end of the footage (the transcript of another video?)', async () => {
      const refused = await owner.agent
        .put(transcriptUrl(footageId))
        .send({ text: 'WEBVTT\n\n00:00:01.000 --> 00:00:02.000\na\n\n00:05:00.000 --> 00:05:02.000\nb\n' })
        .expect(422);
      expect(refused.body.message).toMatch(/^Cue 2 starts at 00:05:00.000, at or after the end of the footage/);
    });

    it('limits size and cue count', async () => {
      const huge = 'x'.repeat(2_000_001);
      const tooLong = await owner.agent.put(transcriptUrl(footageId)).send({ text: huge }).expect(400);
      expect(tooLong.body.message).toEqual(['text must be at most 2 MB']);
      const tooLarge = await owner.agent.post(transcriptUrl(footageId, '/file')).attach('file', Buffer.alloc(2_000_001, 0x41), 'big.vtt').expect(413);
      expect(tooLarge.body.message).toBe('The transcript file must be 2 MB or smaller');
      const manyCues = `WEBVTT\n\n${Array.from({ length: 10_001 }, (_, index) => `00:00:00.${String(index % 1000).padStart(3, '0')} --> 00:00:01.000\n${index}`).join('\n\n')}\n`;
      const tooMany = await owner.agent.put(transcriptUrl(footageId)).send({ text: manyCues }).expect(422);
      expect(tooMany.body.message).toMatch(/more than 10000 cues/);
      await owner.agent.put(transcriptUrl(footageId)).send({ text: '' }).expect(422);
      await owner.agent.put(transcriptUrl(footageId)).send({ text: 'WEBVTT\n', format: 'vtt' }).expect(400);
    });

    it('waits for the footage to be ready', async () => {
      const plan = await owner.agent
        .post(`/api/workshops/${workshopId}/builds/${buildId}/footage`)
        .send({ fileName: 'later.mp4', contentType: 'video/mp4', sizeBytes: 1000 })
        .expect(201);
      const refused = await owner.agent.put(transcriptUrl(plan.body.footage.id)).send({ text: SPLINE_VTT }).expect(409);
      expect(refused.body.message).toMatch(/once the footage is ready \(it is uploading\)/);
      await owner.agent.delete(`/api/workshops/${workshopId}/footage/${plan.body.footage.id}/upload`).expect(204);
    });
  });

  describe('search (MariaDB FULLTEXT)', () => {
    beforeAll(async () => {
      // The active revision of the first footage is the SubRip one; add the spline narration to the second.
      await owner.agent.put(transcriptUrl(secondFootageId)).send({ text: SPLINE_VTT }).expect(200);
    });

    it('finds cues within one footage, in time order, with their times', async () => {
      const found = await owner.agent.get(transcriptUrl(footageId, '/search?q=Pilot%20bearing')).expect(200);
      expect(found.body).toEqual({
        terms: ['pilot', 'bearing'],
        total: 1,
        offset: 0,
        results: [{ cueIndex: 0, startMs: 2000, endMs: 5000, text: 'Pilot bearing out, bore cleaned.' }],
      });
      // Prefixes match longer words; replaced revisions are not searched.
      const prefix = await owner.agent.get(transcriptUrl(footageId, '/search?q=drive')).expect(200);
      expect(prefix.body.results.map((cue: { startMs: number }) => cue.startMs)).toEqual([6000]);
      const old = await owner.agent.get(transcriptUrl(footageId, '/search?q=spline')).expect(200);
      expect(old.body.results).toEqual([]);
    });

    it('pages through every hit, saying how many there are in all', async () => {
      const first = await owner.agent.get(transcriptUrl(footageId, '/search?q=drive&limit=1')).expect(200);
      expect(first.body).toMatchObject({ total: 1, offset: 0 });
      expect(first.body.results).toHaveLength(1);
      const past = await owner.agent.get(transcriptUrl(footageId, '/search?q=drive&limit=1&offset=1')).expect(200);
      expect(past.body).toMatchObject({ total: 1, offset: 1, results: [] });
      const everywhere = await owner.agent.get(`/api/workshops/${workshopId}/transcripts/search?q=bearing&limit=1`).expect(200);
      expect(everywhere.body).toMatchObject({ total: 2, offset: 0 });
      const second = await owner.agent.get(`/api/workshops/${workshopId}/transcripts/search?q=bearing&limit=1&offset=1`).expect(200);
      expect(second.body.total).toBe(2);
      // The two pages together are the two hits, none repeated.
      expect(new Set([everywhere.body.results[0].startMs, second.body.results[0].startMs])).toEqual(new Set([2000, 9000]));
      await owner.agent.get(transcriptUrl(footageId, '/search?q=drive&offset=-1')).expect(400);
    });

    it("searches across the workshop's footage, naming the footage and build of each cue", async () => {
      const found = await owner.agent.get(`/api/workshops/${workshopId}/transcripts/search?q=bearing`).expect(200);
      expect(found.body.total).toBe(2);
      expect(found.body.results).toHaveLength(2);
      expect(found.body.results).toEqual(
        expect.arrayContaining([
          expect.objectContaining({ footageId, startMs: 2000, buildId, buildTitle: 'Motor-to-gearbox coupler', footageTitle: 'twenty-seconds' }),
          expect.objectContaining({ footageId: secondFootageId, startMs: 9000, text: 'The pilot bearing bore measures fifteen thousandths over.' }),
        ]),
      );
    });

    it("never returns another workshop's cues", async () => {
      const other = await owner.agent.post('/api/workshops').send({ name: 'Other shop', slug: uniqueSlug('other') }).expect(201);
      const found = await owner.agent.get(`/api/workshops/${other.body.id}/transcripts/search?q=bearing`).expect(200);
      expect(found.body.results).toEqual([]);
      await owner.agent.get(`/api/workshops/${other.body.id}/footage/${footageId}/transcript/search?q=bearing`).expect(404);
    });

    it('explains a search with no searchable word', async () => {
      const refused = await owner.agent.get(transcriptUrl(footageId, '/search?q=the%20at')).expect(400);
      expect(refused.body.message).toMatch(/at least one word of three or more/);
      await owner.agent.get(transcriptUrl(footageId, '/search')).expect(400);
    });
  });

  describe('access', () => {
    it('answers 404 to non-members and 401 to anonymous callers', async () => {
      const stranger = await signUpAndSignIn(app);
      await stranger.agent.get(transcriptUrl(footageId)).expect(404);
      await stranger.agent.get(transcriptUrl(footageId, '/webvtt')).expect(404);
      await stranger.agent.put(transcriptUrl(footageId)).send({ text: SPLINE_VTT }).expect(404);
      await stranger.agent.get(`/api/workshops/${workshopId}/transcripts/search?q=bearing`).expect(404);
      const anonymous = await browserAgent(app);
      await anonymous.get(transcriptUrl(footageId, '/webvtt')).expect(401);
      await anonymous.get(`/api/workshops/${workshopId}/transcripts/search?q=bearing`).expect(401);
    });
  });
});
