// The viewer's budget (issue #12), checked on the studio build npm test makes (a size, not a timing): each
// public route loads at most 250 KB of gzipped JavaScript and 40 KB of gzipped CSS before it is interactive,
// and none of the editor's, form kit's or creators' code. Run: node --test studio/scripts/viewer-budget.test.mjs
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { fileURLToPath } from 'node:url';
import { kb, readManifest, routeLoad, VIEWER_BUDGET, VIEWER_ROUTES } from './viewer-bundle.mjs';

const distDir = process.env.STUDIO_DIST_DIR ?? fileURLToPath(new URL('../dist', import.meta.url));
const manifest = readManifest(distDir);

for (const { route, module, optional } of VIEWER_ROUTES) {
  test(`${route} stays within the viewer's budget and loads no editor code`, (t) => {
    const load = routeLoad(distDir, manifest, module);
    if (!load) {
      if (optional) return t.skip(`${module} is not in this build`);
      assert.fail(`${module} is not in the manifest`);
    }
    assert.ok(load.jsGzipBytes <= VIEWER_BUDGET.jsGzipBytes, `${route}: JavaScript ${kb(load.jsGzipBytes)} gz > ${kb(VIEWER_BUDGET.jsGzipBytes)}`);
    assert.ok(load.cssGzipBytes <= VIEWER_BUDGET.cssGzipBytes, `${route}: CSS ${kb(load.cssGzipBytes)} gz > ${kb(VIEWER_BUDGET.cssGzipBytes)}`);
    assert.deepEqual(load.editorSources, [], `${route} loads editor or creator code before it is interactive`);
  });
}
