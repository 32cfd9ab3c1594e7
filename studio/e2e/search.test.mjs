// Search journey: an invented workshop publishes a guide through the API whose video has a transcript, then
// changes the guide without publishing. A signed-out reader focuses the header's box with "/", finds the
// published step and the transcript cue with the matched words highlighted, opens the cue and sees the video
// seek to that moment; the unpublished words find nothing for them. The workshop's owner, signed in, finds the
// same words as their own draft, and under "Published" sees the public copies.
import assert from 'node:assert/strict';
import { mkdirSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { randomInt } from 'node:crypto';
import { after, before, test } from 'node:test';
import { baseUrl, launchBrowser } from './browser.mjs';
import { makeClip, signUpThroughApi, uploadClip } from './support.mjs';

const screenshots = new URL('./screenshots/', import.meta.url);
mkdirSync(screenshots, { recursive: true });
const shot = (page, name) => page.screenshot({ path: new URL(`search-${name}.png`, screenshots).pathname, fullPage: true });

const run = `${Date.now().toString(36)}${Math.floor(Math.random() * 1e4)}`;
/** Made-up words (letters only, so they are words to the search, not part numbers) no other run writes. */
const invented = () => Array.from({ length: 9 }, () => String.fromCharCode(97 + randomInt(26))).join('');
const stepWord = invented();
const cueWord = invented();
const draftWord = invented();
const CUE_MS = 6000;

let browser;
let clip;
let owner;
const ids = {};

before(async () => {
  clip = makeClip();
  browser = await launchBrowser();
  owner = await browser.newContext({ viewport: { width: 1366, height: 900 } });
  const api = await signUpThroughApi(owner, { displayName: 'Tamsin Orrell', email: `tamsin-search-${run}@ferrow-works.example`, password: 'journey password 2026' });
  const workshop = await api.post('/workshops', { name: `Ferrow Works ${run}`, slug: `ferrow-search-${run}` });
  const w = `/workshops/${workshop.id}`;
  const build = await api.post(`${w}/builds`, { title: 'Steering shaft swap', vehicle: `Small tractor ${run}` });
  const footageId = await uploadClip(api, workshop.id, build.id, clip);
  await api.put(`${w}/footage/${footageId}/transcript`, {
    text: `WEBVTT\n\n00:00:01.000 --> 00:00:03.000\nFirst we clean the shaft.\n\n00:00:06.000 --> 00:00:08.500\nNow the ${cueWord} joint slides on by hand.\n`,
  });
  const guide = await api.post(`${w}/builds/${build.id}/guides`, { title: `Swapping the steering shaft ${run}`, footageId });
  await api.post(`${w}/guides/${guide.id}/steps`, { title: 'Clean and grease', body: `<p>Grease the ${stepWord} splines lightly.</p>`, footageId, startMs: 1000 });
  await api.post(`${w}/guides/${guide.id}/revisions`, { note: 'First edition' });
  // Changed after publishing: the public must not find these words until they are published.
  await api.post(`${w}/guides/${guide.id}/steps`, { title: 'Torque the pinch bolt', body: `<p>Use the ${draftWord} wrench.</p>` });
  Object.assign(ids, { workshopId: workshop.id, workshopSlug: workshop.slug, guideId: guide.id, guideSlug: guide.slug });
});
after(async () => {
  await owner?.close();
  await browser?.close();
  if (clip) rmSync(join(clip, '..'), { recursive: true, force: true });
});

/** Presses "/" outside any field and types into the header's box, as a reader would. */
async function searchFromHeader(page, words) {
  await page.locator('body').click({ position: { x: 5, y: 300 } });
  await page.keyboard.press('/');
  const box = page.getByRole('searchbox', { name: /Search guides, parts and transcripts/ });
  assert.equal(await box.evaluate((element) => element === document.activeElement), true, '"/" focuses the header search box');
  // On the results page the box holds the last search: replace it.
  await page.keyboard.press('ControlOrMeta+A');
  await page.keyboard.type(words);
  await page.keyboard.press('Enter');
  await page.waitForURL((url) => url.pathname === '/search' && url.searchParams.get('q') === words);
  await page.getByTestId('search-summary').waitFor();
}

test('a signed-out reader searches from the header, sees highlighted public hits, and a cue opens the video at its moment', async () => {
  const reader = await browser.newContext({ viewport: { width: 1366, height: 900 } });
  const page = await reader.newPage();
  await page.goto(`${baseUrl}/`);

  await searchFromHeader(page, stepWord);
  const stepHit = page.getByTestId('search-hit');
  await stepHit.first().waitFor();
  assert.equal(await stepHit.count(), 1);
  assert.match(await stepHit.textContent(), /Guide/);
  assert.deepEqual(await stepHit.getByTestId('search-snippet').locator('mark').allTextContents(), [stepWord]);
  assert.equal(await stepHit.getByText('Your workshop · not public').count(), 0);
  await shot(page, '01-public-step');

  // Unpublished words: nothing, not even a count.
  await searchFromHeader(page, draftWord);
  // The previous results stay on screen until the new answer comes: wait for the answer, then count.
  await page.getByTestId('search-summary').filter({ hasText: `Nothing matches “${draftWord}”.` }).waitFor();
  assert.equal(await page.getByTestId('search-hit').count(), 0);

  await searchFromHeader(page, `${cueWord} joint`);
  const cueHit = page.getByTestId('search-hit').filter({ hasText: 'Transcript' });
  await cueHit.waitFor();
  const marked = await cueHit.getByTestId('search-snippet').locator('mark').allTextContents();
  assert.ok(marked.includes(cueWord), `the cue's matched word is highlighted (marked: ${marked.join(', ')})`);
  await shot(page, '02-public-cue');

  await cueHit.getByRole('link').click();
  await page.waitForURL(`${baseUrl}/guides/${ids.workshopSlug}/${ids.guideSlug}?t=${(CUE_MS / 1000).toFixed(1)}`);
  await page.getByTestId('guide-video').waitFor();
  await page.waitForFunction(
    (atSeconds) => {
      const video = document.querySelector('[data-testid="guide-video"]');
      return video && video.readyState >= 1 && Math.abs(video.currentTime - atSeconds) < 0.75;
    },
    CUE_MS / 1000,
    { timeout: 30_000 },
  );
  await shot(page, '03-cue-moment');
  await reader.close();
});

test("the workshop's owner finds the unpublished words as their draft, and the public copies under Published", async () => {
  const page = await owner.newPage();
  await page.goto(`${baseUrl}/`);

  await searchFromHeader(page, draftWord);
  const draftHit = page.getByTestId('search-hit');
  await draftHit.first().waitFor();
  assert.equal(await draftHit.count(), 1);
  const draftText = await draftHit.textContent();
  assert.match(draftText, /Draft guide/);
  assert.match(draftText, /Your workshop · not public/);
  assert.deepEqual(await draftHit.getByTestId('search-snippet').locator('mark').allTextContents(), [draftWord]);
  await shot(page, '04-member-draft');
  await draftHit.getByRole('link').click();
  await page.waitForURL(`${baseUrl}/workshops/${ids.workshopId}/guides/${ids.guideId}`);

  // Everything: the member's own cue (it opens the studio); Published: the guide's public cue.
  await searchFromHeader(page, `${cueWord} joint`);
  const ownCue = page.getByTestId('search-hit').filter({ hasText: 'Transcript' });
  await ownCue.waitFor();
  assert.match(await ownCue.textContent(), /Your workshop · not public/);
  await page.getByRole('radiogroup', { name: 'Which results' }).getByText('Published', { exact: true }).click();
  await page.waitForURL((url) => url.searchParams.get('state') === 'published');
  const publicCue = page.getByTestId('search-hit').filter({ hasText: 'Transcript' }).filter({ hasNotText: 'not public' });
  await publicCue.waitFor();
  assert.equal(
    await publicCue.getByRole('link').getAttribute('href'),
    `/guides/${ids.workshopSlug}/${ids.guideSlug}?t=${(CUE_MS / 1000).toFixed(1)}`,
  );
  await shot(page, '05-member-published');
  await page.close();
});
