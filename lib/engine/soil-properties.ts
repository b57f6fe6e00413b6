/**
 * Thermal properties of soil and rock layers from their description.
 *
 * API summary
 * - `TEXTURES`, `textureSchema` (zod enum; identical to site-schema.ts's list), `Texture`.
 * - `soilThermalProperties({ texture, dryDensityKgM3, volumetricWaterContent, organicContent?,
 *   salinityPpt? })` → porosity, thawed/frozen conductivity (Johansen 1975 for mineral soils and
 *   rock, Farouki 1981 for peat), thawed/frozen volumetric heat capacity (sum of constituents),
 *   volumetric latent heat, freezing point (depressed by pore-water salinity).
 * - `conductivityJohansen1975(...)`, `conductivityPeatFarouki1981(...)`, `heatCapacityFromConstituents(...)`,
 *   `volumetricLatentHeat(...)`, `freezingPointSeawaterUnesco1983(salinityPpt)`.
 * - Unfrozen water: `unfrozenWaterAndersonTice1972(degreesBelowFreezingK, alpha, beta)`,
 *   `andersonTiceParametersFromSpecificSurface(m2PerG)`, `DEFAULT_SPECIFIC_SURFACE_M2_G`.
 * - Solver materials: `isothermalMaterialFromProperties(props)` and
 *   `freezingCurveMaterial(layer, options)` (with unfrozen water) for heat-conduction.ts.
 *
 * Saline ground: the freezing point is lowered by the pore-water salinity, and part of the pore
 * water stays liquid well below 0 °C. Saline marine silts and clays are weak and creep even when
 * frozen (Hivon & Sego 1995 [7]; Nixon & Lem 1984 [8]): a thermal model that finds them "frozen"
 * says nothing of their bearing capacity.
 *
 * References
 * [1] O. Johansen, Thermal conductivity of soils, PhD thesis, Trondheim, 1975 (CRREL Draft
 *     Translation 637, 1977).
 * [2] O. T. Farouki, Thermal properties of soils, CRREL Monograph 81-1, 1981.
 * [3] D. M. Anderson, A. R. Tice, "Predicting unfrozen water contents in frozen soils from surface
 *     area measurements," Highway Research Record 393, 12–18, 1972.
 * [4] N. P. Fofonoff, R. C. Millard, Algorithms for computation of fundamental properties of
 *     seawater, UNESCO Tech. Pap. Mar. Sci. 44, 1983 (freezing point of seawater).
 * [5] C. D. Peters-Lidard, E. Blackburn, X. Liang, E. F. Wood, "The effect of soil thermal
 *     conductivity parameterization on surface energy fluxes and temperatures," J. Atmos. Sci.
 *     55, 1209–1224, 1998, doi:10.1175/1520-0469(1998)055<1209:TEOSTC>2.0.CO;2 (quartz contents).
 * [6] D. M. Lawrence, A. G. Slater, "Incorporating organic soil into a global climate model,"
 *     Clim. Dyn. 30, 145–160, 2008, doi:10.1007/s00382-007-0278-1 (mixing organic and mineral
 *     properties by the organic fraction).
 * [7] E. C. Hivon, D. C. Sego, "Strength of frozen saline soils," Can. Geotech. J. 32(2),
 *     336–354, 1995 (citation from memory).
 * [8] J. F. Nixon, G. Lem, "Creep and strength testing of frozen saline fine-grained soils,"
 *     Can. Geotech. J. 21(3), 518–529, 1984 (citation from memory).
 */
import { z } from 'zod';
import {
  ICE_CONDUCTIVITY_W_MK,
  ICE_SPECIFIC_HEAT_J_KGK,
  LATENT_HEAT_FUSION_J_KG,
  MINERAL_DENSITY_KG_M3,
  MINERAL_SPECIFIC_HEAT_J_KGK,
  ORGANIC_CONDUCTIVITY_W_MK,
  ORGANIC_DENSITY_KG_M3,
  ORGANIC_SPECIFIC_HEAT_J_KGK,
  OTHER_MINERAL_CONDUCTIVITY_W_MK,
  QUARTZ_CONDUCTIVITY_W_MK,
  WATER_CONDUCTIVITY_W_MK,
  WATER_DENSITY_KG_M3,
  WATER_SPECIFIC_HEAT_J_KGK,
} from './constants';
import { isothermalMaterial, tabulatedMaterial, type PhaseChangeMaterial } from './heat-conduction';

