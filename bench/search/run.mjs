// Search benchmark: 10,000 generated published guides with 1,000,000 transcript cues (invented shop
// talk), bulk-inserted straight into a bench database (never through the API), then 200 varied
// queries timed three ways in the same run:
//   - GET /api/search (every public kind: guide words, parts by FULLTEXT or part number, cues; counts
//     per kind, one page with snippets) through our own API process;
//   - the fit finder (GET /api/fit-finder by spline teeth and pitch; FINDER_PATH overrides the path,
//     with {teeth} and {pitch} placeholders, or "none" skips it): 200 varied spline questions;
//   - the baseline: a plain FULLTEXT `MATCH … AGAINST` on transcript_cues, best 20 by relevance, through
//     one mysql2 connection (no HTTP, no joins, no counts, no snippets).
// Goal: p95 < 150 ms and ≤ 2 × the baseline's p95.
//
// Run with: DB_NAME=fitwright_bench_search bash bench/run.sh search test   (FW_TEST_SLOT=N for a slot)
// It refuses any DB_NAME without "bench" in it: generation empties the tables it fills.
// BENCH_GUIDES (default 10000) and BENCH_CUES_PER_GUIDE (default 100) shrink the data for a quick try;
// BENCH_QUERIES (default 200). The data is kept between runs (regenerated when the sizes differ).
import { createRequire } from 'node:module';
import { randomUUID } from 'node:crypto';
import { loadavg } from 'node:os';
import { median, root, startApi } from '../lib/harness.mjs';

const require = createRequire(`${root}api/package.json`);
const mysql = require('mysql2/promise');

const GUIDES = Number(process.env.BENCH_GUIDES ?? 10_000);
const CUES_PER_GUIDE = Number(process.env.BENCH_CUES_PER_GUIDE ?? 100);
const QUERIES = Number(process.env.BENCH_QUERIES ?? 200);
const WORKSHOPS = 100;
const DB_NAME = process.env.DB_NAME ?? '';
if (!/bench/u.test(DB_NAME)) {
  console.error(`bench/search fills its own database: run it with DB_NAME=fitwright_bench_search (DB_NAME is "${DB_NAME}")`);
  process.exit(2);
}

/** Deterministic pseudo-random numbers, so every run generates the same data and the same queries. */
function generator(seed) {
  let state = seed;
  return () => {
    state = (state * 1_103_515_245 + 12_345) % 2 ** 31;
    return state / 2 ** 31;
  };
}

// Shop talk: common trade words (frequent), and a long tail of invented maker and model words (rare),
// drawn Zipf-like so that queries range from thousands of hits to a handful.
const TRADE = (
  'spline coupler gearbox input shaft pilot bearing bore nose micrometer caliper feeler gauge thousandths tenths ' +
  'millimetres inch clearance interference press slip yoke driveshaft length window plunge margin bump droop ' +
  'adapter plate register motor bell housing torque bolt washer key screw chamfer runout dial indicator seal ' +
  'bushing sleeve collar flange hub axle differential pinion carrier bracket mount spacer shim circlip grease'
).split(' ');
const SYLLABLES = 'ka ro mi ten vor lun bex dra sil cor qua zen tam pri fol nek'.split(' ');
const RARE = Array.from({ length: 4_000 }, (_, index) => {
  let word = '';
  let value = index + 17;
  for (let part = 0; part < 3; part += 1) {
    word += SYLLABLES[value % SYLLABLES.length];
    value = Math.floor(value / SYLLABLES.length) + part * 7;
  }
  return `${word}${index % 10}`;
});

function word(next) {
  if (next() < 0.85) return TRADE[Math.floor(next() ** 2 * TRADE.length)];
  return RARE[Math.floor(next() ** 3 * RARE.length)];
}

const sentence = (next, min, spread) => Array.from({ length: min + Math.floor(next() * spread) }, () => word(next)).join(' ');

async function generated(connection) {
  const [rows] = await connection.query("SELECT COUNT(*) AS guides, (SELECT COUNT(*) FROM transcript_cues) AS cues FROM guides WHERE slug LIKE 'bench-%'");
  return { guides: Number(rows[0].guides), cues: Number(rows[0].cues) };
}

