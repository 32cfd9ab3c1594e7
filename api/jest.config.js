/** Unit specs sit beside the code (src/**\/*.spec.ts); e2e specs in test/ run against real services. */
const swc = [
  '@swc/jest',
  {
    jsc: {
      parser: { syntax: 'typescript', decorators: true },
      transform: { legacyDecorator: true, decoratorMetadata: true },
      target: 'es2022',
    },
    module: { type: 'commonjs' },
  },
];

module.exports = {
  testEnvironment: 'node',
  transform: { '^.+\\.ts$': swc },
  moduleFileExtensions: ['ts', 'js', 'json'],
  projects: [
    {
      displayName: 'unit',
      testEnvironment: 'node',
      transform: { '^.+\\.ts$': swc },
      testMatch: ['<rootDir>/src/**/*.spec.ts'],
    },
    {
      displayName: 'e2e',
      testEnvironment: 'node',
      transform: { '^.+\\.ts$': swc },
      testMatch: ['<rootDir>/test/**/*.e2e-spec.ts'],
    },
  ],
};
