/**
 * Thaw settlement: the sum of thaw strain over the ground newly thawed below the baseline permafrost
 * table, cumulative from the deepest thaw reached so far (settlement does not recover).
 *
 * API:
 * - `settlementBetween(profile, baselineTableM, thawDepthM)` → settlement [m] for one thaw depth.
 * - `cumulativeSettlement(profile, baselineTableM, deepestThawByYearM)` → per-year cumulative [m].
 *
 * The model column does not deform: depths are in the frozen (initial) coordinates, and the
 * settlement of a thawed interval of frozen thickness Δz is ε Δz [1].
 *
 * References:
 * [1] O. B. Andersland, B. Ladanyi, Frozen Ground Engineering, 2nd ed., Wiley/ASCE, 2004, ch. 11:
 *     S = Σ ε_i Δz_i over thawed frozen layers.
 * [2] F. E. Nelson, O. A. Anisimov, N. I. Shiklomanov, "Subsidence risk from thawing permafrost,"
 *     Nature 410, 889–890, 2001, doi:10.1038/35069701 (settlement from the deepening of thaw into
 *     ice-bearing ground).
 */
import { strainIntegralBetween, type StrainInterval } from './ground-ice';

/**
 * Settlement when thaw reaches `thawDepthM` below a baseline permafrost table [1].
 * @param profile Thaw-strain intervals (frozen coordinates) [m, -].
 * @param baselineTableM Depth of the baseline permafrost table [m]: ground above it thawed every
 *   baseline year and holds no excess ice left to melt.
 * @param thawDepthM Deepest thaw reached [m] (the permafrost table of the year, or the column
 *   depth if the column has no permafrost left).
 * @returns Settlement [m] = ∫ ε(z) dz from the baseline table to the thaw depth; 0 if the thaw is
 *   not below the baseline table.
 */
export function settlementBetween(profile: ReadonlyArray<StrainInterval>, baselineTableM: number, thawDepthM: number): number {
  return strainIntegralBetween(profile, baselineTableM, thawDepthM);
}

/**
 * Cumulative settlement by year from the deepest thaw reached so far [1, 2].
 * @param profile Thaw-strain intervals [m, -].
 * @param baselineTableM Baseline permafrost-table depth [m].
 * @param deepestThawByYearM Per year, the deepest thawed depth of that year [m] (its permafrost
 *   table, deeper than the seasonal thaw once a talik forms).
 * @returns Per year, the cumulative settlement [m]; never decreasing (refreezing does not restore
 *   the melted excess ice).
 */
export function cumulativeSettlement(
  profile: ReadonlyArray<StrainInterval>,
  baselineTableM: number,
  deepestThawByYearM: ReadonlyArray<number>,
): number[] {
  let deepest = baselineTableM;
  return deepestThawByYearM.map((d) => {
    if (d > deepest) deepest = d;
    return settlementBetween(profile, baselineTableM, deepest);
  });
}
