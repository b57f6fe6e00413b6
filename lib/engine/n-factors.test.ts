import { describe, expect, it } from 'vitest';
import { N_FACTORS, SURFACE_COVERS, freezingNFactorWithExplicitSnow } from './n-factors';
import { SURFACE_COVERS as SCHEMA_COVERS } from './site-schema';

describe('n-factors (UFC 3-130-04 / TM 5-852-4; Lunardini 1978; Klene et al. 2001)', () => {
  it('the cover list is the site schema’s', () => {
    expect([...SURFACE_COVERS]).toEqual([...SCHEMA_COVERS]);
  });
  it('every nominal value lies within its published range, and ranges are physical', () => {
    for (const c of SURFACE_COVERS) {
      const e = N_FACTORS[c];
      expect(e.freezing).toBeGreaterThanOrEqual(e.freezingRange[0]);
      expect(e.freezing).toBeLessThanOrEqual(e.freezingRange[1]);
      expect(e.thawing).toBeGreaterThanOrEqual(e.thawingRange[0]);
      expect(e.thawing).toBeLessThanOrEqual(e.thawingRange[1]);
      expect(e.freezingRange[0]).toBeGreaterThan(0);
      expect(e.freezingRange[1]).toBeLessThanOrEqual(1); // a surface is never colder than the air in winter on average
    }
  });
  it('snow-cleared surfaces (roads, airstrips, pads) have thawing n-factors above 1 (UFC 3-130-04); vegetation below', () => {
    for (const c of ['gravel_pad', 'gravel_road', 'paved_road', 'airstrip'] as const) {
      expect(N_FACTORS[c].snowCleared).toBe(true);
      expect(N_FACTORS[c].thawing).toBeGreaterThan(1);
      expect(freezingNFactorWithExplicitSnow(c)).toBe(N_FACTORS[c].freezing);
    }
    for (const c of ['tundra', 'shrub_tundra', 'forest', 'peat'] as const) {
      expect(N_FACTORS[c].snowCleared).toBe(false);
      expect(N_FACTORS[c].thawing).toBeLessThan(1);
      // With snow modelled, the vegetation's freezing n-factor (which includes snow) is not applied
      expect(freezingNFactorWithExplicitSnow(c)).toBe(1);
    }
  });
});
