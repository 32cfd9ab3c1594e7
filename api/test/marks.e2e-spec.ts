import { NestExpressApplication } from '@nestjs/platform-express';
import { createTestApp } from './create-test-app';
import { browserAgent, signUpAndSignIn, TestAccount, uniqueSlug } from './support/accounts';
import { makeClip, removeScratch, uploadFile, waitUntilProcessed } from './support/footage';

jest.setTimeout(90_000);


/** Invented shop talk written for this test: three real hits and decoys that only look like numbers. */
const LINES = [
  'Right, the two of us are swapping the coupler on the bench this afternoon.',
  'The shop has run 24/7 since the spring of 2019, and the motor takes four bolts.',
  'Box says coupler number four four one seven twenty-two, the one we ordered.',
  'Across the flats the caliper reads twenty-two millimetres.',
  'The pilot bore measures fifteen thousandths over nominal.',
];

const clock = (ms: number) => new Date(ms).toISOString().slice(11, 23);
/** Cue i runs from offset + 3 s·i for 2.5 s; a replacement shifts every cue by `offsetMs`. */
const webVtt = (lines: string[], offsetMs: number) =>
  `WEBVTT\n\n${lines.map((text, i) => `${clock(offsetMs + 2000 + i * 3000)} --> ${clock(offsetMs + 4500 + i * 3000)}\n${text}\n`).join('\n')}`;

interface SuggestionBody {
  id: string;
  kind: 'measurement' | 'part';
  startMs: number;
  cueIndex: number;
  phrase: string;
  value: string | null;
  unit: string | null;
  partId: string | null;
  status: string;
}

