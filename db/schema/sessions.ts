import { mysqlTable, timestamp, varchar } from 'drizzle-orm/mysql-core';
import { users } from './users';

/** Auth.js adapter table: database sessions. */
export const sessions = mysqlTable('sessions', {
  sessionToken: varchar({ length: 255 }).primaryKey(),
  userId: varchar({ length: 255 })
    .notNull()
    .references(() => users.id, { onDelete: 'cascade' }),
  expires: timestamp({ mode: 'date' }).notNull(),
});
