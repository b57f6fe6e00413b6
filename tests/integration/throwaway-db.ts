/**
 * A throw-away database on the test run's own MariaDB (started by scripts/test-all.sh; DB_* from its
 * environment), migrated with the committed migrations, dropped afterwards.
 */
import mysql from 'mysql2/promise';
import { randomBytes } from 'node:crypto';
import { connectDb, type Db } from '@/db/connect';
import { applyMigrations } from '@/db/migrations';
import { dbConfig, dbServerConfig } from '@/lib/server/env';

export interface ThrowawayDb {
  name: string;
  db: Db;
  pool: mysql.Pool;
  drop(): Promise<void>;
}

export async function createThrowawayDb(options: { migrate?: boolean } = {}): Promise<ThrowawayDb> {
  const name = `thawline_test_${randomBytes(5).toString('hex')}`;
  const admin = await mysql.createConnection(dbServerConfig());
  await admin.query(`CREATE DATABASE \`${name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);
  await admin.end();
  const { db, pool } = connectDb(dbConfig(name), 4);
  if (options.migrate !== false) await applyMigrations(db);
  return {
    name,
    db,
    pool,
    async drop() {
      await pool.end();
      const c = await mysql.createConnection(dbServerConfig());
      await c.query(`DROP DATABASE IF EXISTS \`${name}\``);
      await c.end();
    },
  };
}
