/**
 * The site model: joins the climate modules and the ground solver for one community ground
 * profile (a validated `Site`).
 *
 * API:
 * - `prepareSite(site, options)` → `PreparedSite`: the extended column (layers to ≥ 50 m), its grid
 *   and materials (soil-properties.ts), regional factors, daily snow and the surface n-factors.
 * - `createSiteColumn(prepared)` → a `HeatConductionColumn` for it.
 * - `spinUp(column, prepared, params, monthlyC)` → `SpinUpReport`: from the steady geothermal
 *   profile to the periodic state under a fixed annual cycle.
 * - `runYears(column, prepared, params, series, from, to, carry)` → `YearRecord[]`.
 * - `computeHistory(site, options)` → `SiteHistory`: calibration, spin-up under the site's
 *   1850–1900 climate, transient 1850–2014 (+ the baseline years after 2014 under SSP2-4.5), the
 *   2014 state and the baseline diagnostics. Shared by every scenario; cached by assess.ts.
 * - `runScenario(site, history, scenario, lastYear, options)` → the years 2015..lastYear.
 *
 * Surface forcing per day (documented choices):
 * - air temperature: monthly values from local-climate.ts made daily by the mean-preserving
 *   interpolation of monthly-to-daily.ts (365-day years);
 * - without snow: T_surface = n_t · T_air when T_air > 0, n_f · T_air otherwise (n-factors,
 *   Lunardini 1978; UFC 3-130-04; Klene et al. 2001);
 * - snow on the ground (covers that are not snow-cleared): the air temperature (n = 1) is imposed on
 *   the top of a snow layer of the day's depth and density, conductivity by Sturm et al. (1997), so
 *   the freezing n-factor is NOT applied (the table's vegetation values already include snow);
 *   snow-cleared covers (roads, airstrips: n-factors.ts says which) carry no snow and use n_f;
 * - daily snow depth from the monthly depths by the same mean-preserving interpolation, clipped at 0
 *   and zero through any month whose mean depth is 0.
 *
 * Year diagnostics (per 365-day calendar year, extremes over every solver step):
 * seasonal thaw = largest thaw depth from the surface, bounded by the depth the winter froze to
 * (once a talik forms, the seasonal layer above it); permafrost table = top of the ground that
 * stayed frozen all year (null: no permafrost in the column); talik = a layer ≥ 0.2 m that stayed
 * thawed through this year and the one before, below the seasonal freezing depth, with permafrost
 * below (heat-conduction.ts `detectTalik` over the two-year extremes); mean/min/max temperature at
 * the envelope depths; air mean, thawing index (calendar year), freezing index (winter ending in
 * the year, 1 July – 30 June; air-indices.ts).
 *
 * References:
 * [1] M. Sturm, J. Holmgren, M. König, K. Morris, "The thermal conductivity of seasonal snow,"
 *     J. Glaciol. 43(143), 26–41, 1997, doi:10.3189/S0022143000002781.
 * [2] V. J. Lunardini, "Theory of n-factors and correlation of data," Proc. 3rd Int. Conf.
 *     Permafrost, Edmonton, 1978, 40–46.
 * [3] UFC 3-130-04 (formerly TM 5-852-4), Arctic and subarctic construction: foundations for
 *     structures, U.S. Dept. of Defense.
 * [4] J. M. Klene, F. E. Nelson, N. I. Shiklomanov, K. M. Hinkel, "The n-factor in natural
 *     landscapes," Arct. Antarct. Alp. Res. 33(2), 140–148, 2001, doi:10.2307/1552214.
 * [5] R. O. van Everdingen (ed.), Multi-language glossary of permafrost and related ground-ice
 *     terms, IPA, 1998 (depth of zero annual amplitude; 0.1 °C threshold from memory).
 * [6] V. E. Romanovsky, T. E. Osterkamp, "Thawing of the active layer on the coastal plain of the
 *     Alaskan Arctic," Permafrost Periglac. Process. 8, 1–22, 1997 (the steady geothermal profile
 *     below the active layer, T(z) = T_top + q ∫ dz / k).
 */
import { DAYS_PER_YEAR, SECONDS_PER_DAY, SPINUP_MAX_YEARS, SPINUP_TOLERANCE_K, TALIK_MIN_THICKNESS_M } from './constants';
import { buildColumnGrid, type ColumnGrid } from './grid';
import { HeatConductionColumn, MIN_SNOW_THICKNESS_M, type ColumnState, type PhaseChangeMaterial, type SnowCover } from './heat-conduction';
import { freezingIndexForWinterCDays, airThawingIndexCDays } from './air-indices';
import { localMonthlyAirTemperatures, preindustrialMonthlyAirTemperatures } from './local-climate';
import { meanPreservingDailyFromMonthly, dailyForYearOfSeries, MONTH_OF_DAY } from './monthly-to-daily';
import { siteRegionalFactors } from './regional-warming';
import type { ScenarioId } from './scenario-forcing';
import { givenColumnDepthM, MIN_COLUMN_DEPTH_M, type Site, type SiteLayer } from './site-schema';
import { layerMaterialAdapter, snowPropertiesAdapter, surfaceNFactorsAdapter, type SurfaceNFactors } from './site-model-adapters';

