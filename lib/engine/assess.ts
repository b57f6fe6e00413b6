/**
 * The assessment orchestrator: one community ground profile under scenarios and planning horizons
 * (the `assess` command of the engine contract, docs/engine-contract.md).
 *
 * API:
 * - `assessInputSchema` (zod): `{ site, scenarios, horizons, permafrost_carbon_feedback? }`.
 * - `runAssessment(input, options)` → `{ output, stats }`; `output` is the contract's document.
 * - `profileHash(site, feedback)`: sha256 of what the shared history depends on (cache key).
 * - `ENGINE_VERSION`, `HORIZONS`.
 *
 * Flow: validate → prepare the column → shared history (calibration, spin-up under the site's
 * 1850–1900 climate, transient 1850–2014; cached by profile hash) → each scenario from 2015 to the
 * end of the last window (taken from a shared queue by the main thread and up to two worker threads
 * when there is more than one scenario; in-process if a worker cannot start) → windows, settlement, hazard,
 * envelopes → output.
 *
 * Definitions of the output (beyond the contract's):
 * - baseline permafrost table: the deepest permafrost table of the baseline years (ground above it
 *   thawed during the baseline and holds no excess ice left to melt); settlement counts only ground
 *   that stayed frozen all through the baseline (from that table down to the baseline permafrost
 *   base), thawed since (settlement.ts); thaw from below is not counted.
 * - `permafrost_table_m`: mean over the window's years that have permafrost; null if none has.
 * - design values of the air indices: the 30 years ending with the window's last year
 *   (air-indices.ts); without interannual variability they reflect the trend only.
 * - `talik_onset_year`: first year of the run (from 1850) with a talik, if not after the window end.
 *
 * References: see site-model.ts, ground-ice.ts, settlement.ts, hazard.ts and the climate modules;
 * `SOURCES` lists them for the provenance.
 */
import { z } from 'zod';
import { summarizeAirIndices } from './air-indices';
import { canonicalSha256 } from './canonical-hash';
import { defaultHistoryCache, type HistoryCache } from './assess-cache';
import { TRANSITION_ZONE_THICKNESS_M } from './constants';
import { meanStrainBetween, thawStrainProfile, type StrainInterval } from './ground-ice';
import { rateHazard, type HazardRating } from './hazard';
import { scenarioSchema, type ScenarioId } from './scenario-forcing';
import { cumulativeSettlement } from './settlement';
import {
  BASELINE_REFERENCE_SCENARIO,
  ENVELOPE_DEPTHS_M,
  HISTORY_FIRST_YEAR,
  baselineRecords,
  computeHistory,
  meanOf,
  prepareSite,
  runScenario,
  type PreparedSite,
  type SiteHistory,
  type YearRecord,
} from './site-model';
import { siteSchema, type Site } from './site-schema';

/** Version of the engine's numerical behaviour (bump when results change). */
export const ENGINE_VERSION = '0.1.0';

/** Allowed planning horizons: decades 2030 to 2090 (engine contract). */
export const HORIZONS = [2030, 2040, 2050, 2060, 2070, 2080, 2090] as const;

const horizonSchema = z.number().refine((v) => (HORIZONS as readonly number[]).includes(v), {
  message: 'must be a decade from 2030 to 2090 (a horizon Y stands for the window Y-9 … Y+10)',
});

export const assessInputSchema = z.strictObject({
  site: siteSchema,
  scenarios: z
    .array(scenarioSchema)
    .min(1)
    .max(5)
    .superRefine((list, ctx) => {
      list.forEach((s, i) => {
        if (list.indexOf(s) !== i) ctx.addIssue({ code: 'custom', path: [i], message: `repeats ${s}` });
      });
    }),
  horizons: z
    .array(horizonSchema)
    .min(1)
    .max(HORIZONS.length)
    .superRefine((list, ctx) => {
      list.forEach((h, i) => {
        if (list.indexOf(h) !== i) ctx.addIssue({ code: 'custom', path: [i], message: `repeats ${h}` });
      });
    }),
  permafrost_carbon_feedback: z.boolean().default(false),
});

export type AssessInput = z.input<typeof assessInputSchema>;
export type AssessParsed = z.output<typeof assessInputSchema>;

