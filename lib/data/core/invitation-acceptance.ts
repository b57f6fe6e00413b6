import 'server-only';
import { createHash } from 'node:crypto';
import { and, eq } from 'drizzle-orm';
import { db } from '@/db/client';
import { invitations, memberships, users } from '@/db/schema';
import { recordAuditEvent } from './audit-log';

/**
 * Invitation tokens and their acceptance, apart from the session: the Auth.js "invitation" provider
 * (lib/auth) accepts an invitation before anyone is signed in.
 */

/** Invitations expire after 7 days (common practice for account invitations) and work once. */
export const INVITATION_MAX_AGE_MS = 7 * 24 * 60 * 60 * 1000;

export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}

export class InvitationError extends Error {
  constructor(public readonly reason: 'invalid' | 'expired' | 'used' | 'revoked') {
    super(`invitation ${reason}`);
  }
}

/**
 * Accepts an invitation and returns the person to sign in (the Auth.js "invitation" provider calls
 * this). In one transaction with the invitation row locked: checks it is open, creates the user if the
 * address is new (the mailed token proves the address), adds the membership, marks it used.
 */
export async function acceptInvitationForSignIn(token: string, ip: string): Promise<{ id: string; email: string; name: string | null }> {
  return db.transaction(async (tx) => {
    const [inv] = await tx.select().from(invitations).where(eq(invitations.tokenSha256, hashToken(token))).for('update');
    if (!inv) throw new InvitationError('invalid');
    if (inv.acceptedAt) throw new InvitationError('used');
    if (inv.revokedAt) throw new InvitationError('revoked');
    if (inv.expiresAt.getTime() <= Date.now()) throw new InvitationError('expired');

    let [user] = await tx.select({ id: users.id, email: users.email, name: users.name, emailVerified: users.emailVerified }).from(users).where(eq(users.email, inv.email)).limit(1);
    if (!user) {
      const id = crypto.randomUUID();
      await tx.insert(users).values({ id, email: inv.email, emailVerified: new Date() });
      user = { id, email: inv.email, name: null, emailVerified: new Date() };
    } else if (!user.emailVerified) {
      await tx.update(users).set({ emailVerified: new Date() }).where(eq(users.id, user.id));
    }
    const [member] = await tx.select({ id: memberships.id }).from(memberships).where(and(eq(memberships.organisationId, inv.organisationId), eq(memberships.userId, user.id))).limit(1);
    // Someone who is already a member keeps the role an admin gave them since.
    if (!member) await tx.insert(memberships).values({ organisationId: inv.organisationId, userId: user.id, role: inv.role });
    await tx.update(invitations).set({ acceptedAt: new Date() }).where(eq(invitations.id, inv.id));
    await recordAuditEvent({ event: 'invitation.accepted', organisationId: inv.organisationId, actorUserId: user.id, subject: inv.email, detail: { role: inv.role }, ip }, tx);
    return { id: user.id, email: user.email, name: user.name };
  });
}
