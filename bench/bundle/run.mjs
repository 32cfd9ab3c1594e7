// The viewer's bundle: builds the studio into a folder of its own and prints, per public route, what a reader's
// browser loads before the page is interactive (the entry and the route's module with their static imports),
// gzipped, against issue #12's budget (JavaScript ≤ 250 KB gz, CSS ≤ 40 KB gz), and any editor or creator code
// found in it (from the chunks' source maps). npm test holds the same budget (studio/scripts/viewer-budget.test.mjs).
// Run with: node bench/bundle/run.mjs   (no services needed)
import { execFileSync } from 'node:child_process';
import { join } from 'node:path';
import { root } from '../lib/harness.mjs';
import { kb, readManifest, routeLoad, VIEWER_BUDGET, VIEWER_ROUTES } from '../../studio/scripts/viewer-bundle.mjs';

const outDir = join(process.env.BENCH_DATA ?? join(root, '.data', 'bench'), 'bundle-dist');
execFileSync('npx', ['vite', 'build', '--outDir', outDir, '--emptyOutDir', '--logLevel', 'warn'], {
  cwd: join(root, 'studio'),
  env: { ...process.env, NODE_ENV: 'production' },
  stdio: 'inherit',
});
const manifest = readManifest(outDir);
const verdict = (bytes, budget) => (bytes <= budget ? 'within' : 'OVER');
console.log(`viewer bundle (gzip -9 of each file; budget JS ≤ ${kb(VIEWER_BUDGET.jsGzipBytes)}, CSS ≤ ${kb(VIEWER_BUDGET.cssGzipBytes)})`);
for (const { route, module } of VIEWER_ROUTES) {
  const load = routeLoad(outDir, manifest, module);
  if (!load) {
    console.log(`${route}: ${module} is not in this build`);
    continue;
  }
  console.log(
    `${route}: JS ${kb(load.jsGzipBytes)} in ${load.js.length} files (${verdict(load.jsGzipBytes, VIEWER_BUDGET.jsGzipBytes)}), ` +
      `CSS ${kb(load.cssGzipBytes)} (${verdict(load.cssGzipBytes, VIEWER_BUDGET.cssGzipBytes)}), editor sources: ${load.editorSources.length}`,
  );
  for (const file of [...load.js, ...load.css].sort((a, b) => b.gzipBytes - a.gzipBytes).slice(0, 5)) {
    console.log(`    ${kb(file.gzipBytes).padStart(9)}  ${file.file}`);
  }
  for (const source of load.editorSources.slice(0, 10)) console.log(`    editor: ${source}`);
}

// With the services up (bash bench/run.sh bundle [dev|test]), the same build is served by an API process and
// loaded in Chromium on a throttled phone profile; without them, the size report above is all.
if (process.env.DB_NAME && !process.argv.includes('--sizes-only')) {
  const { reportFirstPaint } = await import('./first-paint.mjs');
  await reportFirstPaint(outDir);
}
