import 'server-only';
import { and, eq, inArray, lt, lte, or, sql } from 'drizzle-orm';
import type { Db, Tx } from '@/db/connect';
import { jobs, type Job, type JobState } from '@/db/schema';

/**
 * The job queue: the one module that inserts, claims, renews, finishes and retries rows of the
 * `jobs` table, for every kind (outlooks, PDF renderings, e-mail). Times come from the database's
 * clock (NOW(3)), so workers on machines whose clocks disagree still agree on leases.
 *
 * A worker claims a row in its own short transaction (`SELECT … FOR UPDATE SKIP LOCKED`, then an
 * UPDATE that names it as the holder and sets the lease), runs the work outside any transaction, and
 * renews the lease while it works. Every later write checks that the row is still held by the same
 * worker under the same attempt, so a worker that lost its lease (it stalled, another took over)
 * cannot overwrite the new holder's work.
 */

export type { Job, JobState };

export interface EnqueueInput {
  kind: string;
  organisationId: string | null;
  payload: Record<string, unknown>;
  inputSha256?: string | null;
  /** Jobs with the same key are one job while queued, running or succeeded. */
  dedupeKey?: string | null;
  maxAttempts?: number;
  createdByUserId?: string | null;
  /** Insert as already finished (the work's answer is known, e.g. a stored outlook). */
  succeededWith?: Record<string, unknown>;
}

/**
 * Inserts a job, or returns the live one with the same dedupe key.
 * @returns The row and whether this call created it.
 */
export async function enqueueJob(conn: Db | Tx, input: EnqueueInput): Promise<{ job: Job; created: boolean }> {
  const id = crypto.randomUUID();
  const done = input.succeededWith !== undefined;
  await conn
    .insert(jobs)
    .values({
      id,
      kind: input.kind,
      organisationId: input.organisationId,
      payload: input.payload,
      inputSha256: input.inputSha256 ?? null,
      dedupeKey: input.dedupeKey ?? null,
      maxAttempts: input.maxAttempts ?? 3,
      createdByUserId: input.createdByUserId ?? null,
      ...(done ? { state: 'succeeded' as const, progress: 1, result: input.succeededWith, finishedAt: sql`NOW(3)` } : {}),
    })
    // Same dedupe key: keep the existing row untouched.
    .onDuplicateKeyUpdate({ set: { id: sql`${jobs.id}` } });
  const [row] = input.dedupeKey
    ? await conn.select().from(jobs).where(eq(jobs.dedupeKey, input.dedupeKey)).limit(1)
    : await conn.select().from(jobs).where(eq(jobs.id, id)).limit(1);
  return { job: row!, created: row!.id === id };
}

export async function getJob(conn: Db | Tx, id: string): Promise<Job | null> {
  const [row] = await conn.select().from(jobs).where(eq(jobs.id, id)).limit(1);
  return row ?? null;
}

export interface ClaimOptions {
  workerId: string;
  /** Only these kinds (default: any). */
  kinds?: readonly string[];
  leaseMs: number;
}

/** The attempt a worker holds: every later write names it. */
export interface Claim {
  job: Job;
  workerId: string;
  attempt: number;
}

const held = (c: Claim) => and(eq(jobs.id, c.job.id), eq(jobs.lockedBy, c.workerId), eq(jobs.attempts, c.attempt), eq(jobs.state, 'running'));

const nowPlus = (ms: number) => sql`NOW(3) + INTERVAL ${Math.max(1, Math.round(ms)) * 1000} MICROSECOND`;

/**
 * Claims the next due job: a queued one whose `runAfter` has come, or a running one whose lease
 * lapsed (its worker died). A lapsed job that used up its attempts is failed with the reason and the
 * search goes on.
 * @returns The claim, or null when nothing is due.
 */
