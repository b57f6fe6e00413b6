import { describe, expect, it } from 'vitest';
import { buildColumnGrid } from './grid';

describe('buildColumnGrid', () => {
  it('is fine at the surface, coarsens with depth, reaches the column depth and puts every layer boundary on a face', () => {
    const layers = [0.3, 1.7, 8, 40.005];
    const g = buildColumnGrid(layers);
    expect(g.thicknessM[0]).toBeCloseTo(0.02, 12);
    expect(g.depthM).toBeCloseTo(50.005, 9);
    expect(g.faceDepthM[g.cellCount]).toBe(g.depthM);
    let top = 0;
    for (let l = 0; l < layers.length; l++) {
      expect(Array.from(g.faceDepthM).some((f) => Math.abs(f - top) < 1e-9)).toBe(true);
      expect(g.layerTopM[l]).toBeCloseTo(top, 9);
      top += layers[l];
    }
    for (let i = 0; i < g.cellCount; i++) {
      expect(g.thicknessM[i]).toBeGreaterThan(0);
      expect(g.thicknessM[i]).toBeLessThanOrEqual(1.5 + 1e-9);
      const z = g.centerDepthM[i];
      let l = 0;
      let acc = layers[0];
      while (z > acc) acc += layers[++l];
      expect(g.layerIndex[i]).toBe(l);
    }
    expect(g.cellCount).toBeGreaterThan(60);
    expect(g.cellCount).toBeLessThan(150);
  });
  it('rejects bad layers and options', () => {
    expect(() => buildColumnGrid([])).toThrow(RangeError);
    expect(() => buildColumnGrid([1, 0])).toThrow(RangeError);
    expect(() => buildColumnGrid([1], { growthFactor: 0.9 })).toThrow(RangeError);
  });
});
