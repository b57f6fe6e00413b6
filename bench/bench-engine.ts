/**
 * `npm run bench:engine`: prints the engine's speed figures, one per line:
 *   ground solver: N node-steps/s   (lib/engine/heat-conduction-bench.ts, one core)
 *   full outlook: S s               (one profile, 5 scenarios, baseline and three horizons, daily
 *                                    steps, spin-up and history from 1850 included, empty cache)
 *   full outlook cached: S s        (the same with the spin-up and history cached by profile hash)
 * The outlooks run first, in a fresh process, so "cold" also pays the worker thread's start-up and
 * the JIT warm-up; the lines are printed in the order above. Targets: ≥ 5 M node-steps/s, cold ≤ 3 s,
 * cached ≤ 1 s on the 2-core machine.
 */
import { runAssessment } from '../lib/engine/assess';
import { HistoryCache } from '../lib/engine/assess-cache';
import { assessWorkerPool, closeAssessPool } from '../lib/engine/assess-pool';
import { measureNodeStepsPerSecond } from './heat-conduction-bench';
import { SCENARIOS } from '../lib/engine/scenario-forcing';
import { exampleSite } from '../lib/engine/site-schema';

async function main() {
  const site = structuredClone(exampleSite);
  delete site.observed; // the outlook of an uncalibrated profile (calibration is a separate cost)
  const input = { site, scenarios: [...SCENARIOS], horizons: [2030, 2050, 2080] };
  const cache = new HistoryCache();

  let t0 = performance.now();
  const cold = await runAssessment(input, { cache, workers: assessWorkerPool });
  const coldS = (performance.now() - t0) / 1000;
  t0 = performance.now();
  const cached = await runAssessment(input, { cache, workers: assessWorkerPool });
  const cachedS = (performance.now() - t0) / 1000;
  await closeAssessPool();
  if (cold.stats.cacheHit || !cached.stats.cacheHit) throw new Error('bench: unexpected cache state');

  const nodeSteps = measureNodeStepsPerSecond();
  process.stdout.write(`ground solver: ${Math.round(nodeSteps)} node-steps/s\n`);
  process.stdout.write(`full outlook: ${coldS.toFixed(2)} s\n`);
  process.stdout.write(`full outlook cached: ${cachedS.toFixed(2)} s\n`);
  if (cold.stats.workerFallback) process.stderr.write(`bench: worker thread not used (${cold.stats.workerFallback})\n`);
}

main().catch((e: unknown) => {
  process.stderr.write(`bench: ${e instanceof Error ? e.message : String(e)}\n`);
  process.exitCode = 1;
});
