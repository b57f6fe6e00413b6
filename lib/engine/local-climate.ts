/**
 * Local monthly air temperature per year for a site: its monthly normals plus the local change
 * relative to the normals' baseline period.
 *
 * API (stable):
 * - `localMonthlyAirTemperatures({ normalsC, baselinePeriod, scenario, permafrostCarbonFeedback?,
 *   monthlyFactors, fromYear, toYear, localProjection?, variability? })`
 *   → `{ years: number[]; monthlyC: Float64Array[] }`: one Float64Array of 12 monthly means [°C]
 *   (January first) per year fromYear..toYear (1850–2100).
 * - `localMonthlyChangeC(...)` → the same shape, the change [K] relative to the baseline period only.
 * - `preindustrialMonthlyAirTemperatures({ normalsC, baselinePeriod, scenario, monthlyFactors })`
 *   → 12 monthly means [°C] of the 1850–1900 climate (normals less the local warming from
 *   1850–1900 to the baseline period), for the ground solver's spin-up.
 * - `localProjectionSchema` (zod): an uploaded local projection (changes relative to its own
 *   stated baseline period, annual or monthly per year); `LocalProjection` is its parsed type.
 * - For daily values use `meanPreservingDailyFromMonthly(monthlyC[i], monthlyC[i − 1], monthlyC[i + 1], buf)`
 *   from monthly-to-daily.ts (or `dailyForYearOfSeries(monthlyC, i, buf)`).
 *
 * Model: T(y, m) = N(m) + ΔT(y, m) + ε(y, m), where N are the normals over the baseline period B,
 * and, from the emulator, ΔT(y, m) = f(m) · (G(y) − mean of G over B), G the global warming series
 * (global-warming.ts) and f the monthly regional factors (regional-warming.ts). ε is optional seeded
 * interannual variability (independent normal anomalies per month, sd per month; off by default;
 * mulberry32 generator [3] with Box–Muller [4]).
 *
 * Uploaded local projection: it replaces the emulator for every year it covers (linear between its
 * years; outside them the emulator is used). Its changes are relative to its own baseline P; they are
 * re-referenced to the normals' baseline B by subtracting, per month, the projection's own mean over
 * B if it covers every year of B, otherwise the emulator's local change from P to B,
 * f(m) · (mean G over B − mean G over P). If P = B nothing is subtracted.
 *
 * References: [1] IPCC AR6 WG1 Atlas (regional factors; see regional-warming.ts).
 * [2] IPCC AR6 WG1 SPM (global warming; see global-warming.ts).
 * [3] T. Ettinger, "mulberry32" public-domain generator (a 32-bit state PRNG; common practice).
 * [4] G. E. P. Box and M. E. Muller, "A note on the generation of random normal deviates," Ann. Math.
 *     Stat. 29(2), 610–611, 1958, doi:10.1214/aoms/1177706645.
 */
import { z } from 'zod';
import { GLOBAL_WARMING_FIRST_YEAR, GLOBAL_WARMING_LAST_YEAR, globalWarmingSeries } from './global-warming';
import type { ScenarioId } from './scenario-forcing';
import { EngineInputError } from './validation';

const FIRST = GLOBAL_WARMING_FIRST_YEAR;
const LAST = GLOBAL_WARMING_LAST_YEAR;

const year = () => z.number().int().min(FIRST).max(LAST);
const change = () => z.number().min(-40).max(40);

const projectionPointSchema = z
  .strictObject({
    year: year(),
    annual_change_c: change().optional(),
    monthly_change_c: z.array(change()).optional(),
  })
  .superRefine((p, ctx) => {
    const hasAnnual = p.annual_change_c !== undefined;
    const hasMonthly = p.monthly_change_c !== undefined;
    if (hasAnnual === hasMonthly) {
      ctx.addIssue({ code: 'custom', message: 'give exactly one of annual_change_c or monthly_change_c' });
    }
    if (hasMonthly && p.monthly_change_c!.length !== 12) {
      ctx.addIssue({ code: 'custom', path: ['monthly_change_c'], message: `needs 12 monthly values, got ${p.monthly_change_c!.length}` });
    }
  });

/**
 * An uploaded local (downscaled) projection: air-temperature changes [K, written _c] relative to
 * its own stated baseline period, by year, either one annual change or 12 monthly changes per year.
 */
