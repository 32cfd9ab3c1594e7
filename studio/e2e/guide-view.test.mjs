// Guide view journey: a creator publishes a guide through the API (workshop, build, a generated clip with its
// transcript, two steps anchored at times); then a signed-out reader finds it on /guides, follows it beside the
// video (a step's time seeks the video and the step lights up), searches the transcript, prints it, and reads it
// on a phone.
import assert from 'node:assert/strict';
import { mkdirSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { after, before, test } from 'node:test';
import { baseUrl, launchBrowser } from './browser.mjs';
import { makeClip, signUpThroughApi, uploadClip } from './support.mjs';

const screenshots = new URL('./screenshots/', import.meta.url);
mkdirSync(screenshots, { recursive: true });
const shot = (page, name, { fullPage = true } = {}) =>
  page.screenshot({ path: new URL(`guide-view-${name}.png`, screenshots).pathname, fullPage });

const run = `${Date.now().toString(36)}${Math.floor(Math.random() * 1e4)}`;
const person = { displayName: 'Ash Penrose', email: `ash-guide-${run}@harrow-lane.example`, password: 'journey password 2026' };
const title = `Fitting the coupler ${run}`;

// Invented bench talk for the generated clip.
const TRANSCRIPT = `WEBVTT

00:00:00.500 --> 00:00:03.000
Cab up on stands before anything else.

00:00:03.000 --> 00:00:05.500
Isolate the pack and prove it dead.

00:00:06.000 --> 00:00:09.000
The coupler slides onto the twenty-one tooth spline.

00:00:09.500 --> 00:00:11.500
Spigot bore reads fifteen thousandths over.
`;

let browser;
let clip;
const ids = {};

before(async () => {
  clip = makeClip();
  browser = await launchBrowser();
  const creator = await browser.newContext();
  const api = await signUpThroughApi(creator, person);
  const workshop = await api.post('/workshops', { name: `Harrow Lane Garage ${run}`, slug: `harrow-guide-${run}` });
  ids.workshopId = workshop.id;
  ids.workshopSlug = workshop.slug;
  ids.buildId = (await api.post(`/workshops/${ids.workshopId}/builds`, { title: 'Motor-to-gearbox coupler', vehicle: '1980s compact pickup, electric conversion' })).id;
  ids.footageId = await uploadClip(api, ids.workshopId, ids.buildId, clip);
  await api.put(`/workshops/${ids.workshopId}/footage/${ids.footageId}/transcript`, { text: TRANSCRIPT });

  // The assembly the guide follows: two parts and a check confirmed with a moment of the video as evidence.
  const w = `/workshops/${ids.workshopId}`;
  const coupler = await api.post(`${w}/parts`, { partNumber: 'HL-2107', maker: 'Brackwater Drive', title: 'Coupler, 21-tooth', category: 'coupler' });
  const plate = await api.post(`${w}/parts`, { partNumber: 'HL-5520', maker: 'Harrow Lane', title: 'Adapter plate', category: 'plate' });
  const assembly = await api.post(`${w}/builds/${ids.buildId}/assemblies`, { name: '21-tooth coupler' });
  await api.put(`${w}/assemblies/${assembly.id}/parts/${coupler.id}`, { position: 'motor side' });
  await api.put(`${w}/assemblies/${assembly.id}/parts/${plate.id}`, { position: 'between motor and bell housing' });
  const check = await api.post(`${w}/assemblies/${assembly.id}/checks`, { title: 'Coupler slides onto the motor shaft', required: true });
  const evidence = await api.post(`${w}/footage/${ids.footageId}/marks`, {
    startMs: 9800,
    kind: 'check_evidence',
    label: 'Slides on by hand',
    fitCheckId: check.id,
  });
  await api.post(`${w}/checks/${check.id}/evidence`, { kind: 'mark', markId: evidence.id });
  await api.post(`${w}/checks/${check.id}/transitions`, { to: 'confirmed', reason: 'Test-fitted on the vehicle' });

  const guide = await api.post(`/workshops/${ids.workshopId}/builds/${ids.buildId}/guides`, {
    assemblyId: assembly.id,
    title,
    summary: '<p>Couple the motor to the original gearbox <strong>without re-machining</strong>.</p>',
    footageId: ids.footageId,
    safetyTopics: ['lifting', 'high_voltage'],
    tools: ['Trolley jack', 'Axle stands', 'Micrometer 0–25 mm'],
    consumables: ['Thread locker, medium strength'],
  });
  ids.guideId = guide.id;
  ids.guideSlug = guide.slug;
  const steps = `/workshops/${ids.workshopId}/guides/${ids.guideId}/steps`;
  await api.post(steps, { title: 'Lift the cab and isolate the pack', body: '<p>Stands at the marked points.</p>', footageId: ids.footageId, startMs: 500 });
  const second = await api.post(steps, {
    title: 'Slide the coupler on',
    body: '<p>It should slide on <em>by hand</em>.</p>',
    footageId: ids.footageId,
    startMs: 6000,
    caution: { level: 'CAUTION', text: 'The coupler edge is sharp; wear gloves.' },
  });
  await api.post(`/workshops/${ids.workshopId}/footage/${ids.footageId}/marks`, {
    startMs: 7200,
    kind: 'step',
    label: 'Splines engage',
    guideStepId: second.id,
  });
  await api.post(`/workshops/${ids.workshopId}/guides/${ids.guideId}/revisions`, { note: 'First edition' });
  await creator.close();
});
after(async () => {
  await browser?.close();
  if (clip) rmSync(join(clip, '..'), { recursive: true, force: true });
});

test('a signed-out reader finds the guide, follows it beside the video, searches the transcript and prints it', async () => {
  const reader = await browser.newContext({ viewport: { width: 1366, height: 900 } });
  const page = await reader.newPage();
  assert.deepEqual(await reader.cookies(baseUrl).then((cookies) => cookies.filter((cookie) => cookie.name === 'fw_session')), []);

  await page.goto(`${baseUrl}/`);
  await page.getByRole('navigation', { name: 'Main navigation' }).getByRole('link', { name: 'Guides' }).click();
  await page.waitForURL(`${baseUrl}/guides`);
  await page.getByRole('heading', { level: 1, name: 'Guides' }).waitFor();
  await page.getByRole('searchbox', { name: 'Search guides', exact: true }).fill(run);
  await page.waitForURL(/\/guides\?q=/);
  await page.getByText(`1 guide matches “${run}”`).waitFor();
  const card = page.getByTestId('guide-card').filter({ hasText: title });
  assert.equal(await page.getByTestId('guide-card').count(), 1);
  assert.match(await card.textContent(), /Harrow Lane Garage .*Build: Motor-to-gearbox coupler.*Revision 1 · .* · 2 steps/);
  // The poster is an API address that redirects to storage: the page's security policy must let it through.
  const posterLoads = await card.locator('img').evaluate((image) => image.decode().then(() => true, () => false));
  assert.ok(posterLoads, 'the poster loads through its redirect to storage');
  await shot(page, '01-index');

  await card.getByRole('link', { name: title }).click();
  await page.waitForURL(`${baseUrl}/guides/${ids.workshopSlug}/${ids.guideSlug}`);
  await page.getByRole('heading', { level: 1, name: title }).waitFor();
  // The date is written in the reader's locale (lib/dates.ts), so the journey asks the browser how it writes today.
  const today = await page.evaluate(() => new Intl.DateTimeFormat(undefined, { dateStyle: 'medium' }).format(new Date()));
  // The revision line ends with the link to the guide's revision history.
  assert.equal(await page.getByTestId('guide-revision').textContent(), `Revision 1 · published ${today} · First edition · Revision history`);

  // Safety at the top: most severe first, each header spelling out its signal word; the disclaimer always there.
  const levels = await page.getByTestId('cautions-block').getByTestId('caution').evaluateAll((panels) => panels.map((panel) => panel.dataset.level));
  const order = ['DANGER', 'WARNING', 'CAUTION', 'NOTICE'];
  assert.ok(levels.length >= 2, `cautions shown: ${levels}`);
  assert.deepEqual(levels, [...levels].sort((a, b) => order.indexOf(a) - order.indexOf(b)));
  assert.ok(levels.includes('CAUTION'), 'the step’s own caution is listed too');
  await page.getByTestId('disclaimer').filter({ hasText: /does not replace/ }).waitFor();

  const video = page.getByTestId('guide-video');
  assert.equal(await video.locator('track').getAttribute('kind'), 'captions');
  await page.waitForFunction(() => document.querySelector('[data-testid="guide-video"]')?.readyState >= 1);
  await video.evaluate((element) => {
    element.muted = true;
  });

  // A step's time seeks the video there, and that step is highlighted as it plays.
  const steps = page.getByTestId('guide-step');
  await steps.nth(1).getByRole('button', { name: 'Play step 2 from 0:06' }).click();
  await page.waitForFunction(() => {
    const element = document.querySelector('[data-testid="guide-video"]');
    return element.currentTime >= 6 && !element.seeking;
  });
  const position = await video.evaluate((element) => {
    element.pause();
    return element.currentTime;
  });
  assert.ok(position >= 6 && position < 9, `the video is at step 2 (${position} s)`);
  await page.locator('[data-testid="guide-step"][aria-current="step"]').filter({ hasText: 'Slide the coupler on' }).waitFor();
  assert.equal(await steps.nth(0).getAttribute('aria-current'), null);
  await steps.nth(1).getByText('Playing now').waitFor();
  // The cue playing now stands out in the transcript.
  await page.locator('[data-testid="transcript-cue"][aria-current="time"]').filter({ hasText: 'twenty-one tooth spline' }).waitFor();
  await shot(page, '02-following-step-2');

  // Searching the transcript keeps the matching cues; a click plays from there.
  await page.getByRole('searchbox', { name: 'Search the transcript' }).fill('spigot');
  await page.getByTestId('transcript-count').filter({ hasText: '1 of 4 cues mention “spigot”' }).waitFor();
  const found = page.getByTestId('transcript-cue');
  // The list is virtual: its rows are drawn a frame after the count, so wait for the row before counting.
  await found.filter({ hasText: 'spigot' }).first().waitFor();
  assert.equal(await found.count(), 1);
  await found.first().click();
  await page.waitForFunction(() => {
    const element = document.querySelector('[data-testid="guide-video"]');
    return element.currentTime >= 9.5 && !element.seeking;
  });
  await video.evaluate((element) => element.pause());

  // The step's mark sits on the strip under the video and in the step.
  await page.getByRole('list', { name: 'Marks in the video' }).getByRole('button', { name: /Step 0:07\s*Splines engage/ }).click();
  await page.waitForFunction(() => Math.abs(document.querySelector('[data-testid="guide-video"]').currentTime - 7.2) < 0.6);
  await video.evaluate((element) => element.pause());
  await steps.nth(1).getByRole('list', { name: 'Marks in step 2' }).getByText('Splines engage').waitFor();
  await shot(page, '03-transcript-search', { fullPage: false });

  // The live checklist: the state in words, and its evidence plays the moment that shows it.
  const checkRow = page.getByTestId('guide-check').filter({ hasText: 'Coupler slides onto the motor shaft' });
  assert.equal(await checkRow.getByTestId('check-state').textContent(), 'Confirmed on the vehicle');
  await checkRow.getByRole('button', { name: 'Watch the evidence at 0:09: Slides on by hand' }).click();
  await page.waitForFunction(() => Math.abs(document.querySelector('[data-testid="guide-video"]').currentTime - 9.8) < 0.6);
  await video.evaluate((element) => element.pause());
  const parts = page.getByRole('table', { name: 'Parts' });
  await parts.getByRole('row').filter({ hasText: 'HL-2107' }).filter({ hasText: 'motor side' }).waitFor();
  await parts.getByRole('row').filter({ hasText: 'HL-5520' }).waitFor();

  // On paper: steps with their times, cautions and supplies; no video, transcript, navigation or buttons.
  await page.emulateMedia({ media: 'print' });
  assert.equal(await video.isVisible(), false, 'the video is not printed');
  assert.equal(await page.getByTestId('guide-transcript').isVisible(), false, 'the transcript is not printed');
  assert.equal(await page.getByRole('button', { name: 'Print' }).isVisible(), false);
  assert.equal(await page.locator('.mantine-AppShell-navbar').isVisible(), false, 'the navigation is not printed');
  assert.equal(await page.locator('.mantine-AppShell-header').isVisible(), false, 'the header is not printed');
  assert.ok(await steps.nth(1).isVisible());
  assert.match(await steps.nth(1).textContent(), /Slide the coupler on.*0:06/);
  assert.match(await steps.nth(0).textContent(), /0:00/);
  assert.ok(await page.getByTestId('cautions-block').isVisible());
  assert.ok(await page.getByTestId('guide-supplies').isVisible());
  assert.ok(await page.getByTestId('guide-checklist').isVisible());
  assert.ok(await parts.isVisible());
  await shot(page, '04-print');
  await page.emulateMedia({ media: 'screen' });
  assert.ok(await video.isVisible());
  await reader.close();
});

test('on a phone the steps come under the video', async () => {
  const phone = await browser.newContext({ viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true, deviceScaleFactor: 2 });
  const page = await phone.newPage();
  await page.goto(`${baseUrl}/guides/${ids.workshopSlug}/${ids.guideSlug}`);
  await page.getByRole('heading', { level: 1, name: title }).waitFor();
  await page
    .waitForFunction(() => document.querySelector('[data-testid="guide-video"]')?.readyState >= 1, null, { timeout: 15_000 })
    .catch(() => assert.fail('the video loads through its redirect to storage'));
  const video = await page.getByTestId('guide-video').boundingBox();
  const steps = await page.getByTestId('guide-steps').boundingBox();
  const transcript = await page.getByTestId('guide-transcript').boundingBox();
  assert.ok(video.width <= 390 && steps.width <= 390, 'nothing overflows the phone’s width');
  assert.ok(steps.y > video.y + video.height - 1, 'steps under the video');
  assert.ok(transcript.y > steps.y, 'transcript after the steps');
  const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
  assert.equal(overflow, 0, 'no sideways scrolling');
  await shot(page, '05-phone');
  await phone.close();
});

test('a guide that is not published says so', async () => {
  const reader = await browser.newContext();
  const page = await reader.newPage();
  await page.goto(`${baseUrl}/guides/${ids.workshopSlug}/no-such-guide`);
  await page.getByRole('heading', { level: 1, name: 'This guide is not published' }).waitFor();
  await page.getByRole('link', { name: 'Browse published guides' }).waitFor();
  await shot(page, '06-not-published');
  await reader.close();
});
