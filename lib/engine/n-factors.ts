/**
 * Surface n-factors by cover type: the ratio of the ground-surface to the air freezing (n_f) or
 * thawing (n_t) index.
 *
 * API: `SURFACE_COVERS`, `surfaceCoverSchema` (zod enum; identical to site-schema.ts's list),
 * `N_FACTORS` (nominal values with published ranges and the snow-cleared flag), `nFactors(cover)`,
 * `freezingNFactorWithExplicitSnow(cover)`.
 *
 * Where snow is modelled explicitly, the freezing n-factor applies only to snow-cleared surfaces
 * (roads, airstrips, pads): the tables' values for vegetated surfaces already include the effect
 * of their snow cover, so applying them under a modelled snowpack would count the snow twice.
 * Building-adjacent ground is not a cover here: drifted snow beside buildings is the site schema's
 * `drifted` snow case.
 *
 * Values: nominal and range as recalled from the tables of UFC 3-130-04 (formerly TM 5-852-4,
 * "Calculation methods for determination of depths of freeze and thaw in soils", Table 2-1 / 3-1
 * n-factors) [1], Lunardini's compilation [2] and, for tundra thawing n-factors, Klene et al. [3]
 * (all from memory; a reviewer should confirm each against the published tables).
 *
 * References
 * [1] US DoD, UFC 3-130-04 / TM 5-852-4, Arctic and Subarctic Construction: Calculation Methods
 *     for Determination of Depths of Freeze and Thaw in Soils, 1988/2004.
 * [2] V. J. Lunardini, Theory of n-factors and correlation of data, CRREL Report 78-23 (also Proc.
 *     3rd Int. Conf. Permafrost, 1978).
 * [3] A. E. Klene, F. E. Nelson, N. I. Shiklomanov, K. M. Hinkel, "The n-factor in natural
 *     landscapes: variability of air and soil-surface temperatures, Kuparuk River basin, Alaska,
 *     U.S.A.," Arct. Antarct. Alp. Res. 33(2), 140–148, 2001.
 */
import { z } from 'zod';

export const SURFACE_COVERS = ['tundra', 'shrub_tundra', 'forest', 'peat', 'gravel_pad', 'gravel_road', 'paved_road', 'airstrip', 'bare_soil'] as const;
export type SurfaceCover = (typeof SURFACE_COVERS)[number];
export const surfaceCoverSchema = z.enum(SURFACE_COVERS);

export interface NFactorEntry {
  /** Freezing n-factor: nominal and published range [-]. */
  freezing: number;
  freezingRange: readonly [number, number];
  /** Thawing n-factor: nominal and published range [-]. */
  thawing: number;
  thawingRange: readonly [number, number];
  /** Kept free of snow in winter (roads, airstrips, pads). */
  snowCleared: boolean;
  source: string;
}

export const N_FACTORS: Record<SurfaceCover, NFactorEntry> = {
  tundra: { freezing: 0.5, freezingRange: [0.25, 0.9], thawing: 0.85, thawingRange: [0.6, 1.1], snowCleared: false, source: 'Klene et al. 2001 (n_t); Lunardini 1978 (n_f); from memory' },
  shrub_tundra: { freezing: 0.4, freezingRange: [0.2, 0.7], thawing: 0.75, thawingRange: [0.5, 1.0], snowCleared: false, source: 'Klene et al. 2001; Lunardini 1978; from memory' },
  forest: { freezing: 0.3, freezingRange: [0.2, 0.5], thawing: 0.5, thawingRange: [0.3, 0.8], snowCleared: false, source: 'Lunardini 1978 (spruce with moss cover); from memory' },
  peat: { freezing: 0.4, freezingRange: [0.2, 0.7], thawing: 0.6, thawingRange: [0.4, 0.9], snowCleared: false, source: 'Lunardini 1978 (moss and peat surfaces); from memory' },
  gravel_pad: { freezing: 0.9, freezingRange: [0.6, 1.0], thawing: 1.4, thawingRange: [1.1, 2.0], snowCleared: true, source: 'UFC 3-130-04 / TM 5-852-4 (gravel, snow-free); Lunardini 1978; from memory' },
  gravel_road: { freezing: 0.9, freezingRange: [0.6, 1.0], thawing: 1.6, thawingRange: [1.3, 2.0], snowCleared: true, source: 'UFC 3-130-04 / TM 5-852-4 (gravel road, snow-free); from memory' },
  paved_road: { freezing: 0.9, freezingRange: [0.7, 1.0], thawing: 1.9, thawingRange: [1.4, 2.3], snowCleared: true, source: 'UFC 3-130-04 / TM 5-852-4 (bituminous pavement, snow-free); from memory' },
  airstrip: { freezing: 0.9, freezingRange: [0.6, 1.0], thawing: 1.6, thawingRange: [1.3, 2.0], snowCleared: true, source: 'UFC 3-130-04 / TM 5-852-4 (gravel runway, snow-free); from memory' },
  bare_soil: { freezing: 0.7, freezingRange: [0.4, 1.0], thawing: 1.4, thawingRange: [1.0, 2.0], snowCleared: false, source: 'UFC 3-130-04 / TM 5-852-4 (bare soil); Lunardini 1978; from memory' },
};

/**
 * The n-factors of a cover type.
 * @param cover Surface cover. @returns Nominal freezing and thawing n-factors [-] with ranges.
 */
export function nFactors(cover: SurfaceCover): NFactorEntry {
  return N_FACTORS[cover];
}

/**
 * Freezing n-factor to apply to the air temperature when snow is modelled explicitly: the table's
 * value on snow-cleared surfaces, 1 elsewhere (the modelled snowpack does the insulating).
 * @param cover Surface cover. @returns n_f [-].
 */
export function freezingNFactorWithExplicitSnow(cover: SurfaceCover): number {
  const e = N_FACTORS[cover];
  return e.snowCleared ? e.freezing : 1;
}
