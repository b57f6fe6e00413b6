/**
 * The job queue (lib/jobs/queue.ts) and the worker process (scripts/worker.ts) against a real
 * MariaDB: one job per dedupe key however many ask at once; concurrent claimers never share a row
 * (SELECT … FOR UPDATE SKIP LOCKED); a lapsed lease is taken over and, after its attempts, failed with
 * the reason; retries wait with a growing delay; a permanent error fails at once; a claim that was
 * lost cannot overwrite the new holder; and a worker process killed with SIGKILL in the middle of an
 * outlook leaves it to another worker process, which finishes it.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { and, eq, sql } from 'drizzle-orm';
import { seedDemo } from '@/db/seed';
import { communities, groundProfiles, groundProfileVersions, jobs, organisations, outlooks } from '@/db/schema';
import { claimJob, completeJob, enqueueJob, failJob, getJob, PermanentJobError, renewLease, retryDelayMs } from '@/lib/jobs/queue';
import { OUTLOOK_JOB } from '@/lib/jobs/kinds/outlook';
import { createThrowawayDb, type ThrowawayDb } from './throwaway-db';
import { startWorkerProcess, until } from './helpers/worker-process';

let t: ThrowawayDb;
let orgId = '';

beforeAll(async () => {
  t = await createThrowawayDb();
  await seedDemo(t.db);
  const [org] = await t.db.select({ id: organisations.id }).from(organisations).where(eq(organisations.slug, 'nivalen-regional-office')).limit(1);
  orgId = org!.id;
}, 120_000);

afterAll(async () => {
  await t?.drop();
});

const probe = (payload: Record<string, unknown> = {}, extra: Partial<Parameters<typeof enqueueJob>[1]> = {}) =>
  enqueueJob(t.db, { kind: 'probe', organisationId: orgId, payload, ...extra });

/** Moves a job's lease or delay into the past, as if time had passed. */
async function age(id: string, column: 'leaseExpiresAt' | 'runAfter') {
  await t.db.update(jobs).set({ [column]: sql`NOW(3) - INTERVAL 1 SECOND` }).where(eq(jobs.id, id));
}

