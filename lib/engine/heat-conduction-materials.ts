/**
 * Materials of the heat-conduction solver (heat-conduction.ts): a material is a monotone,
 * piecewise-linear enthalpy–temperature curve with conductivity at its breakpoints.
 *
 * API: `isothermalMaterial({...})` (phase change at one temperature, as the `ground` command uses),
 * `tabulatedMaterial({...})` (any monotone curve, e.g. with unfrozen water; soil-properties.ts builds
 * one with `freezingCurveMaterial`), the type `PhaseChangeMaterial`.
 *
 * References
 * [1] V. R. Voller, C. R. Swaminathan, B. G. Thomas, "Fixed grid techniques for phase change problems:
 *     a review," Int. J. Numer. Methods Eng. 30(4), 875–898, 1990 (enthalpy method).
 */

/** A material's enthalpy–temperature–conductivity curve (see `tabulatedMaterial`). */
export interface PhaseChangeMaterial {
  /** Enthalpy at the breakpoints [J m-3], non-decreasing. */
  readonly enthalpyJm3: Float64Array;
  /** Temperature at the breakpoints [°C], non-decreasing. */
  readonly temperatureC: Float64Array;
  /** Conductivity at the breakpoints [W m-1 K-1] (linear in H between them). */
  readonly conductivityWmK: Float64Array;
  /** Volumetric heat capacity below the first breakpoint (frozen) [J m-3 K-1]. */
  readonly heatCapacityBelowJm3K: number;
  /** Volumetric heat capacity above the last breakpoint (thawed) [J m-3 K-1]. */
  readonly heatCapacityAboveJm3K: number;
  /** Ground is thawed where T > this [°C]; a cell exactly at it counts as frozen. */
  readonly freezingPointC: number;
  /** Enthalpy range of the isothermal phase change (flat segment) [J m-3], if there is one. */
  readonly latentRangeJm3: readonly [number, number] | null;
}

/** Properties of a material with phase change at a single temperature. */
export interface IsothermalMaterialParams {
  conductivityThawedWmK: number;
  conductivityFrozenWmK: number;
  heatCapacityThawedJm3K: number;
  heatCapacityFrozenJm3K: number;
  /** Volumetric latent heat [J m-3], ≥ 0 (0: no phase change). */
  latentHeatJm3: number;
  /** [°C], default 0. */
  freezingPointC?: number;
}

/**
 * Material with phase change at one temperature: H = C_f (T − T_f) frozen, H ∈ [0, L] at T_f,
 * H = L + C_t (T − T_f) thawed; conductivity linear in the thawed fraction inside the phase change.
 * @param p Thawed/frozen conductivity [W m-1 K-1] and volumetric heat capacity [J m-3 K-1],
 *   volumetric latent heat [J m-3], freezing point [°C].
 * @returns The material curve; enthalpy reference H = 0 for frozen ground at T_f.
 * References: [1] of this module (enthalpy method).
 */
export function isothermalMaterial(p: IsothermalMaterialParams): PhaseChangeMaterial {
  const tf = p.freezingPointC ?? 0;
  const l = p.latentHeatJm3;
  if (!(p.conductivityThawedWmK > 0 && p.conductivityFrozenWmK > 0 && p.heatCapacityThawedJm3K > 0 && p.heatCapacityFrozenJm3K > 0 && l >= 0)) {
    throw new RangeError('isothermalMaterial: conductivities and heat capacities must be > 0 and latent heat >= 0');
  }
  return {
    enthalpyJm3: Float64Array.of(0, l),
    temperatureC: Float64Array.of(tf, tf),
    conductivityWmK: Float64Array.of(p.conductivityFrozenWmK, p.conductivityThawedWmK),
    heatCapacityBelowJm3K: p.heatCapacityFrozenJm3K,
    heatCapacityAboveJm3K: p.heatCapacityThawedJm3K,
    freezingPointC: tf,
    latentRangeJm3: l > 0 ? [0, l] : null,
  };
}

/**
 * Material from a tabulated curve (e.g. with unfrozen water): breakpoints of T, H and k.
 * @param p Breakpoint temperatures [°C] and enthalpies [J m-3] (both non-decreasing, H strictly
 *   increasing where T increases), conductivities [W m-1 K-1], heat capacities beyond the ends
 *   [J m-3 K-1], freezing point [°C] (thawed above it).
 * @returns The material curve.
 */
export function tabulatedMaterial(p: {
  temperatureC: readonly number[];
  enthalpyJm3: readonly number[];
  conductivityWmK: readonly number[];
  heatCapacityBelowJm3K: number;
  heatCapacityAboveJm3K: number;
  freezingPointC: number;
}): PhaseChangeMaterial {
  const m = p.temperatureC.length;
  if (m < 1 || p.enthalpyJm3.length !== m || p.conductivityWmK.length !== m) throw new RangeError('tabulatedMaterial: arrays must have the same length >= 1');
  for (let i = 1; i < m; i++) {
    if (!(p.temperatureC[i] >= p.temperatureC[i - 1]) || !(p.enthalpyJm3[i] >= p.enthalpyJm3[i - 1])) {
      throw new RangeError('tabulatedMaterial: temperature and enthalpy must be non-decreasing');
    }
  }
  if (!(p.heatCapacityBelowJm3K > 0 && p.heatCapacityAboveJm3K > 0)) throw new RangeError('tabulatedMaterial: heat capacities must be > 0');
  return {
    enthalpyJm3: Float64Array.from(p.enthalpyJm3),
    temperatureC: Float64Array.from(p.temperatureC),
    conductivityWmK: Float64Array.from(p.conductivityWmK),
    heatCapacityBelowJm3K: p.heatCapacityBelowJm3K,
    heatCapacityAboveJm3K: p.heatCapacityAboveJm3K,
    freezingPointC: p.freezingPointC,
    latentRangeJm3: null,
  };
}
