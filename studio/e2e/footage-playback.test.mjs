// Footage that plays everywhere: a phone-style HEVC 10-bit .mov (which Chromium cannot decode) is uploaded,
// turned into H.264 renditions by the media pipeline, put in a published guide and played signed-out in headless
// Chromium through the HLS master (hls.js or native): the picture decodes, currentTime advances, the highlighted step
// follows, captions load, and hovering the seek bar shows a scrub preview. A portrait clip in the marking workspace
// keeps the marking controls on screen at 1440×900 and 390×844.
import assert from 'node:assert/strict';
import { execFileSync } from 'node:child_process';
import { copyFileSync, mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { after, before, test } from 'node:test';
import { baseUrl, launchBrowser } from './browser.mjs';
import { signUpThroughApi, uploadClip } from './support.mjs';

const screenshots = new URL('./screenshots/', import.meta.url);
mkdirSync(screenshots, { recursive: true });
const shotPath = (name) => new URL(`footage-playback-${name}.png`, screenshots).pathname;

const run = `${Date.now().toString(36)}${Math.floor(Math.random() * 1e4)}`;
const person = { displayName: 'Noor Halloran', email: `noor-playback-${run}@harrow-lane.example`, password: 'journey password 2026' };
const title = `Pressing the pinion bearing ${run}`;

// Invented bench talk for the generated clip.
const TRANSCRIPT = `WEBVTT

00:00:00.300 --> 00:00:02.500
Support the carrier on the press bed.

00:00:03.000 --> 00:00:05.500
Bearing goes on square, cone first.
`;

const work = mkdtempSync(join(tmpdir(), 'fitwright-playback-'));
const ffmpeg = (args) => execFileSync('ffmpeg', ['-v', 'error', '-y', ...args]);

/** What a phone writes: HEVC Main 10 in a QuickTime file with AAC sound. Six seconds of test pattern, never real footage. */
function makeHevcClip() {
  const file = join(work, 'pinion-press.mov');
  ffmpeg([
    '-f', 'lavfi', '-i', 'testsrc2=duration=6:size=640x360:rate=25',
    '-f', 'lavfi', '-i', 'sine=frequency=440:duration=6',
    '-c:v', 'libx265', '-preset', 'ultrafast', '-x265-params', 'log-level=error', '-pix_fmt', 'yuv420p10le', '-tag:v', 'hvc1',
    '-c:a', 'aac', '-shortest', file,
  ]);
  return file;
}

/** A portrait phone clip: stored 960×540 with a rotation of 90° in its metadata, shown 540×960. */
function makePortraitClip() {
  const landscape = join(work, 'landscape.mp4');
  const file = join(work, 'portrait-bench.mp4');
  ffmpeg(['-f', 'lavfi', '-i', 'testsrc2=duration=3:size=960x540:rate=25', '-c:v', 'libx264', '-preset', 'ultrafast', '-pix_fmt', 'yuv420p', landscape]);
  // ffmpeg 5.1 writes the rotation (a display matrix) only when remuxing with the tag.
  ffmpeg(['-i', landscape, '-c', 'copy', '-metadata:s:v:0', 'rotate=90', file]);
  return file;
}

let browser;
const ids = {};

async function waitForRenditions(api, footageId) {
  const seen = [];
  for (let attempt = 0; attempt < 600; attempt += 1) {
    const footage = await api.get(`/workshops/${ids.workshopId}/footage/${footageId}`);
    const renditions = footage.renditions;
    assert.ok(renditions, 'the footage answer carries its renditions');
    if (renditions.state === 'ready') return { footage, seen };
    assert.notEqual(renditions.state, 'failed', `renditions failed: ${renditions.reason}`);
    if (renditions.state === 'processing') seen.push(renditions.percent);
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
  throw new Error('the renditions were not ready within 150 s');
}

before(async () => {
  const hevc = makeHevcClip();
  const portrait = makePortraitClip();
  browser = await launchBrowser();
  const creator = await browser.newContext();
  const api = await signUpThroughApi(creator, person);
  const workshop = await api.post('/workshops', { name: `Harrow Lane Garage ${run}`, slug: `harrow-play-${run}` });
  ids.workshopId = workshop.id;
  ids.workshopSlug = workshop.slug;
  ids.buildId = (await api.post(`/workshops/${ids.workshopId}/builds`, { title: 'Rear axle rebuild', vehicle: '1970s light truck' })).id;
  ids.footageId = await uploadClip(api, ids.workshopId, ids.buildId, hevc, { fileName: 'pinion-press.mov', contentType: 'video/quicktime' });
  ids.portraitId = await uploadClip(api, ids.workshopId, ids.buildId, portrait, { fileName: 'portrait-bench.mp4', contentType: 'video/mp4' });
  await api.put(`/workshops/${ids.workshopId}/footage/${ids.footageId}/transcript`, { text: TRANSCRIPT });
  const { footage } = await waitForRenditions(api, ids.footageId);
  ids.hevcFootage = footage;

  const guide = await api.post(`/workshops/${ids.workshopId}/builds/${ids.buildId}/guides`, {
    title,
    summary: '<p>Press the pinion bearing on square.</p>',
    footageId: ids.footageId,
    safetyTopics: ['pressing'],
    tools: ['Hydraulic press', 'Bearing splitter'],
    consumables: [],
  });
  ids.guideSlug = guide.slug;
  const steps = `/workshops/${ids.workshopId}/guides/${guide.id}/steps`;
  await api.post(steps, { title: 'Support the carrier', body: '<p>On the press bed.</p>', footageId: ids.footageId, startMs: 300 });
  await api.post(steps, { title: 'Press the bearing on', body: '<p>Cone first, square.</p>', footageId: ids.footageId, startMs: 3000 });
  await api.post(`/workshops/${ids.workshopId}/guides/${guide.id}/revisions`, { note: 'First edition' });
  await creator.close();
});

after(async () => {
  await browser?.close();
  rmSync(work, { recursive: true, force: true });
});

test('the pipeline shows the HEVC upload as a portrait-true, H.264-playable footage', () => {
  // The source is HEVC; the renditions made it playable without the creator choosing anything.
  assert.match(ids.hevcFootage.videoCodec ?? '', /hevc|h265/i);
  assert.equal(ids.hevcFootage.renditions.state, 'ready');
});

test('a signed-out reader plays the HEVC upload through HLS: picture, time advancing, steps following, captions, scrub preview', async () => {
  const reader = await browser.newContext({ viewport: { width: 1366, height: 900 } });
  const page = await reader.newPage();
  page.on('console', (message) => console.error(`[browser ${message.type()}] ${message.text()}`));
  page.on('requestfailed', (request) => console.error(`[request failed] ${request.url()} ${request.failure()?.errorText}`));
  page.on('response', (response) => {
    if (response.status() >= 400) console.error(`[response ${response.status()}] ${response.url()}`);
  });
  const guide = await page.request.get(`${baseUrl}/api/guides/${ids.workshopSlug}/${ids.guideSlug}`).then((response) => response.json());
  assert.ok(guide.footage.hlsUrl, 'the public guide names an HLS master');

  await page.goto(`${baseUrl}/guides/${ids.workshopSlug}/${ids.guideSlug}`);
  await page.getByRole('heading', { level: 1, name: title }).waitFor();
  const video = page.getByTestId('guide-video');
  await page.waitForFunction(() => document.querySelector('[data-testid="guide-video"]')?.readyState >= 2, null, { timeout: 30_000 });
  const stream = await video.getAttribute('data-stream');
  assert.ok(stream === 'hls.js' || stream === 'native-hls', `the player streams HLS (${stream})`);
  // The original bug: sound over a frozen poster. Now the picture decodes.
  const size = await video.evaluate((element) => [element.videoWidth, element.videoHeight]);
  assert.ok(size[0] > 0 && size[1] > 0, `the picture decodes (${size})`);

  await video.evaluate((element) => {
    element.muted = true;
    return element.play();
  });
  await page.waitForFunction(() => document.querySelector('[data-testid="guide-video"]').currentTime > 1, null, { timeout: 20_000 });
  const steps = page.getByTestId('guide-step');
  await page.locator('[data-testid="guide-step"][aria-current="step"]').filter({ hasText: 'Support the carrier' }).waitFor();
  await page.waitForFunction(() => document.querySelector('[data-testid="guide-video"]').currentTime > 3.3, null, { timeout: 20_000 });
  await page.locator('[data-testid="guide-step"][aria-current="step"]').filter({ hasText: 'Press the bearing on' }).waitFor();
  assert.equal(await steps.nth(0).getAttribute('aria-current'), null);

  // Captions stay with the renditions: the transcript track loads its cues.
  await page.waitForFunction(() => {
    const track = document.querySelector('[data-testid="guide-video"]').textTracks[0];
    return track && track.mode === 'showing' && track.cues && track.cues.length === 2;
  });

  // Hovering the seek bar shows the frame there, from the sprite sheet.
  const bar = page.getByTestId('scrub-bar');
  const box = await bar.boundingBox();
  await page.mouse.move(box.x + box.width * 0.6, box.y + box.height / 2);
  const tile = page.getByTestId('scrub-preview-tile');
  await tile.waitFor();
  const spriteLoads = await tile.evaluate((element) => {
    const url = getComputedStyle(element).backgroundImage.slice(5, -2);
    const image = new Image();
    image.src = url;
    return image.decode().then(() => image.naturalWidth > 0, () => false);
  });
  assert.ok(spriteLoads, 'the sprite sheet loads');
  await video.evaluate((element) => element.pause());
  await page.screenshot({ path: shotPath('public-hls'), fullPage: false });
  await reader.close();
});

for (const viewport of [
  { width: 1440, height: 900 },
  { width: 390, height: 844 },
]) {
  test(`a portrait clip in the marking workspace keeps the marking controls on screen at ${viewport.width}×${viewport.height}`, async () => {
    const context = await browser.newContext({ viewport });
    await signInAgain(context);
    const page = await context.newPage();
    await page.goto(`${baseUrl}/workshops/${ids.workshopId}/footage/${ids.portraitId}`);
    const frame = page.getByTestId('player-frame');
    await frame.waitFor();
    assert.equal(await frame.getAttribute('data-aspect'), '540 / 960', 'the frame is portrait, as the clip is shown');
    await page.waitForFunction(() => document.querySelector('[data-testid="footage-video"]')?.readyState >= 1, null, { timeout: 20_000 });
    const videoBox = await page.getByTestId('footage-video').boundingBox();
    assert.ok(videoBox.height > videoBox.width, `the video is taller than wide (${videoBox.width}×${videoBox.height})`);
    const pin = page.getByTestId('pin-mark');
    await pin.waitFor();
    const pinBox = await pin.boundingBox();
    assert.ok(pinBox.y + pinBox.height <= viewport.height, `the Pin button is on the first screen (bottom ${pinBox.y + pinBox.height} of ${viewport.height})`);
    const timeline = await page.getByTestId('marks-timeline').boundingBox();
    assert.ok(timeline.y + timeline.height <= viewport.height, 'the marking timeline is on the first screen');
    const name = `portrait-marking-${viewport.width}x${viewport.height}`;
    await page.screenshot({ path: shotPath(name), fullPage: false });
    if (process.env.FW_SCREENSHOTS_DIR) copyFileSync(shotPath(name), join(process.env.FW_SCREENSHOTS_DIR, `${name}.png`));
    await context.close();
  });
}

async function signInAgain(context) {
  const response = await context.request.post(`${baseUrl}/api/auth/login`, {
    data: { email: person.email, password: person.password },
    headers: { 'X-CSRF-Token': await csrfFor(context) },
  });
  assert.ok(response.ok(), `sign in: ${response.status()}`);
}

async function csrfFor(context) {
  await context.request.get(`${baseUrl}/api/auth/me`);
  return (await context.cookies(baseUrl)).find((cookie) => cookie.name === 'fw_csrf')?.value ?? '';
}
