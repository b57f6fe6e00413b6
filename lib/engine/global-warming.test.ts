import { describe, expect, it } from 'vitest';
import { OBSERVED_2011_2020_C, SPM1_PERIODS, SPM1_WARMING_C } from './data/ar6-spm1-warming';
import { globalWarmingAt, globalWarmingDetails, globalWarmingMean, globalWarmingSeries } from './global-warming';
import { SCENARIOS } from './scenario-forcing';

describe('global warming along the SSPs', () => {
  it('annual 1850–2100, relative to the 1850–1900 mean (AR6 reference period)', () => {
    const s = globalWarmingSeries('SSP2-4.5');
    expect(s.years[0]).toBe(1850);
    expect(s.years[s.years.length - 1]).toBe(2100);
    expect(s.global_warming_c).toHaveLength(251);
    expect(Math.abs(globalWarmingMean('SSP2-4.5', 1850, 1900))).toBeLessThan(1e-12);
    for (const v of s.global_warming_c) expect(Number.isFinite(v)).toBe(true);
  });

  it('memoised: the same frozen object per (scenario, feedback)', () => {
    expect(globalWarmingSeries('SSP1-2.6').global_warming_c).toBe(globalWarmingSeries('SSP1-2.6').global_warming_c);
    expect(Object.isFrozen(globalWarmingSeries('SSP1-2.6').global_warming_c)).toBe(true);
    expect(globalWarmingSeries('SSP1-2.6', { permafrostCarbonFeedback: true }).global_warming_c).not.toBe(
      globalWarmingSeries('SSP1-2.6').global_warming_c,
    );
  });

  for (const scenario of SCENARIOS) {
    SPM1_PERIODS.forEach(([a, b], k) => {
      const assessed = SPM1_WARMING_C[scenario][k];
      it(`${scenario} ${a}–${b}: within 0.2 °C of ${assessed.best} and inside ${assessed.low}–${assessed.high} °C (IPCC AR6 WG1 Table SPM.1)`, () => {
        const w = globalWarmingMean(scenario, a, b);
        expect(Math.abs(w - assessed.best)).toBeLessThanOrEqual(0.2);
        expect(w).toBeGreaterThanOrEqual(assessed.low);
        expect(w).toBeLessThanOrEqual(assessed.high);
      });
    });
  }

  it('2011–2020 inside the observed 0.95–1.20 °C (IPCC AR6 WG1 SPM A.1.2)', () => {
    for (const scenario of SCENARIOS) {
      const w = globalWarmingMean(scenario, 2011, 2020);
      expect(w).toBeGreaterThanOrEqual(OBSERVED_2011_2020_C.low);
      expect(w).toBeLessThanOrEqual(OBSERVED_2011_2020_C.high);
    }
  });

  it('sanity: a higher scenario never gives less 2081–2100 warming (ordering of AR6 Table SPM.1)', () => {
    for (const feedback of [false, true]) {
      const w = SCENARIOS.map((s) => globalWarmingMean(s, 2081, 2100, { permafrostCarbonFeedback: feedback }));
      for (let i = 1; i < w.length; i++) expect(w[i]).toBeGreaterThanOrEqual(w[i - 1]);
    }
  });

  it('sanity: feedback on never gives less warming than feedback off, any year (the release adds CO2)', () => {
    for (const s of SCENARIOS) {
      const off = globalWarmingSeries(s).global_warming_c;
      const on = globalWarmingSeries(s, { permafrostCarbonFeedback: true }).global_warming_c;
      for (let i = 0; i < off.length; i++) expect(on[i]).toBeGreaterThanOrEqual(off[i] - 1e-12);
      expect(on[on.length - 1]).toBeGreaterThan(off[off.length - 1]);
    }
  });

  it('the scenarios share the history up to 2014 (CMIP6 convention, data/ssp-forcing.ts)', () => {
    for (const s of SCENARIOS) expect(globalWarmingAt(s, 2000)).toBeCloseTo(globalWarmingAt('SSP2-4.5', 2000), 12);
  });

  it('forcing of 2019 within the AR6 very likely range 1.96–3.48 W m-2 of the assessed 2.72 (AR6 WG1 ch. 7; range from memory)', () => {
    for (const s of SCENARIOS) {
      const f = globalWarmingDetails(s).forcing_w_m2[2019 - 1850];
      expect(f).toBeGreaterThan(1.96);
      expect(f).toBeLessThan(3.48);
      expect(Math.abs(f - 2.72)).toBeLessThan(0.2);
    }
  });
});
