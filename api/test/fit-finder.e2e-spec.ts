import { NestExpressApplication } from '@nestjs/platform-express';
import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { MysqlQueryRunner } from 'typeorm/driver/mysql/MysqlQueryRunner';
import type { FitFinderQueryDto } from '../src/fit-finder/dto/fit-finder.dto';
import { FINDER_CANDIDATES, FINDER_NEAR_CANDIDATES, FitFinderService } from '../src/fit-finder/fit-finder.service';
import { createTestApp } from './create-test-app';
import { signUpAndSignIn, uniqueSlug, type Agent, type TestAccount } from './support/accounts';
import { makeClip, removeScratch, uploadFile, waitUntilProcessed } from './support/footage';

jest.setTimeout(180_000);

interface FinderAnswer {
  understood: string[];
  total: number;
  offset: number;
  limit: number;
  nearMissTotal: number;
  results: FinderResult[];
  nearMisses: FinderResult[];
}
interface FinderResult {
  verdict: string;
  state: string;
  workshop: { name: string; slug: string };
  guide: { title: string; slug: string; path: string };
  assembly: string;
  vehicle: string;
  link: string;
  fitReports: { fit: number; noFit: number };
  checks: {
    id: string;
    title: string;
    criterion: string;
    state: string;
    verdict: string;
    reasons: string[];
    measurements: { feature: string; value: string; unit: string; millimetres: number }[];
    confirmedAt: string | null;
    confirmedBy: string | null;
    evidenceAtSeconds: number | null;
  }[];
}

/** A shop with one published (or not) guide over one assembly, made through the API as a creator would. */
interface Shop {
  owner: TestAccount;
  slug: string;
  base: string;
  assemblyId: string;
  guideId: string;
  checks: { id: string; title: string; state: string; interfaceId: string | null }[];
}

/**
 * The fit finder on the real MariaDB: published assemblies whose checks match by the engine's rules
 * (ANSI B92.1 pitch, ISO 286-2 limits), ranked confirmed > bench-passed > open, near misses apart,
 * exact units both ways (1 in = 25.4 mm), paging, and nothing from drafts or withdrawn guides.
 * Every shop's build names one vehicle word of this run, so other suites' data never changes the answers.
 */
