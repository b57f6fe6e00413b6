/**
 * `npm run bench:engine`: prints the engine's speed figures, one per line:
 *   ground solver: N node-steps/s   (lib/engine/heat-conduction-bench.ts, one core)
 *   full outlook: S s               (one profile, 5 scenarios, baseline and three horizons, daily
 *                                    steps, spin-up and history from 1850 included, empty cache)
 *   full outlook cached: S s        (the same with the spin-up and history cached by profile hash)
 *   daily interpolation: MS ms      (600 years of mean-preserving daily air temperatures; target
 *                                    well under 50 ms, the solver calls it once a simulated year)
 *   local climate series: MS ms     (monthly air temperatures 1850–2100 of one scenario, mean of 10;
 *                                    target well under 20 ms)
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
import { meanPreservingDailyFromMonthly } from '../lib/engine/monthly-to-daily';
import { localMonthlyAirTemperatures } from '../lib/engine/local-climate';
import { regionalFactorsFor } from '../lib/engine/regional-warming';

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

  const normalsC = [-26.5, -25.5, -21.5, -12.5, -1.0, 10.0, 13.5, 10.5, 3.5, -7.0, -18.5, -23.5];
  const buf = new Float64Array(365);
  t0 = performance.now();
  for (let k = 0; k < 600; k++) meanPreservingDailyFromMonthly(normalsC, normalsC, normalsC, buf);
  process.stdout.write(`daily interpolation: ${(performance.now() - t0).toFixed(1)} ms\n`);
  const climate = { normalsC, baselinePeriod: [1991, 2020] as [number, number], scenario: 'SSP2-4.5' as const, monthlyFactors: regionalFactorsFor(68.36, -133.72).monthly, fromYear: 1850, toYear: 2100 };
  localMonthlyAirTemperatures(climate);
  t0 = performance.now();
  for (let k = 0; k < 10; k++) localMonthlyAirTemperatures(climate);
  process.stdout.write(`local climate series: ${((performance.now() - t0) / 10).toFixed(1)} ms\n`);
  if (cold.stats.workerFallback) process.stderr.write(`bench: worker thread not used (${cold.stats.workerFallback})\n`);
}

main().catch((e: unknown) => {
  process.stderr.write(`bench: ${e instanceof Error ? e.message : String(e)}\n`);
  process.exitCode = 1;
});
