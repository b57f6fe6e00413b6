/**
 * Site model, history: calibration, spin-up under the site's 1850–1900 climate, the transient run
 * 1850–2014 (and the baseline years after 2014 under SSP2-4.5), the 2014 state and the baseline
 * diagnostics, shared by every scenario (cached by assess.ts); then each scenario from 2015.
 *
 * API: `computeHistory(prepared)` → `SiteHistory`; `runScenario(prepared, history, scenario,
 * lastYear)` → the `YearRecord`s of 2015..lastYear; `baselineRecords`, `zeroAnnualAmplitudeDepthM`,
 * `meanOf`.
 */
import type { ScenarioId } from './scenario-forcing';
import type { Site } from './site-schema';
import { BASELINE_REFERENCE_SCENARIO, ENVELOPE_DEPTHS_M, HISTORY_FIRST_YEAR, HISTORY_LAST_YEAR, ZERO_ANNUAL_AMPLITUDE_RANGE_K, createSiteColumn, defaultSurfaceParameters, type PreparedSite, type SurfaceParameters } from './site-model-preparation';
import { monthlySeriesFor, preindustrialMonthly } from './site-model-forcing';
import { carryFromJson, carryToJson, observedStart, runYears, type RunCarry, type RunCarryJson, type YearRecord } from './site-model-run';
import { spinUp, type SpinUpReport } from './site-model-spin-up';
import { CALIBRATION_SNOW_DENSITY_RANGE_KG_M3, calibrateSurface, valueAtDepth, type CalibrationReport, type CalibrationStatus } from './site-model-calibration';

/** The shared part of an assessment: everything up to 2014 (and the baseline years after it). */
export interface SiteHistory {
  params: SurfaceParameters;
  calibration: CalibrationReport;
  spinUp: SpinUpReport;
  /** Records 1850..2014. */
  records: YearRecord[];
  /** Records of the baseline years after 2014 (under BASELINE_REFERENCE_SCENARIO), possibly empty. */
  baselineExtension: YearRecord[];
  /** State and carry at the end of 2014. */
  carry2014: RunCarryJson;
  /** Depth of zero annual amplitude at baseline [m] (an envelope depth). */
  zaaDepthM: number;
}

/** Baseline-period records from a history. */
export function baselineRecords(p: PreparedSite, h: Pick<SiteHistory, 'records' | 'baselineExtension'>): YearRecord[] {
  const [b0, b1] = p.site.climate.baseline_period;
  return [...h.records, ...h.baselineExtension].filter((r) => r.year >= b0 && r.year <= b1);
}

/** Shallowest depth searched for the depth of zero annual amplitude [m] (see below). */
export const ZAA_MIN_DEPTH_M = 10;

/**
 * Depth of zero annual amplitude [m]: the shallowest envelope depth at or below 10 m where the mean
 * annual range (max − min) over the baseline years is at most 0.1 K ([5], threshold from memory);
 * 20 m if none is found down to 30 m (a fallback of this engine). The search starts at 10 m because
 * in warm permafrost the latent heat of the unfrozen water damps the annual range near 0 °C at
 * much shallower depths (a "zero curtain" just below the active layer), which is not the depth of
 * zero annual amplitude; in permafrost that depth lies typically at 10–20 m ([5], from memory).
 */
export function zeroAnnualAmplitudeDepthM(records: readonly YearRecord[]): number {
  const z = ENVELOPE_DEPTHS_M;
  for (let i = 0; i < z.length; i++) {
    if (z[i] < ZAA_MIN_DEPTH_M) continue;
    if (z[i] > 30) break;
    let s = 0;
    for (const r of records) s += r.maxC[i] - r.minC[i];
    if (s / records.length <= ZERO_ANNUAL_AMPLITUDE_RANGE_K) return z[i];
  }
  return 20;
}

function baselineTargets(site: Site) {
  const o = site.observed;
  return { altM: o?.active_layer_thickness_m, magtC: o?.magt_c, magtDepthM: o?.magt_depth_m };
}

/** Runs spin-up, the history 1850–2014 and the baseline extension with given parameters. */
function runHistoryWith(p: PreparedSite, params: SurfaceParameters) {
  const column = createSiteColumn(p);
  const spin = spinUp(column, p, params, preindustrialMonthly(p));
  const [, b1] = p.site.climate.baseline_period;
  const histSeries = monthlySeriesFor(p, BASELINE_REFERENCE_SCENARIO, HISTORY_FIRST_YEAR, Math.max(HISTORY_LAST_YEAR + 1, b1 + 1));
  const carry: RunCarry = { state: column.getState(), prevMinH: null, prevMaxH: null, prevDailyAirC: null };
  const obs = observedStart(p);
  const records = runYears(column, p, params, histSeries, HISTORY_FIRST_YEAR, HISTORY_LAST_YEAR, carry, obs);
  const carry2014 = carryToJson(carry);
  let extension: YearRecord[] = [];
  if (b1 > HISTORY_LAST_YEAR) {
    extension = runYears(column, p, params, histSeries, HISTORY_LAST_YEAR + 1, b1, carry, obs);
  }
  return { spin, records, extension, carry2014 };
}

/** Arithmetic mean of the values [same unit]. */
export function meanOf(values: number[]): number {
  return values.reduce((s, v) => s + v, 0) / values.length;
}

