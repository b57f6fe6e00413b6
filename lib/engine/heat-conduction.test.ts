/**
 * HeatConductionColumn on the production grid (grid.ts defaults): energy conservation, snow
 * sanity, unfrozen-water materials, state caching.
 */
import { describe, expect, it } from 'vitest';
import { buildColumnGrid } from './grid';
import { HeatConductionColumn, isothermalMaterial, type PhaseChangeMaterial } from './heat-conduction';
import { freezingCurveMaterial, isothermalMaterialFromProperties } from './soil-properties';
import { snowConductivitySturm1997, snowHeatCapacity } from './snow';

const DAY = 86400;

function siteLike(materials: PhaseChangeMaterial[] = []) {
  const grid = buildColumnGrid([0.3, 9.7, 40]);
  const mats = materials.length
    ? materials
    : [
        isothermalMaterial({ conductivityThawedWmK: 0.5, conductivityFrozenWmK: 1.3, heatCapacityThawedJm3K: 3.3e6, heatCapacityFrozenJm3K: 2.0e6, latentHeatJm3: 2.0e8 }),
        isothermalMaterial({ conductivityThawedWmK: 1.2, conductivityFrozenWmK: 1.9, heatCapacityThawedJm3K: 2.6e6, heatCapacityFrozenJm3K: 1.9e6, latentHeatJm3: 1.3e8, freezingPointC: -0.2 }),
        isothermalMaterial({ conductivityThawedWmK: 2.5, conductivityFrozenWmK: 2.6, heatCapacityThawedJm3K: 2.1e6, heatCapacityFrozenJm3K: 2.0e6, latentHeatJm3: 1.0e7 }),
      ];
  return new HeatConductionColumn(grid, mats, { bottomHeatFluxWm2: 0.08 });
}

/** Conductivity of an isothermal material at enthalpy h (frozen below 0, thawed above L, linear between). */
function kOf(m: PhaseChangeMaterial, h: number): number {
  const [h0, h1] = [m.enthalpyJm3[0], m.enthalpyJm3[m.enthalpyJm3.length - 1]];
  if (h <= h0) return m.conductivityWmK[0];
  if (h >= h1) return m.conductivityWmK[m.conductivityWmK.length - 1];
  return m.conductivityWmK[0] + ((h - h0) / (h1 - h0)) * (m.conductivityWmK[1] - m.conductivityWmK[0]);
}

