/** Worker processes (scripts/worker.ts) started by integration tests on a throw-away database. */
import { spawn, type ChildProcess } from 'node:child_process';

export interface WorkerProcess {
  child: ChildProcess;
  log(): string;
  kill(signal?: NodeJS.Signals): void;
}

export function startWorkerProcess(dbName: string, options: { leaseMs?: number; env?: Record<string, string> } = {}): WorkerProcess {
  let out = '';
  const child = spawn('npx', ['tsx', '--require', './scripts/server-process.cjs', 'scripts/worker.ts', '--lease-ms', String(options.leaseMs ?? 1500), '--engine-threads', '1'], {
    env: { ...process.env, DB_NAME: dbName, ...options.env },
    stdio: ['ignore', 'pipe', 'pipe'],
    detached: true,
  });
  child.stdout!.on('data', (d) => (out += d));
  child.stderr!.on('data', (d) => (out += d));
  return {
    child,
    log: () => out,
    kill(signal = 'SIGTERM') {
      try {
        process.kill(-child.pid!, signal);
      } catch {
        // already gone
      }
    },
  };
}

/** Polls `fn` every 200 ms until it returns something truthy, or throws after `timeoutMs`. */
export async function until<T>(what: string, fn: () => Promise<T | null | undefined | false>, timeoutMs: number): Promise<T> {
  const end = Date.now() + timeoutMs;
  for (;;) {
    const v = await fn();
    if (v) return v;
    if (Date.now() > end) throw new Error(`timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 200));
  }
}