/** Depths at which envelopes and ground temperatures are reported [m]. */
export const ENVELOPE_DEPTHS_M: readonly number[] = Object.freeze([
  0, 0.1, 0.25, 0.5, 0.75, 1, 1.25, 1.5, 2, 2.5, 3, 4, 5, 6, 8, 10, 12, 15, 20, 25, 30, 40, 50,
]);

/** First and last years of the shared history (CMIP6 convention: historical to 2014). */
export const HISTORY_FIRST_YEAR = 1850;
export const HISTORY_LAST_YEAR = 2014;
/** Scenario used for baseline years after 2014 and to reference the normals (documented choice). */
export const BASELINE_REFERENCE_SCENARIO: ScenarioId = 'SSP2-4.5';
/** Annual-range threshold of the depth of zero annual amplitude [K] ([5], from memory). */
export const ZERO_ANNUAL_AMPLITUDE_RANGE_K = 0.1;

/** A layer of the model column: a schema layer, possibly extended. */
export interface ColumnLayer extends SiteLayer {
  /** True for the last layer when the engine lengthened it to reach the minimum column depth. */
  extended: boolean;
}

/** Surface parameters the calibration may adjust. */
export interface SurfaceParameters {
  /** Thawing n-factor [-]. */
  nThaw: number;
  /** Freezing n-factor [-] (applied only where no snow is modelled). */
  nFreeze: number;
  /** Multiplier of the snow depths [-] (snow case × calibration). */
  snowDepthFactor: number;
  /** Added to every daily snow density [kg m-3] (calibration of snow conductivity). */
  snowDensityShiftKgM3: number;
}

export interface PreparedSite {
  site: Site;
  layers: ColumnLayer[];
  /** Depth the column was extended to [m], or null if the layers given reached it. */
  columnExtendedToM: number | null;
  grid: ColumnGrid;
  materials: PhaseChangeMaterial[];
  /** Freezing point of each layer [°C] (salinity). */
  freezingPointsC: number[];
  regional: { region: string; monthly: number[]; source: string };
  surface: SurfaceNFactors;
  /** Snow-case factor on depths [-]: 1, 1.3, 0.7 or 2 (drifted). */
  snowCaseFactor: number;
  /** Daily snow depth at the site's baseline, before any factor [m], 365 values. */
  baseSnowDepthM: Float64Array;
  /** Daily snow density [kg m-3], 365 values. */
  baseSnowDensityKgM3: Float64Array;
  /** True when snow is modelled (cover not snow-cleared). */
  snowModelled: boolean;
  permafrostCarbonFeedback: boolean;
}

export interface PrepareOptions {
  permafrostCarbonFeedback?: boolean;
}

/** Depth factors of the snow cases (±30 %; drifted: doubled, an illustrative case). */
export const SNOW_CASE_FACTORS = { baseline: 1, plus_30: 1.3, minus_30: 0.7, drifted: 2 } as const;

/**
 * Extends the layers to the minimum column depth by lengthening the last layer given (documented in
 * site-schema.ts and docs/site-schema.md).
 * @param layers Validated layers, thickness [m].
 * @param minDepthM Minimum column depth [m].
 */
export function extendLayers(layers: readonly SiteLayer[], minDepthM = MIN_COLUMN_DEPTH_M): { layers: ColumnLayer[]; extendedToM: number | null } {
  const out: ColumnLayer[] = layers.map((l) => ({ ...l, extended: false }));
  const total = givenColumnDepthM({ layers });
  if (total >= minDepthM) return { layers: out, extendedToM: null };
  const last = out[out.length - 1];
  last.thickness_m += minDepthM - total;
  last.extended = true;
  return { layers: out, extendedToM: minDepthM };
}

/** Daily values from 12 monthly means of a periodic year (mean-preserving, monthly-to-daily.ts). */
function dailyPeriodic(monthly: ArrayLike<number>): Float64Array {
  return meanPreservingDailyFromMonthly(monthly, null, null, new Float64Array(DAYS_PER_YEAR));
}

/**
 * Prepares the column and the fixed parts of the surface forcing of a site.
 * @param site Validated site.
 * @param options Permafrost-carbon feedback of the climate (default off).
 */
