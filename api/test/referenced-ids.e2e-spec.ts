import { randomUUID } from 'node:crypto';
import { NestExpressApplication } from '@nestjs/platform-express';
import type { Response } from 'supertest';
import { createTestApp } from './create-test-app';
import { signUpAndSignIn, type TestAccount } from './support/accounts';
import { removeScratch } from './support/footage';
import { countRows, makeWorkshopFixture, type WorkshopFixture } from './support/workshop-fixture';

jest.setTimeout(120_000);

/**
 * Every id a write route takes in its body must name something of the caller's own workshop. Another
 * workshop's id and an id that names nothing answer the same 4xx, naming the field, and store nothing
 * (a 500 from a foreign-key error would let ids be probed).
 */
describe('ids in request bodies belong to the caller’s workshop (real MariaDB, S3 fake)', () => {
  let app: NestExpressApplication;
  let mine: WorkshopFixture;
  let theirs: WorkshopFixture;
  let reader: TestAccount;

  beforeAll(async () => {
    app = await createTestApp();
    [mine, theirs, reader] = await Promise.all([makeWorkshopFixture(app, 'ids-mine'), makeWorkshopFixture(app, 'ids-theirs'), signUpAndSignIn(app)]);
  });
  afterAll(async () => {
    removeScratch();
    await app.close();
  });

  interface Case {
    route: string;
    field: string;
    /** Sends the request with the given id in `field`. */
    send: (id: string) => Promise<Response>;
    /** The rows the request would have added to or changed in. */
    rows: () => Promise<unknown>;
  }

  const reading = (extra: Record<string, unknown>) => ({
    featureId: mine.holeFeatureId,
    quantity: 'diameter',
    value: '15.012',
    unit: 'mm',
    instrumentKind: 'bore_gauge',
    resolution: '0.001',
    ...extra,
  });
  const guideRow = async () => (await mine.owner.agent.get(`${mine.base}/guides/${mine.guideId}`).expect(200)).body as Record<string, unknown>;

  const cases = (): Case[] => [
    {
      route: 'POST measurements (featureId)',
      field: 'featureId',
      send: (id) => mine.owner.agent.post(`${mine.base}/measurements`).send(reading({ featureId: id })),
      rows: () => countRows(app, 'measurements', 'workshop_id', mine.workshopId),
    },
    {
      route: 'POST measurements (interfaceId)',
      field: 'interfaceId',
      send: (id) => mine.owner.agent.post(`${mine.base}/measurements`).send(reading({ featureId: undefined, interfaceId: id, quantity: 'clearance' })),
      rows: () => countRows(app, 'measurements', 'workshop_id', mine.workshopId),
    },
    {
      route: 'POST measurements (footageId)',
      field: 'footageId',
      send: (id) => mine.owner.agent.post(`${mine.base}/measurements`).send(reading({ footageId: id, footageTimeMs: 500 })),
      rows: () => countRows(app, 'measurements', 'workshop_id', mine.workshopId),
    },
    ...(['partId', 'measurementId', 'fitCheckId', 'guideStepId'] as const).map((field): Case => {
      const kind = { partId: 'part', measurementId: 'measurement', fitCheckId: 'check_evidence', guideStepId: 'step' }[field];
      return {
        route: `POST marks (${field})`,
        field,
        send: (id) => mine.owner.agent.post(`${mine.base}/footage/${mine.footageId}/marks`).send({ kind, startMs: 500, [field]: id }),
        rows: () => countRows(app, 'marks', 'footage_id', mine.footageId),
      };
    }),
    {
      route: 'PATCH marks (partId)',
      field: 'partId',
      send: (id) => mine.owner.agent.patch(`${mine.base}/footage/${mine.footageId}/marks/${mine.markId}`).send({ kind: 'part', partId: id }),
      rows: async () => (await mine.owner.agent.get(`${mine.base}/footage/${mine.footageId}/marks`).expect(200)).body,
    },
    {
      route: 'POST fit check evidence (measurementId)',
      field: 'measurementId',
      send: (id) => mine.owner.agent.post(`${mine.base}/checks/${mine.checkId}/evidence`).send({ kind: 'measurement', measurementId: id }),
      rows: () => countRows(app, 'fit_check_evidence', 'fit_check_id', mine.checkId),
    },
    {
      route: 'POST fit check evidence (markId)',
      field: 'markId',
      send: (id) => mine.owner.agent.post(`${mine.base}/checks/${mine.checkId}/evidence`).send({ kind: 'mark', markId: id }),
      rows: () => countRows(app, 'fit_check_evidence', 'fit_check_id', mine.checkId),
    },
    {
      route: 'POST assembly interfaces (featureAId)',
      field: 'featureAId',
      send: (id) =>
        mine.owner.agent
          .post(`${mine.base}/assemblies/${mine.assemblyId}/interfaces`)
          .send({ kind: 'bore_shaft', name: 'probe', featureAId: id, featureBId: mine.shaftFeatureId }),
      rows: () => countRows(app, 'assembly_interfaces', 'assembly_id', mine.assemblyId),
    },
    {
      route: 'PATCH guides (footageId)',
      field: 'footageId',
      send: (id) => mine.owner.agent.patch(`${mine.base}/guides/${mine.guideId}`).send({ footageId: id }),
      rows: guideRow,
    },
    {
      route: 'PATCH guides (assemblyId)',
      field: 'assemblyId',
      send: (id) => mine.owner.agent.patch(`${mine.base}/guides/${mine.guideId}`).send({ assemblyId: id }),
      rows: guideRow,
    },
    {
      route: 'POST guide steps (footageId)',
      field: 'footageId',
      send: (id) => mine.owner.agent.post(`${mine.base}/guides/${mine.guideId}/steps`).send({ title: 'Probe', footageId: id, startMs: 100 }),
      rows: () => countRows(app, 'guide_steps', 'guide_id', mine.guideId),
    },
    {
      route: 'PUT guide steps order (stepIds)',
      field: 'stepIds',
      send: (id) => mine.owner.agent.put(`${mine.base}/guides/${mine.guideId}/steps/order`).send({ stepIds: [id] }),
      rows: async () => (await mine.owner.agent.get(`${mine.base}/guides/${mine.guideId}`).expect(200)).body.steps,
    },
    {
      route: 'PATCH fit reports (fitCheckId)',
      field: 'fitCheckId',
      send: (id) => mine.owner.agent.patch(`${mine.base}/fit-reports/${reportId}`).send({ fitCheckId: id }),
      rows: async () => (await mine.owner.agent.get(`${mine.base}/fit-reports`).expect(200)).body,
    },
    {
      route: 'POST follows (targetId)',
      field: 'targetId',
      send: (id) => reader.agent.post('/api/follows').send({ targetKind: 'assembly', targetId: id }),
      rows: () => countRows(app, 'follows', 'user_id', reader.id),
    },
  ];

  /** The id of the same kind of thing in the other workshop, for each field. */
  const theirId = (field: string): string =>
    ({
      featureId: theirs.holeFeatureId,
      featureAId: theirs.holeFeatureId,
      interfaceId: theirs.interfaceId,
      footageId: theirs.footageId,
      partId: theirs.partId,
      measurementId: theirs.measurementId,
      fitCheckId: theirs.checkId,
      guideStepId: theirs.stepId,
      markId: theirs.markId,
      assemblyId: theirs.assemblyId,
      stepIds: theirs.stepId,
      targetId: randomUUID(),
    })[field]!;

  let reportId: string;
  beforeAll(async () => {
    reportId = (
      await reader.agent.post(`/api/guides/${mine.workshopSlug}/${mine.guideSlug}/fit-reports`).send({ outcome: 'fit', parts: 'the ids-mine pair' }).expect(201)
    ).body.id;
  });

  it('answers another workshop’s id and a made-up id alike: 4xx naming the field, nothing stored', async () => {
    const failures: string[] = [];
    for (const testCase of cases()) {
      for (const [whose, id] of [
        ['another workshop’s', theirId(testCase.field)],
        ['a random', randomUUID()],
      ] as const) {
        const before = JSON.stringify(await testCase.rows());
        const response = await testCase.send(id);
        const after = JSON.stringify(await testCase.rows());
        const named = JSON.stringify(response.body.errors ?? response.body.message ?? '').includes(testCase.field);
        if (response.status < 400 || response.status >= 500 || !named || before !== after) {
          failures.push(`${testCase.route} with ${whose} id: ${response.status} ${JSON.stringify(response.body)}${before !== after ? ' (rows changed)' : ''}`);
        }
      }
    }
    expect(failures).toEqual([]);
  });

  it('checks a reading’s footage time against the footage’s duration, and wants the footage with the time', async () => {
    const before = await countRows(app, 'measurements', 'workshop_id', mine.workshopId);
    const past = await mine.owner.agent.post(`${mine.base}/measurements`).send(reading({ footageId: mine.footageId, footageTimeMs: mine.footageDurationMs + 1 })).expect(400);
    expect(past.body.errors).toHaveProperty('footageTimeMs');
    const orphan = await mine.owner.agent.post(`${mine.base}/measurements`).send(reading({ footageTimeMs: 500 })).expect(400);
    expect(orphan.body.errors).toHaveProperty('footageTimeMs');
    expect(await countRows(app, 'measurements', 'workshop_id', mine.workshopId)).toBe(before);
    const inside = await mine.owner.agent.post(`${mine.base}/measurements`).send(reading({ footageId: mine.footageId, footageTimeMs: mine.footageDurationMs })).expect(201);
    expect(inside.body).toMatchObject({ footageId: mine.footageId, footageTimeMs: mine.footageDurationMs });
  });
});
