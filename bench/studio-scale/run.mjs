/* global window, document, requestAnimationFrame -- the functions given to page.evaluate run in the browser */
// The studio at the size of real footage (issue 17), a smaller faithful version: through the API it makes a 3-hour
// footage (a generated tiny test pattern, never real footage) with a 3,000-cue transcript and 400 marks, and an
// 80-second footage shaped like the demo's (a cue every ~3.6 s, 10 marks) as the same-run baseline. Then, in
// headless Chromium at 1440×900, it opens each footage page and measures: time to the first cue drawn, DOM
// elements, and while the video plays for PLAY_SECONDS: main-thread busy ms per second (CDP TaskDuration) and long
// tasks (over 50 ms; the longest), frames painted (requestAnimationFrame callbacks); then with the video paused:
// frames over 50 ms while scrolling the marks list and the transcript to their ends (and that each end's last row
// shows), pin-to-row (a click on the last mark's time until the transcript shows the cue playing there) and
// search-to-results (a common word typed until the first hit row shows). A guide on each footage (40 steps on the
// 3-hour one, 5 on the baseline) is timed in its editor and, published, on the public follow-along page (load to
// first step, DOM elements, busy ms per second of playback, long tasks). Prints each figure and the big/baseline
// ratio (goals: ≤ 1.5, DOM ≤ 2 ×, no task over 200 ms during playback, every list reaches its last item).
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

/** A guide on the footage with `steps` steps spread over it, published so its public page can be measured. */
async function makeGuide(api, ids, footageId, { title, seconds, steps }) {
  const guide = await api.post(`/workshops/${ids.workshopId}/builds/${ids.buildId}/guides`, { title, footageId, summary: '<p>Invented bench guide.</p>' });
  const spacing = Math.floor((seconds * 1000) / steps);
  for (let index = 0; index < steps; index += 1) {
    await api.post(`/workshops/${ids.workshopId}/guides/${guide.id}/steps`, {
      title: `Step ${index + 1}: check the spline and the bore`,
      body: `<p>Slide the coupler on by hand, then measure the bore (pass ${index + 1}).</p>`,
      footageId,
      startMs: index * spacing + 500,
    });
  }
  await api.post(`/workshops/${ids.workshopId}/guides/${guide.id}/revisions`, { note: 'Bench edition' });
  return { id: guide.id, slug: guide.slug };
}

/** Counts requestAnimationFrame callbacks and the gaps between them from now until `stop()` in the page. */
function installFrameCounter() {
  window.__frames = { count: 0, longFrames: 0, running: true, last: performance.now() };
  const tick = (now) => {
    const frames = window.__frames;
    if (!frames.running) return;
    frames.count += 1;
    if (now - frames.last > 50) frames.longFrames += 1;
    frames.last = now;
    requestAnimationFrame(tick);
  };
  requestAnimationFrame(tick);
}

/**
 * Scrolls the list at `selector` (or the box it scrolls in) to its end a screenful a frame (a person flinging
 * through it), then waits for the virtual list to draw and fetch its last rows. Says how many frames took over 50 ms
 * and whether the row `lastIndex` shows with its content (not a placeholder of a window still on its way).
 */
async function scrollToEnd(page, selector, lastIndex) {
  return page.evaluate(async ({ selector, lastIndex }) => {
    let scroller = document.querySelector(selector);
    while (scroller && scroller.scrollHeight <= scroller.clientHeight) scroller = scroller.parentElement;
    if (!scroller) return { longFrames: Number.NaN, longShare: Number.NaN, reachedLast: false };
    const frame = () => new Promise((resolve) => requestAnimationFrame(resolve));
    const lastShows = () => {
      const row = scroller.querySelector(`[data-index="${lastIndex}"]`);
      return row !== null && row.querySelector('[data-testid="transcript-cue-loading"]') === null && row.textContent.trim() !== '';
    };
    scroller.scrollTop = 0;
    let last = await frame();
    let longFrames = 0;
    let frames = 0;
    for (let step = 0; step < 1_000; step += 1) {
      const before = scroller.scrollTop;
      scroller.scrollTop += scroller.clientHeight;
      const now = await frame();
      frames += 1;
      if (now - last > 50) longFrames += 1;
      last = now;
      if (scroller.scrollTop === before) break;
    }
    // Rows measured on the way may grow the list, and windows arrive: keep at the end until the last row shows (≤ 5 s).
    const deadline = performance.now() + 5_000;
    while (!lastShows() && performance.now() < deadline) {
      scroller.scrollTop = scroller.scrollHeight;
      await new Promise((resolve) => setTimeout(resolve, 100));
    }
    return { longFrames, longShare: (100 * longFrames) / Math.max(1, frames), reachedLast: lastShows() };
  }, { selector, lastIndex });
}

