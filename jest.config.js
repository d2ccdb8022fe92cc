/**
 * One runner, four projects:
 *  - lib:    pure shared logic (verdict engine, units, CSV rows), ts-jest in node
 *  - server: API tests with supertest against the real MariaDB on 127.0.0.1
 *  - app:    React Native screens and components under jest-expo (web)
 *  - e2e:    the served web build driven in Debian's Chromium by playwright-core
 */
/** The `@/` alias of both tsconfigs, for every project. */
const moduleNameMapper = { '^@/(.*)$': '<rootDir>/$1' };
const tsJest = (tsconfig) => ({ '^.+\\.tsx?$': ['ts-jest', { tsconfig, diagnostics: { warnOnly: false } }] });

module.exports = {
  testTimeout: 90000,
  projects: [
    {
      displayName: 'lib',
      testEnvironment: 'node',
      moduleNameMapper,
      testMatch: ['<rootDir>/__tests__/lib/**/*.test.ts'],
      transform: tsJest('<rootDir>/server/tsconfig.json'),
    },
    {
      displayName: 'server',
      testEnvironment: 'node',
      moduleNameMapper,
      testMatch: ['<rootDir>/__tests__/server/**/*.test.ts'],
      transform: tsJest('<rootDir>/server/tsconfig.json'),
      globalSetup: '<rootDir>/__tests__/helpers/global-setup.ts',
      globalTeardown: '<rootDir>/__tests__/helpers/global-teardown.ts',
      setupFiles: ['<rootDir>/__tests__/helpers/test-env.ts', 'reflect-metadata'],
    },
    {
      displayName: 'app',
      preset: 'jest-expo',
      moduleNameMapper,
      testMatch: ['<rootDir>/__tests__/app/**/*.test.tsx'],
    },
    {
      displayName: 'e2e',
      testEnvironment: 'node',
      moduleNameMapper,
      testMatch: ['<rootDir>/__tests__/e2e/**/*.test.ts'],
      transform: tsJest('<rootDir>/server/tsconfig.json'),
      globalSetup: '<rootDir>/__tests__/helpers/global-setup.ts',
      globalTeardown: '<rootDir>/__tests__/helpers/global-teardown.ts',
      setupFiles: ['<rootDir>/__tests__/helpers/test-env.ts', 'reflect-metadata'],
    },
  ],
};
