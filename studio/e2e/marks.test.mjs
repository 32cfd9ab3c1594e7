// Marks journey: on a footage's player a creator pins a mark with the keyboard at a known moment and
// links it to a part, then accepts a spoken measurement the transcript miner suggested and sees the
// reading recorded at the cue's time; pins a mark that evidences a fit check and follows its link;
// and, pinned where another measurement is spoken, records that reading from the mark form itself.
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

00:00:09.500 --> 00:00:11.500
The register spigot mikes at one point five seven four inch.
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

/** Puts the player at `seconds` and pins a mark there with the M key; returns the mark form. */
async function pinWithKeyAt(seconds, formTitle) {
  const video = page.getByTestId('footage-video');
  await video.evaluate((element, at) => {
    element.muted = true;
    element.currentTime = at;
  }, seconds);
  await page.waitForFunction((at) => {
    const element = document.querySelector('[data-testid="footage-video"]');
    return Math.abs(element.currentTime - at) < 0.01 && !element.seeking;
  }, seconds);
  await page.locator('body').click({ position: { x: 5, y: 5 } });
  await page.keyboard.press('m');
  const form = page.getByRole('dialog', { name: formTitle });
  await form.waitFor();
  return form;
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
    features: [
      { name: 'spigot bore', kind: 'diameter', role: 'hole', nominal: '40', unit: 'mm' },
      { name: 'spigot register', kind: 'diameter', role: 'shaft', nominal: '40', unit: 'mm' },
    ],
  });
  ids.partId = plate.id;
  ids.featureId = plate.features.find((feature) => feature.name === 'spigot bore').id;
  ids.registerId = plate.features.find((feature) => feature.name === 'spigot register').id;
  // An assembly whose checklist has a check to evidence from the footage.
  ids.assemblyId = (await api.post(`/workshops/${ids.workshopId}/builds/${ids.buildId}/assemblies`, { name: 'Plate on bell housing' })).id;
  ids.checkId = (await api.post(`/workshops/${ids.workshopId}/assemblies/${ids.assemblyId}/checks`, { title: 'Spigot seats in the bell housing' })).id;
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

test('a mark evidences a fit check, named in the list and linked to its checklist', async () => {
  const form = await pinWithKeyAt(2, 'New mark at 0:02.0');
  await choose(form, 'Kind', 'Check evidence');
  await choose(form, 'Fit check it evidences', 'Spigot seats in the bell housing · open');
  await form.getByLabel('Label').fill('Plate seated on the bell housing');
  await shot(page, '05-check-evidence-form');
  await form.getByRole('button', { name: 'Save mark' }).click();
  await form.waitFor({ state: 'hidden' });

  const row = page.getByTestId('mark-row').filter({ hasText: 'Plate seated on the bell housing' });
  await row.waitFor();
  assert.match(await row.textContent(), /0:02\.0.*Check evidence.*Spigot seats in the bell housing/);
  const marks = await api.get(`/workshops/${ids.workshopId}/footage/${ids.footageId}/marks`);
  assert.deepEqual(
    marks.filter((mark) => mark.kind === 'check_evidence').map(({ startMs, fitCheckId, partId, measurementId }) => ({ startMs, fitCheckId, partId, measurementId })),
    [{ startMs: 2000, fitCheckId: ids.checkId, partId: null, measurementId: null }],
  );
  // The part mark of the first test names its part number too.
  await page.getByTestId('mark-row').filter({ hasText: 'Plate number on the box' }).getByRole('link', { name: '→ HL-5520' }).waitFor();

  await row.getByRole('link', { name: '→ Spigot seats in the bell housing' }).click();
  await page.waitForURL(new RegExp(`/workshops/${ids.workshopId}/assemblies/${ids.assemblyId}$`));
  await page.getByTestId('check-card').filter({ hasText: 'Spigot seats in the bell housing' }).waitFor();
  await shot(page, '06-followed-to-checklist');
  await page.goBack();
  await page.getByTestId('footage-video').waitFor();
  await page.waitForFunction(() => document.querySelector('[data-testid="footage-video"]')?.readyState >= 1);
});

test('pinned where a measurement is spoken, the reading is recorded from the mark form at the mark’s time', async () => {
  const form = await pinWithKeyAt(10.2, 'New mark at 0:10.2');
  // The transcript says "one point five seven four inch" here: a new reading is offered, filled in.
  assert.equal(await form.getByLabel('Kind', { exact: true }).inputValue(), 'Measurement');
  const reading = form.getByTestId('new-reading');
  await reading.getByText('Heard here: “one point five seven four inch”', { exact: false }).waitFor();
  // Required fields' labels end in an asterisk, hence the patterns.
  assert.equal(await reading.getByLabel(/^Reading/).inputValue(), '1.574');
  assert.equal(await reading.getByLabel(/^Unit/).inputValue(), 'in');
  await reading.getByLabel(/^Measured/).click();
  await page.getByRole('option', { name: 'HL-5520 — spigot register', exact: true }).click();
  await choose(reading, 'Instrument', 'Outside micrometer');
  assert.equal(await reading.getByLabel(/^Quantity/).inputValue(), 'Diameter');
  await form.getByLabel('Label').fill('Register spigot miked');
  await shot(page, '07-inline-reading-form');
  await form.getByRole('button', { name: 'Record reading and save mark' }).click();
  await form.waitFor({ state: 'hidden' });

  const row = page.getByTestId('mark-row').filter({ hasText: 'Register spigot miked' });
  await row.getByRole('link', { name: '→ 1.574 in' }).waitFor();
  assert.match(await row.textContent(), /0:10\.2.*Measurement/);
  // The suggestion heard there is settled: it cannot be accepted into a second reading.
  await page.getByTestId('suggestion-row').filter({ hasText: 'one point five seven four' }).waitFor({ state: 'detached' });

  const { measurements } = await api.get(`/workshops/${ids.workshopId}/measurements?featureId=${ids.registerId}`);
  assert.deepEqual(
    measurements.map(({ value, unit, quantity, footageId, footageTimeMs, instrument }) => ({
      value,
      unit,
      quantity,
      footageId,
      footageTimeMs,
      instrument: instrument.kind,
      resolution: instrument.resolution,
    })),
    [{ value: '1.574', unit: 'in', quantity: 'diameter', footageId: ids.footageId, footageTimeMs: 10200, instrument: 'outside_micrometer', resolution: '0.001' }],
  );
  const marks = await api.get(`/workshops/${ids.workshopId}/footage/${ids.footageId}/marks`);
  const mark = marks.find((item) => item.label === 'Register spigot miked');
  assert.deepEqual({ kind: mark.kind, startMs: mark.startMs, measurementId: mark.measurementId }, { kind: 'measurement', startMs: 10200, measurementId: measurements[0].id });
  await page.getByTestId('marks-list').scrollIntoViewIfNeeded();
  await shot(page, '08-marks-with-links');
});
