import 'server-only';
import { db, type Tx } from '@/db/client';
import { auditEvents } from '@/db/schema';
import { clientIp } from '@/lib/server/rate-limit';

/**
 * The audit log's write, apart from the session (like every module in lib/data/core/): sign-in code
 * in lib/auth records events before anyone is signed in, and the session module itself depends on
 * lib/auth, so nothing here may import lib/data/session.ts.
 */

/** Event codes written to the audit log. Dotted, stable: admins filter on them. */
export const auditEventCodes = [
  'auth.sign_in',
  'auth.sign_in_failed',
  'auth.sign_in_link_sent',
  'auth.rate_limited',
  'auth.sign_out',
  'invitation.created',
  'invitation.accepted',
  'invitation.revoked',
  'member.role_changed',
  'member.removed',
  'organisation.switched',
  'briefing.created',
  'briefing.submitted',
  'briefing.published',
  'briefing.superseded',
  'briefing.version_created',
  'briefing.language_added',
  'briefing.string_corrected',
  'briefing.language_approved',
] as const;
export type AuditEventCode = (typeof auditEventCodes)[number];

export interface AuditInput {
  event: AuditEventCode;
  /** Null for events that concern a person rather than one organisation (sign-in). */
  organisationId: string | null;
  actorUserId: string | null;
  /** The e-mail address or object the event concerns. */
  subject?: string | null;
  detail?: Record<string, unknown>;
  ip?: string | null;
}

/**
 * Appends one event. Never throws into the caller's flow for a sign-in: a failed audit write is logged,
 * because refusing a sign-in for it would lock everyone out when the table is busy. Inside a transaction
 * (tx given) it does throw, so the change and its record commit together.
 */
export async function recordAuditEvent(input: AuditInput, tx?: Tx): Promise<void> {
  // Outside a request (scripts, jobs) there are no headers: no IP.
  const ip = input.ip !== undefined ? input.ip : await clientIp().catch(() => null);
  const row = {
    event: input.event,
    organisationId: input.organisationId,
    actorUserId: input.actorUserId,
    subject: input.subject?.slice(0, 255) ?? null,
    detail: input.detail ?? null,
    ip: ip?.slice(0, 64) ?? null,
  };
  if (tx) {
    await tx.insert(auditEvents).values(row);
    return;
  }
  try {
    await db.insert(auditEvents).values(row);
  } catch (e) {
    console.error(`thawline: audit write failed for ${input.event}: ${(e as Error).message}`);
  }
}
