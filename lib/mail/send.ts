import 'server-only';
import nodemailer, { type Transporter } from 'nodemailer';
import { env, isLoopback } from '@/lib/server/env';

/**
 * Sending mail through the configured SMTP service (the local mail service in development and tests,
 * a real relay in production: only configuration differs).
 */
let transporter: Transporter | null = null;

export function mailTransport(): Transporter {
  transporter ??= nodemailer.createTransport({
    host: env.SMTP_HOST,
    port: env.SMTP_PORT,
    secure: env.SMTP_SECURE,
    auth: env.SMTP_USER ? { user: env.SMTP_USER, pass: env.SMTP_PASSWORD ?? '' } : undefined,
    // The local service offers no TLS; a real relay is configured with SMTP_SECURE.
    ignoreTLS: !env.SMTP_SECURE && isLoopback(env.SMTP_HOST),
    connectionTimeout: 5_000,
  });
  return transporter;
}

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html?: string;
  attachments?: { filename: string; content: Buffer; contentType: string }[];
}

export async function sendMail(mail: OutgoingMail): Promise<void> {
  await mailTransport().sendMail({ from: env.MAIL_FROM, ...mail });
}

/** True if the SMTP service answers (used by /api/health). */
export async function mailServiceReachable(): Promise<boolean> {
  try {
    await mailTransport().verify();
    return true;
  } catch {
    return false;
  }
}
