import { int, mysqlTable, primaryKey, varchar } from 'drizzle-orm/mysql-core';
import { users } from './users';

/** Auth.js adapter table: linked sign-in providers of a user (column keys are the adapter's). */
export const accounts = mysqlTable(
  'accounts',
  {
    userId: varchar({ length: 255 })
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    type: varchar({ length: 255 }).notNull(),
    provider: varchar({ length: 255 }).notNull(),
    providerAccountId: varchar({ length: 255 }).notNull(),
    refresh_token: varchar({ length: 2048 }),
    access_token: varchar({ length: 2048 }),
    expires_at: int(),
    token_type: varchar({ length: 255 }),
    scope: varchar({ length: 255 }),
    id_token: varchar({ length: 2048 }),
    session_state: varchar({ length: 255 }),
  },
  (t) => [primaryKey({ columns: [t.provider, t.providerAccountId] })],
);