export function prepareSite(site: Site, options: PrepareOptions = {}): PreparedSite {
  const { layers, extendedToM } = extendLayers(site.layers);
  const grid = buildColumnGrid(
    layers.map((l) => l.thickness_m),
    GRID_OPTIONS,
  );
  const mats = layers.map((l) => layerMaterialAdapter(l, site.pore_water_salinity_ppt));
  const surface = surfaceNFactorsAdapter(site.surface.cover, site.surface.n_factor_thaw, site.surface.n_factor_freeze);
  const snowDepthMonthly = site.snow.monthly_depth_m;
  const depth = dailyPeriodic(snowDepthMonthly);
  for (let d = 0; d < DAYS_PER_YEAR; d++) {
    const m = MONTH_OF_DAY[d];
    depth[d] = snowDepthMonthly[m] <= 0 ? 0 : Math.max(0, depth[d]);
  }
  const dens = site.snow.density_kg_m3;
  const density = typeof dens === 'number' ? new Float64Array(DAYS_PER_YEAR).fill(dens) : dailyPeriodic(dens);
  return {
    site,
    layers,
    columnExtendedToM: extendedToM,
    grid,
    materials: mats.map((m) => m.material),
    freezingPointsC: mats.map((m) => m.freezingPointC),
    regional: siteRegionalFactors(site.location.latitude_deg, site.location.longitude_deg, site.climate.regional_factors),
    surface,
    snowCaseFactor: SNOW_CASE_FACTORS[site.snow.scenario_case ?? 'baseline'],
    baseSnowDepthM: depth,
    baseSnowDensityKgM3: density,
    snowModelled: !surface.snowCleared,
    permafrostCarbonFeedback: options.permafrostCarbonFeedback === true,
  };
}

/**
 * Grid of the site column: 2 cm at the surface, growing by 12 % a cell to at most 4 m (a choice of
 * this engine, balancing the thaw-front resolution near the surface against speed; the annual wave
 * is damped to a few per cent below ~10 m, Carslaw & Jaeger 1959 §2.6, so the deep cells carry only
 * the slow trend). On the example site this gives 51 cells; against a 161-cell grid (1 cm, 5 %,
 * 0.5 m) the seasonal thaw differed by ≤ 1.5 % and the 12 m temperature by ≤ 0.04 K over 2015–2090
 * under SSP5-8.5 (measured when the grid was chosen).
 */
export const GRID_OPTIONS = { surfaceSpacingM: 0.02, growthFactor: 1.12, maxSpacingM: 4.0 } as const;

/** Default surface parameters of a prepared site (before calibration). */
export function defaultSurfaceParameters(p: PreparedSite): SurfaceParameters {
  return { nThaw: p.surface.nThaw, nFreeze: p.surface.nFreeze, snowDepthFactor: p.snowCaseFactor, snowDensityShiftKgM3: 0 };
}

/** A new solver column for the site (state: 0 °C; call `spinUp` or set a state). */
export function createSiteColumn(p: PreparedSite): HeatConductionColumn {
  const column = new HeatConductionColumn(p.grid, p.materials, { bottomHeatFluxWm2: p.site.bottom_heat_flux_w_m2 });
  column.setReportingDepths(ENVELOPE_DEPTHS_M as number[]);
  return column;
}

/** Per-day snow covers of a year for the given parameters (null: bare). */
export function dailySnowCovers(p: PreparedSite, params: SurfaceParameters): (SnowCover | null)[] {
  const out: (SnowCover | null)[] = [];
  for (let d = 0; d < DAYS_PER_YEAR; d++) {
    const h = p.snowModelled ? p.baseSnowDepthM[d] * params.snowDepthFactor : 0;
    if (h < MIN_SNOW_THICKNESS_M) {
      out.push(null);
      continue;
    }
    // snowPropertiesAdapter clamps the shifted density to Sturm's range.
    const props = snowPropertiesAdapter(p.baseSnowDensityKgM3[d] + params.snowDensityShiftKgM3);
    out.push({ thicknessM: h, conductivityWmK: props.conductivityWmK, heatCapacityJm3K: props.heatCapacityJm3K });
  }
  return out;
}

/**
 * Temperature imposed at the top of the column on one day [°C].
 * @param airC Daily mean air temperature [°C].
 * @param snow Snow of the day or null.
 * @param params n-factors [-].
 * @returns n_t·T_air (thawing) or n_f·T_air (freezing, bare ground only), or T_air on snow [2–4].
 */
export function surfaceTemperatureC(airC: number, snow: SnowCover | null, params: SurfaceParameters, snowModelled: boolean): number {
  if (snow) return airC;
  if (airC > 0) return params.nThaw * airC;
  // Freezing n-factor only where snow is not modelled (snow-cleared covers); vegetated covers use
  // the explicit snow layer instead.
  return snowModelled ? airC : params.nFreeze * airC;
}

/** One year of diagnostics. */
export interface YearRecord {
  year: number;
  airMeanC: number;
  thawingIndexCDays: number;
  freezingIndexCDays: number;
  /**
   * Seasonal thaw [m]: the largest thaw depth from the surface, bounded by the depth the winter
   * froze to (so that, once a talik forms, it is the seasonally frozen and thawed layer above it,
   * shallower than the permafrost table, as the contract describes).
   */
  seasonalThawM: number;
  /** Largest thaw depth from the surface [m] (the contract's thaw depth; reaches through a talik). */
  thawFromSurfaceM: number;
  /** Top of the ground frozen all year [m]; null if the column holds no permafrost. */
  permafrostTableM: number | null;
  /** Deepest thawed depth of the year [m] (the permafrost table, or the column depth). */
  deepestThawM: number;
  /** Talik (two years running) in this year. */
  talik: boolean;
  talikTopM: number | null;
  /** Per ENVELOPE_DEPTHS_M: annual mean, minimum, maximum [°C]. */
  meanC: number[];
  minC: number[];
  maxC: number[];
  /** Newton iterations not converged in the year (solver health). */
  nonConvergedSteps: number;
}

