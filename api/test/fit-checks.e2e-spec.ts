import { NestExpressApplication } from '@nestjs/platform-express';
import { EventEmitter2 } from '@nestjs/event-emitter';
import { createTestApp } from './create-test-app';
import { signUpAndSignIn, TestAccount, uniqueSlug } from './support/accounts';
import { FIT_CHECK_CHANGED, type FitCheckChangedEvent } from '../src/fit-checks/fit-checks.events';

jest.setTimeout(60_000);


interface Check {
  id: string;
  title: string;
  state: string;
  outcome: string | null;
  reason: string;
  detail: Record<string, unknown> | null;
  evidence: unknown[];
}

/**
 * Parts, assemblies, measurements and the verified-fit checklist over HTTP on the real database.
 * Invented parts; ISO 286-2 values quoted where a verdict depends on them.
 */
describe('fit data and the verified-fit checklist (real MariaDB)', () => {
  let app: NestExpressApplication;
  let creator: TestAccount;
  let outsider: TestAccount;
  let base: string;
  const changes: FitCheckChangedEvent[] = [];

  beforeAll(async () => {
    app = await createTestApp();
    app.get(EventEmitter2).on(FIT_CHECK_CHANGED, (event: FitCheckChangedEvent) => changes.push(event));
    creator = await signUpAndSignIn(app, { displayName: 'Quinn Marsh' });
    outsider = await signUpAndSignIn(app, { displayName: 'Not A Member' });
    const workshop = await creator.agent.post('/api/workshops').send({ name: 'Test Bay', slug: uniqueSlug('bay') }).expect(201);
    base = `/api/workshops/${workshop.body.id}`;
  });
  afterAll(async () => app.close());

  const checklistOf = async (assemblyId: string) =>
    (await creator.agent.get(`${base}/assemblies/${assemblyId}/checklist`).expect(200)).body as { verdict: string; checks: Check[] };
  const checkTitled = (checks: Check[], fragment: string) => checks.find((check) => check.title.includes(fragment))!;

  let buildId: string;
  let coupler: { id: string; features: { id: string; name: string }[] };
  let gearbox: { id: string; features: { id: string; name: string }[] };
  let bearing: { id: string; features: { id: string; name: string }[] };
  let assemblyId: string;
  const featureOf = (part: typeof coupler, name: string) => part.features.find((feature) => feature.name === name)!.id;

  it('creates a build and parts with typed features', async () => {
    buildId = (await creator.agent.post(`${base}/builds`).send({ title: 'Coupler trial', vehicle: 'test rig' }).expect(201)).body.id;
    coupler = (
      await creator.agent
        .post(`${base}/parts`)
        .send({
          partNumber: 'TB-21C',
          title: '21-tooth coupler',
          category: 'coupler',
          features: [{ name: 'spline', kind: 'spline', teeth: 21, gender: 'internal', diametralPitch: 16, stubPitch: 32 }],
        })
        .expect(201)
    ).body;
    gearbox = (
      await creator.agent
        .post(`${base}/parts`)
        .send({
          partNumber: 'TB-IN5',
          title: 'Input shaft',
          category: 'shaft',
          source: 'remanufactured',
          features: [
            { name: 'spline', kind: 'spline', teeth: 21, gender: 'external', diametralPitch: 16, stubPitch: 32 },
            { name: 'pilot nose', kind: 'diameter', role: 'shaft', nominal: '15', toleranceClass: 'g6', unit: 'mm' },
          ],
        })
        .expect(201)
    ).body;
    bearing = (
      await creator.agent
        .post(`${base}/parts`)
        .send({
          partNumber: 'TB-PB',
          title: 'Pilot bearing',
          category: 'bearing',
          features: [{ name: 'bore', kind: 'diameter', role: 'hole', nominal: '15', toleranceClass: 'H7', unit: 'mm' }],
        })
        .expect(201)
    ).body;
    expect(gearbox.features).toHaveLength(2);
  });

  it('finds parts by part number however it is spaced, and by spline tooth count', async () => {
    const byNumber = await creator.agent.get(`${base}/parts`).query({ q: 'tb in 5' }).expect(200);
    expect(byNumber.body.map((part: { partNumber: string }) => part.partNumber)).toEqual(['TB-IN5']);
    const byTeeth = await creator.agent.get(`${base}/parts`).query({ splineTeeth: 21, category: 'coupler' }).expect(200);
    expect(byTeeth.body.map((part: { partNumber: string }) => part.partNumber)).toEqual(['TB-21C']);
  });

  it('refuses a duplicate part number and a spline without teeth, naming the problem', async () => {
    const duplicate = await creator.agent.post(`${base}/parts`).send({ partNumber: 'tb 21c', title: 'again', category: 'coupler' }).expect(409);
    expect(duplicate.body.message).toMatch(/already in this workshop/);
    const invalid = await creator.agent
      .post(`${base}/parts`)
      .send({ partNumber: 'TB-X', title: 'x', category: 'coupler', features: [{ name: 's', kind: 'spline', gender: 'internal' }] })
      .expect(400);
    expect(invalid.body.message.join(' ')).toMatch(/teeth must be a whole number/);
  });

  it('derives checks from interfaces: the spline matches and the H7/g6 pilot fit passes by its limits', async () => {
    assemblyId = (await creator.agent.post(`${base}/builds/${buildId}/assemblies`).send({ name: 'stack' }).expect(201)).body.id;
    for (const [part, position] of [
      [coupler, 'coupler'],
      [gearbox, 'gearbox input'],
      [bearing, 'pilot bearing'],
    ] as const) {
      await creator.agent.put(`${base}/assemblies/${assemblyId}/parts/${part.id}`).send({ position }).expect(204);
    }
    await creator.agent
      .post(`${base}/assemblies/${assemblyId}/interfaces`)
      .send({ kind: 'spline', name: 'coupler to input', featureAId: featureOf(coupler, 'spline'), featureBId: featureOf(gearbox, 'spline') })
      .expect(201);
    await creator.agent
      .post(`${base}/assemblies/${assemblyId}/interfaces`)
      .send({ kind: 'bore_shaft', name: 'pilot', featureAId: featureOf(bearing, 'bore'), featureBId: featureOf(gearbox, 'pilot nose') })
      .expect(201);

    const { verdict, checks } = await checklistOf(assemblyId);
    expect(checkTitled(checks, 'coupler to input')).toMatchObject({ state: 'bench_pass', outcome: 'pass' });
    // ISO 286-2, 10–18 mm: H7 +18/0 µm and g6 −6/−17 µm give 6 to 35 µm of clearance.
    expect(checkTitled(checks, 'pilot')).toMatchObject({ state: 'bench_pass', detail: expect.objectContaining({ clearanceMinNm: 6000, clearanceMaxNm: 35000 }) });
    expect(verdict).toBe('bench_pass');
  });

  it('refuses an interface whose features do not suit its kind', async () => {
    const response = await creator.agent
      .post(`${base}/assemblies/${assemblyId}/interfaces`)
      .send({ kind: 'spline', name: 'wrong', featureAId: featureOf(bearing, 'bore'), featureBId: featureOf(gearbox, 'spline') })
      .expect(400);
    expect(response.body.message).toMatch(/joins spline features; "bore" is a diameter/);
  });

  it('keeps readings exactly as taken and summarises them', async () => {
    const pilotNose = featureOf(gearbox, 'pilot nose');
    const first = await creator.agent
      .post(`${base}/measurements`)
      .send({ featureId: pilotNose, quantity: 'diameter', value: '0.5902', unit: 'in', instrumentKind: 'outside_micrometer', resolution: '0.0001' })
      .expect(201);
    // 1 in = 25.4 mm exactly (NIST SP 811): 0.5902 in = 14.99108 mm = 14 991 080 nm, no drift.
    expect(first.body).toMatchObject({ value: '0.5902', unit: 'in', valueNm: 14_991_080, shown: '0.5902 in' });
    await creator.agent
      .post(`${base}/measurements`)
      .send({ featureId: pilotNose, quantity: 'diameter', value: '0.5900', unit: 'in', instrumentKind: 'outside_micrometer', resolution: '0.0001' })
      .expect(201);
    const list = await creator.agent.get(`${base}/measurements`).query({ featureId: pilotNose }).expect(200);
    expect(list.body.summary).toMatchObject({ count: 2, mean: '0.5901 in', spread: '0.0002 in' });
  });

  it('refuses a reading without a subject or with a malformed value', async () => {
    const response = await creator.agent
      .post(`${base}/measurements`)
      .send({ quantity: 'diameter', value: 'fifteen', unit: 'mm', instrumentKind: 'caliper', resolution: '0.01' })
      .expect(400);
    expect(response.body.message).toEqual(expect.arrayContaining(['value must be a decimal number such as 0.6692']));
  });

  it('confirms only with evidence, records who and when, and re-opens when a part changes', async () => {
    const pilot = checkTitled((await checklistOf(assemblyId)).checks, 'pilot');
    const refused = await creator.agent.post(`${base}/checks/${pilot.id}/transitions`).send({ to: 'confirmed', reason: 'looks fine' }).expect(409);
    expect(refused.body.message).toMatch(/Attach evidence/);

    const bore = await creator.agent
      .post(`${base}/measurements`)
      .send({ featureId: featureOf(bearing, 'bore'), quantity: 'diameter', value: '15.008', unit: 'mm', instrumentKind: 'bore_gauge', resolution: '0.001' })
      .expect(201);
    await creator.agent.post(`${base}/checks/${pilot.id}/evidence`).send({ kind: 'measurement', measurementId: bore.body.id }).expect(201);
    const confirmed = await creator.agent
      .post(`${base}/checks/${pilot.id}/transitions`)
      .send({ to: 'confirmed', reason: 'test-fitted on the rig' })
      .expect(201);
    expect(confirmed.body).toMatchObject({ state: 'confirmed', confirmedBy: creator.id, confirmedAt: expect.any(String) });
    expect((await checklistOf(assemblyId)).verdict).toBe('bench_pass');

    changes.length = 0;
    // A replacement bearing with a K6 bore (ISO 286-2, 10–18 mm: +2/−9 µm): the 15.008 mm reading is now out of tolerance.
    await creator.agent
      .patch(`${base}/parts/${bearing.id}/features/${featureOf(bearing, 'bore')}`)
      .send({ toleranceClass: 'K6' })
      .expect(200);
    const reopened = checkTitled((await checklistOf(assemblyId)).checks, 'pilot');
    expect(reopened.state).toBe('open');
    expect(reopened.reason).toMatch(/re-opened: bore on TB-PB changed/);
    expect(changes).toEqual([expect.objectContaining({ fitCheckId: pilot.id, from: 'confirmed', to: 'open', actorId: creator.id })]);

    const history = await creator.agent.get(`${base}/checks/${pilot.id}/history`).expect(200);
    expect(history.body.map((event: { to: string }) => event.to)).toEqual(['bench_pass', 'confirmed', 'open']);
    // Members read who moved a check by name: all three moves came from the creator's own reading, confirmation and part change.
    expect(history.body.map((event: { actorId: string | null; actorName: string | null }) => [event.actorId, event.actorName])).toEqual([
      [creator.id, 'Quinn Marsh'],
      [creator.id, 'Quinn Marsh'],
      [creator.id, 'Quinn Marsh'],
    ]);
  });

  it('never confirms a spline pair whose tooth counts differ', async () => {
    const odd = (
      await creator.agent
        .post(`${base}/parts`)
        .send({ partNumber: 'TB-27C', title: '27-tooth coupler', category: 'coupler', features: [{ name: 'spline', kind: 'spline', teeth: 27, gender: 'internal', diametralPitch: 16 }] })
        .expect(201)
    ).body;
    const trial = (await creator.agent.post(`${base}/builds/${buildId}/assemblies`).send({ name: 'trial 27' }).expect(201)).body.id;
    await creator.agent.put(`${base}/assemblies/${trial}/parts/${odd.id}`).send({ position: 'coupler' }).expect(204);
    await creator.agent.put(`${base}/assemblies/${trial}/parts/${gearbox.id}`).send({ position: 'gearbox input' }).expect(204);
    await creator.agent
      .post(`${base}/assemblies/${trial}/interfaces`)
      .send({ kind: 'spline', name: '27 to 21', featureAId: featureOf(odd, 'spline'), featureBId: featureOf(gearbox, 'spline') })
      .expect(201);
    const { verdict, checks } = await checklistOf(trial);
    expect(verdict).toBe('no_fit');
    const spline = checks[0];
    expect(spline.state).toBe('no_fit');
    const refused = await creator.agent.post(`${base}/checks/${spline.id}/transitions`).send({ to: 'confirmed', reason: 'forced' }).expect(409);
    expect(refused.body.message).toMatch(/does not pass/);
  });

  it('answers a what-if from the measured clearance', async () => {
    const assembly = await creator.agent.get(`${base}/assemblies/${assemblyId}`).expect(200);
    const pilotInterface = assembly.body.interfaces.find((item: { name: string }) => item.name === 'pilot');
    const response = await creator.agent.get(`${base}/interfaces/${pilotInterface.id}/what-if`).query({ delta: '0.0004', unit: 'in' }).expect(200);
    // 0.0004 in = 10 160 nm (NIST SP 811 inch). Measured clearance: bore 15.008 mm − mean shaft
    // (0.5902 + 0.5900) / 2 in = 14.98854 mm → 19 460 nm; 10 160 / 19 460 = 52.21 %.
    expect(response.body).toMatchObject({ deltaNm: 10_160, clearanceNm: 19_460, remainingClearanceNm: 9_300 });
    expect(response.body.sharePercent).toBeCloseTo(52.21, 2);
  });

  it('refuses a what-if that leaves the shaft no positive size, naming the field', async () => {
    const assembly = await creator.agent.get(`${base}/assemblies/${assemblyId}`).expect(200);
    const pilotInterface = assembly.body.interfaces.find((item: { name: string }) => item.name === 'pilot');
    // The shaft's mean is 14.98854 mm (above): 15 mm smaller leaves less than nothing.
    const refused = await creator.agent.get(`${base}/interfaces/${pilotInterface.id}/what-if`).query({ delta: '-15', unit: 'mm' }).expect(400);
    expect(refused.body.message).toMatch(/^delta must leave a shaft size greater than 0; the shaft measures 14\.98854 mm/);
    await creator.agent.get(`${base}/interfaces/${pilotInterface.id}/what-if`).query({ delta: '-14.98', unit: 'mm' }).expect(200);
  });

  it('hides a workshop’s fit data from non-members', async () => {
    await outsider.agent.get(`${base}/parts`).expect(404);
    await outsider.agent.get(`${base}/assemblies/${assemblyId}/checklist`).expect(404);
  });
});
