import { mysqlTable, timestamp, uniqueIndex, varchar } from 'drizzle-orm/mysql-core';
import { timestamps } from './columns';

/** People who sign in. The id, name, email, emailVerified and image columns are Auth.js's adapter shape. */
export const users = mysqlTable(
  'users',
  {
    id: varchar({ length: 255 })
      .primaryKey()
      .$defaultFn(() => crypto.randomUUID()),
    name: varchar({ length: 255 }),
    email: varchar({ length: 255 }).notNull(),
    emailVerified: timestamp({ mode: 'date', fsp: 3 }),
    image: varchar({ length: 255 }),
    /** Argon2id hash; null for people who sign in by e-mail link only. */
    passwordHash: varchar({ length: 255 }),
    /** Preferred interface language (BCP 47). */
    locale: varchar({ length: 16 }).notNull().default('en'),
    ...timestamps,
  },
  (t) => [uniqueIndex('users_email_unique').on(t.email)],
);

export type User = typeof users.$inferSelect;
export type NewUser = typeof users.$inferInsert;