/** Textures known to the property models (the site schema's list). */
export const TEXTURES = ['gravel', 'sand', 'silt', 'clay', 'peat', 'till', 'bedrock'] as const;
export type Texture = (typeof TEXTURES)[number];
export const textureSchema = z.enum(TEXTURES);

interface TextureParams {
  /** Quartz fraction of the mineral solids [-] ([5], from memory; bedrock: granite-like). */
  quartz: number;
  /** Johansen's Kersten-number class: coarse (sand, gravel) or fine. */
  coarse: boolean;
  /** Conductivity of the mineral solids [W m-1 K-1] if given directly (bedrock), else from quartz. */
  solidsConductivityWmK?: number;
}

const TEXTURE_PARAMS: Record<Texture, TextureParams> = {
  gravel: { quartz: 0.6, coarse: true },
  sand: { quartz: 0.9, coarse: true },
  silt: { quartz: 0.25, coarse: false },
  clay: { quartz: 0.25, coarse: false },
  peat: { quartz: 0, coarse: false },
  till: { quartz: 0.4, coarse: false },
  // Bedrock of unknown type: 3.0 W m-1 K-1, typical of granite and gneiss (Farouki 1981 [2]; from memory).
  bedrock: { quartz: 0.3, coarse: true, solidsConductivityWmK: 3.0 },
};

/**
 * Specific surface area used for the unfrozen-water curve by texture [m2 g-1] (order of magnitude
 * as given for these soil types by Anderson & Tice 1972 [3]; from memory).
 */
export const DEFAULT_SPECIFIC_SURFACE_M2_G: Record<Texture, number> = {
  gravel: 0.2,
  sand: 1,
  silt: 20,
  clay: 80,
  peat: 30,
  till: 15,
  bedrock: 0.1,
};

/** A layer's description as the property models take it. */
export interface SoilDescription {
  texture: Texture;
  /** Dry bulk density [kg m-3]. */
  dryDensityKgM3: number;
  /** Total volumetric water content (liquid + ice, as liquid water volume) [m3 m-3]. */
  volumetricWaterContent: number;
  /** Organic mass fraction of the solids [-]; default 0 (peat: 0.8). */
  organicContent?: number;
  /** Pore-water salinity [g kg-1 ≈ ppt]; default 0. */
  salinityPpt?: number;
}

/** Thermal properties of a layer. */
export interface SoilThermalProperties {
  porosity: number;
  conductivityThawedWmK: number;
  conductivityFrozenWmK: number;
  heatCapacityThawedJm3K: number;
  heatCapacityFrozenJm3K: number;
  latentHeatJm3: number;
  freezingPointC: number;
}

function organicFraction(d: SoilDescription): number {
  return d.organicContent ?? (d.texture === 'peat' ? 0.8 : 0);
}

/**
 * Porosity from dry density and the organic fraction of the solids.
 * @param dryDensityKgM3 [kg m-3]. @param organicContent Organic mass fraction of solids [-].
 * @returns Porosity [-], clamped to [0, 1).
 */
export function porosityFromDryDensity(dryDensityKgM3: number, organicContent = 0): number {
  const solids = dryDensityKgM3 * (organicContent / ORGANIC_DENSITY_KG_M3 + (1 - organicContent) / MINERAL_DENSITY_KG_M3);
  return Math.min(0.999, Math.max(0, 1 - solids));
}

/**
 * Thermal conductivity of a mineral soil by Johansen's method [1] (as summarised by Farouki [2]):
 * k = (k_sat − k_dry)·Ke + k_dry.
 * - k_dry = (0.135 ρd + 64.7) / (2700 − 0.947 ρd) (natural soils, ρd in kg m-3); for bedrock the
 *   crushed-rock form 0.039 n^−2.2 is not used: intact rock is treated as saturated (Ke = 1).
 * - k_sat = k_s^(1−n) · k_w^θu · k_i^(n−θu) (geometric mean); k_s = k_q^q · k_o^(1−q) with
 *   k_o = 2.0 W m-1 K-1 for q > 0.2, else 3.0.
 * - Ke thawed: coarse 0.7 log10(Sr) + 1, fine log10(Sr) + 1 (Sr the saturation), clamped to [0, 1];
 *   Ke frozen = Sr.
 * @param p Texture, dry density [kg m-3], porosity [-], saturation Sr [-], liquid fraction of the
 *   pore water [-] (1 thawed, 0 fully frozen), frozen (Kersten-number branch), organic fraction [-].
 * @returns Conductivity [W m-1 K-1].
 * Validity: Johansen's fits cover natural unfrozen and frozen mineral soils; uncertainty ±20 %
 * (Farouki 1981). Organic matter is mixed into the solids by volume fraction (after [6]).
 */
