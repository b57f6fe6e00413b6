import { mysqlTable, primaryKey, timestamp, varchar } from 'drizzle-orm/mysql-core';

/** Auth.js adapter table: single-use e-mail sign-in tokens (stored hashed by Auth.js). */
export const verificationTokens = mysqlTable(
  'verification_tokens',
  {
    identifier: varchar({ length: 255 }).notNull(),
    token: varchar({ length: 255 }).notNull(),
    expires: timestamp({ mode: 'date' }).notNull(),
  },
  (t) => [primaryKey({ columns: [t.identifier, t.token] })],
);
