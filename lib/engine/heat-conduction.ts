/**
 * 1-D transient heat conduction with phase change in a layered ground column.
 *
 * API summary
 * - Materials (heat-conduction-materials.ts, re-exported here): `isothermalMaterial({...})` (phase
 *   change at one temperature, as the `ground` command uses) or `tabulatedMaterial({...})` (any
 *   monotone enthalpy–temperature curve, e.g. with unfrozen water; soil-properties.ts builds one with
 *   `freezingCurveMaterial`). One material per layer.
 * - `new HeatConductionColumn(grid, materials, { bottomHeatFluxWm2 })`, grid from grid.ts.
 * - `step(dtSeconds, surfaceTemperatureC, snow?)`: one implicit step; `snow` = `{ thicknessM,
 *   conductivityWmK, heatCapacityJm3K }` or null/undefined for bare ground.
 * - State: `getState()` / `setState()` (Float64Array copies: enthalpy per cell, the snow
 *   temperatures and the predictor's memory, so a restored state continues bit for bit), `getEnthalpy()`, `getTemperatures()`, `setTemperatureProfile(fn)`,
 *   `setTemperatures(arr)`.
 * - Diagnostics: `thawDepthM()`, `groundSurfaceTemperatureC()`, `temperatureAtDepthC(z)`,
 *   `permafrostTableM(maxEnthalpy)` (null: no cell stayed frozen), `detectTalik(minEnthalpy,
 *   maxEnthalpy, minThicknessM = 0.2)` → `TalikInfo | null`.
 * - Statistics over every step since `resetStatistics()`: `setReportingDepths(depths)`, then
 *   `statistics()` → time-mean, min and max temperature per reporting depth, the largest thaw depth,
 *   per-cell min/max enthalpy (for the permafrost table and taliks), heat that crossed the soil surface
 *   and the base, iteration counts.
 *
 * Method (documented choice)
 * - Finite volumes: cell-centred, every layer boundary on a face (grid.ts); face conductance is the
 *   series (harmonic) combination of the two half-cells; the surface temperature is imposed on face 0
 *   (Dirichlet through half a cell); the geothermal flux enters the bottom cell (Neumann).
 * - Enthalpy formulation, fully implicit (backward Euler) in time, with the enthalpy H of each cell as
 *   the unknown. T(H) is a monotone piecewise-linear function per material (for an isothermal phase
 *   change: frozen branch, a flat segment of width L at the freezing point, thawed branch). Each step
 *   solves the nonlinear system by Newton's method on H: T is linearised within its current segment,
 *   the tridiagonal Jacobian is solved by the Thomas algorithm, and iterations stop when the
 *   linearised temperatures match T(H) within 1e-4 K (exactly, when no cell changed segment).
 *   Conductivity is semi-implicit: evaluated from the state at the start of each step and held
 *   through its iterations (k(H) is continuous, varying with the thawed fraction inside the phase
 *   change; lagging it within the step is a first-order-in-time choice that keeps the iterations
 *   few and avoids a slowly oscillating fixed point in thin, partly thawed top cells). Fluxes are
 *   conservative, so the heat that crosses the boundaries equals the change of stored enthalpy to
 *   round-off. Newton starts from a predictor, the previous step's trend (H^n + ΔH_prev·Δt/Δt_prev),
 *   which changes only the starting point and saves iterations. A step that does not converge in `maxIterations` (default 30) is kept and counted
 *   in `statistics().nonConvergedSteps`.
 * - Thaw front: inside a partly thawed cell from its thawed fraction (thawed part on top),
 *   elsewhere by linear interpolation of T − T_f between cell centres.
 * - Speed (measured with bench/heat-conduction-bench.ts, 124 cells, daily steps, isothermal materials):
 *   about 1.3 iterations a step and 12–23 million node-steps per second on this shared machine;
 *   with unfrozen-water curves about 2.1 iterations a step.
 * - Snow: up to `SNOW_CELLS` equal cells of the given thickness on top of the soil, sensible heat only,
 *   solved in the same tridiagonal system; their temperatures carry over between steps and are capped
 *   at 0 °C (melting). When snow appears, its cells start on the line between the surface and the
 *   ground temperature. The snow's own heat budget is not part of the soil energy accounting, which
 *   counts heat through the snow–soil interface.
 * - No allocation inside `step`.
 * - One class: the step, the diagnostics and the statistics share the column's private per-cell
 *   arrays of the hot loop, so they stay methods of `HeatConductionColumn` in this file; the
 *   materials are in heat-conduction-materials.ts.
 *
 * References
 * [1] H. S. Carslaw, J. C. Jaeger, Conduction of Heat in Solids, 2nd ed., Oxford, 1959.
 * [2] V. R. Voller, C. R. Swaminathan, B. G. Thomas, "Fixed grid techniques for phase change problems:
 *     a review," Int. J. Numer. Methods Eng. 30(4), 875–898, 1990.
 * [3] S. V. Patankar, Numerical Heat Transfer and Fluid Flow, Hemisphere, 1980 (harmonic face
 *     conductivity, tridiagonal matrix algorithm).
 */
import type { ColumnGrid } from './grid';
import type { PhaseChangeMaterial } from './heat-conduction-materials';

export { isothermalMaterial, tabulatedMaterial, type IsothermalMaterialParams, type PhaseChangeMaterial } from './heat-conduction-materials';

