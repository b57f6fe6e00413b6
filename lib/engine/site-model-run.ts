/**
 * Site model, the yearly run: one `YearRecord` of diagnostics per 365-day year (definitions in
 * site-model.ts), the carry-over between years (`RunCarry`, with its JSON form for the cache), the
 * observed start, and the seasonal freezing depth.
 *
 * API: `runYears(column, prepared, params, series, fromYear, toYear, carry, observed?)` →
 * `YearRecord[]`; `carryToJson` / `carryFromJson`; `observedStart(prepared)`;
 * `seasonalFreezingDepthM(column, prepared, minEnthalpyJm3)`.
 */
import { DAYS_PER_YEAR, SECONDS_PER_DAY, TALIK_MIN_THICKNESS_M } from './constants';
import { HeatConductionColumn, type ColumnState } from './heat-conduction';
import { freezingIndexForWinterCDays, airThawingIndexCDays } from './air-indices';
import { dailyForYearOfSeries } from './monthly-to-daily';
import type { PreparedSite, SurfaceParameters } from './site-model-preparation';
import { dailySnowCovers, surfaceTemperatureC, type MonthlySeries } from './site-model-forcing';

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
