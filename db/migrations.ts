import 'server-only';
/**
 * Applying and checking the committed migrations in drizzle/. Used by `npm run db:migrate`, the health
 * check and the integration tests.
 */
import { migrate } from 'drizzle-orm/mysql2/migrator';
import { readMigrationFiles } from 'drizzle-orm/migrator';
import path from 'node:path';
import type mysql from 'mysql2/promise';
import type { Db } from './connect';

export const MIGRATIONS_FOLDER = path.join(process.cwd(), 'drizzle');
const MIGRATIONS_TABLE = '__drizzle_migrations';

export async function applyMigrations(db: Db): Promise<void> {
  await migrate(db, { migrationsFolder: MIGRATIONS_FOLDER, migrationsTable: MIGRATIONS_TABLE });
}

/** Committed migrations not yet applied to the database (0 when current). */
// The committed migrations are fixed for a running build: read and hash them once (the health check
// polls this).
let committed: ReturnType<typeof readMigrationFiles> | undefined;

export async function pendingMigrationCount(pool: mysql.Pool): Promise<number> {
  const files = (committed ??= readMigrationFiles({ migrationsFolder: MIGRATIONS_FOLDER }));
  let applied = new Set<string>();
  try {
    const [rows] = await pool.query(`SELECT hash FROM \`${MIGRATIONS_TABLE}\``);
    applied = new Set((rows as { hash: string }[]).map((r) => r.hash));
  } catch (e) {
    if ((e as { code?: string }).code !== 'ER_NO_SUCH_TABLE') throw e;
  }
  return files.filter((f) => !applied.has(f.hash)).length;
}
