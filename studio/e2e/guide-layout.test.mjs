// Follow-along layout journey: a guide with every safety topic, a step caution, eight steps and a checklist with
// a moment and a photo as evidence. On a 1440×900 desktop and a 390×844 phone the whole video is on the first
// screen after compact cautions (still before any step); on the phone the video stays at the top with the
// playing step under it; the evidence says which moment and opens the photo; printed by Chromium to PDF, the
// "Steps" heading never ends a page without step 1, whatever comes above it; axe-core finds no contrast failure.
import assert from 'node:assert/strict';
import { execFileSync } from 'node:child_process';
import { mkdirSync, readFileSync, rmSync } from 'node:fs';
import { createRequire } from 'node:module';
import { join } from 'node:path';
import { after, before, test } from 'node:test';
import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';
import { baseUrl, launchBrowser } from './browser.mjs';
import { apiClient, makeClip, signUpThroughApi, uploadClip } from './support.mjs';

const screenshots = new URL('./screenshots/', import.meta.url);
mkdirSync(screenshots, { recursive: true });
const shot = (page, name, { fullPage = false } = {}) =>
  page.screenshot({ path: new URL(`guide-layout-${name}.png`, screenshots).pathname, fullPage });

const axeSource = readFileSync(createRequire(import.meta.url).resolve('axe-core/axe.min.js'), 'utf8');

const run = `${Date.now().toString(36)}${Math.floor(Math.random() * 1e4)}`;
const person = { displayName: 'Ash Penrose', email: `ash-layout-${run}@harrow-lane.example`, password: 'journey password 2026' };
const title = `Coupler swap, long form ${run}`;

const TRANSCRIPT = `WEBVTT

00:00:00.500 --> 00:00:03.000
Cab up on stands before anything else.

00:00:03.000 --> 00:00:05.500
Isolate the pack and prove it dead.

00:00:06.000 --> 00:00:09.000
The coupler slides onto the twenty-one tooth spline.
`;

const STEP_TITLES = [
  'Lift the cab onto stands',
  'Isolate the traction pack',
  'Unbolt the old flywheel',
  'Clean the motor shaft',
  'Slide the coupler on',
  'Fit the adapter plate',
  'Offer up the gearbox',
  'Torque the bell housing bolts',
];

let browser;
let clip;
const ids = {};
const guidePath = () => `/guides/${ids.workshopSlug}/${ids.guideSlug}`;

before(async () => {
  clip = makeClip();
  browser = await launchBrowser();
  const creator = await browser.newContext();
  const api = await signUpThroughApi(creator, person);
  const workshop = await api.post('/workshops', { name: `Harrow Lane Garage ${run}`, slug: `harrow-layout-${run}` });
  const w = `/workshops/${workshop.id}`;
  ids.workshopSlug = workshop.slug;
  const build = await api.post(`${w}/builds`, { title: 'Motor-to-gearbox coupler', vehicle: '1980s compact pickup, electric conversion' });
  const footageId = await uploadClip(api, workshop.id, build.id, clip);
  await api.put(`${w}/footage/${footageId}/transcript`, { text: TRANSCRIPT });

  const coupler = await api.post(`${w}/parts`, { partNumber: 'HL-2107', maker: 'Brackwater Drive', title: 'Coupler, 21-tooth', category: 'coupler' });
  const assembly = await api.post(`${w}/builds/${build.id}/assemblies`, { name: '21-tooth coupler' });
  await api.put(`${w}/assemblies/${assembly.id}/parts/${coupler.id}`, { position: 'motor side' });
  const check = await api.post(`${w}/assemblies/${assembly.id}/checks`, { title: 'Coupler slides onto the motor shaft', required: true });
  // Checks in other states, so the studio page shows more than one state glyph.
  await api.post(`${w}/assemblies/${assembly.id}/checks`, { title: 'Bell housing bolts reach full thread', required: true });
  const refused = await api.post(`${w}/assemblies/${assembly.id}/checks`, { title: '27-tooth coupler on this shaft', required: false });
  await api.post(`${w}/checks/${refused.id}/transitions`, { to: 'no_fit', reason: 'Spline counts differ' });
  ids.workshopId = workshop.id;
  ids.assemblyId = assembly.id;
  const moment = await api.post(`${w}/footage/${footageId}/marks`, { startMs: 7_400, kind: 'check_evidence', label: 'Slides on by hand', fitCheckId: check.id });
  await api.post(`${w}/checks/${check.id}/evidence`, { kind: 'mark', markId: moment.id });
  const photo = await creator.request.fetch(`${baseUrl}/api${w}/checks/${check.id}/photos`, {
    method: 'POST',
    headers: { 'X-CSRF-Token': (await creator.cookies(baseUrl)).find((cookie) => cookie.name === 'fw_csrf').value },
    multipart: { photo: { name: 'coupler-on-shaft.png', mimeType: 'image/png', buffer: testPhoto() }, note: 'Coupler seated on the shaft' },
  });
  assert.ok(photo.ok(), `photo evidence: ${photo.status()} ${await photo.text()}`);
  await api.post(`${w}/checks/${check.id}/transitions`, { to: 'confirmed', reason: 'Test-fitted on the vehicle' });

  const guide = await api.post(`${w}/builds/${build.id}/guides`, {
    assemblyId: assembly.id,
    title,
    summary: '<p>Couple the motor to the original gearbox without re-machining.</p>',
    footageId,
    safetyTopics: ['lifting', 'rotating_parts', 'high_voltage', 'welding', 'pressing'],
    tools: ['Trolley jack', 'Axle stands'],
    consumables: ['Thread locker, medium strength'],
  });
  ids.guideSlug = guide.slug;
  for (const [index, stepTitle] of STEP_TITLES.entries()) {
    await api.post(`${w}/guides/${guide.id}/steps`, {
      title: stepTitle,
      body: `<p>${stepTitle}: do it as the video shows, then check it twice before the next step.</p>`,
      footageId,
      startMs: 500 + index * 1_400,
      ...(index === 4 ? { caution: { level: 'CAUTION', text: 'The coupler edge is sharp; wear gloves.' } } : {}),
    });
  }
  await api.post(`${w}/guides/${guide.id}/revisions`, { note: 'First edition' });
  await creator.close();
});

