// The walls in eslint.config.mjs, each shown to fire on a violation and to stay quiet on the allowed import.
// Run by npm test (node --test); a rule that stopped matching would let a violation land unnoticed.
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { ESLint } from 'eslint';

const root = new URL('..', import.meta.url).pathname;
const eslint = new ESLint({ cwd: root });

async function restrictedImports(filePath, code) {
  const [result] = await eslint.lintText(code, { filePath: `${root}${filePath}` });
  return result.messages.filter((message) => message.ruleId === 'no-restricted-imports').map((message) => message.message);
}

const cases = [
  // [file, import, fires]
  ['api/src/engine/wall-fixture.ts', "import { Injectable } from '@nestjs/common';", true],
  ['api/src/engine/wall-fixture.ts', "import { readFileSync } from 'node:fs';", true],
  ['api/src/engine/wall-fixture.ts', "import { Part } from '../parts/entities/part.entity';", true],
  ['api/src/engine/wall-fixture.ts', "import { S3Client } from '@aws-sdk/client-s3';", true],
  ['api/src/engine/wall-fixture.ts', "import { toNanometres } from './units';", false],
  ['api/src/parts/wall-fixture.ts', "import { S3Client } from '@aws-sdk/client-s3';", true],
  ['api/src/parts/wall-fixture.ts', "import { createTransport } from 'nodemailer';", true],
  ['api/src/parts/wall-fixture.ts', "import Redis from 'ioredis';", true],
  ['api/src/parts/wall-fixture.ts', "import { spawn } from 'node:child_process';", true],
  ['api/src/parts/wall-fixture.ts', "import { InjectQueue } from '@nestjs/bull';", true],
  ['api/src/parts/wall-fixture.ts', "import { Queue } from 'bull';", true],
  ['api/src/parts/wall-fixture.ts', "import { StorageService } from '../infra/storage/storage.service';", false],
  ['api/src/parts/wall-fixture.ts', "import { InjectJobQueue } from '../infra/jobs/job-queue';", false],
  ['api/src/infra/jobs/wall-fixture.ts', "import { Queue } from 'bull';", false],
  ['api/src/infra/storage/wall-fixture.ts', "import { S3Client } from '@aws-sdk/client-s3';", false],
  ['studio/src/features/parts/wall-fixture.ts', "import { buildQueries } from '@/features/builds/api/queries';", true],
  ['studio/src/features/parts/wall-fixture.ts', "import { router } from '@/app/router';", true],
  ['studio/src/features/parts/wall-fixture.ts', "import { parseLength } from '../../../../api/src/engine/units';", true],
  ['studio/src/features/parts/wall-fixture.ts', "import { formatClock } from '@/lib/clock';", false],
  ['studio/src/components/wall-fixture.tsx', "import { PartsPage } from '@/features/parts/routes/parts-page';", true],
  ['studio/src/lib/wall-fixture.ts', "import { PartsPage } from '../features/parts/routes/parts-page';", true],
  ['studio/src/lib/wall-fixture.ts', "import { parseLength } from '@fitwright/engine';", false],
  ['studio/src/app/wall-fixture.tsx', "import { PartsPage } from '@/features/parts/routes/parts-page';", false],
];

for (const [file, line, fires] of cases) {
  test(`${fires ? 'refuses' : 'allows'} in ${file}: ${line}`, async () => {
    const messages = await restrictedImports(file, `${line}\nexport const used = [${line.match(/\{ (\w+)|import (\w+)/).slice(1).find(Boolean)}];\n`);
    if (fires) assert.equal(messages.length, 1, `expected one restricted-import error, got ${JSON.stringify(messages)}`);
    else assert.deepEqual(messages, []);
  });
}
