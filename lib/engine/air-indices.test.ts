import { describe, expect, it } from 'vitest';
import {
  airFreezingIndexCDays,
  airIndicesForYear,
  airThawingIndexCDays,
  annualAirIndicesFromMonthly,
  freezingIndexForWinterCDays,
  summarizeAirIndices,
} from './air-indices';

describe('air thawing and freezing indices', () => {
  it('sums degree-days above / below 0 °C (definition, UFC 3-130-06; common practice)', () => {
    const daily = new Float64Array(365);
    for (let d = 0; d < 365; d++) daily[d] = d < 100 ? -10 : d < 200 ? 5 : -2;
    const { thawingIndexCDays, freezingIndexCDays } = airIndicesForYear(daily);
    expect(thawingIndexCDays).toBe(500);
    expect(freezingIndexCDays).toBe(1000 + 165 * 2);
    expect(airThawingIndexCDays([1, -1, 2])).toBe(3);
    expect(airFreezingIndexCDays([1, -1, 2, -0.5])).toBe(1.5);
  });

  it('freezing season 1 July – 30 June spans the new year', () => {
    const a = new Float64Array(365).fill(-1);
    const b = new Float64Array(365).fill(-2);
    expect(freezingIndexForWinterCDays(a, b)).toBe(184 * 1 + 181 * 2);
  });

  it('design values on a hand-made 30-year series (UFC 3-130-06: warmest/coldest in 30, mean of the three warmest/coldest)', () => {
    // Thawing index 1000 + 10·k for k = 0..29 except three hand-placed warm summers; freezing
    // index 3000 − 20·k except three hand-placed cold winters.
    const years = Array.from({ length: 30 }, (_, k) => 1991 + k);
    const thaw = years.map((_, k) => 1000 + 10 * k);
    const freeze = years.map((_, k) => 3000 - 20 * k);
    thaw[4] = 1800; // 1995
    thaw[17] = 1700; // 2008
    thaw[25] = 1600; // 2016
    freeze[2] = 4200; // 1993
    freeze[10] = 4000; // 2001
    freeze[28] = 3900; // 2019
    const s = summarizeAirIndices({ years, thawingIndexCDays: thaw, freezingIndexCDays: freeze }, [1991, 2020]);
    expect(s.designPeriod).toEqual([1991, 2020]);
    expect(s.designYearsUsed).toBe(30);
    expect(s.warmestThawingIndexCDays).toBe(1800);
    expect(s.designThawingIndexCDays).toBeCloseTo((1800 + 1700 + 1600) / 3, 12);
    expect(s.coldestFreezingIndexCDays).toBe(4200);
    expect(s.designFreezingIndexCDays).toBeCloseTo((4200 + 4000 + 3900) / 3, 12);
    const meanThaw = thaw.reduce((a, b) => a + b, 0) / 30;
    expect(s.meanThawingIndexCDays).toBeCloseTo(meanThaw, 12);
  });

  it('a 20-year window takes its design values over the 30 years ending with it when the series has them', () => {
    const years = Array.from({ length: 60 }, (_, k) => 2001 + k);
    const thaw = years.map((y) => (y === 2032 ? 5000 : 1000));
    const freeze = years.map(() => 2000);
    const s = summarizeAirIndices({ years, thawingIndexCDays: thaw, freezingIndexCDays: freeze }, [2041, 2060]);
    expect(s.designPeriod).toEqual([2031, 2060]);
    expect(s.warmestThawingIndexCDays).toBe(5000); // 2032 is in the 30 years, not the 20-year window
    expect(s.meanThawingIndexCDays).toBe(1000);
    const short = summarizeAirIndices({ years: years.slice(35), thawingIndexCDays: thaw.slice(35), freezingIndexCDays: freeze.slice(35) }, [2041, 2060]);
    // The series starts in 2036: the design period is what it holds from 2031 on, i.e. 2036–2060.
    expect(short.designPeriod).toEqual([2036, 2060]);
    expect(short.designYearsUsed).toBe(25);
    const only = summarizeAirIndices({ years: years.slice(40), thawingIndexCDays: thaw.slice(40), freezingIndexCDays: freeze.slice(40) }, [2041, 2060]);
    expect(only.designPeriod).toEqual([2041, 2060]);
    expect(only.designYearsUsed).toBe(20);
  });

  it('refuses a window outside the series', () => {
    expect(() => summarizeAirIndices({ years: [2000, 2001], thawingIndexCDays: [1, 2], freezingIndexCDays: [1, 2] }, [1999, 2001])).toThrow();
  });

  it('from monthly means: months entirely above or below 0 °C contribute exactly their mean × days (mean preservation)', () => {
    // Months far from 0 °C: the daily curve stays on one side, so the index is Σ mean × days exactly.
    const m = [-30, -28, -22, -12, -5, 8, 14, 10, 4, -6, -18, -26];
    const r = annualAirIndicesFromMonthly({ years: [2000, 2001, 2002], monthlyC: [m, m, m] });
    const days = [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];
    const ti = m.reduce((s, v, i) => s + (v > 0 ? v * days[i] : 0), 0);
    const fi = -m.reduce((s, v, i) => s + (v < 0 ? v * days[i] : 0), 0);
    // The May/June and September/October crossings smear a little across 0 °C: both indices gain
    // the same amount (TI − FI equals Σ mean × days exactly), so compare the difference exactly.
    expect(r.thawingIndexCDays[1] - r.freezingIndexCDays[1]).toBeCloseTo(ti - fi, 8);
    expect(r.thawingIndexCDays[1]).toBeGreaterThanOrEqual(ti - 1e-9);
    expect(r.thawingIndexCDays[1] - ti).toBeLessThan(0.05 * ti);
    expect(r.winterFreezingIndexCDays[1]).toBeCloseTo(r.freezingIndexCDays[1], 8);
  });
});

