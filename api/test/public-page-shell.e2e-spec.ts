import { NestExpressApplication } from '@nestjs/platform-express';
import { createHash } from 'node:crypto';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { createTestApp } from './create-test-app';
import { removeScratch } from './support/footage';
import { makeWorkshopFixture, type WorkshopFixture } from './support/workshop-fixture';

jest.setTimeout(180_000);

/** The studio's index.html as Vite writes it (the landmarks the shell fills: title, description, #root). */
const INDEX_HTML = `<!doctype html>
<html lang="en">
  <head>
    <meta charset="UTF-8" />
    <meta name="description" content="Fitwright: verified-fit build guides from workshop footage" />
    <title>Fitwright</title>
    <script type="module" crossorigin src="/assets/index-test.js"></script>
    <link rel="modulepreload" crossorigin href="/assets/runtime-test.js">
    <link rel="stylesheet" crossorigin href="/assets/index-test.css">
  </head>
  <body>
    <div id="root"></div>
  </body>
</html>
`;

const HOSTILE_TITLE = 'Coupler <script>alert("x")</script> & "friends"';

/**
 * A shell page starts the studio's code only after its first paint: no module script or preload in the page as
 * sent; the entry and preloads are named in a JSON block, and the one inline script (the loader) is allowed by
 * its hash in the page's Content-Security-Policy, which allows no other inline script.
 */
function expectModulesDeferred(page: request.Response): void {
  const html = page.text;
  expect(html).not.toContain('<script type="module"');
  expect(html).not.toContain('<link rel="modulepreload"');
  const modules = /<script type="application\/json" id="fw-shell-modules">([^<]*)<\/script>/.exec(html);
  expect(JSON.parse(modules?.[1] ?? 'null')).toEqual({ entry: '/assets/index-test.js', preload: ['/assets/runtime-test.js'] });
  const inline = [...html.matchAll(/<script>([^<]*)<\/script>/g)].map((match) => match[1]);
  expect(inline).toHaveLength(1);
  const scriptSrc = /(?:^|;)script-src ([^;]*)/.exec(String(page.headers['content-security-policy']))?.[1].trim().split(/\s+/);
  expect(scriptSrc).toEqual(["'self'", `'sha256-${createHash('sha256').update(inline[0]).digest('base64')}'`]);
  // After the shell, outside what the studio moves aside.
  expect(html.indexOf('id="fw-shell-modules"')).toBeGreaterThan(html.indexOf('data-page-shell'));
}

/**
 * The public guide pages arrive with a server-rendered first paint (title, cautions, poster) in #root, made from
 * the cached public answer, every text escaped; a page of a guide that is not published is the plain studio page.
 */
