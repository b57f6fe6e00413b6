/**
 * `npm run bench:web`: page latency of the web process while outlooks run, and job throughput.
 * Needs a running instance (`npm run demo`; APP_URL and the DB_* settings as for it). Prints:
 *   page idle: p50 MS ms, p95 MS ms                  (GET /communities signed in, N sequential requests)
 *   page with outlook jobs running: p50 MS ms, p95 MS ms
 *   jobs per minute, workers already running (W): J
 *   jobs per minute, one more worker (W+1): J
 * The outlook jobs are written straight into the jobs table (no dedupe key, so each one really runs
 * the engine) for the demo's terrain units. Figures are printed, not asserted; the goal is that the
 * page stays as fast with jobs running as idle (the web process does no engine work).
 */
import { spawn } from 'node:child_process';
import { and, eq, inArray } from 'drizzle-orm';
import { connectDb } from '../db/connect';
import { groundProfiles, groundProfileVersions, jobs, organisations, communities } from '../db/schema';
import { enqueueJob } from '../lib/jobs/queue';
import { OUTLOOK_JOB } from '../lib/jobs/kinds/outlook';
import { OUTLOOK_HORIZONS, OUTLOOK_SCENARIOS } from '../lib/outlook/scenarios';
import { dbConfig, env } from '../lib/server/env';

const BASE = env.APP_URL.replace(/\/$/, '');
const REQUESTS = Number(process.env.BENCH_REQUESTS ?? 40);
const JOBS = Number(process.env.BENCH_JOBS ?? 4);

async function signIn(): Promise<string> {
  const jar = new Map<string, string>();
  const keep = (res: Response) => {
    for (const line of res.headers.getSetCookie()) {
      const [pair] = line.split(';');
      const i = pair!.indexOf('=');
      jar.set(pair!.slice(0, i).trim(), pair!.slice(i + 1).trim());
    }
  };
  const cookie = () => [...jar].map(([k, v]) => `${k}=${v}`).join('; ');
  const csrf = await fetch(`${BASE}/api/auth/csrf`);
  keep(csrf);
  const { csrfToken } = (await csrf.json()) as { csrfToken: string };
  const res = await fetch(`${BASE}/api/auth/callback/password`, {
    method: 'POST',
    redirect: 'manual',
    headers: { 'content-type': 'application/x-www-form-urlencoded', cookie: cookie() },
    body: new URLSearchParams({ csrfToken, email: 'planner@nivalen.example', password: 'thawline-demo', callbackUrl: `${BASE}/workspace` }).toString(),
  });
  keep(res);
  if (!jar.has('authjs.session-token')) throw new Error(`sign-in failed (${res.status}); is the demo running on ${BASE}?`);
  return cookie();
}

function percentile(sorted: number[], p: number): number {
  return sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))]!;
}

async function pageLatency(cookie: string, n: number): Promise<{ p50: number; p95: number }> {
  const times: number[] = [];
  for (let i = 0; i < n; i++) {
    const t0 = performance.now();
    const res = await fetch(`${BASE}/communities`, { headers: { cookie } });
    await res.text();
    if (res.status !== 200) throw new Error(`GET /communities answered ${res.status}`);
    times.push(performance.now() - t0);
  }
  times.sort((a, b) => a - b);
  return { p50: percentile(times, 50), p95: percentile(times, 95) };
}

async function main() {
  const { db, pool } = connectDb(dbConfig(), 4);
  try {
    const cookie = await signIn();
    await pageLatency(cookie, 5); // warm-up
    const idle = await pageLatency(cookie, REQUESTS);
    console.log(`page idle: p50 ${idle.p50.toFixed(0)} ms, p95 ${idle.p95.toFixed(0)} ms`);

    const [org] = await db.select({ id: organisations.id }).from(organisations).where(eq(organisations.slug, 'nivalen-regional-office'));
    const versions = await db
      .select({ id: groundProfileVersions.id })
      .from(groundProfileVersions)
      .innerJoin(groundProfiles, and(eq(groundProfiles.id, groundProfileVersions.profileId), eq(groundProfiles.currentVersion, groundProfileVersions.version)))
      .innerJoin(communities, eq(communities.id, groundProfiles.communityId))
      .where(eq(communities.organisationId, org!.id));
    const enqueue = async (count: number) => {
      const ids: string[] = [];
      for (let i = 0; i < count; i++) {
        const { job } = await enqueueJob(db, { kind: OUTLOOK_JOB, organisationId: org!.id, payload: { profileVersionId: versions[i % versions.length]!.id, scenarios: [...OUTLOOK_SCENARIOS], horizons: [...OUTLOOK_HORIZONS] } });
        ids.push(job.id);
      }
      return ids;
    };
    const waitAll = async (ids: string[]) => {
      const t0 = Date.now();
      for (;;) {
        const rows = await db.select({ state: jobs.state }).from(jobs).where(inArray(jobs.id, ids));
        if (rows.every((r) => r.state === 'succeeded' || r.state === 'failed' || r.state === 'cancelled')) return (Date.now() - t0) / 60_000;
        if (Date.now() - t0 > 15 * 60_000) throw new Error('the jobs did not finish within 15 minutes: is a worker running (npm run worker)?');
        await new Promise((r) => setTimeout(r, 250));
      }
    };

    const first = await enqueue(JOBS);
    const busy = await pageLatency(cookie, REQUESTS);
    console.log(`page with outlook jobs running: p50 ${busy.p50.toFixed(0)} ms, p95 ${busy.p95.toFixed(0)} ms`);
    const minutes1 = await waitAll(first);
    console.log(`jobs per minute, workers already running: ${(JOBS / minutes1).toFixed(1)}`);

    const extra = spawn('npx', ['tsx', '--require', './scripts/server-process.cjs', 'scripts/worker.ts'], { stdio: 'ignore', detached: true, env: process.env });
    try {
      await new Promise((r) => setTimeout(r, 3000));
      const second = await enqueue(JOBS);
      const minutes2 = await waitAll(second);
      console.log(`jobs per minute, one more worker: ${(JOBS / minutes2).toFixed(1)}`);
    } finally {
      process.kill(-extra.pid!, 'SIGTERM');
    }
  } finally {
    await pool.end();
  }
}

main().catch((e) => {
  console.error(`bench:web: ${e instanceof Error ? e.message : e}`);
  process.exit(1);
});
