import { boolean, mysqlEnum, mysqlTable, uniqueIndex, varchar } from 'drizzle-orm/mysql-core';
import { timestamps, uuidPk } from './columns';

export const organisationKinds = ['community_government', 'regional_office'] as const;

/** A community government, or a regional office serving several communities. */
export const organisations = mysqlTable(
  'organisations',
  {
    id: uuidPk(),
    name: varchar({ length: 200 }).notNull(),
    slug: varchar({ length: 80 }).notNull(),
    kind: mysqlEnum(organisationKinds).notNull(),
    /** ISO 3166-1 alpha-2 of the jurisdiction whose codes govern (CA, US, RU, NO …); XX for the invented demo region. */
    countryCode: varchar({ length: 2 }).notNull(),
    isDemo: boolean().notNull().default(false),
    ...timestamps,
  },
  (t) => [uniqueIndex('organisations_slug_unique').on(t.slug)],
);

export type Organisation = typeof organisations.$inferSelect;
export type NewOrganisation = typeof organisations.$inferInsert;
