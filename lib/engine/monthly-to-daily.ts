/**
 * Daily values (365-day year) from 12 monthly means, by a mean-preserving interpolation that is
 * continuous across year boundaries when the neighbouring years are given.
 *
 * Scheme (in the spirit of Rymes & Myers 2001 [1]: a smooth interpolant, then a per-interval
 * correction that restores each interval's mean exactly; Epstein 1991 [2] does the same with
 * harmonics for a periodic year, which cannot join different neighbouring years):
 * 1. Knots at mid-month with values v_i = m_i + (2 m_i − m_{i−1} − m_{i+1}) / 24: for a smooth
 *    curve the mean over a month of length h is about its mid-month value + h² f''/24, so the knot
 *    shift cancels that first-order loss of the extremes. Between knots a cubic Hermite curve with
 *    centred-difference slopes (Catmull–Rom type on the non-uniform mid-month times), evaluated at
 *    day centres.
 * 2. The remaining difference e_i between m_i and the month's mean of daily values is added as a
 *    half-sine hump, e_i · w_j / mean(w), w_j = sin(π (j + ½) / n_i) over the month's n_i days:
 *    it nearly vanishes at the month ends, so the joins stay (near) continuous, and the month mean
 *    becomes m_i to rounding.
 * The curve around 31 December depends only on months October..March, so the curve of year y and
 * that of year y + 1, each built with the other as neighbour, are the same curve across the join
 * (up to the two months' small humps). Without neighbours the year is treated as periodic.
 *
 * Validity: any finite monthly means; the correction e_i is second order (small) for smooth annual
 * cycles. Speed: a few hundred floating-point operations per day, no allocation with `out` given.
 *
 * References (DOIs from memory except those given in the engine issue):
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

// Static tables: knots at mid-month of months −2..13 (knot index k = month + 2). For day d, the
// knot on its left and the four cubic Hermite basis weights on knots k−1, k, k+1, k+2 (slopes by
// centred differences on the non-uniform knot times); the normalised hump weight of the day.
const KNOT_COUNT = 16;
const LEFT_KNOT = new Int8Array(DAYS_PER_YEAR);
const BASIS = new Float64Array(4 * DAYS_PER_YEAR);
const HUMP = new Float64Array(DAYS_PER_YEAR);
(() => {
  const knotTime = new Float64Array(KNOT_COUNT);
  const monthMid = (m: number) => {
    const mm = ((m % 12) + 12) % 12;
    const shift = m < 0 ? -DAYS_PER_YEAR : m > 11 ? DAYS_PER_YEAR : 0;
    return MONTH_START_DAY[mm] + MONTH_LENGTH_DAYS[mm] / 2 + shift;
  };
  for (let k = 0; k < KNOT_COUNT; k++) knotTime[k] = monthMid(k - 2);
  for (let d = 0; d < DAYS_PER_YEAR; d++) {
    const t = d + 0.5;
    let k = 1;
    while (knotTime[k + 1] < t) k++;
    LEFT_KNOT[d] = k;
    const t0 = knotTime[k];
    const t1 = knotTime[k + 1];
    const h = t1 - t0;
    const s = (t - t0) / h;
    const h00 = 2 * s ** 3 - 3 * s ** 2 + 1;
    const h10 = s ** 3 - 2 * s ** 2 + s;
    const h01 = -2 * s ** 3 + 3 * s ** 2;
    const h11 = s ** 3 - s ** 2;
    // Slopes m_k = (v_{k+1} − v_{k−1}) / (t_{k+1} − t_{k−1}), written as weights on the knot values.
    const a = h / (knotTime[k + 1] - knotTime[k - 1]);
    const b = h / (knotTime[k + 2] - knotTime[k]);
    BASIS[4 * d] = -h10 * a;
    BASIS[4 * d + 1] = h00 - h11 * b;
    BASIS[4 * d + 2] = h01 + h10 * a;
    BASIS[4 * d + 3] = h11 * b;
  }
  for (let m = 0; m < 12; m++) {
    const n = MONTH_LENGTH_DAYS[m];
    let sum = 0;
    for (let j = 0; j < n; j++) sum += Math.sin((Math.PI * (j + 0.5)) / n);
    for (let j = 0; j < n; j++) HUMP[MONTH_START_DAY[m] + j] = Math.sin((Math.PI * (j + 0.5)) / n) / (sum / n);
  }
})();

// Scratch buffers (the function is synchronous and not re-entrant, so sharing is safe).
const EXT = new Float64Array(KNOT_COUNT + 2);
const KNOTS = new Float64Array(KNOT_COUNT);

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
  // EXT[j] is the mean of month j − 3 (j = 0: previous October ... j = 17: next March).
  EXT[0] = prev[9];
  EXT[1] = prev[10];
  EXT[2] = prev[11];
  for (let m = 0; m < 12; m++) EXT[m + 3] = monthly[m];
  EXT[15] = next[0];
  EXT[16] = next[1];
  EXT[17] = next[2];
  for (let k = 0; k < KNOT_COUNT; k++) {
    const c = EXT[k + 1];
    KNOTS[k] = c + (2 * c - EXT[k] - EXT[k + 2]) / 24;
  }
  for (let d = 0; d < DAYS_PER_YEAR; d++) {
    const k = LEFT_KNOT[d];
    const i = 4 * d;
    out[d] = BASIS[i] * KNOTS[k - 1] + BASIS[i + 1] * KNOTS[k] + BASIS[i + 2] * KNOTS[k + 1] + BASIS[i + 3] * KNOTS[k + 2];
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
