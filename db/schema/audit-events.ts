import { bigint, index, json, mysqlTable, timestamp, varchar } from 'drizzle-orm/mysql-core';
import { sql } from 'drizzle-orm';
import { uuidRef } from './columns';

/** Security-relevant events (sign-in, failed sign-in, invitation, role change, publication). Append-only. */
export const auditEvents = mysqlTable(
  'audit_events',
  {
    id: bigint({ mode: 'number', unsigned: true }).autoincrement().primaryKey(),
    organisationId: uuidRef(),
    actorUserId: varchar({ length: 255 }),
    /** Dotted event code, e.g. `auth.sign_in`, `member.role_changed`. */
    event: varchar({ length: 64 }).notNull(),
    /** The e-mail address or object the event concerns. */
    subject: varchar({ length: 255 }),
    detail: json().$type<Record<string, unknown>>(),
    ip: varchar({ length: 64 }),
    createdAt: timestamp({ fsp: 3 }).notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  (t) => [index('audit_events_org_created_idx').on(t.organisationId, t.createdAt)],
);

export type AuditEvent = typeof auditEvents.$inferSelect;
