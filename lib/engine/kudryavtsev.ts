/**
 * The Kudryavtsev method for the active layer and the temperature at the top of permafrost.
 *
 * API: `temperatureTopOfPermafrostKudryavtsev(...)`, `activeLayerKudryavtsev(...)`.
 *
 * The method takes the ground-surface temperature as a sinusoid (mean T_s, amplitude A_s, period P)
 * over homogeneous ground; snow and vegetation are applied before it (here: by the caller).
 * Formulas as given by Romanovsky & Osterkamp [1] and Anisimov et al. [2] (transcribed from
 * memory and checked here: the thermal-offset term reduces to the sinusoid's thawing and freezing
 * indices, see `temperatureTopOfPermafrostKudryavtsev`).
 *
 * References
 * [1] V. E. Romanovsky, T. E. Osterkamp, "Thawing of the active layer on the coastal plain of the
 *     Alaskan Arctic," Permafrost Periglac. Process. 8(1), 1–22, 1997,
 *     doi:10.1002/(SICI)1099-1530(199701)8:1<1::AID-PPP243>3.0.CO;2-U.
 * [2] O. A. Anisimov, N. I. Shiklomanov, F. E. Nelson, "Global warming and active-layer thickness:
 *     results from transient general circulation models," Global Planet. Change 15(3–4), 61–77,
 *     1997, doi:10.1016/S0921-8181(97)00009-X.
 */
import { SECONDS_PER_DAY, DAYS_PER_YEAR } from './constants';

/**
 * Mean annual temperature at the top of permafrost (the thermal offset) [1, 2]:
 *   T_z = [½ T_s (k_f + k_t) + A_s (k_t − k_f)/π · (x·arcsin x + √(1 − x²))] / k*,  x = T_s / A_s,
 * with k* = k_f if the numerator is ≤ 0 (permafrost), k_t otherwise. The bracket is the sinusoid's
 * mean positive part: ½T_s + (A_s/π)(x·arcsin x + √(1−x²)) = DDT/P, so the numerator is
 * (k_t·DDT − k_f·DDF)/P. For |T_s| ≥ A_s the surface never thaws (T_s ≤ −A_s: T_z = T_s) or never
 * freezes (T_s ≥ A_s: T_z = T_s); never NaN.
 * @param meanSurfaceC T_s [°C]. @param amplitudeSurfaceC A_s [K], ≥ 0.
 * @param conductivityThawedWmK k_t, @param conductivityFrozenWmK k_f [W m-1 K-1].
 * @returns T_z [°C].
 */
export function temperatureTopOfPermafrostKudryavtsev(meanSurfaceC: number, amplitudeSurfaceC: number, conductivityThawedWmK: number, conductivityFrozenWmK: number): number {
  const ts = meanSurfaceC;
  const as = amplitudeSurfaceC;
  if (!(as >= 0)) throw new RangeError('Kudryavtsev: amplitude must be >= 0');
  if (as === 0 || Math.abs(ts) >= as) return ts;
  const x = ts / as;
  const kt = conductivityThawedWmK;
  const kf = conductivityFrozenWmK;
  const num = 0.5 * ts * (kf + kt) + ((as * (kt - kf)) / Math.PI) * (x * Math.asin(x) + Math.sqrt(1 - x * x));
  return num / (num <= 0 ? kf : kt);
}

export interface KudryavtsevResult {
  /** Mean annual temperature at the top of permafrost (or of seasonally frozen ground) [°C]. */
  temperatureTopC: number;
  /** True if T_z ≤ 0 (permafrost). */
  permafrost: boolean;
  /** Seasonal thaw depth over permafrost [m] (0 if the surface never thaws); null without permafrost. */
  activeLayerThicknessM: number | null;
  /** Seasonal freezing depth without permafrost [m]; null with permafrost. */
  seasonalFreezingDepthM: number | null;
}