/** A snow cover for one step. */
export interface SnowCover {
  /** [m]; below `MIN_SNOW_THICKNESS_M` the ground is treated as bare. */
  thicknessM: number;
  /** Effective conductivity [W m-1 K-1] (e.g. snowConductivitySturm1997). */
  conductivityWmK: number;
  /** Volumetric heat capacity [J m-3 K-1] (e.g. snowHeatCapacity). */
  heatCapacityJm3K: number;
}


/**
 * Largest difference [K] between the linearised and the true temperature of a cell accepted at
 * convergence (a choice of this engine: 1e-4 K, far below any reported precision).
 */
export const LINEARISATION_TOLERANCE_K = 1e-4;

/** Number of snow cells (equal thickness) solved on top of the soil. */
export const SNOW_CELLS = 3;
/** Snow thinner than this is ignored [m] (a screening choice). */
export const MIN_SNOW_THICKNESS_M = 0.005;

export interface HeatConductionOptions {
  /** Heat flowing upward into the column at its base [W m-2], default 0. */
  bottomHeatFluxWm2?: number;
  /** Newton iterations per step before giving up (the step is kept; counted). Default 30. */
  maxIterations?: number;
}

/** A restorable state of the column. */
export interface ColumnState {
  enthalpyJm3: Float64Array;
  snowTemperatureC: Float64Array;
  snowActive: boolean;
  /** Ground-surface temperature after the last step [°C] (for thawDepthM right after setState). */
  groundSurfaceTemperatureC?: number;
  /** Predictor memory (enthalpy at the start of the last step, and that step [s]), so a restored
   * state continues bit for bit as the original would. */
  previousEnthalpyJm3?: Float64Array;
  previousStepS?: number;
}

/** Statistics over every step since the last `resetStatistics()`. */
export interface ColumnStatistics {
  durationS: number;
  stepCount: number;
  /** Per reporting depth [°C]: time mean, minimum and maximum over every step. */
  meanTemperatureC: Float64Array;
  minTemperatureC: Float64Array;
  maxTemperatureC: Float64Array;
  /** Largest thaw depth after any step [m]. */
  maxThawDepthM: number;
  /** Per cell: minimum and maximum enthalpy reached [J m-3]. */
  minEnthalpyJm3: Float64Array;
  maxEnthalpyJm3: Float64Array;
  /** Heat into the soil through its top (under snow: through the snow–soil interface) [J m-2]. */
  surfaceHeatInJm2: number;
  /** Heat into the column through its base [J m-2]. */
  baseHeatInJm2: number;
  iterations: number;
  nonConvergedSteps: number;
}

/** A talik found in the extremes of a period. */
export interface TalikInfo {
  topM: number;
  bottomM: number;
  thicknessM: number;
}

/**
 * A layered ground column solved by the implicit enthalpy method (see the module comment).
 */
export class HeatConductionColumn {
  readonly grid: ColumnGrid;
  readonly materials: readonly PhaseChangeMaterial[];
  // Scalars that take fractional values live in a Float64Array rather than in object fields, so
  // the fields' representation never changes (a Smi-to-double field transition deoptimises step).
  private readonly sc = new Float64Array(7);
  /** Previous step [s]; < 0: no predictor (fresh or reset state). */
  private get dtPrevS(): number {
    return this.sc[6];
  }
  private set dtPrevS(v: number) {
    this.sc[6] = v;
  }
  /** Heat flowing upward into the column at its base [W m-2]. */
  get bottomHeatFluxWm2(): number {
    return this.sc[5];
  }
  set bottomHeatFluxWm2(v: number) {
    this.sc[5] = v;
  }
  private get surfaceT(): number {
    return this.sc[0];
  }
  private set surfaceT(v: number) {
    this.sc[0] = v;
  }
  private get statTime(): number {
    return this.sc[1];
  }
  private set statTime(v: number) {
    this.sc[1] = v;
  }
  private get statMaxThaw(): number {
    return this.sc[2];
  }
  private set statMaxThaw(v: number) {
    this.sc[2] = v;
  }
  private get statSurfaceIn(): number {
    return this.sc[3];
  }
  private set statSurfaceIn(v: number) {
    this.sc[3] = v;
  }
  private get statBaseIn(): number {
    return this.sc[4];
  }
  private set statBaseIn(v: number) {
    this.sc[4] = v;
  }
  private readonly maxIterations: number;
  private readonly n: number;
  // flattened material tables
  private readonly bpH: Float64Array;
  private readonly bpT: Float64Array;
  private readonly bpK: Float64Array;
  private readonly segSlopeT: Float64Array;
  private readonly segSlopeK: Float64Array;
  private readonly cellOff: Int32Array;
  private readonly cellCnt: Int32Array;
  private readonly cellInvCBelow: Float64Array;
  private readonly cellInvCAbove: Float64Array;
  private readonly cellTf: Float64Array;
  private readonly cellFlatLo: Float64Array;
  private readonly cellFlatHi: Float64Array;
  // state over positions p = 0 … SNOW_CELLS + n − 1; soil cell c is at p = SNOW_CELLS + c
  private readonly h: Float64Array;
  private readonly hOld: Float64Array;
  private readonly hPrev: Float64Array; // enthalpy at the start of the previous step (predictor)
  private readonly t: Float64Array;
  private readonly s: Float64Array;
  private readonly k: Float64Array;
  private readonly dz: Float64Array;
  private readonly seg: Int32Array;
  private readonly g: Float64Array; // conductance between p and p + 1
  private readonly kDirty: Uint8Array; // k changed since g was last computed
  private readonly rhs: Float64Array;
  private readonly cp: Float64Array;
  private snowActive = false;
  // statistics
  private repDepth = new Float64Array(0);
  private repIdx = new Int32Array(0); // position of the upper point (−1: surface)
  private repW = new Float64Array(0); // weight of the lower point
  private repSum = new Float64Array(0);
  private repMin = new Float64Array(0);
  private repMax = new Float64Array(0);
  private readonly cellMinH: Float64Array;
  private readonly cellMaxH: Float64Array;
  private statSteps = 0;
  private statIter = 0;
  private statNonConv = 0;

