/**
 * Thermal properties of seasonal snow.
 *
 * API: `snowConductivitySturm1997(densityKgM3)`, `snowHeatCapacity(densityKgM3)`.
 */
import { ICE_SPECIFIC_HEAT_J_KGK } from './constants';

/** Density range accepted by the snow functions [kg m-3] (documented choice: outside it they throw). */
export const SNOW_DENSITY_MIN_KG_M3 = 50;
export const SNOW_DENSITY_MAX_KG_M3 = 600;

/**
 * Effective thermal conductivity of seasonal snow from its density (Sturm et al. 1997 [1]):
 * with ρ in g cm-3, k = 0.138 − 1.01 ρ + 3.233 ρ² for 0.156 ≤ ρ ≤ 0.6, and k = 0.023 + 0.234 ρ
 * for ρ < 0.156.
 * @param densityKgM3 Snow density [kg m-3], valid 50–600 (the regression's data reach 0.6 g cm-3;
 *   below 50 kg m-3 snow is fresh powder outside the data). Outside the range it throws a
 *   RangeError rather than extrapolating (documented choice; callers clamp if they must).
 * @returns Effective conductivity [W m-1 K-1]; k(300) ≈ 0.126.
 * References: [1] M. Sturm, J. Holmgren, M. König, K. Morris, "The thermal conductivity of seasonal
 * snow," J. Glaciol. 43(143), 26–41, 1997, doi:10.3189/S0022143000002781.
 */
export function snowConductivitySturm1997(densityKgM3: number): number {
  if (!(densityKgM3 >= SNOW_DENSITY_MIN_KG_M3 && densityKgM3 <= SNOW_DENSITY_MAX_KG_M3)) {
    throw new RangeError(`snowConductivitySturm1997: density must be in ${SNOW_DENSITY_MIN_KG_M3}–${SNOW_DENSITY_MAX_KG_M3} kg m-3, got ${densityKgM3}`);
  }
  const rho = densityKgM3 / 1000;
  return rho < 0.156 ? 0.023 + 0.234 * rho : 0.138 - 1.01 * rho + 3.233 * rho * rho;
}

/**
 * Volumetric heat capacity of dry snow from its density: C = ρ · c_ice (the air's share, about
 * 1e3 J m-3 K-1, is neglected; common practice).
 * @param densityKgM3 Snow density [kg m-3], 50–600.
 * @returns [J m-3 K-1].
 * References: [1] O. T. Farouki, Thermal properties of soils, CRREL Monograph 81-1, 1981 (c_ice).
 */
export function snowHeatCapacity(densityKgM3: number): number {
  if (!(densityKgM3 >= SNOW_DENSITY_MIN_KG_M3 && densityKgM3 <= SNOW_DENSITY_MAX_KG_M3)) {
    throw new RangeError(`snowHeatCapacity: density must be in ${SNOW_DENSITY_MIN_KG_M3}–${SNOW_DENSITY_MAX_KG_M3} kg m-3, got ${densityKgM3}`);
  }
  return densityKgM3 * ICE_SPECIFIC_HEAT_J_KGK;
}