export function conductivityJohansen1975(p: {
  texture: Texture;
  dryDensityKgM3: number;
  porosity: number;
  saturation: number;
  liquidFraction: number;
  frozen: boolean;
  organicContent?: number;
}): number {
  const tp = TEXTURE_PARAMS[p.texture];
  const n = p.porosity;
  const om = p.organicContent ?? 0;
  const q = tp.quartz;
  const kOther = q > 0.2 ? OTHER_MINERAL_CONDUCTIVITY_W_MK : 3.0;
  const kMineral = tp.solidsConductivityWmK ?? QUARTZ_CONDUCTIVITY_W_MK ** q * kOther ** (1 - q);
  // volume fraction of organic matter among the solids
  const omVol = om > 0 ? om / ORGANIC_DENSITY_KG_M3 / (om / ORGANIC_DENSITY_KG_M3 + (1 - om) / MINERAL_DENSITY_KG_M3) : 0;
  const ks = kMineral ** (1 - omVol) * ORGANIC_CONDUCTIVITY_W_MK ** omVol;
  const sr = Math.min(1, Math.max(0, p.saturation));
  // k_sat of the saturated state; frozen: the pores hold the same liquid share, the rest is ice
  const liquidSat = n * Math.min(1, Math.max(0, p.liquidFraction));
  const kSat = p.frozen
    ? ks ** (1 - n) * WATER_CONDUCTIVITY_W_MK ** liquidSat * ICE_CONDUCTIVITY_W_MK ** (n - liquidSat)
    : ks ** (1 - n) * WATER_CONDUCTIVITY_W_MK ** n;
  if (p.texture === 'bedrock') return kSat;
  const rho = p.dryDensityKgM3;
  const kDryMineral = (0.135 * rho + 64.7) / (2700 - 0.947 * rho);
  const kDry = (1 - omVol) * kDryMineral + omVol * 0.05;
  let ke: number;
  if (p.frozen) ke = sr;
  else if (sr <= 0) ke = 0;
  else ke = tp.coarse ? 0.7 * Math.log10(sr) + 1 : Math.log10(sr) + 1;
  ke = Math.min(1, Math.max(0, ke));
  return (kSat - kDry) * ke + kDry;
}

/**
 * Thermal conductivity of peat after Farouki [2]: saturated peat as the geometric mean of organic
 * solids (0.25 W m-1 K-1) and water or ice, dry peat 0.05 W m-1 K-1, and between them linear in the
 * saturation (Farouki reports the conductivity of organic soils rising about linearly with water
 * content; the linear Kersten number is our reading, as also used in [6]).
 * @param porosity [-]. @param saturation [-]. @param liquidFraction Liquid share of the pore water [-].
 * @returns Conductivity [W m-1 K-1]. Values from memory (Farouki 1981 gives 0.05–0.06 for dry peat,
 * about 0.5 thawed and 1.5–2 frozen when saturated).
 */
export function conductivityPeatFarouki1981(porosity: number, saturation: number, liquidFraction: number): number {
  const n = porosity;
  const sr = Math.min(1, Math.max(0, saturation));
  const kDry = 0.05;
  const liquidPore = n * liquidFraction;
  const kSat = ORGANIC_CONDUCTIVITY_W_MK ** (1 - n) * WATER_CONDUCTIVITY_W_MK ** liquidPore * ICE_CONDUCTIVITY_W_MK ** (n - liquidPore);
  return (kSat - kDry) * sr + kDry;
}

/**
 * Volumetric heat capacity as the sum of its constituents (de Vries, in [2]).
 * @param p Dry density [kg m-3], organic mass fraction [-], liquid water and ice contents as
 *   liquid-water volume fractions [m3 m-3].
 * @returns [J m-3 K-1]. Air is neglected (about 1e3 J m-3 K-1).
 */
export function heatCapacityFromConstituents(p: { dryDensityKgM3: number; organicContent: number; liquidWater: number; iceAsWater: number }): number {
  const solids = p.dryDensityKgM3 * ((1 - p.organicContent) * MINERAL_SPECIFIC_HEAT_J_KGK + p.organicContent * ORGANIC_SPECIFIC_HEAT_J_KGK);
  return solids + WATER_DENSITY_KG_M3 * (p.liquidWater * WATER_SPECIFIC_HEAT_J_KGK + p.iceAsWater * ICE_SPECIFIC_HEAT_J_KGK);
}

/**
 * Volumetric latent heat of the pore water [J m-3] = ρ_w · L_f · θ.
 * @param volumetricWaterContent [m3 m-3].
 */