  /**
   * @param grid Column grid (grid.ts).
   * @param materials One material per layer of the grid (grid.layerIndex).
   * @param options Geothermal flux [W m-2] and iteration limit.
   */
  constructor(grid: ColumnGrid, materials: readonly PhaseChangeMaterial[], options: HeatConductionOptions = {}) {
    this.grid = grid;
    this.materials = materials;
    this.bottomHeatFluxWm2 = options.bottomHeatFluxWm2 ?? 0;
    this.maxIterations = options.maxIterations ?? 30;
    const n = grid.cellCount;
    this.n = n;
    let maxLayer = 0;
    for (let c = 0; c < n; c++) maxLayer = Math.max(maxLayer, grid.layerIndex[c]);
    if (materials.length <= maxLayer) throw new RangeError('HeatConductionColumn: one material per grid layer is needed');
    const offs: number[] = [];
    let total = 0;
    for (const m of materials) {
      offs.push(total);
      total += m.enthalpyJm3.length;
    }
    this.bpH = new Float64Array(total);
    this.bpT = new Float64Array(total);
    this.bpK = new Float64Array(total);
    this.segSlopeT = new Float64Array(total);
    this.segSlopeK = new Float64Array(total);
    materials.forEach((m, i) => {
      const o = offs[i];
      for (let j = 0; j < m.enthalpyJm3.length; j++) {
        this.bpH[o + j] = m.enthalpyJm3[j];
        this.bpT[o + j] = m.temperatureC[j];
        this.bpK[o + j] = m.conductivityWmK[j];
        if (j > 0) {
          const dh = m.enthalpyJm3[j] - m.enthalpyJm3[j - 1];
          this.segSlopeT[o + j] = dh > 0 ? (m.temperatureC[j] - m.temperatureC[j - 1]) / dh : 0;
          this.segSlopeK[o + j] = dh > 0 ? (m.conductivityWmK[j] - m.conductivityWmK[j - 1]) / dh : 0;
        }
      }
    });
    this.cellOff = new Int32Array(n);
    this.cellCnt = new Int32Array(n);
    this.cellInvCBelow = new Float64Array(n);
    this.cellInvCAbove = new Float64Array(n);
    this.cellTf = new Float64Array(n);
    this.cellFlatLo = new Float64Array(n).fill(NaN);
    this.cellFlatHi = new Float64Array(n).fill(NaN);
    for (let c = 0; c < n; c++) {
      const li = grid.layerIndex[c];
      const m = materials[li];
      this.cellOff[c] = offs[li];
      this.cellCnt[c] = m.enthalpyJm3.length;
      this.cellInvCBelow[c] = 1 / m.heatCapacityBelowJm3K;
      this.cellInvCAbove[c] = 1 / m.heatCapacityAboveJm3K;
      this.cellTf[c] = m.freezingPointC;
      if (m.latentRangeJm3) {
        this.cellFlatLo[c] = m.latentRangeJm3[0];
        this.cellFlatHi[c] = m.latentRangeJm3[1];
      }
    }
    const np = SNOW_CELLS + n;
    this.h = new Float64Array(np);
    this.hOld = new Float64Array(np);
    this.hPrev = new Float64Array(np);
    this.t = new Float64Array(np);
    this.s = new Float64Array(np);
    this.k = new Float64Array(np);
    this.dz = new Float64Array(np);
    this.seg = new Int32Array(np);
    this.g = new Float64Array(np);
    this.kDirty = new Uint8Array(np).fill(1);
    this.rhs = new Float64Array(np);
    this.cp = new Float64Array(np);
    for (let c = 0; c < n; c++) this.dz[SNOW_CELLS + c] = grid.thicknessM[c];
    this.cellMinH = new Float64Array(n);
    this.cellMaxH = new Float64Array(n);
    this.setTemperatureProfile(() => 0);
  }

  /** Number of soil cells. */
  get cellCount(): number {
    return this.n;
  }

  // ---- material curve evaluation --------------------------------------------------------------

  /** Locates the segment of enthalpy hv for soil cell c, starting from hint; returns the segment. */
  private locate(c: number, hv: number, hint: number): number {
    const o = this.cellOff[c];
    const m = this.cellCnt[c];
    const bpH = this.bpH;
    let sg = hint;
    while (sg < m && hv > bpH[o + sg]) sg++;
    while (sg > 0 && hv <= bpH[o + sg - 1]) sg--;
    return sg;
  }

  /** Temperature [°C] of soil cell c at enthalpy hv [J m-3] (any enthalpy, not only the current). */
  temperatureFromEnthalpy(c: number, hv: number): number {
    const sg = this.locate(c, hv, 0);
    return this.tempInSeg(c, hv, sg);
  }

