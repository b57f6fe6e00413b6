import 'server-only';
import { z } from 'zod';
import { mailTransport } from '@/lib/mail/send';
import { env } from '@/lib/server/env';
import { PermanentJobError } from '../queue';
import type { JobHandler } from '../runner';

/**
 * Job kind "email": sends one queued message (lib/mail/outbox.ts) through the configured SMTP
 * service with its stable Message-ID. A refused address (5xx) fails at once; anything else (the
 * service down, 4xx) is retried by the queue with a growing delay. Answers the server's reply.
 */
export const emailJobPayload = z.object({
  to: z.string().min(3),
  subject: z.string(),
  text: z.string(),
  html: z.string().optional(),
  headers: z.record(z.string(), z.string()).optional(),
  messageId: z.string().min(3),
});

export function emailJobHandler(): JobHandler {
  return async ({ job, progress }) => {
    const parsed = emailJobPayload.safeParse(job.payload);
    if (!parsed.success) throw new PermanentJobError('the job is not a message');
    const mail = parsed.data;
    progress(0.5, 'sending');
    try {
      const info = await mailTransport().sendMail({ from: env.MAIL_FROM, to: mail.to, subject: mail.subject, text: mail.text, html: mail.html, headers: mail.headers, messageId: mail.messageId });
      return { messageId: mail.messageId, response: String(info.response ?? '').slice(0, 200) };
    } catch (e) {
      const code = (e as { responseCode?: number }).responseCode;
      if (code && code >= 500 && code < 600) throw new PermanentJobError(`the mail server refused the message (${code})`);
      throw new Error(`the mail service did not take the message: ${(e as Error).message}`);
    }
  };
}