/** What a run carries from one year to the next (also across the history → scenario hand-over). */
export interface RunCarry {
  state: ColumnState;
  /** Per-cell min/max enthalpy of the previous year [J m-3] (talik, two years running). */
  prevMinH: Float64Array | null;
  prevMaxH: Float64Array | null;
  /** Daily air of the previous year [°C] (freezing season of the winter). */
  prevDailyAirC: Float64Array | null;
}

/** Serialisable form of a `RunCarry` (plain arrays; for workers and the directory cache). */
export interface RunCarryJson {
  enthalpyJm3: number[];
  snowTemperatureC: number[];
  snowActive: boolean;
  /** Optional parts of the solver state (heat-conduction.ts `ColumnState`), kept when present. */
  groundSurfaceTemperatureC?: number;
  previousEnthalpyJm3?: number[];
  previousStepS?: number;
  prevMinH: number[] | null;
  prevMaxH: number[] | null;
  prevDailyAirC: number[] | null;
}

export function carryToJson(c: RunCarry): RunCarryJson {
  return {
    enthalpyJm3: Array.from(c.state.enthalpyJm3),
    snowTemperatureC: Array.from(c.state.snowTemperatureC),
    snowActive: c.state.snowActive,
    ...(c.state.groundSurfaceTemperatureC !== undefined ? { groundSurfaceTemperatureC: c.state.groundSurfaceTemperatureC } : {}),
    ...(c.state.previousEnthalpyJm3 !== undefined ? { previousEnthalpyJm3: Array.from(c.state.previousEnthalpyJm3) } : {}),
    ...(c.state.previousStepS !== undefined ? { previousStepS: c.state.previousStepS } : {}),
    prevMinH: c.prevMinH ? Array.from(c.prevMinH) : null,
    prevMaxH: c.prevMaxH ? Array.from(c.prevMaxH) : null,
    prevDailyAirC: c.prevDailyAirC ? Array.from(c.prevDailyAirC) : null,
  };
}

export function carryFromJson(j: RunCarryJson): RunCarry {
  return {
    state: {
      enthalpyJm3: Float64Array.from(j.enthalpyJm3),
      snowTemperatureC: Float64Array.from(j.snowTemperatureC),
      snowActive: j.snowActive,
      ...(j.groundSurfaceTemperatureC !== undefined ? { groundSurfaceTemperatureC: j.groundSurfaceTemperatureC } : {}),
      ...(j.previousEnthalpyJm3 !== undefined ? { previousEnthalpyJm3: Float64Array.from(j.previousEnthalpyJm3) } : {}),
      ...(j.previousStepS !== undefined ? { previousStepS: j.previousStepS } : {}),
    },
    prevMinH: j.prevMinH ? Float64Array.from(j.prevMinH) : null,
    prevMaxH: j.prevMaxH ? Float64Array.from(j.prevMaxH) : null,
    prevDailyAirC: j.prevDailyAirC ? Float64Array.from(j.prevDailyAirC) : null,
  };
}

/** Observed profile to impose at a date during a run. */
export interface ObservedStart {
  year: number;
  /** 0-based day of the 365-day year. */
  dayOfYear: number;
  /** Temperature per cell [°C]. */
  cellTemperatureC: Float64Array;
}

/**
 * Conductivity of a material at a temperature [W m-1 K-1], from its tabulated curve.
 * @param m Material curve (heat-conduction.ts). @param hJm3 Enthalpy [J m-3].
 */
function conductivityAtEnthalpy(m: PhaseChangeMaterial, hJm3: number): number {
  const H = m.enthalpyJm3;
  const K = m.conductivityWmK;
  const n = H.length;
  if (hJm3 <= H[0]) return K[0];
  if (hJm3 >= H[n - 1]) return K[n - 1];
  for (let j = 1; j < n; j++) {
    if (hJm3 <= H[j]) {
      const w = H[j] > H[j - 1] ? (hJm3 - H[j - 1]) / (H[j] - H[j - 1]) : 1;
      return K[j - 1] + w * (K[j] - K[j - 1]);
    }
  }
  return K[n - 1];
}

/**
 * The steady conductive (geothermal) temperature profile below a reference cell [°C per cell]:
 * T_{c+1} = T_c + q (Δz_c / 2k_c + Δz_{c+1} / 2k_{c+1}) [6], with k at each cell's temperature.
 * @param column Solver column (for the material curves).
 * @param topC Temperature of the reference cell [°C]. @param fromCell Reference cell index.
 * @param qWm2 Geothermal heat flux [W m-2]. @param out Per-cell temperatures to fill below fromCell.
 */