/**
 * The shared history of a site: calibration (if observations are given), spin-up under its
 * 1850–1900 climate, the transient 1850–2014, and its baseline years after 2014.
 * Calibration: parameters by bisection on the equilibrium under the baseline normals, then the
 * transient baseline is compared with the targets; if it misses, the equilibrium–transient
 * difference is fed back once and the history rerun. Status "calibrated" only when the transient
 * baseline meets every target (ALT within 20 %, MAGT within 0.5 K).
 * @param p Prepared site.
 * @returns The history (plain, serialisable data).
 */
export function computeHistory(p: PreparedSite): SiteHistory {
  const start = defaultSurfaceParameters(p);
  const targets = baselineTargets(p.site);
  const wantsCalibration = targets.altM !== undefined || targets.magtC !== undefined;
  let params = start;
  let adjusted: string[] = [];
  const measure = (r: ReturnType<typeof runHistoryWith>) => {
    const base = baselineRecords(p, { records: r.records, baselineExtension: r.extension });
    return {
      altM: meanOf(base.map((x) => x.seasonalThawM)),
      magtC: targets.magtDepthM !== undefined ? meanOf(base.map((x) => valueAtDepth(x.meanC, targets.magtDepthM!))) : undefined,
    };
  };
  const hits = (m: { altM: number; magtC?: number }) =>
    (targets.altM === undefined || Math.abs(m.altM - targets.altM) <= 0.2 * targets.altM) &&
    (targets.magtC === undefined || (m.magtC !== undefined && Math.abs(m.magtC - targets.magtC) <= 0.5));
  // With observations, the first calibration attempt replaces the default run: run it only without.
  let run!: ReturnType<typeof runHistoryWith>;
  let achieved!: ReturnType<typeof measure>;
  if (!wantsCalibration) {
    run = runHistoryWith(p, params);
    achieved = measure(run);
  } else {
    let offsets = { altM: 0, magtK: 0 };
    for (let attempt = 0; attempt < 3 && !(attempt > 0 && hits(achieved)); attempt++) {
      const cal = calibrateSurface(p, start, targets, offsets);
      params = cal.params;
      adjusted = cal.adjusted;
      run = runHistoryWith(p, params);
      const m = measure(run);
      // Equilibrium vs transient: the equilibrium under the normals was aimed at target − offset;
      // the transient gave m, so the remaining miss is added to the offset (secant-like update).
      offsets = {
        altM: offsets.altM + (targets.altM !== undefined ? m.altM - targets.altM : 0),
        magtK: offsets.magtK + (targets.magtC !== undefined && m.magtC !== undefined ? m.magtC - targets.magtC : 0),
      };
      achieved = m;
      if (hits(m)) break;
    }
  }
  const status: CalibrationStatus = !wantsCalibration ? 'uncalibrated' : hits(achieved) ? 'calibrated' : 'calibration_not_reached';
  const calibration: CalibrationReport = {
    status,
    targets: {
      ...(targets.altM !== undefined ? { active_layer_thickness_m: targets.altM } : {}),
      ...(targets.magtC !== undefined ? { magt_c: targets.magtC, magt_depth_m: targets.magtDepthM } : {}),
    },
    achieved: wantsCalibration
      ? {
          ...(targets.altM !== undefined ? { active_layer_thickness_m: achieved.altM } : {}),
          ...(targets.magtC !== undefined && achieved.magtC !== undefined ? { magt_c: achieved.magtC } : {}),
        }
      : {},
    tolerance: { active_layer_relative: 0.2, magt_k: 0.5 },
    parameters: {
      n_factor_thaw: params.nThaw,
      n_factor_freeze: params.nFreeze,
      snow_density_shift_kg_m3: params.snowDensityShiftKgM3,
      n_factor_thaw_range: [...p.surface.nThawRange],
      n_factor_freeze_range: [...p.surface.nFreezeRange],
      snow_density_range_kg_m3: [...CALIBRATION_SNOW_DENSITY_RANGE_KG_M3],
    },
    adjusted,
    note: !wantsCalibration
      ? 'no observed MAGT or active-layer thickness: default n-factors and snow, uncalibrated'
      : status === 'calibrated'
        ? `adjusted ${adjusted.join(', ')} within published ranges to match the observations over the baseline period`
        : `could not match the observations within the tolerances by adjusting ${adjusted.join(', ')} within published ranges`,
  };
  const base = baselineRecords(p, { records: run.records, baselineExtension: run.extension });
  return {
    params,
    calibration,
    spinUp: run.spin,
    records: run.records,
    baselineExtension: run.extension,
    carry2014: run.carry2014,
    zaaDepthM: zeroAnnualAmplitudeDepthM(base),
  };
}

/**
 * One scenario from the end of the shared history.
 * @param p Prepared site. @param history Shared history.
 * @param scenario SSP identifier. @param lastYear Last year to run (≤ 2100).
 * @returns Records 2015..lastYear.
 */
export function runScenario(p: PreparedSite, history: Pick<SiteHistory, 'params' | 'carry2014'>, scenario: ScenarioId, lastYear: number): YearRecord[] {
  const column = createSiteColumn(p);
  const carry = carryFromJson(history.carry2014);
  column.setState(carry.state);
  const series = monthlySeriesFor(p, scenario, HISTORY_LAST_YEAR, Math.min(2100, lastYear + 1));
  const obs = observedStart(p);
  return runYears(column, p, history.params, series, HISTORY_LAST_YEAR + 1, lastYear, carry, obs && obs.year > HISTORY_LAST_YEAR ? obs : null);
}