/** Opens the footage page and measures its load, its size and a stretch of playback. */
async function measure(context, workshopId, footageId, { seconds, cues, marks }) {
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
  await page.evaluate(installFrameCounter);
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
  const framesPainted = await page.evaluate(() => {
    window.__frames.running = false;
    return window.__frames.count;
  });
  await page.getByTestId('footage-video').evaluate((video) => video.pause());

  // The marks list to its end, then a click on the last mark's time: until the transcript shows the cue playing there.
  const marksScroll = await scrollToEnd(page, '[data-testid="marks-list"]', marks - 1);
  const lastMark = page.getByTestId('mark-row').filter({ hasText: `Mark ${marks - 1}` });
  const pinStarted = Date.now();
  await lastMark.getByRole('button', { name: /^Jump to/ }).click();
  const cueAtMark = transcriptCueAt(markStartMs(marks - 1, seconds, marks));
  await page.locator(`[data-testid="transcript-cues"] [data-index="${cueAtMark}"] [data-active]`).waitFor({ timeout: 30_000 });
  const pinToRowMs = Date.now() - pinStarted;

  const transcriptScroll = await scrollToEnd(page, '[data-testid="transcript-cues"]', cues - 1);

  // A common word, typed as a person would, until the first hit row shows.
  const search = page.getByLabel('Search this transcript');
  const searchStarted = Date.now();
  await search.pressSequentially('spline');
  await page.locator('[data-testid="transcript-search-results"] button').first().waitFor({ timeout: 30_000 });
  const searchToResultsMs = Date.now() - searchStarted;
  await page.close();
  return {
    loadMs,
    domElements,
    busyMsPerSecond: busyMs / wallSeconds,
    longTasks: longTasks.length,
    longestTaskMs: Math.max(0, ...longTasks),
    playedSeconds: played,
    framesPainted,
    marksLongFrames: marksScroll.longFrames,
    marksLongShare: marksScroll.longShare,
    transcriptLongFrames: transcriptScroll.longFrames,
    transcriptLongShare: transcriptScroll.longShare,
    pinToRowMs,
    searchToResultsMs,
    reachedLast: { marks: marksScroll.reachedLast, transcript: transcriptScroll.reachedLast },
  };
}

/** The guide editor: load to the first step card, and DOM elements once every step is listed. */
async function measureEditor(context, workshopId, guide, steps) {
  const page = await context.newPage();
  const started = Date.now();
  await page.goto(`${baseUrl}/workshops/${workshopId}/guides/${guide.id}`);
  const shown = await page.getByTestId('step-card').first().waitFor({ timeout: 60_000 }).then(() => true, () => false);
  if (!shown) {
    // Said, not thrown: the other figures still count. What the page shows instead, to find out why.
    console.log(`guide editor (${steps} steps): no step card within 60 s; the page says: ${(await page.locator('main').innerText().catch(() => '')).slice(0, 300).replace(/\s+/g, ' ')}`);
    await page.close();
    return { loadMs: Number.NaN, domElements: Number.NaN };
  }
  const loadMs = Date.now() - started;
  await page.waitForFunction((count) => document.querySelectorAll('[data-testid="step-card"]').length >= count, steps, { timeout: 60_000 });
  await page.waitForTimeout(500);
  const domElements = await page.evaluate(() => document.getElementsByTagName('*').length);
  await page.close();
  return { loadMs, domElements };
}