describe('job queue', () => {
  it('gives one job to every request with the same dedupe key, even when they arrive together', async () => {
    const key = `probe:${crypto.randomUUID()}`;
    const answers = await Promise.all(Array.from({ length: 8 }, () => probe({}, { dedupeKey: key })));
    expect(new Set(answers.map((a) => a.job.id)).size).toBe(1);
    expect(answers.filter((a) => a.created)).toHaveLength(1);
    const rows = await t.db.select().from(jobs).where(eq(jobs.dedupeKey, key));
    expect(rows).toHaveLength(1);
  });

  it('never hands one job to two concurrent claimers', async () => {
    const kind = `race-${crypto.randomUUID().slice(0, 8)}`;
    for (let i = 0; i < 6; i++) await enqueueJob(t.db, { kind, organisationId: orgId, payload: { i } });
    const claims = await Promise.all(Array.from({ length: 10 }, (_, i) => claimJob(t.db, { workerId: `w${i}`, kinds: [kind], leaseMs: 30_000 })));
    const got = claims.filter((c) => c !== null).map((c) => c!.job.id);
    expect(got).toHaveLength(6);
    expect(new Set(got).size).toBe(6);
  });

  it('takes over a job whose lease lapsed, and a lost claim cannot finish it', async () => {
    const kind = `lapse-${crypto.randomUUID().slice(0, 8)}`;
    const { job } = await enqueueJob(t.db, { kind, organisationId: orgId, payload: {} });
    const first = (await claimJob(t.db, { workerId: 'first', kinds: [kind], leaseMs: 30_000 }))!;
    expect(await claimJob(t.db, { workerId: 'second', kinds: [kind], leaseMs: 30_000 })).toBeNull();
    await age(job.id, 'leaseExpiresAt');
    const second = (await claimJob(t.db, { workerId: 'second', kinds: [kind], leaseMs: 30_000 }))!;
    expect(second.job.id).toBe(job.id);
    expect(second.attempt).toBe(2);
    expect(second.job.error).toMatch(/lease lapsed/);
    // The first holder wakes up: it can neither renew nor finish.
    expect(await renewLease(t.db, first, 30_000, { fraction: 0.5, stage: 'x' })).toBe(false);
    expect(await completeJob(t.db, first, { from: 'first' })).toBe(false);
    expect(await completeJob(t.db, second, { from: 'second' })).toBe(true);
    const done = await getJob(t.db, job.id);
    expect(done?.state).toBe('succeeded');
    expect(done?.result).toEqual({ from: 'second' });
  });

  it('fails a job whose worker died as many times as it has attempts, with the reason', async () => {
    const kind = `dies-${crypto.randomUUID().slice(0, 8)}`;
    const { job } = await enqueueJob(t.db, { kind, organisationId: orgId, payload: {}, maxAttempts: 2, dedupeKey: `${kind}:k` });
    for (let i = 1; i <= 2; i++) {
      const c = await claimJob(t.db, { workerId: `w${i}`, kinds: [kind], leaseMs: 30_000 });
      expect(c?.attempt).toBe(i);
      await age(job.id, 'leaseExpiresAt');
    }
    expect(await claimJob(t.db, { workerId: 'w3', kinds: [kind], leaseMs: 30_000 })).toBeNull();
    const failed = await getJob(t.db, job.id);
    expect(failed?.state).toBe('failed');
    expect(failed?.error).toMatch(/ended before finishing, 2 times/);
    // Its dedupe key is free again: a new request starts afresh.
    const again = await enqueueJob(t.db, { kind, organisationId: orgId, payload: {}, dedupeKey: `${kind}:k` });
    expect(again.created).toBe(true);
  });

  it('retries a failed attempt after a growing delay, and fails a permanent error at once', async () => {
    expect([1, 2, 3].map(retryDelayMs)).toEqual([5_000, 20_000, 80_000]);
    expect(retryDelayMs(20)).toBe(600_000);
    const kind = `retry-${crypto.randomUUID().slice(0, 8)}`;
    const { job } = await enqueueJob(t.db, { kind, organisationId: orgId, payload: {}, maxAttempts: 3 });
    const c1 = (await claimJob(t.db, { workerId: 'w', kinds: [kind], leaseMs: 30_000 }))!;
    expect(await failJob(t.db, c1, new Error('mail server said 451'))).toBe('retry');
    const waiting = await getJob(t.db, job.id);
    expect(waiting?.state).toBe('queued');
    expect(waiting?.error).toBe('mail server said 451');
    // Not due before its delay.
    expect(await claimJob(t.db, { workerId: 'w', kinds: [kind], leaseMs: 30_000 })).toBeNull();
    await age(job.id, 'runAfter');
    const c2 = (await claimJob(t.db, { workerId: 'w', kinds: [kind], leaseMs: 30_000 }))!;
    expect(c2.attempt).toBe(2);
    expect(await failJob(t.db, c2, new PermanentJobError('the payload names no profile'))).toBe('failed');
    expect((await getJob(t.db, job.id))?.state).toBe('failed');
  });
});

// ---- worker processes ----------------------------------------------------------------------------

describe('worker process', () => {
  it('finishes an outlook whose first worker was killed with SIGKILL midway', async () => {
    const [version] = await t.db
      .select({ id: groundProfileVersions.id })
      .from(groundProfileVersions)
      .innerJoin(groundProfiles, and(eq(groundProfiles.id, groundProfileVersions.profileId), eq(groundProfiles.currentVersion, groundProfileVersions.version)))
      .innerJoin(communities, eq(communities.id, groundProfiles.communityId))
      .where(and(eq(communities.organisationId, orgId), eq(groundProfiles.slug, 'clay-terrace')))
      .limit(1);
    const { job } = await enqueueJob(t.db, { kind: OUTLOOK_JOB, organisationId: orgId, payload: { profileVersionId: version!.id, scenarios: ['SSP2-4.5', 'SSP5-8.5'], horizons: [2050] } });

    const first = startWorkerProcess(t.name);
    try {
      await until('the first worker to start the outlook', async () => ((await getJob(t.db, job.id))?.state === 'running' ? true : null), 60_000);
      first.kill('SIGKILL');
    } catch (e) {
      first.kill('SIGKILL');
      throw new Error(`${(e as Error).message}\n${first.log()}`);
    }
    const second = startWorkerProcess(t.name);
    try {
      const done = await until('the second worker to finish it', async () => {
        const j = await getJob(t.db, job.id);
        return j && (j.state === 'succeeded' || j.state === 'failed') ? j : null;
      }, 90_000);
      expect(done.state, second.log()).toBe('succeeded');
      expect(done.attempts).toBe(2);
      expect(done.progress).toBe(1);
      const [stored] = await t.db.select({ id: outlooks.id }).from(outlooks).where(eq(outlooks.id, done.result!.outlookId as string));
      expect(stored).toBeDefined();
    } finally {
      second.kill();
    }
  }, 180_000);
});
