import { index, mysqlTable, uniqueIndex, varchar } from 'drizzle-orm/mysql-core';
import { timestamps, uuidPk, uuidRef } from './columns';
import { communities } from './communities';
import { organisations } from './organisations';
import { users } from './users';

/**
 * A briefing of one community: the series of versions a planner prepares from its terrain units'
 * outlooks. `publicId` names it on the public pages; it is random and says nothing about the
 * organisation or the internal id.
 */
export const briefings = mysqlTable(
  'briefings',
  {
    id: uuidPk(),
    organisationId: uuidRef()
      .notNull()
      .references(() => organisations.id, { onDelete: 'cascade' }),
    communityId: uuidRef()
      .notNull()
      .references(() => communities.id, { onDelete: 'cascade' }),
    publicId: varchar({ length: 32 }).notNull(),
    createdByUserId: varchar({ length: 255 }).references(() => users.id, { onDelete: 'set null' }),
    ...timestamps,
  },
  (t) => [uniqueIndex('briefings_public_id_unique').on(t.publicId), index('briefings_org_community_idx').on(t.organisationId, t.communityId)],
);

export type Briefing = typeof briefings.$inferSelect;
