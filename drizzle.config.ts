import { defineConfig } from 'drizzle-kit';

// drizzle-kit generate needs no database; migrate is done by scripts/migrate.ts through lib/env.
export default defineConfig({
  dialect: 'mysql',
  schema: './db/schema/index.ts',
  out: './drizzle',
  casing: 'snake_case',
});
