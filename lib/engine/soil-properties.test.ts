import { describe, expect, it } from 'vitest';
import {
  TEXTURES,
  andersonTiceParametersFromSpecificSurface,
  conductivityJohansen1975,
  conductivityPeatFarouki1981,
  freezingCurveMaterial,
  freezingPointSeawaterUnesco1983,
  heatCapacityFromConstituents,
  porosityFromDryDensity,
  soilThermalProperties,
  unfrozenWaterAndersonTice1972,
  volumetricLatentHeat,
} from './soil-properties';
import { TEXTURES as SCHEMA_TEXTURES } from './site-schema';

describe('soil properties', () => {
  it('the texture list is the site schema’s', () => {
    expect([...TEXTURES]).toEqual([...SCHEMA_TEXTURES]);
  });

  it('Johansen (1975): dry and saturated limits', () => {
    // Dry (Sr = 0): k_dry = (0.135 ρd + 64.7)/(2700 − 0.947 ρd); ρd = 1600 → 0.2369 (Johansen 1975, in Farouki 1981).
    const n = porosityFromDryDensity(1600);
    const dry = conductivityJohansen1975({ texture: 'sand', dryDensityKgM3: 1600, porosity: n, saturation: 0, liquidFraction: 1, frozen: false });
    expect(dry).toBeCloseTo((0.135 * 1600 + 64.7) / (2700 - 0.947 * 1600), 6);
    // Saturated thawed sand (q = 0.9): k = k_s^(1−n) k_w^n with k_s = 7.7^0.9 · 2.0^0.1 (Johansen 1975).
    const ks = 7.7 ** 0.9 * 2.0 ** 0.1;
    const sat = conductivityJohansen1975({ texture: 'sand', dryDensityKgM3: 1600, porosity: n, saturation: 1, liquidFraction: 1, frozen: false });
    expect(sat).toBeCloseTo(ks ** (1 - n) * 0.57 ** n, 6);
    const satFrozen = conductivityJohansen1975({ texture: 'sand', dryDensityKgM3: 1600, porosity: n, saturation: 1, liquidFraction: 0, frozen: true });
    expect(satFrozen).toBeCloseTo(ks ** (1 - n) * 2.2 ** n, 6);
    // Kersten number, fine soil, Sr = 0.5: log10(0.5) + 1 = 0.699 (Johansen 1975)
    const nSilt = porosityFromDryDensity(1400);
    const half = conductivityJohansen1975({ texture: 'silt', dryDensityKgM3: 1400, porosity: nSilt, saturation: 0.5, liquidFraction: 1, frozen: false });
    const d = conductivityJohansen1975({ texture: 'silt', dryDensityKgM3: 1400, porosity: nSilt, saturation: 0, liquidFraction: 1, frozen: false });
    const s = conductivityJohansen1975({ texture: 'silt', dryDensityKgM3: 1400, porosity: nSilt, saturation: 1, liquidFraction: 1, frozen: false });
    expect((half - d) / (s - d)).toBeCloseTo(Math.log10(0.5) + 1, 6);
  });

  it('typical values fall in the ranges Farouki (1981) reports (common practice; ranges from memory)', () => {
    const silt = soilThermalProperties({ texture: 'silt', dryDensityKgM3: 1400, volumetricWaterContent: 0.45 });
    expect(silt.conductivityThawedWmK).toBeGreaterThan(1.0);
    expect(silt.conductivityThawedWmK).toBeLessThan(1.8);
    expect(silt.conductivityFrozenWmK).toBeGreaterThan(silt.conductivityThawedWmK); // ice conducts 4× better than water
    const peat = soilThermalProperties({ texture: 'peat', dryDensityKgM3: 150, volumetricWaterContent: 0.7 });
    expect(peat.conductivityThawedWmK).toBeGreaterThan(0.3);
    expect(peat.conductivityThawedWmK).toBeLessThan(0.6);
    expect(peat.conductivityFrozenWmK).toBeGreaterThan(0.8);
    expect(peat.conductivityFrozenWmK).toBeLessThan(2.0);
    expect(conductivityPeatFarouki1981(0.9, 0, 1)).toBeCloseTo(0.05, 6);
  });

  it('heat capacity and latent heat from constituents (de Vries, in Farouki 1981)', () => {
    // water alone: 1000 × 4180 J m-3 K-1 per unit water content
    expect(heatCapacityFromConstituents({ dryDensityKgM3: 0, organicContent: 0, liquidWater: 1, iceAsWater: 0 })).toBeCloseTo(4.18e6, 0);
    expect(heatCapacityFromConstituents({ dryDensityKgM3: 1000, organicContent: 0, liquidWater: 0, iceAsWater: 0 })).toBeCloseTo(7.5e5, 0);
    // L = ρ_w L_f θ, L_f = 333.55 kJ kg-1
    expect(volumetricLatentHeat(0.3)).toBeCloseTo(0.3 * 1000 * 333550, 3);
  });

  it('freezing point of saline pore water (UNESCO 1983: −1.922 °C at S = 35)', () => {
    expect(freezingPointSeawaterUnesco1983(0)).toBe(0);
    expect(freezingPointSeawaterUnesco1983(35)).toBeCloseTo(-1.922, 2);
    expect(soilThermalProperties({ texture: 'clay', dryDensityKgM3: 1300, volumetricWaterContent: 0.45, salinityPpt: 35 }).freezingPointC).toBeCloseTo(-1.922, 2);
    expect(() => freezingPointSeawaterUnesco1983(-1)).toThrow(RangeError);
  });

  it('Anderson & Tice (1972) power law and its surface-area regression', () => {
    // w_u = α θ^−β: at θ = 1 K it is α; it falls with colder temperature
    expect(unfrozenWaterAndersonTice1972(1, 0.1, 0.5)).toBeCloseTo(0.1, 12);
    expect(unfrozenWaterAndersonTice1972(4, 0.1, 0.5)).toBeCloseTo(0.05, 12);
    // more surface area, more unfrozen water (Anderson & Tice 1972)
    const clay = andersonTiceParametersFromSpecificSurface(100);
    const silt = andersonTiceParametersFromSpecificSurface(10);
    expect(unfrozenWaterAndersonTice1972(2, clay.alpha, clay.beta)).toBeGreaterThan(unfrozenWaterAndersonTice1972(2, silt.alpha, silt.beta));
  });

  it('the unfrozen-water material is monotone and holds the whole latent heat between −40 °C and T_f', () => {
    const d = { texture: 'clay' as const, dryDensityKgM3: 1300, volumetricWaterContent: 0.45 };
    const m = freezingCurveMaterial(d);
    for (let i = 1; i < m.temperatureC.length; i++) {
      expect(m.temperatureC[i]).toBeGreaterThan(m.temperatureC[i - 1]);
      expect(m.enthalpyJm3[i]).toBeGreaterThan(m.enthalpyJm3[i - 1]);
    }
    const p = soilThermalProperties(d);
    const span = m.enthalpyJm3[m.enthalpyJm3.length - 1] - m.enthalpyJm3[0];
    // total = latent heat (less what is still liquid at −40 °C) + sensible heat over 40 K
    expect(span).toBeGreaterThan(0.8 * p.latentHeatJm3 + 40 * p.heatCapacityFrozenJm3K);
    expect(span).toBeLessThan(p.latentHeatJm3 + 40 * p.heatCapacityThawedJm3K);
  });
});
