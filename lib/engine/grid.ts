/**
 * The 1-D finite-volume grid of a ground column.
 *
 * Cells are bounded by faces; the ground surface is face 0 and the column base is face N. Cells are
 * thin at the surface (a few cm) and grow geometrically with depth up to a maximum spacing, and every
 * layer boundary is a face, so each cell lies in exactly one layer (one material).
 *
 * API: `buildColumnGrid(layerThicknessM, options)` → `ColumnGrid`; `DEFAULT_GRID_OPTIONS`.
 */

/** Spacing options of the grid. */
export interface GridOptions {
  /** Thickness of the top cell [m]. Default 0.02. */
  surfaceSpacingM?: number;
  /** Ratio of the thickness of a cell to the one above it [-], ≥ 1. Default 1.08. */
  growthFactor?: number;
  /** Largest cell thickness [m]. Default 1.0. */
  maxSpacingM?: number;
}

export const DEFAULT_GRID_OPTIONS: Required<GridOptions> = {
  surfaceSpacingM: 0.02,
  growthFactor: 1.08,
  maxSpacingM: 1.0,
};

/** A column grid; arrays are indexed by cell (top = 0) except `faceDepthM` (N + 1 entries). */
export interface ColumnGrid {
  readonly cellCount: number;
  /** Depth of the column base [m]. */
  readonly depthM: number;
  /** Depths of the cell faces [m], 0 … depthM. */
  readonly faceDepthM: Float64Array;
  /** Depths of the cell centres [m]. */
  readonly centerDepthM: Float64Array;
  /** Cell thicknesses [m]. */
  readonly thicknessM: Float64Array;
  /** Index of the layer each cell lies in. */
  readonly layerIndex: Int32Array;
  /** Depth of the top of each layer [m]. */
  readonly layerTopM: Float64Array;
}

/**
 * Builds a column grid from layer thicknesses: fine near the surface, geometric growth with depth,
 * layer boundaries on faces.
 * @param layerThicknessM Thickness of each layer, top to bottom [m], each > 0.
 * @param options Spacing (see `GridOptions`).
 * @returns The grid. The last cell of a layer is between 0.5 and 1.5 times the nominal spacing there
 *   (or the layer's whole thickness if thinner), so no sliver cells arise at boundaries.
 * Notes: geometric stretching is common practice for ground-temperature models, since the
 * temperature signal damps exponentially with depth (Carslaw & Jaeger 1959, §2.6).
 * References: [1] H. S. Carslaw, J. C. Jaeger, Conduction of Heat in Solids, 2nd ed., Oxford, 1959.
 */
export function buildColumnGrid(layerThicknessM: readonly number[], options: GridOptions = {}): ColumnGrid {
  const o = { ...DEFAULT_GRID_OPTIONS, ...options };
  if (layerThicknessM.length === 0) throw new RangeError('buildColumnGrid: at least one layer is needed');
  if (!(o.surfaceSpacingM > 0) || !(o.growthFactor >= 1) || !(o.maxSpacingM >= o.surfaceSpacingM)) {
    throw new RangeError('buildColumnGrid: need surfaceSpacingM > 0, growthFactor >= 1, maxSpacingM >= surfaceSpacingM');
  }
  const faces: number[] = [0];
  const layers: number[] = [];
  const layerTop: number[] = [];
  let z = 0;
  let dz = o.surfaceSpacingM;
  for (let l = 0; l < layerThicknessM.length; l++) {
    const t = layerThicknessM[l];
    if (!(t > 0) || !Number.isFinite(t)) throw new RangeError(`buildColumnGrid: layer ${l} thickness must be > 0`);
    layerTop.push(z);
    const bottom = z + t;
    while (bottom - z > 1e-9 * Math.max(1, bottom)) {
      const remaining = bottom - z;
      const h = remaining < 1.5 * dz ? remaining : dz;
      z = remaining < 1.5 * dz ? bottom : z + h;
      faces.push(z);
      layers.push(l);
      dz = Math.min(dz * o.growthFactor, o.maxSpacingM);
    }
    z = bottom;
    faces[faces.length - 1] = bottom;
  }
  const n = layers.length;
  const faceDepthM = Float64Array.from(faces);
  const thicknessM = new Float64Array(n);
  const centerDepthM = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    thicknessM[i] = faceDepthM[i + 1] - faceDepthM[i];
    centerDepthM[i] = 0.5 * (faceDepthM[i + 1] + faceDepthM[i]);
  }
  return {
    cellCount: n,
    depthM: faceDepthM[n],
    faceDepthM,
    centerDepthM,
    thicknessM,
    layerIndex: Int32Array.from(layers),
    layerTopM: Float64Array.from(layerTop),
  };
}