describe('Fit finder (real MariaDB)', () => {
  let app: NestExpressApplication;
  const vehicleWord = `Finderwagon${randomUUID().slice(0, 8)}`;
  let confirmedShop: Shop;
  let benchShop: Shop;
  let openShop: Shop;
  let otherPitchShop: Shop;
  let draftShop: Shop;
  let withdrawnShop: Shop;
  const anonymous = () => request(app.getHttpServer());
  const find = async (query: Record<string, string | number>) =>
    (await anonymous().get('/api/fit-finder').query({ vehicle: vehicleWord, ...query }).expect(200)).body as FinderAnswer;

  async function makeShop(
    label: string,
    spline: { pitch?: { diametralPitch: number; stubPitch: number } },
    options: {
      publish?: boolean;
      showNames?: boolean;
      extras?: (agent: Agent, base: string, buildId: string, assemblyId: string, couplerSplineId: string) => Promise<void>;
    } = {},
  ): Promise<Shop> {
    const owner = await signUpAndSignIn(app, { displayName: `${label} Owner` });
    const slug = uniqueSlug(label.toLowerCase());
    const workshopId = (await owner.agent.post('/api/workshops').send({ name: `${label} Works`, slug }).expect(201)).body.id as string;
    const base = `/api/workshops/${workshopId}`;
    if (options.showNames) await owner.agent.patch(base).send({ showMemberNames: true }).expect(200);
    const buildId = (await owner.agent.post(`${base}/builds`).send({ title: `${label} coupler`, vehicle: `${vehicleWord} van, electric` }).expect(201)).body.id as string;
    const pitch = spline.pitch ?? {};
    const coupler = (
      await owner.agent
        .post(`${base}/parts`)
        .send({
          partNumber: `${label.toUpperCase()}-43C`,
          maker: `${label} Gear`,
          title: '43-tooth coupler',
          category: 'coupler',
          features: [{ name: 'spline', kind: 'spline', teeth: 43, gender: 'internal', pressureAngle: 30, ...pitch }],
        })
        .expect(201)
    ).body as { id: string; features: { id: string }[] };
    const shaft = (
      await owner.agent
        .post(`${base}/parts`)
        .send({
          partNumber: `${label.toUpperCase()}-43S`,
          title: '43-tooth input shaft',
          category: 'shaft',
          features: [{ name: 'spline', kind: 'spline', teeth: 43, gender: 'external', pressureAngle: 30, ...pitch }],
        })
        .expect(201)
    ).body as { id: string; features: { id: string }[] };
    const assemblyId = (await owner.agent.post(`${base}/builds/${buildId}/assemblies`).send({ name: `${label} stack` }).expect(201)).body.id as string;
    await owner.agent.put(`${base}/assemblies/${assemblyId}/parts/${coupler.id}`).send({ position: 'coupler' }).expect(204);
    await owner.agent.put(`${base}/assemblies/${assemblyId}/parts/${shaft.id}`).send({ position: 'shaft' }).expect(204);
    await owner.agent
      .post(`${base}/assemblies/${assemblyId}/interfaces`)
      .send({ kind: 'spline', name: 'coupler to shaft', featureAId: coupler.features[0].id, featureBId: shaft.features[0].id })
      .expect(201);
    await options.extras?.(owner.agent, base, buildId, assemblyId, coupler.features[0].id);
    const guide = (await owner.agent.post(`${base}/builds/${buildId}/guides`).send({ title: `${label} guide` }).expect(201)).body as { id: string };
    await owner.agent.patch(`${base}/guides/${guide.id}`).send({ assemblyId }).expect(200);
    await owner.agent.post(`${base}/guides/${guide.id}/steps`).send({ title: 'Fit it' }).expect(201);
    if (options.publish !== false) await owner.agent.post(`${base}/guides/${guide.id}/revisions`).send({}).expect(201);
    const checklist = (await owner.agent.get(`${base}/assemblies/${assemblyId}/checklist`).expect(200)).body as {
      checks: { id: string; title: string; state: string; interfaceId: string | null }[];
    };
    return { owner, slug, base, assemblyId, guideId: guide.id, checks: checklist.checks };
  }

  const splineCheck = (shop: Shop) => shop.checks.find((check) => check.title.startsWith('Spline'))!;

  beforeAll(async () => {
    app = await createTestApp();
    const sixteen = { diametralPitch: 16, stubPitch: 32 };
    let footageMoment = { footageId: '', markId: '' };
    confirmedShop = await makeShop('Confirmed', { pitch: sixteen }, {
      showNames: true,
      extras: async (agent, base, buildId, assemblyId) => {
        // A pilot fit in millimetres and a driveshaft, for the unit, clearance and length queries.
        const bore = (
          await agent
            .post(`${base}/parts`)
            .send({
              partNumber: 'CONF-BRG',
              title: 'Pilot bearing',
              category: 'bearing',
              features: [{ name: 'bore', kind: 'diameter', role: 'hole', nominal: '15', toleranceClass: 'H7', unit: 'mm' }],
            })
            .expect(201)
        ).body as { id: string; features: { id: string }[] };
        const nose = (
          await agent
            .post(`${base}/parts`)
            .send({
              partNumber: 'CONF-NOSE',
              title: 'Input shaft nose',
              category: 'shaft',
              features: [
                { name: 'pilot nose', kind: 'diameter', role: 'shaft', nominal: '15', toleranceClass: 'g6', unit: 'mm' },
                { name: 'driveshaft', kind: 'length', length: '540', compressed: '520', extended: '565', unit: 'mm' },
              ],
            })
            .expect(201)
        ).body as { id: string; features: { id: string; name: string }[] };
        const noseFeature = (name: string) => nose.features.find((feature) => feature.name === name)!.id;
        for (const part of [bore, nose]) await agent.put(`${base}/assemblies/${assemblyId}/parts/${part.id}`).send({ position: 'pilot' }).expect(204);
        await agent.post(`${base}/assemblies/${assemblyId}/interfaces`).send({ kind: 'bore_shaft', name: 'pilot fit', featureAId: bore.features[0].id, featureBId: noseFeature('pilot nose') }).expect(201);
        await agent
          .post(`${base}/assemblies/${assemblyId}/interfaces`)
          .send({ kind: 'length_window', name: 'driveshaft window', featureAId: noseFeature('driveshaft'), installedMin: '530', installedMax: '555', unit: 'mm' })
          .expect(201);
        // Readings: the bore in millimetres (0.0001 mm steps), the nose in inches (micrometer, 0.0001 in).
        // 15.0114 mm is 0.5910 in exactly and 0.5902 in is 14.99108 mm exactly (1 in = 25.4 mm).
        await agent.post(`${base}/measurements`).send({ featureId: bore.features[0].id, quantity: 'diameter', value: '15.0114', unit: 'mm', instrumentKind: 'bore_gauge', resolution: '0.0001' }).expect(201);
        await agent.post(`${base}/measurements`).send({ featureId: noseFeature('pilot nose'), quantity: 'diameter', value: '0.5902', unit: 'in', instrumentKind: 'outside_micrometer', resolution: '0.0001' }).expect(201);
        const clip = makeClip('finder-four-seconds.mp4', { seconds: 4, width: 160, height: 120, rate: 10 });
        const footageId = await uploadFile(agent, base.split('/').pop()!, buildId, clip);
        expect((await waitUntilProcessed(agent, base.split('/').pop()!, footageId)).state).toBe('ready');
        const markId = (await agent.post(`${base}/footage/${footageId}/marks`).send({ kind: 'note', startMs: 2500, label: 'counting the teeth' }).expect(201)).body.id as string;
        footageMoment = { footageId, markId };
      },
    });
    // The guide plays the footage; the spline check is confirmed with the mark at 2.5 s as evidence.
    await confirmedShop.owner.agent.patch(`${confirmedShop.base}/guides/${confirmedShop.guideId}`).send({ footageId: footageMoment.footageId }).expect(200);
    await confirmedShop.owner.agent.post(`${confirmedShop.base}/guides/${confirmedShop.guideId}/revisions`).send({}).expect(201);
    const confirmedCheck = splineCheck(confirmedShop);
    await confirmedShop.owner.agent.post(`${confirmedShop.base}/checks/${confirmedCheck.id}/evidence`).send({ kind: 'mark', markId: footageMoment.markId }).expect(201);
    await confirmedShop.owner.agent.post(`${confirmedShop.base}/checks/${confirmedCheck.id}/transitions`).send({ to: 'confirmed', reason: 'Test-fitted on the van' }).expect(201);

    benchShop = await makeShop('Bench', { pitch: sixteen });
    // One side without a pitch: the engine cannot pass the pair, so the check stays open.
    openShop = await makeShop('Open', {}, {
      extras: async (agent, base, _buildId, assemblyId, couplerSplineId) => {
        const recorded = (
          await agent
            .post(`${base}/parts`)
            .send({ partNumber: 'OPEN-43P', title: 'Shaft with a known pitch', category: 'shaft', features: [{ name: 'spline', kind: 'spline', teeth: 43, gender: 'external', ...sixteen }] })
            .expect(201)
        ).body as { id: string; features: { id: string }[] };
        await agent.put(`${base}/assemblies/${assemblyId}/parts/${recorded.id}`).send({ position: 'spare shaft' }).expect(204);
        await agent
          .post(`${base}/assemblies/${assemblyId}/interfaces`)
          .send({ kind: 'spline', name: 'coupler to spare shaft', featureAId: couplerSplineId, featureBId: recorded.features[0].id })
          .expect(201);
      },
    });
    otherPitchShop = await makeShop('Otherpitch', { pitch: { diametralPitch: 24, stubPitch: 48 } });
    draftShop = await makeShop('Draft', { pitch: sixteen }, { publish: false });
    withdrawnShop = await makeShop('Withdrawn', { pitch: sixteen });
    await withdrawnShop.owner.agent.delete(`${withdrawnShop.base}/guides/${withdrawnShop.guideId}/publication`).expect((response) => expect([200, 204]).toContain(response.status));
  });

  afterAll(async () => {
    removeScratch();
    await app.close();
  });

  it('ranks confirmed, then bench-passed, then open; near misses apart with "same teeth, other pitch"', async () => {
    const answer = await find({ splineTeeth: 43, splinePitch: '16/32' });
    expect(answer.understood[0]).toBe('spline: 43 teeth, 16/32 diametral pitch (ANSI B92.1)');
    expect(answer.results.map((result) => [result.workshop.slug, result.state])).toEqual([
      [confirmedShop.slug, 'confirmed'],
      [benchShop.slug, 'bench_pass'],
      [openShop.slug, 'open'],
    ]);
    expect(answer.total).toBe(3);
    expect(answer.nearMisses.map((result) => result.workshop.slug)).toEqual([otherPitchShop.slug]);
    expect(answer.nearMissTotal).toBe(1);
    expect(answer.nearMisses[0].checks[0].reasons[0]).toMatch(/^same teeth, other pitch: 16\/32 .* this is 24\/48/);
  });

  it('never lists a 43-tooth assembly for a 27-tooth query', async () => {
    const answer = await find({ splineTeeth: 27, splinePitch: '16/32' });
    expect(answer.total + answer.nearMissTotal).toBe(0);
  });

  it('shows the matching check, who confirmed it and when (names only where the workshop shows them), and links to the evidence moment', async () => {
    const [confirmed, bench] = (await find({ splineTeeth: 43, splinePitch: '16/32' })).results;
    expect(confirmed.checks[0]).toMatchObject({ criterion: 'spline', state: 'confirmed', verdict: 'match', confirmedBy: 'Confirmed Owner', evidenceAtSeconds: 2.5 });
    expect(confirmed.checks[0].confirmedAt).not.toBeNull();
    expect(confirmed.link).toBe(`/guides/${confirmedShop.slug}/${confirmed.guide.slug}?t=2.5`);
    // The bench shop hides names: confirm its check too and it still shows no name.
    const benchCheck = splineCheck(benchShop);
    await benchShop.owner.agent.post(`${benchShop.base}/checks/${benchCheck.id}/evidence`).send({ kind: 'measurement', measurementId: await someReading(benchShop) }).expect(201);
    await benchShop.owner.agent.post(`${benchShop.base}/checks/${benchCheck.id}/transitions`).send({ to: 'confirmed', reason: 'fitted' }).expect(201);
    const after = (await find({ splineTeeth: 43, splinePitch: '16/32' })).results.find((result) => result.workshop.slug === benchShop.slug)!;
    expect(bench.checks[0].confirmedBy).toBeNull();
    expect(after.checks[0]).toMatchObject({ state: 'confirmed', confirmedBy: null });
    expect(after.checks[0].confirmedAt).not.toBeNull();
  });

  it('pages the matches: limit and offset walk them in rank order', async () => {
    const all = (await find({ splineTeeth: 43, splinePitch: '16/32' })).results.map((result) => result.workshop.slug);
    const pages: string[] = [];
    for (let offset = 0; offset < all.length; offset += 1) {
      const page = await find({ splineTeeth: 43, splinePitch: '16/32', limit: 1, offset });
      expect(page.total).toBe(all.length);
      expect(page.results).toHaveLength(1);
      pages.push(page.results[0].workshop.slug);
    }
    expect(pages).toEqual(all);
    expect((await find({ splineTeeth: 43, splinePitch: '16/32', limit: 1, offset: all.length })).results).toEqual([]);
  });

  it('never shows a draft or a withdrawn guide, whatever the query', async () => {
    const queries: Record<string, string | number>[] = [{ splineTeeth: 43 }, { splineTeeth: 43, splinePitch: '16/32' }, { partNumber: 'DRAFT-43C' }, { partNumber: 'withdrawn 43c' }, {}];
    for (const query of queries) {
      const answer = await find(query);
      const slugs = [...answer.results, ...answer.nearMisses].map((result) => result.workshop.slug);
      expect(slugs).not.toContain(draftShop.slug);
      expect(slugs).not.toContain(withdrawnShop.slug);
    }
    // The same data is found once it is published again: the refusal above is privacy, not a miss.
    await withdrawnShop.owner.agent.post(`${withdrawnShop.base}/guides/${withdrawnShop.guideId}/revisions`).send({}).expect(201);
    expect((await find({ partNumber: 'withdrawn 43c' })).results.map((result) => result.workshop.slug)).toEqual([withdrawnShop.slug]);
    await withdrawnShop.owner.agent.delete(`${withdrawnShop.base}/guides/${withdrawnShop.guideId}/publication`).expect(204);
    expect((await find({ partNumber: 'withdrawn 43c' })).total).toBe(0);
  });

  it('finds by part number (spacing and dashes ignored) and by maker', async () => {
    const byNumber = await find({ partNumber: 'bench 43 c' });
    expect(byNumber.results.map((result) => result.workshop.slug)).toEqual([benchShop.slug]);
    const byMaker = await find({ maker: 'Otherpitch Gear' });
    expect(byMaker.results.map((result) => result.workshop.slug)).toEqual([otherPitchShop.slug]);
  });

  it('finds millimetre data with an inch query exactly, and the reverse (1 in = 25.4 mm exactly)', async () => {
    // The bore was read in millimetres: 15.0114 mm. Asked in inches, 0.5910 in is the same length to the nanometre.
    const inchQuery = await find({ diameter: '0.5910 in' });
    expect(inchQuery.results.map((result) => result.workshop.slug)).toEqual([confirmedShop.slug]);
    expect(inchQuery.results[0].checks[0].reasons[0]).toContain('your 0.591 in lies within CONF-BRG bore measured');
    // One tenth more (0.0001 in = 2.54 µm) is no longer inside the reading: a near miss, not a match.
    const tenthOff = await find({ diameter: '0.5911 in' });
    expect(tenthOff.total).toBe(0);
    expect(tenthOff.nearMisses.map((result) => result.workshop.slug)).toEqual([confirmedShop.slug]);
    // The nose was read in inches: 0.5902 in. Asked in millimetres, 14.99108 mm finds it.
    const millimetreQuery = await find({ diameter: '14.99108 mm' });
    expect(millimetreQuery.results.map((result) => result.workshop.slug)).toEqual([confirmedShop.slug]);
    const match = millimetreQuery.results[0].checks[0];
    expect(match.criterion).toBe('diameter');
    expect(match.reasons[0]).toBe('your 14.99108 mm lies within CONF-NOSE pilot nose measured: 14.99108 mm');
    expect(match.measurements.map((reading) => reading.value)).toEqual(expect.arrayContaining(['0.5902 in', '15.0114 mm']));
    expect(match.measurements.find((reading) => reading.value === '0.5902 in')!.millimetres).toBe(14.99108);
    expect((await find({ diameter: '14.99107 mm' })).total).toBe(0);
  });

  it('checks a measured diameter against the reader\'s ISO 286 class: "diameter outside H6"', async () => {
    // ISO 286-2 at 15 mm (over 10 up to 18): H7 is 0 to +18 µm, H6 0 to +11 µm; the bore reads 15.0114 mm.
    expect((await find({ diameter: '15 mm', toleranceClass: 'H7' })).results.map((result) => result.workshop.slug)).toEqual([confirmedShop.slug]);
    const tighter = await find({ diameter: '15 mm', toleranceClass: 'H6' });
    expect(tighter.total).toBe(0);
    expect(tighter.nearMisses[0].checks[0].reasons).toEqual(['diameter outside H6: CONF-BRG bore measured 15.0114 mm', 'H6 at 15 mm is 15 mm – 15.011 mm (ISO 286-2)']);
  });

  it('checks a measured clearance against the reader\'s fit class (ISO 286-2 at 15 mm)', async () => {
    // Clearance from the readings: 15.0114 ± 0.00005 mm bore, 14.99108 ± 0.00127 mm nose → about 19 to 21.6 µm.
    expect((await find({ diameter: '15 mm', fit: 'H7/g6' })).total).toBe(1); // 6 to 35 µm
    const transition = await find({ diameter: '15 mm', fit: 'H7/k6' }); // −12 to +17 µm
    expect(transition.total).toBe(0);
    expect(transition.nearMisses[0].checks[0].reasons[0]).toMatch(/^clearance outside H7\/k6; clearance measured/);
  });

  it('matches a length window in either unit, and calls a slightly short one a near miss', async () => {
    expect((await find({ lengthMin: '515 mm', lengthMax: '570 mm' })).results.map((result) => result.workshop.slug)).toEqual([confirmedShop.slug]);
    const near = await find({ lengthMin: '20.5 in', lengthMax: '22.5 in' });
    expect(near.total).toBe(0);
    // 20.5 in = 520.7 mm exactly: the shaft reaches 520 mm = 20.47244 in, 0.7 mm = 0.02756 in short.
    expect(near.nearMisses[0].checks[0].reasons[0]).toBe('CONF-NOSE driveshaft reaches 20.47244 in, 0.02756 in shorter than your 20.5 in');
    expect((await find({ lengthMin: '20 in', lengthMax: '22.5 in' })).total).toBe(1);
  });

  it('needs every given criterion to match in one assembly', async () => {
    expect((await find({ splineTeeth: 43, splinePitch: '16/32', diameter: '15 mm', toleranceClass: 'H7' })).results.map((result) => result.workshop.slug)).toEqual([confirmedShop.slug]);
  });

  it('refuses what it cannot read with 400 naming the field', async () => {
    const cases: [Record<string, string>, RegExp][] = [
      [{}, /Describe what you have/],
      [{ splineTeeth: '43', splinePitch: 'sixteen' }, /^splinePitch: cannot read spline pitch/],
      [{ diameter: 'three quarters' }, /^diameter: cannot read/],
      [{ diameter: '19.05' }, /^diameter: .*has no unit/],
      [{ splinePitch: '16/32' }, /^splineTeeth: /],
      [{ diameter: '15 mm', toleranceClass: 'H7', fit: 'H7/g6' }, /^fit: /],
      [{ lengthMin: '600 mm', lengthMax: '500 mm' }, /lengthMin must not exceed lengthMax/],
      [{ splineTeeth: 'many' }, /splineTeeth must be a whole number/],
      [{ toleranceClass: 'H7' }, /^diameter: /],
    ];
    for (const [query, message] of cases) {
      const response = await anonymous().get('/api/fit-finder').query(query).expect(400);
      expect([query, [response.body.message].flat().join(' | ')]).toEqual([query, expect.stringMatching(message)]);
    }
  });

  it('reads its candidates through keys: EXPLAIN shows no full scan of a table', async () => {
    const database = app.get(DataSource);
    const finder = app.get(FitFinderService);
    for (const query of [
      { splineTeeth: 43, splinePitch: '16/32' },
      { diameter: '15 mm', toleranceClass: 'H7' },
      { lengthMin: '500 mm', lengthMax: '570 mm' },
      { partNumber: 'CONF-BRG', maker: 'Confirmed Gear' },
    ]) {
      for (const { sql, parameters } of finder.candidateStatements(query)) {
        const plan = await database.query<{ table: string | null; type: string | null; key: string | null }[]>(`EXPLAIN ${sql}`, parameters);
        const fullScans = plan.filter((step) => step.type === 'ALL' && step.table !== null && !step.table.startsWith('<')).map((step) => step.table);
        expect({ query, fullScans }).toEqual({ query, fullScans: [] });
      }
    }
  });

  it('narrows splines by the pitch as the engine compares it, and still lists the other pitches as near misses', async () => {
    const byFraction = await find({ splineTeeth: 43, splinePitch: '16/32' });
    // "16 DP" names no stub pitch: the same diametral pitch, so the same matches (the engine notes the stub).
    const byDiametral = await find({ splineTeeth: 43, splinePitch: '16 DP' });
    expect(byDiametral.results.map((result) => result.workshop.slug)).toEqual(byFraction.results.map((result) => result.workshop.slug));
    expect(byDiametral.nearMisses.map((result) => result.workshop.slug)).toEqual([otherPitchShop.slug]);
    // A module is another pitch system: nothing matches, and every 43-tooth assembly is a near miss from the wider window.
    const byModule = await find({ splineTeeth: 43, splinePitch: 'm1.25' });
    expect(byModule.total).toBe(0);
    expect(byModule.nearMisses.map((result) => result.workshop.slug).sort()).toEqual([confirmedShop.slug, benchShop.slug, openShop.slug, otherPitchShop.slug].sort());
    expect(byModule.nearMisses.every((result) => result.checks[0].verdict === 'near_miss' && /^same teeth, /.test(result.checks[0].reasons[0]))).toBe(true);
    // The 24/48 shop matches its own pitch, and the 16/32 shops are its near misses.
    const byOther = await find({ splineTeeth: 43, splinePitch: '24/48' });
    expect(byOther.results.map((result) => result.workshop.slug)).toEqual([otherPitchShop.slug]);
    expect(byOther.nearMissTotal).toBe(3);
    const capped = (answer: FinderAnswer) => answer as FinderAnswer & { totalCapped: boolean; nearMissCapped: boolean };
    expect([byFraction, byDiametral, byModule, byOther].map((answer) => [capped(answer).totalCapped, capped(answer).nearMissCapped])).toEqual(Array(4).fill([false, false]));
  });

  it('reads bounded candidate windows: every candidate statement has a LIMIT, near misses a narrower one', async () => {
    const finder = app.get(FitFinderService);
    const queries: FitFinderQueryDto[] = [
      { splineTeeth: 43, splinePitch: '16/32' },
      { splineTeeth: 43, vehicle: vehicleWord },
      { diameter: '15 mm', fit: 'H7/g6' },
      { lengthMin: '500 mm' },
      { maker: 'Confirmed Gear', vehicle: vehicleWord },
    ];
    for (const query of queries) {
      for (const statement of finder.candidateStatements(query)) {
        const limit = Number(/LIMIT (\d+)\s*$/.exec(statement.sql)?.[1] ?? Number.NaN);
        expect({ query, window: statement.window, limit }).toEqual({ query, window: statement.window, limit: statement.window === 'near' ? FINDER_NEAR_CANDIDATES : FINDER_CANDIDATES });
      }
    }
    // A pitch narrows the match window by the keyed pitch; a near-miss window is read apart, for the other pitches.
    const pitched = finder.candidateStatements({ splineTeeth: 43, splinePitch: '16/32' });
    expect(pitched.map((statement) => statement.window)).toEqual(['match', 'near']);
    expect(pitched[0].parameters).toEqual(expect.arrayContaining([43, 'dp16.000000']));
  });

  it('runs only keyed statements for a question, the page details included: EXPLAIN shows no full scan of a growing table', async () => {
    const database = app.get(DataSource);
    const finder = app.get(FitFinderService);
    // Plans of a few-row table say nothing (a scan of 18 rows is the optimizer's cheapest choice): grow the features and
    // readings tables first, 300 features with 10 readings each on the draft shop's part, which no answer shows.
    const draftWorkshopId = draftShop.base.split('/').pop()!;
    const [draftPart] = await database.query<{ id: string }[]>('SELECT id FROM parts WHERE workshop_id = ? AND part_number = ?', [draftWorkshopId, 'DRAFT-43C']);
    await database.query(
      `INSERT INTO part_features (id, part_id, name, kind, spec, display_unit) SELECT UUID(), ?, CONCAT('grown ', seq), 'free', '{}', 'mm' FROM seq_1_to_300`,
      [draftPart.id],
    );
    await database.query(
      `INSERT INTO measurements (id, workshop_id, feature_id, quantity, value_text, unit, value_nm, instrument_kind, instrument_resolution_nm, taken_at)
       SELECT UUID(), ?, f.id, 'other', '1', 'mm', 1000000, 'caliper', 10000, NOW(3) FROM part_features f JOIN seq_1_to_10 WHERE f.part_id = ? AND f.name LIKE 'grown %'`,
      [draftWorkshopId, draftPart.id],
    );
    await database.query('ANALYZE TABLE part_features, measurements');
    const ran: { sql: string; parameters: unknown[] }[] = [];
    const query = MysqlQueryRunner.prototype.query;
    const spy = jest.spyOn(MysqlQueryRunner.prototype, 'query').mockImplementation(function (this: MysqlQueryRunner, sql: string, parameters?: unknown[] | object, structured?: boolean) {
      ran.push({ sql, parameters: Array.isArray(parameters) ? parameters : [] });
      return query.call(this, sql, parameters, structured);
    });
    try {
      for (const dto of [
        { splineTeeth: 43, splinePitch: '16/32' },
        { splineTeeth: 43 },
        { diameter: '15 mm', toleranceClass: 'H7' },
        { diameter: '0.5910 in' },
        { diameter: '15 mm', fit: 'H7/g6' },
        { lengthMin: '515 mm', lengthMax: '570 mm' },
        { partNumber: 'CONFIRMED-43C', maker: 'Confirmed Gear' },
      ] as FitFinderQueryDto[]) {
        const answer = await finder.find({ vehicle: vehicleWord, ...dto });
        // Every question finds something, so the page's details (readings, marks, names, fit reports) were read too.
        expect({ dto, found: answer.results.length + answer.nearMisses.length > 0 }).toEqual({ dto, found: true });
      }
    } finally {
      spy.mockRestore();
    }
    // The grown rows go again once the plans are read (their readings with them).
    const dropGrown = () => database.query("DELETE FROM part_features WHERE part_id = ? AND name LIKE 'grown %'", [draftPart.id]);
    const selects = ran.filter(({ sql }) => /^\s*\(?\s*SELECT/i.test(sql));
    expect(selects.length).toBeGreaterThan(20);
    // Every statement with a scan (a whole table, or a whole index) of a table of 200 rows or more is named, with
    // its WHERE. Below that a scan is the optimizer's cheaper choice and says nothing of the plan at size (a
    // 3-row evidence table is scanned for 4 keys); the tables grown above are well over it.
    const scans: { sql: string; fullScans: (string | null)[] }[] = [];
    for (const { sql, parameters } of selects) {
      const plan = await database.query<{ table: string | null; type: string | null; rows: string | number | null }[]>(`EXPLAIN ${sql}`, parameters);
      const fullScans = plan
        .filter((step) => (step.type === 'ALL' || step.type === 'index') && step.table !== null && !step.table.startsWith('<') && Number(step.rows) >= 200)
        .map((step) => step.table);
      if (fullScans.length > 0) scans.push({ sql: `${sql.trim().slice(0, 60)} … ${sql.slice(sql.search(/WHERE/i)).replace(/\s+/g, ' ').slice(0, 200)}`, fullScans });
    }
    await dropGrown();
    expect(scans).toEqual([]);
  });

  // Last: it adds a 43-tooth shop, which the totals of the tests above do not count.
  it('matches a module spline by its module (ISO 4156) through the keyed pitch, and lists it as a near miss for a diametral question', async () => {
    const metricShop = await makeShop('Metric', { pitch: { module: 1.25 } as unknown as { diametralPitch: number; stubPitch: number } });
    expect((await find({ splineTeeth: 43, splinePitch: 'm1.25' })).results.map((result) => result.workshop.slug)).toEqual([metricShop.slug]);
    expect((await find({ splineTeeth: 43, splinePitch: 'module 1.25' })).total).toBe(1);
    expect((await find({ splineTeeth: 43, splinePitch: 'm1.5' })).total).toBe(0);
    const diametral = await find({ splineTeeth: 43, splinePitch: '16/32' });
    expect(diametral.results.map((result) => result.workshop.slug)).not.toContain(metricShop.slug);
    expect(diametral.nearMisses.find((result) => result.workshop.slug === metricShop.slug)?.checks[0].reasons[0]).toMatch(/^same teeth, other pitch: 16\/32 .* this is module 1.25/);
  });

  /** A reading on the shop's coupler spline feature, so a check has evidence to be confirmed with. */
  async function someReading(shop: Shop): Promise<string> {
    const parts = (await shop.owner.agent.get(`${shop.base}/parts`).expect(200)).body as { features: { id: string; kind: string }[] }[];
    const featureId = parts.flatMap((part) => part.features).find((feature) => feature.kind === 'spline')!.id;
    return (
      await shop.owner.agent
        .post(`${shop.base}/measurements`)
        .send({ featureId, quantity: 'other', value: '1.2', unit: 'in', instrumentKind: 'caliper', resolution: '0.001' })
        .expect(201)
    ).body.id as string;
  }
});
