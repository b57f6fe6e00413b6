/**
 * Ground ice: excess-ice content from the visual ice class of frozen soil (ASTM D4083), a measured
 * excess-ice content, or frozen and thawed dry densities; and the thaw strain of each layer.
 *
 * API:
 * - `excessIceForClass(iceClass, texture)` → `{ low, central, high, basis }` excess-ice fraction [-].
 * - `layerThawStrain(layer)` → `{ strain, low, high, basis }` thaw strain [-] of one schema layer.
 * - `thawStrainProfile(layers)` → contiguous `{ top_m, bottom_m, strain, basis }` intervals.
 *
 * References:
 * [1] ASTM D4083-89 (reapproved), Standard Practice for Description of Frozen Soils (Visual-Manual
 *     Procedure). ASTM International.
 * [2] O. B. Andersland, B. Ladanyi, Frozen Ground Engineering, 2nd ed., Wiley/ASCE, 2004 (ch. 11,
 *     thaw settlement: strain from excess ice and from frozen/thawed dry density).
 * [3] Y. Shur, K. M. Hinkel, F. E. Nelson, "The transient layer: implications for geocryology and
 *     climate-change science," Permafrost Periglac. Process. 16, 5–17, 2005, doi:10.1002/ppp.518.
 */
import type { IceClass, SiteLayer, Texture } from './site-schema';

/** Where an excess-ice value comes from, from the most to the least direct. */
export type IceBasis = 'densities' | 'measured_excess_ice' | 'ice_class' | 'assumed_unknown';

export interface ExcessIceRange {
  /** Lower end of the range [m3 m-3]. */
  low: number;
  /** Value the engine uses [m3 m-3]. */
  central: number;
  /** Upper end of the range [m3 m-3]. */
  high: number;
  basis: IceBasis;
}

/**
 * Excess-ice fraction (volume of ice in excess of the thawed pore volume, per unit frozen volume)
 * by ASTM D4083 class [1]. The standard describes the ice, it does not quantify it: these ranges
 * are common practice in northern geotechnical screening, set here from memory, and should be
 * replaced by measured values (excess_ice_content or densities) where a borehole log has them.
 * - N group (ice not visible): Nf and Nbn hold no excess ice by definition [1]; Nbe does, but
 *   little, since it is not visible.
 * - V group (visible ice < 25 mm): from scattered crystals and coatings (Vx, Vc) to random (Vr)
 *   and stratified lenses (Vs), the most ice-rich of the group.
 * - ICE group (> 25 mm): ice with soil inclusions, and nearly pure ice.
 */
const CLASS_RANGES: Record<Exclude<IceClass, 'unknown'>, [number, number, number]> = {
  Nf: [0, 0, 0],
  Nbn: [0, 0, 0],
  Nbe: [0, 0.05, 0.1],
  Vx: [0.05, 0.1, 0.2],
  Vc: [0.05, 0.1, 0.2],
  Vr: [0.1, 0.2, 0.3],
  Vs: [0.2, 0.3, 0.5],
  'ICE+soil': [0.5, 0.7, 0.9],
  ICE: [0.9, 0.95, 1.0],
};

/**
 * Assumed excess ice for an undescribed layer, by texture. Never zero: the ground just below the
 * active layer is often the most ice-rich (the ice-rich transition zone, [3]), and fine-grained
 * frost-susceptible soils (silt, clay, peat, till) build segregated ice. Values from memory,
 * common practice: a cautious middle of the V group for fine-grained soils, a little for coarse
 * soils (pore ice, rare lenses) and bedrock (ice in joints).
 */
const UNKNOWN_BY_TEXTURE: Record<Texture, [number, number, number]> = {
  silt: [0.1, 0.2, 0.4],
  clay: [0.1, 0.2, 0.4],
  peat: [0.1, 0.2, 0.5],
  till: [0.05, 0.15, 0.3],
  sand: [0.02, 0.05, 0.15],
  gravel: [0.0, 0.03, 0.1],
  bedrock: [0.0, 0.02, 0.05],
};

/**
 * Excess-ice fraction of a layer from its visual ice class.
 * @param iceClass ASTM D4083 class code, or "unknown" [1].
 * @param texture Soil texture, used only when the class is unknown.
 * @returns Range and central value of the excess-ice fraction [m3 m-3]; `basis` is "assumed_unknown"
 *   for an unknown class (never zero, [3]).
 */
export function excessIceForClass(iceClass: IceClass, texture: Texture): ExcessIceRange {
  if (iceClass === 'unknown') {
    const [low, central, high] = UNKNOWN_BY_TEXTURE[texture];
    return { low, central, high, basis: 'assumed_unknown' };
  }
  const [low, central, high] = CLASS_RANGES[iceClass];
  return { low, central, high, basis: 'ice_class' };
}