function steadyProfileBelow(column: HeatConductionColumn, p: PreparedSite, fromCell: number, topC: number, qWm2: number, out: Float64Array): void {
  const g = p.grid;
  out[fromCell] = topC;
  for (let c = fromCell; c < g.cellCount - 1; c++) {
    const ka = conductivityAtEnthalpy(p.materials[g.layerIndex[c]], column.enthalpyFromTemperature(c, out[c]));
    // k of the next cell evaluated at the temperature it would have with ka (one fixed-point pass).
    let next = out[c] + qWm2 * (g.thicknessM[c] / (2 * ka) + g.thicknessM[c + 1] / (2 * ka));
    const kb = conductivityAtEnthalpy(p.materials[g.layerIndex[c + 1]], column.enthalpyFromTemperature(c + 1, next));
    next = out[c] + qWm2 * (g.thicknessM[c] / (2 * ka) + g.thicknessM[c + 1] / (2 * kb));
    out[c + 1] = next;
  }
}

export interface SpinUpReport {
  years: number;
  converged: boolean;
  /** Largest change of the annual-mean temperature between the last two years [K]. */
  maxChangeK: number;
  acceleratedYears: number;
}

/** Per-cell annual-mean temperature over one year (by stepping) [°C], plus the year's statistics. */
function runCycleYear(
  column: HeatConductionColumn,
  topC: Float64Array,
  snow: (SnowCover | null)[],
  meanCell: Float64Array,
): { maxThawM: number } {
  column.resetStatistics();
  meanCell.fill(0);
  const n = column.cellCount;
  // Spin-up and calibration run this loop for centuries: accumulate in place, no array a day.
  for (let d = 0; d < DAYS_PER_YEAR; d++) {
    column.step(SECONDS_PER_DAY, topC[d], snow[d]);
    column.accumulateTemperatures(meanCell);
  }
  for (let c = 0; c < n; c++) meanCell[c] /= DAYS_PER_YEAR;
  return { maxThawM: column.maxThawDepthM };
}

/**
 * Spin-up to the periodic state under a fixed annual cycle of monthly air temperatures.
 * Start: the steady geothermal profile through an estimated mean surface temperature (unless
 * `warmStart`). Acceleration: after each of the first years the annual-mean profile below the
 * seasonal layer (below 1.5 × the thaw depth, at least 3 m) is moved onto the steady conductive
 * line through the annual mean at that depth [6] (the annual wave is kept, only its mean moves);
 * once that correction is below 0.02 K (after at least 3 such years), plain years run until the annual-mean profile changes by
 * less than 0.01 K a year (SPINUP_TOLERANCE_K), bounded by SPINUP_MAX_YEARS.
 * @param column Solver column (its state is the result). @param p Prepared site.
 * @param params Surface parameters. @param monthlyC 12 monthly air temperatures [°C].
 * @param warmStart Keep the column's current state as the start.
 * @returns Years run, convergence flag and last change [K].
 */
export function spinUp(
  column: HeatConductionColumn,
  p: PreparedSite,
  params: SurfaceParameters,
  monthlyC: ArrayLike<number>,
  warmStart = false,
  maxYears = SPINUP_MAX_YEARS,
): SpinUpReport {
  const air = dailyPeriodic(monthlyC);
  const snow = dailySnowCovers(p, params);
  const top = new Float64Array(DAYS_PER_YEAR);
  for (let d = 0; d < DAYS_PER_YEAR; d++) top[d] = surfaceTemperatureC(air[d], snow[d], params, p.snowModelled);
  const n = column.cellCount;
  const q = p.site.bottom_heat_flux_w_m2;
  const g = p.grid;
  const work = new Float64Array(n);
  if (!warmStart) {
    // Mean surface temperature estimate: the mean imposed top temperature, warmed under snow by the
    // snow cover's insulation (crude; the acceleration corrects it).
    let s = 0;
    for (let d = 0; d < DAYS_PER_YEAR; d++) s += snow[d] ? Math.min(0, top[d] * 0.5) : top[d];
    steadyProfileBelow(column, p, 0, s / DAYS_PER_YEAR, q, work);
    column.setTemperatures(work);
  }
  const mean = new Float64Array(n);
  const prevMean = new Float64Array(n).fill(NaN);
  let accelerating = true;
  let accelerated = 0;
  let years = 0;
  let change = Infinity;
  while (years < maxYears) {
    const { maxThawM } = runCycleYear(column, top, snow, mean);
    years++;
    change = 0;
    for (let c = 0; c < n; c++) change = Math.max(change, Math.abs(mean[c] - prevMean[c]));
    if (Number.isNaN(change)) change = Infinity;
    prevMean.set(mean);
    if (accelerating) {
      const zRef = Math.min(15, Math.max(3, 1.5 * maxThawM));
      let ref = 0;
      while (ref < n - 1 && g.centerDepthM[ref] < zRef) ref++;
      steadyProfileBelow(column, p, ref, mean[ref], q, work);
      let maxShift = 0;
      const t = column.getTemperatures();
      const h = column.getEnthalpy();
      for (let c = ref + 1; c < n; c++) {
        const shift = work[c] - mean[c];
        maxShift = Math.max(maxShift, Math.abs(shift));
        h[c] = column.enthalpyFromTemperature(c, t[c] + shift);
        prevMean[c] += shift;
      }
      column.setEnthalpy(h);
      accelerated++;
      if ((accelerated >= 3 && maxShift < 0.02) || accelerated >= 30) accelerating = false;
      continue;
    }
    if (change < SPINUP_TOLERANCE_K) return { years, converged: true, maxChangeK: change, acceleratedYears: accelerated };
  }
  return { years, converged: false, maxChangeK: Number.isFinite(change) ? change : 999, acceleratedYears: accelerated };
}

