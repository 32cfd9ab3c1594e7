import js from '@eslint/js';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import tseslint from 'typescript-eslint';

// ---- walls between parts of the code (DEVELOPERS.md, "Layout and walls"; scripts/lint-rules.test.mjs shows each one fire) ----
const OUTSIDE_STUDIO = [
  { group: ['**/api/src/**'], message: 'The studio reaches the engine as @fitwright/engine and the API through its contract, never by path.' },
];
const FEATURES = { group: ['@/features/*', '@/features/*/**'], message: 'Import another feature only from app/ routes, never from a feature or shared code.' };
const APP_SHELL = { group: ['@/app', '@/app/**'], message: 'Only app/ imports app/.' };
const RELATIVE_FEATURES = { group: ['../features/*', '../../features/*', '../**/features/*'], message: 'Shared code never imports a feature.' };
const INFRA_MESSAGE = 'Only api/src/infra/ imports storage, mail, queue and process libraries; use its services.';
const INFRA_ONLY_PATHS = ['nodemailer', 'bull', '@nestjs/bull', 'ioredis', 'child_process', 'node:child_process'].map((name) => ({ name, message: INFRA_MESSAGE }));
const INFRA_ONLY_PATTERNS = [{ group: ['@aws-sdk/*'], message: INFRA_MESSAGE }];
const ENGINE_MESSAGE = 'The engine is pure computation: no framework, database, network or file access.';
const NODE_IO = ['fs', 'node:fs', 'fs/promises', 'node:fs/promises', 'http', 'node:http', 'https', 'node:https', 'net', 'node:net'];

export default tseslint.config(
  { ignores: ['**/dist/**', '**/node_modules/**', '.data/**', '**/coverage/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    rules: {
      '@typescript-eslint/no-explicit-any': 'error',
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', destructuredArrayIgnorePattern: '^_' }],
    },
  },
  {
    files: ['api/**/*.ts'],
    languageOptions: { globals: { ...globals.node, ...globals.jest } },
  },
  {
    files: ['**/*.js', '**/*.cjs', '**/*.mjs'],
    languageOptions: { globals: globals.node },
    rules: { '@typescript-eslint/no-require-imports': 'off' },
  },
  {
    // Journeys run in Node but hand callbacks to the page.
    files: ['studio/e2e/**/*.mjs'],
    languageOptions: { globals: { ...globals.node, ...globals.browser } },
  },
  {
    files: ['studio/src/**/*.{ts,tsx}'],
    languageOptions: { globals: globals.browser },
    plugins: { 'react-hooks': reactHooks },
    rules: {
      ...reactHooks.configs.recommended.rules,
      // Shared code (components/, lib/, config/, theme/, testing/) never reaches into a feature or the app shell.
      'no-restricted-imports': ['error', { patterns: [...OUTSIDE_STUDIO, FEATURES, APP_SHELL, RELATIVE_FEATURES] }],
    },
  },
  {
    // Features stay independent: they meet only in app/ routes, and share what lives in components/ or lib/.
    files: ['studio/src/features/**/*.{ts,tsx}'],
    rules: { 'no-restricted-imports': ['error', { patterns: [...OUTSIDE_STUDIO, FEATURES, APP_SHELL] }] },
  },
  {
    files: ['studio/src/app/**/*.{ts,tsx}'],
    rules: { 'no-restricted-imports': ['error', { patterns: OUTSIDE_STUDIO }] },
  },
  {
    // Tests may borrow the API's linear-time helper for their fuzz budgets.
    files: ['studio/src/**/*.test.{ts,tsx}'],
    rules: { 'no-restricted-imports': 'off' },
  },
  {
    // Only infrastructure talks to storage, mail, queues, Redis and processes; domains use its ports and services
    // (jobs: infra/jobs/job-queue.ts and job-handlers.ts). No exceptions are left.
    files: ['api/src/**/*.ts'],
    ignores: ['api/src/infra/**'],
    rules: { 'no-restricted-imports': ['error', { paths: INFRA_ONLY_PATHS, patterns: INFRA_ONLY_PATTERNS }] },
  },
  {
    // The engine is pure computation: no framework, no I/O, nothing from the app around it.
    files: ['api/src/engine/**/*.ts'],
    ignores: ['api/src/engine/**/*.spec.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          paths: [...INFRA_ONLY_PATHS, ...NODE_IO.map((name) => ({ name, message: ENGINE_MESSAGE }))],
          patterns: [
            ...INFRA_ONLY_PATTERNS,
            { group: ['@nestjs/*', 'typeorm', 'mysql2', 'mysql2/*', 'express', 'class-validator', 'class-transformer'], message: ENGINE_MESSAGE },
            { group: ['../*'], message: 'The engine imports only its own modules.' },
          ],
        },
      ],
    },
  },
);