  private tempInSeg(c: number, hv: number, sg: number): number {
    const o = this.cellOff[c];
    const m = this.cellCnt[c];
    if (sg === 0) return this.bpT[o] + (hv - this.bpH[o]) * this.cellInvCBelow[c];
    if (sg === m) return this.bpT[o + m - 1] + (hv - this.bpH[o + m - 1]) * this.cellInvCAbove[c];
    return this.bpT[o + sg - 1] + (hv - this.bpH[o + sg - 1]) * this.segSlopeT[o + sg];
  }

  /** Enthalpy [J m-3] of soil cell c at temperature tv [°C]; at T_f exactly, the frozen end. */
  enthalpyFromTemperature(c: number, tv: number): number {
    const o = this.cellOff[c];
    const m = this.cellCnt[c];
    const bpT = this.bpT;
    const bpH = this.bpH;
    if (tv <= bpT[o]) return bpH[o] + (tv - bpT[o]) / this.cellInvCBelow[c];
    if (tv > bpT[o + m - 1]) return bpH[o + m - 1] + (tv - bpT[o + m - 1]) / this.cellInvCAbove[c];
    for (let j = 1; j < m; j++) {
      if (tv <= bpT[o + j]) {
        const dt = bpT[o + j] - bpT[o + j - 1];
        if (dt <= 0) return bpH[o + j - 1];
        return bpH[o + j - 1] + ((tv - bpT[o + j - 1]) / dt) * (bpH[o + j] - bpH[o + j - 1]);
      }
    }
    return bpH[o + m - 1];
  }

  /** Refreshes t, s, k, seg of soil position p from h. */
  private evalSoil(p: number): void {
    this.kDirty[p] = 1;
    const c = p - SNOW_CELLS;
    const hv = this.h[p];
    const sg = this.locate(c, hv, this.seg[p]);
    this.seg[p] = sg;
    const o = this.cellOff[c];
    const m = this.cellCnt[c];
    if (sg === 0) {
      this.s[p] = this.cellInvCBelow[c];
      this.t[p] = this.bpT[o] + (hv - this.bpH[o]) * this.s[p];
      this.k[p] = this.bpK[o];
    } else if (sg === m) {
      this.s[p] = this.cellInvCAbove[c];
      this.t[p] = this.bpT[o + m - 1] + (hv - this.bpH[o + m - 1]) * this.s[p];
      this.k[p] = this.bpK[o + m - 1];
    } else {
      const d = hv - this.bpH[o + sg - 1];
      this.s[p] = this.segSlopeT[o + sg];
      this.t[p] = this.bpT[o + sg - 1] + d * this.s[p];
      this.k[p] = this.bpK[o + sg - 1] + d * this.segSlopeK[o + sg];
    }
  }

  // ---- state ----------------------------------------------------------------------------------

  /** Sets every soil cell from a temperature function of depth [°C at m] (cell centres). */
  setTemperatureProfile(temperatureAtDepthC: (depthM: number) => number): void {
    for (let c = 0; c < this.n; c++) {
      this.h[SNOW_CELLS + c] = this.enthalpyFromTemperature(c, temperatureAtDepthC(this.grid.centerDepthM[c]));
    }
    this.snowActive = false;
    this.refreshAll();
    this.surfaceT = this.t[SNOW_CELLS];
  }

  /** Sets the soil cells' temperatures [°C] (one per cell; at T_f exactly: frozen). */
  setTemperatures(temperatureC: ArrayLike<number>): void {
    if (temperatureC.length !== this.n) throw new RangeError('setTemperatures: one value per cell');
    this.setTemperatureProfile(() => 0);
    for (let c = 0; c < this.n; c++) this.h[SNOW_CELLS + c] = this.enthalpyFromTemperature(c, temperatureC[c]);
    this.refreshAll();
    this.surfaceT = this.t[SNOW_CELLS];
  }

  /** Copy of the soil cells' enthalpy [J m-3]. */
  getEnthalpy(): Float64Array {
    return this.h.slice(SNOW_CELLS);
  }

  /** Sets the soil cells' enthalpy [J m-3] (e.g. a cached state). */
  setEnthalpy(enthalpyJm3: ArrayLike<number>): void {
    if (enthalpyJm3.length !== this.n) throw new RangeError('setEnthalpy: one value per cell');
    for (let c = 0; c < this.n; c++) this.h[SNOW_CELLS + c] = enthalpyJm3[c];
    this.refreshAll();
  }

  /** Adds each soil cell's temperature [°C] to `acc` (one value per cell), without allocating. */
  accumulateTemperatures(acc: Float64Array): void {
    for (let c = 0; c < this.n; c++) acc[c] += this.t[SNOW_CELLS + c];
  }

  /** Deepest thaw since the last resetStatistics() [m] (as in statistics(), without its copies). */
  get maxThawDepthM(): number {
    return this.statMaxThaw;
  }

  /** Copy of the soil cells' temperatures [°C]. */
  getTemperatures(): Float64Array {
    return this.t.slice(SNOW_CELLS);
  }

  /** A copy of the full state (soil enthalpy and snow temperatures). */
  getState(): ColumnState {
    return {
      enthalpyJm3: this.getEnthalpy(),
      snowTemperatureC: this.t.slice(0, SNOW_CELLS),
      snowActive: this.snowActive,
      groundSurfaceTemperatureC: this.surfaceT,
      previousEnthalpyJm3: this.hPrev.slice(SNOW_CELLS),
      previousStepS: this.dtPrevS,
    };
  }

