// Smoke journey: the built studio is served by the API, renders its shell in Lexend and shows health.
import assert from 'node:assert/strict';
import { mkdirSync } from 'node:fs';
import { after, before, test } from 'node:test';
import { baseUrl, launchBrowser } from './browser.mjs';

const screenshots = new URL('./screenshots/', import.meta.url);
mkdirSync(screenshots, { recursive: true });

let browser;
let page;
before(async () => {
  browser = await launchBrowser();
  page = await browser.newPage({ viewport: { width: 1280, height: 800 } });
});
after(async () => browser?.close());

test('the shell renders with the Lexend font shipped by the app', async () => {
  const fontRequests = [];
  page.on('request', (request) => {
    if (request.resourceType() === 'font') fontRequests.push(request.url());
  });
  await page.goto(baseUrl);
  await page.getByRole('heading', { name: 'Prove the fit. Publish the build.' }).waitFor();
  await page.evaluate(() => document.fonts.ready);

  const family = await page.evaluate(() => getComputedStyle(document.body).fontFamily);
  assert.match(family, /^Lexend/);
  assert.equal(await page.evaluate(() => document.fonts.check('16px Lexend')), true);
  assert.ok(fontRequests.length > 0, 'a Lexend font file was loaded');
  for (const url of fontRequests) assert.ok(url.startsWith(baseUrl), `font served by the app, not ${url}`);
  await page.screenshot({ path: new URL('home.png', screenshots).pathname });
});

test('the status page shows all four checks up', async () => {
  await page.getByRole('link', { name: 'System status' }).first().click();
  await page.getByText('Every service is up.').waitFor();
  for (const name of ['database', 'storage', 'mail', 'queue']) {
    assert.equal(await page.getByTestId(`check-${name}`).getAttribute('data-state'), 'up');
  }
  await page.screenshot({ path: new URL('status.png', screenshots).pathname });
});

test('an unknown address shows the not-found page inside the shell', async () => {
  const response = await page.goto(`${baseUrl}/no/such/page`);
  assert.equal(response.status(), 200);
  await page.getByRole('heading', { name: 'Page not found' }).waitFor();
  assert.ok(await page.getByText('Fitwright', { exact: true }).isVisible());
});

test('the served studio is a production build of React', async () => {
  const html = await (await fetch(baseUrl)).text();
  const scripts = [...html.matchAll(/<script[^>]+src="([^"]+)"/g)].map((match) => new URL(match[1], baseUrl).href);
  assert.ok(scripts.length > 0, 'index.html loads a script');
  for (const url of scripts) {
    const source = await (await fetch(url)).text();
    // React's development JSX runtime is called jsxDEV; its production runtime never contains the name.
    assert.doesNotMatch(source, /jsxDEV/, `${url} is a development build`);
  }
});

test('scripts are sent precompressed and cached for good; JSON answers are compressed', async () => {
  const html = await (await fetch(baseUrl)).text();
  const [, main] = /<script[^>]+src="([^"]+)"/.exec(html);
  const url = new URL(main, baseUrl);
  for (const [accepted, expected] of [['br, gzip', 'br'], ['gzip', 'gzip'], ['identity', null]]) {
    const response = await fetch(url, { headers: { 'Accept-Encoding': accepted } });
    assert.equal(response.status, 200);
    assert.equal(response.headers.get('content-encoding'), expected, `asked for ${accepted}`);
    assert.match(response.headers.get('content-type'), /javascript/);
    assert.match(response.headers.get('cache-control'), /max-age=31536000.*immutable/);
  }
  // The page itself is never cached for long: a new build must reach readers at once.
  assert.equal((await fetch(baseUrl)).headers.get('cache-control'), 'no-cache');

  // The API's OpenAPI document is a large JSON answer (hundreds of kB).
  const contract = await fetch(`${baseUrl}/api/docs/openapi.json`, { headers: { 'Accept-Encoding': 'gzip' } });
  assert.equal(contract.status, 200);
  assert.equal(contract.headers.get('content-encoding'), 'gzip');
  assert.ok((await contract.json()).paths, 'the compressed answer reads back as the document');
});
