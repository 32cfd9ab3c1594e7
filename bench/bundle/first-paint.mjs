// First paint of the public routes on a throttled phone profile (issue #12): per route, the bytes a reader's browser
// has fetched when the first contentful paint happens (budget ≤ 80 KB compressed) and that paint's time, beside a
// static HTML page of the same guide's title and poster served in the same run (goal ≤ 1.5 × that page).
// Needs the services (bash bench/run.sh bundle [dev|test]); run.mjs calls it after the size report.
import { createServer } from 'node:http';
import { loadavg } from 'node:os';
import { startApi } from '../lib/harness.mjs';
import { launchBrowser } from '../../studio/e2e/browser.mjs';

/** A phone on a middling mobile link: 4 Mbit/s down, 1 Mbit/s up, 150 ms round trip; its CPU 4× slower than this box's. */
export const PHONE = { downloadBitsPerSecond: 4_000_000, uploadBitsPerSecond: 1_000_000, latencyMs: 150, cpuSlowdown: 4 };
export const FIRST_PAINT_BUDGET_BYTES = 80 * 1024;
export const FIRST_PAINT_GOAL_RATIO = 1.5;
const RUNS = Number(process.env.BENCH_PAINT_RUNS ?? 5);

const escapeHtml = (text) => text.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]);
const median = (values) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)];

/** One cold load (a fresh context: empty cache) under the phone profile: FCP in ms and the bytes of responses finished by then. */
async function coldLoad(browser, url) {
  const context = await browser.newContext({ viewport: { width: 412, height: 915 }, isMobile: true, deviceScaleFactor: 1 });
  try {
    const page = await context.newPage();
    const cdp = await context.newCDPSession(page);
    await cdp.send('Network.enable');
    await cdp.send('Network.emulateNetworkConditions', {
      offline: false,
      latency: PHONE.latencyMs,
      downloadThroughput: PHONE.downloadBitsPerSecond / 8,
      uploadThroughput: PHONE.uploadBitsPerSecond / 8,
    });
    await cdp.send('Emulation.setCPUThrottlingRate', { rate: PHONE.cpuSlowdown });
    // Bytes on the wire per request (compressed, headers included), keyed by the URL the page asked for (before redirects).
    const firstUrl = new Map();
    const bytesByUrl = new Map();
    cdp.on('Network.requestWillBeSent', ({ requestId, request }) => {
      if (!firstUrl.has(requestId)) firstUrl.set(requestId, request.url);
    });
    cdp.on('Network.loadingFinished', ({ requestId, encodedDataLength }) => {
      const url = firstUrl.get(requestId);
      if (url) bytesByUrl.set(url, (bytesByUrl.get(url) ?? 0) + encodedDataLength);
    });
    await page.goto(url, { waitUntil: 'load', timeout: 120_000 });
    const fcp = await page.waitForFunction(() => performance.getEntriesByName('first-contentful-paint')[0]?.startTime, null, { timeout: 60_000 });
    const fcpMs = await fcp.jsonValue();
    // Which responses had ended by the paint (Resource Timing's responseEnd is given for every origin).
    const { ended, firstByteMs } = await page.evaluate((paint) => {
      const navigation = performance.getEntriesByType('navigation')[0];
      const resources = performance.getEntriesByType('resource').filter((entry) => entry.responseEnd <= paint);
      return {
        ended: [...(navigation && navigation.responseEnd <= paint ? [navigation.name] : []), ...resources.map((entry) => entry.name)],
        // When the page's first byte came: what the server and the link take before the browser can draw anything.
        firstByteMs: navigation?.responseStart ?? 0,
      };
    }, fcpMs);
    const bytesBeforePaint = ended.reduce((sum, name) => sum + (bytesByUrl.get(name) ?? 0), 0);
    return { fcpMs, firstByteMs, bytesBeforePaint, files: ended.length };
  } finally {
    await context.close();
  }
}