/** A monthly series of air temperature, one row of 12 per year, `firstYear` first. */
export interface MonthlySeries {
  firstYear: number;
  monthlyC: Float64Array[];
}

/**
 * Runs the column through consecutive years of a monthly air-temperature series.
 * @param column Solver column, in the state at the start of `fromYear`.
 * @param p Prepared site. @param params Surface parameters.
 * @param series Monthly air temperatures [°C]; must cover fromYear..toYear (neighbours used for
 *   the daily interpolation when present).
 * @param carry Carry-over from the previous year (talik, freezing season); updated in place.
 * @param observed Optional observed profile to impose at its date.
 * @returns One record per year.
 */
export function runYears(
  column: HeatConductionColumn,
  p: PreparedSite,
  params: SurfaceParameters,
  series: MonthlySeries,
  fromYear: number,
  toYear: number,
  carry: RunCarry,
  observed?: ObservedStart | null,
): YearRecord[] {
  const snow = dailySnowCovers(p, params);
  const air = new Float64Array(DAYS_PER_YEAR);
  const records: YearRecord[] = [];
  for (let year = fromYear; year <= toYear; year++) {
    const i = year - series.firstYear;
    if (i < 0 || i >= series.monthlyC.length) throw new RangeError(`runYears: no climate for ${year}`);
    dailyForYearOfSeries(series.monthlyC, i, air);
    column.resetStatistics();
    let airSum = 0;
    for (let d = 0; d < DAYS_PER_YEAR; d++) {
      if (observed && observed.year === year && observed.dayOfYear === d) column.setTemperatures(observed.cellTemperatureC);
      const a = air[d];
      airSum += a;
      column.step(SECONDS_PER_DAY, surfaceTemperatureC(a, snow[d], params, p.snowModelled), snow[d]);
    }
    const st = column.statistics();
    const table = column.permafrostTableM(st.maxEnthalpyJm3);
    let talikTop: number | null = null;
    if (carry.prevMinH && carry.prevMaxH) {
      const minH = st.minEnthalpyJm3.slice();
      const maxH = st.maxEnthalpyJm3.slice();
      for (let c = 0; c < minH.length; c++) {
        if (carry.prevMinH[c] < minH[c]) minH[c] = carry.prevMinH[c];
        if (carry.prevMaxH[c] > maxH[c]) maxH[c] = carry.prevMaxH[c];
      }
      const talik = column.detectTalik(minH, maxH, TALIK_MIN_THICKNESS_M);
      talikTop = talik ? talik.topM : null;
    }
    const freezing = freezingIndexForWinterCDays(carry.prevDailyAirC ?? air, air);
    records.push({
      year,
      airMeanC: airSum / DAYS_PER_YEAR,
      thawingIndexCDays: airThawingIndexCDays(air),
      freezingIndexCDays: freezing,
      seasonalThawM: Math.min(st.maxThawDepthM, seasonalFreezingDepthM(column, p, st.minEnthalpyJm3)),
      thawFromSurfaceM: st.maxThawDepthM,
      permafrostTableM: table,
      deepestThawM: table ?? p.grid.depthM,
      talik: talikTop !== null,
      talikTopM: talikTop,
      meanC: Array.from(st.meanTemperatureC),
      minC: Array.from(st.minTemperatureC),
      maxC: Array.from(st.maxTemperatureC),
      nonConvergedSteps: st.nonConvergedSteps,
    });
    carry.prevMinH = st.minEnthalpyJm3;
    carry.prevMaxH = st.maxEnthalpyJm3;
    carry.prevDailyAirC = air.slice();
  }
  carry.state = column.getState();
  return records;
}

/**
 * Depth the ground froze to from the surface during a period [m]: the top of the shallowest cell
 * whose minimum temperature stayed above its freezing point (never froze); Infinity if every cell
 * froze at some time (the seasonal frost reached the permafrost, or the column is all frozen).
 * @param column Solver column (material curves). @param p Prepared site (freezing points).
 * @param minEnthalpyJm3 Per-cell minimum enthalpy of the period [J m-3].
 */
export function seasonalFreezingDepthM(column: HeatConductionColumn, p: PreparedSite, minEnthalpyJm3: Float64Array): number {
  const g = p.grid;
  for (let c = 0; c < g.cellCount; c++) {
    if (column.temperatureFromEnthalpy(c, minEnthalpyJm3[c]) > p.freezingPointsC[g.layerIndex[c]]) return g.faceDepthM[c];
  }
  return Infinity;
}

