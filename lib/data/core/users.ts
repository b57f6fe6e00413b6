import 'server-only';
import { eq } from 'drizzle-orm';
import { db } from '@/db/client';
import { users } from '@/db/schema';

/**
 * Look-ups of the sign-in flow, before anyone is signed in (so apart from the session). They answer
 * only whether an address belongs to a person Thawline knows, never anything about them.
 */

/** The user id of a known address, or null. */
export async function findUserIdByEmail(email: string): Promise<string | null> {
  const [row] = await db.select({ id: users.id }).from(users).where(eq(users.email, email)).limit(1);
  return row?.id ?? null;
}