/** A plain page of the guide's title and poster, the baseline the follow-along page's first paint is held against. */
function startStaticPage(title, posterUrl) {
  const html =
    `<!doctype html><html lang="en"><head><meta charset="UTF-8" /><meta name="viewport" content="width=device-width, initial-scale=1.0" />` +
    `<title>${escapeHtml(title)}</title></head><body><h1>${escapeHtml(title)}</h1>` +
    `<img src="${escapeHtml(posterUrl)}" alt="" width="960" height="540" style="width:100%;height:auto" /></body></html>`;
  const server = createServer((_request, response) => {
    response.writeHead(200, { 'Content-Type': 'text/html; charset=utf-8', 'Cache-Control': 'no-cache' });
    response.end(html);
  });
  return new Promise((resolve) => server.listen(0, '127.0.0.1', () => resolve({ url: `http://127.0.0.1:${server.address().port}/`, close: () => server.close() })));
}

export async function reportFirstPaint(studioDist) {
  const api = await startApi({ STUDIO_DIST: studioDist });
  const browser = await launchBrowser();
  try {
    const guides = await (await fetch(`${api.baseUrl}/api/guides`)).json();
    const guide = guides.find((item) => item.posterUrl) ?? guides[0];
    if (!guide) {
      console.log('first paint: no published guide in this database (npm start loads the demo one); skipped');
      return;
    }
    const staticPage = await startStaticPage(guide.title, `${api.baseUrl}${guide.posterUrl ?? '/favicon.svg'}`);
    const routes = [
      { label: 'static page (title + poster)', url: staticPage.url },
      { label: '/guides', url: `${api.baseUrl}/guides` },
      { label: `${guide.path} (follow-along)`, url: `${api.baseUrl}${guide.path}`, baseline: true },
      { label: '/unsubscribe', url: `${api.baseUrl}/unsubscribe` },
      { label: '/fit-finder', url: `${api.baseUrl}/fit-finder` },
    ];
    console.log(
      `\nfirst contentful paint, cold cache, phone profile (${PHONE.downloadBitsPerSecond / 1e6} Mbit/s, ${PHONE.latencyMs} ms RTT, CPU ${PHONE.cpuSlowdown}× slower), ` +
        `median of ${RUNS}; bytes = compressed responses finished before the paint (budget ≤ ${FIRST_PAINT_BUDGET_BYTES / 1024} KB); ` +
        `load average ${loadavg().map((value) => value.toFixed(1)).join(', ')}`,
    );
    const results = [];
    for (const route of routes) {
      const loads = [];
      for (let run = 0; run < RUNS; run += 1) loads.push(await coldLoad(browser, route.url));
      results.push({ ...route, fcpMs: median(loads.map((load) => load.fcpMs)), firstByteMs: median(loads.map((load) => load.firstByteMs)), bytes: median(loads.map((load) => load.bytesBeforePaint)), files: median(loads.map((load) => load.files)) });
    }
    const staticFcp = results[0].fcpMs;
    for (const result of results) {
      const ratio = result.fcpMs / staticFcp;
      const budget = result.bytes <= FIRST_PAINT_BUDGET_BYTES ? 'within' : 'OVER';
      const goal = result.baseline ? ` (goal ≤ ${FIRST_PAINT_GOAL_RATIO}×: ${ratio <= FIRST_PAINT_GOAL_RATIO ? 'met' : 'NOT met'})` : '';
      console.log(
        `${result.label.padEnd(48)} FCP ${String(Math.round(result.fcpMs)).padStart(5)} ms (first byte ${String(Math.round(result.firstByteMs)).padStart(4)} ms)  ${ratio.toFixed(2)}× static${goal}  ` +
          `before paint ${(result.bytes / 1024).toFixed(1).padStart(6)} KB in ${result.files} files (${budget})`,
      );
    }
    console.log(`load average at the end: ${loadavg().map((value) => value.toFixed(1)).join(', ')}`);
    staticPage.close();
  } finally {
    await browser.close();
    await api.stop();
  }
}
