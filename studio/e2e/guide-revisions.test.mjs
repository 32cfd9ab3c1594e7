// Guide revisions journey: a creator publishes a guide, reads it signed in, then publishes a second revision
// (one step reworded, one added, the check confirmed meanwhile). Opening the guide again says "Updated since you
// last read"; its link opens the comparison of revision 1 and 2, and the revision history opens revision 1
// read-only. Screenshots go to e2e/screenshots/ (and docs/screenshots/ with FW_SCREENSHOTS_DIR).
import assert from 'node:assert/strict';
import { copyFileSync, mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { after, before, test } from 'node:test';
import { baseUrl, launchBrowser } from './browser.mjs';
import { confirmCheckWithReading, publishGuideWithOpenCheck, signUpThroughApi } from './support.mjs';

const screenshots = new URL('./screenshots/', import.meta.url);
mkdirSync(screenshots, { recursive: true });
async function shot(page, name) {
  const path = new URL(`${name}.png`, screenshots).pathname;
  await page.screenshot({ path, fullPage: true });
  if (process.env.FW_SCREENSHOTS_DIR) copyFileSync(path, join(process.env.FW_SCREENSHOTS_DIR, `${name}.png`));
}

const run = `${Date.now().toString(36)}${Math.floor(Math.random() * 1e4)}`;
const person = { displayName: 'Rowan Hale', email: `rowan-revisions-${run}@harrow-lane.example`, password: 'journey password 2026' };

let browser;
let context;
let api;
let guide;

before(async () => {
  browser = await launchBrowser();
  context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
  api = await signUpThroughApi(context, person);
  guide = await publishGuideWithOpenCheck(api, {
    workshopName: `Harrow Lane Garage ${run}`,
    workshopSlug: `harrow-revisions-${run}`,
    assemblyName: '21-tooth coupler',
    checkTitle: 'Coupler slides onto the motor shaft',
    guideTitle: `Fitting the coupler ${run}`,
  });
});

after(async () => browser?.close());

test('a reader told of an update compares the two revisions and opens the old one', async () => {
  const page = await context.newPage();
  const guidePath = `/guides/${guide.workshopSlug}/${guide.guideSlug}`;
  await page.goto(`${baseUrl}${guidePath}`);
  await page.getByTestId('guide-revision').waitFor();
  // First visit: nothing to tell yet (the visit is recorded).
  await page.getByRole('link', { name: 'Revision history' }).waitFor();
  assert.equal(await page.getByTestId('updated-since-read').count(), 0);
  for (let tries = 0; (await api.get(`${guidePath}/reading`)).lastReadRevision !== 1; tries += 1) {
    assert.ok(tries < 50, 'the visit was never recorded');
    await page.waitForTimeout(100);
  }

  // The creator revises: the step reworded, a step added, the check confirmed on the vehicle.
  const full = await api.get(`${guide.w}/builds`);
  assert.ok(full.length > 0);
  const guides = await api.get(`${guide.w}/builds/${full[0].id}/guides`);
  const draft = await api.get(`${guide.w}/guides/${guides[0].id}`);
  await api.patch(`${guide.w}/guides/${draft.id}/steps/${draft.steps[0].id}`, { body: '<p>It should slide on <em>by hand</em> with a smear of spline grease.</p>' });
  await api.post(`${guide.w}/guides/${draft.id}/steps`, { title: 'Stake the set screw', body: '<p>Stake the set screw once the key is home.</p>' });
  await confirmCheckWithReading(api, guide);
  await api.post(`${guide.w}/guides/${draft.id}/revisions`, { note: 'Grease and staking added' });

  await page.goto(`${baseUrl}${guidePath}`);
  const notice = page.getByTestId('updated-since-read');
  await notice.waitFor();
  assert.match(await notice.textContent(), /Updated since you last read.*revision 1.*revision 2/);
  await notice.getByRole('link', { name: 'Compare what changed' }).click();

  const differences = page.getByTestId('revision-differences');
  await differences.waitFor();
  assert.equal(new URL(page.url()).search, '?from=1&to=2');
  await page.getByRole('heading', { name: 'Steps added (1)' }).waitFor();
  assert.match(await differences.textContent(), /Step 2: Stake the set screw/);
  const inserted = page.getByTestId('changed-step').locator('ins');
  assert.match(await inserted.first().textContent(), /spline grease/);
  const checkRow = page.getByRole('row', { name: /Coupler slides onto the motor shaft/ });
  assert.match(await checkRow.textContent(), /\(changed\)/);
  await shot(page, 'guide-revisions-compare');

  // The history lists both; revision 1 opens read-only, labelled, with the way back to the live guide.
  await page.getByRole('link', { name: 'Revisions' }).click();
  await page.getByRole('link', { name: 'Revision 1', exact: true }).click();
  const label = page.getByTestId('revision-label');
  await label.waitFor();
  assert.match(await label.textContent(), /Revision 1 of 2, published/);
  assert.equal(await page.getByText('Stake the set screw').count(), 0);
  await page.getByRole('link', { name: 'Open the live guide' }).waitFor();
  await shot(page, 'guide-revisions-old-revision');
  await page.close();
});
