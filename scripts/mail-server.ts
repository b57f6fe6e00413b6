/**
 * The local mail service for development and tests: an SMTP server on 127.0.0.1 (smtp-server) that
 * parses every message it receives (mailparser) and keeps it in MAIL_STORE_DIR. It stands in for the
 * mail relay; the application sends through nodemailer to whatever SMTP the configuration names.
 *   npx tsx scripts/mail-server.ts        (SMTP_PORT, MAIL_STORE_DIR from the environment)
 */
import { SMTPServer } from 'smtp-server';
import { simpleParser, type AddressObject } from 'mailparser';
import { randomUUID } from 'node:crypto';
import path from 'node:path';
import { saveMessage } from '../lib/mail/store';
import { env } from '../lib/server/env';

// The same validated configuration as the app (a bad SMTP_PORT stops here with one line).
const port = env.SMTP_PORT;
const dir = path.resolve(env.MAIL_STORE_DIR);

function addresses(a: AddressObject | AddressObject[] | undefined): string[] {
  const list = Array.isArray(a) ? a : a ? [a] : [];
  return list.flatMap((x) => x.value.map((v) => v.address ?? '')).filter(Boolean);
}

const server = new SMTPServer({
  authOptional: true,
  disabledCommands: ['STARTTLS'],
  // Messages larger than this are refused with a clear SMTP error rather than kept half.
  size: 25 * 1024 * 1024,
  banner: 'Thawline local mail service',
  onData(stream, session, callback) {
    simpleParser(stream)
      .then(async (parsed) => {
        const to = addresses(parsed.to).length ? addresses(parsed.to) : session.envelope.rcptTo.map((r) => r.address);
        await saveMessage(dir, {
          id: randomUUID(),
          receivedAt: new Date().toISOString(),
          from: addresses(parsed.from)[0] ?? (session.envelope.mailFrom ? session.envelope.mailFrom.address : ''),
          to,
          subject: parsed.subject ?? '',
          text: parsed.text ?? '',
          html: typeof parsed.html === 'string' ? parsed.html : null,
          attachments: parsed.attachments.map((att) => ({ filename: att.filename ?? 'attachment', contentType: att.contentType, size: att.size })),
          messageId: parsed.messageId ?? null,
          listHeaders: Object.fromEntries(['list-unsubscribe', 'list-unsubscribe-post'].flatMap((h) => (parsed.headers.has(h) ? [[h, String(parsed.headers.get(h))]] : []))),
        });
        callback();
      })
      .catch((e: unknown) => callback(e instanceof Error ? e : new Error(String(e))));
  },
});

server.on('error', (e: NodeJS.ErrnoException) => {
  if (e.code === 'EADDRINUSE') console.error(`thawline: mail port ${port} is taken; set SMTP_PORT to a free port`);
  else console.error(`thawline: mail service error: ${e.message}`);
  process.exit(1);
});

server.listen(port, '127.0.0.1', () => console.log(`mail service on 127.0.0.1:${port}, keeping messages in ${dir}`));

for (const sig of ['SIGINT', 'SIGTERM'] as const) process.on(sig, () => server.close(() => process.exit(0)));