/** Sources listed in every provenance block. */
export const SOURCES: readonly string[] = Object.freeze([
  'Two-layer energy-balance emulator: Held et al. 2010, J. Climate 23, doi:10.1175/2009JCLI3466.1; Geoffroy et al. 2013, J. Climate 26, doi:10.1175/JCLI-D-12-00195.1; calibrated to IPCC AR6 WG1 (ERF 2xCO2 3.93 W m-2, ECS 3 °C, TCR 1.8 °C)',
  'Scenario forcing: IPCC AR6 WG1 ch. 7 total ERF (SSP1-2.6, SSP2-4.5, SSP3-7.0, SSP5-8.5; SSP1-1.9 reconstructed); Meinshausen et al. 2020, GMD 13',
  'Regional warming: IPCC AR6 WG1 Atlas land regions, seasonal factors per degree of global warming (approximate)',
  'Daily air temperature: mean-preserving interpolation (Rymes & Myers 2001, Solar Energy 71, doi:10.1016/S0038-092X(01)00052-4)',
  'Air indices and design values: UFC 3-130-06 (formerly TM 5-852-6)',
  'Ground heat conduction: implicit enthalpy method (Voller et al. 1990, doi:10.1002/nme.1620300419); checks after Carslaw & Jaeger 1959',
  'Soil thermal properties: Johansen 1975; Farouki 1981, CRREL Monograph 81-1; unfrozen water after Anderson & Tice 1972; freezing point of saline pore water (UNESCO 1983)',
  'Snow conductivity: Sturm et al. 1997, J. Glaciol. 43, doi:10.3189/S0022143000002781',
  'n-factors: UFC 3-130-04 (formerly TM 5-852-4); Klene et al. 2001, Arct. Antarct. Alp. Res. 33, doi:10.2307/1552214',
  'Ground ice: ASTM D4083 visual ice classes; Shur, Hinkel & Nelson 2005, Permafrost Periglac. Process. 16, doi:10.1002/ppp.518',
  'Thaw strain and settlement: Andersland & Ladanyi, Frozen Ground Engineering, 2nd ed., 2004',
  'Hazard approach: Nelson et al. 2001, Nature 410, doi:10.1038/35069701; Hjort et al. 2018, Nat. Commun. 9, doi:10.1038/s41467-018-07557-4',
  'Input hash: RFC 8785 JSON canonicalization, SHA-256',
]);

/**
 * Worker threads that can run scenarios beside the main thread. The thread pool itself lives in
 * assess-pool.ts (`assessWorkerPool`) and is passed in by callers that want it (the CLI, the bench,
 * tests), so that this module's import graph holds no worker code: a bundler (the web application's)
 * never meets a `new Worker(...)` it would try to bundle, and the application runs in-process.
 */
export interface ScenarioWorkerPool {
  /** Grows the pool to `count` workers; resolves with how many are ready. */
  start(count: number): Promise<number>;
  /** Runs one job on worker `slot`; rejects if that worker is unavailable or fails. */
  run(slot: number, job: WorkerJobInput): Promise<{ scenario: ScenarioId; records: YearRecord[] }[]>;
  /** Why a worker could not start, if one could not. */
  failure(): string | null;
}

/** What a worker needs to run scenarios from a shared history (see assess-worker.ts). */
export interface WorkerJobInput {
  site: Site;
  history: Pick<SiteHistory, 'params' | 'carry2014'>;
  lastYear: number;
  permafrostCarbonFeedback: boolean;
  scenarios: ScenarioId[];
}

export interface AssessOptions {
  /** History cache (default: the process-wide memory cache). Pass `null` for none. */
  cache?: HistoryCache | null;
  /** Worker threads for part of the scenarios when there is more than one (default: none, in-process). */
  workers?: ScenarioWorkerPool;
  /** Set false to run in-process even when a pool is given. */
  useWorkers?: boolean;
  /** Number of worker threads beside the main thread (default DEFAULT_WORKER_THREADS). */
  workerThreads?: number;
  /** Told how far the run is, at each stage and after each scenario (for a job's progress bar). */
  onProgress?: (progress: AssessProgress) => void;
}

/** How far a run is: `fraction` 0–1 of the expected work, and the stage it is in. */
export interface AssessProgress {
  fraction: number;
  stage: 'history' | 'scenarios' | 'summary';
  /** Scenarios finished and in all (stage "scenarios"). */
  scenariosDone?: number;
  scenariosTotal?: number;
}

