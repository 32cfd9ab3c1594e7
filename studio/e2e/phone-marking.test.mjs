// Marking on a phone (390×844): mark labels wrap by words (never a letter a line), every suggestion's time
// reads in full, and the kind filter scrolls sideways instead of squeezing its words. Screenshots of the marks
// list and the suggestions go to e2e/screenshots/ (and docs/screenshots/ with FW_SCREENSHOTS_DIR).
import assert from 'node:assert/strict';
import { copyFileSync, mkdirSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { after, before, test } from 'node:test';
import { baseUrl, launchBrowser } from './browser.mjs';
import { makeClip, signUpThroughApi, uploadClip } from './support.mjs';

const screenshots = new URL('./screenshots/', import.meta.url);
mkdirSync(screenshots, { recursive: true });
async function shot(target, name) {
  const path = new URL(`${name}.png`, screenshots).pathname;
  await target.screenshot({ path });
  if (process.env.FW_SCREENSHOTS_DIR) copyFileSync(path, join(process.env.FW_SCREENSHOTS_DIR, `${name}.png`));
}

const run = `${Date.now().toString(36)}${Math.floor(Math.random() * 1e4)}`;
const person = { displayName: 'Ada Brasher', email: `ada-phone-${run}@harrow-lane.example`, password: 'journey password 2026' };
const PHONE = { width: 390, height: 844 };

// Invented bench talk: a part number and two spoken measurements, so the suggestions panel has rows.
const TRANSCRIPT = `WEBVTT

00:00:01.000 --> 00:00:03.500
This is flange number HL-7731 from the kit.

00:00:04.000 --> 00:00:07.000
The pilot bore measures fifteen point zero one millimetres.

00:00:08.000 --> 00:00:11.000
The register spigot mikes at one point five seven four inch.
`;

const LONG_LABEL = 'Flange seated square against the gearbox face before the bolts go in';

let browser;
let clip;
let api;
const ids = {};

before(async () => {
  clip = makeClip();
  browser = await launchBrowser();
  const setup = await browser.newContext();
  api = await signUpThroughApi(setup, person);
  ids.storage = await setup.storageState();
  ids.workshopId = (await api.post('/workshops', { name: `Harrow Lane Garage ${run}`, slug: `harrow-phone-${run}` })).id;
  ids.buildId = (await api.post(`/workshops/${ids.workshopId}/builds`, { title: 'Gearbox flange fit' })).id;
  const flange = await api.post(`/workshops/${ids.workshopId}/parts`, {
    partNumber: 'HL-7731',
    title: 'Gearbox flange',
    category: 'coupler',
    features: [{ name: 'pilot bore', kind: 'diameter', role: 'hole', nominal: '15', unit: 'mm' }],
  });
  ids.partId = flange.id;
  ids.footageId = await uploadClip(api, ids.workshopId, ids.buildId, clip, { fileName: 'gearbox-flange-fit.mp4' });
  await api.put(`/workshops/${ids.workshopId}/footage/${ids.footageId}/transcript`, { text: TRANSCRIPT });
  const marks = `/workshops/${ids.workshopId}/footage/${ids.footageId}/marks`;
  await api.post(marks, { startMs: 1200, kind: 'part', partId: ids.partId, label: LONG_LABEL });
  await api.post(marks, { startMs: 5400, kind: 'check_evidence', label: 'Bore gauge reading at the pilot' });
  await api.post(marks, { startMs: 9100, kind: 'caution', label: 'Keep fingers clear while the flange is pressed home' });
  // The miner runs as a job: wait until its suggestions are stored.
  for (let attempt = 0; ; attempt += 1) {
    const found = await api.get(`/workshops/${ids.workshopId}/footage/${ids.footageId}/mark-suggestions`);
    if (found.length >= 2) break;
    assert.ok(attempt < 60, 'the suggestions arrive');
    await new Promise((resolve) => setTimeout(resolve, 500));
  }
  await setup.close();
});
after(async () => {
  await browser?.close();
  if (clip) rmSync(join(clip, '..'), { recursive: true, force: true });
});

/** Every element matching `selector` inside `scope`: its text, width, line count and whether it overflows. */
function measure(scope, selector) {
  return scope.locator(selector).evaluateAll((elements) =>
    elements.map((element) => {
      const style = getComputedStyle(element);
      const lineHeight = parseFloat(style.lineHeight) || parseFloat(style.fontSize) * 1.55;
      const box = element.getBoundingClientRect();
      return {
        text: element.textContent,
        width: box.width,
        lines: Math.round(box.height / lineHeight),
        overflows: element.scrollWidth > element.clientWidth + 1,
      };
    }),
  );
}

test('at 390×844 the marks list keeps its labels in words, suggestions show whole times, the kind filter scrolls', async () => {
  const context = await browser.newContext({ viewport: PHONE, storageState: ids.storage, isMobile: true, hasTouch: true, deviceScaleFactor: 2 });
  const page = await context.newPage();
  await page.goto(`${baseUrl}/workshops/${ids.workshopId}/footage/${ids.footageId}`);
  const list = page.getByTestId('marks-list');
  await list.getByTestId('mark-row').first().waitFor();
  assert.equal(await list.getByTestId('mark-row').count(), 3);

  // Nothing on the page is wider than the phone.
  const pageWidth = await page.evaluate(() => document.documentElement.scrollWidth);
  assert.ok(pageWidth <= PHONE.width, `the page is no wider than the phone (${pageWidth} px)`);

  // Labels: the whole label is there, as wide as most of the row, over a few lines (not one letter a line).
  const labels = await measure(list, '[data-testid="mark-label"]');
  assert.equal(labels.length, 3);
  const long = labels.find((label) => label.text === LONG_LABEL);
  assert.ok(long, 'the long label is shown whole, not cut short');
  assert.ok(long.width >= 200, `the label has room for words (${long.width} px wide)`);
  assert.ok(long.lines >= 2 && long.lines <= 4, `the long label wraps over a few lines (${long.lines})`);
  for (const label of labels) assert.ok(!label.overflows, `“${label.text}” fits its box`);
  // No word is broken: the widest word of the label fits on one line of it.
  const wordsFit = await list.locator('[data-testid="mark-label"]', { hasText: LONG_LABEL }).evaluate((element) => {
    const range = document.createRange();
    range.selectNodeContents(element);
    const lines = new Set([...range.getClientRects()].map((rect) => Math.round(rect.top)));
    return lines.size <= element.textContent.split(' ').length / 2;
  });
  assert.ok(wordsFit, 'the label breaks between words, several words a line');

  // Times of marks read in full.
  const markTimes = await measure(list, '[data-testid="mark-time"]');
  assert.deepEqual(markTimes.map((time) => time.text), ['0:01.2', '0:05.4', '0:09.1']);
  for (const time of markTimes) assert.ok(!time.overflows && time.lines === 1, `mark time ${time.text} reads in full`);

  // The kind filter keeps its words and scrolls sideways inside its own strip.
  const filter = page.getByTestId('mark-kind-filter');
  const strip = await filter.evaluate((element) => ({
    scrollWidth: element.scrollWidth,
    clientWidth: element.clientWidth,
    overflowX: getComputedStyle(element).overflowX,
    right: element.getBoundingClientRect().right,
  }));
  assert.ok(strip.scrollWidth > strip.clientWidth, 'the filter is wider than the phone, so it scrolls');
  assert.ok(['auto', 'scroll'].includes(strip.overflowX), `the strip scrolls sideways (${strip.overflowX})`);
  assert.ok(strip.right <= PHONE.width, 'the strip stays inside the screen');
  const options = await measure(filter, 'label');
  assert.equal(options.length, 7);
  for (const option of options) assert.ok(!option.overflows, `the filter option “${option.text}” reads in full`);
  const heights = await filter.locator('label').evaluateAll((labels) => new Set(labels.map((label) => Math.round(label.getBoundingClientRect().height))).size);
  assert.equal(heights, 1, 'every option is one line high');
  await filter.evaluate((element) => element.scrollTo({ left: element.scrollWidth }));
  await filter.getByText('Note', { exact: true }).click();
  await page.getByText('No marks of this kind.').waitFor();
  await filter.getByText('Caution', { exact: true }).click();
  await list.getByTestId('mark-row').filter({ hasText: 'Keep fingers clear' }).waitFor();
  await filter.evaluate((element) => element.scrollTo({ left: 0 }));
  await filter.getByText('All', { exact: true }).click();
  await list.getByTestId('mark-row').nth(2).waitFor();

  const marksPanel = page.getByTestId('marks-panel');
  await marksPanel.scrollIntoViewIfNeeded();
  await shot(marksPanel, 'marking-phone-marks');

  // Suggestions: each time reads in full beside its phrase.
  const suggestions = page.getByTestId('suggestions');
  await suggestions.getByTestId('suggestion-row').first().waitFor();
  // The button's label is where Mantine would cut a squeezed time short (overflow hidden, no wrap).
  const times = await measure(suggestions, '[data-testid="suggestion-time"] .mantine-Button-label');
  assert.ok(times.length >= 2, 'the suggestions are listed');
  for (const time of times) {
    assert.match(time.text, /^\d+:\d{2}\.\d$/, `a whole time (${time.text})`);
    assert.ok(!time.overflows, `suggestion time ${time.text} is not cut`);
  }
  const phrases = await measure(suggestions, '[data-testid="suggestion-phrase"]');
  for (const phrase of phrases) {
    assert.ok(!phrase.overflows, `“${phrase.text}” fits`);
    assert.ok(phrase.width >= 200, `the phrase has room for words (${phrase.width} px)`);
  }
  const panel = page.getByTestId('suggestions-panel');
  await panel.scrollIntoViewIfNeeded();
  await shot(panel, 'marking-phone-suggestions');
  await page.screenshot({ path: new URL('marking-phone-page.png', screenshots).pathname, fullPage: true });
  await context.close();
});
