import 'server-only';
import type mysql from 'mysql2/promise';
import { dbConfig } from '@/lib/server/env';
import { connectDb, type Db } from './connect';

// One pool per server process; Next's dev server re-evaluates modules, so keep it on globalThis.
const globalForDb = globalThis as unknown as { thawlineDb?: { pool: mysql.Pool; db: Db } };

const instance =
  globalForDb.thawlineDb ??
  connectDb(dbConfig());
globalForDb.thawlineDb = instance;

export const db = instance.db;
export const pool = instance.pool;
export type { Db, Tx } from './connect';
export { schema } from './connect';
