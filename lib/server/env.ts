import 'server-only';
/**
 * The application's configuration, read from process.env once (the only place that reads it) and
 * checked with the schema in env-schema.ts; a wrong value stops the process with one line naming the
 * variable. Server processes outside Next (scripts, the worker) load it through
 * scripts/server-process.cjs, which lets `server-only` resolve there.
 */
import { parseEnv, type Env } from './env-schema';

export { isLoopback, parseEnv, type Env } from './env-schema';

function loadEnv(): Env {
  try {
    return parseEnv(process.env);
  } catch (e) {
    // A script or `next start` stops with the one line, not a stack trace; under vitest it throws.
    if (process.env.VITEST === undefined && typeof process.exit === 'function') {
      console.error(`thawline: ${(e as Error).message}`);
      process.exit(1);
    }
    throw e;
  }
}

export const env: Env = loadEnv();

/** Options of the long-lived preference cookies (active organisation, interface language). */
export const preferenceCookieOptions = {
  httpOnly: true,
  sameSite: 'lax',
  secure: env.APP_URL.startsWith('https:'),
  path: '/',
  maxAge: 365 * 24 * 60 * 60,
} as const;

/** The database server and account from the configuration (no database chosen), for mysql2. */
export function dbServerConfig() {
  return { host: env.DB_HOST, port: env.DB_PORT, user: env.DB_USER, password: env.DB_PASSWORD };
}

/** The configured database, for `connectDb` (db/connect.ts); pass another name for a test database. */
export function dbConfig(database: string = env.DB_NAME) {
  return { ...dbServerConfig(), database };
}