export function volumetricLatentHeat(volumetricWaterContent: number): number {
  return WATER_DENSITY_KG_M3 * LATENT_HEAT_FUSION_J_KG * volumetricWaterContent;
}

/**
 * Freezing point of saline pore water (seawater formula of UNESCO 1983 [4]):
 * T_f = −0.0575 S + 1.710523e-3 S^1.5 − 2.154996e-4 S² at atmospheric pressure.
 * @param salinityPpt Salinity [g kg-1], ≥ 0. The formula is fitted for 4–40; below it tends to 0 °C
 *   correctly; above 40 (brines) it is used as an extrapolation (stated limitation).
 * @returns Freezing point [°C].
 */
export function freezingPointSeawaterUnesco1983(salinityPpt: number): number {
  if (!(salinityPpt >= 0)) throw new RangeError('freezingPointSeawaterUnesco1983: salinity must be >= 0');
  const s = salinityPpt;
  return -0.0575 * s + 1.710523e-3 * s ** 1.5 - 2.154996e-4 * s * s;
}

/**
 * Unfrozen water by the power law of Anderson & Tice [3]: w_u = α · θ^(−β), θ in degrees below the
 * freezing point.
 * @param degreesBelowFreezingK θ [K], > 0 (at θ → 0 the law diverges; callers cap w_u at the total).
 * @param alpha α [kg kg-1 at θ = 1 K]. @param beta β [-] (> 0; the exponent is −β).
 * @returns Gravimetric unfrozen water content [kg water per kg dry soil].
 */
export function unfrozenWaterAndersonTice1972(degreesBelowFreezingK: number, alpha: number, beta: number): number {
  if (!(degreesBelowFreezingK > 0)) return Infinity;
  return alpha * degreesBelowFreezingK ** -beta;
}

/**
 * Anderson & Tice's regression of the power-law parameters on the specific surface area S [3]:
 * ln α = 0.5519 ln S + 0.2618, ln β = −0.2640 ln S + 0.3712 (α in percent by mass; returned as a
 * fraction). From memory.
 * @param specificSurfaceM2G S [m2 g-1], > 0.
 * @returns α [kg kg-1], β [-].
 */
export function andersonTiceParametersFromSpecificSurface(specificSurfaceM2G: number): { alpha: number; beta: number } {
  const ls = Math.log(specificSurfaceM2G);
  return { alpha: Math.exp(0.5519 * ls + 0.2618) / 100, beta: Math.exp(-0.264 * ls + 0.3712) };
}

/**
 * Thermal properties of a layer from its description (thawed: all water liquid; frozen: all water
 * ice, for the isothermal model).
 * @param d Texture, dry density [kg m-3], volumetric water content [m3 m-3], organic fraction [-],
 *   salinity [ppt].
 * @returns Porosity, conductivities [W m-1 K-1], heat capacities [J m-3 K-1], latent heat [J m-3],
 *   freezing point [°C]. Peat (texture `peat`) uses [2]; other textures [1].
 */
export function soilThermalProperties(d: SoilDescription): SoilThermalProperties {
  if (!(d.dryDensityKgM3 > 0) || !(d.volumetricWaterContent >= 0)) throw new RangeError('soilThermalProperties: dry density > 0 and water content >= 0 are needed');
  const om = organicFraction(d);
  const n = porosityFromDryDensity(d.dryDensityKgM3, om);
  const theta = d.volumetricWaterContent;
  const sr = n > 0 ? Math.min(1, theta / n) : 1;
  const cond = (liquidFraction: number, frozen: boolean) =>
    d.texture === 'peat'
      ? conductivityPeatFarouki1981(n, sr, liquidFraction)
      : conductivityJohansen1975({ texture: d.texture, dryDensityKgM3: d.dryDensityKgM3, porosity: n, saturation: sr, liquidFraction, frozen, organicContent: om });
  return {
    porosity: n,
    conductivityThawedWmK: cond(1, false),
    conductivityFrozenWmK: cond(0, true),
    heatCapacityThawedJm3K: heatCapacityFromConstituents({ dryDensityKgM3: d.dryDensityKgM3, organicContent: om, liquidWater: theta, iceAsWater: 0 }),
    heatCapacityFrozenJm3K: heatCapacityFromConstituents({ dryDensityKgM3: d.dryDensityKgM3, organicContent: om, liquidWater: 0, iceAsWater: theta }),
    latentHeatJm3: volumetricLatentHeat(theta),
    freezingPointC: freezingPointSeawaterUnesco1983(d.salinityPpt ?? 0),
  };
}