/** Share of a cold run's time that the spin-up and 1850–2014 history take (measured, bench:engine). */
const HISTORY_SHARE = 0.3;

/**
 * Worker threads beside the main thread: 2. On the 2-core machine three threads share two cores;
 * with five scenarios this finishes in about 2.5 scenario-lengths instead of the 3 of a main + one
 * worker split (whole scenarios cannot be split), at the price of one more worker start-up. The
 * scenarios are taken from a shared queue, so a worker still starting never holds the main thread.
 */
export const DEFAULT_WORKER_THREADS = 2;

export interface AssessStats {
  cacheHit: boolean;
  /** Scenarios run on the worker thread. */
  workerScenarios: number;
  /** Why the worker was not used, if it was wanted. */
  workerFallback: string | null;
  historyMs: number;
  scenariosMs: number;
}

/**
 * Cache key of the shared history: sha256 of the RFC 8785 canonical JSON of the engine version, the
 * site without the fields the history does not depend on (name, checklist) and the feedback flag.
 */
export function profileHash(site: Site, permafrostCarbonFeedback: boolean): string {
  const { name: _name, checklist: _checklist, ...physical } = site;
  void _name;
  void _checklist;
  return canonicalSha256({ engine_version: ENGINE_VERSION, site: physical, permafrost_carbon_feedback: permafrostCarbonFeedback });
}

const round = (v: number, digits = 3) => {
  const f = 10 ** digits;
  return Math.round(v * f) / f;
};

interface BaselineGround {
  /** Baseline permafrost table [m], or null (no permafrost at baseline). */
  tableM: number | null;
  /** Baseline permafrost base [m] (the column depth if permafrost reaches the bottom). */
  baseM: number;
  /** Strain profile clipped to the baseline-frozen ground. */
  strain: StrainInterval[];
  transitionZoneStrain: number;
  transitionZoneIceAssumed: boolean;
  anyIceAssumed: boolean;
}

/**
 * Baseline state of the ground for settlement and hazard: the baseline permafrost table (deepest of
 * the baseline years) and base, the thaw-strain profile clipped to the ground frozen all through
 * the baseline, and the mean strain of the transition zone below the table (2 m; Shur, Hinkel &
 * Nelson 2005, doi:10.1002/ppp.518).
 * @param p Prepared site (layers, freezing points). @param base Baseline-period year records.
 * @returns Depths [m], strains [-] and ice-assumption flags.
 */
function baselineGround(p: PreparedSite, base: YearRecord[]): BaselineGround {
  const profile = thawStrainProfile(p.layers);
  const tables = base.map((r) => r.permafrostTableM);
  const anyIceAssumed = profile.some((s) => s.basis === 'assumed_unknown');
  if (tables.some((t) => t === null)) {
    return { tableM: null, baseM: 0, strain: [], transitionZoneStrain: 0, transitionZoneIceAssumed: false, anyIceAssumed };
  }
  const tableM = Math.max(...(tables as number[]));
  // Base: the shallowest envelope depth below the table whose baseline maximum exceeds the freezing
  // point of its layer (coarse, at the envelope depths), else the column depth.
  let baseM = p.grid.depthM;
  for (let i = 0; i < ENVELOPE_DEPTHS_M.length; i++) {
    const z = ENVELOPE_DEPTHS_M[i];
    if (z <= tableM) continue;
    const maxOverBaseline = Math.max(...base.map((r) => r.maxC[i]));
    if (maxOverBaseline > freezingPointAt(p, z)) {
      baseM = z;
      break;
    }
  }
  const strain = profile
    .map((s) => ({ ...s, top_m: Math.max(s.top_m, tableM), bottom_m: Math.min(s.bottom_m, baseM) }))
    .filter((s) => s.bottom_m > s.top_m);
  const tzBottom = Math.min(baseM, tableM + TRANSITION_ZONE_THICKNESS_M);
  return {
    tableM,
    baseM,
    strain,
    transitionZoneStrain: meanStrainBetween(profile, tableM, tzBottom),
    transitionZoneIceAssumed: profile.some((s) => s.basis === 'assumed_unknown' && s.bottom_m > tableM && s.top_m < tzBottom),
    anyIceAssumed,
  };
}