/**
 * Thaw strain from frozen and thawed dry densities [2, ch. 11]: ε = 1 − ρd,frozen / ρd,thawed, the
 * relative loss of thickness when the frozen layer thaws and consolidates at constant solid mass.
 * @param frozenDryDensityKgM3 Dry density of the frozen soil [kg m-3].
 * @param thawedDryDensityKgM3 Dry density after thaw and consolidation [kg m-3], ≥ the frozen one.
 * @returns Thaw strain [-], 0 … 1 (clamped at 0 if the thawed density is the smaller).
 */
export function thawStrainFromDryDensities(frozenDryDensityKgM3: number, thawedDryDensityKgM3: number): number {
  if (!(frozenDryDensityKgM3 > 0) || !(thawedDryDensityKgM3 > 0)) throw new RangeError('dry densities must be > 0');
  return Math.max(0, 1 - frozenDryDensityKgM3 / thawedDryDensityKgM3);
}

export interface LayerThawStrain {
  /** Thaw strain the engine uses [-]. */
  strain: number;
  /** Lower end of its range [-] (equal to `strain` for measured values). */
  low: number;
  /** Upper end of its range [-]. */
  high: number;
  basis: IceBasis;
}

/**
 * Thaw strain of one layer: from frozen/thawed dry densities where both are given [2]; else the
 * measured excess-ice fraction (thaw strain ≈ excess-ice fraction when the melt water of the excess
 * ice drains and the skeleton does not consolidate further, [2]); else the ice-class range, with an
 * undescribed class never taken as ice-free [3].
 * @param layer A validated site layer (dimensionless fractions and densities in kg m-3).
 * @returns The strain [-], its range [-] and the basis of the value.
 */
export function layerThawStrain(
  layer: Pick<SiteLayer, 'ice_class' | 'texture' | 'excess_ice_content' | 'frozen_dry_density_kg_m3' | 'thawed_dry_density_kg_m3'>,
): LayerThawStrain {
  if (layer.frozen_dry_density_kg_m3 !== undefined && layer.thawed_dry_density_kg_m3 !== undefined) {
    const s = thawStrainFromDryDensities(layer.frozen_dry_density_kg_m3, layer.thawed_dry_density_kg_m3);
    return { strain: s, low: s, high: s, basis: 'densities' };
  }
  if (layer.excess_ice_content !== undefined) {
    const s = layer.excess_ice_content;
    return { strain: s, low: s, high: s, basis: 'measured_excess_ice' };
  }
  const r = excessIceForClass(layer.ice_class ?? 'unknown', layer.texture);
  return { strain: r.central, low: r.low, high: r.high, basis: r.basis };
}

export interface StrainInterval extends LayerThawStrain {
  /** Depth of the top of the interval [m]. */
  top_m: number;
  /** Depth of its bottom [m]. */
  bottom_m: number;
}

/**
 * Thaw-strain profile of a layered column, top to bottom, in frozen-state depth coordinates.
 * @param layers Layers with `thickness_m` [m] and their ice description.
 * @returns Contiguous intervals from 0 to the column depth [m] with their strain [-].
 */
export function thawStrainProfile(
  layers: ReadonlyArray<Pick<SiteLayer, 'thickness_m' | 'ice_class' | 'texture' | 'excess_ice_content' | 'frozen_dry_density_kg_m3' | 'thawed_dry_density_kg_m3'>>,
): StrainInterval[] {
  const out: StrainInterval[] = [];
  let top = 0;
  for (const layer of layers) {
    const bottom = top + layer.thickness_m;
    out.push({ top_m: top, bottom_m: bottom, ...layerThawStrain(layer) });
    top = bottom;
  }
  return out;
}

/**
 * Mean thaw strain over a depth interval [-] (thickness-weighted).
 * @param profile Strain intervals from {@link thawStrainProfile}.
 * @param topM Top of the interval [m]. @param bottomM Bottom [m], > topM.
 * @returns Mean strain [-]; 0 for an empty interval.
 */
export function meanStrainBetween(profile: ReadonlyArray<StrainInterval>, topM: number, bottomM: number): number {
  return bottomM > topM ? strainIntegralBetween(profile, topM, bottomM) / (bottomM - topM) : 0;
}

/**
 * Thaw strain integrated over a depth interval, ∫ ε(z) dz [m] (Andersland & Ladanyi 2004: the
 * settlement of the interval once it has thawed and consolidated).
 * @param profile Strain intervals from {@link thawStrainProfile}.
 * @param topM Top of the interval [m]. @param bottomM Bottom [m].
 * @returns The integral [m]; 0 when bottomM ≤ topM.
 */
export function strainIntegralBetween(profile: ReadonlyArray<StrainInterval>, topM: number, bottomM: number): number {
  if (!(bottomM > topM)) return 0;
  let sum = 0;
  for (const p of profile) {
    const a = Math.max(topM, p.top_m);
    const b = Math.min(bottomM, p.bottom_m);
    if (b > a) sum += (b - a) * p.strain;
  }
  return sum;
}
