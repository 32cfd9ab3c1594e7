// Rename and delete from the studio: a creator renames an assembly, a footage and the build itself from their
// pages; each delete asks again and says what goes with it (counted by the API) before anything goes, "Keep it"
// keeps everything, and the red button deletes. Screenshots of the three questions go to e2e/screenshots/ (and
// docs/screenshots/ with FW_SCREENSHOTS_DIR).
import assert from 'node:assert/strict';
import { copyFileSync, mkdirSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { after, before, test } from 'node:test';
import { baseUrl, launchBrowser } from './browser.mjs';
import { makeClip, signUpThroughApi, uploadClip } from './support.mjs';

const screenshots = new URL('./screenshots/', import.meta.url);
mkdirSync(screenshots, { recursive: true });
async function shot(page, name) {
  const path = new URL(`${name}.png`, screenshots).pathname;
  await page.screenshot({ path });
  if (process.env.FW_SCREENSHOTS_DIR) copyFileSync(path, join(process.env.FW_SCREENSHOTS_DIR, `${name}.png`));
}

const run = `${Date.now().toString(36)}${Math.floor(Math.random() * 1e4)}`;
const person = { displayName: 'Rhea Calder', email: `rhea-rename-${run}@harrow-lane.example`, password: 'journey password 2026' };

let browser;
let page;
let api;
let clip;
const ids = {};

before(async () => {
  clip = makeClip();
  browser = await launchBrowser();
  const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
  page = await context.newPage();
  api = await signUpThroughApi(context, person);
  const w = (ids.workshopId = (await api.post('/workshops', { name: `Harrow Lane Garage ${run}`, slug: `harrow-rename-${run}` })).id);
  ids.buildId = (await api.post(`/workshops/${w}/builds`, { title: 'Coupler trial' })).id;
  ids.assemblyId = (await api.post(`/workshops/${w}/builds/${ids.buildId}/assemblies`, { name: 'Coupler on motor' })).id;
  await api.post(`/workshops/${w}/assemblies/${ids.assemblyId}/checks`, { title: 'Coupler slides on by hand' });
  ids.keptAssemblyId = (await api.post(`/workshops/${w}/builds/${ids.buildId}/assemblies`, { name: 'Gearbox side' })).id;
  ids.footageId = await uploadClip(api, w, ids.buildId, clip, { fileName: 'coupler-trial.mp4' });
  await api.post(`/workshops/${w}/footage/${ids.footageId}/marks`, { startMs: 1000, kind: 'note', label: 'Coupler in view' });
  await api.post(`/workshops/${w}/footage/${ids.footageId}/marks`, { startMs: 4000, kind: 'note', label: 'Key lined up' });
});
after(async () => {
  await browser?.close();
  if (clip) rmSync(join(clip, '..'), { recursive: true, force: true });
});

/** The items of a list in the open question ("Deleted with it", "Kept, but no longer linked"). */
async function listed(dialog, name) {
  const list = dialog.getByRole('list', { name });
  if ((await list.count()) === 0) return [];
  return (await list.getByRole('listitem').allTextContents()).map((text) => text.trim());
}

test('an assembly is renamed, and deleting it says what goes with it; Keep it keeps it', async () => {
  await page.goto(`${baseUrl}/workshops/${ids.workshopId}/builds/${ids.buildId}`);
  await page.getByRole('button', { name: 'Rename Coupler on motor' }).click();
  const rename = page.getByRole('dialog', { name: 'Rename the assembly' });
  await rename.getByRole('textbox', { name: 'Name' }).fill('Coupler on the motor shaft');
  await rename.getByRole('button', { name: 'Save' }).click();
  await rename.waitFor({ state: 'hidden' });
  await page.getByRole('link', { name: 'Coupler on the motor shaft', exact: true }).waitFor();
  assert.equal((await api.get(`/workshops/${ids.workshopId}/assemblies/${ids.assemblyId}`)).name, 'Coupler on the motor shaft');

  await page.getByRole('button', { name: 'Delete Coupler on the motor shaft' }).click();
  const question = page.getByRole('dialog', { name: 'Delete the assembly “Coupler on the motor shaft”?' });
  await question.getByRole('list', { name: 'Deleted with it' }).waitFor();
  assert.deepEqual(await listed(question, 'Deleted with it'), ['1 fit check']);
  await question.getByText('This cannot be undone.').waitFor();
  await shot(page, 'delete-assembly-question');
  await question.getByRole('button', { name: 'Keep it' }).click();
  await question.waitFor({ state: 'hidden' });
  assert.equal((await api.get(`/workshops/${ids.workshopId}/assemblies/${ids.assemblyId}`)).name, 'Coupler on the motor shaft', 'Keep it deleted nothing');

  await page.getByRole('button', { name: 'Delete Coupler on the motor shaft' }).click();
  await question.getByRole('list', { name: 'Deleted with it' }).waitFor();
  await question.getByRole('button', { name: 'Delete assembly' }).click();
  await question.waitFor({ state: 'hidden' });
  await page.getByRole('link', { name: 'Coupler on the motor shaft', exact: true }).waitFor({ state: 'detached' });
  const left = await api.get(`/workshops/${ids.workshopId}/builds/${ids.buildId}/assemblies`);
  assert.deepEqual(left.map((assembly) => assembly.name), ['Gearbox side']);
});

test('a footage is renamed, and deleting it names its marks before they go', async () => {
  const card = page.getByTestId('footage-card').filter({ hasText: 'coupler-trial' });
  await card.getByRole('button', { name: /^Rename / }).click();
  const rename = page.getByRole('dialog', { name: 'Rename the footage' });
  await rename.getByRole('textbox', { name: 'Title' }).fill('Coupler trial, first fit');
  await rename.getByRole('button', { name: 'Save' }).click();
  await rename.waitFor({ state: 'hidden' });
  const renamed = page.getByTestId('footage-card').filter({ hasText: 'Coupler trial, first fit' });
  await renamed.waitFor();
  assert.equal((await api.get(`/workshops/${ids.workshopId}/footage/${ids.footageId}`)).title, 'Coupler trial, first fit');

  await renamed.getByRole('button', { name: 'Delete Coupler trial, first fit' }).click();
  const question = page.getByRole('dialog', { name: 'Delete the footage “Coupler trial, first fit”?' });
  await question.getByRole('list', { name: 'Deleted with it' }).waitFor();
  assert.ok((await listed(question, 'Deleted with it')).includes('2 marks'), 'the two marks are named');
  await shot(page, 'delete-footage-question');
  await question.getByRole('button', { name: 'Delete footage' }).click();
  await question.waitFor({ state: 'hidden' });
  await renamed.waitFor({ state: 'detached' });
  assert.deepEqual(await api.get(`/workshops/${ids.workshopId}/builds/${ids.buildId}/footage`), []);
});

test('the build is renamed, and deleting it lists what is left in it, then goes back to the builds', async () => {
  await page.getByRole('button', { name: 'Rename', exact: true }).click();
  const rename = page.getByRole('dialog', { name: 'Rename the build' });
  // An empty title is refused before asking the API.
  await rename.getByRole('textbox', { name: 'Title' }).fill('   ');
  await rename.getByRole('button', { name: 'Save' }).click();
  await rename.getByText('Give the build a title').waitFor();
  await rename.getByRole('textbox', { name: 'Title' }).fill('Coupler trial, motor side');
  await rename.getByRole('button', { name: 'Save' }).click();
  await rename.waitFor({ state: 'hidden' });
  await page.getByRole('heading', { name: 'Coupler trial, motor side', level: 2 }).waitFor();

  await page.getByRole('button', { name: 'Delete build' }).click();
  const question = page.getByRole('dialog', { name: 'Delete the build “Coupler trial, motor side”?' });
  await question.getByRole('list', { name: 'Deleted with it' }).waitFor();
  assert.deepEqual(await listed(question, 'Deleted with it'), ['1 assembly']);
  await shot(page, 'delete-build-question');
  await question.getByRole('button', { name: 'Delete build' }).click();
  await page.waitForURL(`${baseUrl}/workshops/${ids.workshopId}/builds`);
  const builds = await api.get(`/workshops/${ids.workshopId}/builds`);
  assert.equal(builds.length, 0);
});
