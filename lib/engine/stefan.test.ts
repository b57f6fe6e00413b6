import { describe, expect, it } from 'vitest';
import { erf, neumannTwoPhaseThaw, thawDepthStefan } from './stefan';

describe('erf (Abramowitz & Stegun 1964, 7.1.26)', () => {
  it('matches tabulated values within 2e-7 (A&S Table 7.1)', () => {
    expect(Math.abs(erf(0.5) - 0.5204998778)).toBeLessThan(2e-7);
    expect(Math.abs(erf(1) - 0.8427007929)).toBeLessThan(2e-7);
    expect(Math.abs(erf(2) - 0.9953222650)).toBeLessThan(2e-7);
    expect(erf(-1)).toBeCloseTo(-erf(1), 12);
  });
});

describe('Stefan and Neumann thaw depths', () => {
  it('Stefan: X = √(2 k I / L) (Lunardini 1981)', () => {
    // k 1.2, I 100 °C d, L 1e8: √(2·1.2·100·86400/1e8) = 0.4554 m
    expect(thawDepthStefan(100, 1.2, 1e8)).toBeCloseTo(Math.sqrt((2 * 1.2 * 100 * 86400) / 1e8), 12);
    expect(thawDepthStefan(0, 1.2, 1e8)).toBe(0);
    expect(() => thawDepthStefan(100, 1.2, 0)).toThrow(RangeError);
  });

  it('one-phase Neumann root satisfies λ e^{λ²} erf λ = Ste/√π (Carslaw & Jaeger 1959, §11.2)', () => {
    for (const ste of [0.01, 0.1, 0.5]) {
      const c = 2e6;
      const l = c / ste; // ΔT = 1 K
      const { lambda } = neumannTwoPhaseThaw({ surfaceTemperatureC: 1, initialTemperatureC: 0, conductivityThawedWmK: 1, conductivityFrozenWmK: 1, heatCapacityThawedJm3K: c, heatCapacityFrozenJm3K: c, latentHeatJm3: l });
      expect(lambda * Math.exp(lambda * lambda) * erf(lambda)).toBeCloseTo(ste / Math.sqrt(Math.PI), 7);
    }
  });

  it("Stefan's approximation is the small-Stefan-number limit of Neumann's (Carslaw & Jaeger 1959, §11.2)", () => {
    const errors = [0.3, 0.1, 0.03, 0.01].map((ste) => {
      const c = 2e6;
      const l = (c * 2) / ste; // ΔT = 2 K
      const t = 50 * 86400;
      const n = neumannTwoPhaseThaw({ surfaceTemperatureC: 2, initialTemperatureC: 0, conductivityThawedWmK: 1.5, conductivityFrozenWmK: 1.5, heatCapacityThawedJm3K: c, heatCapacityFrozenJm3K: c, latentHeatJm3: l }).frontDepthM(t);
      return thawDepthStefan(100, 1.5, l) / n - 1;
    });
    // Stefan over-predicts, by about Ste/12 to first order (series of the one-phase root)
    errors.forEach((e) => expect(e).toBeGreaterThan(0));
    for (let i = 1; i < errors.length; i++) expect(errors[i]).toBeLessThan(errors[i - 1]);
    expect(errors[3]).toBeLessThan(0.002);
  });

  it('a colder frozen ground slows thaw (two-phase term; Carslaw & Jaeger 1959, §11.2)', () => {
    const base = { surfaceTemperatureC: 5, conductivityThawedWmK: 1.2, conductivityFrozenWmK: 2, heatCapacityThawedJm3K: 2.6e6, heatCapacityFrozenJm3K: 1.9e6, latentHeatJm3: 1e8 };
    const warm = neumannTwoPhaseThaw({ ...base, initialTemperatureC: 0 }).lambda;
    const cold = neumannTwoPhaseThaw({ ...base, initialTemperatureC: -5 }).lambda;
    expect(cold).toBeLessThan(warm);
  });
});

describe('two-phase Neumann solution satisfies its own problem (Carslaw & Jaeger 1959, §11.2)', () => {
  // The problem of §11.2 stated independently of the root-finding: the temperature is T_s at the
  // surface, the freezing point at the front, T_0 far below, and at the front the heat conducted in
  // from the thawed side minus that conducted away into the frozen side melts the ice, L dX/dt.
  // Checked by finite differences of the returned field, so an error in the transcendental equation
  // (the term for the frozen side especially) shows up here.
  const p = {
    surfaceTemperatureC: 5,
    initialTemperatureC: -4,
    freezingPointC: 0,
    conductivityThawedWmK: 1.2,
    conductivityFrozenWmK: 2.0,
    heatCapacityThawedJm3K: 2.6e6,
    heatCapacityFrozenJm3K: 1.9e6,
    latentHeatJm3: 1.0e8,
  };
  const n = neumannTwoPhaseThaw(p);
  const t = 20 * 86_400;
  const x = n.frontDepthM(t);

  it('meets the boundary values: T_s at the surface, T_f at the front, T_0 deep down', () => {
    expect(n.temperatureC(0, t)).toBeCloseTo(p.surfaceTemperatureC, 6);
    expect(Math.abs(n.temperatureC(x, t) - p.freezingPointC)).toBeLessThan(1e-3);
    expect(n.temperatureC(50, t)).toBeCloseTo(p.initialTemperatureC, 3);
  });

  it('balances heat at the front: k_t ∂T/∂z|thawed − k_f ∂T/∂z|frozen = L dX/dt, within 1 %', () => {
    const h = 1e-5;
    const gradThawed = (n.temperatureC(x - h, t) - n.temperatureC(x - 2 * h, t)) / h;
    const gradFrozen = (n.temperatureC(x + 2 * h, t) - n.temperatureC(x + h, t)) / h;
    // Heat flows down (against the gradient): in from above, k_t·(−∂T/∂z); out below, k_f·(−∂T/∂z).
    const netInWm2 = -p.conductivityThawedWmK * gradThawed + p.conductivityFrozenWmK * gradFrozen;
    const dt = 60;
    const speed = (n.frontDepthM(t + dt) - n.frontDepthM(t - dt)) / (2 * dt);
    expect(netInWm2 / (p.latentHeatJm3 * speed)).toBeGreaterThan(0.99);
    expect(netInWm2 / (p.latentHeatJm3 * speed)).toBeLessThan(1.01);
  });
});
