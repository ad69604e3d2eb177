// Four projects: pure shared science, server units, Angular client, and the
// integration/e2e suites that need the private MariaDB started by `npm test`.
const { createCjsPreset } = require('jest-preset-angular/presets');

const moduleNameMapper = {
  '^@app/(.*)$': '<rootDir>/src/app/$1',
  '^@server/(.*)$': '<rootDir>/server/$1',
  '^@shared/(.*)$': '<rootDir>/shared/$1',
};
const nodeTransform = {
  '^.+\\.ts$': ['ts-jest', { tsconfig: '<rootDir>/tsconfig.spec.json' }],
};

module.exports = {
  cacheDirectory: '<rootDir>/.cache/jest',
  projects: [
    {
      displayName: 'shared',
      testEnvironment: 'node',
      roots: ['<rootDir>/shared'],
      testMatch: ['**/*.spec.ts'],
      transform: nodeTransform,
      moduleNameMapper,
    },
    {
      displayName: 'server',
      testEnvironment: 'node',
      roots: ['<rootDir>/server', '<rootDir>/scripts'],
      testMatch: ['**/*.spec.ts'],
      transform: nodeTransform,
      moduleNameMapper,
    },
    {
      displayName: 'client',
      ...createCjsPreset({ tsconfig: '<rootDir>/tsconfig.spec.json' }),
      roots: ['<rootDir>/src'],
      setupFilesAfterEnv: ['<rootDir>/src/setup-jest.ts'],
      moduleNameMapper,
    },
    {
      displayName: 'integration',
      testEnvironment: 'node',
      roots: ['<rootDir>/test/integration'],
      testMatch: ['**/*.spec.ts'],
      setupFilesAfterEnv: ['<rootDir>/test/integration/jest-setup.ts'],
      transform: nodeTransform,
      moduleNameMapper,
    },
    {
      displayName: 'e2e',
      testEnvironment: 'node',
      roots: ['<rootDir>/test/e2e'],
      testMatch: ['**/*.e2e-spec.ts'],
      setupFilesAfterEnv: ['<rootDir>/test/e2e/jest-setup.ts'],
      transform: nodeTransform,
      moduleNameMapper,
    },
  ],
};
