import { boolean, mysqlEnum, mysqlTable, timestamp, uniqueIndex, varchar } from 'drizzle-orm/mysql-core';
import { timestamps, uuidPk, uuidRef } from './columns';
import { briefingVersions } from './briefing-versions';
import { users } from './users';

export const briefingLanguageStates = ['draft', 'in_review', 'approved'] as const;
export type BriefingLanguageState = (typeof briefingLanguageStates)[number];

/**
 * A language of a briefing version and its review state. English is approved by its publication;
 * another language only by a translator. `shipped` is false for a language the product has no
 * catalogue for, whose strings a translator supplied.
 */
export const briefingLanguages = mysqlTable(
  'briefing_languages',
  {
    id: uuidPk(),
    versionId: uuidRef()
      .notNull()
      .references(() => briefingVersions.id, { onDelete: 'cascade' }),
    /** BCP 47 tag, e.g. `fr`, `iu-Cans`, `ikt-Latn`. */
    lang: varchar({ length: 35 }).notNull(),
    state: mysqlEnum(briefingLanguageStates).notNull().default('draft'),
    shipped: boolean().notNull().default(true),
    approvedAt: timestamp({ fsp: 3 }),
    approvedByUserId: varchar({ length: 255 }).references(() => users.id, { onDelete: 'set null' }),
    ...timestamps,
  },
  (t) => [uniqueIndex('briefing_languages_version_lang_unique').on(t.versionId, t.lang)],
);

export type BriefingLanguage = typeof briefingLanguages.$inferSelect;