/** Observed profile of the site as per-cell temperatures at its date, or null. */
export function observedStart(p: PreparedSite): ObservedStart | null {
  const prof = p.site.observed?.ground_temperature_profile;
  if (!prof) return null;
  const date = new Date(`${prof.date}T00:00:00Z`);
  const year = date.getUTCFullYear();
  const jan1 = Date.UTC(year, 0, 1);
  const dayOfYear = Math.min(DAYS_PER_YEAR - 1, Math.floor((date.getTime() - jan1) / 86_400_000));
  const pts = prof.points;
  const g = p.grid;
  const out = new Float64Array(g.cellCount);
  const last = pts[pts.length - 1];
  // Below the deepest measurement: the steady geothermal gradient with the frozen/thawed
  // conductivity of each layer at the last measured temperature (Romanovsky & Osterkamp 1997 [6]).
  let tBelow = last.temperature_c;
  let zPrev = last.depth_m;
  for (let c = 0; c < g.cellCount; c++) {
    const z = g.centerDepthM[c];
    if (z <= pts[0].depth_m) out[c] = pts[0].temperature_c;
    else if (z <= last.depth_m) {
      let k = 0;
      while (pts[k + 1].depth_m < z) k++;
      const w = (z - pts[k].depth_m) / (pts[k + 1].depth_m - pts[k].depth_m);
      out[c] = pts[k].temperature_c + w * (pts[k + 1].temperature_c - pts[k].temperature_c);
    } else {
      const m = p.materials[g.layerIndex[c]];
      const kWmK = tBelow > m.freezingPointC ? m.conductivityWmK[m.conductivityWmK.length - 1] : m.conductivityWmK[0];
      tBelow += (p.site.bottom_heat_flux_w_m2 * (z - zPrev)) / kWmK;
      zPrev = z;
      out[c] = tBelow;
    }
  }
  return { year, dayOfYear, cellTemperatureC: out };
}

/** Monthly air temperature series for a scenario over [fromYear, toYear] (local-climate.ts). */
export function monthlySeriesFor(p: PreparedSite, scenario: ScenarioId, fromYear: number, toYear: number): MonthlySeries {
  const s = localMonthlyAirTemperatures({
    normalsC: p.site.climate.monthly_air_temperature_c,
    baselinePeriod: p.site.climate.baseline_period as [number, number],
    scenario,
    permafrostCarbonFeedback: p.permafrostCarbonFeedback,
    monthlyFactors: p.regional.monthly,
    fromYear,
    toYear,
    localProjection: localProjectionOf(p.site),
  });
  return { firstYear: fromYear, monthlyC: s.monthlyC };
}

/** The site's local projection in the form local-climate.ts takes (validated by the site schema). */
function localProjectionOf(site: Site): Parameters<typeof localMonthlyAirTemperatures>[0]['localProjection'] {
  return (site.climate.local_projection ?? undefined) as Parameters<typeof localMonthlyAirTemperatures>[0]['localProjection'];
}

/** The site's 1850–1900 monthly climate (local-climate.ts). */
export function preindustrialMonthly(p: PreparedSite): Float64Array {
  return preindustrialMonthlyAirTemperatures({
    normalsC: p.site.climate.monthly_air_temperature_c,
    baselinePeriod: p.site.climate.baseline_period as [number, number],
    scenario: BASELINE_REFERENCE_SCENARIO,
    permafrostCarbonFeedback: p.permafrostCarbonFeedback,
    monthlyFactors: p.regional.monthly,
  });
}

// ---- calibration ---------------------------------------------------------------------------

export type CalibrationStatus = 'uncalibrated' | 'calibrated' | 'calibration_not_reached';

export interface CalibrationReport {
  status: CalibrationStatus;
  /** Observed targets, when given. */
  targets: { active_layer_thickness_m?: number; magt_c?: number; magt_depth_m?: number };
  /** Modelled values over the baseline period after calibration (transient run). */
  achieved: { active_layer_thickness_m?: number; magt_c?: number };
  /** Calibration tolerances (common practice for screening): ALT within 20 %, MAGT within 0.5 °C. */
  tolerance: { active_layer_relative: 0.2; magt_k: 0.5 };
  /** Parameters used, and their allowed ranges. */
  parameters: {
    n_factor_thaw: number;
    n_factor_freeze: number;
    snow_density_shift_kg_m3: number;
    n_factor_thaw_range: [number, number];
    n_factor_freeze_range: [number, number];
    snow_density_range_kg_m3: [number, number];
  };
  /** Which parameter each target moved. */
  adjusted: string[];
  note: string;
}

/**
 * Range of mean snow density the calibration may move the snow into [kg m-3]: 150–450, bulk
 * densities of seasonal snow from taiga to tundra and maritime classes (Sturm, Taras, Liston et al.
 * 2010, "Estimating snow water equivalent using snow depth data and climate classes," J.
 * Hydrometeorol. 11, 1380–1394, doi:10.1175/2010JHM1202.1; range from memory).
 */
