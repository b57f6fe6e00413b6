/**
 * Site model, calibration: the surface parameters adjusted within their published ranges so the
 * equilibrium under the baseline normals matches an observed active-layer thickness and mean annual
 * ground temperature (when the site gives them).
 *
 * API: `calibrateSurface(prepared, start, targets, offsets)` → `{ params, adjusted }`;
 * `valueAtDepth(values, depthM)`; `CalibrationStatus`, `CalibrationReport`.
 */
import { DAYS_PER_YEAR } from './constants';
import { HeatConductionColumn } from './heat-conduction';
import { ENVELOPE_DEPTHS_M, createSiteColumn, type PreparedSite, type SurfaceParameters } from './site-model-preparation';
import { spinUp } from './site-model-spin-up';

// ---- calibration ---------------------------------------------------------------------------

export type CalibrationStatus = 'uncalibrated' | 'calibrated' | 'calibration_not_reached';

export interface CalibrationReport {
  status: CalibrationStatus;
  /** Observed targets, when given. */
  targets: { active_layer_thickness_m?: number; magt_c?: number; magt_depth_m?: number };
  /** Modelled values over the baseline period after calibration (transient run). */
  achieved: { active_layer_thickness_m?: number; magt_c?: number };
  /** Calibration tolerances (common practice for screening): ALT within 20 %, MAGT within 0.5 °C. */
  tolerance: { active_layer_relative: 0.2; magt_k: 0.5 };
  /** Parameters used, and their allowed ranges. */
  parameters: {
    n_factor_thaw: number;
    n_factor_freeze: number;
    snow_density_shift_kg_m3: number;
    n_factor_thaw_range: [number, number];
    n_factor_freeze_range: [number, number];
    snow_density_range_kg_m3: [number, number];
  };
  /** Which parameter each target moved. */
  adjusted: string[];
  note: string;
}

/**
 * Range of mean snow density the calibration may move the snow into [kg m-3]: 150–450, bulk
 * densities of seasonal snow from taiga to tundra and maritime classes (Sturm, Taras, Liston et al.
 * 2010, "Estimating snow water equivalent using snow depth data and climate classes," J.
 * Hydrometeorol. 11, 1380–1394, doi:10.1175/2010JHM1202.1; range from memory).
 */
export const CALIBRATION_SNOW_DENSITY_RANGE_KG_M3: readonly [number, number] = [150, 450];

/** Interpolates the annual mean at a depth from the envelope depths [°C]. */
export function valueAtDepth(values: ArrayLike<number>, depthM: number): number {
  const z = ENVELOPE_DEPTHS_M;
  if (depthM <= z[0]) return values[0];
  for (let i = 1; i < z.length; i++) {
    if (depthM <= z[i]) {
      const w = (depthM - z[i - 1]) / (z[i] - z[i - 1]);
      return values[i - 1] + w * (values[i] - values[i - 1]);
    }
  }
  return values[z.length - 1];
}

/** Equilibrium ALT [m] and mean temperature at a depth [°C] under the baseline normals. */
function equilibriumResponse(column: HeatConductionColumn, p: PreparedSite, params: SurfaceParameters, magtDepthM: number): { altM: number; magtC: number } {
  spinUp(column, p, params, p.site.climate.monthly_air_temperature_c, true, 80);
  const st = column.statistics();
  return { altM: st.maxThawDepthM, magtC: valueAtDepth(st.meanTemperatureC, magtDepthM) };
}

/** Bisection of a monotone response on [lo, hi] towards a target; returns the parameter. */
function bisect(f: (x: number) => number, lo: number, hi: number, target: number, increasing: boolean, iterations = 8): number {
  let a = lo;
  let b = hi;
  const fa = f(a);
  if (increasing ? fa >= target : fa <= target) return a;
  const fb = f(b);
  if (increasing ? fb <= target : fb >= target) return b;
  for (let i = 0; i < iterations; i++) {
    const m = 0.5 * (a + b);
    const fm = f(m);
    if (increasing ? fm < target : fm > target) a = m;
    else b = m;
  }
  return 0.5 * (a + b);
}

/**
 * Adjusts the thawing n-factor (for an observed ALT) and the winter parameter (for an observed
 * MAGT: the snow density shift, i.e. its Sturm conductivity, where snow is modelled; else the
 * freezing n-factor) within their published ranges, each by bisection of the equilibrium response
 * under the baseline normals. The transient check against the tolerances is done by the caller.
 * @param p Prepared site. @param start Default parameters.
 * @param targets Observed ALT [m] and/or MAGT [°C] at a depth [m].
 * @param offsets Transient-minus-equilibrium differences to correct for (ALT [m], MAGT [K]).
 * @returns Calibrated parameters and the list of adjusted names.
 */
export function calibrateSurface(
  p: PreparedSite,
  start: SurfaceParameters,
  targets: { altM?: number; magtC?: number; magtDepthM?: number },
  offsets: { altM: number; magtK: number } = { altM: 0, magtK: 0 },
): { params: SurfaceParameters; adjusted: string[] } {
  const column = createSiteColumn(p);
  spinUp(column, p, start, p.site.climate.monthly_air_temperature_c);
  const params = { ...start };
  const adjusted: string[] = [];
  const depth = targets.magtDepthM ?? 15;
  const [nt0, nt1] = p.surface.nThawRange;
  const [nf0, nf1] = p.surface.nFreezeRange;
  const meanDensity = p.baseSnowDensityKgM3.reduce((s, v) => s + v, 0) / DAYS_PER_YEAR;
  const [d0, d1] = CALIBRATION_SNOW_DENSITY_RANGE_KG_M3;
  const rounds = targets.altM !== undefined && targets.magtC !== undefined ? 2 : 1;
  for (let r = 0; r < rounds; r++) {
    if (targets.altM !== undefined) {
      const target = targets.altM - offsets.altM;
      params.nThaw = bisect((x) => equilibriumResponse(column, p, { ...params, nThaw: x }, depth).altM, nt0, nt1, target, true);
      if (!adjusted.includes('n_factor_thaw')) adjusted.push('n_factor_thaw');
    }
    if (targets.magtC !== undefined) {
      const target = targets.magtC - offsets.magtK;
      if (p.snowModelled) {
        // Denser snow conducts better (Sturm et al. 1997): colder ground; MAGT falls as density rises.
        const shift = bisect(
          (x) => equilibriumResponse(column, p, { ...params, snowDensityShiftKgM3: x }, depth).magtC,
          d0 - meanDensity,
          d1 - meanDensity,
          target,
          false,
        );
        params.snowDensityShiftKgM3 = shift;
        if (!adjusted.includes('snow_density')) adjusted.push('snow_density');
      } else {
        // A larger freezing n-factor passes more winter cold: MAGT falls as n_f rises.
        params.nFreeze = bisect((x) => equilibriumResponse(column, p, { ...params, nFreeze: x }, depth).magtC, nf0, nf1, target, false);
        if (!adjusted.includes('n_factor_freeze')) adjusted.push('n_factor_freeze');
      }
    }
  }
  return { params, adjusted };
}

// ---- history and scenarios -----------------------------------------------------------------
