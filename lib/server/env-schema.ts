/**
 * The configuration's schema: every variable the application reads, its default and its check. The
 * defaults let the README's two commands run on a fresh machine without editing anything. The values
 * themselves are read once, in env.ts (server-only); this file holds no values, so next.config.ts can
 * use it at build time.
 */
import { z } from 'zod';

const port = z.coerce.number({ error: 'must be a port number from 1 to 65535' }).int('must be a port number from 1 to 65535').min(1, 'must be a port number from 1 to 65535').max(65_535, 'must be a port number from 1 to 65535');
const flag = z
  .enum(['0', '1', 'true', 'false', 'yes', 'no', ''])
  .transform((v) => v === '1' || v === 'true' || v === 'yes');

const envSchema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  /** Public base URL of the application, used in e-mailed links. */
  APP_URL: z.url().default('http://localhost:3000'),
  DB_HOST: z.string().min(1).default('127.0.0.1'),
  DB_PORT: port.default(3307),
  DB_USER: z.string().min(1).default('thawline'),
  DB_PASSWORD: z.string().default('thawline-local'),
  DB_NAME: z.string().regex(/^[A-Za-z0-9_]+$/, 'letters, digits and _ only').default('thawline'),
  SMTP_HOST: z.string().min(1).default('127.0.0.1'),
  SMTP_PORT: port.default(2525),
  SMTP_USER: z.string().optional(),
  SMTP_PASSWORD: z.string().optional(),
  SMTP_SECURE: flag.default(false),
  MAIL_FROM: z.string().min(3).default('Thawline <outlook@thawline.invalid>'),
  /** Where the local mail service keeps the messages it receives (development and tests only). */
  MAIL_STORE_DIR: z.string().min(1).default('.data/mail'),
  /** Shows the development inbox at /dev/inbox. Never set in production. */
  DEV_INBOX: flag.default(false),
  AUTH_SECRET: z.string().min(32, 'must be at least 32 characters').default('development-only-secret-change-me-0123456789'),
  /** Build output folder; the test command builds into its own so a running demo keeps working. */
  NEXT_DIST_DIR: z.string().regex(/^\.next[\w-]*$/, 'must be .next or .next-<name>').default('.next'),
  /** Auth.js must trust the Host header behind `next start` on localhost. */
  AUTH_TRUST_HOST: flag.default(true),
});

/** True for this machine's own addresses (127.x, ::1, localhost). */
export function isLoopback(host: string): boolean {
  return host === 'localhost' || host === '::1' || host.startsWith('127.');
}

export type Env = z.infer<typeof envSchema>;

export function parseEnv(source: NodeJS.ProcessEnv): Env {
  const result = envSchema.safeParse(source);
  if (!result.success) {
    const first = result.error.issues[0];
    const name = first?.path.join('.') ?? 'environment';
    throw new Error(`Configuration: ${name} ${first?.message ?? 'is invalid'} (see README, Configuration)`);
  }
  if (result.data.DEV_INBOX && !isLoopback(result.data.SMTP_HOST)) {
    // The inbox shows every message the local mail service received; it has no place beside a real relay.
    throw new Error('Configuration: DEV_INBOX needs SMTP_HOST on this machine (127.0.0.1 or localhost)');
  }
  return result.data;
}

export { envSchema };
