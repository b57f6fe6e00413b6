import { index, int, json, mysqlTable, uniqueIndex, varchar } from 'drizzle-orm/mysql-core';
import { timestamps, uuidPk, uuidRef } from './columns';
import { groundProfiles } from './ground-profiles';
import { users } from './users';

/**
 * Every saved state of a ground profile, never overwritten, so an outlook can always be traced to the
 * exact inputs it ran on. `site` holds the engine's site document (validated by lib/engine/site-schema).
 */
export const groundProfileVersions = mysqlTable(
  'ground_profile_versions',
  {
    id: uuidPk(),
    profileId: uuidRef()
      .notNull()
      .references(() => groundProfiles.id, { onDelete: 'cascade' }),
    version: int().notNull(),
    site: json().$type<Record<string, unknown>>().notNull(),
    /** SHA-256 of the site in RFC 8785 canonical JSON (the engine's cache key). */
    siteSha256: varchar({ length: 64 }).notNull(),
    /** Where the inputs came from (survey, borehole log, upload file name, demo). */
    sourceNote: varchar({ length: 1000 }),
    createdByUserId: varchar({ length: 255 }).references(() => users.id, { onDelete: 'set null' }),
    ...timestamps,
  },
  (t) => [uniqueIndex('ground_profile_versions_profile_version_unique').on(t.profileId, t.version), index('gpv_profile_idx').on(t.profileId)],
);

export type GroundProfileVersion = typeof groundProfileVersions.$inferSelect;
