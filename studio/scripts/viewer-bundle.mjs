// What a reader's browser loads for each public route of a studio build, read from Vite's manifest
// (dist/.vite/manifest.json) and the chunks' source maps: the entry and the route's module with every chunk
// they import statically (what arrives before the page is interactive; dynamic imports such as hls.js come
// later, on demand), gzipped sizes, and which sources each chunk holds. Shared by bench/bundle and the
// budget test (viewer-budget.test.mjs).
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';

/** Issue #12's budget for a public route: everything loaded before it is interactive, gzipped. */
export const VIEWER_BUDGET = { jsGzipBytes: 250 * 1024, cssGzipBytes: 40 * 1024 };

/** Public routes and the module each one loads lazily (app/router.tsx). */
export const VIEWER_ROUTES = [
  { route: '/guides', module: 'src/app/routes/guides.tsx' },
  { route: '/guides/:workshopSlug/:guideSlug (follow-along)', module: 'src/app/routes/guides.tsx' },
  { route: '/unsubscribe', module: 'src/app/routes/unsubscribe.tsx' },
  { route: '/fit-finder', module: 'src/app/routes/fit-finder.tsx', optional: true },
];

/**
 * Code a reader never needs: the rich-text editor, the form and upload kits, and the creators' and admins'
 * features (the header's workshop switcher, for signed-in creators, is part of the shell everyone loads).
 */
export const EDITOR_SOURCES = [
  /node_modules\/@tiptap\//,
  /node_modules\/prosemirror-/,
  /node_modules\/@mantine\/(?:tiptap|form|dropzone)\//,
  /src\/features\/(?:marks|guides|footage|admin|builds|parts|assemblies|measurements)\//,
];

export function readManifest(distDir) {
  const file = join(distDir, '.vite', 'manifest.json');
  if (!existsSync(file)) throw new Error(`${file} is missing: build the studio first (npm run build -w studio)`);
  return JSON.parse(readFileSync(file, 'utf8'));
}

function gzippedSize(distDir, file) {
  return gzipSync(readFileSync(join(distDir, file)), { level: 9 }).length;
}

/** The sources a built chunk was made from (its source map's `sources`), as paths relative to the studio. */
function chunkSources(distDir, file) {
  const map = join(distDir, `${file}.map`);
  if (!existsSync(map)) return [];
  return JSON.parse(readFileSync(map, 'utf8')).sources.map((source) => source.replace(/^(?:\.\.\/)+/, ''));
}

/** Manifest keys reachable from `keys` through static imports (Vite preloads these with the module). */
function staticClosure(manifest, keys) {
  const seen = new Set();
  const visit = (key) => {
    if (seen.has(key) || !manifest[key]) return;
    seen.add(key);
    for (const imported of manifest[key].imports ?? []) visit(imported);
  };
  keys.forEach(visit);
  return [...seen];
}

/** What the browser loads for a route before it is interactive: files with gzipped sizes, totals, and editor sources found. */
export function routeLoad(distDir, manifest, module) {
  const entry = Object.keys(manifest).find((key) => manifest[key].isEntry);
  if (!entry) throw new Error('the manifest has no entry');
  if (!manifest[module]) return null;
  const chunks = staticClosure(manifest, [entry, module]);
  const js = chunks.map((key) => manifest[key].file).map((file) => ({ file, gzipBytes: gzippedSize(distDir, file) }));
  const cssFiles = [...new Set(chunks.flatMap((key) => manifest[key].css ?? []))];
  const css = cssFiles.map((file) => ({ file, gzipBytes: gzippedSize(distDir, file) }));
  const editorSources = js.flatMap(({ file }) =>
    chunkSources(distDir, file)
      .filter((source) => EDITOR_SOURCES.some((pattern) => pattern.test(source)))
      .map((source) => `${file}: ${source}`),
  );
  const sum = (files) => files.reduce((total, item) => total + item.gzipBytes, 0);
  return { js, css, jsGzipBytes: sum(js), cssGzipBytes: sum(css), editorSources };
}

export const kb = (bytes) => `${(bytes / 1024).toFixed(1)} KB`;
