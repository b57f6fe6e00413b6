'use server';

import { AuthError } from 'next-auth';
import { unstable_rethrow } from 'next/navigation';
import { z } from 'zod';
import { failure, validatedAction, type ActionResult } from '@/lib/server/validated-action';
import { signIn } from '@/lib/auth/auth';
import { invitationTokenSchema } from '@/lib/schemas/auth';

const messages: Record<string, string> = {
  invitation_invalid: 'This invitation link is not valid. Check that you opened the whole link from the e-mail.',
  invitation_expired: 'This invitation has expired. Ask the admin who invited you to send a new one.',
  invitation_used: 'This invitation was already accepted. Sign in with your e-mail address instead.',
  invitation_revoked: 'This invitation was withdrawn. Ask the admin who invited you if this is a mistake.',
  rate_limited: 'Too many attempts from this network. Wait 15 minutes and try again.',
};

/** Accepts the invitation and signs the person in (the Auth.js "invitation" credential). Public: the token is the proof. */
export const acceptInvitation = validatedAction(z.object({ token: invitationTokenSchema }), async ({ token }): Promise<ActionResult> => {
  try {
    await signIn('invitation', { token, redirectTo: '/workspace?welcome=1' });
    return { ok: true };
  } catch (e) {
    unstable_rethrow(e);
    if (e instanceof AuthError) {
      const code = (e as AuthError & { code?: string }).code ?? '';
      return failure(messages[code] ?? messages.invitation_invalid);
    }
    throw e;
  }
});