async function insertRows(connection, table, columns, rows, batch = 2_000) {
  for (let start = 0; start < rows.length; start += batch) {
    const slice = rows.slice(start, start + batch);
    await connection.query(`INSERT INTO ${table} (${columns.join(', ')}) VALUES ?`, [slice]);
  }
}

async function generate(connection) {
  const next = generator(20_261_204);
  console.log(`generating ${GUIDES.toLocaleString('en')} published guides with ${(GUIDES * CUES_PER_GUIDE).toLocaleString('en')} cues…`);
  const started = Date.now();
  await connection.query('SET FOREIGN_KEY_CHECKS = 0');
  for (const table of [
    'transcript_cues', 'transcripts', 'guide_revision_search', 'guide_revisions', 'guide_steps', 'guides', 'fit_check_events',
    'fit_check_evidence', 'fit_checks', 'assembly_interfaces', 'assembly_parts', 'assemblies', 'part_features', 'parts',
    'marks', 'mark_suggestions', 'footage', 'builds', 'workshop_members', 'workshops',
  ]) {
    await connection.query(`DELETE FROM ${table}`);
  }
  // The cue index is built once after loading: maintaining it row by row would take most of the time.
  await connection.query('ALTER TABLE transcript_cues DROP INDEX IF EXISTS ft_cues_text');

  const workshops = Array.from({ length: WORKSHOPS }, (_, index) => [randomUUID(), `bench-shop-${index}`, `Bench Shop ${index}`]);
  await insertRows(connection, 'workshops', ['id', 'slug', 'name'], workshops);
  const vehicles = ['compact pickup', 'estate car', 'roadster', 'utility van', 'hatchback', 'off-road wagon'];
  const now = new Date();
  const rows = { builds: [], footage: [], transcripts: [], parts: [], features: [], assemblies: [], assemblyParts: [], interfaces: [], checks: [], guides: [], revisions: [], search: [] };
  for (let index = 0; index < GUIDES; index += 1) {
    const workshopId = workshops[index % WORKSHOPS][0];
    const buildId = randomUUID();
    const footageId = randomUUID();
    const transcriptId = randomUUID();
    const assemblyId = randomUUID();
    const guideId = randomUUID();
    const revisionId = randomUUID();
    const title = `${word(next)} ${word(next)} ${['install', 'swap', 'fit-up', 'rebuild'][index % 4]} ${index}`;
    rows.builds.push([buildId, workshopId, `Build ${title}`, vehicles[index % vehicles.length], sentence(next, 6, 6)]);
    rows.footage.push([footageId, workshopId, buildId, `Footage ${title}`, 'bench.mp4', 'video/mp4', 1, `bench/${footageId}`, 'ready', CUES_PER_GUIDE * 4000]);
    rows.transcripts.push([transcriptId, workshopId, footageId, 1, 'webvtt', '', CUES_PER_GUIDE, 1]);
    const teeth = [10, 21, 23, 24, 27, 29, 31][index % 7];
    const partIds = [randomUUID(), randomUUID()];
    const featureIds = [randomUUID(), randomUUID()];
    partIds.forEach((partId, side) => {
      const partNumber = `BN-${String(index).padStart(5, '0')}-${side === 0 ? 'CPL' : 'SHF'}`;
      rows.parts.push([partId, workshopId, partNumber, partNumber.replace(/[^A-Z0-9]/gu, ''), `Maker ${index % 37}`, `${side === 0 ? 'Coupler' : 'Input shaft'} ${word(next)}`, side === 0 ? 'coupler' : 'shaft', sentence(next, 4, 6), '[]']);
      const spec = { teeth, gender: side === 0 ? 'internal' : 'external', diametralPitch: index % 2 ? 16 : 24, stubPitch: index % 2 ? 32 : 48, pressureAngle: 30 };
      rows.features.push([featureIds[side], partId, 'spline', 'spline', JSON.stringify(spec), 'in']);
      rows.assemblyParts.push([assemblyId, partId, side === 0 ? 'motor side' : 'gearbox side', side]);
    });
    const interfaceId = randomUUID();
    rows.assemblies.push([assemblyId, workshopId, buildId, `Coupler stack ${index}`, '']);
    rows.interfaces.push([interfaceId, assemblyId, 'spline', 'coupler spline', featureIds[0], featureIds[1]]);
    rows.checks.push([randomUUID(), workshopId, assemblyId, interfaceId, 'spline_match', 'Spline match', ['open', 'bench_pass', 'confirmed'][index % 3]]);
    const steps = Array.from({ length: 5 }, (_, position) => ({
      id: randomUUID(), position, title: sentence(next, 3, 3), body: `<p>${sentence(next, 20, 20)}</p>`, footageId, startMs: position * 60_000, endMs: null, caution: null,
    }));
    const content = { title, slug: `bench-guide-${index}`, summary: sentence(next, 12, 8), footageId, assemblyId, safetyTopics: [], tools: [], consumables: [], steps, stepMarks: [] };
    rows.guides.push([guideId, workshopId, buildId, title, content.slug, content.summary, footageId, assemblyId, '[]', '[]', '[]', null]);
    rows.revisions.push([revisionId, guideId, 1, JSON.stringify(content), 'bench'.padEnd(64, '0'), now]);
    const text = [title, content.summary, ...steps.flatMap((step) => [step.title, step.body.replace(/<[^>]*>/gu, ' ')])].join('\n');
    rows.search.push([revisionId, guideId, workshopId, footageId, assemblyId, title, text]);
  }
  await insertRows(connection, 'builds', ['id', 'workshop_id', 'title', 'vehicle', 'goal'], rows.builds);
  await insertRows(connection, 'footage', ['id', 'workshop_id', 'build_id', 'title', 'original_name', 'content_type', 'size_bytes', 'object_key', 'state', 'duration_ms'], rows.footage);
  await insertRows(connection, 'transcripts', ['id', 'workshop_id', 'footage_id', 'revision', 'format', 'source_text', 'cue_count', 'is_active'], rows.transcripts);
  await insertRows(connection, 'parts', ['id', 'workshop_id', 'part_number', 'part_number_key', 'maker', 'title', 'category', 'notes', 'photo_keys'], rows.parts);
  await insertRows(connection, 'part_features', ['id', 'part_id', 'name', 'kind', 'spec', 'display_unit'], rows.features);
  await insertRows(connection, 'assemblies', ['id', 'workshop_id', 'build_id', 'name', 'notes'], rows.assemblies);
  await insertRows(connection, 'assembly_parts', ['assembly_id', 'part_id', 'position', 'sort_order'], rows.assemblyParts);
  await insertRows(connection, 'assembly_interfaces', ['id', 'assembly_id', 'kind', 'name', 'feature_a_id', 'feature_b_id'], rows.interfaces);
  await insertRows(connection, 'fit_checks', ['id', 'workshop_id', 'assembly_id', 'interface_id', 'kind', 'title', 'state'], rows.checks);
  await insertRows(connection, 'guides', ['id', 'workshop_id', 'build_id', 'title', 'slug', 'summary', 'footage_id', 'assembly_id', 'safety_topics', 'tools', 'consumables', 'published_revision_id'], rows.guides);
  await insertRows(connection, 'guide_revisions', ['id', 'guide_id', 'number', 'content', 'content_hash', 'published_at'], rows.revisions, 500);
  await insertRows(connection, 'guide_revision_search', ['revision_id', 'guide_id', 'workshop_id', 'footage_id', 'assembly_id', 'title', 'search_text'], rows.search, 500);
  await connection.query('UPDATE guides g JOIN guide_revisions r ON r.guide_id = g.id SET g.published_revision_id = r.id');
  console.log(`  guides, parts, checks and revisions in ${((Date.now() - started) / 1000).toFixed(0)} s; cues…`);

  let batch = [];
  for (let index = 0; index < GUIDES; index += 1) {
    const transcriptId = rows.transcripts[index][0];
    for (let cue = 0; cue < CUES_PER_GUIDE; cue += 1) {
      batch.push([transcriptId, cue, cue * 4000, cue * 4000 + 3500, `${sentence(next, 6, 10)}.`]);
      if (batch.length === 5_000) {
        await connection.query('INSERT INTO transcript_cues (transcript_id, cue_index, start_ms, end_ms, text) VALUES ?', [batch]);
        batch = [];
      }
    }
  }
  if (batch.length) await connection.query('INSERT INTO transcript_cues (transcript_id, cue_index, start_ms, end_ms, text) VALUES ?', [batch]);
  console.log(`  cues in ${((Date.now() - started) / 1000).toFixed(0)} s; FULLTEXT index on the cues…`);
  await connection.query('ALTER TABLE transcript_cues ADD FULLTEXT KEY IF NOT EXISTS ft_cues_text (text)');
  await connection.query('SET FOREIGN_KEY_CHECKS = 1');
  await connection.query('ANALYZE TABLE transcript_cues, guides, guide_revision_search, parts');
  console.log(`  generated in ${((Date.now() - started) / 1000).toFixed(0)} s`);
}