export async function claimJob(db: Db, options: ClaimOptions): Promise<Claim | null> {
  const dueNow = () => or(and(eq(jobs.state, 'queued'), lte(jobs.runAfter, sql`NOW(3)`)), and(eq(jobs.state, 'running'), lt(jobs.leaseExpiresAt, sql`NOW(3)`)));
  const due = () => (options.kinds?.length ? and(dueNow(), inArray(jobs.kind, [...options.kinds])) : dueNow());
  for (let round = 0; round < 20; round++) {
    // A plain read finds candidates; each is then locked alone by its primary key. (One locking read
    // with ORDER BY … LIMIT 1 would lock every row it scanned and sorted, so that concurrent
    // claimers would skip them all and find nothing.)
    const candidates = await db.select({ id: jobs.id }).from(jobs).where(due()).orderBy(jobs.runAfter, jobs.createdAt).limit(16);
    if (candidates.length === 0) return null;
    const outcome = await db.transaction(async (tx) => {
      for (const { id } of candidates) {
        const [row] = await tx.select().from(jobs).where(and(eq(jobs.id, id), due())).limit(1).for('update', { skipLocked: true });
        if (!row) continue;
        if (row.state === 'running' && row.attempts >= row.maxAttempts) {
          await tx
            .update(jobs)
            .set({ state: 'failed', error: `stopped: the worker ended before finishing, ${row.attempts} times (lease lapsed)`, dedupeKey: null, lockedBy: null, leaseExpiresAt: null, finishedAt: sql`NOW(3)` })
            .where(eq(jobs.id, row.id));
          return { kind: 'gave-up' as const };
        }
        const attempt = row.attempts + 1;
        await tx
          .update(jobs)
          .set({
            state: 'running',
            attempts: attempt,
            lockedBy: options.workerId,
            leaseExpiresAt: nowPlus(options.leaseMs),
            startedAt: sql`COALESCE(${jobs.startedAt}, NOW(3))`,
            error: row.state === 'running' ? 'the previous worker stopped (lease lapsed); retried' : row.error,
          })
          .where(eq(jobs.id, row.id));
        const [claimed] = await tx.select().from(jobs).where(eq(jobs.id, row.id)).limit(1);
        return { kind: 'claimed' as const, claim: { job: claimed!, workerId: options.workerId, attempt } };
      }
      return { kind: 'taken' as const };
    });
    if (outcome.kind === 'claimed') return outcome.claim;
    // 'taken': every candidate went to other workers meanwhile; 'gave-up': one was failed. Look again.
  }
  return null;
}

/**
 * Extends the lease and records progress.
 * @returns false when the job is no longer held by this claim (lease lost, cancelled): stop working.
 */
export async function renewLease(db: Db, claim: Claim, leaseMs: number, progress?: { fraction: number; stage: string }): Promise<boolean> {
  const set: Partial<typeof jobs.$inferInsert> = { leaseExpiresAt: nowPlus(leaseMs) as unknown as Date };
  if (progress) {
    set.progress = Math.min(1, Math.max(0, progress.fraction));
    set.stage = progress.stage.slice(0, 40);
  }
  const [res] = await db.update(jobs).set(set).where(held(claim));
  return affected(res) > 0;
}

/** Marks the held job succeeded with its answer. @returns false when the claim was lost. */
export async function completeJob(conn: Db | Tx, claim: Claim, result: Record<string, unknown>): Promise<boolean> {
  const [res] = await conn
    .update(jobs)
    .set({ state: 'succeeded', result, progress: 1, stage: 'done', error: null, lockedBy: null, leaseExpiresAt: null, finishedAt: sql`NOW(3)` })
    .where(held(claim));
  return affected(res) > 0;
}

/** A failure that another attempt cannot mend (bad input): the job fails at once. */
export class PermanentJobError extends Error {}

/** Delay before attempt n+1 after n failed attempts: 5 s, 20 s, 80 s …, at most 10 minutes. */
export function retryDelayMs(attempts: number): number {
  return Math.min(600_000, 5_000 * 4 ** Math.max(0, attempts - 1));
}

/**
 * Records a failed attempt: queued again after a growing delay while attempts remain and the error
 * is not permanent, else failed (and its dedupe key freed, so a new request starts afresh).
 * @returns What became of the job, or 'lost' when the claim was no longer held.
 */
export async function failJob(db: Db, claim: Claim, error: unknown): Promise<'retry' | 'failed' | 'lost'> {
  const message = oneLine(error);
  const permanent = error instanceof PermanentJobError;
  const retry = !permanent && claim.attempt < claim.job.maxAttempts;
  const [res] = await db
    .update(jobs)
    .set(
      retry
        ? { state: 'queued', error: message, lockedBy: null, leaseExpiresAt: null, runAfter: nowPlus(retryDelayMs(claim.attempt)) as unknown as Date }
        : { state: 'failed', error: message, dedupeKey: null, lockedBy: null, leaseExpiresAt: null, finishedAt: sql`NOW(3)` },
    )
    .where(held(claim));
  if (affected(res) === 0) return 'lost';
  return retry ? 'retry' : 'failed';
}

/** Cancels a job that has not finished. @returns false when it had already finished. */
export async function cancelJob(conn: Db | Tx, id: string): Promise<boolean> {
  const [res] = await conn
    .update(jobs)
    .set({ state: 'cancelled', dedupeKey: null, lockedBy: null, leaseExpiresAt: null, finishedAt: sql`NOW(3)` })
    .where(and(eq(jobs.id, id), inArray(jobs.state, ['queued', 'running'])));
  return affected(res) > 0;
}

function affected(res: unknown): number {
  return (res as { affectedRows?: number } | undefined)?.affectedRows ?? 0;
}

/** An error as one line of at most 500 characters, never a stack trace. */
function oneLine(error: unknown): string {
  const text = error instanceof Error ? error.message : String(error);
  return text.replace(/\s+/g, ' ').trim().slice(0, 500) || 'failed';
}
