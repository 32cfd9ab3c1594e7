import { NestExpressApplication } from '@nestjs/platform-express';
import { createTestApp } from './create-test-app';
import { signUpAndSignIn, TestAccount } from './support/accounts';

jest.setTimeout(60_000);

/**
 * Editing a part feature from the studio: the form sends every optional field of the kind, null for
 * those that no longer apply, and the server must forget them (a stale diametral pitch beside a new
 * module would be refused as "not both"; a stale ISO class would outrank new explicit limits).
 */
describe('updating a part feature clears fields sent as null (real MariaDB)', () => {
  let app: NestExpressApplication;
  let creator: TestAccount;
  let base: string;

  beforeAll(async () => {
    app = await createTestApp();
    creator = await signUpAndSignIn(app, { displayName: 'Noor Feld' });
    const slug = `feature-edit-${Date.now().toString(36)}-${Math.floor(Math.random() * 1e6)}`;
    const workshop = await creator.agent.post('/api/workshops').send({ name: 'Feature Bench', slug }).expect(201);
    base = `/api/workshops/${workshop.body.id}`;
  });
  afterAll(async () => app.close());

  it('switches a spline from diametral pitch to module', async () => {
    const part = (
      await creator.agent
        .post(`${base}/parts`)
        .send({
          partNumber: 'FB-1',
          title: 'hub',
          category: 'coupler',
          features: [{ name: 'spline', kind: 'spline', teeth: 21, gender: 'internal', diametralPitch: 16, stubPitch: 32 }],
        })
        .expect(201)
    ).body;
    const featureId = part.features[0].id;
    const updated = await creator.agent
      .patch(`${base}/parts/${part.id}/features/${featureId}`)
      .send({ diametralPitch: null, stubPitch: null, module: 1.25 })
      .expect(200);
    expect(updated.body.spec).toEqual({ teeth: 21, gender: 'internal', module: 1.25 });
    expect(updated.body.shown.pitch).toBe('module 1.25');
  });

  it('switches a diameter from an ISO class to explicit limits', async () => {
    const part = (
      await creator.agent
        .post(`${base}/parts`)
        .send({
          partNumber: 'FB-2',
          title: 'bearing seat',
          category: 'bore',
          features: [{ name: 'bore', kind: 'diameter', role: 'hole', nominal: '15', toleranceClass: 'H7', unit: 'mm' }],
        })
        .expect(201)
    ).body;
    const updated = await creator.agent
      .patch(`${base}/parts/${part.id}/features/${part.features[0].id}`)
      .send({ toleranceClass: null, max: '15.020', min: '15.002' })
      .expect(200);
    expect(updated.body.spec).toEqual({ role: 'hole', nominalNm: 15_000_000, maxNm: 15_020_000, minNm: 15_002_000 });
  });

  it('keeps fields that are not sent', async () => {
    const part = (
      await creator.agent
        .post(`${base}/parts`)
        .send({
          partNumber: 'FB-3',
          title: 'shaft',
          category: 'shaft',
          features: [{ name: 'length', kind: 'length', length: '540', compressed: '520', extended: '565', unit: 'mm' }],
        })
        .expect(201)
    ).body;
    const updated = await creator.agent
      .patch(`${base}/parts/${part.id}/features/${part.features[0].id}`)
      .send({ extended: '570' })
      .expect(200);
    expect(updated.body.spec).toEqual({ lengthNm: 540_000_000, compressedNm: 520_000_000, extendedNm: 570_000_000 });
  });

  it('keeps a spline\'s pressure angle, fit and tolerance class through an update that does not send them', async () => {
    const part = (
      await creator.agent
        .post(`${base}/parts`)
        .send({
          partNumber: 'FB-4',
          title: 'coupler',
          category: 'coupler',
          features: [
            {
              name: 'spline',
              kind: 'spline',
              teeth: 27,
              gender: 'internal',
              diametralPitch: 16,
              stubPitch: 32,
              pressureAngle: 30,
              splineFit: 'major',
              splineClass: 5,
            },
          ],
        })
        .expect(201)
    ).body;
    const featureId = part.features[0].id;
    const renamed = await creator.agent
      .patch(`${base}/parts/${part.id}/features/${featureId}`)
      .send({ name: 'output spline' })
      .expect(200);
    expect(renamed.body.spec).toEqual({
      teeth: 27,
      gender: 'internal',
      diametralPitch: 16,
      stubPitch: 32,
      pressureAngle: 30,
      fit: 'major',
      toleranceClass: 5,
    });
    expect(renamed.body.shown).toMatchObject({ fit: 'major-diameter fit', toleranceClass: 'class 5' });

    // Changing one of them changes that one; clearing one with null clears only that one.
    const changed = await creator.agent
      .patch(`${base}/parts/${part.id}/features/${featureId}`)
      .send({ splineFit: 'side', splineClass: null })
      .expect(200);
    expect(changed.body.spec).toMatchObject({ pressureAngle: 30, fit: 'side' });
    expect(changed.body.spec).not.toHaveProperty('toleranceClass');

    // What is stored is what the next read gives back.
    const reread = await creator.agent.get(`${base}/parts/${part.id}`).expect(200);
    expect(reread.body.features[0].spec).toEqual(changed.body.spec);
  });
});
