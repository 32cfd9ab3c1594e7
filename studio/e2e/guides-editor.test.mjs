// Guide editor journey: a creator starts a guide from the build page, picks the build's footage as the
// main video, lets the app spot a safety topic in the summary, adds two steps anchored in the video (one
// from the player's current time, with a WARNING caution; one typed as m:ss.s), moves the second up with the
// keyboard, publishes revision 1 with a note and opens the public page.
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
const shot = (page, name) => page.screenshot({ path: new URL(`guides-editor-${name}.png`, screenshots).pathname, fullPage: true });

const run = `${Date.now().toString(36)}${Math.floor(Math.random() * 1e4)}`;
const person = { displayName: 'Rowan Keel', email: `rowan-guides-${run}@harrow-lane.example`, password: 'journey password 2026' };
const guideTitle = `Fitting the motor-to-gearbox coupler ${run}`;

/** A 12 s small test pattern made on the spot; never real footage. */
function makeClip() {
  const file = join(mkdtempSync(join(tmpdir(), 'fitwright-guides-')), 'coupler-fitting.mp4');
  execFileSync('ffmpeg', [
    '-v', 'error', '-y',
    '-f', 'lavfi', '-i', 'testsrc2=duration=12:size=640x360:rate=25',
    '-c:v', 'libx264', '-preset', 'ultrafast', '-pix_fmt', 'yuv420p', '-movflags', '+faststart', file,
  ]);
  return file;
}

/** Types into a Tiptap field (found by its label), as a person does. */
async function typeRichText(scope, label, text) {
  const editor = scope.getByRole('textbox', { name: label, exact: true });
  await editor.click();
  await editor.pressSequentially(text);
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
  ids.workshopId = (await api.post('/workshops', { name: `Harrow Lane Garage ${run}`, slug: `harrow-guides-${run}` })).id;
  ids.buildId = (await api.post(`/workshops/${ids.workshopId}/builds`, { title: 'Motor-to-gearbox coupler', vehicle: '1980s compact pickup, electric conversion' })).id;
  ids.assemblyId = (await api.post(`/workshops/${ids.workshopId}/builds/${ids.buildId}/assemblies`, { name: '21-tooth coupler stack' })).id;
});
after(async () => {
  await browser?.close();
  if (clip) rmSync(join(clip, '..'), { recursive: true, force: true });
});

test('a guide is started from the build page and given its footage, assembly and safety topics', async () => {
  await page.goto(`${baseUrl}/workshops/${ids.workshopId}/builds/${ids.buildId}`);
  await page.locator('[data-testid="footage-dropzone"] input[type=file]').setInputFiles(clip);
  const card = page.getByTestId('footage-card').filter({ hasText: 'coupler-fitting' });
  await card.locator('[data-state="ready"]').waitFor({ timeout: 60_000 });

  const guides = page.getByTestId('build-guides');
  await guides.getByText('No guides yet.').waitFor();
  await guides.getByRole('button', { name: 'New guide' }).click();
  await guides.getByRole('form', { name: 'New guide' }).getByLabel('Title').fill(guideTitle);
  await guides.getByRole('button', { name: 'Create and edit' }).click();
  await page.waitForURL(/\/workshops\/[0-9a-f-]{36}\/guides\/[0-9a-f-]{36}$/);
  ids.guideId = page.url().match(/guides\/([0-9a-f-]{36})$/)[1];
  await page.getByRole('heading', { name: guideTitle }).waitFor();
  assert.equal(await page.getByTestId('guide-status').textContent(), 'Draft — not published yet');

  const details = page.getByRole('form', { name: 'Guide details' });
  await typeRichText(details, 'Summary', 'Raise the truck on a jack and stands, then couple the motor to the original gearbox.');
  await choose(details, 'Main footage', 'coupler-fitting');
  await choose(details, 'Assembly', '21-tooth coupler stack');
  await details.getByLabel('Tools').fill('Torque wrench, 20–100 N·m');
  await details.getByLabel('Tools').press('Enter');
  await details.getByLabel('Consumables').fill('Medium-strength thread locker');
  await details.getByLabel('Consumables').press('Enter');
  await details.getByRole('button', { name: 'Save details' }).click();
  await details.getByTestId('details-unsaved').waitFor({ state: 'hidden' });

  // The server read "jack" in the summary: the lifting topic is offered with one click.
  const lifting = details.getByTestId('safety-lifting');
  await lifting.getByText('found in your text').waitFor();
  await shot(page, '01-details');
  await lifting.getByRole('button', { name: 'Add lifting' }).click();
  await lifting.getByRole('button', { name: 'Add lifting' }).waitFor({ state: 'detached' });
  assert.equal(await lifting.getByRole('checkbox', { name: /Lifting/ }).isChecked(), true);

  const guide = await api.get(`/workshops/${ids.workshopId}/guides/${ids.guideId}`);
  assert.ok(guide.footageId, 'main footage saved');
  assert.equal(guide.assemblyId, ids.assemblyId);
  assert.deepEqual(guide.safetyTopics, ['lifting']);
  assert.deepEqual(guide.tools, ['Torque wrench, 20–100 N·m']);
  assert.deepEqual(guide.consumables, ['Medium-strength thread locker']);
  assert.match(guide.summary, /<p>Raise the truck on a jack/);
});