/** Freezing point [°C] of the layer at a depth [m] (soil-properties.ts, by salinity). */
function freezingPointAt(p: PreparedSite, depthM: number): number {
  let top = 0;
  for (let i = 0; i < p.layers.length; i++) {
    top += p.layers[i].thickness_m;
    if (depthM <= top) return p.freezingPointsC[i];
  }
  return p.freezingPointsC[p.freezingPointsC.length - 1];
}

/**
 * Summary of one window of years (baseline or scenario × horizon): window means of the year
 * records, air-index design values (UFC 3-130-06 via air-indices.ts), cumulative settlement at the
 * window end (settlement.ts), the hazard rating (hazard.ts) and the min/max envelope.
 * Units: °C, °C·d, m as in the field names.
 */
function summarizeWindow(
  p: PreparedSite,
  history: SiteHistory,
  ground: BaselineGround,
  all: YearRecord[],
  settlement: number[],
  window: [number, number],
  observedThermalState: boolean,
) {
  const first = all[0].year;
  const years = all.filter((r) => r.year >= window[0] && r.year <= window[1]);
  const zaaIndex = ENVELOPE_DEPTHS_M.indexOf(history.zaaDepthM);
  const indices = summarizeAirIndices(
    { years: all.map((r) => r.year), thawingIndexCDays: all.map((r) => r.thawingIndexCDays), freezingIndexCDays: all.map((r) => r.freezingIndexCDays) },
    window,
  );
  const tables = years.map((r) => r.permafrostTableM).filter((t): t is number => t !== null);
  const onset = all.find((r) => r.talik && r.year <= window[1]);
  const groundT = meanOf(years.map((r) => r.meanC[zaaIndex]));
  const settlementEnd = settlement[window[1] - first];
  const hazard: HazardRating = rateHazard({
    groundTemperatureC: groundT,
    baselinePermafrost: ground.tableM !== null,
    windowPermafrost: years.every((r) => r.permafrostTableM !== null),
    talik: years.some((r) => r.talik),
    settlementM: settlementEnd,
    transitionZoneStrain: ground.transitionZoneStrain,
    transitionZoneIceAssumed: ground.transitionZoneIceAssumed,
    anyIceAssumed: ground.anyIceAssumed,
    thermalStateObserved: observedThermalState,
    checklist: p.site.checklist,
  });
  const envelope = {
    depths_m: [...ENVELOPE_DEPTHS_M],
    min_c: ENVELOPE_DEPTHS_M.map((_, i) => round(Math.min(...years.map((r) => r.minC[i])), 2)),
    max_c: ENVELOPE_DEPTHS_M.map((_, i) => round(Math.max(...years.map((r) => r.maxC[i])), 2)),
  };
  return {
    fields: {
      window,
      air_temperature_c: round(meanOf(years.map((r) => r.airMeanC)), 2),
      thawing_index_c_days: round(indices.meanThawingIndexCDays, 0),
      freezing_index_c_days: round(indices.meanFreezingIndexCDays, 0),
      thawing_index_design_c_days: round(indices.designThawingIndexCDays, 0),
      thawing_index_warmest_c_days: round(indices.warmestThawingIndexCDays, 0),
      freezing_index_design_c_days: round(indices.designFreezingIndexCDays, 0),
      freezing_index_coldest_c_days: round(indices.coldestFreezingIndexCDays, 0),
      design_index_period: indices.designPeriod,
      seasonal_thaw_m: round(meanOf(years.map((r) => r.seasonalThawM)), 3),
      permafrost_table_m: tables.length ? round(meanOf(tables), 3) : null,
      talik: years.some((r) => r.talik),
      talik_onset_year: onset ? onset.year : null,
      ground_temperature_c: round(groundT, 2),
      ground_temperature_depth_m: history.zaaDepthM,
      settlement_m: round(settlementEnd, 3),
      hazard: hazard.hazard,
      hazard_label: hazard.hazard_label,
      hazard_reasons: hazard.hazard_reasons,
      not_modelled: hazard.not_modelled,
      confidence: hazard.confidence,
    },
    envelope,
  };
}

/**
 * Runs an assessment (see the module comment).
 * @param raw Input; validated here (throws a ZodError on bad input; the CLI validates first).
 * @param options Cache and worker options.
 * @returns The contract's output document and run statistics.
 */
