/**
 * One persistent worker thread for the assessment's scenario runs (the machine has 2 cores: the
 * main thread runs some scenarios, the worker the others).
 *
 * Starting the worker: the engine is TypeScript run by tsx (Node 20 cannot run .ts files), and a
 * worker does not inherit tsx's loader for its entry file. So the worker is started from a small
 * CommonJS snippet (`eval: true`) that registers tsx's CommonJS hook (`tsx/cjs/api`) and then
 * requires assess-worker.ts; if a compiled assess-worker.js sits beside this file it is used
 * directly. If the worker cannot start (no tsx, a bundler that moved the files, a platform without
 * worker threads) or fails, the caller falls back to running every scenario in-process: same
 * results, one core.
 *
 * The worker is unref'd between jobs, so it never keeps a process alive; `closeAssessPool()` ends it.
 *
 * API: `startAssessWorker()` (idempotent, returns a promise of readiness: true/false),
 * `runOnWorker(job)` → results or throws, `closeAssessPool()`.
 */
import fs from 'node:fs';
import path from 'node:path';
import { Worker } from 'node:worker_threads';
import type { WorkerJob } from './assess-worker';
import type { YearRecord } from './site-model';
import type { ScenarioId } from './scenario-forcing';

type Pending = { resolve: (v: unknown) => void; reject: (e: Error) => void };

let worker: Worker | null = null;
let ready: Promise<boolean> | null = null;
let failure: string | null = null;
let nextId = 1;
const pending = new Map<number, Pending>();

function workerSource(): { code: string; eval: true } | { file: string } | null {
  const dir = typeof __dirname === 'string' ? __dirname : null;
  if (!dir) return null;
  const js = path.join(dir, 'assess-worker.js');
  if (fs.existsSync(js)) return { file: js };
  const ts = path.join(dir, 'assess-worker.ts');
  if (!fs.existsSync(ts)) return null;
  return { code: `require('tsx/cjs/api').register(); require(${JSON.stringify(ts)});`, eval: true };
}

function failAll(message: string): void {
  failure = message;
  for (const p of pending.values()) p.reject(new Error(message));
  pending.clear();
  worker = null;
}

/**
 * Starts the worker if it is not running. Resolves true once it answers a ping, false if it
 * cannot start (the reason is kept for `assessPoolFailure()`).
 */
export function startAssessWorker(): Promise<boolean> {
  if (ready) return ready;
  ready = new Promise<boolean>((resolve) => {
    const src = workerSource();
    if (!src) {
      failure = 'worker entry not found beside assess-pool';
      resolve(false);
      return;
    }
    try {
      const w = 'file' in src ? new Worker(src.file) : new Worker(src.code, { eval: true });
      worker = w;
      w.unref();
      w.on('message', (m: { id: number; ok: boolean; error?: string; pong?: boolean; results?: unknown }) => {
        const p = pending.get(m.id);
        if (!p) return;
        pending.delete(m.id);
        if (pending.size === 0) w.unref();
        if (m.ok) p.resolve(m.pong ? true : m.results);
        else p.reject(new Error(m.error ?? 'worker failed'));
      });
      w.on('error', (e) => {
        failAll(`worker error: ${e.message}`);
        ready = null;
        resolve(false);
      });
      w.on('exit', (code) => {
        if (worker === w) failAll(`worker exited (${code})`);
        ready = null;
      });
      send<boolean>({ id: 0, ping: true }).then(
        () => resolve(true),
        () => resolve(false),
      );
    } catch (e) {
      failure = `worker could not start: ${e instanceof Error ? e.message : String(e)}`;
      worker = null;
      resolve(false);
    }
  });
  return ready;
}

function send<T>(msg: Record<string, unknown>): Promise<T> {
  const w = worker;
  if (!w) return Promise.reject(new Error(failure ?? 'no worker'));
  const id = nextId++;
  return new Promise<T>((resolve, reject) => {
    pending.set(id, { resolve: resolve as (v: unknown) => void, reject });
    w.ref();
    w.postMessage({ ...msg, id });
  });
}

/** Runs scenarios on the worker; rejects if the worker is not available or fails. */
export function runOnWorker(job: Omit<WorkerJob, 'id'>): Promise<{ scenario: ScenarioId; records: YearRecord[] }[]> {
  return send(job as unknown as Record<string, unknown>);
}

/** The reason the worker is not available, if any. */
export function assessPoolFailure(): string | null {
  return failure;
}

/** Ends the worker (if any). */
export async function closeAssessPool(): Promise<void> {
  const w = worker;
  worker = null;
  ready = null;
  if (w) await w.terminate();
}
