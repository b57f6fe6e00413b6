/** `npm run db:seed`: writes the invented demo region into the configured database (idempotent). */
import { connectDb } from '../db/connect';
import { seedDemo } from '../db/seed';
import { dbConfig, env } from '../lib/server/env';

async function main() {
  const { pool, db } = connectDb(dbConfig(), 2);
  try {
    const s = await seedDemo(db);
    console.log(
      `demo region seeded: ${s.organisations} organisations, ${s.users} users, ${s.communities} communities, ${s.profiles} ground profiles (${s.newProfileVersions} new versions)`,
    );
  } finally {
    await pool.end();
  }
}

main().catch((e: unknown) => {
  const err = e as { code?: string; message?: string };
  if (err.code === 'ECONNREFUSED') console.error(`thawline: no database on ${env.DB_HOST}:${env.DB_PORT}; start it with npm run db:start`);
  else if (err.code === 'ER_NO_SUCH_TABLE') console.error('thawline: the database has no tables yet; run npm run db:migrate first');
  else console.error(`thawline: seed failed: ${err.message ?? String(e)}`);
  process.exit(1);
});