after(async () => {
  await browser?.close();
  if (clip) rmSync(join(clip, '..'), { recursive: true, force: true });
});

/** A small grey PNG made with ffmpeg: an invented "photo" of the test fit. */
function testPhoto() {
  const file = join(clip, '..', 'photo.png');
  // makeClip's folder is ours; the photo goes beside the clip and is removed with it.
  execFileSync('ffmpeg', ['-v', 'error', '-y', '-f', 'lavfi', '-i', 'testsrc2=size=480x320', '-frames:v', '1', file]);
  return readFileSync(file);
}

async function openGuide(context) {
  const page = await context.newPage();
  await page.goto(`${baseUrl}${guidePath()}`);
  await page.getByRole('heading', { level: 1, name: title }).waitFor();
  await page
    .waitForFunction(() => document.querySelector('[data-testid="guide-video"]')?.readyState >= 1, null, { timeout: 15_000 })
    .catch(() => assert.fail('the video loads through its redirect to storage'));
  return page;
}

/** Every caution comes before the first step in reading order. */
async function cautionsBeforeSteps(page) {
  return page.evaluate(() => {
    const cautions = [...document.querySelectorAll('[data-testid="cautions-block"] [data-testid="caution"]')];
    const firstStep = document.querySelector('[data-testid="guide-step"]');
    return cautions.length > 0 && cautions.every((caution) => caution.compareDocumentPosition(firstStep) & Node.DOCUMENT_POSITION_FOLLOWING);
  });
}

test('on a 1440×900 desktop the whole video is on the first screen, after compact cautions', async () => {
  const context = await browser.newContext({ viewport: { width: 1440, height: 900 } });
  const page = await openGuide(context);
  const video = await page.getByTestId('guide-video').boundingBox();
  await shot(page, '00-desktop-as-loaded');
  assert.ok(video.y >= 0 && video.y + video.height <= 900, `video from ${video.y} to ${video.y + video.height} px`);
  assert.ok(await cautionsBeforeSteps(page), 'every caution comes before step 1');

  // One caution in full (the most severe), the others folded to their signal word and topic, opened on demand.
  const cautions = page.getByTestId('cautions-block').getByTestId('caution');
  const levels = await cautions.evaluateAll((panels) => panels.map((panel) => `${panel.tagName} ${panel.dataset.level}`));
  assert.equal(levels[0], 'SECTION DANGER');
  assert.ok(levels.slice(1).every((level) => level.startsWith('DETAILS ')), levels.join(', '));
  assert.ok(levels.length >= 6, `five topics and the step caution: ${levels}`);
  const folded = cautions.nth(1);
  const text = folded.locator('p');
  assert.equal(await text.isVisible(), false);
  await folded.locator('summary').click();
  assert.ok(await text.isVisible(), 'a folded caution opens');
  await shot(page, '01-desktop-first-screen');
  await folded.locator('summary').click();

  // The steps sit beside the video, and a step's time plays it.
  const steps = await page.getByTestId('guide-steps').boundingBox();
  assert.ok(steps.x >= video.x + video.width, 'steps beside the video');
  await context.close();
});