export const CALIBRATION_SNOW_DENSITY_RANGE_KG_M3: readonly [number, number] = [150, 450];

/** Interpolates the annual mean at a depth from the envelope depths [°C]. */
export function valueAtDepth(values: ArrayLike<number>, depthM: number): number {
  const z = ENVELOPE_DEPTHS_M;
  if (depthM <= z[0]) return values[0];
  for (let i = 1; i < z.length; i++) {
    if (depthM <= z[i]) {
      const w = (depthM - z[i - 1]) / (z[i] - z[i - 1]);
      return values[i - 1] + w * (values[i] - values[i - 1]);
    }
  }
  return values[z.length - 1];
}

/** Equilibrium ALT [m] and mean temperature at a depth [°C] under the baseline normals. */
function equilibriumResponse(column: HeatConductionColumn, p: PreparedSite, params: SurfaceParameters, magtDepthM: number): { altM: number; magtC: number } {
  spinUp(column, p, params, p.site.climate.monthly_air_temperature_c, true, 80);
  const st = column.statistics();
  return { altM: st.maxThawDepthM, magtC: valueAtDepth(st.meanTemperatureC, magtDepthM) };
}

/** Bisection of a monotone response on [lo, hi] towards a target; returns the parameter. */
function bisect(f: (x: number) => number, lo: number, hi: number, target: number, increasing: boolean, iterations = 8): number {
  let a = lo;
  let b = hi;
  const fa = f(a);
  if (increasing ? fa >= target : fa <= target) return a;
  const fb = f(b);
  if (increasing ? fb <= target : fb >= target) return b;
  for (let i = 0; i < iterations; i++) {
    const m = 0.5 * (a + b);
    const fm = f(m);
    if (increasing ? fm < target : fm > target) a = m;
    else b = m;
  }
  return 0.5 * (a + b);
}

/**
 * Adjusts the thawing n-factor (for an observed ALT) and the winter parameter (for an observed
 * MAGT: the snow density shift, i.e. its Sturm conductivity, where snow is modelled; else the
 * freezing n-factor) within their published ranges, each by bisection of the equilibrium response
 * under the baseline normals. The transient check against the tolerances is done by the caller.
 * @param p Prepared site. @param start Default parameters.
 * @param targets Observed ALT [m] and/or MAGT [°C] at a depth [m].
 * @param offsets Transient-minus-equilibrium differences to correct for (ALT [m], MAGT [K]).
 * @returns Calibrated parameters and the list of adjusted names.
 */
export function calibrateSurface(
  p: PreparedSite,
  start: SurfaceParameters,
  targets: { altM?: number; magtC?: number; magtDepthM?: number },
  offsets: { altM: number; magtK: number } = { altM: 0, magtK: 0 },
): { params: SurfaceParameters; adjusted: string[] } {
  const column = createSiteColumn(p);
  spinUp(column, p, start, p.site.climate.monthly_air_temperature_c);
  const params = { ...start };
  const adjusted: string[] = [];
  const depth = targets.magtDepthM ?? 15;
  const [nt0, nt1] = p.surface.nThawRange;
  const [nf0, nf1] = p.surface.nFreezeRange;
  const meanDensity = p.baseSnowDensityKgM3.reduce((s, v) => s + v, 0) / DAYS_PER_YEAR;
  const [d0, d1] = CALIBRATION_SNOW_DENSITY_RANGE_KG_M3;
  const rounds = targets.altM !== undefined && targets.magtC !== undefined ? 2 : 1;
  for (let r = 0; r < rounds; r++) {
    if (targets.altM !== undefined) {
      const target = targets.altM - offsets.altM;
      params.nThaw = bisect((x) => equilibriumResponse(column, p, { ...params, nThaw: x }, depth).altM, nt0, nt1, target, true);
      if (!adjusted.includes('n_factor_thaw')) adjusted.push('n_factor_thaw');
    }
    if (targets.magtC !== undefined) {
      const target = targets.magtC - offsets.magtK;
      if (p.snowModelled) {
        // Denser snow conducts better (Sturm et al. 1997): colder ground; MAGT falls as density rises.
        const shift = bisect(
          (x) => equilibriumResponse(column, p, { ...params, snowDensityShiftKgM3: x }, depth).magtC,
          d0 - meanDensity,
          d1 - meanDensity,
          target,
          false,
        );
        params.snowDensityShiftKgM3 = shift;
        if (!adjusted.includes('snow_density')) adjusted.push('snow_density');
      } else {
        // A larger freezing n-factor passes more winter cold: MAGT falls as n_f rises.
        params.nFreeze = bisect((x) => equilibriumResponse(column, p, { ...params, nFreeze: x }, depth).magtC, nf0, nf1, target, false);
        if (!adjusted.includes('n_factor_freeze')) adjusted.push('n_factor_freeze');
      }
    }
  }
  return { params, adjusted };
}

// ---- history and scenarios -----------------------------------------------------------------

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
