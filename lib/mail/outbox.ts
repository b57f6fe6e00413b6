import 'server-only';
import type { Db, Tx } from '@/db/connect';
import { enqueueJob } from '@/lib/jobs/queue';
import { env } from '@/lib/server/env';
import type { OutgoingMail } from './send';

/**
 * The outbox: mail is not sent inside a request but written as an "email" job, in the caller's
 * transaction when it passes one (so an invitation and its e-mail are stored together or not at all),
 * and sent by a worker (lib/jobs/kinds/email.ts) with retries and a growing delay while the mail
 * service is down. Each message has a stable Message-ID chosen here: a duplicate can only follow a
 * crash between the server's acceptance and the job's commit, and is recognisable by it.
 */
export const EMAIL_JOB = 'email';

export interface QueuedMail extends Omit<OutgoingMail, 'attachments'> {
  /** Extra headers (List-Unsubscribe and the like). */
  headers?: Record<string, string>;
}

export async function queueMail(conn: Db | Tx, mail: QueuedMail, options: { organisationId?: string | null; dedupeKey?: string; maxAttempts?: number } = {}): Promise<{ messageId: string; jobId: string }> {
  const domain = new URL(env.APP_URL).hostname || 'thawline.invalid';
  const messageId = `<${crypto.randomUUID()}@${domain}>`;
  const { job } = await enqueueJob(conn, {
    kind: EMAIL_JOB,
    organisationId: options.organisationId ?? null,
    payload: { ...mail, messageId },
    dedupeKey: options.dedupeKey ?? null,
    maxAttempts: options.maxAttempts ?? 8,
  });
  return { messageId: (job.payload as { messageId?: string }).messageId ?? messageId, jobId: job.id };
}