export async function runAssessment(raw: AssessInput | AssessParsed, options: AssessOptions = {}): Promise<{ output: AssessOutput; stats: AssessStats }> {
  const input = assessInputSchema.parse(raw);
  const site = input.site;
  const feedback = input.permafrost_carbon_feedback;
  const cache = options.cache === undefined ? defaultHistoryCache : options.cache;
  const scenarios = input.scenarios as ScenarioId[];
  const horizons = [...input.horizons].sort((a, b) => a - b);
  const lastYear = horizons[horizons.length - 1] + 10;
  const pool = options.useWorkers === false ? undefined : options.workers;
  const workerCount = pool ? Math.min(options.workerThreads ?? DEFAULT_WORKER_THREADS, scenarios.length - 1) : 0;
  // Start the workers first, so their start-up overlaps the history on the main thread.
  const workersReady = pool && workerCount > 0 ? pool.start(workerCount) : Promise.resolve(0);

  const report = options.onProgress ?? (() => {});
  const p = prepareSite(site, { permafrostCarbonFeedback: feedback });
  const key = profileHash(site, feedback);
  const t0 = performance.now();
  let history = cache?.get(key);
  const cacheHit = !!history;
  report({ fraction: 0, stage: 'history' });
  if (!history) {
    history = computeHistory(p);
    cache?.set(key, history);
  }
  const t1 = performance.now();
  const historyShare = cacheHit ? 0 : HISTORY_SHARE;
  const scenarioDone = () =>
    report({ fraction: historyShare + ((1 - historyShare) * 0.95 * results.size) / scenarios.length, stage: 'scenarios', scenariosDone: results.size, scenariosTotal: scenarios.length });
  report({ fraction: historyShare, stage: 'scenarios', scenariosDone: 0, scenariosTotal: scenarios.length });

  // Scenarios from a shared queue: the main thread takes one at a time and yields between them, so
  // that each worker, once it has started (its start-up overlaps the history), takes the next one.
  // A worker that fails hands its scenario back to the queue and stops (in-process fallback).
  const results = new Map<ScenarioId, YearRecord[]>();
  let workerScenarios = 0;
  let workerFallback: string | null = null;
  const queue = [...scenarios];
  const h = history;
  const workerJob = { site, history: { params: h.params, carry2014: h.carry2014 }, lastYear, permafrostCarbonFeedback: feedback };
  const workerLoops =
    workerCount > 0
      ? workersReady.then((ready) => {
          if (ready < workerCount) workerFallback = pool!.failure() ?? 'worker unavailable';
          return Promise.all(
            Array.from({ length: ready }, async (_, slot) => {
              while (queue.length > 0) {
                const s = queue.shift()!;
                try {
                  const r = await pool!.run(slot, { ...workerJob, scenarios: [s] });
                  results.set(s, r[0].records);
                  workerScenarios++;
                  scenarioDone();
                } catch (e) {
                  workerFallback = (e as Error).message;
                  queue.push(s);
                  return;
                }
              }
            }),
          );
        })
      : Promise.resolve([]);
  // Yield once first, so that workers already running take their first scenarios before the main
  // thread starts its own.
  await new Promise<void>((resolve) => setImmediate(resolve));
  while (queue.length > 0) {
    const s = queue.shift()!;
    results.set(s, runScenario(p, h, s, lastYear));
    scenarioDone();
    // Let worker replies and readiness through before taking the next scenario.
    await new Promise<void>((resolve) => setImmediate(resolve));
  }
  await workerLoops;
  // Scenarios handed back by a failed worker after the main loop ended.
  for (const s of queue.splice(0)) {
    results.set(s, runScenario(p, h, s, lastYear));
    scenarioDone();
  }
  const t2 = performance.now();
  report({ fraction: 0.97, stage: 'summary' });

  const output = assembleOutput(input, p, history, results, horizons, key);
  return {
    output,
    stats: { cacheHit, workerScenarios, workerFallback, historyMs: t1 - t0, scenariosMs: t2 - t1 },
  };
}

export type AssessOutput = ReturnType<typeof assembleOutput>;

