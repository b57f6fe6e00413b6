import 'server-only';
import path from 'node:path';
import { env } from '@/lib/server/env';
import { getMessage, listMessages, type StoredMessage } from '@/lib/mail/store';

/**
 * The development inbox: the messages the local mail service kept. Only with DEV_INBOX set (the
 * start and test commands set it; a real deployment does not), and then open to anyone on this
 * machine, as a local mail catcher is; it never shows mail of a real relay.
 */
export function devInboxEnabled(): boolean {
  return env.DEV_INBOX;
}

const storeDir = () => path.resolve(env.MAIL_STORE_DIR);

export type InboxEntry = Pick<StoredMessage, 'id' | 'receivedAt' | 'from' | 'to' | 'subject'>;

export async function listInbox(to?: string): Promise<InboxEntry[] | null> {
  if (!devInboxEnabled()) return null;
  const messages = await listMessages(storeDir(), to);
  return messages.map(({ id, receivedAt, from, to: rcpt, subject }) => ({ id, receivedAt, from, to: rcpt, subject }));
}

export async function getInboxMessage(id: string): Promise<StoredMessage | null> {
  if (!devInboxEnabled()) return null;
  return getMessage(storeDir(), id);
}