/** 200 varied queries: one or two trade words, rare model words, trade + rare, part numbers (whole or prefix), and filtered ones. */
function queries() {
  const next = generator(7_041_989);
  const pick = (list) => list[Math.floor(next() * list.length)];
  const list = [];
  for (let index = 0; index < QUERIES; index += 1) {
    const shape = index % 8;
    if (shape === 0) list.push({ q: pick(TRADE) });
    else if (shape === 1) list.push({ q: `${pick(TRADE)} ${pick(TRADE)}` });
    else if (shape === 2) list.push({ q: pick(RARE) });
    else if (shape === 3) list.push({ q: `${pick(TRADE)} ${pick(RARE)}` });
    else if (shape === 4) list.push({ q: `BN-${String(Math.floor(next() * GUIDES)).padStart(5, '0')}-CPL` });
    else if (shape === 5) list.push({ q: `BN-${String(Math.floor(next() * (GUIDES / 10))).padStart(4, '0')}` });
    else if (shape === 6) list.push({ q: pick(TRADE), vehicle: 'pickup' });
    else list.push({ q: `${pick(RARE)} ${pick(RARE)}`, offset: 20 });
  }
  return list;
}

const percentile = (values, p) => {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)];
};

async function timeEach(list, run) {
  const times = [];
  for (const item of list) {
    const started = performance.now();
    await run(item);
    times.push(performance.now() - started);
  }
  return times;
}