  /** Restores a state from `getState()` (copied). */
  setState(state: ColumnState): void {
    this.setEnthalpy(state.enthalpyJm3);
    for (let p = 0; p < SNOW_CELLS; p++) this.t[p] = state.snowTemperatureC[p] ?? 0;
    this.snowActive = state.snowActive;
    this.surfaceT = state.groundSurfaceTemperatureC ?? this.t[SNOW_CELLS];
    if (state.previousEnthalpyJm3 && state.previousEnthalpyJm3.length === this.n && state.previousStepS !== undefined) {
      this.hPrev.set(state.previousEnthalpyJm3, SNOW_CELLS);
      this.dtPrevS = state.previousStepS;
    }
  }

  private refreshAll(): void {
    this.dtPrevS = -1;
    for (let p = SNOW_CELLS; p < SNOW_CELLS + this.n; p++) {
      this.seg[p] = 0;
      this.evalSoil(p);
    }
  }

  // ---- time step ------------------------------------------------------------------------------

  /**
   * Advances the column by one implicit step.
   * @param dtSeconds Step [s], > 0.
   * @param surfaceTemperatureC Temperature imposed at the top [°C]: the ground surface, or the snow
   *   surface when `snow` is given.
   * @param snow Optional snow cover for this step.
   */
  step(dtSeconds: number, surfaceTemperatureC: number, snow?: SnowCover | null): void {
    const n = this.n;
    const end = SNOW_CELLS + n;
    const h = this.h;
    const hOld = this.hOld;
    const t = this.t;
    const s = this.s;
    const k = this.k;
    const dz = this.dz;
    const g = this.g;
    const rhs = this.rhs;
    const cp = this.cp;
    const invDt = 1 / dtSeconds;

    // snow set-up
    const withSnow = !!snow && snow.thicknessM >= MIN_SNOW_THICKNESS_M;
    const start = withSnow ? 0 : SNOW_CELLS;
    if (withSnow) {
      const cs = snow.heatCapacityJm3K;
      const d = snow.thicknessM / SNOW_CELLS;
      if (!this.snowActive) {
        const tg = t[SNOW_CELLS];
        for (let p = 0; p < SNOW_CELLS; p++) {
          const f = (p + 0.5) / SNOW_CELLS;
          t[p] = Math.min(0, surfaceTemperatureC + f * (tg - surfaceTemperatureC));
        }
      }
      for (let p = 0; p < SNOW_CELLS; p++) {
        dz[p] = d;
        k[p] = snow.conductivityWmK;
        this.kDirty[p] = 1;
        s[p] = 1 / cs;
        h[p] = cs * t[p];
      }
    }
    this.snowActive = withSnow;
    for (let p = start; p < SNOW_CELLS; p++) hOld[p] = h[p]; // soil cells: in the predictor pass

    const qBase = this.bottomHeatFluxWm2;
    let gTop = 0;
    let iter = 0;
    let converged = false;
    let tTopLin = 0;
    let tSoilLin = 0;
    let tAboveSoilLin = 0;
    let gInterface = 0;
    const seg = this.seg;
    const bpH = this.bpH;
    const bpT = this.bpT;
    const bpK = this.bpK;
    const slT = this.segSlopeT;
    const slK = this.segSlopeK;
    const cellOff = this.cellOff;
    const cellCnt = this.cellCnt;
    const invCb = this.cellInvCBelow;
    const invCa = this.cellInvCAbove;
    const last = end - 1;
    const kDirty = this.kDirty;
    // Predictor: start Newton from the previous step's trend, H* = H^n + (H^n − H^(n−1))·Δt/Δt_prev
    // (soil cells only; conductivities stay those of H^n). It changes only the starting point of
    // the iteration, not the converged solution, and saves iterations under smooth forcing.
    const hPrev = this.hPrev;
    const ratio = this.dtPrevS > 0 ? dtSeconds / this.dtPrevS : 0;
    for (let p = SNOW_CELLS; p <= last; p++) {
      const hn = h[p];
      hOld[p] = hn;
      const dh = (hn - hPrev[p]) * ratio;
      hPrev[p] = hn;
      if (dh === 0) continue;
      const hv = hn + dh;
      h[p] = hv;
      const c = p - SNOW_CELLS;
      const o = cellOff[c];
      const mm = cellCnt[c];
      let sg = seg[p];
      while (sg < mm && hv > bpH[o + sg]) sg++;
      while (sg > 0 && hv <= bpH[o + sg - 1]) sg--;
      seg[p] = sg;
      if (sg === 0) {
        s[p] = invCb[c];
        t[p] = bpT[o] + (hv - bpH[o]) * s[p];
      } else if (sg === mm) {
        s[p] = invCa[c];
        t[p] = bpT[o + mm - 1] + (hv - bpH[o + mm - 1]) * s[p];
      } else {
        s[p] = slT[o + sg];
        t[p] = bpT[o + sg - 1] + (hv - bpH[o + sg - 1]) * s[p];
      }
    }
    this.dtPrevS = dtSeconds;
    while (iter < this.maxIterations) {
      iter++;
      // Assemble (residual, Jacobian) and eliminate forward in one pass (Thomas algorithm; the
      // Jacobian is column-diagonally dominant, so no pivoting is needed).
      gTop = (2 * k[start]) / dz[start];
      let gw = gTop;
      let tw = surfaceTemperatureC;
      let sw = 0; // slope of the upper neighbour (0: the surface is fixed)
      let cPrev = 0;
      let dPrev = 0;
      for (let p = start; p <= last; p++) {
        const tp = t[p];
        const sp = s[p];
        let ge = 0;
        let te = 0;
        let se = 0;
        if (p < last) {
          // conductances are cached and recomputed only where a conductivity changed
          if (kDirty[p] !== 0 || kDirty[p + 1] !== 0) g[p] = 1 / ((0.5 * dz[p]) / k[p] + (0.5 * dz[p + 1]) / k[p + 1]);
          ge = g[p];
          te = t[p + 1];
          se = s[p + 1];
        }
        kDirty[p] = 0;
        const cap = dz[p] * invDt;
        let r = cap * (h[p] - hOld[p]) - gw * (tw - tp) - ge * (te - tp);
        if (p === last) r -= qBase;
        const a = -gw * sw;
        const b = cap + (gw + ge) * sp;
        const cc = -ge * se;
        const m = 1 / (b - a * cPrev);
        cPrev = cc * m;
        dPrev = (-r - a * dPrev) * m;
        cp[p] = cPrev;
        rhs[p] = dPrev;
        gw = ge;
        tw = tp;
        sw = sp;
      }
      // Back substitution fused with the update of the iterate (bottom up). The linearised
      // boundary temperatures (the ones this solve's fluxes used) are taken before each update.
      let maxErr = 0;
      let maxDh = 0;
      let next = 0;
      for (let p = last; p >= start; p--) {
        const d = p === last ? rhs[p] : rhs[p] - cp[p] * next;
        next = d;
        if (p === start) tTopLin = t[p] + s[p] * d;
        if (p < SNOW_CELLS) {
          // snow cells are linear
          if (p === SNOW_CELLS - 1) tAboveSoilLin = t[p] + s[p] * d;
          h[p] += d;
          t[p] = h[p] * s[p];
          continue;
        }
        if (p === SNOW_CELLS) tSoilLin = t[p] + s[p] * d;
        const hv = h[p] + d;
        const tLin = t[p] + s[p] * d;
        h[p] = hv;
        const ad = d < 0 ? -d : d;
        if (ad > maxDh) maxDh = ad;
        const c = p - SNOW_CELLS;
        const o = cellOff[c];
        const mm = cellCnt[c];
        const before = seg[p];
        let sg = before;
        while (sg < mm && hv > bpH[o + sg]) sg++;
        while (sg > 0 && hv <= bpH[o + sg - 1]) sg--;
        if (sg === 0) {
          const sl = invCb[c];
          s[p] = sl;
          t[p] = bpT[o] + (hv - bpH[o]) * sl;
        } else if (sg === mm) {
          const sl = invCa[c];
          s[p] = sl;
          t[p] = bpT[o + mm - 1] + (hv - bpH[o + mm - 1]) * sl;
        } else {
          const sl = slT[o + sg];
          s[p] = sl;
          t[p] = bpT[o + sg - 1] + (hv - bpH[o + sg - 1]) * sl;
        }
        if (sg !== before) {
          seg[p] = sg;
          const e = t[p] > tLin ? t[p] - tLin : tLin - t[p];
          if (e > maxErr) maxErr = e;
        }
      }
      if (withSnow) gInterface = g[SNOW_CELLS - 1];
      // Converged when the linearisation was exact to LINEARISATION_TOLERANCE_K: no cell changed
      // segment (T(H) is then linear), or those that did landed where the linearised temperature
      // is within the tolerance of T(H) (smooth unfrozen-water curves); or the update is negligible.
      if (maxErr <= LINEARISATION_TOLERANCE_K || maxDh < 1e-3) {
        converged = true;
        break;
      }
    }
    // conductivities for the next step (semi-implicit: held through each step's iterations), and
    // the per-cell enthalpy extremes of the statistics, in one pass
    const cellMinH = this.cellMinH;
    const cellMaxH = this.cellMaxH;
    for (let p = SNOW_CELLS; p <= last; p++) {
      const c = p - SNOW_CELLS;
      const hv = h[p];
      if (hv < cellMinH[c]) cellMinH[c] = hv;
      if (hv > cellMaxH[c]) cellMaxH[c] = hv;
      const o = cellOff[c];
      const mm = cellCnt[c];
      const sg = seg[p];
      const kn = sg === 0 ? bpK[o] : sg === mm ? bpK[o + mm - 1] : bpK[o + sg - 1] + (h[p] - bpH[o + sg - 1]) * slK[o + sg];
      if (kn !== k[p]) {
        k[p] = kn;
        kDirty[p] = 1;
      }
    }
    this.statIter += iter;
    if (!converged) this.statNonConv++;

    // snow melts at 0 °C
    if (withSnow) {
      for (let p = 0; p < SNOW_CELLS; p++) {
        if (t[p] > 0) {
          t[p] = 0;
          h[p] = 0;
        }
      }
    }

    // energy accounting for the soil (fluxes exactly as used in the last solve)
    const qSurf = withSnow ? gInterface * (tAboveSoilLin - tSoilLin) : gTop * (surfaceTemperatureC - tTopLin);
    this.statSurfaceIn += qSurf * dtSeconds;
    this.statBaseIn += qBase * dtSeconds;
    this.surfaceT = withSnow ? this.interfaceTemperature() : surfaceTemperatureC;

    this.updateStatistics(dtSeconds);
  }

