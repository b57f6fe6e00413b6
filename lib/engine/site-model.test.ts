import { describe, expect, it } from 'vitest';
import {
  ENVELOPE_DEPTHS_M,
  computeHistory,
  createSiteColumn,
  spinUp,
  dailySnowCovers,
  defaultSurfaceParameters,
  extendLayers,
  observedStart,
  prepareSite,
  surfaceTemperatureC,
  zeroAnnualAmplitudeDepthM,
  type YearRecord,
} from './site-model';
import { MONTH_START_DAY } from './monthly-to-daily';
import { exampleSite, siteSchema, MIN_COLUMN_DEPTH_M, type SiteInput } from './site-schema';

function site(mutate?: (s: SiteInput) => void) {
  const s = structuredClone(exampleSite);
  delete s.observed;
  mutate?.(s);
  return siteSchema.parse(s);
}

describe('column', () => {
  it('extends the last layer given to 50 m and flags it (documented in docs/site-schema.md)', () => {
    const s = site((x) => {
      x.layers = x.layers.slice(0, 3); // 0.3 + 1.2 + 3.5 = 5 m
    });
    const { layers, extendedToM } = extendLayers(s.layers);
    expect(extendedToM).toBe(MIN_COLUMN_DEPTH_M);
    expect(layers[2].thickness_m).toBeCloseTo(3.5 + 45, 12); // by hand: 50 − 5 m added to the last layer
    expect(layers[2].extended).toBe(true);
    expect(layers.reduce((a, l) => a + l.thickness_m, 0)).toBeCloseTo(50, 12);
    // A profile already reaching 50 m is left alone (the example sums to exactly 50 m).
    expect(extendLayers(site().layers).extendedToM).toBeNull();
    expect(prepareSite(s).grid.depthM).toBeCloseTo(50, 9);
  });
});

describe('surface forcing', () => {
  const base = { nThaw: 0.85, nFreeze: 0.5, snowDepthFactor: 1, snowDensityShiftKgM3: 0 };
  const snow = { thicknessM: 0.3, conductivityWmK: 0.18, heatCapacityJm3K: 7e5 };
  it('n-factors: n_t on thawing days; n_f only where snow is not modelled (Lunardini 1978)', () => {
    expect(surfaceTemperatureC(10, null, base, true)).toBeCloseTo(8.5, 12);
    // Vegetated cover, snow modelled, a snow-free freezing day: the table's n_f already includes
    // snow, so it must not be applied: the air temperature is imposed.
    expect(surfaceTemperatureC(-10, null, base, true)).toBe(-10);
    // Snow-cleared cover (no snow modelled): n_f applies.
    expect(surfaceTemperatureC(-10, null, base, false)).toBeCloseTo(-5, 12);
    // On snow the air temperature is imposed at the snow surface (n = 1).
    expect(surfaceTemperatureC(-20, snow, base, true)).toBe(-20);
  });

  it('daily snow follows the monthly depths, zero in snow-free months, scaled by the snow case; Sturm conductivity', () => {
    const p = prepareSite(site());
    const covers = dailySnowCovers(p, defaultSurfaceParameters(p));
    // July (month 6) has no snow in the example.
    for (let d = MONTH_START_DAY[6]; d < MONTH_START_DAY[7]; d++) expect(covers[d]).toBeNull();
    const march = covers.slice(MONTH_START_DAY[2], MONTH_START_DAY[3]).map((c) => c!.thicknessM);
    // Mean-preserving interpolation (monthly-to-daily.ts): the March mean is the monthly 0.35 m.
    expect(march.reduce((a, b) => a + b, 0) / march.length).toBeCloseTo(0.35, 3);
    // Sturm et al. 1997: k = 0.138 − 1.01 ρ + 3.233 ρ² (ρ in g cm-3); ρ = 0.35 → 0.1806 (by hand).
    expect(covers[MONTH_START_DAY[2]]!.conductivityWmK).toBeCloseTo(0.138 - 1.01 * 0.35 + 3.233 * 0.35 ** 2, 10);
    const plus = prepareSite(site((x) => (x.snow.scenario_case = 'plus_30')));
    const coversPlus = dailySnowCovers(plus, defaultSurfaceParameters(plus));
    // The +30 % case: every snow depth × 1.3.
    expect(coversPlus[MONTH_START_DAY[2]]!.thicknessM).toBeCloseTo(1.3 * covers[MONTH_START_DAY[2]]!.thicknessM, 12);
    // A snow-cleared cover carries no snow at all (n-factors.ts: roads, airstrips, pads).
    const road = prepareSite(site((x) => (x.surface.cover = 'paved_road')));
    expect(dailySnowCovers(road, defaultSurfaceParameters(road)).every((c) => c === null)).toBe(true);
  });
});

