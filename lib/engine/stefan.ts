/**
 * Closed-form thaw depths: Stefan's approximation and the exact two-phase Neumann solution.
 *
 * API: `thawDepthStefan(thawingIndexCDays, conductivityThawedWmK, latentHeatJm3)`,
 * `neumannTwoPhaseThaw({...})` → `{ lambda, frontDepthM(t), temperatureC(z, t) }`, `erf`, `erfc`.
 *
 * References
 * [1] H. S. Carslaw, J. C. Jaeger, Conduction of Heat in Solids, 2nd ed., Oxford, 1959, §11.2.
 * [2] V. J. Lunardini, Heat Transfer in Cold Climates, Van Nostrand Reinhold, 1981 (Stefan solution).
 * [3] M. Abramowitz, I. A. Stegun, Handbook of Mathematical Functions, NBS AMS 55, 1964, 7.1.26.
 */
import { SECONDS_PER_DAY } from './constants';

/**
 * Error function by Abramowitz & Stegun 7.1.26 [3], |error| ≤ 1.5e-7.
 * @param x [-]. @returns erf(x).
 */
export function erf(x: number): number {
  const s = x < 0 ? -1 : 1;
  const a = Math.abs(x);
  const t = 1 / (1 + 0.3275911 * a);
  const y = 1 - ((((1.061405429 * t - 1.453152027) * t + 1.421413741) * t - 0.284496736) * t + 0.254829592) * t * Math.exp(-a * a);
  return s * y;
}

/** Complementary error function 1 − erf(x) [3]. @param x [-]. */
export function erfc(x: number): number {
  return 1 - erf(x);
}

/**
 * Stefan's thaw depth X = √(2 k_t I_t / L), thawed ground at a linear profile, frozen ground at the
 * freezing point, sensible heat neglected [2].
 * @param thawingIndexCDays Surface thawing index [°C d], ≥ 0.
 * @param conductivityThawedWmK [W m-1 K-1], > 0. @param latentHeatJm3 Volumetric latent heat [J m-3], > 0.
 * @returns Thaw depth [m]. Valid for small Stefan numbers C ΔT / L (it over-predicts as the
 *   sensible heat of the thawed layer grows; frozen ground colder than T_f slows thaw further).
 */
export function thawDepthStefan(thawingIndexCDays: number, conductivityThawedWmK: number, latentHeatJm3: number): number {
  if (!(thawingIndexCDays >= 0) || !(conductivityThawedWmK > 0) || !(latentHeatJm3 > 0)) throw new RangeError('thawDepthStefan: index >= 0, k > 0, L > 0');
  return Math.sqrt((2 * conductivityThawedWmK * thawingIndexCDays * SECONDS_PER_DAY) / latentHeatJm3);
}

export interface NeumannThawParams {
  /** Constant surface temperature [°C], > freezing point. */
  surfaceTemperatureC: number;
  /** Initial uniform temperature [°C], ≤ freezing point. */
  initialTemperatureC: number;
  freezingPointC?: number;
  conductivityThawedWmK: number;
  conductivityFrozenWmK: number;
  heatCapacityThawedJm3K: number;
  heatCapacityFrozenJm3K: number;
  latentHeatJm3: number;
}

/**
 * The two-phase Neumann solution of thawing of a half-space [1, §11.2]: front X = 2λ√(α_t t), with
 * λ the root of
 *   k_t ΔT_s e^(−λ²) / (erf λ √(π α_t)) − k_f ΔT_0 e^(−μ²) / (erfc μ √(π α_f)) = L λ √α_t,
 *   μ = λ √(α_t/α_f), ΔT_s = T_s − T_f, ΔT_0 = T_f − T_0.
 * @param p Surface and initial temperatures [°C], freezing point [°C], conductivities [W m-1 K-1],
 *   volumetric heat capacities [J m-3 K-1], volumetric latent heat [J m-3] (> 0).
 * @returns λ [-], the front depth [m] at t [s] and the temperature [°C] at depth z [m] and t [s].
 */
export function neumannTwoPhaseThaw(p: NeumannThawParams): {
  lambda: number;
  frontDepthM(tSeconds: number): number;
  temperatureC(depthM: number, tSeconds: number): number;
} {
  const tf = p.freezingPointC ?? 0;
  const dTs = p.surfaceTemperatureC - tf;
  const dT0 = tf - p.initialTemperatureC;
  if (!(dTs > 0) || !(dT0 >= 0) || !(p.latentHeatJm3 > 0)) throw new RangeError('neumannTwoPhaseThaw: need T_s > T_f >= T_0 and L > 0');
  const at = p.conductivityThawedWmK / p.heatCapacityThawedJm3K;
  const af = p.conductivityFrozenWmK / p.heatCapacityFrozenJm3K;
  const r = Math.sqrt(at / af);
  const f = (l: number) => {
    const mu = l * r;
    const a = (p.conductivityThawedWmK * dTs * Math.exp(-l * l)) / (erf(l) * Math.sqrt(Math.PI * at));
    const b = dT0 > 0 ? (p.conductivityFrozenWmK * dT0 * Math.exp(-mu * mu)) / (erfc(mu) * Math.sqrt(Math.PI * af)) : 0;
    return a - b - p.latentHeatJm3 * l * Math.sqrt(at);
  };
  let lo = 1e-9;
  let hi = 1;
  while (f(hi) > 0 && hi < 1e3) hi *= 2;
  for (let i = 0; i < 200; i++) {
    const mid = 0.5 * (lo + hi);
    if (f(mid) > 0) lo = mid;
    else hi = mid;
  }
  const lambda = 0.5 * (lo + hi);
  return {
    lambda,
    frontDepthM: (t) => 2 * lambda * Math.sqrt(at * t),
    temperatureC: (z, t) => {
      const x = 2 * lambda * Math.sqrt(at * t);
      if (z <= x) return p.surfaceTemperatureC - (dTs * erf(z / (2 * Math.sqrt(at * t)))) / erf(lambda);
      return p.initialTemperatureC + (dT0 * erfc(z / (2 * Math.sqrt(af * t)))) / erfc(lambda * r);
    },
  };
}
