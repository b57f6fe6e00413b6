/**
 * Adapters between the site schema (snake_case, boundary units) and the ground engineer's property
 * modules (soil-properties.ts, snow.ts, n-factors.ts), so that site-model.ts depends on one small
 * surface. No physics is defined here beyond unit mapping and clamping.
 *
 * API: `layerMaterialAdapter(layer, salinityPpt)`, `snowPropertiesAdapter(densityKgM3)`,
 * `surfaceNFactorsAdapter(cover, thawOverride?, freezeOverride?)`.
 */
import type { PhaseChangeMaterial } from './heat-conduction';
import { freezingCurveMaterial, soilThermalProperties } from './soil-properties';
import { snowConductivitySturm1997, snowHeatCapacity, SNOW_DENSITY_MAX_KG_M3, SNOW_DENSITY_MIN_KG_M3 } from './snow';
import { nFactors } from './n-factors';
import type { SiteLayer, SurfaceCover } from './site-schema';

/**
 * Solver material of a layer with unfrozen water (Anderson & Tice 1972 form) and its freezing
 * point depressed by salinity (soil-properties.ts `freezingCurveMaterial`).
 * @param layer Validated layer: dry density [kg m-3], water content [m3 m-3], organic fraction [-].
 * @param salinityPpt Pore-water salinity [ppt].
 * @returns The material and its freezing point [°C].
 */
export function layerMaterialAdapter(layer: SiteLayer, salinityPpt: number): { material: PhaseChangeMaterial; freezingPointC: number } {
  const d = {
    texture: layer.texture,
    dryDensityKgM3: layer.dry_density_kg_m3,
    volumetricWaterContent: layer.volumetric_water_content,
    organicContent: layer.organic_content,
    salinityPpt,
  };
  return { material: freezingCurveMaterial(d), freezingPointC: soilThermalProperties(d).freezingPointC };
}

/**
 * Snow conductivity (Sturm et al. 1997) and heat capacity for a density, clamped into the snow
 * module's valid range 50–600 kg m-3 (calibration shifts may push a density outside it).
 * @param densityKgM3 Snow density [kg m-3].
 * @returns Conductivity [W m-1 K-1] and volumetric heat capacity [J m-3 K-1].
 */
export function snowPropertiesAdapter(densityKgM3: number): { conductivityWmK: number; heatCapacityJm3K: number } {
  const rho = Math.min(SNOW_DENSITY_MAX_KG_M3, Math.max(SNOW_DENSITY_MIN_KG_M3, densityKgM3));
  return { conductivityWmK: snowConductivitySturm1997(rho), heatCapacityJm3K: snowHeatCapacity(rho) };
}

/** n-factors of a surface as the site model uses them. */
export interface SurfaceNFactors {
  nThaw: number;
  nFreeze: number;
  /** Published ranges [-] within which calibration may move them. */
  nThawRange: [number, number];
  nFreezeRange: [number, number];
  /** Snow is cleared (roads, airstrips): no snow layer, the freezing n-factor applies. */
  snowCleared: boolean;
  source: string;
  /** True where the site overrode a table value. */
  overridden: boolean;
}

/**
 * The cover's n-factors (n-factors.ts), with the site's overrides; an override outside the
 * published range widens the calibration range to include it.
 * @param cover Surface cover. @param thawOverride Site n_factor_thaw [-]. @param freezeOverride Site n_factor_freeze [-].
 */
export function surfaceNFactorsAdapter(cover: SurfaceCover, thawOverride?: number, freezeOverride?: number): SurfaceNFactors {
  const t = nFactors(cover);
  const nThaw = thawOverride ?? t.thawing;
  const nFreeze = freezeOverride ?? t.freezing;
  return {
    nThaw,
    nFreeze,
    nThawRange: [Math.min(t.thawingRange[0], nThaw), Math.max(t.thawingRange[1], nThaw)],
    nFreezeRange: [Math.min(t.freezingRange[0], nFreeze), Math.max(t.freezingRange[1], nFreeze)],
    snowCleared: t.snowCleared,
    source: t.source,
    overridden: thawOverride !== undefined || freezeOverride !== undefined,
  };
}
