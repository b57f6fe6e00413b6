/**
 * The mail outbox: a message queued while the mail service cannot be reached is kept, retried, and
 * delivered exactly once when it can; the stable Message-ID chosen at queueing is the one delivered.
 * Real parts: MariaDB (throw-away database), worker processes, and the local mail service of the
 * test run (SMTP_PORT) — "down" is a worker pointed at a loopback port where nothing listens.
 */
import net from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eq, sql } from 'drizzle-orm';
import { jobs } from '@/db/schema';
import { getJob } from '@/lib/jobs/queue';
import { queueMail } from '@/lib/mail/outbox';
import { listMessages } from '@/lib/mail/store';
import { MAIL_STORE_DIR, uniqueAddress } from './helpers/app-client';
import { startWorkerProcess, until } from './helpers/worker-process';
import { createThrowawayDb, type ThrowawayDb } from './throwaway-db';

let t: ThrowawayDb;

beforeAll(async () => {
  t = await createThrowawayDb();
}, 60_000);

afterAll(async () => {
  await t?.drop();
});

/** A loopback port with nothing listening on it. */
async function closedPort(): Promise<number> {
  const server = net.createServer();
  await new Promise<void>((r) => server.listen(0, '127.0.0.1', r));
  const port = (server.address() as net.AddressInfo).port;
  await new Promise((r) => server.close(r));
  return port;
}

describe('mail outbox', () => {
  it('keeps a message while the mail service is down and delivers it once when it is back', async () => {
    const to = uniqueAddress('outbox');
    const { jobId, messageId } = await queueMail(t.db, { to, subject: 'Outbox probe', text: 'One message, whatever happens.' });

    const down = startWorkerProcess(t.name, { env: { SMTP_PORT: String(await closedPort()) } });
    try {
      await until('a failed attempt', async () => {
        const j = await getJob(t.db, jobId);
        return j && j.attempts >= 1 && j.state === 'queued' ? j : null;
      }, 60_000);
    } finally {
      down.kill();
    }
    const waiting = await getJob(t.db, jobId);
    expect(waiting?.error).toMatch(/did not take the message/);
    expect(await listMessages(MAIL_STORE_DIR, to)).toHaveLength(0);

    // Skip the retry delay, then a worker that reaches the mail service.
    await t.db.update(jobs).set({ runAfter: sql`NOW(3)` }).where(eq(jobs.id, jobId));
    const up = startWorkerProcess(t.name);
    try {
      const done = await until('the delivery', async () => {
        const j = await getJob(t.db, jobId);
        return j?.state === 'succeeded' ? j : null;
      }, 60_000);
      expect(done.attempts).toBe(2);
      const messages = await until('the message in the local mail store', async () => {
        const m = await listMessages(MAIL_STORE_DIR, to);
        return m.length ? m : null;
      }, 10_000);
      await new Promise((r) => setTimeout(r, 1000));
      expect(await listMessages(MAIL_STORE_DIR, to)).toHaveLength(1);
      expect(messages[0]!.messageId).toBe(messageId);
    } finally {
      up.kill();
    }
  }, 150_000);
});