  private interfaceTemperature(): number {
    const p = SNOW_CELLS - 1;
    const q = SNOW_CELLS;
    const ga = (2 * this.k[p]) / this.dz[p];
    const gb = (2 * this.k[q]) / this.dz[q];
    return (ga * this.t[p] + gb * this.t[q]) / (ga + gb);
  }

  // ---- diagnostics ----------------------------------------------------------------------------

  /** Ground-surface temperature after the last step [°C] (under snow: the snow–soil interface). */
  groundSurfaceTemperatureC(): number {
    return this.surfaceT;
  }

  /**
   * Thaw depth as the engine contract defines it [m]: 0 while the ground surface is at or below the
   * top layer's freezing point; otherwise the first depth at which the temperature reaches its
   * layer's freezing point (inside a cell in the isothermal phase change, from its thawed fraction;
   * otherwise interpolated linearly between cell centres); the column depth if nothing is frozen.
   */
  thawDepthM(): number {
    // fast path of thawDepthFrom on the current state (temperatures already evaluated)
    const n = this.n;
    const tf = this.cellTf;
    if (!(this.surfaceT > tf[0])) return 0;
    const t = this.t;
    let c = 0;
    while (c < n && t[SNOW_CELLS + c] > tf[c]) c++;
    if (c === n) return this.grid.depthM;
    const hv = this.h[SNOW_CELLS + c];
    const flo = this.cellFlatLo[c];
    const fhi = this.cellFlatHi[c];
    if (hv > flo && hv < fhi) return this.grid.faceDepthM[c] + ((hv - flo) / (fhi - flo)) * this.grid.thicknessM[c];
    const zPrev = c === 0 ? 0 : this.grid.centerDepthM[c - 1];
    const gPrev = c === 0 ? this.surfaceT - tf[0] : t[SNOW_CELLS + c - 1] - tf[c - 1];
    const gHere = t[SNOW_CELLS + c] - tf[c];
    return zPrev + (gPrev / (gPrev - gHere)) * (this.grid.centerDepthM[c] - zPrev);
  }

