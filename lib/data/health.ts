import 'server-only';
import { pool } from '@/db/client';
import { pendingMigrationCount } from '@/db/migrations';
import { mailServiceReachable } from '@/lib/mail/send';

export interface Health {
  ok: boolean;
  database: 'ok' | 'unreachable';
  migrations: 'current' | 'pending' | 'unknown';
  mail: 'ok' | 'unreachable';
  reasons: string[];
}

/** Public by design: it reveals no data, only whether the parts answer. */
export async function getHealth(): Promise<Health> {
  const reasons: string[] = [];
  let database: Health['database'] = 'ok';
  let migrations: Health['migrations'] = 'unknown';
  try {
    await pool.query('SELECT 1');
    const pending = await pendingMigrationCount(pool);
    migrations = pending === 0 ? 'current' : 'pending';
    if (pending > 0) reasons.push(`${pending} migration(s) not applied; run npm run db:migrate`);
  } catch {
    database = 'unreachable';
    reasons.push('database unreachable');
  }
  const mail = (await mailServiceReachable()) ? 'ok' : 'unreachable';
  if (mail !== 'ok') reasons.push('mail service unreachable');
  return { ok: reasons.length === 0, database, migrations, mail, reasons };
}