test('two steps are anchored in the video, one with a WARNING; the second moves up with the keyboard', async () => {
  const video = page.getByTestId('step-video');
  await video.waitFor();
  await page.waitForFunction(() => document.querySelector('[data-testid="step-video"]')?.readyState >= 1);

  // Step 1: at the player's current time (put at 2.5 s), with a caution.
  await page.getByRole('button', { name: 'Add step' }).click();
  let form = page.getByRole('form', { name: 'New step' });
  await form.getByLabel('Title').fill('Support the gearbox');
  await typeRichText(form, 'What to do', 'Put a transmission jack under the bell housing before the last bolt comes out.');
  await video.evaluate((element) => {
    element.currentTime = 2.5;
  });
  await page.waitForFunction(() => {
    const element = document.querySelector('[data-testid="step-video"]');
    return Math.abs(element.currentTime - 2.5) < 0.01 && !element.seeking;
  });
  await form.getByRole('button', { name: 'Use current time', exact: true }).click();
  assert.equal(await form.getByLabel(/^At/).inputValue(), '0:02.5');
  await choose(form, 'Caution', 'WARNING');
  await form.getByLabel(/^Caution text/).fill('The gearbox weighs about 30 kg; keep hands clear while it is lowered.');
  await shot(page, '02-step-form');
  await form.getByRole('button', { name: 'Add step' }).click();
  await form.waitFor({ state: 'detached' });

  // Step 2: its time typed as m:ss.s.
  await page.getByRole('button', { name: 'Add step' }).click();
  form = page.getByRole('form', { name: 'New step' });
  await form.getByLabel('Title').fill('Check the spline count');
  await typeRichText(form, 'What to do', 'Count the teeth on both halves: 21 and 21.');
  await form.getByLabel(/^At/).fill('0:07.5');
  await form.getByRole('button', { name: 'Add step' }).click();
  await form.waitFor({ state: 'detached' });

  const cards = page.getByTestId('step-card');
  await cards.nth(1).waitFor();
  assert.match(await cards.nth(0).textContent(), /Step 1Support the gearbox0:02\.5.*WARNING\s*The gearbox weighs/);
  assert.match(await cards.nth(1).textContent(), /Step 2Check the spline count0:07\.5/);

  // Keyboard: focus "move up" on step 2 and press Enter; the step moves and focus stays on the moved step.
  await page.getByRole('button', { name: 'Move step 2, Check the spline count, up' }).focus();
  await page.keyboard.press('Enter');
  await page.getByRole('status').filter({ hasText: '“Check the spline count” is now step 1 of 2.' }).waitFor();
  // The announcement may come a frame before the list re-renders: wait for the list itself.
  await page.waitForFunction(() => document.querySelector('[data-testid="step-card"]')?.textContent?.startsWith('Step 1Check the spline count'));
  assert.equal(await page.evaluate(() => document.activeElement?.getAttribute('aria-label')), 'Move step 1, Check the spline count, down');
  await page.waitForFunction(
    async ([workshopId, guideId]) => {
      const guide = await (await fetch(`/api/workshops/${workshopId}/guides/${guideId}`)).json();
      return guide.steps[0]?.title === 'Check the spline count';
    },
    [ids.workshopId, ids.guideId],
  );

  // A step's time moves the player there.
  await cards.nth(1).getByRole('button', { name: 'Play from 0:02.5' }).click();
  await page.waitForFunction(() => Math.abs(document.querySelector('[data-testid="step-video"]').currentTime - 2.5) < 0.05);

  const guide = await api.get(`/workshops/${ids.workshopId}/guides/${ids.guideId}`);
  assert.deepEqual(
    guide.steps.map(({ position, title, startMs, footageId, caution }) => ({ position, title, startMs, anchored: footageId === guide.footageId, caution })),
    [
      { position: 1, title: 'Check the spline count', startMs: 7500, anchored: true, caution: null },
      {
        position: 2,
        title: 'Support the gearbox',
        startMs: 2500,
        anchored: true,
        caution: { level: 'WARNING', text: 'The gearbox weighs about 30 kg; keep hands clear while it is lowered.' },
      },
    ],
  );
  await shot(page, '03-steps');
});