/**
 * Solver material with phase change at one temperature from a layer description.
 * @param d Layer description. @returns Material for HeatConductionColumn.
 */
export function isothermalMaterialFromProperties(d: SoilDescription): PhaseChangeMaterial {
  const p = soilThermalProperties(d);
  return isothermalMaterial({
    conductivityThawedWmK: p.conductivityThawedWmK,
    conductivityFrozenWmK: p.conductivityFrozenWmK,
    heatCapacityThawedJm3K: p.heatCapacityThawedJm3K,
    heatCapacityFrozenJm3K: p.heatCapacityFrozenJm3K,
    latentHeatJm3: p.latentHeatJm3,
    freezingPointC: p.freezingPointC,
  });
}

/**
 * Solver material with unfrozen water below the freezing point (Anderson & Tice [3]), for the
 * site model. The liquid content is θ_u(T) = min(θ, ρd/ρw · α (T_f − T)^−β); the curve is
 * tabulated at temperatures T_f − δ with δ geometric from 0.005 to 40 K, enthalpy integrated from
 * sensible heat (constituents) plus latent heat of the water that freezes, conductivity from
 * Johansen (frozen branch with the liquid share) or Farouki for peat.
 * @param d Layer description. @param options Specific surface [m2 g-1] (default by texture) or α, β.
 * @returns Material for HeatConductionColumn (enthalpy reference: 0 at T_f − 40 K).
 */
export function freezingCurveMaterial(
  d: SoilDescription,
  options: { specificSurfaceM2G?: number; alpha?: number; beta?: number; points?: number } = {},
): PhaseChangeMaterial {
  const om = organicFraction(d);
  const props = soilThermalProperties(d);
  const n = props.porosity;
  const theta = d.volumetricWaterContent;
  const sr = n > 0 ? Math.min(1, theta / n) : 1;
  const tf = props.freezingPointC;
  const at = andersonTiceParametersFromSpecificSurface(options.specificSurfaceM2G ?? DEFAULT_SPECIFIC_SURFACE_M2_G[d.texture]);
  const alpha = options.alpha ?? at.alpha;
  const beta = options.beta ?? at.beta;
  const liquid = (tv: number) => (tv >= tf ? theta : Math.min(theta, (d.dryDensityKgM3 / WATER_DENSITY_KG_M3) * unfrozenWaterAndersonTice1972(tf - tv, alpha, beta)));
  const capacity = (tv: number) => {
    const l = liquid(tv);
    return heatCapacityFromConstituents({ dryDensityKgM3: d.dryDensityKgM3, organicContent: om, liquidWater: l, iceAsWater: theta - l });
  };
  const cond = (tv: number) => {
    const f = theta > 0 ? liquid(tv) / theta : 1;
    if (tv >= tf) return props.conductivityThawedWmK;
    return d.texture === 'peat'
      ? conductivityPeatFarouki1981(n, sr, f)
      : conductivityJohansen1975({ texture: d.texture, dryDensityKgM3: d.dryDensityKgM3, porosity: n, saturation: sr, liquidFraction: f, frozen: true, organicContent: om });
  };
  const m = options.points ?? 32;
  const deltas: number[] = [];
  for (let j = 0; j < m; j++) deltas.push(40 * (0.005 / 40) ** (j / (m - 1))); // 40 … 0.005 K
  const temps = [...deltas.map((dl) => tf - dl), tf];
  const latent = WATER_DENSITY_KG_M3 * LATENT_HEAT_FUSION_J_KG;
  const enth: number[] = [0];
  for (let j = 1; j < temps.length; j++) {
    const a = temps[j - 1];
    const b = temps[j];
    const sub = 8;
    let sens = 0;
    for (let i = 0; i < sub; i++) {
      const x0 = a + ((b - a) * i) / sub;
      const x1 = a + ((b - a) * (i + 1)) / sub;
      sens += 0.5 * (capacity(x0) + capacity(Math.min(x1, tf - 1e-9))) * (x1 - x0);
    }
    const lb = j === temps.length - 1 ? theta : liquid(b);
    enth.push(enth[j - 1] + sens + latent * (lb - liquid(a)));
  }
  return tabulatedMaterial({
    temperatureC: temps,
    enthalpyJm3: enth,
    conductivityWmK: temps.map(cond),
    heatCapacityBelowJm3K: capacity(temps[0]),
    heatCapacityAboveJm3K: props.heatCapacityThawedJm3K,
    freezingPointC: tf,
  });
}