describe('diagnostics', () => {
  it('depth of zero annual amplitude: the shallowest depth ≥ 10 m with an annual range ≤ 0.1 K (van Everdingen 1998; from memory)', () => {
    const n = ENVELOPE_DEPTHS_M.length;
    const rec = (range: (z: number) => number): YearRecord =>
      ({ minC: ENVELOPE_DEPTHS_M.map((z) => -3 - range(z) / 2), maxC: ENVELOPE_DEPTHS_M.map((z) => -3 + range(z) / 2), meanC: new Array(n).fill(-3) }) as unknown as YearRecord;
    // Range 20 K e^(−z/2.5): ≤ 0.1 K from z = 2.5 ln 200 = 13.2 m → the envelope depth 15 m (by hand).
    expect(zeroAnnualAmplitudeDepthM([rec((z) => 20 * Math.exp(-z / 2.5))])).toBe(15);
    // A zero curtain that damps the range at 1–3 m does not count: the search starts at 10 m.
    expect(zeroAnnualAmplitudeDepthM([rec((z) => (z > 1 && z < 3 ? 0.01 : 20 * Math.exp(-z / 2.5)))])).toBe(15);
    // Nothing below 0.1 K down to 30 m: the documented 20 m fallback.
    expect(zeroAnnualAmplitudeDepthM([rec(() => 1)])).toBe(20);
  });

  it('an observed profile is interpolated linearly and continued below its last point by the geothermal gradient', () => {
    const p = prepareSite(
      site((x) => {
        x.observed = { ground_temperature_profile: { date: '2012-03-02', points: [{ depth_m: 1, temperature_c: -6 }, { depth_m: 11, temperature_c: -4 }] } };
      }),
    );
    const o = observedStart(p)!;
    expect(o.year).toBe(2012);
    expect(o.dayOfYear).toBe(31 + 29 + 1); // 2 March of a leap year, 0-based (the 365-day model clips at day 364)
    const g = p.grid;
    for (let c = 0; c < g.cellCount; c++) {
      const z = g.centerDepthM[c];
      if (z <= 1) expect(o.cellTemperatureC[c]).toBe(-6);
      else if (z <= 11) expect(o.cellTemperatureC[c]).toBeCloseTo(-6 + (2 * (z - 1)) / 10, 10);
      // Below: warming with depth by q/k > 0 (Romanovsky & Osterkamp 1997: T = T_top + q z / k).
      else expect(o.cellTemperatureC[c]).toBeGreaterThan(-4);
    }
  });

  it('a colder observed start gives colder ground afterwards (comparison principle of monotone heat conduction; common practice)', () => {
    const run = (t: number) =>
      computeHistory(
        prepareSite(
          site((x) => {
            x.observed = { ground_temperature_profile: { date: '2005-09-01', points: [{ depth_m: 0.5, temperature_c: t }, { depth_m: 30, temperature_c: t }] } };
          }),
        ),
      );
    const cold = run(-8);
    const warm = run(-1);
    const y = (h: ReturnType<typeof run>, year: number) => h.records.find((r) => r.year === year)!;
    const i10 = ENVELOPE_DEPTHS_M.indexOf(10);
    for (const year of [2006, 2010, 2014]) expect(y(cold, year).meanC[i10]).toBeLessThan(y(warm, year).meanC[i10]);
    // Before the date both runs are the same spin-up and history.
    expect(y(cold, 2004).meanC).toEqual(y(warm, 2004).meanC);
  });
});

describe('spin-up and calibration reporting', () => {
  // Issue 3: the spin-up is bounded and a spin-up that did not converge is reported.
  it('reports a spin-up cut short by its bound as not converged', () => {
    const p = prepareSite(site());
    const r = spinUp(createSiteColumn(p), p, defaultSurfaceParameters(p), p.site.climate.monthly_air_temperature_c, false, 2);
    expect(r).toMatchObject({ years: 2, converged: false });
    expect(Number.isFinite(r.maxChangeK)).toBe(true);
  });

  // Issue 3: calibration stays within published ranges and says so when it cannot match.
  it('an active layer the published n-factor range cannot reach is reported as calibration_not_reached', () => {
    const h = computeHistory(prepareSite(site((x) => (x.observed = { active_layer_thickness_m: 4 }))));
    expect(h.calibration.status).toBe('calibration_not_reached');
    const c = h.calibration.parameters;
    expect(c.n_factor_thaw).toBeLessThanOrEqual(c.n_factor_thaw_range[1]);
    expect(h.calibration.achieved.active_layer_thickness_m!).toBeLessThan(4 * 0.8);
  });
});
