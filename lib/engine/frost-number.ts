/**
 * Frost numbers of Nelson & Outcalt (1987) and the permafrost classes they indicate.
 *
 * API: `airFrostNumberNelsonOutcalt1987(ddf, ddt)`, `surfaceFrostNumberNelsonOutcalt1987(...)`,
 * `frostNumberClass(f)`, `FROST_NUMBER_CLASSES`.
 *
 * References: [1] F. E. Nelson, S. I. Outcalt, "A computational method for prediction and
 * regionalization of permafrost," Arct. Alp. Res. 19(3), 279–288, 1987, doi:10.2307/1551363.
 */

/**
 * Air frost number F = √DDF / (√DDF + √DDT) [1].
 * @param freezingIndexCDays Air freezing index DDF [°C d], ≥ 0.
 * @param thawingIndexCDays Air thawing index DDT [°C d], ≥ 0.
 * @returns F in [0, 1]; 0.5 when both indices are 0 (no frost, no thaw: undefined, reported as the
 *   boundary value; documented choice).
 */
export function airFrostNumberNelsonOutcalt1987(freezingIndexCDays: number, thawingIndexCDays: number): number {
  if (!(freezingIndexCDays >= 0 && thawingIndexCDays >= 0)) throw new RangeError('frost number: indices must be >= 0');
  const f = Math.sqrt(freezingIndexCDays);
  const t = Math.sqrt(thawingIndexCDays);
  return f + t === 0 ? 0.5 : f / (f + t);
}

/**
 * Surface frost number F+ = √DDF+ / (√DDF+ + √DDT) [1], with the freezing index at the ground
 * surface under snow. Nelson & Outcalt correct the air freezing index for snow through a snow-
 * adjusted mean winter temperature; here the caller supplies the surface index directly (e.g. the
 * freezing n-factor times the air index), and the thawing index likewise (n_t · DDT).
 * @param surfaceFreezingIndexCDays DDF+ [°C d]. @param surfaceThawingIndexCDays [°C d].
 * @returns F+ in [0, 1].
 */
export function surfaceFrostNumberNelsonOutcalt1987(surfaceFreezingIndexCDays: number, surfaceThawingIndexCDays: number): number {
  return airFrostNumberNelsonOutcalt1987(surfaceFreezingIndexCDays, surfaceThawingIndexCDays);
}

export const FROST_NUMBER_CLASSES = ['continuous', 'discontinuous', 'sporadic', 'none'] as const;
export type FrostNumberClass = (typeof FROST_NUMBER_CLASSES)[number];

/**
 * Permafrost class from a frost number [1]: F ≥ 0.67 continuous, 0.6 ≤ F < 0.67 discontinuous,
 * 0.5 ≤ F < 0.6 sporadic, F < 0.5 none (class limits as recalled from [1]; from memory).
 * @param frostNumber F [-]. @returns The class.
 */
export function frostNumberClass(frostNumber: number): FrostNumberClass {
  if (!(frostNumber >= 0 && frostNumber <= 1)) throw new RangeError('frostNumberClass: F must be in [0, 1]');
  if (frostNumber >= 0.67) return 'continuous';
  if (frostNumber >= 0.6) return 'discontinuous';
  if (frostNumber >= 0.5) return 'sporadic';
  return 'none';
}
