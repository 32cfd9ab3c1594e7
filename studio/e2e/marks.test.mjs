// Marks journey: on a footage's player a creator pins a mark with the keyboard at a known moment and
// links it to a part, then accepts a spoken measurement the transcript miner suggested and sees the
// reading recorded at the cue's time.
import assert from 'node:assert/strict';
import { execFileSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { after, before, test } from 'node:test';
import { baseUrl, launchBrowser } from './browser.mjs';
import { choose, signUpThroughApi } from './support.mjs';

const screenshots = new URL('./screenshots/', import.meta.url);
mkdirSync(screenshots, { recursive: true });
const shot = (page, name) => page.screenshot({ path: new URL(`marks-${name}.png`, screenshots).pathname, fullPage: true });

const run = `${Date.now().toString(36)}${Math.floor(Math.random() * 1e4)}`;
const person = { displayName: 'Morgan Tell', email: `morgan-marks-${run}@harrow-lane.example`, password: 'journey password 2026' };

// Invented bench talk for the generated clip: a part number and a spoken measurement, plus a decoy.
const TRANSCRIPT = `WEBVTT

00:00:00.500 --> 00:00:03.000
The two of us are fitting the adapter plate today.

00:00:03.000 --> 00:00:05.500
This is plate number HL-5520 from the kit.

00:00:06.000 --> 00:00:09.000
The spigot bore measures fifteen thousandths over.
`;

/** A 12 s small test pattern made on the spot; never real footage. */
function makeClip() {
  const file = join(mkdtempSync(join(tmpdir(), 'fitwright-marks-')), 'adapter-plate-fit.mp4');
  execFileSync('ffmpeg', [
    '-v', 'error', '-y',
    '-f', 'lavfi', '-i', 'testsrc2=duration=12:size=640x360:rate=25',
    '-c:v', 'libx264', '-preset', 'ultrafast', '-pix_fmt', 'yuv420p', '-movflags', '+faststart', file,
  ]);
  return file;
}

let browser;
let context;
let page;
let clip;
let api;
const ids = {};

before(async () => {
  clip = makeClip();
  browser = await launchBrowser();
  context = await browser.newContext({ viewport: { width: 1280, height: 1000 } });
  page = await context.newPage();
  api = await signUpThroughApi(context, person);
  ids.workshopId = (await api.post('/workshops', { name: `Harrow Lane Garage ${run}`, slug: `harrow-marks-${run}` })).id;
  ids.buildId = (await api.post(`/workshops/${ids.workshopId}/builds`, { title: 'Adapter plate fit' })).id;
  const plate = await api.post(`/workshops/${ids.workshopId}/parts`, {
    partNumber: 'HL-5520',
    title: 'Adapter plate',
    category: 'plate',
    features: [{ name: 'spigot bore', kind: 'diameter', role: 'hole', nominal: '40', unit: 'mm' }],
  });
  ids.partId = plate.id;
  ids.featureId = plate.features[0].id;
});
after(async () => {
  await browser?.close();
  if (clip) rmSync(join(clip, '..'), { recursive: true, force: true });
});

test('a footage with a transcript gets suggestions; a mark is pinned with the M key and linked to a part', async () => {
  await page.goto(`${baseUrl}/workshops/${ids.workshopId}/builds/${ids.buildId}`);
  await page.locator('[data-testid="footage-dropzone"] input[type=file]').setInputFiles(clip);
  const card = page.getByTestId('footage-card').filter({ hasText: 'adapter-plate-fit' });
  await card.locator('[data-state="ready"]').waitFor({ timeout: 60_000 });
  await card.getByRole('link', { name: 'adapter-plate-fit', exact: true }).click();
  await page.waitForURL(/\/footage\/[0-9a-f-]{36}/);
  ids.footageId = page.url().match(/footage\/([0-9a-f-]{36})/)[1];
  await api.put(`/workshops/${ids.workshopId}/footage/${ids.footageId}/transcript`, { text: TRANSCRIPT });
  await page.reload();

  const video = page.getByTestId('footage-video');
  await video.waitFor();
  await page.waitForFunction(() => document.querySelector('[data-testid="footage-video"]')?.readyState >= 1);
  // The miner runs as a job; the panel shows its findings once they are stored.
  const suggestions = page.getByTestId('suggestions');
  for (let attempt = 0; (await suggestions.getByTestId('suggestion-row').count()) < 2; attempt += 1) {
    assert.ok(attempt < 30, 'the suggestions arrive');
    await page.waitForTimeout(500);
    await page.reload();
    await suggestions.waitFor();
  }
  assert.equal(await suggestions.getByText('“HL-5520”').count(), 1);
  assert.equal(await suggestions.getByText('“fifteen thousandths”').count(), 1);
  assert.equal(await suggestions.getByText(/two of us/).count(), 0);

  // Put the player at 4.2 s, then pin with the keyboard.
  await video.evaluate((element) => {
    element.muted = true;
    element.currentTime = 4.2;
  });
  await page.waitForFunction(() => {
    const element = document.querySelector('[data-testid="footage-video"]');
    return Math.abs(element.currentTime - 4.2) < 0.01 && !element.seeking;
  });
  await page.locator('body').click({ position: { x: 5, y: 5 } });
  await page.keyboard.press('m');
  const form = page.getByRole('dialog', { name: 'New mark at 0:04.2' });
  await form.waitFor();
  await choose(form, 'Kind', 'Part');
  await choose(form, 'Part shown', 'HL-5520 — Adapter plate');
  await form.getByLabel('Label').fill('Plate number on the box');
  await shot(page, '01-pin-form');
  await form.getByRole('button', { name: 'Save mark' }).click();
  await form.waitFor({ state: 'hidden' });

  const row = page.getByTestId('mark-row').filter({ hasText: 'Plate number on the box' });
  await row.waitFor();
  assert.match(await row.textContent(), /0:04\.2.*Part/);
  await page.getByTestId('marks-timeline').getByRole('button', { name: 'Part at 0:04.2: Plate number on the box' }).waitFor();
  const marks = await api.get(`/workshops/${ids.workshopId}/footage/${ids.footageId}/marks`);
  assert.deepEqual(
    marks.map(({ startMs, kind, partId, label }) => ({ startMs, kind, partId, label })),
    [{ startMs: 4200, kind: 'part', partId: ids.partId, label: 'Plate number on the box' }],
  );

  // The key list.
  await page.keyboard.press('?');
  await page.getByRole('dialog', { name: 'Marking keys' }).getByText('Pin a mark at the playing moment').waitFor();
  await shot(page, '02-keys');
  await page.keyboard.press('Escape');
});

test('accepting a spoken measurement records the reading at the cue time', async () => {
  const suggestion = page.getByTestId('suggestion-row').filter({ hasText: 'fifteen thousandths' });
  await suggestion.getByRole('button', { name: 'Accept' }).click();
  const dialog = page.getByRole('dialog', { name: 'Record the spoken reading' });
  await dialog.waitFor();
  assert.equal(await dialog.getByLabel('Value').inputValue(), '0.015');
  assert.equal(await dialog.getByLabel('Unit').inputValue(), 'in');
  await choose(dialog, 'Feature measured', 'HL-5520 — spigot bore');
  await shot(page, '03-accept-reading');
  await dialog.getByRole('button', { name: 'Record reading' }).click();
  await dialog.waitFor({ state: 'hidden' });

  const row = page.getByTestId('mark-row').filter({ hasText: 'fifteen thousandths' });
  await row.waitFor();
  assert.match(await row.textContent(), /0:06\.0.*Measurement/);
  await page.getByTestId('marks-timeline').getByRole('button', { name: /Measurement at 0:06\.0/ }).waitFor();
  assert.equal(await page.getByTestId('suggestion-row').filter({ hasText: 'fifteen thousandths' }).count(), 0);

  const { measurements } = await api.get(`/workshops/${ids.workshopId}/measurements?featureId=${ids.featureId}`);
  assert.equal(measurements.length, 1);
  assert.equal(measurements[0].value, '0.015');
  assert.equal(measurements[0].unit, 'in');
  assert.equal(measurements[0].footageId, ids.footageId);
  assert.equal(measurements[0].footageTimeMs, 6000);
  await page.getByTestId('marks-timeline').scrollIntoViewIfNeeded();
  await shot(page, '04-marked');
});