const summary = (times) => ({ median: median(times), p95: percentile(times, 95) });
const ms = (value) => `${value.toFixed(1)} ms`;

async function main() {
  const connection = await mysql.createConnection({
    host: process.env.DB_HOST, port: Number(process.env.DB_PORT), user: process.env.DB_USER, password: process.env.DB_PASSWORD, database: DB_NAME,
    multipleStatements: false,
  });
  // MariaDB's temporary files (the FULLTEXT build's sort, large sorts) must not live where a /tmp cleaner can remove them.
  const [[{ tmpdir }]] = await connection.query('SELECT @@tmpdir AS tmpdir');
  console.log(`MariaDB tmpdir ${tmpdir}${/^\/tmp(\/|$)/u.test(tmpdir) ? ' (under /tmp: restart this profile\'s MariaDB with scripts/lib.sh to move it beside the data)' : ''}`);
  const load = () => loadavg().map((value) => value.toFixed(2)).join(', ');
  console.log(`load average at start: ${load()}`);
  const have = await generated(connection);
  if (have.guides !== GUIDES || have.cues !== GUIDES * CUES_PER_GUIDE) await generate(connection);
  else console.log(`reusing ${have.guides.toLocaleString('en')} guides and ${have.cues.toLocaleString('en')} cues in ${DB_NAME}`);

  // A high calculator budget: this measures answer time, not the rate limit.
  const api = await startApi({ DB_NAME, TOOLS_RATE_LIMIT: '100000', TOOLS_TEXT_RATE_LIMIT: '100000' });
  const list = queries();
  try {
    const search = async (item) => {
      const params = new URLSearchParams(Object.entries(item).map(([key, value]) => [key, String(value)]));
      const response = await fetch(`${api.baseUrl}/api/search?${params}`, { headers: { 'X-Forwarded-For': '10.9.9.9' } });
      if (response.status !== 200 && response.status !== 400) throw new Error(`search ${params}: ${response.status} ${await response.text()}`);
      return response.json();
    };
    const baseline = async (item) => {
      const words = (item.q.toLowerCase().match(/[\p{L}\p{N}]+/gu) ?? []).filter((w) => w.length >= 3);
      if (!words.length) return;
      await connection.query(
        'SELECT transcript_id, cue_index, start_ms, text, MATCH (text) AGAINST (? IN BOOLEAN MODE) AS score FROM transcript_cues WHERE MATCH (text) AGAINST (? IN BOOLEAN MODE) ORDER BY score DESC LIMIT 20',
        [words.map((w) => `+${w}*`).join(' '), words.map((w) => `+${w}*`).join(' ')],
      );
    };
    // Warm both paths (buffer pool, JIT) with the same queries, then measure interleaved rounds.
    await timeEach(list.slice(0, 20), search);
    await timeEach(list.slice(0, 20), baseline);
    const ours = await timeEach(list, search);
    const plain = await timeEach(list, baseline);
    const hits = [];
    for (const item of list.slice(0, 16)) hits.push((await search(item)).total ?? 0);

    const finderPath = process.env.FINDER_PATH ?? '/api/fit-finder?splineTeeth={teeth}&splinePitch={pitch}';
    let finder = null;
    if (finderPath !== 'none') {
      const finderQueries = Array.from({ length: QUERIES }, (_, index) => finderPath.replaceAll('{teeth}', String([10, 21, 23, 24, 27, 29, 31, 15][index % 8])).replaceAll('{pitch}', index % 2 ? '16/32' : '24/48'));
      finder = summary(await timeEach(finderQueries, async (path) => {
        const response = await fetch(`${api.baseUrl}${path}`, { headers: { 'X-Forwarded-For': '10.9.9.8' } });
        if (!response.ok) throw new Error(`finder ${path}: ${response.status} ${await response.text()}`);
        await response.json();
      }));
      const sample = await (await fetch(`${api.baseUrl}${finderQueries[1]}`, { headers: { 'X-Forwarded-For': '10.9.9.8' } })).json();
      console.log(`finder sample ${finderQueries[1]}: total ${sample.total}${sample.totalCapped ? '+' : ''}, near misses ${sample.nearMissTotal}${sample.nearMissCapped ? '+' : ''}`);
    }

    const searchStats = summary(ours);
    const plainStats = summary(plain);
    console.log(`\n${GUIDES.toLocaleString('en')} published guides, ${(GUIDES * CUES_PER_GUIDE).toLocaleString('en')} cues, ${list.length} queries (first hits totals: ${hits.join(', ')})`);
    console.log(`GET /api/search            median ${ms(searchStats.median)}  p95 ${ms(searchStats.p95)}`);
    if (finder) console.log(`fit finder (${finderPath.split('?')[0]})  median ${ms(finder.median)}  p95 ${ms(finder.p95)}`);
    else console.log('fit finder: not measured (FINDER_PATH=none)');
    console.log(`baseline MATCH … AGAINST   median ${ms(plainStats.median)}  p95 ${ms(plainStats.p95)}`);
    console.log(`search p95 / baseline p95: ${(searchStats.p95 / plainStats.p95).toFixed(2)} (goal ≤ 2), search p95 ${searchStats.p95 < 150 ? '<' : '≥'} 150 ms`);
    if (finder) console.log(`finder p95 / baseline p95: ${(finder.p95 / plainStats.p95).toFixed(2)} (goal ≤ 2), finder p95 ${finder.p95 < 150 ? '<' : '≥'} 150 ms`);
    console.log(`load average at end: ${load()}`);
  } finally {
    await api.stop();
    await connection.end();
  }
}

await main();
