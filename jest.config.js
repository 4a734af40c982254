// One Jest run, three projects: unit specs beside the code, reference checks against published
// values, and e2e suites against the real PostgreSQL and Redis that `npm test` starts.
const tsJest = [
  'ts-jest',
  { useESM: true, tsconfig: '<rootDir>/api/tsconfig.jest.json' },
];
const common = {
  rootDir: '.',
  extensionsToTreatAsEsm: ['.ts'],
  moduleNameMapper: {
    // the workspace packages from their sources (their dist/ is for Node.js at run time)
    '^@pourgate/batching$': '<rootDir>/packages/batching/src/index.ts',
    '^@pourgate/permissions$': '<rootDir>/packages/permissions/src/index.ts',
    '^(\\.{1,2}/.*)\\.js$': '$1',
  },
  transform: { '^.+\\.ts$': tsJest },
  testEnvironment: 'node',
};

export default {
  // a global option (ignored inside projects): app start-up in hooks needs more than 5 s on a busy 2-core machine
  testTimeout: 30000,
  // Bull and ioredis keep reconnect timers after an app closes; a single suite run in-band would
  // wait on them forever once every test has finished
  forceExit: true,
  projects: [
    { ...common, displayName: 'unit', roots: ['<rootDir>/packages', '<rootDir>/api/src', '<rootDir>/fakes/src', '<rootDir>/sdk/src'], testMatch: ['**/*.spec.ts'] },
    { ...common, displayName: 'reference', roots: ['<rootDir>/test/reference'], testMatch: ['**/*.reference-spec.ts'] },
    { ...common, displayName: 'e2e', roots: ['<rootDir>/test/e2e'], testMatch: ['**/*.e2e-spec.ts'] },
  ],
};
