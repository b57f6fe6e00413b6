'use server';

import { AuthError } from 'next-auth';
import { redirect, unstable_rethrow } from 'next/navigation';
import { failure, validatedAction, type ActionResult } from '@/lib/server/validated-action';
import { signIn } from '@/lib/auth/auth';
import { emailSignInSchema, passwordSignInSchema, safeReturnPath } from '@/lib/schemas/auth';
import { recordAuditEvent } from '@/lib/data/core/audit-log';
import { findUserIdByEmail } from '@/lib/data/core/users';
import { clientIp, consume } from '@/lib/server/rate-limit';

function minutes(seconds: number): number {
  return Math.max(1, Math.ceil(seconds / 60));
}

/** Password sign-in. Success redirects to the return path; failure says what to do, never which part was wrong. */
export const signInWithPassword = validatedAction(passwordSignInSchema, async ({ email, password, returnTo }): Promise<ActionResult> => {
  try {
    await signIn('password', { email, password, redirectTo: safeReturnPath(returnTo) });
    return { ok: true };
  } catch (e) {
    unstable_rethrow(e);
    if (e instanceof AuthError) {
      const code = (e as AuthError & { code?: string }).code;
      if (code === 'rate_limited') return failure('Too many attempts. Wait 15 minutes, or ask for an e-mail link instead.');
      return failure('The e-mail address or password is not right. Check both, or ask for an e-mail link instead.');
    }
    throw e;
  }
});

/**
 * Sends a one-time sign-in link. The answer is the same whether or not the address belongs to a
 * member, so the form cannot be used to find out who has an account.
 */
export const requestEmailLink = validatedAction(emailSignInSchema, async ({ email, returnTo }): Promise<ActionResult> => {
  const ip = await clientIp();
  const perIp = await consume('signInPerIp', ip);
  const perAddress = await consume('linkPerAddress', email);
  if (!perIp.ok || !perAddress.ok) {
    await recordAuditEvent({ event: 'auth.rate_limited', organisationId: null, actorUserId: null, subject: email, ip, detail: { method: 'email' } });
    return failure(`Several links were sent to this address recently. Use the newest one, or wait ${minutes(Math.max(perIp.retryAfterSeconds, perAddress.retryAfterSeconds))} minutes.`);
  }
  const knownId = await findUserIdByEmail(email);
  if (!knownId) {
    await recordAuditEvent({ event: 'auth.sign_in_failed', organisationId: null, actorUserId: null, subject: email, ip, detail: { method: 'email', reason: 'unknown address' } });
    redirect('/sign-in/check-email');
  }
  try {
    await signIn('nodemailer', { email, redirectTo: safeReturnPath(returnTo), redirect: false });
  } catch (e) {
    unstable_rethrow(e);
    console.error(`thawline: e-mail link not sent: ${(e as Error).message}`);
    return failure('The sign-in link could not be sent just now. Try again in a minute, or sign in with your password.');
  }
  await recordAuditEvent({ event: 'auth.sign_in_link_sent', organisationId: null, actorUserId: knownId, subject: email, ip });
  redirect('/sign-in/check-email');
});
