/**
 * Daily values (365-day year) from 12 monthly means, by a mean-preserving interpolation that is
 * continuous across year boundaries when the neighbouring years are given.
 *
 * Scheme (in the spirit of Rymes & Myers 2001 [1]: a smooth interpolant, then a per-interval
 * correction that restores each interval's mean exactly; Epstein 1991 [2] does the same with
 * harmonics for a periodic year, which cannot join different neighbouring years):
 * 1. Knots at mid-month with values v_i = m_i + (2 m_i − m_{i−1} − m_{i+1}) / 6. For a curve
 *    linear between mid-month knots the month mean is about (v_{i−1} + 6 v_i + v_{i+1}) / 8; the
 *    knot shift cancels the first-order loss of the extremes (a local, truncated inverse of that
 *    filter). The curve between knots is linear in time, evaluated at day centres.
 * 2. The remaining difference e_i between m_i and the month's mean of daily values is added as a
 *    half-sine hump, e_i · w_j / mean(w), w_j = sin(π (j + ½) / n_i) over the month's n_i days:
 *    zero-mean-free at the month ends, so the joins stay (near) continuous, and the month mean
 *    becomes m_i to rounding.
 * The knots of December and of the next January depend only on months Oct..Feb, so the curve of
 * year y and that of year y + 1, each built with the other as neighbour, are the same curve across
 * 31 December. Without neighbours the year is treated as periodic.
 *
 * Validity: any finite monthly means; the correction e_i is second order (small) for smooth annual
 * cycles. Speed: a few hundred floating-point operations per day, no allocation with `out` given.
 *
 * References:
 * [1] M. D. Rymes and D. R. Myers, "Mean preserving algorithm for smoothly interpolating averaged
 *     data," Solar Energy 71(4), 225–231, 2001, doi:10.1016/S0038-092X(01)00052-4.
 * [2] E. S. Epstein, "On obtaining daily climatological values from monthly means," J. Climate 4,
 *     365–368, 1991, doi:10.1175/1520-0442(1991)004<0365:OODCVF>2.0.CO;2.
 */
import { DAYS_PER_YEAR } from './constants';

/** Days in each month of the 365-day model year, January first. */
export const MONTH_LENGTH_DAYS: readonly number[] = Object.freeze([31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31]);
/** First day index (0-based) of each month. */
export const MONTH_START_DAY: readonly number[] = Object.freeze(
  MONTH_LENGTH_DAYS.reduce<number[]>((acc, n, i) => (acc.push(i === 0 ? 0 : acc[i - 1] + MONTH_LENGTH_DAYS[i - 1]), acc), []),
);
/** Month (0–11) of each day of the model year. */
export const MONTH_OF_DAY: Int8Array = (() => {
  const a = new Int8Array(DAYS_PER_YEAR);
  for (let m = 0; m < 12; m++) for (let j = 0; j < MONTH_LENGTH_DAYS[m]; j++) a[MONTH_START_DAY[m] + j] = m;
  return a;
})();

// Static tables: for day d, the knot on its left (index 0..13 for months −1..12) and the weight of
// the right knot; the normalised hump weight of the day within its month.
const LEFT_KNOT = new Int8Array(DAYS_PER_YEAR);
const RIGHT_WEIGHT = new Float64Array(DAYS_PER_YEAR);
const HUMP = new Float64Array(DAYS_PER_YEAR);
(() => {
  const knotTime = new Float64Array(14);
  knotTime[0] = -MONTH_LENGTH_DAYS[11] / 2;
  for (let m = 0; m < 12; m++) knotTime[m + 1] = MONTH_START_DAY[m] + MONTH_LENGTH_DAYS[m] / 2;
  knotTime[13] = DAYS_PER_YEAR + MONTH_LENGTH_DAYS[0] / 2;
  for (let d = 0; d < DAYS_PER_YEAR; d++) {
    const t = d + 0.5;
    let k = 0;
    while (knotTime[k + 1] < t) k++;
    LEFT_KNOT[d] = k;
    RIGHT_WEIGHT[d] = (t - knotTime[k]) / (knotTime[k + 1] - knotTime[k]);
  }
  for (let m = 0; m < 12; m++) {
    const n = MONTH_LENGTH_DAYS[m];
    let sum = 0;
    for (let j = 0; j < n; j++) sum += Math.sin((Math.PI * (j + 0.5)) / n);
    for (let j = 0; j < n; j++) HUMP[MONTH_START_DAY[m] + j] = Math.sin((Math.PI * (j + 0.5)) / n) / (sum / n);
  }
})();

// Scratch buffers (the function is synchronous and not re-entrant, so sharing is safe).
const EXT = new Float64Array(16);
const KNOTS = new Float64Array(14);

/**
 * Mean-preserving daily values from monthly means (the scheme above).
 * @param monthly 12 monthly means of the year, January first [any unit, e.g. °C].
 * @param previousYear 12 monthly means of the year before, or null/undefined (periodic year).
 * @param nextYear 12 monthly means of the year after, or null/undefined (periodic year).
 * @param out Optional output buffer of 365 values (reused to avoid allocation).
 * @returns 365 daily values whose mean over each month equals that month's mean (to rounding).
 */
export function meanPreservingDailyFromMonthly(
  monthly: ArrayLike<number>,
  previousYear?: ArrayLike<number> | null,
  nextYear?: ArrayLike<number> | null,
  out: Float64Array = new Float64Array(DAYS_PER_YEAR),
): Float64Array {
  const prev = previousYear ?? monthly;
  const next = nextYear ?? monthly;
  // EXT[k] is the mean of month k − 2 (k = 0: previous November ... k = 15: next February).
  EXT[0] = prev[10];
  EXT[1] = prev[11];
  for (let m = 0; m < 12; m++) EXT[m + 2] = monthly[m];
  EXT[14] = next[0];
  EXT[15] = next[1];
  for (let j = 0; j < 14; j++) {
    const c = EXT[j + 1];
    KNOTS[j] = c + (2 * c - EXT[j] - EXT[j + 2]) / 6;
  }
  for (let d = 0; d < DAYS_PER_YEAR; d++) {
    const k = LEFT_KNOT[d];
    const w = RIGHT_WEIGHT[d];
    out[d] = KNOTS[k] + w * (KNOTS[k + 1] - KNOTS[k]);
  }
  for (let m = 0; m < 12; m++) {
    const start = MONTH_START_DAY[m];
    const n = MONTH_LENGTH_DAYS[m];
    let sum = 0;
    for (let j = 0; j < n; j++) sum += out[start + j];
    const e = monthly[m] - sum / n;
    for (let j = 0; j < n; j++) out[start + j] += e * HUMP[start + j];
  }
  return out;
}

/**
 * Daily values of year `index` of a monthly series, joined to its neighbours (periodic at the ends).
 * @param monthlyByYear Monthly means per year (each 12 values, January first).
 * @param index Year index into `monthlyByYear`.
 * @param out Optional 365-value buffer.
 */
export function dailyForYearOfSeries(monthlyByYear: ReadonlyArray<ArrayLike<number>>, index: number, out?: Float64Array): Float64Array {
  const prev = index > 0 ? monthlyByYear[index - 1] : null;
  const next = index + 1 < monthlyByYear.length ? monthlyByYear[index + 1] : null;
  return meanPreservingDailyFromMonthly(monthlyByYear[index], prev, next, out);
}
