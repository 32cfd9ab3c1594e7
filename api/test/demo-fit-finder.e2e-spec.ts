import { NestExpressApplication } from '@nestjs/platform-express';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { loadDemoAccounts } from '../src/database/demo/demo-accounts';
import { loadDemoFitData } from '../src/database/demo/demo-fit-data';
import { loadDemoFootage } from '../src/database/demo/demo-footage';
import { loadDemoGuide } from '../src/database/demo/demo-guide';
import { loadDemoMarks } from '../src/database/demo/demo-marks';
import { loadDemoFinderEvidence, loadDemoSecondWorkshop, SECOND_WORKSHOP } from '../src/database/demo/demo-second-workshop';
import { createTestApp } from './create-test-app';

// The demo clip may have to be generated first (about 15 s); later runs reuse it from .data/.
jest.setTimeout(180_000);

describe('demo fit finder (real MariaDB, Redis, S3 fake)', () => {
  let app: NestExpressApplication;
  beforeAll(async () => {
    app = await createTestApp();
  });
  afterAll(async () => app.close());

  it('finds the demo coupler by its spline: Harrow Lane matches at the counting moment, Quarry Hill is a near miss with another pitch', async () => {
    const accounts = await loadDemoAccounts(app.get(DataSource));
    const ids = { workshopId: accounts.workshopId, creatorId: accounts.ownerId };
    await loadDemoFitData(app, ids);
    await loadDemoFootage(app, ids);
    await loadDemoMarks(app, ids);
    await loadDemoGuide(app, ids);
    await loadDemoFinderEvidence(app, ids);
    expect(await loadDemoFinderEvidence(app, ids)).toBe('finder evidence already loaded');
    await loadDemoSecondWorkshop(app);
    expect(await loadDemoSecondWorkshop(app)).toBe('second demo workshop already loaded');

    const answer = (await request(app.getHttpServer()).get('/api/fit-finder').query({ splineTeeth: 21, splinePitch: '16/32' }).expect(200)).body;
    const harrow = answer.results.find((result: { workshop: { slug: string } }) => result.workshop.slug === 'harrow-lane-garage');
    expect(harrow).toMatchObject({ verdict: 'match', assembly: '21-tooth coupler stack', vehicle: 'Compact pickup, 1980s, electric conversion' });
    expect(harrow.checks[0]).toMatchObject({ criterion: 'spline', state: 'bench_pass', title: 'Spline match: coupler to gearbox input' });
    // The link seeks to the mark where the narration counts the teeth (a step mark 0.5 s into its cue).
    const guide = (await request(app.getHttpServer()).get(`/api${harrow.guide.path}`).expect(200)).body;
    const counting = guide.marks.find((mark: { label: string }) => mark.label.startsWith('Counting the coupler'));
    expect(harrow.link).toBe(`${harrow.guide.path}?t=${(counting.startMs / 1000).toFixed(1)}`);

    const quarry = answer.nearMisses.find((result: { workshop: { slug: string } }) => result.workshop.slug === SECOND_WORKSHOP.slug);
    expect(quarry.checks[0].reasons[0]).toBe('same teeth, other pitch: 16/32 diametral pitch (ANSI B92.1) asked, this is 24/48 diametral pitch (ANSI B92.1)');
    expect(answer.results.map((result: { workshop: { slug: string } }) => result.workshop.slug)).not.toContain(SECOND_WORKSHOP.slug);

    // Asked for 24/48, the roles swap; the 27-tooth catalogue coupler is in no published guide.
    const fine = (await request(app.getHttpServer()).get('/api/fit-finder').query({ splineTeeth: 21, splinePitch: '24/48' }).expect(200)).body;
    expect(fine.results.map((result: { workshop: { slug: string } }) => result.workshop.slug)).toContain(SECOND_WORKSHOP.slug);
    expect(fine.nearMisses.map((result: { workshop: { slug: string } }) => result.workshop.slug)).toContain('harrow-lane-garage');
    const byPart = (await request(app.getHttpServer()).get('/api/fit-finder').query({ partNumber: 'HL 2107' }).expect(200)).body;
    // A part-number query stands on the assembly's best check: the test fit, confirmed by Rowan Avery (Harrow Lane shows names).
    expect(byPart.results[0].checks[0]).toMatchObject({ criterion: 'part', state: 'confirmed', confirmedBy: 'Rowan Avery' });
    expect((await request(app.getHttpServer()).get('/api/fit-finder').query({ partNumber: 'BD-2741' }).expect(200)).body.total).toBe(0);
  });
});
