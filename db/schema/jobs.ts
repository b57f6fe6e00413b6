import { double, index, int, json, mysqlEnum, mysqlTable, text, timestamp, uniqueIndex, varchar } from 'drizzle-orm/mysql-core';
import { sql } from 'drizzle-orm';
import { timestamps, uuidPk, uuidRef } from './columns';
import { organisations } from './organisations';
import { users } from './users';

export const JOB_STATES = ['queued', 'running', 'succeeded', 'failed', 'cancelled'] as const;
export type JobState = (typeof JOB_STATES)[number];

/**
 * Background work: one row a job, claimed by worker processes (scripts/worker.ts) with
 * `SELECT … FOR UPDATE SKIP LOCKED` and held by a lease the worker renews while it works. Any number
 * of workers on any number of machines share this table; lib/jobs/queue.ts is the only code that
 * claims, renews, finishes or retries rows, for every kind.
 *
 * - `dedupeKey`: jobs with the same key are one job while it is queued, running or succeeded (two
 *   planners asking for the same outlook get the same row); it is cleared when a job fails or is
 *   cancelled, so that a new request starts afresh.
 * - `runAfter`: not claimed before this time (retries wait with a growing delay).
 * - `leaseExpiresAt`: a running job whose lease lapsed (its worker died) is claimed again, up to
 *   `maxAttempts` attempts in all, then failed with the reason.
 */
export const jobs = mysqlTable(
  'jobs',
  {
    id: uuidPk(),
    kind: varchar({ length: 40 }).notNull(),
    organisationId: uuidRef().references(() => organisations.id, { onDelete: 'cascade' }),
    payload: json().$type<Record<string, unknown>>().notNull(),
    /** SHA-256 of the work's input where the kind has one (an outlook: the engine's input hash). */
    inputSha256: varchar({ length: 64 }),
    dedupeKey: varchar({ length: 191 }),
    state: mysqlEnum(JOB_STATES).notNull().default('queued'),
    attempts: int().notNull().default(0),
    maxAttempts: int().notNull().default(3),
    /** 0–1, and a short stage code the page turns into words. */
    progress: double().notNull().default(0),
    stage: varchar({ length: 40 }),
    /** The kind's answer on success (an outlook: its id). */
    result: json().$type<Record<string, unknown>>(),
    /** Why the last attempt failed (one line; never a stack trace). */
    error: text(),
    runAfter: timestamp({ fsp: 3 }).notNull().default(sql`CURRENT_TIMESTAMP(3)`),
    lockedBy: varchar({ length: 120 }),
    leaseExpiresAt: timestamp({ fsp: 3 }),
    startedAt: timestamp({ fsp: 3 }),
    finishedAt: timestamp({ fsp: 3 }),
    createdByUserId: varchar({ length: 255 }).references(() => users.id, { onDelete: 'set null' }),
    ...timestamps,
  },
  (t) => [
    uniqueIndex('jobs_dedupe_unique').on(t.dedupeKey),
    index('jobs_claim_idx').on(t.state, t.runAfter),
    index('jobs_lease_idx').on(t.state, t.leaseExpiresAt),
    index('jobs_org_kind_idx').on(t.organisationId, t.kind),
  ],
);

export type Job = typeof jobs.$inferSelect;
