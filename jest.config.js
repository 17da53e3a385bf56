// Jest projects: pure engine code (shared), server + worker against the real
// test database (server), the Expo client rendered by jest-expo (client) and
// the browser end-to-end suite (e2e). `npm test` runs them all through
// tests/run-all.ts, which first stands the stack up.
// .js too: the ESM-only packages listed below are transpiled to CommonJS for jest.
const nodeTransform = {
  '^.+\\.[tj]sx?$': ['ts-jest', { tsconfig: '<rootDir>/tsconfig.node.json', diagnostics: false }],
};
// A root that does not exist (yet) is an error to jest: keep only real folders.
const { existsSync } = require('node:fs');
const roots = (...dirs) => dirs.filter((d) => existsSync(`${__dirname}/${d}`)).map((d) => `<rootDir>/${d}`);
const esmOnly = ['lucia', '@lucia-auth', '@oslojs', 'oslo'];

/** @type {import('jest').Config} */
module.exports = {
  projects: [
    {
      displayName: 'shared',
      testEnvironment: 'node',
      roots: roots('shared'),
      testMatch: ['**/*.test.ts'],
      transform: nodeTransform,
      moduleNameMapper: { '^@/(.*)$': '<rootDir>/$1' },
    },
    {
      displayName: 'server',
      testEnvironment: 'node',
      roots: roots('server', 'worker', 'tests/server', 'tests/cli'),
      testMatch: ['**/*.test.ts'],
      transform: nodeTransform,
      transformIgnorePatterns: [`/node_modules/(?!(${esmOnly.join('|')})/)`],
      moduleNameMapper: { '^@/(.*)$': '<rootDir>/$1' },
      setupFiles: ['reflect-metadata'],
    },
    {
      displayName: 'client',
      preset: 'jest-expo',
      setupFilesAfterEnv: ['<rootDir>/tests/setup/client-timeout.js'],
      roots: roots('app', 'components'),
      testMatch: ['**/*.test.ts?(x)'],
      moduleNameMapper: { '^@/(.*)$': '<rootDir>/$1' },
    },
    {
      displayName: 'e2e',
      testEnvironment: 'node',
      roots: roots('tests/e2e'),
      testMatch: ['**/*.e2e.ts'],
      transform: nodeTransform,
    },
  ],
};
