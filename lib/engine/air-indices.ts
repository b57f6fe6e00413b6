/**
 * Air thawing and freezing indices [°C·days] and their design values.
 *
 * Definitions (common practice; UFC 3-130-06 [1], formerly TM 5-852-6; Andersland & Ladanyi [2]):
 * - thawing index of a year: the sum over its days of the daily mean air temperature above 0 °C;
 * - freezing index: the sum of the daily mean below 0 °C, as a positive number. Here it is given per
 *   calendar year (`airIndicesForYear`) and per freezing season 1 July – 30 June
 *   (`freezingIndexForWinterCDays`), since a northern winter spans the new year. The handbooks read
 *   the index from the cumulative degree-day curve between its extreme points, which nets out brief
 *   thaws inside the season; the sums here do not net them (common practice for daily series).
 * - design thawing (freezing) index: the warmest summer (coldest winter) in 30 years, or the mean of
 *   the three warmest summers (coldest winters) in the latest 30 years [1].
 *
 * Windows shorter than 30 years (the engine's horizons are 20-year windows): the design values of a
 * window are taken over the 30 years ending with the window's last year when the series holds them
 * all (the "latest 30 years" as of the end of the window); otherwise over the years the series holds
 * from (window end − 29) to the window end, never fewer than the window itself; the number of years
 * used is reported. With fewer than three years the "mean of the three" is the mean of those present.
 *
 * References:
 * [1] UFC 3-130-06, "Calculation methods for determination of depths of freeze and thaw in soils,"
 *     U.S. Dept. of Defense, 2004 (formerly TM 5-852-6 / AFR 88-19 vol. 6, 1988).
 * [2] O. B. Andersland and B. Ladanyi, Frozen Ground Engineering, 2nd ed., Wiley, 2004, ch. 3.
 */
import { DAYS_PER_YEAR } from './constants';
import { meanPreservingDailyFromMonthly } from './monthly-to-daily';
import { EngineInputError } from './validation';

/** Index of 1 July in the 365-day model year (0-based). */
export const JULY_FIRST_DAY = 181;

/**
 * Thawing index [°C·d]: sum of daily mean air temperatures above 0 °C over days [from, to).
 * @param dailyC Daily means [°C].
 */
export function airThawingIndexCDays(dailyC: ArrayLike<number>, from = 0, to = dailyC.length): number {
  let s = 0;
  for (let d = from; d < to; d++) if (dailyC[d] > 0) s += dailyC[d];
  return s;
}

/**
 * Freezing index [°C·d], positive: minus the sum of daily means below 0 °C over days [from, to).
 * @param dailyC Daily means [°C].
 */
export function airFreezingIndexCDays(dailyC: ArrayLike<number>, from = 0, to = dailyC.length): number {
  let s = 0;
  for (let d = from; d < to; d++) if (dailyC[d] < 0) s -= dailyC[d];
  return s;
}

/** Both indices [°C·d] of one calendar year of 365 daily means [°C]. */
export function airIndicesForYear(dailyC: ArrayLike<number>): { thawingIndexCDays: number; freezingIndexCDays: number } {
  if (dailyC.length !== DAYS_PER_YEAR) throw new EngineInputError('daily_c', `needs ${DAYS_PER_YEAR} daily values, got ${dailyC.length}`);
  return { thawingIndexCDays: airThawingIndexCDays(dailyC), freezingIndexCDays: airFreezingIndexCDays(dailyC) };
}

/**
 * Freezing index [°C·d] of the freezing season 1 July of the previous year to 30 June of this year.
 * @param previousYearDailyC 365 daily means [°C] of the previous year.
 * @param thisYearDailyC 365 daily means [°C] of this year.
 */
export function freezingIndexForWinterCDays(previousYearDailyC: ArrayLike<number>, thisYearDailyC: ArrayLike<number>): number {
  return airFreezingIndexCDays(previousYearDailyC, JULY_FIRST_DAY, DAYS_PER_YEAR) + airFreezingIndexCDays(thisYearDailyC, 0, JULY_FIRST_DAY);
}

/** Years of the design period of cold-regions practice [1]. */
export const DESIGN_PERIOD_YEARS = 30;

export interface AirIndexWindowSummary {
  window: [number, number];
  meanThawingIndexCDays: number;
  meanFreezingIndexCDays: number;
  /** Inclusive years over which the design values were taken. */
  designPeriod: [number, number];
  designYearsUsed: number;
  /** Warmest summer in the design period [°C·d]. */
  warmestThawingIndexCDays: number;
  /** Mean of the three warmest summers [°C·d]. */
  designThawingIndexCDays: number;
  /** Coldest winter in the design period [°C·d]. */
  coldestFreezingIndexCDays: number;
  /** Mean of the three coldest winters [°C·d]. */
  designFreezingIndexCDays: number;
}

