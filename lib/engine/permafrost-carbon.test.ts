import { describe, expect, it } from 'vitest';
import { PERMAFROST_SOC_0_3M_PGC, PERMAFROST_SOC_0_3M_UNCERTAINTY_PGC } from './constants';
import { globalWarmingDetails } from './global-warming';
import {
  AR6_PERMAFROST_CO2_FEEDBACK_PGC_PER_K,
  PERMAFROST_CARBON_DEFAULTS,
  newPermafrostCarbonState,
  permafrostAirborneCo2Ppm,
  permafrostCo2ForcingWm2,
  stepPermafrostCarbonYear,
} from './permafrost-carbon';
import { SCENARIOS } from './scenario-forcing';

describe('permafrost-carbon feedback', () => {
  it('pool is the 0–3 m stock of Hugelius et al. 2014 (1035 ± 150 PgC, Biogeosciences 11; from memory)', () => {
    expect(PERMAFROST_CARBON_DEFAULTS.frozenPoolPgC).toBe(PERMAFROST_SOC_0_3M_PGC);
    // The published figures as literals, so the check does not compare a constant with itself.
    expect(PERMAFROST_SOC_0_3M_PGC).toBeGreaterThanOrEqual(1035 - 150);
    expect(PERMAFROST_SOC_0_3M_PGC).toBeLessThanOrEqual(1035 + 150);
    expect(PERMAFROST_SOC_0_3M_UNCERTAINTY_PGC).toBe(150);
  });

  for (const scenario of SCENARIOS) {
    it(`${scenario}: release to 2100 per °C of global warming inside AR6 WG1 ch. 5's 3.1–41 PgC °C-1 (5.4.3.2, Table 5.7; from memory)`, () => {
      const d = globalWarmingDetails(scenario, { permafrostCarbonFeedback: true });
      const n = d.years.length - 1;
      const perK = d.permafrost_release_pgc[n] / d.global_warming_c[n];
      expect(perK).toBeGreaterThanOrEqual(AR6_PERMAFROST_CO2_FEEDBACK_PGC_PER_K.low);
      expect(perK).toBeLessThanOrEqual(AR6_PERMAFROST_CO2_FEEDBACK_PGC_PER_K.high);
      // Released carbon can never exceed the thawed decomposable share of the pool.
      expect(d.permafrost_release_pgc[n]).toBeLessThanOrEqual(PERMAFROST_SOC_0_3M_PGC * PERMAFROST_CARBON_DEFAULTS.decomposableFraction);
    });
  }

  it('no warming, no release; release grows with warming (Q10 > 1 and larger thaw)', () => {
    const cold = newPermafrostCarbonState();
    for (let i = 0; i < 50; i++) expect(stepPermafrostCarbonYear(cold, 0)).toBe(0);
    const warm = newPermafrostCarbonState();
    const hot = newPermafrostCarbonState();
    for (let i = 0; i < 50; i++) {
      stepPermafrostCarbonYear(warm, 1);
      stepPermafrostCarbonYear(hot, 2);
    }
    expect(hot.releasedPgC).toBeGreaterThan(warm.releasedPgC);
    expect(warm.releasedPgC).toBeGreaterThan(0);
  });

  it('airborne fraction of a pulse follows Joos et al. 2013: about 0.6 after 20 yr, 0.4 after 100 yr (ACP 13, Fig. 1; from memory)', () => {
    const s = newPermafrostCarbonState();
    // One pulse of decomposable carbon released in the first year, nothing later.
    s.decomposablePgC = 0;
    s.airborneBoxesPgC.fill(0);
    const p = { ...PERMAFROST_CARBON_DEFAULTS, thawFractionPerK: 0 };
    s.decomposablePgC = 100;
    const turnoverFast = { ...p, turnoverYr: 1e-9 };
    stepPermafrostCarbonYear(s, 0, turnoverFast);
    const pulse = s.releasedPgC;
    expect(pulse).toBeCloseTo(100, 6);
    for (let i = 0; i < 19; i++) stepPermafrostCarbonYear(s, 0, p);
    const after20 = permafrostAirborneCo2Ppm(s) * 2.124 / pulse;
    for (let i = 0; i < 80; i++) stepPermafrostCarbonYear(s, 0, p);
    const after100 = permafrostAirborneCo2Ppm(s) * 2.124 / pulse;
    expect(after20).toBeGreaterThan(0.5);
    expect(after20).toBeLessThan(0.7);
    expect(after100).toBeGreaterThan(0.33);
    expect(after100).toBeLessThan(0.47);
  });

  it('logarithmic forcing scaled to AR6: doubling CO2 gives 3.93 W m-2 (AR6 WG1 ch. 7; Myhre et al. 1998 form)', () => {
    expect(permafrostCo2ForcingWm2(400, 400)).toBeCloseTo(3.93, 10);
    expect(permafrostCo2ForcingWm2(0, 400)).toBe(0);
  });
});
