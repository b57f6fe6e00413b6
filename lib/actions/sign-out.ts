'use server';

import { signOut } from '@/lib/auth/auth';
import { getSignedInUser } from '@/lib/data/session';
import { recordAuditEvent } from '@/lib/data/core/audit-log';

/** Ends the session (clears the cookie) and returns to the sign-in page. Anyone may call it. */
export async function signOutAction(): Promise<void> {
  const user = await getSignedInUser();
  if (user) await recordAuditEvent({ event: 'auth.sign_out', organisationId: null, actorUserId: user.userId, subject: user.email });
  await signOut({ redirectTo: '/sign-in?signedOut=1' });
}