/** The public follow-along page, signed out: load to the first step, DOM elements, and a stretch of playback. */
async function measurePublic(browser, workshopSlug, guide, cues) {
  const context = await browser.newContext({ viewport: { width: 1440, height: 900 } });
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
  await page.goto(`${baseUrl}/guides/${workshopSlug}/${guide.slug}`);
  await page.getByTestId('guide-step').first().waitFor({ timeout: 60_000 });
  const loadMs = Date.now() - started;
  const video = page.locator('[data-testid="guide-player"] video');
  await page.waitForFunction(() => document.querySelector('[data-testid="guide-player"] video')?.readyState >= 2, null, { timeout: 60_000 });
  await page.waitForTimeout(500);
  const domElements = await page.evaluate(() => document.getElementsByTagName('*').length);
  const taskSeconds = async () => (await cdp.send('Performance.getMetrics')).metrics.find((metric) => metric.name === 'TaskDuration').value;
  await page.evaluate(() => {
    window.__longTasks = [];
  });
  await page.evaluate(installFrameCounter);
  const before = await taskSeconds();
  const playStarted = Date.now();
  await video.evaluate(async (element) => {
    element.muted = true;
    await element.play();
  });
  await page.waitForTimeout(PLAY_SECONDS * 1000);
  const busyMs = ((await taskSeconds()) - before) * 1000;
  const wallSeconds = (Date.now() - playStarted) / 1000;
  const longTasks = await page.evaluate(() => window.__longTasks);
  const framesPainted = await page.evaluate(() => {
    window.__frames.running = false;
    return window.__frames.count;
  });
  await video.evaluate((element) => element.pause());
  const transcriptScroll = await scrollToEnd(page, '[data-testid="guide-transcript"] ul', cues - 1);
  await context.close();
  return {
    loadMs,
    domElements,
    busyMsPerSecond: busyMs / wallSeconds,
    longTasks: longTasks.length,
    longestTaskMs: Math.max(0, ...longTasks),
    framesPainted,
    transcriptLongFrames: transcriptScroll.longFrames,
    transcriptLongShare: transcriptScroll.longShare,
    reachedLast: { transcript: transcriptScroll.reachedLast },
  };
}

/** Where makeFootage put mark `index` of `marks` on a footage of `seconds`. */
function markStartMs(index, seconds, marks) {
  return index * Math.floor((seconds * 1000) / marks) + 1_000;
}

