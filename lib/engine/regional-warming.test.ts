import { describe, expect, it } from 'vitest';
import { ATLAS_SEASONAL_FACTORS, atlasRegionFor, monthlyFromSeasonalFactors, regionalFactorsFor, siteRegionalFactors } from './regional-warming';
import { EngineInputError } from './validation';

describe('regional warming factors (AR6 WG1 Atlas land regions)', () => {
  it('box lookup picks the documented region for known places (coordinates common knowledge)', () => {
    expect(atlasRegionFor(68.36, -133.72)).toBe('NWN'); // Inuvik area
    expect(atlasRegionFor(64.84, -147.72)).toBe('NWN'); // Fairbanks
    expect(atlasRegionFor(63.75, -68.52)).toBe('NEN'); // Iqaluit
    expect(atlasRegionFor(69.22, -51.1)).toBe('GIC'); // Ilulissat
    expect(atlasRegionFor(76.53, -68.7)).toBe('GIC'); // Pituffik
    expect(atlasRegionFor(69.65, 18.96)).toBe('NEU'); // Tromsø
    expect(atlasRegionFor(78.22, 15.65)).toBe('RAR'); // Longyearbyen (documented choice)
    expect(atlasRegionFor(67.5, 64.0)).toBe('RAR'); // Vorkuta
    expect(atlasRegionFor(66.53, 66.6)).toBe('RAR'); // Salekhard
    expect(atlasRegionFor(61.25, 73.4)).toBe('WSB'); // Surgut
    expect(atlasRegionFor(62.03, 129.73)).toBe('ESB'); // Yakutsk
    expect(atlasRegionFor(59.56, 150.8)).toBe('RFE'); // Magadan
    expect(atlasRegionFor(64.73, 177.5)).toBe('RFE'); // Anadyr
    expect(atlasRegionFor(69.38, 88.2)).toBe('RAR'); // Norilsk
  });

  it('winter is amplified much more than summer in every region (AR6 WG1 Atlas / ch. 4: Arctic-land DJF ≫ JJA)', () => {
    for (const [, [djf, , jja]] of Object.entries(ATLAS_SEASONAL_FACTORS)) {
      expect(djf).toBeGreaterThan(1.5 * jja);
      expect(jja).toBeGreaterThanOrEqual(1);
    }
    const f = regionalFactorsFor(68.36, -133.72).monthly;
    expect(f[0]).toBeGreaterThan(f[6] * 1.5);
  });

  it('no land factor approaches the whole-Arctic ~4x of Rantanen et al. 2022 on an annual mean (it includes ocean and sea ice)', () => {
    for (const seasonal of Object.values(ATLAS_SEASONAL_FACTORS)) {
      const m = monthlyFromSeasonalFactors(seasonal);
      const annual = m.reduce((a, b) => a + b, 0) / 12;
      expect(annual).toBeLessThan(3);
      expect(annual).toBeGreaterThan(1);
    }
  });

  it('1-2-1 smoothing keeps the annual mean of the season steps', () => {
    const s = [3, 2, 1, 2.5] as const;
    const m = monthlyFromSeasonalFactors(s);
    const stepMean = (3 * 3 + 2 * 3 + 1 * 3 + 2.5 * 3) / 12;
    expect(m.reduce((a, b) => a + b, 0) / 12).toBeCloseTo(stepMean, 12);
    expect(m).toHaveLength(12);
  });

  it('site override replaces the default; bad input is refused', () => {
    const own = [2, 2, 2, 1.5, 1.2, 1, 1, 1, 1.2, 1.5, 2, 2];
    expect(siteRegionalFactors(68, -133, own).monthly).toEqual(own);
    expect(() => siteRegionalFactors(68, -133, [1, 2])).toThrow(EngineInputError);
    expect(() => regionalFactorsFor(40, 0)).toThrow(EngineInputError);
    expect(regionalFactorsFor(50, 100).source).toMatch(/coarser/);
    expect(regionalFactorsFor(68, -133).source).toMatch(/from memory/);
  });
});