export const localProjectionSchema = z
  .strictObject({
    baseline_period: z.tuple([year(), year()]),
    description: z.string().trim().max(500).optional(),
    series: z.array(projectionPointSchema).min(1).max(300),
  })
  .superRefine((p, ctx) => {
    if (p.baseline_period[1] < p.baseline_period[0]) {
      ctx.addIssue({ code: 'custom', path: ['baseline_period', 1], message: 'must be >= the start year' });
    }
    for (let i = 1; i < p.series.length; i++) {
      if (p.series[i].year <= p.series[i - 1].year) {
        ctx.addIssue({ code: 'custom', path: ['series', i, 'year'], message: 'years must be strictly increasing' });
      }
    }
  });

export type LocalProjection = z.infer<typeof localProjectionSchema>;

/** Optional seeded interannual variability. */
export interface InterannualVariability {
  /** Seed of the generator (integer). */
  seed: number;
  /** Standard deviation of monthly anomalies [K]: one value or 12 (January first). */
  sdC: number | ArrayLike<number>;
}

export interface LocalClimateInput {
  /** Monthly normals [°C], January first, over `baselinePeriod`. */
  normalsC: ArrayLike<number>;
  /** Baseline period of the normals [first year, last year], inclusive. */
  baselinePeriod: readonly [number, number];
  scenario: ScenarioId;
  permafrostCarbonFeedback?: boolean;
  /** Local warming per degree of global warming by month [K K-1], January first. */
  monthlyFactors: ArrayLike<number>;
  fromYear: number;
  toYear: number;
  localProjection?: LocalProjection;
  variability?: InterannualVariability;
}

export interface LocalMonthlySeries {
  years: number[];
  /** One Float64Array(12) per year [°C or K], January first. */
  monthlyC: Float64Array[];
}

function checkTwelve(values: ArrayLike<number>, field: string): void {
  if (values.length !== 12) throw new EngineInputError(field, `needs 12 monthly values, got ${values.length}`);
  for (let i = 0; i < 12; i++) if (!Number.isFinite(values[i])) throw new EngineInputError(`${field}[${i}]`, 'must be a finite number');
}

function checkPeriod(period: readonly [number, number], field: string): void {
  const [a, b] = period;
  if (!Number.isInteger(a) || !Number.isInteger(b) || a < FIRST || b > LAST || b < a) {
    throw new EngineInputError(field, `must be [first, last] years within ${FIRST}–${LAST}, first <= last`);
  }
}

function meanOver(values: readonly number[], firstYear: number, lastYear: number): number {
  let s = 0;
  for (let y = firstYear; y <= lastYear; y++) s += values[y - FIRST];
  return s / (lastYear - firstYear + 1);
}

/** mulberry32: a small deterministic 32-bit PRNG returning uniforms in [0, 1) (common practice). */
export function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Standard normal deviates by the Box–Muller transform from a uniform generator. */
export function normalGenerator(uniform: () => number): () => number {
  let spare: number | null = null;
  return () => {
    if (spare !== null) {
      const s = spare;
      spare = null;
      return s;
    }
    let u = 0;
    while (u <= 0) u = uniform();
    const v = uniform();
    const r = Math.sqrt(-2 * Math.log(u));
    spare = r * Math.sin(2 * Math.PI * v);
    return r * Math.cos(2 * Math.PI * v);
  };
}

/** Projection change [K] in a year and month, linear between its years; null outside its years. */
function projectionChange(p: LocalProjection, yr: number, month: number): number | null {
  const s = p.series;
  if (yr < s[0].year || yr > s[s.length - 1].year) return null;
  const at = (i: number) => s[i].monthly_change_c?.[month] ?? s[i].annual_change_c!;
  let k = 0;
  while (k + 1 < s.length && s[k + 1].year <= yr) k++;
  if (s[k].year === yr || k + 1 >= s.length) return at(k);
  const w = (yr - s[k].year) / (s[k + 1].year - s[k].year);
  return at(k) + w * (at(k + 1) - at(k));
}

/**
 * Local monthly change of air temperature [K] relative to the baseline period, per year.
 * @param input See `LocalClimateInput` (normalsC is not used).
 * @returns `{ years, monthlyC }`, the change per year and month [K].
 */
