import { defineConfig } from 'drizzle-kit';

/** drizzle-kit generates the committed migrations in drizzle/ from server/db/schema.ts. */
export default defineConfig({
  dialect: 'postgresql',
  schema: './server/db/schema.ts',
  out: './drizzle',
});
