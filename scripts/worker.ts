/**
 * `npm run worker -- [--concurrency N]`: a worker process. It claims jobs from the `jobs` table
 * (lib/jobs/queue.ts) and runs them: outlooks through the engine (with the engine's worker-thread
 * pool, so one outlook uses both cores), and every further kind in lib/jobs/registry.ts. Any number of
 * these may run, on any machine that reaches the database. SIGTERM or SIGINT: stop claiming, finish
 * the running jobs, exit; a worker killed outright leaves its lease to lapse, and another worker
 * takes the job over.
 */
import os from 'node:os';
import { connectDb } from '../db/connect';
import { assessWorkerPool, closeAssessPool } from '../lib/engine/assess-pool';
import { jobLanes } from '../lib/jobs/registry';
import { startWorker } from '../lib/jobs/runner';
import { dbConfig } from '../lib/server/env';

function option(name: string, fallback: number, min: number, max: number): number {
  const i = process.argv.indexOf(`--${name}`);
  const raw = i >= 0 ? process.argv[i + 1] : process.env[`WORKER_${name.toUpperCase()}`];
  if (raw === undefined || raw === '') return fallback;
  const n = Number(raw);
  if (!Number.isInteger(n) || n < min || n > max) {
    console.error(`thawline worker: --${name} must be a whole number from ${min} to ${max} (got "${raw}")`);
    process.exit(2);
  }
  return n;
}

const concurrency = option('concurrency', 1, 1, 64);
const leaseMs = option('lease-ms', 30_000, 500, 600_000);
const threads = option('engine-threads', 2, 0, 16);
const { pool, db } = connectDb(dbConfig(), concurrency + 4);
const workerId = `${os.hostname()}:${process.pid}`;
const log = (line: string) => console.log(`${new Date().toISOString()} worker ${workerId}: ${line}`);

const lanes = jobLanes(db, { workers: assessWorkerPool, workerThreads: threads });
// Heavy jobs (outlooks) take `concurrency` slots; e-mail has two slots of its own, so a message never
// waits behind an engine run.
const workers = [
  startWorker({ db, workerId: `${workerId}/heavy`, concurrency, leaseMs, handlers: lanes.heavy, log }),
  startWorker({ db, workerId: `${workerId}/light`, concurrency: 2, leaseMs, handlers: lanes.light, log }),
];
log(`started: ${concurrency} slot(s) for ${Object.keys(lanes.heavy).join(', ')}, 2 for ${Object.keys(lanes.light).join(', ')}; lease ${leaseMs} ms`);

let stopping = false;
async function shutdown(signal: string) {
  if (stopping) return;
  stopping = true;
  log(`${signal}: finishing running jobs`);
  await Promise.all(workers.map((w) => w.stop()));
  await closeAssessPool();
  await pool.end();
  log(`stopped after ${workers.reduce((n, w) => n + w.finished, 0)} job(s)`);
  process.exit(0);
}
process.on('SIGTERM', () => void shutdown('SIGTERM'));
process.on('SIGINT', () => void shutdown('SIGINT'));
