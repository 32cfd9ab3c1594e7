import { NestExpressApplication } from '@nestjs/platform-express';
import { ConfigService } from '@nestjs/config';
import Redis from 'ioredis';
import request from 'supertest';
import { DataSource } from 'typeorm';
import type { AppConfig } from '../src/config/app-config';
import { PublishedGuidesService } from '../src/guides/published-guides.service';
import { Workshop } from '../src/workshops/entities/workshop.entity';
import { createTestApp } from './create-test-app';
import { removeScratch } from './support/footage';
import { makeWorkshopFixture, type WorkshopFixture } from './support/workshop-fixture';

jest.setTimeout(120_000);

/**
 * The follow-along read held in Redis for every API process (real MariaDB and Redis, two apps in one test
 * standing for two API processes): the tag is read from Redis, the answer is served gzipped from Redis, and a
 * write through either process, or one outside any request (as a job writes), is seen by the other at once.
 */
describe('Public guide reads held in Redis, shared by two API processes', () => {
  let first: NestExpressApplication;
  let second: NestExpressApplication;
  let shop: WorkshopFixture;
  let readPath: string;
  let redis: Redis;
  let fieldsKey: string;

  function readOn(app: NestExpressApplication, ifNoneMatch?: string) {
    const call = request(app.getHttpServer()).get(readPath).set('Accept-Encoding', 'gzip');
    return ifNoneMatch ? call.set('If-None-Match', ifNoneMatch) : call;
  }

  beforeAll(async () => {
    first = await createTestApp();
    second = await createTestApp();
    shop = await makeWorkshopFixture(first, 'shared');
    readPath = `/api/guides/${shop.workshopSlug}/${shop.guideSlug}`;
    await shop.owner.agent.patch(`${shop.base}/guides/${shop.guideId}`).send({ assemblyId: shop.assemblyId }).expect(200);
    await shop.owner.agent.post(`${shop.base}/guides/${shop.guideId}/revisions`).send({}).expect(201);
    const connection = first.get(ConfigService<AppConfig, true>).get('redis', { infer: true });
    redis = new Redis({ host: connection.host, port: connection.port, password: connection.password });
    fieldsKey = `${connection.prefix}:public-guides:fields`;
  });
  afterAll(async () => {
    removeScratch();
    await redis?.quit();
    await second?.close();
    await first?.close();
  });

  it('answers If-None-Match from the tag Redis holds, without asking the database', async () => {
    const answer = await readOn(second).expect(200);
    const field = `read:${shop.workshopSlug}/${shop.guideSlug}`;
    // A tag only Redis knows (no database row gives it) is honoured: that 304 never asked the database. The
    // fixture's media jobs may still write footage rows, which rightly forget held tags, so try a few times.
    const statuses: number[] = [];
    for (let attempt = 0; attempt < 5 && !statuses.includes(304); attempt += 1) {
      await redis.hset(fieldsKey, field, '"held-in-redis-only"');
      statuses.push((await readOn(first, '"held-in-redis-only"')).status);
    }
    expect(statuses).toContain(304);
    await redis.hdel(fieldsKey, field);
    const again = await readOn(first).expect(200);
    expect(again.headers.etag).toBe(answer.headers.etag);
  });

  it('serves the answer gzipped from Redis, the same as a freshly built one, and plain JSON to a client without gzip', async () => {
    const gzipped = await readOn(first).expect(200);
    expect(gzipped.headers['content-encoding']).toBe('gzip');
    expect(gzipped.headers['content-type']).toBe('application/json; charset=utf-8');
    expect(gzipped.headers.vary).toMatch(/Accept-Encoding/i);
    const built = await first.get(PublishedGuidesService).read(shop.workshopSlug, shop.guideSlug);
    expect(gzipped.body).toEqual(JSON.parse(JSON.stringify(built)));

    const plain = await request(first.getHttpServer()).get(readPath).set('Accept-Encoding', 'identity').expect(200);
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(plain.headers.etag).toBe(gzipped.headers.etag);
    expect(plain.body).toEqual(gzipped.body);
  });

  it('sees on one process a check confirmed through the other, at once', async () => {
    const before = await readOn(second).expect(200);
    await readOn(second, String(before.headers.etag)).expect(304);
    // Written through the first process; the second holds the old tag and answer in Redis.
    await shop.owner.agent.post(`${shop.base}/checks/${shop.checkId}/evidence`).send({ kind: 'mark', markId: shop.markId }).expect(201);
    await shop.owner.agent.post(`${shop.base}/checks/${shop.checkId}/transitions`).send({ to: 'confirmed', reason: 'Seated by hand' }).expect(201);
    const after = await readOn(second, String(before.headers.etag)).expect(200);
    expect(after.headers.etag).not.toBe(before.headers.etag);
    const check = (after.body as { checklist: { checks: { id: string; state: string; evidence: unknown[] }[] } }).checklist.checks.find(
      (candidate) => candidate.id === shop.checkId,
    );
    expect(check?.state).toBe('confirmed');
    expect(check?.evidence).toHaveLength(1);
    await readOn(first, String(after.headers.etag)).expect(304);
  });

  it('forgets the tag on a write made outside any request (as a queue job writes)', async () => {
    const before = await readOn(first).expect(200);
    await readOn(first, String(before.headers.etag)).expect(304);
    await second
      .get(DataSource).getRepository(Workshop).update({ id: shop.workshopId }, { name: 'Renamed by a job' });
    const after = await readOn(first, String(before.headers.etag)).expect(200);
    expect((after.body as { workshop: { name: string } }).workshop.name).toBe('Renamed by a job');
  });

  it('serves the index gzipped from Redis, the same as a freshly built one', async () => {
    const index = await request(first.getHttpServer()).get('/api/guides').set('Accept-Encoding', 'gzip').expect(200);
    expect(index.headers['content-encoding']).toBe('gzip');
    const tag = String(index.headers.etag);
    // Other test files publish guides meanwhile: compare with a fresh build only while the tag holds still.
    const built = await second.get(PublishedGuidesService).index();
    const still = await request(second.getHttpServer()).get('/api/guides').set('Accept-Encoding', 'gzip').set('If-None-Match', tag);
    if (still.status === 304) expect(index.body).toEqual(JSON.parse(JSON.stringify(built)));
    else expect(still.headers.etag).not.toBe(tag);
  });

  it('moves the index tag on withdrawal through either process', async () => {
    const index = await request(second.getHttpServer()).get('/api/guides').expect(200);
    await request(second.getHttpServer()).get('/api/guides').set('If-None-Match', String(index.headers.etag)).expect(304);
    await shop.owner.agent.delete(`${shop.base}/guides/${shop.guideId}/publication`).expect(204);
    await request(second.getHttpServer()).get('/api/guides').set('If-None-Match', String(index.headers.etag)).expect(200);
    await readOn(second).expect(404);
  });
});
