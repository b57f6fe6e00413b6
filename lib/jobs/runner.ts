import 'server-only';
import type { Db } from '@/db/connect';
import { claimJob, completeJob, failJob, renewLease, type Claim, type Job } from './queue';

/**
 * The worker loop: `concurrency` slots, each claiming one job at a time through lib/jobs/queue.ts and
 * running the handler of its kind. While a handler works, the lease is renewed (with the latest
 * progress) every third of its length; a renewal that finds the job no longer held aborts the
 * handler's signal. `stop()` stops claiming and waits for the running handlers.
 */

export interface JobContext {
  job: Job;
  attempt: number;
  /** Aborted when the lease was lost or the worker is stopping for good. */
  signal: AbortSignal;
  /** Records how far the work is (sent with the next lease renewal). */
  progress(fraction: number, stage: string): void;
}

export type JobHandler = (ctx: JobContext) => Promise<Record<string, unknown>>;

export interface WorkerOptions {
  db: Db;
  workerId: string;
  handlers: Readonly<Record<string, JobHandler>>;
  concurrency?: number;
  leaseMs?: number;
  /** Wait between polls when nothing is due [ms]. */
  idleMs?: number;
  log?: (line: string) => void;
}

export interface RunningWorker {
  /** Stops claiming; resolves when every running handler has ended. */
  stop(): Promise<void>;
  /** Jobs finished by this worker (succeeded or failed). */
  readonly finished: number;
}

export function startWorker(options: WorkerOptions): RunningWorker {
  const leaseMs = options.leaseMs ?? 30_000;
  const idleMs = options.idleMs ?? 500;
  const log = options.log ?? (() => {});
  const kinds = Object.keys(options.handlers);
  let stopping = false;
  let finished = 0;
  const wakers = new Set<() => void>();

  const sleep = (ms: number) =>
    new Promise<void>((resolve) => {
      const done = () => {
        clearTimeout(t);
        wakers.delete(done);
        resolve();
      };
      const t = setTimeout(done, ms);
      wakers.add(done);
    });

  async function runOne(claim: Claim): Promise<void> {
    const handler = options.handlers[claim.job.kind]!;
    const abort = new AbortController();
    let latest: { fraction: number; stage: string } | undefined;
    let renewing = Promise.resolve();
    const timer = setInterval(() => {
      renewing = renewLease(options.db, claim, leaseMs, latest)
        .then((ok) => {
          if (!ok) abort.abort(new Error('lease lost'));
        })
        .catch((e) => log(`job ${claim.job.id}: lease renewal failed: ${e instanceof Error ? e.message : e}`));
    }, Math.max(200, Math.floor(leaseMs / 3)));
    try {
      const t0 = Date.now();
      const result = await handler({
        job: claim.job,
        attempt: claim.attempt,
        signal: abort.signal,
        progress: (fraction, stage) => {
          latest = { fraction, stage };
        },
      });
      clearInterval(timer);
      await renewing;
      const ok = await completeJob(options.db, claim, result);
      log(`job ${claim.job.id} (${claim.job.kind}) ${ok ? 'succeeded' : 'finished after its lease was lost; result dropped'} in ${Date.now() - t0} ms`);
    } catch (e) {
      clearInterval(timer);
      await renewing;
      const outcome = await failJob(options.db, claim, e);
      log(`job ${claim.job.id} (${claim.job.kind}) attempt ${claim.attempt} failed (${outcome}): ${e instanceof Error ? e.message : e}`);
    } finally {
      finished++;
    }
  }

  async function slot(n: number): Promise<void> {
    while (!stopping) {
      let claim: Claim | null = null;
      try {
        claim = await claimJob(options.db, { workerId: `${options.workerId}/${n}`, kinds, leaseMs });
      } catch (e) {
        log(`claiming failed: ${e instanceof Error ? e.message : e}`);
      }
      if (claim) await runOne(claim);
      else await sleep(idleMs);
    }
  }

  const slots = Array.from({ length: Math.max(1, options.concurrency ?? 1) }, (_, i) => slot(i + 1));
  return {
    async stop() {
      stopping = true;
      for (const w of [...wakers]) w();
      await Promise.all(slots);
    },
    get finished() {
      return finished;
    },
  };
}
