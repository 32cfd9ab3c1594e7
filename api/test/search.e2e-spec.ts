import { NestExpressApplication } from '@nestjs/platform-express';
import { randomInt } from 'node:crypto';
import { DataSource } from 'typeorm';
import { createTestApp } from './create-test-app';
import { browserAgent, signUpAndSignIn, type Agent } from './support/accounts';
import { makeWorkshopFixture, type WorkshopFixture } from './support/workshop-fixture';

jest.setTimeout(180_000);

/** A made-up word no other test writes, so counts are exact even on a database other runs have used. */
function inventedWord(): string {
  return Array.from({ length: 10 }, () => String.fromCharCode(97 + randomInt(26))).join('');
}

interface Hit {
  kind: string;
  id: string;
  published: boolean;
  title: string;
  snippet: { text: string; match: boolean }[];
  workshop: { name: string; slug: string };
  startMs: number | null;
  link: string;
}
interface Results {
  terms: string[];
  total: number;
  offset: number;
  limit: number;
  totalCapped: boolean;
  counts: { kind: string; count: number; capped: boolean }[];
  results: Hit[];
}

async function search(agent: Agent, query: Record<string, string | number>): Promise<Results> {
  return (await agent.get('/api/search').query(query).expect(200)).body as Results;
}

describe('search: published guides for everyone, own workshops for members (real MariaDB)', () => {
  let app: NestExpressApplication;
  let shop: WorkshopFixture;
  let other: WorkshopFixture;
  let reader: Agent;
  const stepWord = inventedWord();
  const cueWord = inventedWord();
  const draftWord = inventedWord();
  const pagedWord = inventedWord();

  beforeAll(async () => {
    app = await createTestApp();
    [shop, other] = [await makeWorkshopFixture(app, 'searchshop'), await makeWorkshopFixture(app, 'searchother')];
    reader = await browserAgent(app);
    const { owner, base, guideId, stepId, footageId, assemblyId } = shop;
    // The fixture's clip is four seconds long: every cue sits inside it.
    const at = (ms: number) => `00:00:0${Math.floor(ms / 1000)}.${String(ms % 1000).padStart(3, '0')}`;
    const cues = [
      `${at(1000)} --> ${at(1400)}\nThe ${cueWord} coupler slides on <img src=x onerror=alert(1)>`,
      ...Array.from({ length: 5 }, (_, index) => `${at(1500 + index * 400)} --> ${at(1800 + index * 400)}\nCue ${index} says ${pagedWord}`),
    ];
    await owner.agent.put(`${base}/footage/${footageId}/transcript`).send({ text: `WEBVTT\n\n${cues.join('\n\n')}\n` }).expect(200);
    await owner.agent.patch(`${base}/guides/${guideId}`).send({ assemblyId, summary: 'Bench and truck checks.' }).expect(200);
    await owner.agent.patch(`${base}/guides/${guideId}/steps/${stepId}`).send({ body: `<p>Press the ${stepWord} bearing home.</p>` }).expect(200);
    await owner.agent.post(`${base}/guides/${guideId}/revisions`).send({}).expect(201);
    // After publishing: a draft change the public must not see until it is published.
    await owner.agent.patch(`${base}/guides/${guideId}/steps/${stepId}`).send({ body: `<p>Press the ${stepWord} bearing home. ${draftWord}</p>` }).expect(200);
  });

  afterAll(async () => {
    await app.close();
  });

  it("finds a published step's words for a signed-out reader, with a highlighted snippet and the guide's link", async () => {
    const found = await search(reader, { q: stepWord });
    expect(found.total).toBe(1);
    const [hit] = found.results;
    expect(hit).toMatchObject({ kind: 'guide', published: true, link: `/guides/${shop.workshopSlug}/${shop.guideSlug}` });
    expect(hit.snippet).toContainEqual({ text: stepWord, match: true });
  });

  it('gives a cue hit its footage time and a link that opens the guide at that moment; the cue text stays text', async () => {
    const found = await search(reader, { q: `${cueWord} coupler` });
    expect(found.results).toHaveLength(1);
    const [hit] = found.results;
    expect(hit).toMatchObject({ kind: 'cue', startMs: 1000, link: `/guides/${shop.workshopSlug}/${shop.guideSlug}?t=1.0` });
    expect(hit.snippet.some((segment) => segment.text.includes('<'))).toBe(false);
  });

  it('finds a part of a published guide by its part number, hyphens or not, exactly or by prefix', async () => {
    const partNumber = 'SEARCHSHOP-1'; // the fixture's part number is the label upper-cased with "-1"
    for (const q of [partNumber, 'searchshop1', 'SEARCHSHOP']) {
      const found = await search(reader, { q, kind: 'part' });
      expect(found.results.map((hit) => hit.title)).toContain(`Pilot bearing and shaft · ${partNumber}`);
      expect(found.results.every((hit) => hit.published)).toBe(true);
    }
  });

  it("never matches a published part by its private notes", async () => {
    const noteWord = inventedWord();
    await shop.owner.agent.patch(`${shop.base}/parts/${shop.partId}`).send({ notes: `Bought from ${noteWord} at a discount` }).expect(200);
    expect((await search(reader, { q: noteWord })).total).toBe(0);
    expect((await search(shop.owner.agent, { q: noteWord, kind: 'part' })).total).toBe(1);
  });

  it('pages cue hits with a total, disjoint pages and the whole set across them', async () => {
    const first = await search(reader, { q: pagedWord, limit: 2 });
    const second = await search(reader, { q: pagedWord, limit: 2, offset: 2 });
    const third = await search(reader, { q: pagedWord, limit: 2, offset: 4 });
    expect(first.total).toBe(5);
    expect(first.counts).toContainEqual({ kind: 'cue', count: 5, capped: false });
    expect(first.totalCapped).toBe(false);
    const ids = [...first.results, ...second.results, ...third.results].map((hit) => hit.id);
    expect(ids).toHaveLength(5);
    expect(new Set(ids).size).toBe(5);
  });

  it('never shows draft guide text to the public; the workshop member finds it as a draft', async () => {
    expect((await search(reader, { q: draftWord })).total).toBe(0);
    const stranger = await signUpAndSignIn(app);
    expect((await search(stranger.agent, { q: draftWord })).total).toBe(0);
    const own = await search(shop.owner.agent, { q: draftWord });
    expect(own.results).toHaveLength(1);
    expect(own.results[0]).toMatchObject({ kind: 'draft_guide', published: false, link: `/workshops/${shop.workshopId}/guides/${shop.guideId}` });
  });

  it("never shows another workshop's unpublished parts, footage or marks; their members see them", async () => {
    // The other fixture's guide names no assembly: its part is in no published guide.
    const partNumber = 'SEARCHOTHER-1';
    // (Its published guide's title, "searchother guide", is public; the part is not.)
    expect((await search(reader, { q: partNumber, kind: 'part' })).total).toBe(0);
    expect((await search(shop.owner.agent, { q: partNumber, kind: 'part' })).total).toBe(0);
    const own = await search(other.owner.agent, { q: partNumber, kind: 'part' });
    expect(own.results).toHaveLength(1);
    expect(own.results[0]).toMatchObject({ published: false, link: `/workshops/${other.workshopId}/parts/${other.partId}` });
    // The fixture's check title ("searchother check") is a fit check only members see.
    expect((await search(reader, { q: 'searchother check', kind: 'fit_check' })).total).toBe(0);
    expect((await search(other.owner.agent, { q: 'searchother check', kind: 'fit_check' })).total).toBeGreaterThanOrEqual(1);
  });

  it('filters by workshop, state and vehicle', async () => {
    expect((await search(reader, { q: stepWord, workshop: other.workshopSlug })).total).toBe(0);
    expect((await search(reader, { q: stepWord, workshop: shop.workshopSlug })).total).toBe(1);
    // A kind filter narrows the page; the chips still count the other kinds.
    const onlyCues = await search(reader, { q: stepWord, kind: 'cue' });
    expect(onlyCues.total).toBe(0);
    expect(onlyCues.counts).toContainEqual({ kind: 'guide', count: 1, capped: false });
    expect((await search(shop.owner.agent, { q: draftWord, state: 'published' })).total).toBe(0);
    expect((await search(shop.owner.agent, { q: stepWord, state: 'unpublished', kind: 'guide' })).total).toBe(0);
    // The fixture's build has no vehicle: any vehicle filter leaves it out.
    expect((await search(reader, { q: stepWord, vehicle: 'pickup' })).total).toBe(0);
  });

  it("shows a member their own workshop's published parts and cues under the Published filter, with the public links", async () => {
    const { owner, workshopSlug, guideSlug } = shop;
    const publishedCues = await search(owner.agent, { q: `${cueWord} coupler`, state: 'published' });
    expect(publishedCues.results).toHaveLength(1);
    expect(publishedCues.results[0]).toMatchObject({ kind: 'cue', published: true, startMs: 1000, link: `/guides/${workshopSlug}/${guideSlug}?t=1.0` });
    const publishedParts = await search(owner.agent, { q: 'SEARCHSHOP-1', kind: 'part', state: 'published' });
    expect(publishedParts.results.map((hit) => [hit.published, hit.link])).toEqual([[true, `/guides/${workshopSlug}/${guideSlug}`]]);

    // Unfiltered, the member's own records stand in for the public copies (they open the studio), each once.
    const everything = await search(owner.agent, { q: `${cueWord} coupler` });
    expect(everything.results.map((hit) => [hit.kind, hit.published])).toEqual([['cue', false]]);
    const parts = await search(owner.agent, { q: 'SEARCHSHOP-1', kind: 'part' });
    expect(parts.results.map((hit) => [hit.published, hit.link])).toEqual([[false, `/workshops/${shop.workshopId}/parts/${shop.partId}`]]);
    // Unpublished: only the member's own records, never the public copies.
    const own = await search(owner.agent, { q: 'SEARCHSHOP-1', kind: 'part', state: 'unpublished' });
    expect(own.results.every((hit) => !hit.published)).toBe(true);
    expect(own.total).toBe(1);
  });

  it('caps a kind\'s count at 1,000 ("1,000+") and still pages to the thousandth hit', async () => {
    // 1,050 cues in the published footage's transcript, written straight to the table (the API's
    // transcript path would take minutes): more than the cap, so the count stops and says so.
    const manyWord = inventedWord();
    const database = app.get(DataSource);
    const [transcript] = await database.query<{ id: string }[]>('SELECT id FROM transcripts WHERE footage_id = ? AND is_active = 1', [shop.footageId]);
    const rows = Array.from({ length: 1_050 }, (_, index) => [transcript.id, 10_000 + index, 3_900, 3_950, `Cue ${index} names ${manyWord} again`]);
    await database.query('INSERT INTO transcript_cues (transcript_id, cue_index, start_ms, end_ms, text) VALUES ?', [rows]);
    try {
      const first = await search(reader, { q: manyWord, limit: 5 });
      expect(first.counts).toContainEqual({ kind: 'cue', count: 1_000, capped: true });
      expect(first.total).toBe(1_000);
      expect(first.totalCapped).toBe(true);
      expect(first.results).toHaveLength(5);
      const deep = await search(reader, { q: manyWord, kind: 'cue', offset: 1_000, limit: 50 });
      expect(deep.results).toHaveLength(50);
      expect(new Set([...first.results, ...deep.results].map((hit) => hit.id)).size).toBe(55);
      // Under the cap a count is exact and not capped.
      const few = await search(reader, { q: `${manyWord} 1049` });
      expect(few.totalCapped).toBe(false);
    } finally {
      await database.query('DELETE FROM transcript_cues WHERE transcript_id = ? AND cue_index >= 10000', [transcript.id]);
    }
  });

  it('narrows to guides with a fit check in a state (checkState), apart from published/unpublished', async () => {
    // The fixture's assembly has one derived check, open until confirmed.
    const [{ state }] = await app.get(DataSource).query<{ state: string }[]>('SELECT state FROM fit_checks WHERE assembly_id = ? LIMIT 1', [shop.assemblyId]);
    const other = state === 'confirmed' ? 'no_fit' : 'confirmed';
    expect((await search(reader, { q: stepWord, checkState: state })).total).toBe(1);
    expect((await search(reader, { q: stepWord, checkState: other })).total).toBe(0);
    expect((await search(shop.owner.agent, { q: draftWord, checkState: state })).total).toBe(0);
    const bad = await reader.get('/api/search').query({ q: stepWord, checkState: 'bench_passed' }).expect(400);
    expect(JSON.stringify(bad.body)).toMatch(/checkState/u);
  });

  it('refuses a query with nothing to search and out-of-range paging, naming the field', async () => {
    const empty = await reader.get('/api/search').query({ q: 'the an' }).expect(400);
    expect(empty.body.message).toMatch(/^q:/u);
    const tooMany = await reader.get('/api/search').query({ q: stepWord, limit: 500 }).expect(400);
    expect(JSON.stringify(tooMany.body)).toMatch(/limit/u);
    const badKind = await reader.get('/api/search').query({ q: stepWord, kind: 'everything' }).expect(400);
    expect(JSON.stringify(badKind.body)).toMatch(/kind/u);
  });

  it('drops a withdrawn guide from every public kind at once', async () => {
    await shop.owner.agent.delete(`${shop.base}/guides/${shop.guideId}/publication`).expect(204);
    expect((await search(reader, { q: stepWord })).total).toBe(0);
    expect((await search(reader, { q: cueWord })).total).toBe(0);
    expect((await search(reader, { q: 'SEARCHSHOP-1', workshop: shop.workshopSlug })).total).toBe(0);
  });
});