  private thawDepthFrom(surfaceT: number, hArr: Float64Array): number {
    const n = this.n;
    const grid = this.grid;
    if (!(surfaceT > this.cellTf[0])) return 0;
    let zPrev = 0;
    let gPrev = surfaceT - this.cellTf[0];
    for (let c = 0; c < n; c++) {
      const hv = hArr[SNOW_CELLS + c];
      const tv = this.temperatureFromEnthalpy(c, hv);
      const tf = this.cellTf[c];
      if (tv > tf) {
        zPrev = grid.centerDepthM[c];
        gPrev = tv - tf;
        continue;
      }
      const flo = this.cellFlatLo[c];
      const fhi = this.cellFlatHi[c];
      if (hv > flo && hv < fhi) {
        // partly thawed cell: the thawed part lies on top
        return grid.faceDepthM[c] + ((hv - flo) / (fhi - flo)) * grid.thicknessM[c];
      }
      const gHere = tv - tf; // <= 0
      const zc = grid.centerDepthM[c];
      return zPrev + (gPrev / (gPrev - gHere)) * (zc - zPrev);
    }
    return grid.depthM;
  }

  /** Temperature at a depth [°C], linear between the surface and the cell centres. */
  temperatureAtDepthC(depthM: number): number {
    const zc = this.grid.centerDepthM;
    const n = this.n;
    if (depthM <= zc[0]) {
      const w = depthM / zc[0];
      return (1 - w) * this.surfaceT + w * this.t[SNOW_CELLS];
    }
    if (depthM >= zc[n - 1]) return this.t[SNOW_CELLS + n - 1];
    let c = 0;
    while (zc[c + 1] < depthM) c++;
    const w = (depthM - zc[c]) / (zc[c + 1] - zc[c]);
    return (1 - w) * this.t[SNOW_CELLS + c] + w * this.t[SNOW_CELLS + c + 1];
  }

  /**
   * Depth of the permafrost table [m]: the top of the shallowest ground that stayed frozen during a
   * period, from the per-cell maximum enthalpy of that period (see `statistics()`). Computed like
   * the thaw depth, on the profile of maxima, with a thawed surface. Null if no cell stayed frozen.
   * @param maxEnthalpyJm3 Per-cell maximum enthalpy over the period [J m-3].
   */
  permafrostTableM(maxEnthalpyJm3: Float64Array): number | null {
    const n = this.n;
    let any = false;
    for (let c = 0; c < n; c++) {
      if (!(this.temperatureFromEnthalpy(c, maxEnthalpyJm3[c]) > this.cellTf[c])) {
        any = true;
        break;
      }
    }
    if (!any) return null;
    const tmp = this.scratchProfile(maxEnthalpyJm3);
    const t0 = this.temperatureFromEnthalpy(0, maxEnthalpyJm3[0]);
    if (!(t0 > this.cellTf[0])) {
      // the top cell never fully rose above freezing: the table lies within it or at the surface
      const lo = this.cellFlatLo[0];
      const hi = this.cellFlatHi[0];
      const hv = maxEnthalpyJm3[0];
      return hv > lo && hv < hi ? ((hv - lo) / (hi - lo)) * this.grid.thicknessM[0] : 0;
    }
    return this.thawDepthFrom(Math.max(t0, this.cellTf[0] + 1e-9), tmp);
  }

  private scratch: Float64Array | null = null;
  private scratchProfile(cellH: Float64Array): Float64Array {
    if (!this.scratch) this.scratch = new Float64Array(SNOW_CELLS + this.n);
    this.scratch.set(cellH, SNOW_CELLS);
    return this.scratch;
  }

