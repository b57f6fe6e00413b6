/**
 * Persistent worker threads for the assessment's scenario runs.
 *
 * Starting a worker: the engine is TypeScript run by tsx (Node 20 cannot run .ts files), and a
 * worker does not inherit tsx's loader for its entry file. So each worker is started from a small
 * CommonJS snippet (`eval: true`) that registers tsx's CommonJS hook (`tsx/cjs/api`) and then
 * requires assess-worker.ts; if a compiled assess-worker.js sits beside this file it is used
 * directly. If a worker cannot start (no tsx, a bundler that moved the files, a platform without
 * worker threads) or fails, the caller runs those scenarios in-process instead: same results, fewer
 * cores.
 *
 * Workers are unref'd between jobs, so they never keep a process alive; `closeAssessPool()` ends them.
 *
 * API: `startAssessWorkers(count)` → promise of the number of workers ready (idempotent, grows the
 * pool up to `count`), `runOnWorker(slot, job)` → results or throws, `assessPoolFailure()`,
 * `closeAssessPool()`; `assessWorkerPool` bundles the first three as the `workers` option of
 * `runAssessment` (assess.ts does not import this module: callers that want threads pass it in).
 */
import fs from 'node:fs';
import path from 'node:path';
import { Worker } from 'node:worker_threads';
import type { WorkerJob } from './assess-worker';
import type { ScenarioWorkerPool } from './assess';
import type { YearRecord } from './site-model';
import type { ScenarioId } from './scenario-forcing';

type Pending = { resolve: (v: unknown) => void; reject: (e: Error) => void };

interface Slot {
  worker: Worker | null;
  ready: Promise<boolean>;
  pending: Map<number, Pending>;
}

const slots: Slot[] = [];
let failure: string | null = null;
let nextId = 1;

function workerSource(): { code: string; eval: true } | { file: string } | null {
  const dir = typeof __dirname === 'string' ? __dirname : null;
  if (!dir) return null;
  const js = path.join(dir, 'assess-worker.js');
  if (fs.existsSync(js)) return { file: js };
  const ts = path.join(dir, 'assess-worker.ts');
  if (!fs.existsSync(ts)) return null;
  return { code: `require('tsx/cjs/api').register(); require(${JSON.stringify(ts)});`, eval: true };
}

function send<T>(slot: Slot, msg: Record<string, unknown>): Promise<T> {
  const w = slot.worker;
  if (!w) return Promise.reject(new Error(failure ?? 'no worker'));
  const id = nextId++;
  return new Promise<T>((resolve, reject) => {
    slot.pending.set(id, { resolve: resolve as (v: unknown) => void, reject });
    w.ref();
    w.postMessage({ ...msg, id });
  });
}

function startSlot(): Slot {
  const slot: Slot = { worker: null, ready: Promise.resolve(false), pending: new Map() };
  const fail = (message: string) => {
    failure = message;
    for (const p of slot.pending.values()) p.reject(new Error(message));
    slot.pending.clear();
    slot.worker = null;
  };
  slot.ready = new Promise<boolean>((resolve) => {
    const src = workerSource();
    if (!src) {
      failure = 'worker entry not found beside assess-pool';
      resolve(false);
      return;
    }
    try {
      const w = 'file' in src ? new Worker(src.file) : new Worker(src.code, { eval: true });
      slot.worker = w;
      w.unref();
      w.on('message', (m: { id: number; ok: boolean; error?: string; pong?: boolean; results?: unknown }) => {
        const p = slot.pending.get(m.id);
        if (!p) return;
        slot.pending.delete(m.id);
        if (slot.pending.size === 0) w.unref();
        if (m.ok) p.resolve(m.pong ? true : m.results);
        else p.reject(new Error(m.error ?? 'worker failed'));
      });
      w.on('error', (e) => {
        fail(`worker error: ${e.message}`);
        resolve(false);
      });
      w.on('exit', (code) => {
        if (slot.worker === w) fail(`worker exited (${code})`);
        resolve(false);
      });
      send<boolean>(slot, { ping: true }).then(
        () => resolve(true),
        () => resolve(false),
      );
    } catch (e) {
      failure = `worker could not start: ${e instanceof Error ? e.message : String(e)}`;
      slot.worker = null;
      resolve(false);
    }
  });
  return slot;
}

/**
 * Grows the pool to `count` workers (dead ones are restarted) and resolves with the number that
 * answered a ping; the reason of a failure is kept for `assessPoolFailure()`.
 */
export async function startAssessWorkers(count: number): Promise<number> {
  for (let i = 0; i < count; i++) {
    if (!slots[i] || (!slots[i].worker && slots[i].pending.size === 0)) slots[i] = startSlot();
  }
  const ok = await Promise.all(slots.slice(0, count).map((s) => s.ready));
  return ok.filter(Boolean).length;
}

/** Runs scenarios on worker `slot`; rejects if that worker is not available or fails. */
export function runOnWorker(slot: number, job: Omit<WorkerJob, 'id'>): Promise<{ scenario: ScenarioId; records: YearRecord[] }[]> {
  const s = slots[slot];
  if (!s) return Promise.reject(new Error('no such worker'));
  return send(s, job as unknown as Record<string, unknown>);
}

/** The reason a worker was not available, if any. */
export function assessPoolFailure(): string | null {
  return failure;
}

/** Ends every worker. */
export async function closeAssessPool(): Promise<void> {
  const all = slots.splice(0, slots.length);
  await Promise.all(all.map((s) => (s.worker ? s.worker.terminate() : Promise.resolve(0))));
}

/** The thread pool as `runAssessment`'s `workers` option. */
export const assessWorkerPool: ScenarioWorkerPool = {
  start: startAssessWorkers,
  run: runOnWorker,
  failure: assessPoolFailure,
};
