// Unit and controller specs beside the code (src, files ending .spec.ts).
module.exports = {
  rootDir: 'src',
  testEnvironment: 'node',
  testRegex: '.*\\.spec\\.ts$',
  transform: { '^.+\\.ts$': ['ts-jest', { tsconfig: '<rootDir>/../tsconfig.json' }] },
  moduleNameMapper: { '^@jigwright/core$': '<rootDir>/../../core/src/index.ts' },
};