test('on a 390×844 phone the video is on the first screen and stays at the top with the playing step under it', async () => {
  const context = await browser.newContext({ viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true, deviceScaleFactor: 2 });
  const page = await openGuide(context);
  const video = page.getByTestId('guide-video');
  const first = await video.boundingBox();
  assert.ok(first.y >= 0 && first.y + first.height <= 844, `video from ${first.y} to ${first.y + first.height} px`);
  assert.ok(await cautionsBeforeSteps(page), 'every caution comes before step 1');
  const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
  assert.equal(overflow, 0, 'no sideways scrolling');
  await shot(page, '02-phone-first-screen');

  // Play step 6 from its time: the page scrolls down to it, yet the video stays at the top and the step is under it.
  await video.evaluate((element) => {
    element.muted = true;
  });
  await page.getByRole('button', { name: 'Play step 6 from 0:07' }).click();
  await page.waitForFunction(() => document.querySelector('[data-testid="guide-video"]').currentTime >= 7.5);
  await video.evaluate((element) => element.pause());
  await page.getByTestId('now-playing').filter({ hasText: 'Fit the adapter plate' }).waitFor();
  await page.evaluate(() => window.scrollTo(0, document.querySelector('[data-testid="guide-transcript"]').getBoundingClientRect().top + window.scrollY - 400));
  assert.ok(await page.evaluate(() => window.scrollY) > 600, 'the page has scrolled');
  const player = await page.getByTestId('guide-player').boundingBox();
  const stuck = await video.boundingBox();
  const now = await page.getByTestId('now-playing').boundingBox();
  assert.ok(player.y >= 55 && player.y < 60, `the video stays under the header (at ${player.y} px)`);
  assert.ok(stuck.y >= player.y && stuck.y + stuck.height <= 844 / 2, `the video keeps to the top half (${stuck.y}–${stuck.y + stuck.height} px)`);
  assert.ok(now.y >= stuck.y + stuck.height && now.y + now.height <= player.y + player.height, 'the playing step is under the video, in the part that stays');
  assert.ok(now.y - (stuck.y + stuck.height) < 80, `the playing step is directly under the video (${now.y - stuck.y - stuck.height} px below)`);
  assert.match(await page.getByTestId('now-playing').textContent(), /^Step 6 of 8 · from 0:07/);
  await shot(page, '03-phone-sticky-video');
  await context.close();
});

test('evidence says which moment and seeks the video; a photo opens full size', async () => {
  const context = await browser.newContext({ viewport: { width: 1440, height: 900 } });
  const page = await openGuide(context);
  const row = page.getByTestId('guide-check').filter({ hasText: 'Coupler slides onto the motor shaft' });
  // The evidence link seeks and plays. Playing is held back here (play() does nothing), so the position read is
  // where the link put the video, not where playback had carried it by the time a loaded machine looked.
  await page.getByTestId('guide-video').evaluate((video) => {
    video.pause();
    video.play = () => Promise.resolve();
  });
  await row.getByRole('button', { name: 'Watch the evidence at 0:07: Slides on by hand' }).click();
  await page
    .waitForFunction(() => Math.abs(document.querySelector('[data-testid="guide-video"]').currentTime - 7.4) < 0.05, null, { timeout: 10_000 })
    .catch(async () => assert.fail(`the video is at the evidence moment (at ${await page.getByTestId('guide-video').evaluate((video) => video.currentTime)} s)`));
  await page.getByTestId('guide-video').evaluate((element) => element.pause());
  const thumbnail = row.getByRole('button', { name: 'Open the photo full size: Coupler seated on the shaft' });
  const image = thumbnail.locator('img');
  assert.ok(await image.evaluate((element) => element.decode().then(() => element.naturalWidth > 0, () => false)), 'the thumbnail loads');
  await thumbnail.click();
  const dialog = page.getByRole('dialog', { name: 'Coupler seated on the shaft' });
  await dialog.waitFor();
  const full = dialog.locator('img');
  assert.ok(await full.evaluate((element) => element.decode().then(() => element.naturalWidth === 480, () => false)), 'the photo at full size');
  await shot(page, '04-evidence-photo');
  await page.keyboard.press('Escape');
  await dialog.waitFor({ state: 'hidden' });
  await context.close();
});

/** The text of each page of a PDF, as pdf.js extracts it. */
async function pdfPages(bytes) {
  const document = await getDocument({ data: new Uint8Array(bytes), useSystemFonts: true }).promise;
  const pages = [];
  for (let number = 1; number <= document.numPages; number += 1) {
    const content = await (await document.getPage(number)).getTextContent();
    pages.push(content.items.map((item) => item.str).filter((text) => text.trim() !== ''));
  }
  await document.destroy();
  return pages;
}