describe('Public guide pages: server-rendered shell (real MariaDB, Redis, S3 fake)', () => {
  let app: NestExpressApplication;
  let shop: WorkshopFixture;
  let studioDist: string;
  let pagePath: string;
  const anonymous = () => request(app.getHttpServer());

  beforeAll(async () => {
    studioDist = mkdtempSync(join(tmpdir(), 'fw-shell-'));
    writeFileSync(join(studioDist, 'index.html'), INDEX_HTML);
    app = await createTestApp({ STUDIO_DIST: studioDist });
    shop = await makeWorkshopFixture(app, 'shell');
    const guidePath = `${shop.base}/guides/${shop.guideId}`;
    await shop.owner.agent.patch(guidePath).send({ title: HOSTILE_TITLE, safetyTopics: ['lifting'] }).expect(200);
    await shop.owner.agent
      .patch(`${guidePath}/steps/${shop.stepId}`)
      .send({ caution: { level: 'CAUTION', text: 'Mind the <b>splines</b> & the seal.' } })
      .expect(200);
    await shop.owner.agent.post(`${guidePath}/revisions`).send({}).expect(201);
    pagePath = `/guides/${shop.workshopSlug}/${shop.guideSlug}`;
    const read = await anonymous().get(`/api${pagePath}`).expect(200);
    expect(read.body.guide.title).toBe(HOSTILE_TITLE);
  });
  afterAll(async () => {
    removeScratch();
    await app.close();
    rmSync(studioDist, { recursive: true, force: true });
  });

  it('draws the published guide’s title, workshop, cautions and poster into #root, escaped', async () => {
    const page = await anonymous().get(pagePath).expect(200).expect('Content-Type', /text\/html/);
    const html = page.text;
    expect(html).toContain('Coupler &lt;script&gt;alert(&quot;x&quot;)&lt;/script&gt; &amp; &quot;friends&quot;');
    expect(html).not.toContain('<script>alert');
    expect(html).toMatch(/<title>Coupler &lt;script&gt;[^<]*· Fitwright<\/title>/);
    expect(html).toMatch(/<meta name="description" content="A verified-fit build guide from [^"<>]*Coupler &lt;script&gt;/);
    expect(html).toMatch(/<div id="root"><div data-page-shell=""/);
    // The lifting topic's caution (WARNING, the most severe here, in full) and the step's caution by its heading.
    expect(html).toContain('Safety before you start');
    expect(html).toMatch(/data-level="WARNING">⚠ WARNING<\/span><strong>Lifting the vehicle<\/strong> \S/);
    expect(html).toContain('<strong>Step 1: Fit it</strong>');
    expect(html).not.toContain('<b>splines</b>');
    expect(html).toContain(`<img class="fw-shell-poster" src="/api/guides/${shop.workshopSlug}/${shop.guideSlug}/poster"`);
    // The studio's script is started by the loader after the first paint, so the app still takes over; its stylesheet
    // stays in <head> as a print sheet (turned on by the studio as it starts), so it holds back no paint, and stays
    // before #root, where React draws the theme's variables that must win over the library's defaults in it.
    expectModulesDeferred(page);
    expect(html).toContain('<link rel="stylesheet" media="print" data-shell-deferred="" crossorigin href="/assets/index-test.css">');
    expect(html.indexOf('index-test.css')).toBeLessThan(html.indexOf('</head>'));
    // The poster link the shell names answers (a redirect to storage).
    await anonymous().get(`/api/guides/${shop.workshopSlug}/${shop.guideSlug}/poster`).expect(302);
  });

  it('serves the same shell again from Redis, and a new one once the guide changes', async () => {
    const before = (await anonymous().get(pagePath).expect(200)).text;
    expect((await anonymous().get(pagePath).expect(200)).text).toBe(before);
    await shop.owner.agent.patch(`${shop.base}/guides/${shop.guideId}`).send({ title: 'Fitting the shell coupler' }).expect(200);
    await shop.owner.agent.post(`${shop.base}/guides/${shop.guideId}/revisions`).send({}).expect(201);
    const after = (await anonymous().get(pagePath).expect(200)).text;
    expect(after).toContain('<h1>Fitting the shell coupler</h1>');
    expect(after).not.toContain('Coupler &lt;script&gt;');
  });

  it('lists the published guides’ titles on the guide index, but not for a search', async () => {
    const index = (await anonymous().get('/guides').expect(200)).text;
    expect(index).toContain('<title>Published guides · Fitwright</title>');
    expect(index).toContain(`<a href="/guides/${shop.workshopSlug}/${shop.guideSlug}">Fitting the shell coupler</a>`);
    expectModulesDeferred(await anonymous().get('/guides').expect(200));
    const search = (await anonymous().get('/guides?q=coupler').expect(200)).text;
    expect(search).toBe(INDEX_HTML);
  });

  it('gives the other public pages a static first paint: a title and a sentence, nothing from the address', async () => {
    const unsubscribe = await anonymous().get('/unsubscribe?token=tok-%3Cb%3Esecret').expect(200).expect('Content-Type', /text\/html/);
    expect(unsubscribe.text).toContain('<title>Stop fit news · Fitwright</title>');
    expect(unsubscribe.text).toMatch(/<div id="root"><div data-page-shell=""[^]*<h1>Stop fit news<\/h1><p class="fw-shell-lead">This page stops/);
    expect(unsubscribe.text).not.toMatch(/tok-|secret/);
    expectModulesDeferred(unsubscribe);
    const preferences = await anonymous().get('/mail-preferences?token=abc').expect(200);
    expect(preferences.text).toContain('<title>Mail preferences · Fitwright</title>');
    expect(preferences.text).toContain('<h1>Mail preferences</h1>');
    expectModulesDeferred(preferences);
    const finder = await anonymous().get('/fit-finder/?splineTeeth=21').expect(200);
    expect(finder.text).toContain('<title>Fit finder · Fitwright</title>');
    expect(finder.text).toContain('<h1>Fit finder</h1><p class="fw-shell-lead">Has anyone proven it fits?');
    expect(finder.text).toMatch(/<meta name="description" content="Has anyone proven it fits\?/);
    expectModulesDeferred(finder);
  });

  it('serves the plain page for an unknown guide, other studio paths, and a withdrawn guide', async () => {
    expect((await anonymous().get(`/guides/${shop.workshopSlug}/no-such-guide`).expect(200)).text).toBe(INDEX_HTML);
    expect((await anonymous().get('/tools/fit-calculator').expect(200)).text).toBe(INDEX_HTML);
    expect((await anonymous().get('/unsubscribe/more').expect(200)).text).toBe(INDEX_HTML);
    await shop.owner.agent.delete(`${shop.base}/guides/${shop.guideId}/publication`).expect(204);
    const withdrawn = (await anonymous().get(pagePath).expect(200)).text;
    expect(withdrawn).toBe(INDEX_HTML);
    expect(withdrawn).not.toContain('shell coupler');
    expect((await anonymous().get('/guides').expect(200)).text).not.toContain(`href="${pagePath}"`);
  });
});
