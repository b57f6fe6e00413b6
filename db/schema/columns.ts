import { sql } from 'drizzle-orm';
import { timestamp, varchar } from 'drizzle-orm/mysql-core';

/** Primary key as a random UUID: ids of one organisation say nothing about another's. */
export const uuidPk = () =>
  varchar({ length: 36 })
    .primaryKey()
    .$defaultFn(() => crypto.randomUUID());

/** A foreign key to a UUID primary key. */
export const uuidRef = () => varchar({ length: 36 });

export const timestamps = {
  createdAt: timestamp({ fsp: 3 }).notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  updatedAt: timestamp({ fsp: 3 })
    .notNull()
    .default(sql`CURRENT_TIMESTAMP(3)`)
    .$onUpdate(() => new Date()),
};
