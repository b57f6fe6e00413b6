import 'server-only';
/**
 * Creates a Drizzle client on a mysql2 pool. The application uses db/client.ts (server-only, one pool
 * per process); scripts and tests call this directly with their own database name.
 */
import { drizzle } from 'drizzle-orm/mysql2';
import mysql from 'mysql2/promise';
import * as schema from './schema';

export interface DbConfig {
  host: string;
  port: number;
  user: string;
  password: string;
  database: string;
}

export function connectDb(config: DbConfig, connectionLimit = 10) {
  const pool = mysql.createPool({ ...config, connectionLimit, timezone: 'Z', charset: 'utf8mb4' });
  const db = drizzle(pool, { schema, mode: 'default', casing: 'snake_case' });
  return { pool, db };
}

export type Db = ReturnType<typeof connectDb>['db'];
/** A transaction handle, for core operations that take an explicit transaction. */
export type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];
export { schema };
