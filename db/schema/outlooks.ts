import { index, json, mysqlTable, uniqueIndex, varchar } from 'drizzle-orm/mysql-core';
import { timestamps, uuidPk, uuidRef } from './columns';
import { groundProfileVersions } from './ground-profile-versions';
import { organisations } from './organisations';
import { users } from './users';

/**
 * A computed outlook: the engine's `assess` document for one ground-profile version under the
 * requested scenarios and horizons, stored so that every reader sees the same numbers and every
 * number traces to its inputs (`inputSha256`, the engine's provenance hash) and the engine version.
 *
 * Unique per organisation, input hash and engine version: the same inputs on the same engine give
 * the same document, so a second run reuses the stored one. The organisation is part of the key on
 * purpose: two organisations can hold identical inputs, and one must never read the other's row
 * (who ran it, when).
 */
export const outlooks = mysqlTable(
  'outlooks',
  {
    id: uuidPk(),
    profileVersionId: uuidRef()
      .notNull()
      .references(() => groundProfileVersions.id, { onDelete: 'cascade' }),
    organisationId: uuidRef()
      .notNull()
      .references(() => organisations.id, { onDelete: 'cascade' }),
    /** Requested scenarios (AR6 SSP ids, low → high). */
    scenarios: json().$type<string[]>().notNull(),
    /** Requested planning horizons (decades). */
    horizons: json().$type<number[]>().notNull(),
    /** SHA-256 of the validated engine input in RFC 8785 canonical JSON (the engine's provenance). */
    inputSha256: varchar({ length: 64 }).notNull(),
    engineVersion: varchar({ length: 32 }).notNull(),
    /** The engine's output document (contract `assess`). */
    result: json().$type<Record<string, unknown>>().notNull(),
    computedByUserId: varchar({ length: 255 }).references(() => users.id, { onDelete: 'set null' }),
    ...timestamps,
  },
  (t) => [
    uniqueIndex('outlooks_org_input_engine_unique').on(t.organisationId, t.inputSha256, t.engineVersion),
    index('outlooks_profile_version_idx').on(t.profileVersionId),
  ],
);

export type Outlook = typeof outlooks.$inferSelect;
export type NewOutlook = typeof outlooks.$inferInsert;
