import { describe, expect, it } from 'vitest';
import { globalWarmingMean, globalWarmingSeries } from './global-warming';
import {
  localMonthlyAirTemperatures,
  localMonthlyChangeC,
  localProjectionSchema,
  mulberry32,
  preindustrialMonthlyAirTemperatures,
  type LocalClimateInput,
} from './local-climate';
import { formatIssues } from './validation';
import { regionalFactorsFor } from './regional-warming';

const normalsC = [-26.5, -25.5, -21.5, -12.5, -1.0, 10.0, 13.5, 10.5, 3.5, -7.0, -18.5, -23.5];
const monthlyFactors = regionalFactorsFor(68.36, -133.72).monthly;
const base: LocalClimateInput = {
  normalsC,
  baselinePeriod: [1991, 2020],
  scenario: 'SSP2-4.5',
  monthlyFactors,
  fromYear: 1850,
  toYear: 2100,
};

function meanOverYears(series: { years: number[]; monthlyC: Float64Array[] }, a: number, b: number, m: number): number {
  let s = 0;
  for (let y = a; y <= b; y++) s += series.monthlyC[y - series.years[0]][m];
  return s / (b - a + 1);
}

describe('local monthly air temperature', () => {
  it('reproduces the normals over their own baseline period (definition of the reference)', () => {
    const s = localMonthlyAirTemperatures(base);
    expect(s.years[0]).toBe(1850);
    expect(s.monthlyC).toHaveLength(251);
    for (let m = 0; m < 12; m++) expect(meanOverYears(s, 1991, 2020, m)).toBeCloseTo(normalsC[m], 10);
  });

  it('change = monthly factor × (global warming − its baseline-period mean)', () => {
    const s = localMonthlyChangeC(base);
    const g = globalWarmingSeries('SSP2-4.5').global_warming_c;
    const gb = globalWarmingMean('SSP2-4.5', 1991, 2020);
    for (const y of [1850, 1950, 2050, 2100]) {
      for (let m = 0; m < 12; m++) expect(s.monthlyC[y - 1850][m]).toBeCloseTo(monthlyFactors[m] * (g[y - 1850] - gb), 12);
    }
    // Winter warms more than summer (AR6 Atlas, see regional-warming.ts).
    const row = s.monthlyC[2100 - 1850];
    expect(row[0]).toBeGreaterThan(row[6]);
  });

  it('the 1850–1900 spin-up climate is the mean of the series over 1850–1900', () => {
    const pre = preindustrialMonthlyAirTemperatures(base);
    const s = localMonthlyAirTemperatures(base);
    for (let m = 0; m < 12; m++) expect(meanOverYears(s, 1850, 1900, m)).toBeCloseTo(pre[m], 10);
    // Colder than the normals: the baseline 1991–2020 is about 0.9 °C above 1850–1900 globally (AR6 WG1 ch. 2; from memory).
    for (let m = 0; m < 12; m++) expect(pre[m]).toBeLessThan(normalsC[m]);
  });

  it('local projection with the same baseline replaces the emulator where it has years, linear between them', () => {
    const localProjection = localProjectionSchema.parse({
      baseline_period: [1991, 2020],
      series: [
        { year: 2030, annual_change_c: 1 },
        { year: 2050, monthly_change_c: [4, 4, 3, 2, 1, 1, 1, 1, 1, 2, 3, 4] },
      ],
    });
    const s = localMonthlyChangeC({ ...base, localProjection });
    const emu = localMonthlyChangeC(base);
    expect(s.monthlyC[2030 - 1850][5]).toBe(1);
    expect(s.monthlyC[2040 - 1850][0]).toBeCloseTo(2.5, 12);
    expect(s.monthlyC[2050 - 1850][0]).toBe(4);
    expect(s.monthlyC[2029 - 1850][3]).toBe(emu.monthlyC[2029 - 1850][3]);
    expect(s.monthlyC[2051 - 1850][3]).toBe(emu.monthlyC[2051 - 1850][3]);
  });

  it('re-references a projection to the normals baseline: by its own mean over that baseline when it covers it', () => {
    const series = [];
    for (let y = 1981; y <= 2100; y++) series.push({ year: y, annual_change_c: 0.03 * (y - 1995.5) });
    const localProjection = localProjectionSchema.parse({ baseline_period: [1986, 2005], series });
    const s = localMonthlyChangeC({ ...base, localProjection });
    for (let m = 0; m < 12; m++) expect(meanOverYears(s, 1991, 2020, m)).toBeCloseTo(0, 10);
  });

  it('re-references by the emulator difference between the baselines when the projection does not cover the normals baseline', () => {
    const localProjection = localProjectionSchema.parse({
      baseline_period: [1986, 2005],
      series: [
        { year: 2021, annual_change_c: 1.5 },
        { year: 2100, annual_change_c: 5 },
      ],
    });
    const s = localMonthlyChangeC({ ...base, localProjection });
    const shift = (m: number) => monthlyFactors[m] * (globalWarmingMean('SSP2-4.5', 1991, 2020) - globalWarmingMean('SSP2-4.5', 1986, 2005));
    for (let m = 0; m < 12; m++) expect(s.monthlyC[2021 - 1850][m]).toBeCloseTo(1.5 - shift(m), 12);
  });

  it('projection schema: clear messages naming the field', () => {
    const bad = localProjectionSchema.safeParse({
      baseline_period: [1991, 2020],
      series: [
        { year: 2050, monthly_change_c: [1, 2] },
        { year: 2040, annual_change_c: 1 },
        { year: 2060, annual_change_c: 1, monthly_change_c: new Array(12).fill(1) },
      ],
    });
    expect(bad.success).toBe(false);
    const lines = formatIssues(bad.error!);
    expect(lines).toContain('series[0].monthly_change_c: needs 12 monthly values, got 2');
    expect(lines).toContain('series[1].year: years must be strictly increasing');
    expect(lines).toContain('series[2]: give exactly one of annual_change_c or monthly_change_c');
    expect(localProjectionSchema.safeParse({ baseline_period: [1991, 2020], series: [{ year: 2050, change: 1 }] }).success).toBe(false);
  });

  it('seeded interannual variability: off by default, reproducible with a seed, the requested sd (common practice)', () => {
    const plain = localMonthlyChangeC(base);
    const a = localMonthlyChangeC({ ...base, variability: { seed: 42, sdC: 1.5 } });
    const b = localMonthlyChangeC({ ...base, variability: { seed: 42, sdC: 1.5 } });
    const c = localMonthlyChangeC({ ...base, variability: { seed: 43, sdC: 1.5 } });
    expect(a.monthlyC[100]).toEqual(b.monthlyC[100]);
    expect(a.monthlyC[100]).not.toEqual(c.monthlyC[100]);
    let s = 0;
    let s2 = 0;
    let n = 0;
    a.monthlyC.forEach((row, i) => {
      for (let m = 0; m < 12; m++) {
        const e = row[m] - plain.monthlyC[i][m];
        s += e;
        s2 += e * e;
        n++;
      }
    });
    const mean = s / n;
    const sd = Math.sqrt(s2 / n - mean * mean);
    // n = 3012: the sample sd is within about ±4 % (3 standard errors) of 1.5.
    expect(Math.abs(sd - 1.5)).toBeLessThan(0.06);
    expect(Math.abs(mean)).toBeLessThan(0.1);
    const u = mulberry32(1);
    for (let i = 0; i < 1000; i++) {
      const v = u();
      expect(v).toBeGreaterThanOrEqual(0);
      expect(v).toBeLessThan(1);
    }
  });

  it('refuses bad arrays and periods with a field name', () => {
    expect(() => localMonthlyAirTemperatures({ ...base, normalsC: [1, 2, 3] })).toThrow(/normalsC/);
    expect(() => localMonthlyAirTemperatures({ ...base, baselinePeriod: [2020, 1991] })).toThrow(/baselinePeriod/);
    expect(() => localMonthlyAirTemperatures({ ...base, toYear: 2200 })).toThrow(/fromYear/);
  });

});
