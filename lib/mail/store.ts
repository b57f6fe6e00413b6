import 'server-only';
/**
 * The local mail service's store: one JSON file per received message in MAIL_STORE_DIR. Written by
 * scripts/mail-server.ts, read by the development inbox and by tests. Not used with a real relay.
 */
import { mkdir, readdir, readFile, rename, writeFile } from 'node:fs/promises';
import path from 'node:path';

export interface StoredMessage {
  id: string;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
  attachments: { filename: string; contentType: string; size: number }[];
  /** The Message-ID header (null in messages stored before it was kept). */
  messageId?: string | null;
  /** Headers a reader may need to check (List-Unsubscribe, List-Unsubscribe-Post). */
  listHeaders?: Record<string, string>;
}

export async function saveMessage(dir: string, message: StoredMessage): Promise<void> {
  await mkdir(dir, { recursive: true });
  // Write then rename, so a reader never sees half a message.
  const file = path.join(dir, `${message.receivedAt.replace(/[:.]/g, '-')}-${message.id}.json`);
  await writeFile(`${file}.part`, JSON.stringify(message));
  await rename(`${file}.part`, file);
}

/** Messages, newest first; optionally only those addressed to `to`. */
export async function listMessages(dir: string, to?: string): Promise<StoredMessage[]> {
  let names: string[];
  try {
    names = (await readdir(dir)).filter((n) => n.endsWith('.json'));
  } catch (e) {
    if ((e as { code?: string }).code === 'ENOENT') return [];
    throw e;
  }
  names.sort().reverse();
  const messages = await Promise.all(names.map(async (n) => JSON.parse(await readFile(path.join(dir, n), 'utf8')) as StoredMessage));
  const wanted = to?.toLowerCase();
  return wanted ? messages.filter((m) => m.to.some((t) => t.toLowerCase() === wanted)) : messages;
}

export async function getMessage(dir: string, id: string): Promise<StoredMessage | null> {
  if (!/^[A-Za-z0-9-]+$/.test(id)) return null;
  const all = await listMessages(dir);
  return all.find((m) => m.id === id) ?? null;
}
