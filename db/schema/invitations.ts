import { index, mysqlEnum, mysqlTable, timestamp, uniqueIndex, varchar } from 'drizzle-orm/mysql-core';
import { timestamps, uuidPk, uuidRef } from './columns';
import { organisations } from './organisations';
import { roles } from './memberships';
import { users } from './users';

/** An admin's invitation by e-mail: the token is stored only as its SHA-256, used once, and expires. */
export const invitations = mysqlTable(
  'invitations',
  {
    id: uuidPk(),
    organisationId: uuidRef()
      .notNull()
      .references(() => organisations.id, { onDelete: 'cascade' }),
    email: varchar({ length: 255 }).notNull(),
    role: mysqlEnum(roles).notNull(),
    tokenSha256: varchar({ length: 64 }).notNull(),
    invitedByUserId: varchar({ length: 255 }).references(() => users.id, { onDelete: 'set null' }),
    expiresAt: timestamp({ fsp: 3 }).notNull(),
    acceptedAt: timestamp({ fsp: 3 }),
    revokedAt: timestamp({ fsp: 3 }),
    ...timestamps,
  },
  (t) => [uniqueIndex('invitations_token_unique').on(t.tokenSha256), index('invitations_org_idx').on(t.organisationId)],
);

export type Invitation = typeof invitations.$inferSelect;