test('publishing revision 1 with a note, then the public page', async () => {
  const panel = page.getByTestId('publish-panel');
  await panel.getByLabel('Note for this revision (optional)').fill('First cut: coupler and spline check.');
  await panel.getByRole('button', { name: 'Publish revision' }).click();
  await panel.getByTestId('guide-status').filter({ hasText: 'Published — revision 1' }).waitFor();
  await panel.getByTestId('revisions').getByText('First cut: coupler and spline check.').waitFor();
  assert.equal(await panel.getByRole('button', { name: 'Publish revision' }).isDisabled(), true);
  await page.getByTestId('publish-panel').scrollIntoViewIfNeeded();
  await shot(page, '04-published');

  // The build page lists it as published, revision 1, two steps.
  await page.goto(`${baseUrl}/workshops/${ids.workshopId}/builds/${ids.buildId}`);
  const row = page.getByTestId('guide-row').filter({ hasText: guideTitle });
  await row.waitFor();
  assert.match(await row.textContent(), /Published.*2.*Revision 1/);
  await page.getByTestId('build-guides').scrollIntoViewIfNeeded();
  await shot(page, '05-build-page');

  await row.getByRole('link', { name: guideTitle }).click();
  await page.getByTestId('public-link').click();
  await page.waitForURL(new RegExp(`/guides/harrow-guides-${run}/fitting-the-motor-to-gearbox-coupler`));
  await page.getByTestId('guide-revision').filter({ hasText: 'Revision 1' }).waitFor();
  assert.match(await page.getByTestId('guide-revision').textContent(), /First cut: coupler and spline check\./);
  await page.getByRole('heading', { level: 1, name: guideTitle }).waitFor();
  await page.getByText('Check the spline count').first().waitFor();
  await page.waitForLoadState('networkidle');
  await shot(page, '06-public-page');
});

test('an edit after publishing shows as unpublished changes; withdrawing takes the guide off the public page', async () => {
  await page.goto(`${baseUrl}/workshops/${ids.workshopId}/guides/${ids.guideId}`);
  await page.getByRole('button', { name: 'Edit step 1, Check the spline count' }).click();
  const form = page.getByRole('form', { name: 'Edit step 1' });
  await form.getByLabel('Title').fill('Count the spline teeth');
  await form.getByRole('button', { name: 'Save step' }).click();
  await form.waitFor({ state: 'detached' });
  const panel = page.getByTestId('publish-panel');
  await panel.getByTestId('unpublished-changes').waitFor();
  assert.match(await panel.getByTestId('unpublished-note').textContent(), /Readers see revision 1 until you publish again/);
  assert.equal(await panel.getByRole('button', { name: 'Publish revision' }).isDisabled(), false);

  await panel.getByRole('button', { name: 'Withdraw' }).click();
  const dialog = page.getByRole('dialog', { name: 'Withdraw this guide from public view?' });
  await dialog.getByRole('button', { name: 'Withdraw' }).click();
  await panel.getByTestId('guide-status').filter({ hasText: 'Draft — withdrawn after revision 1' }).waitFor();
  assert.equal(await panel.getByTestId('public-link').count(), 0);
  await shot(page, '07-withdrawn');
  const response = await context.request.get(`${baseUrl}/api/guides/harrow-guides-${run}/${(await api.get(`/workshops/${ids.workshopId}/guides/${ids.guideId}`)).slug}`);
  assert.equal(response.status(), 404);
});
