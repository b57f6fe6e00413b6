import 'server-only';
import { and, asc, eq } from 'drizzle-orm';
import { db, type Tx } from '@/db/client';
import { memberships, users, type Role } from '@/db/schema';
import { recordAuditEvent } from './core/audit-log';
import { notFoundUnlessOwn, requireActor, ROLES, type Actor } from './session';

export interface MemberDto {
  membershipId: string;
  userId: string;
  email: string;
  name: string | null;
  role: Role;
  joinedAt: string;
  isSelf: boolean;
}

/** Members of the active organisation, by e-mail. Admins only. */
export async function listMembers(): Promise<MemberDto[]> {
  const actor = await requireActor(ROLES.admin);
  const rows = await db
    .select({ membershipId: memberships.id, userId: users.id, email: users.email, name: users.name, role: memberships.role, joinedAt: memberships.createdAt })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.organisationId, actor.organisationId))
    .orderBy(asc(users.email));
  return rows.map((r) => ({ ...r, joinedAt: r.joinedAt.toISOString(), isSelf: r.userId === actor.userId }));
}

export class MemberChangeRefused extends Error {
  constructor(message: string) {
    super(message);
  }
}

export const LAST_ADMIN_MESSAGE = 'An organisation needs at least one admin. Make another member an admin first.';

/**
 * Locks the organisation's admin memberships and the target row (SELECT … FOR UPDATE) so two admins
 * demoting each other at once cannot leave the organisation with none.
 */
async function lockForChange(tx: Tx, actor: Actor, membershipId: string) {
  const [target] = await tx
    .select({ id: memberships.id, organisationId: memberships.organisationId, userId: memberships.userId, role: memberships.role, email: users.email })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.id, membershipId))
    .for('update');
  notFoundUnlessOwn(target?.organisationId, actor);
  const admins = await tx
    .select({ id: memberships.id })
    .from(memberships)
    .where(and(eq(memberships.organisationId, actor.organisationId), eq(memberships.role, 'admin')))
    .for('update');
  return { target: target!, adminCount: admins.length };
}

/** Changes a member's role in the active organisation. Admins only; the last admin stays an admin. */
export async function changeMemberRole(input: { membershipId: string; role: Role }): Promise<MemberDto['role']> {
  const actor = await requireActor(ROLES.admin);
  return db.transaction(async (tx) => {
    const { target, adminCount } = await lockForChange(tx, actor, input.membershipId);
    if (target.role === input.role) return target.role;
    if (target.role === 'admin' && adminCount <= 1) throw new MemberChangeRefused(LAST_ADMIN_MESSAGE);
    await tx.update(memberships).set({ role: input.role }).where(eq(memberships.id, target.id));
    await recordAuditEvent(
      { event: 'member.role_changed', organisationId: actor.organisationId, actorUserId: actor.userId, subject: target.email, detail: { from: target.role, to: input.role } },
      tx,
    );
    return input.role;
  });
}

/** Removes a member from the active organisation. Admins only; the last admin cannot be removed. */
export async function removeMember(input: { membershipId: string }): Promise<void> {
  const actor = await requireActor(ROLES.admin);
  await db.transaction(async (tx) => {
    const { target, adminCount } = await lockForChange(tx, actor, input.membershipId);
    if (target.role === 'admin' && adminCount <= 1) throw new MemberChangeRefused(LAST_ADMIN_MESSAGE);
    await tx.delete(memberships).where(eq(memberships.id, target.id));
    await recordAuditEvent(
      { event: 'member.removed', organisationId: actor.organisationId, actorUserId: actor.userId, subject: target.email, detail: { role: target.role } },
      tx,
    );
  });
}
