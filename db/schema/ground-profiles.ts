import { index, int, mysqlTable, uniqueIndex, varchar } from 'drizzle-orm/mysql-core';
import { timestamps, uuidPk, uuidRef } from './columns';
import { communities } from './communities';

/** One terrain unit of a community (a gravel pad, an ice-rich silt terrace, bedrock …). */
export const groundProfiles = mysqlTable(
  'ground_profiles',
  {
    id: uuidPk(),
    communityId: uuidRef()
      .notNull()
      .references(() => communities.id, { onDelete: 'cascade' }),
    /** The terrain unit's name as residents know it. */
    name: varchar({ length: 200 }).notNull(),
    slug: varchar({ length: 80 }).notNull(),
    /** Version number of the current `ground_profile_versions` row. */
    currentVersion: int().notNull().default(1),
    ...timestamps,
  },
  (t) => [uniqueIndex('ground_profiles_community_slug_unique').on(t.communityId, t.slug), index('ground_profiles_community_idx').on(t.communityId)],
);

export type GroundProfile = typeof groundProfiles.$inferSelect;