export function localMonthlyChangeC(input: Omit<LocalClimateInput, 'normalsC'> & { normalsC?: ArrayLike<number> }): LocalMonthlySeries {
  const { baselinePeriod, scenario, monthlyFactors, fromYear, toYear, localProjection } = input;
  checkTwelve(monthlyFactors, 'monthlyFactors');
  checkPeriod(baselinePeriod, 'baselinePeriod');
  checkPeriod([fromYear, toYear], 'fromYear..toYear');
  const g = globalWarmingSeries(scenario, { permafrostCarbonFeedback: input.permafrostCarbonFeedback === true }).global_warming_c;
  const gBase = meanOver(g, baselinePeriod[0], baselinePeriod[1]);
  const [b0, b1] = baselinePeriod;

  let reference: Float64Array | null = null;
  if (localProjection) {
    const p = localProjection;
    reference = new Float64Array(12);
    const [p0, p1] = p.baseline_period;
    const first = p.series[0].year;
    const last = p.series[p.series.length - 1].year;
    if (p0 === b0 && p1 === b1) {
      // Same baseline: nothing to re-reference.
    } else if (first <= b0 && last >= b1) {
      for (let m = 0; m < 12; m++) {
        let s = 0;
        for (let y = b0; y <= b1; y++) s += projectionChange(p, y, m)!;
        reference[m] = s / (b1 - b0 + 1);
      }
    } else {
      const gp = meanOver(g, p0, p1);
      for (let m = 0; m < 12; m++) reference[m] = monthlyFactors[m] * (gBase - gp);
    }
  }

  let sd: Float64Array | null = null;
  let normal: (() => number) | null = null;
  if (input.variability) {
    const v = input.variability;
    sd = new Float64Array(12);
    if (typeof v.sdC === 'number') sd.fill(v.sdC);
    else {
      checkTwelve(v.sdC, 'variability.sdC');
      for (let m = 0; m < 12; m++) sd[m] = v.sdC[m];
    }
    normal = normalGenerator(mulberry32(v.seed));
  }

  const years: number[] = [];
  const monthlyC: Float64Array[] = [];
  for (let y = fromYear; y <= toYear; y++) {
    const row = new Float64Array(12);
    const dg = g[y - FIRST] - gBase;
    for (let m = 0; m < 12; m++) {
      const fromProjection = localProjection ? projectionChange(localProjection, y, m) : null;
      row[m] = fromProjection !== null ? fromProjection - reference![m] : monthlyFactors[m] * dg;
      if (normal) row[m] += sd![m] * normal();
    }
    years.push(y);
    monthlyC.push(row);
  }
  return { years, monthlyC };
}

/**
 * Local monthly air temperature [°C] per year: normals + local change relative to their baseline.
 * @param input See `LocalClimateInput`.
 * @returns `{ years, monthlyC }`: years fromYear..toYear, 12 monthly means [°C] each, January first.
 */
export function localMonthlyAirTemperatures(input: LocalClimateInput): LocalMonthlySeries {
  checkTwelve(input.normalsC, 'normalsC');
  const out = localMonthlyChangeC(input);
  for (const row of out.monthlyC) for (let m = 0; m < 12; m++) row[m] += input.normalsC[m];
  return out;
}

/**
 * The site's 1850–1900 monthly climate for the spin-up: normals less the local warming from
 * 1850–1900 to the baseline period, N(m) − f(m) · mean of G over the baseline (G is 0 on average
 * over 1850–1900 by construction). The emulator is used even when a local projection is uploaded
 * (projections rarely reach back to 1850–1900).
 * @returns 12 monthly means [°C], January first.
 */
export function preindustrialMonthlyAirTemperatures(input: {
  normalsC: ArrayLike<number>;
  baselinePeriod: readonly [number, number];
  scenario: ScenarioId;
  permafrostCarbonFeedback?: boolean;
  monthlyFactors: ArrayLike<number>;
}): Float64Array {
  checkTwelve(input.normalsC, 'normalsC');
  checkTwelve(input.monthlyFactors, 'monthlyFactors');
  checkPeriod(input.baselinePeriod, 'baselinePeriod');
  const g = globalWarmingSeries(input.scenario, { permafrostCarbonFeedback: input.permafrostCarbonFeedback === true }).global_warming_c;
  const gBase = meanOver(g, input.baselinePeriod[0], input.baselinePeriod[1]);
  const out = new Float64Array(12);
  for (let m = 0; m < 12; m++) out[m] = input.normalsC[m] - input.monthlyFactors[m] * gBase;
  return out;
}
