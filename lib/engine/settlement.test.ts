import { describe, expect, it } from 'vitest';
import { thawStrainProfile, layerThawStrain, excessIceForClass, thawStrainFromDryDensities, meanStrainBetween } from './ground-ice';
import { cumulativeSettlement, settlementBetween } from './settlement';
import { TEXTURES, ICE_CLASSES } from './site-schema';

// A hand-worked column (values of our own choosing):
//   0–1 m  Nbn (no excess ice, ASTM D4083)          ε = 0
//   1–3 m  ρd frozen 1000, thawed 1250 kg m-3       ε = 1 − 1000/1250 = 0.20 (Andersland & Ladanyi 2004, ch. 11)
//   3–10 m measured excess ice 0.05                 ε = 0.05 (Andersland & Ladanyi 2004, ch. 11)
const profile = thawStrainProfile([
  { thickness_m: 1, texture: 'silt', ice_class: 'Nbn' },
  { thickness_m: 2, texture: 'silt', ice_class: 'Vs', frozen_dry_density_kg_m3: 1000, thawed_dry_density_kg_m3: 1250 },
  { thickness_m: 7, texture: 'till', ice_class: 'unknown', excess_ice_content: 0.05 },
]);

describe('settlement, hand-computed example (S = Σ ε Δz, Andersland & Ladanyi 2004, ch. 11)', () => {
  it('sums strain over the newly thawed thickness below the baseline table', () => {
    // Baseline table 0.8 m; thaw to 1.5 m: 0.2 m of ε=0 then 0.5 m of ε=0.2 → 0.10 m (by hand).
    expect(settlementBetween(profile, 0.8, 1.5)).toBeCloseTo(0.1, 12);
    // Thaw to 3.5 m: 0.2 × 2 + 0.05 × 0.5 = 0.425 m (by hand).
    expect(settlementBetween(profile, 0.8, 3.5)).toBeCloseTo(0.425, 12);
    // No thaw below the baseline table: no settlement (by definition).
    expect(settlementBetween(profile, 0.8, 0.6)).toBe(0);
  });

  it('is cumulative from the deepest thaw reached so far and never decreases', () => {
    // Years with deepest thaw 0.8, 1.5, 1.2, 3.5, 2.0 m → 0, 0.10, 0.10, 0.425, 0.425 m (by hand).
    const s = cumulativeSettlement(profile, 0.8, [0.8, 1.5, 1.2, 3.5, 2.0]);
    const expected = [0, 0.1, 0.1, 0.425, 0.425];
    s.forEach((v, i) => expect(v).toBeCloseTo(expected[i], 12));
    for (let i = 1; i < s.length; i++) expect(s[i]).toBeGreaterThanOrEqual(s[i - 1]);
  });
});

describe('ground ice (ASTM D4083 classes; Andersland & Ladanyi 2004; Shur et al. 2005)', () => {
  it('takes the density-based strain first, then measured excess ice, then the class', () => {
    // ε = 1 − ρf/ρt (Andersland & Ladanyi 2004, ch. 11): 1 − 1200/1500 = 0.2.
    expect(thawStrainFromDryDensities(1200, 1500)).toBeCloseTo(0.2, 12);
    const both = layerThawStrain({ texture: 'silt', ice_class: 'ICE', excess_ice_content: 0.4, frozen_dry_density_kg_m3: 1200, thawed_dry_density_kg_m3: 1500 });
    expect(both).toMatchObject({ basis: 'densities' });
    expect(both.strain).toBeCloseTo(0.2, 12);
    expect(layerThawStrain({ texture: 'silt', ice_class: 'ICE', excess_ice_content: 0.4 })).toMatchObject({ strain: 0.4, basis: 'measured_excess_ice' });
    expect(layerThawStrain({ texture: 'silt', ice_class: 'Vs' }).basis).toBe('ice_class');
  });

  it('an unknown ice class is never taken as ice-free (Shur, Hinkel & Nelson 2005, doi:10.1002/ppp.518)', () => {
    for (const t of TEXTURES) {
      const r = excessIceForClass('unknown', t);
      expect(r.central).toBeGreaterThan(0);
      expect(r.basis).toBe('assumed_unknown');
    }
  });

  it('no-excess-ice classes hold none and the ice group holds most (ASTM D4083 class definitions)', () => {
    expect(excessIceForClass('Nbn', 'silt').central).toBe(0);
    expect(excessIceForClass('Nf', 'silt').central).toBe(0);
    // Visible ice grows from V to ICE (ASTM D4083 group order); ranges are common practice, from memory.
    const order = ['Nbe', 'Vx', 'Vr', 'Vs', 'ICE+soil', 'ICE'] as const;
    for (let i = 1; i < order.length; i++) {
      expect(excessIceForClass(order[i], 'silt').central).toBeGreaterThan(excessIceForClass(order[i - 1], 'silt').central);
    }
    for (const c of ICE_CLASSES) {
      const r = excessIceForClass(c, 'silt');
      expect(r.low).toBeLessThanOrEqual(r.central);
      expect(r.central).toBeLessThanOrEqual(r.high);
      expect(r.high).toBeLessThanOrEqual(1);
    }
  });

  it('averages strain by thickness (by hand: 1–3 m at 0.2 over 0.5–2.5 m → (1.5 × 0.2)/2 = 0.15)', () => {
    expect(meanStrainBetween(profile, 0.5, 2.5)).toBeCloseTo(0.15, 12);
  });
});
