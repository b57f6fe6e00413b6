import { boolean, double, index, json, mysqlTable, uniqueIndex, varchar } from 'drizzle-orm/mysql-core';
import { timestamps, uuidPk, uuidRef } from './columns';
import { organisations } from './organisations';

/** A community an organisation serves, with its location and languages. */
export const communities = mysqlTable(
  'communities',
  {
    id: uuidPk(),
    organisationId: uuidRef()
      .notNull()
      .references(() => organisations.id, { onDelete: 'restrict' }),
    name: varchar({ length: 200 }).notNull(),
    slug: varchar({ length: 80 }).notNull(),
    latitudeDeg: double().notNull(),
    longitudeDeg: double().notNull(),
    /** Briefing languages (BCP 47), English first. */
    languages: json().$type<string[]>().notNull(),
    population: varchar({ length: 32 }),
    description: varchar({ length: 2000 }),
    isDemo: boolean().notNull().default(false),
    ...timestamps,
  },
  (t) => [uniqueIndex('communities_slug_unique').on(t.slug), index('communities_org_idx').on(t.organisationId)],
);

export type Community = typeof communities.$inferSelect;
export type NewCommunity = typeof communities.$inferInsert;