describe('HeatConductionColumn', () => {
  it('conserves energy: heat in through the boundaries = change of enthalpy, within 0.1 %', () => {
    // Common practice (conservative finite volumes, Patankar 1980): the boundary heat is recomputed
    // here from the public state (k from the enthalpy before the step, T after it), independently
    // of the solver's own bookkeeping.
    const col = siteLike();
    col.setTemperatureProfile((z) => -5 + 0.02 * z);
    const e0 = col.totalEnthalpyJm2();
    const g = col.grid;
    const top = col.materials[g.layerIndex[0]];
    let heatIn = 0;
    for (let d = 0; d < 3 * 365; d++) {
      const ts = -1 + 12 * Math.cos((2 * Math.PI * (d - 200)) / 365);
      // the scheme's conductivity is evaluated at the start of the step (semi-implicit, documented)
      const k0 = kOf(top, col.getEnthalpy()[0]);
      col.step(DAY, ts);
      const t0 = col.getTemperatures()[0];
      heatIn += ((2 * k0) / g.thicknessM[0]) * (ts - t0) * DAY + 0.08 * DAY;
    }
    const de = col.totalEnthalpyJm2() - e0;
    expect(Math.abs(de)).toBeGreaterThan(1e7); // a real net change, not a cancelling cycle
    expect(Math.abs(heatIn / de - 1)).toBeLessThanOrEqual(0.001);
    const st = col.statistics();
    expect(Math.abs((st.surfaceHeatInJm2 + st.baseHeatInJm2) / de - 1)).toBeLessThan(1e-9);
    expect(st.nonConvergedSteps).toBe(0);
  });

  it('conserves energy with an unfrozen-water curve (Anderson & Tice 1972 material), within 0.1 %', () => {
    const silt = freezingCurveMaterial({ texture: 'silt', dryDensityKgM3: 1400, volumetricWaterContent: 0.45 });
    const peat = freezingCurveMaterial({ texture: 'peat', dryDensityKgM3: 150, volumetricWaterContent: 0.7 });
    const rock = isothermalMaterialFromProperties({ texture: 'bedrock', dryDensityKgM3: 2600, volumetricWaterContent: 0.01 });
    const col = siteLike([peat, silt, rock]);
    col.setTemperatureProfile(() => -4);
    const e0 = col.totalEnthalpyJm2();
    for (let d = 0; d < 2 * 365; d++) col.step(DAY, -2 + 14 * Math.cos((2 * Math.PI * (d - 200)) / 365));
    const st = col.statistics();
    const de = col.totalEnthalpyJm2() - e0;
    expect(Math.abs((st.surfaceHeatInJm2 + st.baseHeatInJm2) / de - 1)).toBeLessThanOrEqual(0.001);
    expect(st.nonConvergedSteps).toBe(0);
    expect(st.maxThawDepthM).toBeGreaterThan(0.2);
  });

  it('sanity: more snow never gives colder ground (mean annual temperature at 2, 5 and 10 m)', () => {
    // Common practice: snow insulates the ground in winter (e.g. Goodrich 1982, Can. Geotech. J. 19; from memory).
    const rho = 250;
    const snowK = snowConductivitySturm1997(rho);
    const snowC = snowHeatCapacity(rho);
    const magt: number[][] = [];
    for (const depthOfSnow of [0, 0.1, 0.3, 0.6, 1.0]) {
      const col = siteLike();
      col.setTemperatureProfile(() => -4);
      col.setReportingDepths([2, 5, 10]);
      for (let y = 0; y < 8; y++) {
        col.resetStatistics();
        for (let d = 0; d < 365; d++) {
          const ts = -6 + 15 * Math.cos((2 * Math.PI * (d - 200)) / 365);
          const winter = d < 140 || d > 290; // snow from mid-October to mid-May (day 0 = 1 January)
          col.step(DAY, ts, winter && depthOfSnow > 0 ? { thicknessM: depthOfSnow, conductivityWmK: snowK, heatCapacityJm3K: snowC } : null);
        }
      }
      magt.push(Array.from(col.statistics().meanTemperatureC));
    }
    for (let i = 1; i < magt.length; i++) magt[i].forEach((v, j) => expect(v).toBeGreaterThanOrEqual(magt[i - 1][j] - 1e-6));
    expect(magt[magt.length - 1][1] - magt[0][1]).toBeGreaterThan(1); // and the effect is not nil
  });

  it('with snow, the soil budget closes: heat through the snow–soil interface and the base = change of soil enthalpy', () => {
    // Common practice (conservative finite volumes, Patankar 1980); snow from Sturm et al. 1997.
    const col = siteLike();
    col.setTemperatureProfile(() => -3);
    const e0 = col.totalEnthalpyJm2();
    const snow = { thicknessM: 0.4, conductivityWmK: snowConductivitySturm1997(280), heatCapacityJm3K: snowHeatCapacity(280) };
    for (let d = 0; d < 2 * 365; d++) {
      const ts = -5 + 14 * Math.cos((2 * Math.PI * ((d % 365) - 200)) / 365);
      col.step(DAY, ts, ts < 0 ? snow : null);
    }
    const st = col.statistics();
    const de = col.totalEnthalpyJm2() - e0;
    expect(Math.abs((st.surfaceHeatInJm2 + st.baseHeatInJm2 - de) / Math.max(Math.abs(de), 1e6))).toBeLessThan(1e-9);
    expect(st.nonConvergedSteps).toBe(0);
  });

  it('getState/setState restore a cached state exactly (same result after the same steps)', () => {
    const col = siteLike();
    col.setTemperatureProfile(() => -3);
    for (let d = 0; d < 200; d++) col.step(DAY, -3 + 10 * Math.cos((2 * Math.PI * d) / 365));
    const saved = col.getState();
    const run = () => {
      for (let d = 0; d < 100; d++) col.step(DAY, 5);
      return col.getTemperatures();
    };
    const a = run();
    col.setState(saved);
    const b = run();
    expect(Array.from(b)).toEqual(Array.from(a));
    expect(saved.enthalpyJm3).not.toBe(col.getEnthalpy()); // copies, not views
  });

  it('a node exactly at the freezing point starts frozen (engine contract)', () => {
    const grid = buildColumnGrid([5]);
    const col = new HeatConductionColumn(grid, [isothermalMaterial({ conductivityThawedWmK: 1, conductivityFrozenWmK: 1, heatCapacityThawedJm3K: 2e6, heatCapacityFrozenJm3K: 2e6, latentHeatJm3: 1e8 })]);
    col.setTemperatureProfile(() => 0);
    expect(Array.from(col.getEnthalpy()).every((h) => h === 0)).toBe(true);
    col.step(DAY, 0);
    expect(col.thawDepthM()).toBe(0);
  });
});
