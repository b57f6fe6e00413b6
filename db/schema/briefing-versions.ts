import { index, int, json, mysqlEnum, mysqlTable, timestamp, uniqueIndex, varchar } from 'drizzle-orm/mysql-core';
import { timestamps, uuidPk, uuidRef } from './columns';
import { briefings } from './briefings';
import { users } from './users';

export const briefingVersionStates = ['draft', 'in_review', 'published', 'superseded'] as const;
export type BriefingVersionState = (typeof briefingVersionStates)[number];

/**
 * One version of a briefing: the outlooks it was made from (fixed: their ids pin the profile
 * versions, horizons, scenarios and engine version) and its lifecycle state. A published version
 * never changes; a later publication marks it superseded and it stays readable as history.
 */
export const briefingVersions = mysqlTable(
  'briefing_versions',
  {
    id: uuidPk(),
    briefingId: uuidRef()
      .notNull()
      .references(() => briefings.id, { onDelete: 'cascade' }),
    version: int().notNull(),
    state: mysqlEnum(briefingVersionStates).notNull().default('draft'),
    /** The outlooks (one a terrain unit) the numbers come from, in display order. */
    outlookIds: json().$type<string[]>().notNull(),
    /** SHA-256 of the numbers the text was generated from; equal numbers keep translators' corrections. */
    numbersSha256: varchar({ length: 64 }).notNull(),
    publishedAt: timestamp({ fsp: 3 }),
    publishedByUserId: varchar({ length: 255 }).references(() => users.id, { onDelete: 'set null' }),
    ...timestamps,
  },
  (t) => [uniqueIndex('briefing_versions_briefing_version_unique').on(t.briefingId, t.version), index('briefing_versions_state_idx').on(t.state)],
);

export type BriefingVersion = typeof briefingVersions.$inferSelect;
