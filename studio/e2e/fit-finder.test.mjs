// Fit finder journey: two invented workshops publish guides through the API, one with a 21-tooth 16/32 coupler
// confirmed with a moment of its video as evidence, one with a 21-tooth 24/48 coupler. A signed-out reader opens
// the fit finder from the navigation, describes the spline, sees the confirmed match and the near miss ("same
// teeth, other pitch"), opens the match at its evidence and sees the video seek to that moment.
import assert from 'node:assert/strict';
import { mkdirSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { after, before, test } from 'node:test';
import { baseUrl, launchBrowser } from './browser.mjs';
import { makeClip, signUpThroughApi, uploadClip } from './support.mjs';

const screenshots = new URL('./screenshots/', import.meta.url);
mkdirSync(screenshots, { recursive: true });
const shot = (page, name) => page.screenshot({ path: new URL(`fit-finder-${name}.png`, screenshots).pathname, fullPage: true });

const run = `${Date.now().toString(36)}${Math.floor(Math.random() * 1e4)}`;
// The vehicle word keeps this run's guides apart from any other journey's.
const vehicle = `Compact pickup ${run}`;
const EVIDENCE_MS = 7200;

let browser;
let clip;
const ids = {};

/** A workshop with a coupler and an input shaft of one spline, joined in an assembly, and its published guide. */
async function publishCouplerGuide(api, { name, slug, pitch, showNames, footage }) {
  const workshop = await api.post('/workshops', { name, slug });
  const w = `/workshops/${workshop.id}`;
  if (showNames) await api.patch(w, { showMemberNames: true });
  const build = await api.post(`${w}/builds`, { title: 'Motor-to-gearbox coupler', vehicle });
  const spline = { kind: 'spline', teeth: 21, pressureAngle: 30, ...pitch };
  const coupler = await api.post(`${w}/parts`, {
    partNumber: `CPL-${run}`,
    maker: name,
    title: 'Motor coupler, 21-tooth',
    category: 'coupler',
    features: [{ name: 'gearbox spline', gender: 'internal', ...spline }],
  });
  const shaft = await api.post(`${w}/parts`, {
    partNumber: `IN-${run}`,
    title: 'Gearbox input shaft',
    category: 'shaft',
    features: [{ name: 'input spline', gender: 'external', ...spline }],
  });
  const assembly = await api.post(`${w}/builds/${build.id}/assemblies`, { name: '21-tooth coupler stack' });
  await api.put(`${w}/assemblies/${assembly.id}/parts/${coupler.id}`, { position: 'coupler' });
  await api.put(`${w}/assemblies/${assembly.id}/parts/${shaft.id}`, { position: 'gearbox input' });
  await api.post(`${w}/assemblies/${assembly.id}/interfaces`, {
    kind: 'spline',
    name: 'coupler to gearbox input',
    featureAId: coupler.features[0].id,
    featureBId: shaft.features[0].id,
  });
  let footageId = null;
  if (footage) {
    footageId = await uploadClip(api, workshop.id, build.id, footage);
    // The spline check (passed by the numbers) is confirmed with the moment the teeth are counted on camera.
    const { checks } = await api.get(`${w}/assemblies/${assembly.id}/checklist`);
    const check = checks.find((item) => item.title.startsWith('Spline'));
    const mark = await api.post(`${w}/footage/${footageId}/marks`, { startMs: EVIDENCE_MS, kind: 'check_evidence', label: 'Counting 21 teeth', fitCheckId: check.id });
    await api.post(`${w}/checks/${check.id}/evidence`, { kind: 'mark', markId: mark.id });
    await api.post(`${w}/checks/${check.id}/transitions`, { to: 'confirmed', reason: 'Slid on by hand on the truck' });
  }
  const guide = await api.post(`${w}/builds/${build.id}/guides`, { title: `Fitting the coupler (${name})`, assemblyId: assembly.id, footageId });
  await api.post(`${w}/guides/${guide.id}/steps`, { title: 'Count the splines on both sides', footageId, startMs: footageId ? 500 : undefined });
  await api.post(`${w}/guides/${guide.id}/revisions`, { note: 'First edition' });
  return { workshopSlug: workshop.slug, guideSlug: guide.slug };
}

before(async () => {
  clip = makeClip();
  browser = await launchBrowser();
  const creator = await browser.newContext();
  const api = await signUpThroughApi(creator, { displayName: 'Rowan Avery', email: `rowan-finder-${run}@harrow-lane.example`, password: 'journey password 2026' });
  ids.match = await publishCouplerGuide(api, {
    name: `Harrow Lane Garage ${run}`,
    slug: `harrow-finder-${run}`,
    pitch: { diametralPitch: 16, stubPitch: 32 },
    showNames: true,
    footage: clip,
  });
  ids.near = await publishCouplerGuide(api, { name: `Quarry Hill Fabrication ${run}`, slug: `quarry-finder-${run}`, pitch: { diametralPitch: 24, stubPitch: 48 } });
  await creator.close();
});
after(async () => {
  await browser?.close();
  if (clip) rmSync(join(clip, '..'), { recursive: true, force: true });
});

test('a signed-out reader finds the coupler by its spline, sees the near miss apart, and opens the evidence moment', async () => {
  const reader = await browser.newContext({ viewport: { width: 1366, height: 900 } });
  const page = await reader.newPage();
  await page.goto(`${baseUrl}/`);
  await page.getByRole('navigation', { name: 'Main navigation' }).getByRole('link', { name: 'Fit finder' }).click();
  await page.waitForURL(`${baseUrl}/fit-finder`);
  await page.getByRole('heading', { level: 1, name: 'Fit finder' }).waitFor();

  await page.getByLabel('Vehicle').fill(vehicle);
  await page.getByLabel('Teeth').fill('21');
  await page.getByRole('textbox', { name: /^Pitch/ }).fill('16/32');
  await page.getByRole('button', { name: 'Find proven fits' }).click();
  await page.waitForURL(/\/fit-finder\?.*splineTeeth=21/);

  const match = page.getByTestId('finder-result');
  await match.first().waitFor();
  assert.equal(await match.count(), 1);
  const matchText = await match.textContent();
  assert.match(matchText, new RegExp(`Harrow Lane Garage ${run}`));
  assert.match(matchText, /Confirmed on the vehicle/);
  assert.match(matchText, /Confirmed by Rowan Avery on /);
  assert.equal(await match.locator('[data-icon="confirmed"]').count() > 0, true, 'the confirmed glyph is drawn beside its words');

  const near = page.getByTestId('finder-near-miss');
  assert.equal(await near.count(), 1);
  const nearText = await near.textContent();
  assert.match(nearText, new RegExp(`Quarry Hill Fabrication ${run}`));
  assert.match(nearText, /same teeth, other pitch: 16\/32 diametral pitch \(ANSI B92\.1\) asked, this is 24\/48/);
  await shot(page, '01-results');

  await match.getByRole('link', { name: 'Open the guide at the evidence' }).click();
  await page.waitForURL(`${baseUrl}/guides/${ids.match.workshopSlug}/${ids.match.guideSlug}?t=${(EVIDENCE_MS / 1000).toFixed(1)}`);
  await page.getByTestId('guide-video').waitFor();
  // The video seeks to the evidence moment once it can (7.2 s of a 12 s clip).
  await page.waitForFunction(
    (atSeconds) => {
      const video = document.querySelector('[data-testid="guide-video"]');
      return video && video.readyState >= 1 && Math.abs(video.currentTime - atSeconds) < 0.75;
    },
    EVIDENCE_MS / 1000,
    { timeout: 30_000 },
  );
  await shot(page, '02-evidence-moment');
  await reader.close();
});
