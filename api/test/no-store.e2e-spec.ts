import { NestExpressApplication } from '@nestjs/platform-express';
import request from 'supertest';
import { PUBLIC_GUIDE_CACHE } from '../src/guides/published-guides.controller';
import { createTestApp } from './create-test-app';
import { removeScratch } from './support/footage';
import { makeWorkshopFixture, type WorkshopFixture } from './support/workshop-fixture';

jest.setTimeout(120_000);

/**
 * RFC 9111 §5.2.2.5: `no-store` keeps an answer out of every browser and shared cache. Signed-in answers
 * (member e-mail addresses, drafts) and presigned storage links must carry it; anonymous public reads
 * keep their own policy.
 */
describe('Cache-Control: no-store on private answers (real MariaDB, S3 fake)', () => {
  let app: NestExpressApplication;
  let shop: WorkshopFixture;
  const anonymous = () => request(app.getHttpServer());

  beforeAll(async () => {
    app = await createTestApp();
    shop = await makeWorkshopFixture(app, 'no-store');
    await shop.owner.agent.put(`${shop.base}/footage/${shop.footageId}/transcript`).send({ text: 'WEBVTT\n\n00:00.500 --> 00:01.500\nBench talk\n' }).expect(200);
  });
  afterAll(async () => {
    removeScratch();
    await app.close();
  });

  it('marks every signed-in read no-store: members with e-mail addresses, playback links, drafts, readings and the rest', async () => {
    const paths = [
      '/api/auth/me',
      '/api/workshops',
      `${shop.base}`,
      `${shop.base}/members`,
      `${shop.base}/invitations`,
      `${shop.base}/builds`,
      `${shop.base}/builds/${shop.buildId}/footage`,
      `${shop.base}/footage/${shop.footageId}`,
      `${shop.base}/footage/${shop.footageId}/playback`,
      `${shop.base}/footage/${shop.footageId}/marks`,
      `${shop.base}/parts`,
      `${shop.base}/parts/${shop.partId}`,
      `${shop.base}/measurements`,
      `${shop.base}/builds/${shop.buildId}/assemblies`,
      `${shop.base}/assemblies/${shop.assemblyId}/checklist`,
      `${shop.base}/checks/${shop.checkId}/history`,
      `${shop.base}/builds/${shop.buildId}/guides`,
      `${shop.base}/guides/${shop.guideId}`,
      `${shop.base}/fit-reports`,
      '/api/follows',
      '/api/fit-reports',
      `${shop.base}/footage/${shop.footageId}/transcript/webvtt`,
    ];
    const answers = [];
    for (const path of paths) {
      const response = await shop.owner.agent.get(path);
      answers.push({ path, status: response.status, cacheControl: response.headers['cache-control'] });
    }
    expect(answers).toEqual(paths.map((path) => ({ path, status: 200, cacheControl: 'no-store' })));
  });

  it('marks a playback answer no-store because it carries a presigned link', async () => {
    const playback = await shop.owner.agent.get(`${shop.base}/footage/${shop.footageId}/playback`).expect(200);
    expect(JSON.stringify(playback.body)).toMatch(/X-Amz-Signature=/);
    expect(playback.headers['cache-control']).toBe('no-store');
  });

  it('marks a public redirect to a presigned storage link no-store, even for an anonymous reader', async () => {
    const video = await anonymous().get(`/api/guides/${shop.workshopSlug}/${shop.guideSlug}/video`).expect(302);
    expect(video.headers.location).toMatch(/X-Amz-Signature=/);
    expect(video.headers['cache-control']).toBe('no-store');
  });

  it('marks no-store any answer that sets a cookie (the anonymous first visit gets its CSRF cookie)', async () => {
    const me = await anonymous().get('/api/auth/me').expect(200);
    expect(me.headers['set-cookie']).toBeDefined();
    expect(me.headers['cache-control']).toBe('no-store');
  });

  it('leaves anonymous public reads to their own policy', async () => {
    for (const path of ['/api/health', '/api/guides', `/api/guides/${shop.workshopSlug}/${shop.guideSlug}`, '/api/tools/fits?size=25&unit=mm&hole=H7&shaft=g6']) {
      const response = await anonymous().get(path);
      expect({ path, status: response.status < 300, noStore: /no-store/.test(response.headers['cache-control'] ?? '') }).toEqual({ path, status: true, noStore: false });
    }
    const captions = await anonymous().get(`/api/guides/${shop.workshopSlug}/${shop.guideSlug}/captions.vtt`).expect(200);
    expect(captions.headers['cache-control']).toBe('public, max-age=60');
  });

  it('keeps a public route’s declared policy for a signed-in reader too, since the answer is the same for everyone', async () => {
    const captions = await shop.owner.agent.get(`/api/guides/${shop.workshopSlug}/${shop.guideSlug}/captions.vtt`).expect(200);
    expect(captions.headers['cache-control']).toBe('public, max-age=60');
    // The follow-along read declares its policy too (published-guide-caching.e2e-spec.ts): nothing in it is personal.
    const guide = await shop.owner.agent.get(`/api/guides/${shop.workshopSlug}/${shop.guideSlug}`).expect(200);
    expect(guide.headers['cache-control']).toBe(PUBLIC_GUIDE_CACHE);
  });
});