/** The cue playing at `ms` in transcript(): one every 3.6 s, 3 s long (the one before, between two). */
function transcriptCueAt(ms) {
  return Math.floor(ms / 3_600);
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
  console.log('making the footage (3 h with 3,000 cues and 400 marks; 80 s with 22 cues and 10 marks) and a guide on each (40 and 5 steps)…');
  const shapes = {
    big: { name: 'three-hour-session', seconds: 3 * 3600, cues: 3_000, marks: 400, steps: 40 },
    small: { name: 'eighty-second-clip', seconds: 80, cues: 22, marks: 10, steps: 5 },
  };
  const footage = {};
  const guides = {};
  for (const [size, shape] of Object.entries(shapes)) {
    footage[size] = await makeFootage(api, ids, folder, shape);
    guides[size] = await makeGuide(api, ids, footage[size], { title: `${shape.name} guide ${run}`, seconds: shape.seconds, steps: shape.steps });
  }
  const workshopSlug = `scale-bench-${run}`;

  const results = { big: [], small: [] };
  const editor = { big: [], small: [] };
  const reader = { big: [], small: [] };
  for (let round = 0; round < RUNS; round += 1) {
    for (const size of ['small', 'big']) {
      results[size].push(await measure(context, ids.workshopId, footage[size], shapes[size]));
      editor[size].push(await measureEditor(context, ids.workshopId, guides[size], shapes[size].steps));
      reader[size].push(await measurePublic(browser, workshopSlug, guides[size], shapes[size].cues));
      const rounded = (result) => JSON.stringify(result, (key, value) => (typeof value === 'number' ? Math.round(value * 10) / 10 : value));
      console.log(`round ${round + 1} ${size}: footage ${rounded(results[size].at(-1))} editor ${rounded(editor[size].at(-1))} public ${rounded(reader[size].at(-1))}`);
    }
  }
  const table = (title, sets, figures) => {
    console.log(`\n${title}`);
    console.log('figure | 3 h | 80 s | ratio | goal');
    for (const [label, key, goal] of figures) {
      const b = median(sets.big.map((result) => result[key]));
      const s = median(sets.small.map((result) => result[key]));
      const ratio = s > 0 ? b / s : Number.NaN;
      console.log(`${label} | ${b.toFixed(1)} | ${s.toFixed(1)} | ${Number.isFinite(ratio) ? ratio.toFixed(2) : '–'} | ${goal ?? ''}`);
    }
  };
  const playback = [
    ['main-thread busy, ms per s of playback', 'busyMsPerSecond', '≤ 1.5'],
    ['frames painted during playback', 'framesPainted', '≥ 0.67'],
    ['long tasks during playback', 'longTasks', null],
    ['longest task during playback, ms', 'longestTaskMs', null],
  ];
  table(`footage page, medians of ${RUNS} runs, ${PLAY_SECONDS} s of playback each, Chromium 1440×900`, results, [
    ['load to first cue, ms', 'loadMs', '≤ 1.5'],
    ['DOM elements', 'domElements', '≤ 2'],
    ...playback,
    ['seconds of video played', 'playedSeconds', null],
    ['frames over 50 ms scrolling the marks list to its end', 'marksLongFrames', null],
    ['share of those frames over 50 ms, %', 'marksLongShare', '≤ 1.5'],
    ['frames over 50 ms scrolling the transcript to its end', 'transcriptLongFrames', null],
    ['share of those frames over 50 ms, %', 'transcriptLongShare', '≤ 1.5'],
    ['pin-to-row (last mark clicked until its cue row shows), ms', 'pinToRowMs', '≤ 1.5'],
    ['search-to-results ("spline" typed until the first hit row), ms', 'searchToResultsMs', '≤ 1.5'],
  ]);
  table(`guide editor (40 steps against 5), medians of ${RUNS} runs`, editor, [
    ['load to first step, ms', 'loadMs', '≤ 1.5'],
    ['DOM elements, every step listed', 'domElements', '≤ 2'],
  ]);
  table(`public follow-along page, signed out, medians of ${RUNS} runs, ${PLAY_SECONDS} s of playback each`, reader, [
    ['load to first step, ms', 'loadMs', '≤ 1.5'],
    ['DOM elements', 'domElements', '≤ 2'],
    ...playback,
    ['frames over 50 ms scrolling the transcript to its end', 'transcriptLongFrames', null],
    ['share of those frames over 50 ms, %', 'transcriptLongShare', '≤ 1.5'],
  ]);
  const longest = Math.max(...results.big.map((result) => result.longestTaskMs));
  const longestPublic = Math.max(...reader.big.map((result) => result.longestTaskMs));
  console.log(`\nlongest task while the 3 h footage played: ${longest.toFixed(0)} ms on the footage page, ${longestPublic.toFixed(0)} ms on the public page (goal: none over 200 ms)`);
  const unreached = [];
  for (const size of ['big', 'small']) {
    for (const [page, sets] of [['footage page', results[size]], ['public page', reader[size]]]) {
      for (const result of sets) {
        for (const [list, reached] of Object.entries(result.reachedLast)) if (!reached) unreached.push(`${size} ${page} ${list}`);
      }
    }
  }
  console.log(unreached.length === 0 ? 'every list reached its last item (marks, transcript, public transcript; every run)' : `lists that did not show their last item: ${[...new Set(unreached)].join(', ')}`);
} finally {
  await browser.close();
  rmSync(folder, { recursive: true, force: true });
}
