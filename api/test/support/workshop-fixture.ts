import type { INestApplication } from '@nestjs/common';
import { DataSource } from 'typeorm';
import { signUpAndSignIn, type TestAccount, uniqueSlug } from './accounts';
import { makeClip, uploadFile, waitUntilProcessed, waitUntilRenditionsSettled } from './footage';

/** One workshop with one of everything a write route can reference, made through the API as a creator would. */
export interface WorkshopFixture {
  owner: TestAccount;
  workshopId: string;
  workshopSlug: string;
  base: string;
  buildId: string;
  partId: string;
  holeFeatureId: string;
  shaftFeatureId: string;
  assemblyId: string;
  interfaceId: string;
  checkId: string;
  measurementId: string;
  footageId: string;
  footageDurationMs: number;
  markId: string;
  guideId: string;
  guideSlug: string;
  stepId: string;
}

export async function makeWorkshopFixture(app: INestApplication, label: string): Promise<WorkshopFixture> {
  const owner = await signUpAndSignIn(app);
  const workshopSlug = uniqueSlug(label);
  const workshopId = (await owner.agent.post('/api/workshops').send({ name: `${label} shop`, slug: workshopSlug }).expect(201)).body.id as string;
  const base = `/api/workshops/${workshopId}`;
  const buildId = (await owner.agent.post(`${base}/builds`).send({ title: `${label} build` }).expect(201)).body.id as string;
  const part = (
    await owner.agent
      .post(`${base}/parts`)
      .send({
        partNumber: `${label.toUpperCase()}-1`,
        title: 'Pilot bearing and shaft',
        category: 'other',
        features: [
          { name: 'bore', kind: 'diameter', role: 'hole', nominal: '15', unit: 'mm' },
          { name: 'spigot', kind: 'diameter', role: 'shaft', nominal: '15', unit: 'mm' },
        ],
      })
      .expect(201)
  ).body as { id: string; features: { id: string; name: string }[] };
  const holeFeatureId = part.features.find((feature) => feature.name === 'bore')!.id;
  const shaftFeatureId = part.features.find((feature) => feature.name === 'spigot')!.id;
  const assemblyId = (await owner.agent.post(`${base}/builds/${buildId}/assemblies`).send({ name: `${label} stack` }).expect(201)).body.id as string;
  await owner.agent.put(`${base}/assemblies/${assemblyId}/parts/${part.id}`).send({ position: 'input side' }).expect(204);
  const interfaceId = (
    await owner.agent
      .post(`${base}/assemblies/${assemblyId}/interfaces`)
      .send({ kind: 'bore_shaft', name: 'pilot fit', featureAId: holeFeatureId, featureBId: shaftFeatureId })
      .expect(201)
  ).body.id as string;
  const checkId = (await owner.agent.post(`${base}/assemblies/${assemblyId}/checks`).send({ title: `${label} check` }).expect(201)).body.id as string;
  const measurementId = (
    await owner.agent
      .post(`${base}/measurements`)
      .send({ featureId: holeFeatureId, quantity: 'diameter', value: '15.010', unit: 'mm', instrumentKind: 'bore_gauge', resolution: '0.001' })
      .expect(201)
  ).body.id as string;
  const clip = makeClip(`${label}-four-seconds.mp4`, { seconds: 4, width: 160, height: 120, rate: 10 });
  const footageId = await uploadFile(owner.agent, workshopId, buildId, clip);
  const footage = await waitUntilProcessed(owner.agent, workshopId, footageId);
  if (footage.state !== 'ready') throw new Error(`fixture footage ${footage.state}: ${footage.failureReason}`);
  // The renditions job writes the footage row until it is done; tests that compare public tags need it settled.
  await waitUntilRenditionsSettled(owner.agent, workshopId, footageId);
  const markId = (await owner.agent.post(`${base}/footage/${footageId}/marks`).send({ kind: 'note', startMs: 1000, label: 'here' }).expect(201)).body.id as string;
  const guide = (await owner.agent.post(`${base}/builds/${buildId}/guides`).send({ title: `${label} guide` }).expect(201)).body as { id: string; slug: string };
  await owner.agent.patch(`${base}/guides/${guide.id}`).send({ footageId }).expect(200);
  const stepId = (await owner.agent.post(`${base}/guides/${guide.id}/steps`).send({ title: 'Fit it' }).expect(201)).body.id as string;
  await owner.agent.post(`${base}/guides/${guide.id}/revisions`).send({}).expect(201);
  return {
    owner,
    workshopId,
    workshopSlug,
    base,
    buildId,
    partId: part.id,
    holeFeatureId,
    shaftFeatureId,
    assemblyId,
    interfaceId,
    checkId,
    measurementId,
    footageId,
    footageDurationMs: Number(footage.durationMs),
    markId,
    guideId: guide.id,
    guideSlug: guide.slug,
    stepId,
  };
}

/** How many rows a table holds for one owner (workshop, user, guide…), read straight from MariaDB. */
export async function countRows(app: INestApplication, table: string, column: string, value: string): Promise<number> {
  const [row] = await app.get(DataSource).query<{ n: string | number }[]>(`SELECT COUNT(*) AS n FROM \`${table}\` WHERE \`${column}\` = ?`, [value]);
  return Number(row.n);
}
