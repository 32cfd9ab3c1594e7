/* global window, document -- the functions given to page.evaluate run in the browser */
// The studio at the size of real footage (issue 17), a smaller faithful version: through the API it makes a 3-hour
// footage (a generated tiny test pattern, never real footage) with a 3,000-cue transcript and 400 marks, and an
// 80-second footage shaped like the demo's (a cue every ~3.6 s, 10 marks) as the same-run baseline. Then, in
// headless Chromium at 1440×900, it opens each footage page and measures: time to the first cue drawn, DOM
// elements, and while the video plays for PLAY_SECONDS: main-thread busy ms per second (CDP TaskDuration) and long
// tasks (over 50 ms; the longest). Prints each figure and the big/baseline ratio (goals: ≤ 1.5, DOM ≤ 2 ×,
// no task over 200 ms during playback).
// Run with the app served on a test slot (builds, serves, stops after):
//   FW_TEST_SLOT=N bash scripts/journeys.sh bench/studio-scale/run.mjs
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { baseUrl, launchBrowser } from '../../studio/e2e/browser.mjs';
import { signUpThroughApi, uploadClip } from '../../studio/e2e/support.mjs';

const PLAY_SECONDS = Number(process.env.PLAY_SECONDS ?? 10);
const RUNS = Number(process.env.RUNS ?? 3);
const KINDS = ['part', 'measurement', 'check_evidence', 'step', 'caution', 'note'];
const run = `${Date.now().toString(36)}${Math.floor(Math.random() * 1e4)}`;

/** A test pattern of `seconds`, tiny (64×36, 1 fps) so three hours encode in seconds. */
function makeClip(folder, name, seconds) {
  const file = join(folder, `${name}.mp4`);
  execFileSync('ffmpeg', [
    '-v', 'error', '-y',
    '-f', 'lavfi', '-i', `testsrc2=duration=${seconds}:size=64x36:rate=1`,
    '-c:v', 'libx264', '-preset', 'ultrafast', '-pix_fmt', 'yuv420p', '-g', '10', '-movflags', '+faststart', file,
  ]);
  return file;
}

const vttTime = (ms) => new Date(ms).toISOString().slice(11, 23);

/** `count` cues, one every 3.6 s; every tenth mentions the spline, now and then a measurement the miner finds. */
function transcript(count) {
  const cues = Array.from({ length: count }, (_, index) => {
    const startMs = index * 3_600;
    const text =
      index % 10 === 0
        ? `Spline count check ${index}: twenty-one teeth on the shaft.`
        : index % 7 === 0
          ? `The bore measures fifteen thousandths over, take ${index}.`
          : `Shop talk while the fixture settles, take ${index}.`;
    return `${vttTime(startMs)} --> ${vttTime(startMs + 3_000)}\n${text}`;
  });
  return `WEBVTT\n\n${cues.join('\n\n')}\n`;
}

async function makeFootage(api, ids, folder, { name, seconds, cues, marks }) {
  const clip = makeClip(folder, name, seconds);
  const footageId = await uploadClip(api, ids.workshopId, ids.buildId, clip, { fileName: `${name}.mp4` });
  await api.put(`/workshops/${ids.workshopId}/footage/${footageId}/transcript`, { text: transcript(cues) });
  const spacing = Math.floor((seconds * 1000) / marks);
  for (let index = 0; index < marks; index += 1) {
    await api.post(`/workshops/${ids.workshopId}/footage/${footageId}/marks`, { startMs: index * spacing + 1_000, kind: KINDS[index % KINDS.length], label: `Mark ${index}` });
  }
  return footageId;
}

