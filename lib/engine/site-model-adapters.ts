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

/**
 * Provisional n-factor table until n-factors.ts lands (then this is replaced by its values).
 * Values from memory of UFC 3-130-04 (formerly TM 5-852-4) tables and Klene et al. 2001
 * (doi:10.2307/1552214); common practice, not read from the sources here.
 */
function nFactorsForCover(cover: SurfaceCover): { thaw: number; freeze: number; thawRange: [number, number]; freezeRange: [number, number]; snowCleared: boolean; source: string } {
  const table: Record<SurfaceCover, [number, number, number, number, number, number, boolean]> = {
    tundra: [0.9, 0.6, 1.2, 0.5, 0.3, 0.9, false],
    shrub_tundra: [0.8, 0.6, 1.1, 0.45, 0.25, 0.8, false],
    forest: [0.5, 0.3, 0.8, 0.35, 0.2, 0.6, false],
    peat: [0.7, 0.5, 1.0, 0.5, 0.3, 0.9, false],
    gravel_pad: [1.5, 1.2, 2.0, 0.9, 0.6, 1.0, false],
    gravel_road: [1.6, 1.3, 2.0, 0.9, 0.7, 1.0, true],
    paved_road: [1.9, 1.6, 2.3, 0.95, 0.8, 1.0, true],
    airstrip: [1.8, 1.4, 2.2, 0.95, 0.8, 1.0, true],
    bare_soil: [1.3, 1.0, 1.6, 0.9, 0.7, 1.0, false],
  };
  const [thaw, t0, t1, freeze, f0, f1, snowCleared] = table[cover];
  return { thaw, freeze, thawRange: [t0, t1], freezeRange: [f0, f1], snowCleared, source: 'provisional table (UFC 3-130-04; Klene et al. 2001; from memory)' };
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
  const t = nFactorsForCover(cover);
  const nThaw = thawOverride ?? t.thaw;
  const nFreeze = freezeOverride ?? t.freeze;
  return {
    nThaw,
    nFreeze,
    nThawRange: [Math.min(t.thawRange[0], nThaw), Math.max(t.thawRange[1], nThaw)],
    nFreezeRange: [Math.min(t.freezeRange[0], nFreeze), Math.max(t.freezeRange[1], nFreeze)],
    snowCleared: t.snowCleared,
    source: t.source,
    overridden: thawOverride !== undefined || freezeOverride !== undefined,
  };
}
