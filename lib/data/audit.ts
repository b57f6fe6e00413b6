import 'server-only';
import { and, desc, eq, inArray, isNull, or } from 'drizzle-orm';
import { db } from '@/db/client';
import { auditEvents, memberships, users } from '@/db/schema';
import { requireActor, ROLES } from './session';

export interface AuditEventDto {
  id: number;
  createdAt: string;
  event: string;
  actorEmail: string | null;
  subject: string | null;
  detail: Record<string, unknown> | null;
  ip: string | null;
}

/**
 * The organisation's audit log, newest first: its own events and the person-level events (sign-ins)
 * of its current members. Admins only.
 */
export async function listAuditEvents(opts: { limit?: number } = {}): Promise<AuditEventDto[]> {
  const actor = await requireActor(ROLES.admin);
  const limit = Math.min(Math.max(opts.limit ?? 200, 1), 500);
  const memberIds = db.select({ id: memberships.userId }).from(memberships).where(eq(memberships.organisationId, actor.organisationId));
  const rows = await db
    .select({
      id: auditEvents.id,
      createdAt: auditEvents.createdAt,
      event: auditEvents.event,
      actorEmail: users.email,
      subject: auditEvents.subject,
      detail: auditEvents.detail,
      ip: auditEvents.ip,
    })
    .from(auditEvents)
    .leftJoin(users, eq(users.id, auditEvents.actorUserId))
    .where(
      or(
        eq(auditEvents.organisationId, actor.organisationId),
        and(isNull(auditEvents.organisationId), inArray(auditEvents.actorUserId, memberIds)),
      ),
    )
    .orderBy(desc(auditEvents.createdAt), desc(auditEvents.id))
    .limit(limit);
  return rows.map((r) => ({ ...r, createdAt: r.createdAt.toISOString(), detail: r.detail ?? null }));
}