/**
 * Active-layer thickness by the Kudryavtsev method [1, 2]:
 *   A_z = (A_s − |T_z|) / ln[(A_s + L/2C) / (|T_z| + L/2C)] − L/2C,
 *   Z_c = 2 (A_s − |T_z|) √(k P C/π) / (2 A_z C + L),
 *   Z = [2 (A_s − |T_z|) √(k P C/π) + (2 A_z C + L) Z_c · L √(k P/(π C)) / ((2 A_z C + L) Z_c + (2 A_z C + L) √(k P/(π C)))] / (2 A_z C + L),
 * where the second term's numerator and denominator are (2A_zC Z_c + L Z_c) and
 * (2A_zC Z_c + L Z_c + (2A_zC + L)√(kP/(πC))); k and C are the thawed values over permafrost
 * (T_z ≤ 0) and the frozen values for seasonal freezing (T_z > 0).
 * @param p Mean T_s [°C] and amplitude A_s [K] of the ground-surface temperature; thawed and frozen
 *   conductivities [W m-1 K-1] and volumetric heat capacities [J m-3 K-1]; volumetric latent heat
 *   L [J m-3] (> 0); period [d] (default 365).
 * @returns T_z, the permafrost flag and the depth. |T_s| ≥ A_s gives 0 (no thaw, or no freezing),
 *   never NaN. Validity: homogeneous ground, sinusoidal forcing. Against this engine's numerical
 *   solver (kudryavtsev.test.ts) it agrees within 1 % for a dry gravel pad, under-predicts by 14 %
 *   for an ice-rich silt (L/2C ≈ 22 K, A_s 15 K) and by 32 % for a wet peat (L/2C ≈ 30 K, A_s 9 K):
 *   the shortfall grows with L/2C relative to A_s (for large L it falls off as 1/L where Stefan's
 *   estimate falls off as 1/√L). The formula is transcribed from memory; this behaviour should be
 *   checked against [1, 2] before the method is relied on for wet organic ground.
 */
export function activeLayerKudryavtsev(p: {
  meanSurfaceC: number;
  amplitudeSurfaceC: number;
  conductivityThawedWmK: number;
  conductivityFrozenWmK: number;
  heatCapacityThawedJm3K: number;
  heatCapacityFrozenJm3K: number;
  latentHeatJm3: number;
  periodDays?: number;
}): KudryavtsevResult {
  if (!(p.latentHeatJm3 > 0)) throw new RangeError('activeLayerKudryavtsev: latent heat must be > 0');
  const tz = temperatureTopOfPermafrostKudryavtsev(p.meanSurfaceC, p.amplitudeSurfaceC, p.conductivityThawedWmK, p.conductivityFrozenWmK);
  const permafrost = tz <= 0;
  const k = permafrost ? p.conductivityThawedWmK : p.conductivityFrozenWmK;
  const c = permafrost ? p.heatCapacityThawedJm3K : p.heatCapacityFrozenJm3K;
  const l = p.latentHeatJm3;
  const period = (p.periodDays ?? DAYS_PER_YEAR) * SECONDS_PER_DAY;
  const as = p.amplitudeSurfaceC;
  const atz = Math.abs(tz);
  let depth = 0;
  if (as - atz > 0) {
    const q = l / (2 * c);
    const az = (as - atz) / Math.log((as + q) / (atz + q)) - q;
    const s1 = Math.sqrt((k * period * c) / Math.PI);
    const s2 = Math.sqrt((k * period) / (Math.PI * c));
    const b = 2 * az * c + l;
    const zc = (2 * (as - atz) * s1) / b;
    depth = (2 * (as - atz) * s1 + ((b * zc) * l * s2) / (b * zc + b * s2)) / b;
  }
  return {
    temperatureTopC: tz,
    permafrost,
    activeLayerThicknessM: permafrost ? depth : null,
    seasonalFreezingDepthM: permafrost ? null : depth,
  };
}
