import { defineConfig } from 'vitest/config';

/** Node-side suites: engine, shared contracts, server (in-process, PGlite) and cross-module tests. */
export default defineConfig({
  test: {
    include: [
      'engine/**/*.test.ts',
      'shared/**/*.test.ts',
      'server/**/*.test.ts',
      'tests/**/*.test.ts',
    ],
    exclude: ['tests/e2e/**', 'tests/pg/**', 'node_modules/**'],
    environment: 'node',
    globalSetup: ['tests/support/global-setup.ts'],
    testTimeout: 30_000,
    hookTimeout: 60_000,
    pool: 'forks',
  },
});