function assembleOutput(
  input: AssessParsed,
  p: PreparedSite,
  history: SiteHistory,
  results: Map<ScenarioId, YearRecord[]>,
  horizons: number[],
  key: string,
) {
  const site = input.site;
  const [b0, b1] = site.climate.baseline_period;
  const base = baselineRecords(p, history);
  const ground = baselineGround(p, base);
  const observedThermalState = history.calibration.status === 'calibrated' || !!site.observed?.ground_temperature_profile;
  const zaaIndex = ENVELOPE_DEPTHS_M.indexOf(history.zaaDepthM);

  const settlementOf = (all: YearRecord[]) =>
    ground.tableM === null ? all.map(() => 0) : cumulativeSettlement(ground.strain, ground.tableM, all.map((r) => (r.year <= b1 ? 0 : r.deepestThawM)));

  // Baseline: the history (and its extension under the reference scenario), its own window.
  const baseAll = [...history.records, ...history.baselineExtension];
  const baseSummary = summarizeWindow(p, history, ground, baseAll, settlementOf(baseAll), [b0, b1], observedThermalState);

  const out: {
    results: Record<string, unknown>[];
    annual: Record<string, unknown>[];
    envelopes: Record<string, unknown>[];
  } = { results: [], annual: [], envelopes: [] };
  for (const scenario of input.scenarios as ScenarioId[]) {
    const all = [...history.records, ...results.get(scenario)!];
    const settlement = settlementOf(all);
    for (const horizon of horizons) {
      const window: [number, number] = [horizon - 9, horizon + 10];
      const s = summarizeWindow(p, history, ground, all, settlement, window, observedThermalState);
      out.results.push({ scenario, horizon, ...s.fields });
      out.envelopes.push({ scenario, horizon, ...s.envelope });
    }
    for (let i = 0; i < all.length; i++) {
      const r = all[i];
      if (r.year < b0) continue;
      out.annual.push({
        scenario,
        year: r.year,
        air_temperature_c: round(r.airMeanC, 2),
        thawing_index_c_days: round(r.thawingIndexCDays, 0),
        freezing_index_c_days: round(r.freezingIndexCDays, 0),
        seasonal_thaw_m: round(r.seasonalThawM, 3),
        permafrost_table_m: r.permafrostTableM === null ? null : round(r.permafrostTableM, 3),
        talik: r.talik,
        ground_temperature_c: round(r.meanC[zaaIndex], 2),
        settlement_m: round(settlement[i], 3),
      });
    }
  }

  const solverHealth = [...base, ...[...results.values()].flat()].reduce((s, r) => s + r.nonConvergedSteps, 0);
  return {
    baseline: { period: [b0, b1] as [number, number], ...baseSummary.fields, envelope: baseSummary.envelope },
    results: out.results,
    annual: out.annual,
    envelopes: out.envelopes,
    site_model: {
      calibration: history.calibration,
      spin_up: {
        years: history.spinUp.years,
        converged: history.spinUp.converged,
        max_change_k: round(history.spinUp.maxChangeK, 4),
        accelerated_years: history.spinUp.acceleratedYears,
        climate: '1850–1900: baseline normals less the local historical warming',
      },
      start: site.observed?.ground_temperature_profile
        ? `observed profile imposed at ${site.observed.ground_temperature_profile.date}`
        : 'spin-up, then transient from 1850',
      column_depth_m: p.grid.depthM,
      column_extended_to_m: p.columnExtendedToM,
      grid_cells: p.grid.cellCount,
      baseline_permafrost_table_m: ground.tableM === null ? null : round(ground.tableM, 3),
      baseline_permafrost_base_m: ground.tableM === null ? null : ground.baseM,
      snow_case: site.snow.scenario_case ?? 'baseline',
      snow_modelled: p.snowModelled,
      n_factors: { thaw: round(history.params.nThaw, 3), freeze: round(history.params.nFreeze, 3), source: p.surface.source },
      regional_factors: { region: p.regional.region, monthly: p.regional.monthly.map((v) => round(v, 3)), source: p.regional.source },
      baseline_reference_scenario: BASELINE_REFERENCE_SCENARIO,
      history_from: HISTORY_FIRST_YEAR,
      non_converged_solver_steps: solverHealth,
      ice_bases: thawStrainProfile(site.layers).map((s) => s.basis),
    },
    provenance: {
      engine_version: ENGINE_VERSION,
      input_sha256: canonicalSha256(input),
      profile_sha256: key,
      sources: [...SOURCES],
    },
  };
}
