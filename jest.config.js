// Jest projects: pure engine code (shared), server + worker against the real
// test database (server), the Expo client rendered by jest-expo (client) and
// the browser end-to-end suite (e2e). `npm test` runs them all through
// tests/run-all.ts, which first stands the stack up.
const nodeTransform = {
  '^.+\\.tsx?$': ['ts-jest', { tsconfig: '<rootDir>/tsconfig.node.json', diagnostics: false }],
};
const esmOnly = ['lucia', '@lucia-auth', '@oslojs', 'oslo'];

/** @type {import('jest').Config} */
module.exports = {
  projects: [
    {
      displayName: 'shared',
      testEnvironment: 'node',
      roots: ['<rootDir>/shared'],
      testMatch: ['**/*.test.ts'],
      transform: nodeTransform,
      moduleNameMapper: { '^@/(.*)$': '<rootDir>/$1' },
    },
    {
      displayName: 'server',
      testEnvironment: 'node',
      roots: ['<rootDir>/server', '<rootDir>/worker', '<rootDir>/tests/server', '<rootDir>/tests/cli'],
      testMatch: ['**/*.test.ts'],
      transform: nodeTransform,
      transformIgnorePatterns: [`/node_modules/(?!(${esmOnly.join('|')})/)`],
      moduleNameMapper: { '^@/(.*)$': '<rootDir>/$1' },
      setupFiles: ['reflect-metadata'],
    },
    {
      displayName: 'client',
      preset: 'jest-expo',
      roots: ['<rootDir>/app', '<rootDir>/components'],
      testMatch: ['**/*.test.tsx'],
      moduleNameMapper: { '^@/(.*)$': '<rootDir>/$1' },
    },
    {
      displayName: 'e2e',
      testEnvironment: 'node',
      roots: ['<rootDir>/tests/e2e'],
      testMatch: ['**/*.e2e.ts'],
      transform: nodeTransform,
    },
  ],
};
