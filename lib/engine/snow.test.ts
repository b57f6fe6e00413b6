import { describe, expect, it } from 'vitest';
import { snowConductivitySturm1997, snowHeatCapacity } from './snow';

describe('snowConductivitySturm1997', () => {
  it("reproduces Sturm et al. (1997)'s regressions (J. Glaciol. 43(143), eqs. for 0.156–0.6 and below)", () => {
    // Issue 3 quotes k(300 kg m-3) ≈ 0.126 W m-1 K-1 (0.138 − 1.01·0.3 + 3.233·0.09 = 0.12597).
    expect(snowConductivitySturm1997(300)).toBeCloseTo(0.12597, 5);
    // ρ = 0.5 g cm-3: 0.138 − 0.505 + 3.233·0.25 = 0.44125 (Sturm et al. 1997, quadratic branch).
    expect(snowConductivitySturm1997(500)).toBeCloseTo(0.44125, 5);
    // ρ = 0.1 g cm-3: 0.023 + 0.0234 = 0.0464 (Sturm et al. 1997, linear branch).
    expect(snowConductivitySturm1997(100)).toBeCloseTo(0.0464, 6);
    // the two branches nearly meet at 0.156 g cm-3 (0.0595 vs 0.0591; Sturm et al. 1997)
    expect(Math.abs(snowConductivitySturm1997(155.999) - snowConductivitySturm1997(156))).toBeLessThan(0.001);
  });
  it('throws outside its documented range rather than extrapolating', () => {
    expect(() => snowConductivitySturm1997(601)).toThrow(RangeError);
    expect(() => snowConductivitySturm1997(10)).toThrow(RangeError);
    expect(() => snowConductivitySturm1997(Number.NaN)).toThrow(RangeError);
  });
  it('heat capacity = ρ c_ice (common practice; c_ice 2090 J kg-1 K-1, Farouki 1981)', () => {
    expect(snowHeatCapacity(300)).toBeCloseTo(300 * 2090, 6);
    expect(() => snowHeatCapacity(700)).toThrow(RangeError);
  });
});
