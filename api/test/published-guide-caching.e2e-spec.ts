import { NestExpressApplication } from '@nestjs/platform-express';
import request from 'supertest';
import { DataSource } from 'typeorm';
// The app first: it loads the entities in the order their decorators need (the controller alone reaches them through its DTOs).
import { createTestApp } from './create-test-app';
import { PUBLIC_GUIDE_CACHE } from '../src/guides/published-guides.controller';
import { PUBLISHED_GUIDE_VERSION_SQL, PUBLISHED_INDEX_VERSION_SQL } from '../src/guides/published-guide-versions';
import { removeScratch } from './support/footage';
import { makeWorkshopFixture, type WorkshopFixture } from './support/workshop-fixture';

jest.setTimeout(120_000);

/**
 * Conditional reads of public guides (RFC 9110 §13.1.2 If-None-Match, §15.4.5 304; RFC 9111 caching;
 * RFC 5861 stale-while-revalidate), on the real MariaDB: the tag names the published revision and the
 * live checklist, so it moves when a check is confirmed, the guide is re-published or withdrawn, and not otherwise.
 */
describe('Public guide reads: ETag, Cache-Control and 304 (real MariaDB, S3 fake)', () => {
  let app: NestExpressApplication;
  let shop: WorkshopFixture;
  let readPath: string;
  const anonymous = () => request(app.getHttpServer());

  /** The state of the fixture's manual check in a read answer (the assembly's derived fit check sits beside it). */
  function checkState(answer: { checklist: { checks: { id: string; state: string }[] } }): string | undefined {
    return answer.checklist.checks.find((check) => check.id === shop.checkId)?.state;
  }

  async function readTag(): Promise<string> {
    const answer = await anonymous().get(readPath).expect(200);
    return String(answer.headers.etag);
  }

  beforeAll(async () => {
    app = await createTestApp();
    shop = await makeWorkshopFixture(app, 'etag');
    readPath = `/api/guides/${shop.workshopSlug}/${shop.guideSlug}`;
    // The guide shows the assembly's checklist from here on.
    await shop.owner.agent.patch(`${shop.base}/guides/${shop.guideId}`).send({ assemblyId: shop.assemblyId }).expect(200);
    await shop.owner.agent.post(`${shop.base}/guides/${shop.guideId}/revisions`).send({}).expect(201);
  });
  afterAll(async () => {
    removeScratch();
    await app.close();
  });

  it('answers with a strong ETag and the public policy, and 304 without a body for the same tag', async () => {
    const first = await anonymous().get(readPath).expect(200);
    expect(first.headers.etag).toMatch(/^"[A-Za-z0-9_-]{32}"$/);
    expect(first.headers['cache-control']).toBe(PUBLIC_GUIDE_CACHE);
    expect(checkState(first.body)).toBe('open');

    const again = await anonymous().get(readPath).set('If-None-Match', first.headers.etag).expect(304);
    expect(again.text).toBe('');
    expect(again.headers.etag).toBe(first.headers.etag);
    expect(again.headers['cache-control']).toBe(PUBLIC_GUIDE_CACHE);
    // One of a list, and the weak form, match as well (weak comparison).
    await anonymous().get(readPath).set('If-None-Match', `"older", W/${first.headers.etag}`).expect(304);
    // A reload asks for everything: the whole answer, not an empty 200.
    const reload = await anonymous().get(readPath).set('If-None-Match', first.headers.etag).set('Cache-Control', 'no-cache').expect(200);
    expect(reload.body.guide.slug).toBe(shop.guideSlug);
  });

  it('gives a signed-in reader the same answer, tag and public policy (nothing in it is personal)', async () => {
    const anonymousAnswer = await anonymous().get(readPath).expect(200);
    const signedIn = await shop.owner.agent.get(readPath).expect(200);
    expect(signedIn.headers.etag).toBe(anonymousAnswer.headers.etag);
    expect(signedIn.headers['cache-control']).toBe(PUBLIC_GUIDE_CACHE);
    expect(signedIn.body).toEqual(anonymousAnswer.body);
  });

  it('keeps the tag while only the draft changes (readers do not see drafts)', async () => {
    const before = await readTag();
    await shop.owner.agent.patch(`${shop.base}/guides/${shop.guideId}`).send({ summary: '<p>Draft words nobody reads yet</p>' }).expect(200);
    await anonymous().get(readPath).set('If-None-Match', before).expect(304);
  });

  it('moves the tag when a check of the guide’s assembly is confirmed', async () => {
    const before = await readTag();
    await shop.owner.agent.post(`${shop.base}/checks/${shop.checkId}/evidence`).send({ kind: 'mark', markId: shop.markId }).expect(201);
    const withEvidence = await anonymous().get(readPath).set('If-None-Match', before).expect(200);
    expect(withEvidence.headers.etag).not.toBe(before);

    await shop.owner.agent.post(`${shop.base}/checks/${shop.checkId}/transitions`).send({ to: 'confirmed', reason: 'Fitted on the truck' }).expect(201);
    const confirmed = await anonymous().get(readPath).set('If-None-Match', String(withEvidence.headers.etag)).expect(200);
    expect(confirmed.headers.etag).not.toBe(withEvidence.headers.etag);
    expect(checkState(confirmed.body)).toBe('confirmed');
    await anonymous().get(readPath).set('If-None-Match', String(confirmed.headers.etag)).expect(304);
  });

  it('moves the tag when the guide is re-published, and answers 404 kept by no cache once it is withdrawn', async () => {
    const before = await readTag();
    await shop.owner.agent.post(`${shop.base}/guides/${shop.guideId}/revisions`).send({ note: 'again' }).expect(201);
    const republished = await anonymous().get(readPath).set('If-None-Match', before).expect(200);
    expect(republished.headers.etag).not.toBe(before);
    expect(republished.body.revision.note).toBe('again');

    await shop.owner.agent.delete(`${shop.base}/guides/${shop.guideId}/publication`).expect(204);
    const withdrawn = await anonymous().get(readPath).set('If-None-Match', String(republished.headers.etag)).expect(404);
    expect(withdrawn.headers['cache-control']).toBe('no-store');

    await shop.owner.agent.post(`${shop.base}/guides/${shop.guideId}/revisions`).send({}).expect(201);
    const back = await anonymous().get(readPath).set('If-None-Match', String(republished.headers.etag)).expect(200);
    expect([before, republished.headers.etag]).not.toContain(back.headers.etag);
  });

  it('tags the index too: 304 while nothing is published or withdrawn, a new tag when a guide is', async () => {
    const first = await anonymous().get('/api/guides').expect(200);
    expect(first.headers.etag).toMatch(/^"[A-Za-z0-9_-]{32}"$/);
    expect(first.headers['cache-control']).toBe(PUBLIC_GUIDE_CACHE);
    // The index spans every workshop, and other test files publish guides at the same time: a 200 here
    // is right only with a new tag (the index did change); ask again with that tag until it holds still.
    let current = String(first.headers.etag);
    let notModified = false;
    for (let attempt = 0; attempt < 10 && !notModified; attempt++) {
      const again = await anonymous().get('/api/guides?q=etag').set('If-None-Match', current);
      notModified = again.status === 304;
      if (!notModified) {
        expect([again.status, again.headers.etag === current]).toEqual([200, false]);
        current = String(again.headers.etag);
      }
    }
    expect(notModified).toBe(true);

    await shop.owner.agent.delete(`${shop.base}/guides/${shop.guideId}/publication`).expect(204);
    const withdrawn = await anonymous().get('/api/guides').set('If-None-Match', first.headers.etag).expect(200);
    expect(withdrawn.headers.etag).not.toBe(first.headers.etag);
    const listed = (withdrawn.body as { slug: string; workshop: { slug: string } }[]).map((guide) => `${guide.workshop.slug}/${guide.slug}`);
    expect(listed).not.toContain(`${shop.workshopSlug}/${shop.guideSlug}`);

    await shop.owner.agent.post(`${shop.base}/guides/${shop.guideId}/revisions`).send({}).expect(201);
    const published = await anonymous().get('/api/guides').set('If-None-Match', String(withdrawn.headers.etag)).expect(200);
    expect(published.headers.etag).not.toBe(withdrawn.headers.etag);
    // The whole index is held under its tag too: the answer after publishing lists the guide again, at its new revision.
    const republished = (published.body as { slug: string; revision: number; workshop: { slug: string } }[]).find(
      (guide) => guide.workshop.slug === shop.workshopSlug && guide.slug === shop.guideSlug,
    );
    expect(republished?.revision).toBeGreaterThan(1);
  });

  it('serves the index’s held answer with the public policy, and a search freshly, under the same tag', async () => {
    const plain = await anonymous().get('/api/guides').set('Accept-Encoding', 'gzip').expect(200);
    expect(plain.headers['cache-control']).toBe(PUBLIC_GUIDE_CACHE);
    expect(plain.headers['content-encoding']).toBe('gzip');
    const workshopName = String((await anonymous().get(readPath).expect(200)).body.workshop.name);
    const search = await anonymous().get(`/api/guides?q=${encodeURIComponent(workshopName)}`).expect(200);
    expect(search.headers.etag).toBe(plain.headers.etag);
    const found = search.body as { slug: string; workshop: { slug: string; name: string } }[];
    expect(found.map((guide) => `${guide.workshop.slug}/${guide.slug}`)).toContain(`${shop.workshopSlug}/${shop.guideSlug}`);
    expect(found.length).toBeLessThan((plain.body as unknown[]).length + 1);
    expect(found.every((guide) => guide.workshop.name === workshopName)).toBe(true);
    // The search is checked before the tag is read, with the usual field errors, even for a tag that matches.
    const tooLong = await anonymous().get(`/api/guides?q=${'a'.repeat(101)}`).set('If-None-Match', String(plain.headers.etag)).expect(400);
    expect(tooLong.body.errors.q).toMatch(/100 characters/);
    expect((await anonymous().get('/api/guides?q=a&q=b').expect(400)).body.errors.q).toBe('q must be a string');
    expect((await anonymous().get('/api/guides?page=2').expect(400)).body.errors.page).toBe('property page should not exist');
  });

  it('reads the tags through keys: EXPLAIN shows no full scan of any table', async () => {
    const database = app.get(DataSource);
    for (const [sql, parameters] of [
      [PUBLISHED_GUIDE_VERSION_SQL, [shop.guideSlug, shop.workshopSlug]],
      [PUBLISHED_INDEX_VERSION_SQL, []],
    ] as const) {
      const plan = await database.query<{ table: string | null; type: string | null; key: string | null }[]>(`EXPLAIN ${sql}`, [...parameters]);
      const fullScans = plan.filter((step) => step.type === 'ALL').map((step) => step.table);
      expect({ query: sql.trim().slice(0, 60), fullScans }).toEqual({ query: sql.trim().slice(0, 60), fullScans: [] });
    }
  });
});
