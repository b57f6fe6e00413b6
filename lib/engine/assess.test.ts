/**
 * Sanity checks of the assessment on the production path (runAssessment / site model):
 * a higher scenario never gives a thinner seasonal thaw, settlement never decreases, more snow
 * never gives colder ground, calibration meets its targets; workers and the cache change nothing.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { profileHash, runAssessment, type AssessOutput } from './assess';
import { HistoryCache } from './assess-cache';
import { assessWorkerPool, closeAssessPool } from './assess-pool';
import { SPINUP_TOLERANCE_K } from './constants';
import { globalWarmingMean } from './global-warming';
import { SCENARIOS } from './scenario-forcing';
import { computeHistory, createSiteColumn, defaultSurfaceParameters, prepareSite, spinUp } from './site-model';
import { exampleSite, siteSchema, type SiteInput } from './site-schema';

function site(): SiteInput {
  const s = structuredClone(exampleSite);
  delete s.observed;
  return s;
}

type Result = AssessOutput['results'][number] & { scenario: string; horizon: number; seasonal_thaw_m: number; settlement_m: number };

const cache = new HistoryCache();

describe('assessment: five scenarios, three horizons', () => {
  let out: AssessOutput;
  let stats: Awaited<ReturnType<typeof runAssessment>>['stats'];
  beforeAll(async () => {
    const r = await runAssessment({ site: site(), scenarios: [...SCENARIOS], horizons: [2030, 2050, 2080] }, { cache, workers: assessWorkerPool });
    out = r.output;
    stats = r.stats;
  });
  afterAll(async () => {
    await closeAssessPool();
  });

  it('a higher scenario never gives a thinner seasonal thaw, at every horizon (sanity check)', () => {
    // Order by the emulator's global warming over the window: the scenarios' forcing is not ordered
    // in the 2020s (AR6 WG1 ch. 7: SSP3-7.0 2.76 < SSP1-2.6 2.80 W m-2 in 2020, from the issue), so
    // "higher" means warmer over the window; from 2050 on this is the SSP order (AR6 SPM Table SPM.1).
    const results = out.results as Result[];
    for (const horizon of [2030, 2050, 2080]) {
      const row = results.filter((r) => r.horizon === horizon);
      const warming = (s: string) => globalWarmingMean(s as (typeof SCENARIOS)[number], horizon - 9, horizon + 10);
      const sorted = [...row].sort((a, b) => warming(a.scenario) - warming(b.scenario));
      for (let i = 1; i < sorted.length; i++) expect(sorted[i].seasonal_thaw_m).toBeGreaterThanOrEqual(sorted[i - 1].seasonal_thaw_m);
      if (horizon >= 2050) expect(sorted.map((r) => r.scenario)).toEqual([...SCENARIOS]);
    }
    // Across horizons: a later window of the same scenario is at least as warm from 2050 on
    // for SSP2-4.5 and above (AR6 SPM Table SPM.1) and never thaws less.
    for (const s of ['SSP2-4.5', 'SSP3-7.0', 'SSP5-8.5']) {
      const row = results.filter((r) => r.scenario === s).sort((a, b) => a.horizon - b.horizon);
      for (let i = 1; i < row.length; i++) expect(row[i].seasonal_thaw_m).toBeGreaterThanOrEqual(row[i - 1].seasonal_thaw_m);
    }
  });

  it('settlement never decreases, year by year and horizon by horizon (settlement does not recover, contract)', () => {
    for (const s of SCENARIOS) {
      const years = (out.annual as { scenario: string; settlement_m: number }[]).filter((a) => a.scenario === s);
      expect(years.length).toBeGreaterThan(50);
      for (let i = 1; i < years.length; i++) expect(years[i].settlement_m).toBeGreaterThanOrEqual(years[i - 1].settlement_m);
      const row = (out.results as Result[]).filter((r) => r.scenario === s).sort((a, b) => a.horizon - b.horizon);
      for (let i = 1; i < row.length; i++) expect(row[i].settlement_m).toBeGreaterThanOrEqual(row[i - 1].settlement_m);
    }
    expect(out.baseline.settlement_m).toBe(0);
  });

  // Issue 3: the spin-up is bounded and reports non-convergence; here it must have converged.
  it('the spin-up converged and the solver converged in every step', () => {
    expect(out.site_model.spin_up.converged).toBe(true);
    // Convergence criterion of the spin-up: the annual-mean profile changes < 0.01 °C a year.
    expect(out.site_model.spin_up.max_change_k).toBeLessThan(SPINUP_TOLERANCE_K);
    expect(out.site_model.non_converged_solver_steps).toBe(0);
  });

  it('the worker thread and the in-process path give identical results; the cache gives identical output', async () => {
    // Parallel runs and caching must not change a number (common practice).
    // Two scenarios in-process, history from the cache.
    const inProcess = await runAssessment({ site: site(), scenarios: ['SSP1-2.6', 'SSP5-8.5'], horizons: [2030, 2050, 2080] }, { cache, useWorkers: false });
    expect(inProcess.stats.cacheHit).toBe(true);
    expect(inProcess.stats.workerScenarios).toBe(0);
    const pick = (o: AssessOutput, s: string) => (o.results as Result[]).filter((r) => r.scenario === s);
    for (const s of ['SSP1-2.6', 'SSP5-8.5']) expect(pick(inProcess.output, s)).toEqual(pick(out, s));
    // The first run used a worker for part of the scenarios unless it could not start (reported).
    expect(stats.workerScenarios > 0 || stats.workerFallback !== null).toBe(true);
    expect(stats.workerFallback).toBeNull();
  });

  it('without observations the site is marked uncalibrated', () => {
    expect(out.site_model.calibration.status).toBe('uncalibrated');
  });

  // The directory cache must return exactly what was stored (common practice).
  it('round-trips a history through the directory cache', () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'thawline-cache-'));
    try {
      const key = profileHash(siteSchema.parse(site()), false);
      const h = cache.get(key)!;
      expect(h).toBeDefined();
      new HistoryCache({ directory: dir }).set(key, h);
      const back = new HistoryCache({ directory: dir }).get(key);
      expect(back).toEqual(JSON.parse(JSON.stringify(h)));
      expect(new HistoryCache({ directory: dir }).get('b'.repeat(64))).toBeUndefined();
    } finally {
      fs.rmSync(dir, { recursive: true, force: true });
    }
  });
});

describe('snow: more snow never gives colder ground (sanity check)', () => {
  // Snow insulates the ground in winter and warms it (Goodrich 1982, Can. Geotech. J. 19,
  // doi:10.1139/t82-047); the summer snow-free season is unchanged, so deeper snow cannot cool it.
  it('equilibrium annual-mean ground temperature rises with snow depth at every depth', () => {
    const p = prepareSite(siteSchema.parse(site()));
    const normals = p.site.climate.monthly_air_temperature_c;
    let previous: Float64Array | null = null;
    for (const factor of [0, 0.5, 0.7, 1, 1.3, 2]) {
      const column = createSiteColumn(p);
      const r = spinUp(column, p, { ...defaultSurfaceParameters(p), snowDepthFactor: factor }, normals);
      expect(r.converged).toBe(true);
      const mean = column.statistics().meanTemperatureC;
      // Allowance: the spin-up's own convergence criterion, 0.01 K a year.
      if (previous) for (let i = 0; i < mean.length; i++) expect(mean[i]).toBeGreaterThanOrEqual(previous[i] - SPINUP_TOLERANCE_K);
      previous = mean;
    }
  });

  it('the ±30 % snow cases order the outlook: minus_30 ≤ baseline ≤ plus_30 in ground temperature', async () => {
    const run = async (c: 'minus_30' | 'plus_30') => {
      const s = site();
      s.snow.scenario_case = c;
      return (await runAssessment({ site: s, scenarios: ['SSP2-4.5'], horizons: [2050] }, { cache: null })).output;
    };
    const lo = await run('minus_30');
    const hi = await run('plus_30');
    const base = (await runAssessment({ site: site(), scenarios: ['SSP2-4.5'], horizons: [2050] }, { cache })).output;
    const t = (o: AssessOutput) => (o.results[0] as { ground_temperature_c: number }).ground_temperature_c;
    expect(t(lo)).toBeLessThanOrEqual(t(base));
    expect(t(base)).toBeLessThanOrEqual(t(hi));
    expect(lo.baseline.ground_temperature_c).toBeLessThanOrEqual(hi.baseline.ground_temperature_c);
  });
});

describe('calibration meets its targets when observations are given (MAGT within 0.5 °C, ALT within 20 %)', () => {
  it('ALT and MAGT observed together', () => {
    const s = site();
    s.observed = { active_layer_thickness_m: 0.6, magt_c: -4.5, magt_depth_m: 10 };
    const h = computeHistory(prepareSite(siteSchema.parse(s)));
    expect(h.calibration.status).toBe('calibrated');
    expect(Math.abs(h.calibration.achieved.active_layer_thickness_m! - 0.6)).toBeLessThanOrEqual(0.2 * 0.6);
    expect(Math.abs(h.calibration.achieved.magt_c! + 4.5)).toBeLessThanOrEqual(0.5);
    // Parameters stay inside their published ranges.
    const c = h.calibration.parameters;
    expect(c.n_factor_thaw).toBeGreaterThanOrEqual(c.n_factor_thaw_range[0]);
    expect(c.n_factor_thaw).toBeLessThanOrEqual(c.n_factor_thaw_range[1]);
  });
});

describe('talik (drifted snow beside buildings, SSP5-8.5)', () => {
  it('once a talik forms, the permafrost table lies deeper than the seasonal thaw; onset year and reasons reported', async () => {
    const s = site();
    s.snow.scenario_case = 'drifted';
    s.checklist = { ...s.checklist!, snow_drifts: 'present' };
    const o = (await runAssessment({ site: s, scenarios: ['SSP5-8.5'], horizons: [2050] }, { cache })).output;
    const r = o.results[0] as { talik: boolean; talik_onset_year: number | null; permafrost_table_m: number; seasonal_thaw_m: number; hazard: string; hazard_reasons: string[]; not_modelled: string[] };
    // Engine contract: permafrost_table_m is "deeper than the seasonal thaw once a talik forms".
    expect(r.talik).toBe(true);
    expect(r.talik_onset_year).not.toBeNull();
    expect(r.talik_onset_year!).toBeLessThanOrEqual(2060);
    expect(r.permafrost_table_m).toBeGreaterThan(r.seasonal_thaw_m);
    // Year by year: a talik year has its table below the seasonal thaw by at least the talik's 0.2 m
    // (the talik's minimum thickness).
    const talikYears = (o.annual as { talik: boolean; permafrost_table_m: number | null; seasonal_thaw_m: number }[]).filter(
      (a) => a.talik && a.permafrost_table_m !== null,
    );
    expect(talikYears.length).toBeGreaterThan(0);
    for (const a of talikYears) expect(a.permafrost_table_m! - a.seasonal_thaw_m).toBeGreaterThanOrEqual(0.2 - 1e-9);
    // Hazard rules (hazard.ts): a talik gives higher concern; the checklist item is a reason and not modelled.
    expect(r.hazard).toBe('high');
    expect(r.hazard_reasons).toContain('talik');
    expect(r.hazard_reasons).toContain('checklist_snow_drifts');
    expect(r.not_modelled).toEqual(['snow_drifts']);
  });
});

describe('progress', () => {
  it('reports the stages in order, every scenario once, and fractions that never go back', async () => {
    const seen: { fraction: number; stage: string; scenariosDone?: number }[] = [];
    await runAssessment({ site: exampleSite, scenarios: ['SSP1-2.6', 'SSP5-8.5'], horizons: [2050] }, { cache: null, onProgress: (p) => seen.push(p) });
    expect(seen.map((p) => p.stage)).toEqual(['history', 'scenarios', 'scenarios', 'scenarios', 'summary']);
    expect(seen.filter((p) => p.stage === 'scenarios').map((p) => p.scenariosDone)).toEqual([0, 1, 2]);
    for (let i = 1; i < seen.length; i++) expect(seen[i].fraction).toBeGreaterThan(seen[i - 1].fraction);
    expect(seen[0].fraction).toBe(0);
    expect(seen.at(-1)!.fraction).toBeLessThan(1);
  });
});
