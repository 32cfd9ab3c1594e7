// Footage journey: a creator drops a generated clip on the build's Dropzone, watches it upload straight to
// storage (progress, pause, resume), waits for it to be processed, attaches a transcript, plays the video,
// and jumps around it from the transcript and its search.
import assert from 'node:assert/strict';
import { execFileSync } from 'node:child_process';
import { copyFileSync, mkdirSync, mkdtempSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { after, before, test } from 'node:test';
import { baseUrl, launchBrowser } from './browser.mjs';
import { signUpThroughApi } from './support.mjs';

const screenshots = new URL('./screenshots/', import.meta.url);
mkdirSync(screenshots, { recursive: true });
const shot = (page, name) => page.screenshot({ path: new URL(`footage-${name}.png`, screenshots).pathname, fullPage: true });

const run = `${Date.now().toString(36)}${Math.floor(Math.random() * 1e4)}`;
const person = { displayName: 'Rowan Avery', email: `rowan-footage-${run}@harrow-lane.example`, password: 'journey password 2026' };

// Invented narration for the generated clip (DESIGN.md's demo scenario).
const TRANSCRIPT = `WEBVTT

00:00:00.500 --> 00:00:03.000
Here is the twenty-one tooth coupler.

00:00:03.000 --> 00:00:06.000
The spline slides onto the gearbox input shaft.

00:00:06.000 --> 00:00:09.000
Next the pilot bearing bore, fifteen thousandths over.

00:00:09.000 --> 00:00:11.500
Driveshaft length sits inside the window.
`;

/** A 12 s lossless test pattern (about 20 MB: three 8 MiB parts), made on the spot; never real footage. */
function makeClip() {
  const file = join(mkdtempSync(join(tmpdir(), 'fitwright-e2e-')), 'coupler-spline-check.mp4');
  execFileSync('ffmpeg', [
    '-v', 'error', '-y',
    '-f', 'lavfi', '-i', 'testsrc2=duration=12:size=1280x720:rate=25',
    '-f', 'lavfi', '-i', 'sine=frequency=330:duration=12',
    '-c:v', 'libx264', '-preset', 'ultrafast', '-qp', '0', '-pix_fmt', 'yuv420p',
    '-c:a', 'aac', '-shortest', '-movflags', '+faststart', file,
  ]);
  return file;
}

/** Sets up through the API, as the accounts journey already covers the screens: account, workshop, build. */
async function setUp(context) {
  const api = await signUpThroughApi(context, person);
  const workshop = await api.post('/workshops', { name: `Harrow Lane Garage ${run}`, slug: `harrow-footage-${run}` });
  const build = await api.post(`/workshops/${workshop.id}/builds`, { title: 'Motor-to-gearbox coupler', vehicle: '1980s compact pickup, electric conversion' });
  return { workshopId: workshop.id, buildId: build.id };
}

let browser;
let context;
let page;
let ids;
let clip;
before(async () => {
  clip = makeClip();
  browser = await launchBrowser();
  context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
  page = await context.newPage();
  ids = await setUp(context);
});
after(async () => {
  await browser?.close();
  if (clip) rmSync(join(clip, '..'), { recursive: true, force: true });
});

test('a wrong file is refused before any byte is sent', async () => {
  await page.goto(`${baseUrl}/workshops/${ids.workshopId}/builds/${ids.buildId}`);
  await page.getByText('Drop footage here, or click to choose files').waitFor();
  const uploads = [];
  page.on('request', (request) => {
    if (request.method() === 'PUT' || request.url().includes('/footage')) uploads.push(request.url());
  });
  await page.locator('[data-testid="footage-dropzone"] input[type=file]').setInputFiles({
    name: 'shop-notes.txt',
    mimeType: 'text/plain',
    buffer: Buffer.from('not a video'),
  });
  await page.getByText('"shop-notes.txt" is not a video file we accept. Choose .mp4, .mov, .webm, .mkv.').waitFor();
  assert.deepEqual(uploads.filter((url) => !url.includes('footage-limits')), []);
  await page.getByRole('button', { name: 'Dismiss' }).click();
});

test('a clip uploads straight to storage with progress, pause and resume, then is processed', async () => {
  // Slow the upload down to a home connection's pace so its progress can be seen (Chromium's DevTools throttling).
  const cdp = await context.newCDPSession(page);
  await cdp.send('Network.enable');
  await cdp.send('Network.emulateNetworkConditions', { offline: false, latency: 5, downloadThroughput: -1, uploadThroughput: 4 * 1024 * 1024 });

  const storagePuts = [];
  page.on('request', (request) => {
    if (request.method() === 'PUT' && request.url().includes('partNumber=')) storagePuts.push(new URL(request.url()).origin);
  });
  await page.locator('[data-testid="footage-dropzone"] input[type=file]').setInputFiles(clip);

  const progress = page.getByTestId('upload-progress');
  await progress.waitFor();
  await page.waitForFunction(() => /[1-9]\d* %/.test(document.querySelector('[data-testid="upload-bytes"]')?.textContent ?? ''));
  await page.getByTestId('upload-speed').filter({ hasText: /\/s · / }).waitFor();
  await shot(page, '01-uploading');
  const bytesText = await page.getByTestId('upload-bytes').textContent();
  assert.match(bytesText, /^[\d.]+ (kB|MB) of 2\d\.\d MB · \d+ %$/);

  await progress.getByRole('button', { name: 'Pause' }).click();
  await page.locator('[data-testid="upload-progress"][data-phase="paused"]').waitFor();
  await shot(page, '02-paused');
  await progress.getByRole('button', { name: 'Resume' }).click();

  await cdp.send('Network.emulateNetworkConditions', { offline: false, latency: 0, downloadThroughput: -1, uploadThroughput: -1 });
  const card = page.getByTestId('footage-card').filter({ hasText: 'coupler-spline-check' });
  await card.locator('[data-state="ready"]').waitFor({ timeout: 60_000 });
  assert.ok(storagePuts.length >= 3, 'every part went to storage');
  assert.ok(storagePuts.every((origin) => origin !== baseUrl), 'no part went through the app');
  await card.getByRole('img', { name: /Poster frame/ }).waitFor();
  assert.equal(await card.getByText('0:12').count(), 1);
  await shot(page, '03-ready');
  assert.ok(statSync(clip).size > 16 * 1024 * 1024);
});

test('the player shows the video with its transcript, and the transcript jumps the player', async () => {
  await page.getByTestId('footage-card').filter({ hasText: 'coupler-spline-check' }).getByRole('link', { name: 'coupler-spline-check', exact: true }).click();
  const video = page.getByTestId('footage-video');
  await video.waitFor();
  await page.waitForFunction(() => document.querySelector('[data-testid="footage-video"]')?.readyState >= 1);
  assert.equal(Math.round(await video.evaluate((element) => element.duration)), 12);

  // Attach a transcript with a mistake first: the line is named and nothing is stored.
  await page.getByRole('button', { name: 'Attach transcript' }).click();
  await page.getByText('Paste text').click();
  await page.getByLabel('Transcript', { exact: true }).fill(TRANSCRIPT.replace('00:00:03.000 --> 00:00:06.000', '00:00:03.000 -> 00:00:06.000'));
  await page.getByRole('button', { name: 'Attach transcript' }).last().click();
  await page.getByTestId('transcript-error').filter({ hasText: 'Line 6: expected a cue timing' }).waitFor();
  await shot(page, '04-transcript-error');
  await page.getByLabel('Transcript', { exact: true }).fill(TRANSCRIPT);
  await page.getByRole('button', { name: 'Attach transcript' }).last().click();
  await page.getByText('Revision 1 · 4 cues · WebVTT').waitFor();

  // The captions track is the exported WebVTT.
  await page.waitForFunction(() => {
    const track = document.querySelector('[data-testid="footage-video"]')?.textTracks[0];
    return track && track.cues && track.cues.length === 4;
  });

  await video.evaluate((element) => {
    element.muted = true;
    return element.play();
  });
  await page.waitForFunction(() => document.querySelector('[data-testid="footage-video"]').currentTime > 0.3);

  // Click a cue: the player seeks there and the cue is highlighted.
  await page.getByRole('button', { name: /Next the pilot bearing bore/ }).click();
  await page.waitForFunction(() => {
    const element = document.querySelector('[data-testid="footage-video"]');
    return element.currentTime >= 6 && element.currentTime < 8 && element.readyState >= 2;
  });
  await page.locator('[data-active]').filter({ hasText: 'pilot bearing bore' }).waitFor();

  // Search, then jump from a result.
  await page.getByLabel('Search this transcript').fill('driveshaft');
  const result = page.getByTestId('transcript-search-results').getByRole('button', { name: /Driveshaft length/ });
  await result.waitFor();
  await result.click();
  await page.waitForFunction(() => {
    const element = document.querySelector('[data-testid="footage-video"]');
    return element.currentTime >= 9 && element.currentTime < 11.5 && !element.seeking && element.readyState >= 2;
  });
  await video.evaluate((element) => element.pause());
  // Let the frame and the caption of the new position paint before the picture is taken.
  await page.waitForFunction(() => {
    const track = document.querySelector('[data-testid="footage-video"]').textTracks[0];
    return [...(track.activeCues ?? [])].some((cue) => cue.text.startsWith('Driveshaft'));
  });
  await page.waitForTimeout(300);
  await page.getByLabel('Search this transcript').fill('');
  await page.locator('[data-active]').filter({ hasText: 'Driveshaft length' }).waitFor();
  await shot(page, '05-player');
});

test('after a reload, the interrupted upload resumes from the parts the server recorded once the file is chosen again', async () => {
  await page.goto(`${baseUrl}/workshops/${ids.workshopId}/builds/${ids.buildId}`);
  const second = join(clip, '..', 'pilot-bore-check.mp4');
  copyFileSync(clip, second);
  const cdp = await context.newCDPSession(page);
  await cdp.send('Network.enable');
  await cdp.send('Network.emulateNetworkConditions', { offline: false, latency: 5, downloadThroughput: -1, uploadThroughput: 2 * 1024 * 1024 });
  await page.locator('[data-testid="footage-dropzone"] input[type=file]').setInputFiles(second);
  await page.getByTestId('upload-progress').filter({ hasText: 'pilot-bore-check.mp4' }).waitFor();

  // Wait until the server has recorded a finished part, then reload mid-upload.
  const api = context.request;
  let footage;
  for (const deadline = Date.now() + 30_000; Date.now() < deadline; await page.waitForTimeout(100)) {
    const list = await (await api.get(`${baseUrl}/api/workshops/${ids.workshopId}/builds/${ids.buildId}/footage`)).json();
    footage = list.find((item) => item.originalName === 'pilot-bore-check.mp4');
    if (footage?.upload?.completedPartCount >= 1) break;
  }
  assert.ok(footage.upload.completedPartCount >= 1 && footage.upload.completedPartCount < footage.upload.partCount, 'reloaded part-way');
  await page.reload();
  await cdp.send('Network.emulateNetworkConditions', { offline: false, latency: 0, downloadThroughput: -1, uploadThroughput: -1 });

  const card = page.getByTestId('footage-card').filter({ hasText: 'pilot-bore-check' });
  await card.getByText(/Upload interrupted at \d+ %/).waitFor();
  await card.getByText('browsers cannot reopen a file by themselves', { exact: false }).waitFor();
  await shot(page, '06-interrupted');

  // A different file is refused; the same file continues with the parts still missing.
  const resumedParts = [];
  page.on('request', (request) => {
    if (request.method() === 'PUT' && request.url().includes('partNumber=')) resumedParts.push(Number(new URL(request.url()).searchParams.get('partNumber')));
  });
  await card.locator('input[type=file]').setInputFiles({ name: 'other.mp4', mimeType: 'video/mp4', buffer: Buffer.alloc(1000) });
  await page.getByText(/That is not the same file/).waitFor();
  await card.locator('input[type=file]').setInputFiles(second);
  await card.locator('[data-state="ready"]').waitFor({ timeout: 60_000 });
  assert.equal(resumedParts.length, footage.upload.partCount - footage.upload.completedPartCount, `only the missing parts were sent (${resumedParts})`);
});
