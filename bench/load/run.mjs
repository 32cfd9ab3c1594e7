// Load on the public reads, with autocannon, against one API process of our own on loopback. The ceiling is
// the static index.html the same process serves; every route is printed as requests/s, p50/p99, unexpected
// answers and its ratio to that ceiling, at 50 and 200 connections. The follow-along read is measured twice:
// a full answer, and a revalidation with the ETag of the current answer (If-None-Match → 304, one indexed query).
// Run with: bash bench/run.sh load   (see the header of bench/run.sh); BENCH_SECONDS per route and level (default 8).
import { existsSync } from 'node:fs';
import autocannon from 'autocannon';
import { editorWithBuild, root, startApi } from '../lib/harness.mjs';

const SECONDS = Number(process.env.BENCH_SECONDS ?? 8);
const CONNECTION_LEVELS = [50, 200];
// As a browser asks: the API compresses JSON over 1 kB, the studio's index is sent precompressed.
const BROWSER_HEADERS = { accept: 'application/json, text/html', 'accept-encoding': 'gzip, br' };

/** A published guide to read: the first in the index (the demo's, after npm start), or one made here. */
async function publishedGuidePath(baseUrl) {
  const index = await (await fetch(`${baseUrl}/api/guides`)).json();
  if (index.length > 0) return `/api${index[0].path}`;
  const { api, workshopId, buildId } = await editorWithBuild(baseUrl, 'load');
  const base = `/workshops/${workshopId}`;
  const assembly = await api.post(`${base}/builds/${buildId}/assemblies`, { name: 'Coupler stack' });
  for (const title of ['Spline engages fully', 'Pilot bearing seats', 'Shaft length inside the window']) {
    await api.post(`${base}/assemblies/${assembly.id}/checks`, { title });
  }
  const guide = await api.post(`${base}/builds/${buildId}/guides`, { title: 'Fitting the motor coupler' });
  await api.request('PATCH', `${base}/guides/${guide.id}`, { assemblyId: assembly.id, summary: '<p>How the coupler goes on.</p>' });
  for (const title of ['Clean the spline', 'Seat the pilot bearing', 'Offer up the coupler', 'Torque the clamp bolts']) {
    await api.post(`${base}/guides/${guide.id}/steps`, { title });
  }
  await api.post(`${base}/guides/${guide.id}/revisions`, {});
  const workshop = await api.get(base);
  return `/api/guides/${workshop.slug}/${guide.slug}`;
}

async function currentTag(url) {
  const response = await fetch(url, { headers: BROWSER_HEADERS });
  const body = await response.arrayBuffer();
  const tag = response.headers.get('etag');
  if (!response.ok || !tag) throw new Error(`${url}: ${response.status}, ETag ${tag}`);
  return { tag, jsonBytes: body.byteLength };
}

function run(url, connections, headers, expectedStatus) {
  return new Promise((resolve, reject) => {
    autocannon({ url, connections, duration: SECONDS, headers: { ...BROWSER_HEADERS, ...headers } }, (error, result) => {
      if (error) return reject(error);
      const answered = Object.entries(result.statusCodeStats ?? {});
      const unexpected = answered.filter(([status]) => Number(status) !== expectedStatus).reduce((sum, [, stats]) => sum + stats.count, 0);
      resolve({
        perSecond: result.requests.average,
        p50: result.latency.p50,
        p99: result.latency.p99,
        unexpected: unexpected + result.errors + result.timeouts,
      });
    });
  });
}

async function main() {
  const studioDist = `${root}studio/dist`;
  if (!existsSync(`${studioDist}/index.html`)) throw new Error('studio/dist/index.html is missing: run `npm start` once (or `npm run build -w studio`)');
  // This process only: the calculator's per-address limit would otherwise answer 429 after 300 requests.
  const api = await startApi({ STUDIO_DIST: studioDist, TOOLS_RATE_LIMIT: '100000000' });
  try {
    const readPath = await publishedGuidePath(api.baseUrl);
    const read = await currentTag(`${api.baseUrl}${readPath}`);
    const index = await currentTag(`${api.baseUrl}/api/guides`);
    const routes = [
      { name: 'static index.html (ceiling)', path: '/', expected: 200 },
      { name: 'guide index', path: '/api/guides', expected: 200 },
      { name: 'guide index, If-None-Match', path: '/api/guides', headers: { 'if-none-match': index.tag }, expected: 304 },
      { name: 'follow-along read', path: readPath, expected: 200 },
      { name: 'follow-along, If-None-Match', path: readPath, headers: { 'if-none-match': read.tag }, expected: 304 },
      { name: 'fit calculator', path: '/api/tools/fits?size=25&unit=mm&hole=H7&shaft=g6', expected: 200 },
    ];
    console.log(`load: ${SECONDS} s per route and level, one API process (${api.baseUrl}), Node ${process.version}`);
    console.log(`follow-along read: ${readPath} (${read.jsonBytes} bytes of JSON before compression)`);
    for (const connections of CONNECTION_LEVELS) {
      // A short warm-up so the first route measured does not pay for the JIT and the connection pool.
      await run(`${api.baseUrl}${readPath}`, connections, {}, 200);
      const results = [];
      for (const route of routes) results.push({ ...route, ...(await run(`${api.baseUrl}${route.path}`, connections, route.headers ?? {}, route.expected)) });
      const ceiling = results[0].perSecond;
      console.log(`\n${connections} connections`);
      console.log('route                            req/s    p50 ms  p99 ms  unexpected  × ceiling');
      for (const result of results) {
        console.log(
          `${result.name.padEnd(30)} ${result.perSecond.toFixed(0).padStart(7)} ${String(result.p50).padStart(9)} ${String(result.p99).padStart(7)} ${String(result.unexpected).padStart(11)}  ${(result.perSecond / ceiling).toFixed(2).padStart(9)}`,
        );
      }
    }
  } finally {
    await api.stop();
  }
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
