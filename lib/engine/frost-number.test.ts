import { describe, expect, it } from 'vitest';
import { airFrostNumberNelsonOutcalt1987, frostNumberClass, surfaceFrostNumberNelsonOutcalt1987 } from './frost-number';

describe('frost numbers (Nelson & Outcalt 1987, Arct. Alp. Res. 19)', () => {
  it('F = √DDF / (√DDF + √DDT)', () => {
    // DDF 2500, DDT 900: 50 / (50 + 30) = 0.625 (Nelson & Outcalt 1987, eq. for the air frost number).
    expect(airFrostNumberNelsonOutcalt1987(2500, 900)).toBeCloseTo(0.625, 12);
    // equal indices give 0.5, the limit of permafrost (Nelson & Outcalt 1987)
    expect(airFrostNumberNelsonOutcalt1987(1000, 1000)).toBe(0.5);
    expect(airFrostNumberNelsonOutcalt1987(1000, 0)).toBe(1);
    expect(airFrostNumberNelsonOutcalt1987(0, 1000)).toBe(0);
    expect(surfaceFrostNumberNelsonOutcalt1987(0.5 * 2500, 0.9 * 900)).toBeCloseTo(Math.sqrt(1250) / (Math.sqrt(1250) + Math.sqrt(810)), 12);
    expect(() => airFrostNumberNelsonOutcalt1987(-1, 10)).toThrow(RangeError);
  });
  it('classes: ≥ 0.67 continuous, 0.6–0.67 discontinuous, 0.5–0.6 sporadic, < 0.5 none (Nelson & Outcalt 1987; limits from memory)', () => {
    expect(frostNumberClass(0.8)).toBe('continuous');
    expect(frostNumberClass(0.67)).toBe('continuous');
    expect(frostNumberClass(0.66)).toBe('discontinuous');
    expect(frostNumberClass(0.6)).toBe('discontinuous');
    expect(frostNumberClass(0.55)).toBe('sporadic');
    expect(frostNumberClass(0.5)).toBe('sporadic');
    expect(frostNumberClass(0.49)).toBe('none');
    expect(frostNumberClass(airFrostNumberNelsonOutcalt1987(2500, 900))).toBe('discontinuous');
    expect(() => frostNumberClass(1.2)).toThrow(RangeError);
  });
});
