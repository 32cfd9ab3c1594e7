import { NestExpressApplication } from '@nestjs/platform-express';
import { DataSource } from 'typeorm';
import { DEMO_PASSWORD, DEMO_PEOPLE, loadDemoAccounts } from '../src/database/demo/demo-accounts';
import { DEMO_BUILD_TITLE, loadDemoFitData } from '../src/database/demo/demo-fit-data';
import { DEMO_FOOTAGE_TITLE, loadDemoFootage } from '../src/database/demo/demo-footage';
import { DEMO_MARKS, loadDemoMarks } from '../src/database/demo/demo-marks';
import { createTestApp } from './create-test-app';
import { signIn } from './support/accounts';

// The demo clip is generated on the first run (about 15 s) and reused from .data/ after that.
jest.setTimeout(180_000);

interface MarkBody {
  kind: string;
  label: string;
  startMs: number;
  endMs: number | null;
  partId: string | null;
  measurementId: string | null;
  fitCheckId: string | null;
  guideStepId: string | null;
}

describe('demo marks (real MariaDB, Redis, S3 fake, ffmpeg)', () => {
  let app: NestExpressApplication;
  beforeAll(async () => {
    app = await createTestApp();
  });
  afterAll(async () => app.close());

  it('marks the walkthrough where its narration names things, once, and leaves suggestions to review', async () => {
    const accounts = await loadDemoAccounts(app.get(DataSource));
    const ids = { workshopId: accounts.workshopId, creatorId: accounts.ownerId };
    await loadDemoFitData(app, ids);
    await loadDemoFootage(app, ids);
    await loadDemoMarks(app, ids);
    expect(await loadDemoMarks(app, ids)).toBe('demo marks already loaded');

    const owner = await signIn(app, DEMO_PEOPLE.owner.email, DEMO_PASSWORD);
    const base = `/api/workshops/${accounts.workshopId}`;
    const build = ((await owner.get(`${base}/builds`).expect(200)).body as { id: string; title: string }[]).find(
      (candidate) => candidate.title === DEMO_BUILD_TITLE,
    )!;
    const footage = ((await owner.get(`${base}/builds/${build.id}/footage`).expect(200)).body as { id: string; title: string }[]).find(
      (item) => item.title === DEMO_FOOTAGE_TITLE,
    )!;
    // The demo guide adds its step marks to the same footage; these are the ones this module adds.
    const labels = new Set(DEMO_MARKS.map((mark) => mark.label));
    const marks = ((await owner.get(`${base}/footage/${footage.id}/marks`).expect(200)).body as MarkBody[]).filter((mark) =>
      labels.has(mark.label),
    );
    expect(marks.map((mark) => mark.label).sort()).toEqual([...labels].sort());
    const { cues } = (await owner.get(`${base}/footage/${footage.id}/transcript`).expect(200)).body as {
      cues: { startMs: number; endMs: number; text: string }[];
    };
    const cueSaying = (phrase: string) => cues.find((cue) => cue.text.includes(phrase))!;
    const markLabelled = (fragment: string) => marks.find((mark) => mark.label.includes(fragment))!;

    // Part marks sit in the cue that names the part and link to it.
    const parts = (await owner.get(`${base}/parts`).expect(200)).body as { id: string; partNumber: string }[];
    const partId = (partNumber: string) => parts.find((part) => part.partNumber === partNumber)!.id;
    expect(markLabelled('In-house coupler')).toMatchObject({
      kind: 'part',
      partId: partId('HL-2107'),
      startMs: cueSaying('H L twenty-one oh seven').startMs,
    });
    const catalogue = markLabelled('Catalogue coupler');
    expect(catalogue).toMatchObject({ kind: 'part', partId: partId('BD-2741') });
    const sentence = cueSaying('twenty-seven');
    expect(catalogue.startMs).toBeGreaterThan(sentence.startMs);
    expect(catalogue.startMs).toBeLessThan(sentence.endMs);

    // The measurement mark links the demo's 0.5902 in pilot-nose reading, spoken in its cue.
    const measured = markLabelled('Pilot nose');
    expect(measured).toMatchObject({ kind: 'measurement', startMs: cueSaying('zero point five nine zero two inch').startMs });
    const { measurements } = (await owner.get(`${base}/measurements`).expect(200)).body as {
      measurements: { id: string; value: string; unit: string }[];
    };
    expect(measurements.find((reading) => reading.id === measured.measurementId)).toMatchObject({ value: '0.5902', unit: 'in' });

    // The check-evidence mark links the confirmed test fit.
    const assemblies = (await owner.get(`${base}/builds/${build.id}/assemblies`).expect(200)).body as { id: string; name: string }[];
    const stack = assemblies.find((assembly) => assembly.name === '21-tooth coupler stack')!;
    const checklist = (await owner.get(`${base}/assemblies/${stack.id}/checklist`).expect(200)).body as {
      checks: { id: string; title: string; state: string }[];
    };
    const evidence = markLabelled('turns freely');
    expect(evidence).toMatchObject({ kind: 'check_evidence', startMs: cueSaying('Fit confirmed').startMs });
    expect(checklist.checks.find((check) => check.id === evidence.fitCheckId)).toMatchObject({ state: 'confirmed' });

    // The caution spans its whole cue (the battery hazard is DANGER, as everywhere in the demo); the note links
    // nothing; none is a guide step (the demo guide adds those).
    const warning = cueSaying('isolate the high voltage battery');
    expect(markLabelled('high-voltage battery')).toMatchObject({ kind: 'caution', startMs: warning.startMs, endMs: warning.endMs, partId: null });
    expect(markLabelled('high-voltage battery').label).toMatch(/^DANGER: /);
    expect(marks.find((mark) => mark.kind === 'note')).toMatchObject({ partId: null, measurementId: null, fitCheckId: null });
    expect(marks.filter((mark) => mark.kind === 'step' || mark.guideStepId !== null)).toEqual([]);

    // The transcript's spoken measurements wait as suggestions.
    const pending = (await owner.get(`${base}/footage/${footage.id}/mark-suggestions`).expect(200)).body as {
      kind: string;
      phrase: string;
      value: string | null;
      unit: string | null;
    }[];
    expect(pending.length).toBeGreaterThanOrEqual(3);
    expect(pending).toEqual(
      expect.arrayContaining([
        expect.objectContaining({ kind: 'measurement', value: '0.015', unit: 'in' }),
        expect.objectContaining({ kind: 'measurement', value: '15.008', unit: 'mm' }),
      ]),
    );
    // Those in a sentence whose mark already links their part or reading are settled.
    expect(pending.filter((suggestion) => suggestion.value === '0.5902' || suggestion.phrase === 'H L twenty-one oh seven')).toEqual([]);
  });
});
