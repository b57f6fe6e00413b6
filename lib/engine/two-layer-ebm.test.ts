import { describe, expect, it } from 'vitest';
import {
  CALIBRATED_HEAT_EXCHANGE_W_M2_K,
  CALIBRATED_TWO_LAYER,
  TWO_LAYER_BASE,
  climateMetricsTwoLayer,
  solveHeatExchangeForTcr,
  twoLayerResponse,
} from './two-layer-ebm';

describe('two-layer EBM (Held et al. 2010; Geoffroy et al. 2013)', () => {
  it('feedback parameter is F2x / ECS = 3.93 / 3 = 1.31 W m-2 K-1 (IPCC AR6 WG1 ch. 7, F2x and ECS best estimates)', () => {
    expect(CALIBRATED_TWO_LAYER.feedbackWm2K).toBeCloseTo(1.31, 2);
  });

  it('calibrated parameters give TCR 1.8 ± 0.05 K (AR6 WG1 ch. 7, 7.5.5 best estimate, 1 %/yr CO2 definition)', () => {
    const { tcrK } = climateMetricsTwoLayer(CALIBRATED_TWO_LAYER);
    expect(Math.abs(tcrK - 1.8)).toBeLessThanOrEqual(0.05);
  });

  it('calibrated parameters give ECS 3.0 K numerically after an abrupt doubling (AR6 WG1 ch. 7 best estimate)', () => {
    const { ecsK, ecsAnalyticK } = climateMetricsTwoLayer(CALIBRATED_TWO_LAYER);
    expect(ecsAnalyticK).toBeCloseTo(3.0, 10);
    expect(Math.abs(ecsK - 3.0)).toBeLessThan(0.01);
  });

  it('the written-down γ is what the documented bisection solves (calibration reproducible)', () => {
    const g = solveHeatExchangeForTcr(TWO_LAYER_BASE, 1.8);
    expect(Math.abs(g - CALIBRATED_HEAT_EXCHANGE_W_M2_K)).toBeLessThan(1e-3);
    // Geoffroy et al. 2013 Part II CMIP5 models span γ of roughly 0.5–1.0 W m-2 K-1 (from memory).
    expect(g).toBeGreaterThan(0.4);
    expect(g).toBeLessThan(1.2);
  });

  it('efficacy > 1 lowers the transient warming for the same γ (Held et al. 2010 / Geoffroy et al. 2013 Part II)', () => {
    const withEfficacy = climateMetricsTwoLayer(CALIBRATED_TWO_LAYER).tcrK;
    const without = climateMetricsTwoLayer({ ...CALIBRATED_TWO_LAYER, efficacy: 1 }).tcrK;
    expect(withEfficacy).toBeLessThan(without);
  });

  it('step response: fast e-folding of a few years then slow approach (two time scales, Held et al. 2010)', () => {
    const forcing = new Float64Array(300).fill(CALIBRATED_TWO_LAYER.forcing2xWm2);
    const t = twoLayerResponse(forcing, CALIBRATED_TWO_LAYER);
    // After ~10 years the fast component has mostly adjusted; equilibrium (3 K) is far from reached.
    expect(t[9]).toBeGreaterThan(1.5);
    expect(t[9]).toBeLessThan(2.6);
    expect(t[299]).toBeGreaterThan(t[99]);
    expect(t[299]).toBeLessThan(3.0);
    for (let i = 1; i < t.length; i++) expect(t[i]).toBeGreaterThanOrEqual(t[i - 1]);
  });
});
