// The API↔studio contract: api/openapi.json (written from the API's decorators) and the studio's types generated
// from it (studio/src/lib/api-contract.ts). `npm run contract` rewrites both; `--check` (run by npm test) fails when
// either differs from what the code produces now, so a changed route cannot land without its regenerated contract.
// Both need the API built (api/dist); npm run contract builds it first.
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import openapiTS, { astToString } from 'openapi-typescript';

const root = new URL('..', import.meta.url).pathname;
const documentPath = join(root, 'api/openapi.json');
const typesPath = join(root, 'studio/src/lib/api-contract.ts');
const check = process.argv.includes('--check');

const scratch = mkdtempSync(join(tmpdir(), 'fitwright-contract-'));
try {
  const freshDocumentPath = join(scratch, 'openapi.json');
  execFileSync(process.execPath, [join(root, 'api/dist/openapi/write-contract.js'), freshDocumentPath], { stdio: 'inherit' });
  const freshDocument = readFileSync(freshDocumentPath, 'utf8');
  const header =
    '/* Generated from api/openapi.json by `npm run contract` (openapi-typescript). Do not edit: change the API and regenerate. */\n';
  const freshTypes = header + astToString(await openapiTS(JSON.parse(freshDocument)));

  const untyped = untypedOperations(JSON.parse(freshDocument));

  const stale = [
    [documentPath, freshDocument],
    [typesPath, freshTypes],
  ].filter(([path, fresh]) => readOrEmpty(path) !== fresh);

  if (!check) {
    for (const [path, fresh] of stale) writeFileSync(path, fresh);
    console.log(stale.length ? `contract rewritten: ${stale.map(([path]) => path.slice(root.length)).join(', ')}` : 'contract already current');
  } else if (stale.length) {
    console.error(
      `The API contract is out of date: ${stale.map(([path]) => path.slice(root.length)).join(', ')} ` +
        'differ from what the code produces. Run `npm run contract` and commit the result.',
    );
    process.exit(1);
  } else {
    console.log('contract current: api/openapi.json and studio/src/lib/api-contract.ts match the code');
  }
  if (untyped.length) {
    console.error(
      `${untyped.length} operation(s) document no typed success answer: ${untyped.join(', ')}. ` +
        'Give each a response DTO (@ApiOkResponse({ type }) or @ApiCreatedResponse), 204, or a redirect (@ApiResponse({ status: 302 })).',
    );
    process.exit(1);
  }
} finally {
  rmSync(scratch, { recursive: true, force: true });
}

function readOrEmpty(path) {
  try {
    return readFileSync(path, 'utf8');
  } catch {
    return '';
  }
}

/**
 * Operations whose success the studio cannot type: a 2xx answer without a body schema (204 No Content aside), or
 * no 2xx or redirect at all. None are allowed, so a new route cannot land with an answer the studio must guess.
 */
export function untypedOperations(document) {
  const untyped = [];
  for (const [path, operations] of Object.entries(document.paths ?? {})) {
    for (const [method, operation] of Object.entries(operations)) {
      if (!operation || typeof operation !== 'object' || !('responses' in operation)) continue;
      const codes = Object.entries(operation.responses ?? {});
      const answered = codes.filter(([code]) => /^[23]\d\d$/.test(code));
      const bare = answered.filter(([code, answer]) => code.startsWith('2') && code !== '204' && !answer.content);
      if (answered.length === 0 || bare.length) untyped.push(`${method.toUpperCase()} ${path}`);
    }
  }
  return untyped;
}
