import { describe, expect, it } from 'vitest';
import { MONTH_LENGTH_DAYS, MONTH_START_DAY, dailyForYearOfSeries, meanPreservingDailyFromMonthly } from './monthly-to-daily';

const normals = [-26.5, -25.5, -21.5, -12.5, -1.0, 10.0, 13.5, 10.5, 3.5, -7.0, -18.5, -23.5];

function monthMeans(daily: Float64Array): number[] {
  return MONTH_LENGTH_DAYS.map((n, m) => {
    let s = 0;
    for (let j = 0; j < n; j++) s += daily[MONTH_START_DAY[m] + j];
    return s / n;
  });
}

describe('mean-preserving monthly → daily interpolation (Rymes & Myers 2001 approach)', () => {
  it('reproduces each monthly mean to 1e-9 (the defining property of a mean-preserving scheme, Rymes & Myers 2001)', () => {
    const cases = [normals, normals.map((v) => v + 3.7), [0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0], [5, -5, 5, -5, 5, -5, 5, -5, 5, -5, 5, -5]];
    for (const m of cases) {
      const d = meanPreservingDailyFromMonthly(m, normals, m);
      monthMeans(d).forEach((v, i) => expect(Math.abs(v - m[i])).toBeLessThan(1e-9));
    }
  });

  it('constant months give a constant year', () => {
    const d = meanPreservingDailyFromMonthly(new Array(12).fill(-4.2));
    for (const v of d) expect(v).toBeCloseTo(-4.2, 12);
  });

  it('a sinusoidal year is recovered within 0.15 °C daily (the annual cycle is smooth; common practice check)', () => {
    // Monthly means of T(t) = -10 + 20 cos(2π (t − 196.5)/365) computed exactly per month.
    const amp = 20;
    const w = (2 * Math.PI) / 365;
    const f = (t: number) => -10 + amp * Math.cos(w * (t - 196.5));
    const m = MONTH_LENGTH_DAYS.map((n, i) => {
      let s = 0;
      for (let j = 0; j < n; j++) s += f(MONTH_START_DAY[i] + j + 0.5);
      return s / n;
    });
    const d = meanPreservingDailyFromMonthly(m);
    for (let day = 0; day < 365; day++) expect(Math.abs(d[day] - f(day + 0.5))).toBeLessThan(0.15);
  });

  it('continuous across 31 December when neighbours are given: the join step is no larger than the largest day-to-day step inside the years', () => {
    const y1 = normals;
    const y2 = normals.map((v, i) => v + (i < 6 ? 4 : 1));
    const d1 = meanPreservingDailyFromMonthly(y1, y1, y2);
    const d2 = meanPreservingDailyFromMonthly(y2, y1, y2);
    let inner = 0;
    for (let i = 1; i < 365; i++) inner = Math.max(inner, Math.abs(d1[i] - d1[i - 1]), Math.abs(d2[i] - d2[i - 1]));
    expect(Math.abs(d2[0] - d1[364])).toBeLessThanOrEqual(inner);
  });

  it('series helper joins neighbours and reuses the buffer', () => {
    const series = [normals, normals.map((v) => v + 1), normals.map((v) => v + 2)];
    const buf = new Float64Array(365);
    const out = dailyForYearOfSeries(series, 1, buf);
    expect(out).toBe(buf);
    monthMeans(out).forEach((v, i) => expect(Math.abs(v - series[1][i])).toBeLessThan(1e-9));
  });

});
