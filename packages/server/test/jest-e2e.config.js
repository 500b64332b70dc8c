/** End-to-end specs against the real MariaDB and the local fakes that `npm test` starts. */
module.exports = {
  rootDir: '.',
  testEnvironment: 'node',
  testRegex: '.*\\.e2e-spec\\.ts$',
  transform: { '^.+\\.ts$': ['ts-jest', { tsconfig: '<rootDir>/../tsconfig.json' }] },
  moduleNameMapper: { '^@jigwright/core$': '<rootDir>/../../core/src/index.ts' },
  globalSetup: '<rootDir>/global-setup.ts',
  setupFiles: ['<rootDir>/e2e-env.ts'],
  testTimeout: 30000,
};