  /**
   * Talik detection from the extremes of a period (e.g. two years running): a contiguous run of
   * cells that never froze (minimum temperature above the freezing point), at least
   * `minThicknessM` thick, with ground that never thawed (permafrost) below it. Unfrozen ground
   * below the permafrost base is therefore not a talik, nor is ground where no permafrost remains.
   * @param minEnthalpyJm3 Per-cell minimum enthalpy over the period [J m-3].
   * @param maxEnthalpyJm3 Per-cell maximum enthalpy over the period [J m-3].
   * @param minThicknessM Smallest talik thickness [m], default 0.2 (common practice).
   * @returns The shallowest talik, or null.
   */
  detectTalik(minEnthalpyJm3: Float64Array, maxEnthalpyJm3: Float64Array, minThicknessM = 0.2): TalikInfo | null {
    const n = this.n;
    const grid = this.grid;
    let runTop = -1;
    let found: TalikInfo | null = null;
    for (let c = 0; c <= n; c++) {
      const neverFrozen = c < n && this.temperatureFromEnthalpy(c, minEnthalpyJm3[c]) > this.cellTf[c];
      if (neverFrozen) {
        if (runTop < 0) runTop = c;
        continue;
      }
      if (runTop >= 0) {
        const top = grid.faceDepthM[runTop];
        const bottom = grid.faceDepthM[c];
        if (!found && bottom - top >= minThicknessM) {
          for (let j = c; j < n; j++) {
            if (!(this.temperatureFromEnthalpy(j, maxEnthalpyJm3[j]) > this.cellTf[j])) {
              found = { topM: top, bottomM: bottom, thicknessM: bottom - top };
              break;
            }
          }
        }
        runTop = -1;
      }
      if (found) break;
    }
    return found;
  }

  // ---- statistics -----------------------------------------------------------------------------

  /** Sets the depths [m] at which `statistics()` reports temperature; resets the statistics. */
  setReportingDepths(depthsM: readonly number[]): void {
    const m = depthsM.length;
    this.repDepth = Float64Array.from(depthsM);
    this.repIdx = new Int32Array(m);
    this.repW = new Float64Array(m);
    this.repSum = new Float64Array(m);
    this.repMin = new Float64Array(m);
    this.repMax = new Float64Array(m);
    const zc = this.grid.centerDepthM;
    const n = this.n;
    for (let i = 0; i < m; i++) {
      const z = depthsM[i];
      if (z <= zc[0]) {
        this.repIdx[i] = -1;
        this.repW[i] = Math.max(0, z / zc[0]);
      } else if (z >= zc[n - 1]) {
        this.repIdx[i] = n - 2;
        this.repW[i] = 1;
      } else {
        let c = 0;
        while (zc[c + 1] < z) c++;
        this.repIdx[i] = c;
        this.repW[i] = (z - zc[c]) / (zc[c + 1] - zc[c]);
      }
    }
    this.resetStatistics();
  }

  /** Starts a new statistics period (e.g. a year). */
  resetStatistics(): void {
    this.statTime = 0;
    this.statSteps = 0;
    this.statMaxThaw = 0;
    this.statSurfaceIn = 0;
    this.statBaseIn = 0;
    this.statIter = 0;
    this.statNonConv = 0;
    this.repSum.fill(0);
    this.repMin.fill(Infinity);
    this.repMax.fill(-Infinity);
    this.cellMinH.set(this.h.subarray(SNOW_CELLS));
    this.cellMaxH.set(this.h.subarray(SNOW_CELLS));
  }

  private updateStatistics(dt: number): void {
    this.statTime += dt;
    this.statSteps++;
    const t = this.t;
    const m = this.repDepth.length;
    for (let i = 0; i < m; i++) {
      const c = this.repIdx[i];
      const w = this.repW[i];
      const upper = c < 0 ? this.surfaceT : t[SNOW_CELLS + c];
      const v = (1 - w) * upper + w * t[SNOW_CELLS + c + 1];
      this.repSum[i] += v * dt;
      if (v < this.repMin[i]) this.repMin[i] = v;
      if (v > this.repMax[i]) this.repMax[i] = v;
    }
    // (per-cell enthalpy extremes are updated in step)
    if (this.surfaceT > this.cellTf[0]) {
      const d = this.thawDepthM();
      if (d > this.statMaxThaw) this.statMaxThaw = d;
    }
  }

  /** Statistics since the last reset (copies). Min/max are ±Infinity-free only after one step. */
  statistics(): ColumnStatistics {
    const m = this.repDepth.length;
    const mean = new Float64Array(m);
    for (let i = 0; i < m; i++) mean[i] = this.statTime > 0 ? this.repSum[i] / this.statTime : NaN;
    return {
      durationS: this.statTime,
      stepCount: this.statSteps,
      meanTemperatureC: mean,
      minTemperatureC: this.repMin.slice(),
      maxTemperatureC: this.repMax.slice(),
      maxThawDepthM: this.statMaxThaw,
      minEnthalpyJm3: this.cellMinH.slice(),
      maxEnthalpyJm3: this.cellMaxH.slice(),
      surfaceHeatInJm2: this.statSurfaceIn,
      baseHeatInJm2: this.statBaseIn,
      iterations: this.statIter,
      nonConvergedSteps: this.statNonConv,
    };
  }

  /** Total stored enthalpy of the soil [J m-2] (Σ H·Δz). */
  totalEnthalpyJm2(): number {
    let e = 0;
    for (let c = 0; c < this.n; c++) e += this.h[SNOW_CELLS + c] * this.grid.thicknessM[c];
    return e;
  }
}
