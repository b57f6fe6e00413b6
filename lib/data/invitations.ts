import 'server-only';
import { randomBytes } from 'node:crypto';
import { and, asc, eq, gt, isNull } from 'drizzle-orm';
import { db } from '@/db/client';
import { invitations, memberships, organisations, users, type Role } from '@/db/schema';
import { env } from '@/lib/server/env';
import { queueMail } from '@/lib/mail/outbox';
import { consume } from '@/lib/server/rate-limit';
import { recordAuditEvent } from './core/audit-log';
import { hashToken, INVITATION_MAX_AGE_MS } from './core/invitation-acceptance';
import { notFoundUnlessOwn, requireActor, ROLES } from './session';

export interface PendingInvitationDto {
  invitationId: string;
  email: string;
  role: Role;
  expiresAt: string;
  invitedBy: string | null;
}

/** Open invitations of the active organisation (not accepted, not revoked, not expired). Admins only. */
export async function listPendingInvitations(): Promise<PendingInvitationDto[]> {
  const actor = await requireActor(ROLES.admin);
  const rows = await db
    .select({ invitationId: invitations.id, email: invitations.email, role: invitations.role, expiresAt: invitations.expiresAt, invitedBy: users.email })
    .from(invitations)
    .leftJoin(users, eq(users.id, invitations.invitedByUserId))
    .where(and(eq(invitations.organisationId, actor.organisationId), isNull(invitations.acceptedAt), isNull(invitations.revokedAt), gt(invitations.expiresAt, new Date())))
    .orderBy(asc(invitations.email));
  return rows.map((r) => ({ ...r, expiresAt: r.expiresAt.toISOString() }));
}

export type CreateInvitationOutcome = { ok: true } | { ok: false; field?: 'email'; message: string };

/**
 * Invites an address into the active organisation with a role and e-mails a single-use link.
 * Admins only. An earlier open invitation for the same address is revoked, so one link is live.
 */
export async function createInvitation(input: { email: string; role: Role }): Promise<CreateInvitationOutcome> {
  const actor = await requireActor(ROLES.admin);
  if (!(await consume('invitationsSentPerAdmin', actor.userId)).ok) {
    return { ok: false, message: 'You have sent many invitations in the last hour. Try again later.' };
  }
  const [existing] = await db
    .select({ id: memberships.id })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.organisationId, actor.organisationId), eq(users.email, input.email)))
    .limit(1);
  if (existing) return { ok: false, field: 'email', message: 'This person is already a member. Change their role in the list instead.' };

  const token = randomBytes(32).toString('base64url');
  const expiresAt = new Date(Date.now() + INVITATION_MAX_AGE_MS);
  // The configured APP_URL, never the request's Host header (a forged Host must not receive tokens).
  const url = `${env.APP_URL.replace(/\/$/, '')}/invite/${token}`;
  // The invitation and its e-mail are stored together (the outbox): a mail service that is down
  // delays the message, it never loses it.
  await db.transaction(async (tx) => {
    await tx
      .update(invitations)
      .set({ revokedAt: new Date() })
      .where(and(eq(invitations.organisationId, actor.organisationId), eq(invitations.email, input.email), isNull(invitations.acceptedAt), isNull(invitations.revokedAt)));
    await tx.insert(invitations).values({ organisationId: actor.organisationId, email: input.email, role: input.role, tokenSha256: hashToken(token), invitedByUserId: actor.userId, expiresAt });
    await recordAuditEvent({ event: 'invitation.created', organisationId: actor.organisationId, actorUserId: actor.userId, subject: input.email, detail: { role: input.role } }, tx);
    await queueMail(
      tx,
      {
        to: input.email,
        subject: `You are invited to ${actor.organisationName} on Thawline`,
        text: [
          'Hello,',
          '',
          `${actor.name ?? actor.email} invites you to join ${actor.organisationName} on Thawline as ${input.role}.`,
          '',
          'Open this link to accept and sign in:',
          url,
          '',
          'The link works once and expires in 7 days. If you did not expect this, you can ignore this message.',
        ].join('\n'),
      },
      { organisationId: actor.organisationId },
    );
  });
  return { ok: true };
}

/** Revokes an open invitation of the active organisation. Admins only; another organisation's → 404. */
export async function revokeInvitation(input: { invitationId: string }): Promise<void> {
  const actor = await requireActor(ROLES.admin);
  const [row] = await db.select({ id: invitations.id, organisationId: invitations.organisationId, email: invitations.email, acceptedAt: invitations.acceptedAt }).from(invitations).where(eq(invitations.id, input.invitationId)).limit(1);
  notFoundUnlessOwn(row?.organisationId, actor);
  if (row!.acceptedAt) return;
  await db.update(invitations).set({ revokedAt: new Date() }).where(eq(invitations.id, row!.id));
  await recordAuditEvent({ event: 'invitation.revoked', organisationId: actor.organisationId, actorUserId: actor.userId, subject: row!.email });
}

export type InvitationStatus = 'valid' | 'expired' | 'used' | 'revoked' | 'invalid';

export interface InvitationPreview {
  status: InvitationStatus;
  organisationName?: string;
  role?: Role;
  email?: string;
}

/**
 * What the invitation page may show for a token. Public by design: the token itself is the secret,
 * so a valid one reveals the organisation and the invited address; anything else reveals nothing.
 */
export async function previewInvitation(token: string): Promise<InvitationPreview> {
  const [row] = await db
    .select({ email: invitations.email, role: invitations.role, expiresAt: invitations.expiresAt, acceptedAt: invitations.acceptedAt, revokedAt: invitations.revokedAt, organisationName: organisations.name })
    .from(invitations)
    .innerJoin(organisations, eq(organisations.id, invitations.organisationId))
    .where(eq(invitations.tokenSha256, hashToken(token)))
    .limit(1);
  if (!row) return { status: 'invalid' };
  if (row.acceptedAt) return { status: 'used' };
  if (row.revokedAt) return { status: 'revoked' };
  if (row.expiresAt.getTime() <= Date.now()) return { status: 'expired' };
  return { status: 'valid', organisationName: row.organisationName, role: row.role, email: row.email };
}