/** Opens the footage page and measures its load, its size and a stretch of playback. */
async function measure(context, workshopId, footageId) {
  const page = await context.newPage();
  await page.addInitScript(() => {
    window.__longTasks = [];
    new PerformanceObserver((list) => {
      for (const entry of list.getEntries()) window.__longTasks.push(entry.duration);
    }).observe({ type: 'longtask', buffered: true });
  });
  const cdp = await context.newCDPSession(page);
  await cdp.send('Performance.enable');
  const started = Date.now();
  await page.goto(`${baseUrl}/workshops/${workshopId}/footage/${footageId}`);
  await page.locator('[data-testid="transcript-cues"] button').first().waitFor({ timeout: 60_000 });
  const loadMs = Date.now() - started;
  await page.waitForFunction(() => document.querySelector('[data-testid="footage-video"]')?.readyState >= 2, null, { timeout: 60_000 });
  await page.waitForTimeout(500);
  const domElements = await page.evaluate(() => document.getElementsByTagName('*').length);
  const taskSeconds = async () => (await cdp.send('Performance.getMetrics')).metrics.find((metric) => metric.name === 'TaskDuration').value;
  await page.evaluate(() => {
    window.__longTasks = [];
  });
  const before = await taskSeconds();
  const playStarted = Date.now();
  const startPosition = await page.getByTestId('footage-video').evaluate(async (video) => {
    video.muted = true;
    await video.play();
    return video.currentTime;
  });
  await page.waitForTimeout(PLAY_SECONDS * 1000);
  const busyMs = ((await taskSeconds()) - before) * 1000;
  const wallSeconds = (Date.now() - playStarted) / 1000;
  const played = (await page.getByTestId('footage-video').evaluate((video) => video.currentTime)) - startPosition;
  const longTasks = await page.evaluate(() => window.__longTasks);
  await page.close();
  return { loadMs, domElements, busyMsPerSecond: busyMs / wallSeconds, longTasks: longTasks.length, longestTaskMs: Math.max(0, ...longTasks), playedSeconds: played };
}

const median = (values) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)];

const folder = mkdtempSync(join(tmpdir(), 'fitwright-studio-scale-'));
const browser = await launchBrowser();
try {
  const context = await browser.newContext({ viewport: { width: 1440, height: 900 } });
  const api = await signUpThroughApi(context, { displayName: 'Bench Fitter', email: `bench-scale-${run}@harrow-lane.example`, password: 'bench password 2026' });
  const ids = {};
  ids.workshopId = (await api.post('/workshops', { name: `Scale bench ${run}`, slug: `scale-bench-${run}` })).id;
  ids.buildId = (await api.post(`/workshops/${ids.workshopId}/builds`, { title: 'Three-hour session' })).id;
  console.log('making the footage (3 h with 3,000 cues and 400 marks; 80 s with 22 cues and 10 marks)…');
  const big = await makeFootage(api, ids, folder, { name: 'three-hour-session', seconds: 3 * 3600, cues: 3_000, marks: 400 });
  const small = await makeFootage(api, ids, folder, { name: 'eighty-second-clip', seconds: 80, cues: 22, marks: 10 });

  const results = { big: [], small: [] };
  for (let round = 0; round < RUNS; round += 1) {
    results.small.push(await measure(context, ids.workshopId, small));
    results.big.push(await measure(context, ids.workshopId, big));
  }
  const figures = [
    ['load to first cue, ms', 'loadMs', 1.5],
    ['DOM elements', 'domElements', 2],
    ['main-thread busy, ms per s of playback', 'busyMsPerSecond', 1.5],
    ['long tasks during playback', 'longTasks', null],
    ['longest task during playback, ms', 'longestTaskMs', null],
    ['seconds of video played', 'playedSeconds', null],
  ];
  console.log(`\nfootage page, medians of ${RUNS} runs, ${PLAY_SECONDS} s of playback each, Chromium 1440×900`);
  console.log('figure | 3 h | 80 s | ratio | goal');
  for (const [label, key, goal] of figures) {
    const b = median(results.big.map((result) => result[key]));
    const s = median(results.small.map((result) => result[key]));
    const ratio = s > 0 ? b / s : Number.NaN;
    console.log(`${label} | ${b.toFixed(1)} | ${s.toFixed(1)} | ${Number.isFinite(ratio) ? ratio.toFixed(2) : '–'} | ${goal ? `≤ ${goal}` : ''}`);
  }
  const longest = Math.max(...results.big.map((result) => result.longestTaskMs));
  console.log(`longest task while the 3 h footage played: ${longest.toFixed(0)} ms (goal: none over 200 ms)`);
} finally {
  await browser.close();
  rmSync(folder, { recursive: true, force: true });
}