test('printed to PDF, "Steps" never ends a page without step 1, wherever the page breaks', async () => {
  const context = await browser.newContext({ viewport: { width: 1440, height: 900 } });
  const page = await openGuide(context);
  // A scrolled steps panel on screen must not cut step 1 off on paper.
  await page.locator('[data-testid="guide-steps"] ol').evaluate((list) => list.scrollTo(0, list.scrollHeight));
  // Push the steps down the page in small increments so that, in some run, a page break falls right after the heading.
  const spacer = await page.evaluateHandle(() => {
    const element = document.createElement('div');
    element.dataset.testSpacer = '';
    document.querySelector('[data-testid="guide-steps"]').closest('[data-guide-document] > *').before(element);
    return element;
  });
  let headingNearFoot = 0;
  for (let height = 0; height <= 1140; height += 60) {
    await spacer.evaluate((element, px) => {
      element.style.height = `${px}px`;
    }, height);
    const pages = await pdfPages(await page.pdf({ format: 'A4', printBackground: true }));
    const headingPage = pages.findIndex((lines) => lines.includes('Steps'));
    assert.ok(headingPage >= 0, `the Steps heading is printed (spacer ${height} px)`);
    const lines = pages[headingPage];
    const after = lines.slice(lines.indexOf('Steps') + 1).join(' ');
    assert.match(after, /Lift the cab onto stands/, `step 1 is on the page of its heading (spacer ${height} px): ${lines.slice(-4).join(' | ')}`);
    if (headingPage > 0 && pages[headingPage][0] === 'Steps') headingNearFoot += 1;
    if (height === 0) {
      // Everything on paper: all eight steps, every caution's text, no video controls.
      const all = pages.flat().join(' ');
      for (const stepTitle of STEP_TITLES) assert.ok(all.includes(stepTitle), `${stepTitle} is printed`);
      assert.ok(all.includes('wear gloves'), 'the folded step caution prints open');
      assert.equal(all.includes('Press play'), false);
    }
  }
  // Somewhere in the sweep the heading was pushed to the top of a new page rather than left at the foot of one.
  assert.ok(headingNearFoot > 0, 'a page break fell at the heading in at least one run, and the heading moved on with its step');
  await context.close();
});

/** axe-core's colour-contrast rule on the page as it is now: the failures, each with its element and numbers. */
async function contrastFailures(page) {
  await page.addScriptTag({ content: axeSource });
  const result = await page.evaluate(() => window.axe.run(document, { runOnly: { type: 'rule', values: ['color-contrast'] } }));
  assert.ok(result.passes.length > 0, 'axe checked something');
  return result.violations.flatMap((violation) => violation.nodes.map((node) => `${node.target.join(' ')}: ${node.failureSummary}`));
}

test('axe-core finds no colour-contrast failure on the studio’s assembly page with its check-state glyphs', async () => {
  const context = await browser.newContext({ viewport: { width: 1440, height: 900 }, bypassCSP: true });
  const api = apiClient(context);
  await context.request.get(`${baseUrl}/api/auth/me`);
  await api.post('/auth/login', { email: person.email, password: person.password });
  const page = await context.newPage();
  await page.goto(`${baseUrl}/workshops/${ids.workshopId}/assemblies/${ids.assemblyId}`);
  await page.getByText('27-tooth coupler on this shaft').first().waitFor();
  const glyphs = await page.locator('svg[data-icon]').evaluateAll((icons) => [...new Set(icons.map((icon) => icon.dataset.icon))].sort());
  assert.ok(glyphs.includes('confirmed') && glyphs.includes('open') && glyphs.includes('no_fit'), `state glyphs on the page: ${glyphs}`);
  await shot(page, '05-assembly-glyphs', { fullPage: true });
  assert.deepEqual(await contrastFailures(page), [], 'contrast failures on the assembly page');
  await context.close();
});

test('axe-core finds no colour-contrast failure on the guide (desktop and phone)', async () => {
  for (const viewport of [{ width: 1440, height: 900 }, { width: 390, height: 844 }]) {
    // The page's policy allows no inline script; the test injects axe-core as a tool, not as the page's code.
    const context = await browser.newContext({ viewport, bypassCSP: true });
    const page = await openGuide(context);
    await page.evaluate(() => document.querySelectorAll('[data-testid="caution"]').forEach((element) => element.setAttribute('open', '')));
    assert.deepEqual(await contrastFailures(page), [], `contrast failures at ${viewport.width}px`);
    await context.close();
  }
});
