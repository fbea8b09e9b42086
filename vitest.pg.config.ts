import { defineConfig } from 'vitest/config';

/**
 * The server suites again, against a PostgreSQL server (node-postgres driver, same schema and
 * migrations): `TEST_DATABASE_URL=postgres://... npm run test:pg`. Each test gets its own database.
 */
export default defineConfig({
  test: {
    include: ['server/**/*.test.ts', 'tests/api/**/*.test.ts', 'tests/pg/**/*.test.ts'],
    environment: 'node',
    globalSetup: ['tests/support/global-setup.ts'],
    testTimeout: 30_000,
    hookTimeout: 60_000,
    pool: 'forks',
  },
});