function meanOfLargest(values: number[], k: number): number {
  const sorted = [...values].sort((a, b) => b - a);
  const n = Math.min(k, sorted.length);
  let s = 0;
  for (let i = 0; i < n; i++) s += sorted[i];
  return s / n;
}

/**
 * Window mean and design values of annual air indices (see the file comment for short windows).
 * @param series `years` (consecutive, increasing), `thawingIndexCDays`, `freezingIndexCDays` per year.
 * @param window Inclusive [first, last] years, inside the series.
 * @param designPeriodYears Length of the design period [yr], default 30.
 */
export function summarizeAirIndices(
  series: { years: ArrayLike<number>; thawingIndexCDays: ArrayLike<number>; freezingIndexCDays: ArrayLike<number> },
  window: readonly [number, number],
  designPeriodYears = DESIGN_PERIOD_YEARS,
): AirIndexWindowSummary {
  const y0 = series.years[0];
  const n = series.years.length;
  const [w0, w1] = window;
  if (!(w0 <= w1) || w0 < y0 || w1 > y0 + n - 1) {
    throw new EngineInputError('window', `must lie within ${y0}–${y0 + n - 1}, first <= last`);
  }
  let st = 0;
  let sf = 0;
  for (let y = w0; y <= w1; y++) {
    st += series.thawingIndexCDays[y - y0];
    sf += series.freezingIndexCDays[y - y0];
  }
  const d0 = Math.max(y0, Math.min(w0, w1 - designPeriodYears + 1));
  const thaw: number[] = [];
  const freeze: number[] = [];
  for (let y = d0; y <= w1; y++) {
    thaw.push(series.thawingIndexCDays[y - y0]);
    freeze.push(series.freezingIndexCDays[y - y0]);
  }
  return {
    window: [w0, w1],
    meanThawingIndexCDays: st / (w1 - w0 + 1),
    meanFreezingIndexCDays: sf / (w1 - w0 + 1),
    designPeriod: [d0, w1],
    designYearsUsed: w1 - d0 + 1,
    warmestThawingIndexCDays: Math.max(...thaw),
    designThawingIndexCDays: meanOfLargest(thaw, 3),
    coldestFreezingIndexCDays: Math.max(...freeze),
    designFreezingIndexCDays: meanOfLargest(freeze, 3),
  };
}

/**
 * Annual air indices [°C·d] of a monthly series, through the mean-preserving daily interpolation
 * (monthly-to-daily.ts), each year joined to its neighbours.
 * @param series `years` and `monthlyC` (12 monthly means [°C] per year, January first), as returned
 *   by `localMonthlyAirTemperatures`.
 * @returns Per year: `thawingIndexCDays` and `freezingIndexCDays` (calendar year), and
 *   `winterFreezingIndexCDays` (1 July of the year before to 30 June; the first year's uses its own
 *   second half-year as the previous one).
 */
export function annualAirIndicesFromMonthly(series: { years: ArrayLike<number>; monthlyC: ReadonlyArray<ArrayLike<number>> }): {
  years: number[];
  thawingIndexCDays: Float64Array;
  freezingIndexCDays: Float64Array;
  winterFreezingIndexCDays: Float64Array;
} {
  const n = series.monthlyC.length;
  const thaw = new Float64Array(n);
  const freeze = new Float64Array(n);
  const winter = new Float64Array(n);
  let prevDaily = new Float64Array(DAYS_PER_YEAR);
  let daily = new Float64Array(DAYS_PER_YEAR);
  for (let i = 0; i < n; i++) {
    meanPreservingDailyFromMonthly(series.monthlyC[i], i > 0 ? series.monthlyC[i - 1] : null, i + 1 < n ? series.monthlyC[i + 1] : null, daily);
    thaw[i] = airThawingIndexCDays(daily);
    freeze[i] = airFreezingIndexCDays(daily);
    winter[i] = freezingIndexForWinterCDays(i > 0 ? prevDaily : daily, daily);
    const t = prevDaily;
    prevDaily = daily;
    daily = t;
  }
  return { years: Array.from(series.years), thawingIndexCDays: thaw, freezingIndexCDays: freeze, winterFreezingIndexCDays: winter };
}
