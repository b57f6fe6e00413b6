/** `npm run db:migrate`: applies the committed migrations in drizzle/ to the configured database. */
import { connectDb } from '../db/connect';
import { applyMigrations } from '../db/migrations';
import { dbConfig, env } from '../lib/server/env';

async function main() {
  const { pool, db } = connectDb(dbConfig(), 2);
  try {
    await applyMigrations(db);
    console.log(`migrations applied to ${env.DB_NAME} on ${env.DB_HOST}:${env.DB_PORT}`);
  } finally {
    await pool.end();
  }
}

main().catch((e: unknown) => {
  const err = e as { code?: string; message?: string };
  if (err.code === 'ECONNREFUSED') console.error(`thawline: no database on ${env.DB_HOST}:${env.DB_PORT}; start it with npm run db:start`);
  else console.error(`thawline: migration failed: ${err.message ?? String(e)}`);
  process.exit(1);
});