describe('marks and suggestions mined from the transcript (real MariaDB and Redis)', () => {
  let app: NestExpressApplication;
  let owner: TestAccount;
  let workshopId: string;
  let footageId: string;
  let part: { id: string; features: { id: string; name: string }[] };
  let otherPartId: string;
  let base: string;
  let buildId: string;

  const suggestions = async (status = 'pending'): Promise<SuggestionBody[]> =>
    (await owner.agent.get(`${base}/mark-suggestions`).query({ status }).expect(200)).body;

  /** The mining job runs on the Bull worker; wait until it has stored what `done` expects. */
  async function waitForSuggestions(done: (rows: SuggestionBody[]) => boolean): Promise<SuggestionBody[]> {
    const deadline = Date.now() + 20_000;
    for (;;) {
      const rows = await suggestions();
      if (done(rows)) return rows;
      if (Date.now() > deadline) throw new Error(`suggestions never settled: ${JSON.stringify(rows)}`);
      await new Promise((resolve) => setTimeout(resolve, 200));
    }
  }

  beforeAll(async () => {
    app = await createTestApp();
    owner = await signUpAndSignIn(app);
    workshopId = (await owner.agent.post('/api/workshops').send({ name: 'Marks Test Shop', slug: uniqueSlug('marks') }).expect(201)).body.id;
    buildId = (await owner.agent.post(`/api/workshops/${workshopId}/builds`).send({ title: 'Bench coupler swap' }).expect(201)).body.id;
    part = (
      await owner.agent
        .post(`/api/workshops/${workshopId}/parts`)
        .send({
          partNumber: '4417-22',
          title: 'Bench coupler',
          category: 'coupler',
          features: [{ name: 'pilot bore', kind: 'diameter', role: 'hole', nominal: '15', unit: 'mm' }],
        })
        .expect(201)
    ).body;
    otherPartId = (
      await owner.agent.post(`/api/workshops/${workshopId}/parts`).send({ partNumber: 'QX-90', title: 'Spacer', category: 'other' }).expect(201)
    ).body.id;
    const clip = makeClip('marks-twenty-seconds.mp4', { seconds: 20, width: 160, height: 120, rate: 10 });
    footageId = await uploadFile(owner.agent, workshopId, buildId, clip);
    await waitUntilProcessed(owner.agent, workshopId, footageId);
    base = `/api/workshops/${workshopId}/footage/${footageId}`;
  });
  afterAll(async () => {
    removeScratch();
    await app.close();
  });

  it('mines an attached transcript: a spoken part number and two measurements at their cues, nothing for decoys', async () => {
    await owner.agent.put(`${base}/transcript`).send({ text: webVtt(LINES, 0) }).expect(200);
    const rows = await waitForSuggestions((found) => found.length >= 3);
    expect(rows.map(({ kind, startMs, cueIndex, phrase, value, unit, partId }) => ({ kind, startMs, cueIndex, phrase, value, unit, partId }))).toEqual([
      { kind: 'part', startMs: 8000, cueIndex: 2, phrase: 'four four one seven twenty-two', value: null, unit: null, partId: part.id },
      { kind: 'measurement', startMs: 11000, cueIndex: 3, phrase: 'twenty-two millimetres', value: '22', unit: 'mm', partId: null },
      { kind: 'measurement', startMs: 14000, cueIndex: 4, phrase: 'fifteen thousandths', value: '0.015', unit: 'in', partId: null },
    ]);
    // The decoy lines (cues 0 and 1) yield nothing.
    expect(rows.some((row) => row.cueIndex < 2)).toBe(false);
  });

  let acceptedMarkId: string;

  it('accepts a measurement suggestion: the mark and the reading, both at the cue time', async () => {
    const thou = (await suggestions()).find((row) => row.phrase === 'fifteen thousandths')!;
    const missingSubject = await owner.agent.post(`${base}/mark-suggestions/${thou.id}/accept`).send({}).expect(400);
    expect(missingSubject.body.message).toMatch(/featureId/);
    const accepted = await owner.agent
      .post(`${base}/mark-suggestions/${thou.id}/accept`)
      .send({ featureId: part.features[0].id, quantity: 'diameter' })
      .expect(201);
    expect(accepted.body.mark).toMatchObject({ kind: 'measurement', startMs: 14000, endMs: 16500, label: 'fifteen thousandths' });
    expect(accepted.body.measurement).toMatchObject({
      value: '0.015',
      unit: 'in',
      footageId,
      footageTimeMs: 14000,
      instrument: { kind: 'other', resolution: '0.001' },
    });
    expect(accepted.body.mark.measurementId).toBe(accepted.body.measurement.id);
    acceptedMarkId = accepted.body.mark.id;
    await owner.agent.post(`${base}/mark-suggestions/${thou.id}/accept`).send({ featureId: part.features[0].id }).expect(409);
    expect((await suggestions('accepted')).map((row) => row.id)).toEqual([thou.id]);
  });

  it('moves the reading with its mark when the mark is re-timed', async () => {
    const moved = await owner.agent.patch(`${base}/marks/${acceptedMarkId}`).send({ startMs: 14200 }).expect(200);
    const { measurements: readings } = (
      await owner.agent.get(`/api/workshops/${workshopId}/measurements`).query({ featureId: part.features[0].id }).expect(200)
    ).body;
    expect(readings.find((reading: { id: string }) => reading.id === moved.body.measurementId).footageTimeMs).toBe(14200);
    await owner.agent.patch(`${base}/marks/${acceptedMarkId}`).send({ startMs: 14000 }).expect(200);
  });

  it('dismisses a suggestion, and a replacement transcript (re-timed) does not bring it back', async () => {
    const mm = (await suggestions()).find((row) => row.phrase === 'twenty-two millimetres')!;
    await owner.agent.post(`${base}/mark-suggestions/${mm.id}/dismiss`).expect(201);
    expect((await suggestions()).map((row) => row.phrase)).toEqual(['four four one seven twenty-two']);

    await owner.agent
      .put(`${base}/transcript`)
      .send({ text: webVtt([...LINES, 'Spacer QX-90 goes behind the plate.'], 500) })
      .expect(200);
    const rows = await waitForSuggestions((found) => found.some((row) => row.phrase === 'QX-90'));
    expect(rows.map(({ phrase, startMs }) => ({ phrase, startMs }))).toEqual([
      { phrase: 'four four one seven twenty-two', startMs: 8500 },
      { phrase: 'QX-90', startMs: 17500 },
    ]);
    expect((await suggestions('dismissed')).map((row) => row.id)).toEqual([mm.id]);
    // Marks point at the footage, not at cues: the accepted mark keeps its time.
    const marks = (await owner.agent.get(`${base}/marks`).expect(200)).body;
    expect(marks.find((mark: { id: string }) => mark.id === acceptedMarkId).startMs).toBe(14000);
    const spacer = rows.find((row) => row.phrase === 'QX-90')!;
    const accepted = await owner.agent.post(`${base}/mark-suggestions/${spacer.id}/accept`).send({}).expect(201);
    expect(accepted.body.mark).toMatchObject({ kind: 'part', partId: otherPartId, startMs: 17500 });
    expect(accepted.body.measurement).toBeNull();
  });

  it('creates, filters, edits and deletes marks, checking times and links', async () => {
    const created = await owner.agent
      .post(`${base}/marks`)
      .send({ startMs: 6200, kind: 'part', partId: part.id, label: 'Coupler on the bench' })
      .expect(201);
    expect(created.body).toMatchObject({ startMs: 6200, endMs: null, kind: 'part', partId: part.id, label: 'Coupler on the bench' });
    const note = await owner.agent.post(`${base}/marks`).send({ startMs: 1000, endMs: 3000, kind: 'caution', label: 'Gloves on' }).expect(201);

    const parts = await owner.agent.get(`${base}/marks`).query({ kind: 'part' }).expect(200);
    expect(parts.body.every((mark: { kind: string }) => mark.kind === 'part')).toBe(true);
    expect(parts.body.map((mark: { startMs: number }) => mark.startMs)).toEqual([6200, 17500]);

    const edited = await owner.agent.patch(`${base}/marks/${created.body.id}`).send({ startMs: 6400, label: 'Coupler seated' }).expect(200);
    expect(edited.body).toMatchObject({ startMs: 6400, label: 'Coupler seated', partId: part.id });
    // Turning it into a note drops the part link a note cannot carry.
    const asNote = await owner.agent.patch(`${base}/marks/${created.body.id}`).send({ kind: 'note' }).expect(200);
    expect(asNote.body).toMatchObject({ kind: 'note', partId: null });

    await owner.agent.delete(`${base}/marks/${note.body.id}`).expect(204);
    await owner.agent.delete(`${base}/marks/${note.body.id}`).expect(404);
  });

  it('refuses bad input with clear messages', async () => {
    const wrongLink = await owner.agent.post(`${base}/marks`).send({ startMs: 100, kind: 'note', partId: part.id }).expect(400);
    expect(wrongLink.body.message).toMatch(/note mark links to nothing/);
    const mismatched = await owner.agent.post(`${base}/marks`).send({ startMs: 100, kind: 'measurement', partId: part.id }).expect(400);
    expect(mismatched.body.message).toMatch(/measurementId, not partId/);
    const pastEnd = await owner.agent.post(`${base}/marks`).send({ startMs: 60_000, kind: 'note' }).expect(400);
    expect(pastEnd.body.message).toMatch(/past the end/);
    await owner.agent.post(`${base}/marks`).send({ startMs: 5000, endMs: 4000, kind: 'step' }).expect(400);
    await owner.agent.post(`${base}/marks`).send({ startMs: -1, kind: 'note' }).expect(400);
    await owner.agent.post(`${base}/marks`).send({ startMs: 100, kind: 'sparkle' }).expect(400);
    await owner.agent.post(`${base}/marks`).send({ startMs: 100, kind: 'note', colour: 'red' }).expect(400);
    await owner.agent.get(`${base}/marks`).query({ kind: 'sparkle' }).expect(400);

    // A part of another workshop is "not found", never linked.
    const otherWorkshop = (await owner.agent.post('/api/workshops').send({ name: 'Elsewhere', slug: uniqueSlug('elsewhere') }).expect(201)).body.id;
    const foreignPart = (
      await owner.agent.post(`/api/workshops/${otherWorkshop}/parts`).send({ partNumber: 'ZZ-1', title: 'Foreign', category: 'other' }).expect(201)
    ).body.id;
    await owner.agent.post(`${base}/marks`).send({ startMs: 100, kind: 'part', partId: foreignPart }).expect(404);
    await owner.agent.get(`/api/workshops/${otherWorkshop}/footage/${footageId}/marks`).expect(404);
  });

  it('links a mark as a fit check\'s evidence, and a mark of this workshop only', async () => {
    const shop = `/api/workshops/${workshopId}`;
    const assemblyId = (await owner.agent.post(`${shop}/builds/${buildId}/assemblies`).send({ name: 'bench trial' }).expect(201)).body.id;
    const check = (await owner.agent.post(`${shop}/assemblies/${assemblyId}/checks`).send({ title: 'Coupler seats fully on the shaft' }).expect(201)).body;
    const seated = (await owner.agent.post(`${base}/marks`).send({ startMs: 9000, kind: 'check_evidence', fitCheckId: check.id, label: 'Seated' }).expect(201)).body;
    const evidence = await owner.agent.post(`${shop}/checks/${check.id}/evidence`).send({ kind: 'mark', markId: seated.id }).expect(201);
    expect(evidence.body).toMatchObject({ kind: 'mark', markId: seated.id, measurementId: null });
    await owner.agent.post(`${shop}/checks/${check.id}/evidence`).send({ kind: 'mark' }).expect(400);
    await owner.agent.post(`${shop}/checks/${check.id}/evidence`).send({ kind: 'mark', markId: check.id }).expect(404);
    // Removing the mark removes the evidence it was.
    await owner.agent.delete(`${base}/marks/${seated.id}`).expect(204);
    const checklist = await owner.agent.get(`${shop}/assemblies/${assemblyId}/checklist`).expect(200);
    const listed = checklist.body.checks.find((item: { id: string }) => item.id === check.id);
    expect(listed.evidence).toEqual([]);
  });

  it('answers 404 to non-members and 401 to anonymous callers', async () => {
    const stranger = await signUpAndSignIn(app);
    await stranger.agent.get(`${base}/marks`).expect(404);
    await stranger.agent.get(`${base}/mark-suggestions`).expect(404);
    await stranger.agent.post(`${base}/marks`).send({ startMs: 100, kind: 'note' }).expect(404);
    await (await browserAgent(app)).get(`${base}/marks`).expect(401);
  });
});
