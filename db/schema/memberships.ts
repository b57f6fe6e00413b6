import { index, mysqlEnum, mysqlTable, uniqueIndex, varchar } from 'drizzle-orm/mysql-core';
import { timestamps, uuidPk, uuidRef } from './columns';
import { organisations } from './organisations';
import { users } from './users';

// Relative path: drizzle-kit loads the schema without the project's path aliases.
import { roles } from '../../lib/schemas/roles';

export { roles, type Role } from '../../lib/schemas/roles';

/** A person's role in one organisation; a person may belong to several. */
export const memberships = mysqlTable(
  'memberships',
  {
    id: uuidPk(),
    organisationId: uuidRef()
      .notNull()
      .references(() => organisations.id, { onDelete: 'cascade' }),
    userId: varchar({ length: 255 })
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    role: mysqlEnum(roles).notNull(),
    ...timestamps,
  },
  (t) => [uniqueIndex('memberships_org_user_unique').on(t.organisationId, t.userId), index('memberships_user_idx').on(t.userId)],
);

export type Membership = typeof memberships.$inferSelect;
