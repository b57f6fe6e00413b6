import { mysqlTable, text, uniqueIndex, varchar } from 'drizzle-orm/mysql-core';
import { timestamps, uuidPk, uuidRef } from './columns';
import { briefingVersions } from './briefing-versions';
import { users } from './users';

/**
 * One string of a briefing version in one language: the text generated from the numbers and, when a
 * translator corrected it, their correction (shown instead). A correction belongs to the numbers it
 * was made for (`numbersSha256`): regenerating the same numbers keeps it.
 */
export const briefingStrings = mysqlTable(
  'briefing_strings',
  {
    id: uuidPk(),
    versionId: uuidRef()
      .notNull()
      .references(() => briefingVersions.id, { onDelete: 'cascade' }),
    lang: varchar({ length: 35 }).notNull(),
    /** Stable key of the string within the briefing, e.g. `keyMessages.0`, `cautions.designBasis`. */
    key: varchar({ length: 120 }).notNull(),
    generated: text().notNull(),
    correction: text(),
    numbersSha256: varchar({ length: 64 }).notNull(),
    correctedByUserId: varchar({ length: 255 }).references(() => users.id, { onDelete: 'set null' }),
    ...timestamps,
  },
  (t) => [uniqueIndex('briefing_strings_version_lang_key_unique').on(t.versionId, t.lang, t.key)],
);

export type BriefingString = typeof briefingStrings.$inferSelect;
