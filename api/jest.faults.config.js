/**
 * Fault tests (npm run test:faults, scripts/faults.sh): they start the faults profile's own services
 * and API processes, stop and kill them on purpose, and check what survives.
 */
module.exports = {
  testEnvironment: 'node',
  transform: {
    '^.+\\.ts$': [
      '@swc/jest',
      {
        jsc: {
          parser: { syntax: 'typescript', decorators: true },
          transform: { legacyDecorator: true, decoratorMetadata: true },
          target: 'es2022',
        },
        module: { type: 'commonjs' },
      },
    ],
  },
  moduleFileExtensions: ['ts', 'js', 'json'],
  testMatch: ['<rootDir>/test/faults/**/*.fault-spec.ts'],
  testTimeout: 180_000,
};
