/**
 * Site model, spin-up: from the steady geothermal profile below the active layer (Romanovsky &
 * Osterkamp 1997, reference [6] of site-model.ts) to the periodic state under a fixed annual cycle.
 *
 * API: `spinUp(column, prepared, params, monthlyC, warmStart = false, maxYears)` → `SpinUpReport`.
 */
import { DAYS_PER_YEAR, SECONDS_PER_DAY, SPINUP_MAX_YEARS, SPINUP_TOLERANCE_K } from './constants';
import { HeatConductionColumn, type PhaseChangeMaterial, type SnowCover } from './heat-conduction';
import { dailyPeriodic, type PreparedSite, type SurfaceParameters } from './site-model-preparation';
import { dailySnowCovers, surfaceTemperatureC } from './site-model-forcing';

/**
 * Conductivity of a material at a temperature [W m-1 K-1], from its tabulated curve.
 * @param m Material curve (heat-conduction.ts). @param hJm3 Enthalpy [J m-3].
 */
function conductivityAtEnthalpy(m: PhaseChangeMaterial, hJm3: number): number {
  const H = m.enthalpyJm3;
  const K = m.conductivityWmK;
  const n = H.length;
  if (hJm3 <= H[0]) return K[0];
  if (hJm3 >= H[n - 1]) return K[n - 1];
  for (let j = 1; j < n; j++) {
    if (hJm3 <= H[j]) {
      const w = H[j] > H[j - 1] ? (hJm3 - H[j - 1]) / (H[j] - H[j - 1]) : 1;
      return K[j - 1] + w * (K[j] - K[j - 1]);
    }
  }
  return K[n - 1];
}

/**
 * The steady conductive (geothermal) temperature profile below a reference cell [°C per cell]:
 * T_{c+1} = T_c + q (Δz_c / 2k_c + Δz_{c+1} / 2k_{c+1}) [6], with k at each cell's temperature.
 * @param column Solver column (for the material curves).
 * @param topC Temperature of the reference cell [°C]. @param fromCell Reference cell index.
 * @param qWm2 Geothermal heat flux [W m-2]. @param out Per-cell temperatures to fill below fromCell.
 */
function steadyProfileBelow(column: HeatConductionColumn, p: PreparedSite, fromCell: number, topC: number, qWm2: number, out: Float64Array): void {
  const g = p.grid;
  out[fromCell] = topC;
  for (let c = fromCell; c < g.cellCount - 1; c++) {
    const ka = conductivityAtEnthalpy(p.materials[g.layerIndex[c]], column.enthalpyFromTemperature(c, out[c]));
    // k of the next cell evaluated at the temperature it would have with ka (one fixed-point pass).
    let next = out[c] + qWm2 * (g.thicknessM[c] / (2 * ka) + g.thicknessM[c + 1] / (2 * ka));
    const kb = conductivityAtEnthalpy(p.materials[g.layerIndex[c + 1]], column.enthalpyFromTemperature(c + 1, next));
    next = out[c] + qWm2 * (g.thicknessM[c] / (2 * ka) + g.thicknessM[c + 1] / (2 * kb));
    out[c + 1] = next;
  }
}

export interface SpinUpReport {
  years: number;
  converged: boolean;
  /** Largest change of the annual-mean temperature between the last two years [K]. */
  maxChangeK: number;
  acceleratedYears: number;
}

/** Per-cell annual-mean temperature over one year (by stepping) [°C], plus the year's statistics. */
function runCycleYear(
  column: HeatConductionColumn,
  topC: Float64Array,
  snow: (SnowCover | null)[],
  meanCell: Float64Array,
): { maxThawM: number } {
  column.resetStatistics();
  meanCell.fill(0);
  const n = column.cellCount;
  // Spin-up and calibration run this loop for centuries: accumulate in place, no array a day.
  for (let d = 0; d < DAYS_PER_YEAR; d++) {
    column.step(SECONDS_PER_DAY, topC[d], snow[d]);
    column.accumulateTemperatures(meanCell);
  }
  for (let c = 0; c < n; c++) meanCell[c] /= DAYS_PER_YEAR;
  return { maxThawM: column.maxThawDepthM };
}

/**
 * Spin-up to the periodic state under a fixed annual cycle of monthly air temperatures.
 * Start: the steady geothermal profile through an estimated mean surface temperature (unless
 * `warmStart`). Acceleration: after each of the first years the annual-mean profile below the
 * seasonal layer (below 1.5 × the thaw depth, at least 3 m) is moved onto the steady conductive
 * line through the annual mean at that depth [6] (the annual wave is kept, only its mean moves);
 * once that correction is below 0.02 K (after at least 3 such years), plain years run until the annual-mean profile changes by
 * less than 0.01 K a year (SPINUP_TOLERANCE_K), bounded by SPINUP_MAX_YEARS.
 * @param column Solver column (its state is the result). @param p Prepared site.
 * @param params Surface parameters. @param monthlyC 12 monthly air temperatures [°C].
 * @param warmStart Keep the column's current state as the start.
 * @returns Years run, convergence flag and last change [K].
 */
export function spinUp(
  column: HeatConductionColumn,
  p: PreparedSite,
  params: SurfaceParameters,
  monthlyC: ArrayLike<number>,
  warmStart = false,
  maxYears = SPINUP_MAX_YEARS,
): SpinUpReport {
  const air = dailyPeriodic(monthlyC);
  const snow = dailySnowCovers(p, params);
  const top = new Float64Array(DAYS_PER_YEAR);
  for (let d = 0; d < DAYS_PER_YEAR; d++) top[d] = surfaceTemperatureC(air[d], snow[d], params, p.snowModelled);
  const n = column.cellCount;
  const q = p.site.bottom_heat_flux_w_m2;
  const g = p.grid;
  const work = new Float64Array(n);
  if (!warmStart) {
    // Mean surface temperature estimate: the mean imposed top temperature, warmed under snow by the
    // snow cover's insulation (crude; the acceleration corrects it).
    let s = 0;
    for (let d = 0; d < DAYS_PER_YEAR; d++) s += snow[d] ? Math.min(0, top[d] * 0.5) : top[d];
    steadyProfileBelow(column, p, 0, s / DAYS_PER_YEAR, q, work);
    column.setTemperatures(work);
  }
  const mean = new Float64Array(n);
  const prevMean = new Float64Array(n).fill(NaN);
  let accelerating = true;
  let accelerated = 0;
  let years = 0;
  let change = Infinity;
  while (years < maxYears) {
    const { maxThawM } = runCycleYear(column, top, snow, mean);
    years++;
    change = 0;
    for (let c = 0; c < n; c++) change = Math.max(change, Math.abs(mean[c] - prevMean[c]));
    if (Number.isNaN(change)) change = Infinity;
    prevMean.set(mean);
    if (accelerating) {
      const zRef = Math.min(15, Math.max(3, 1.5 * maxThawM));
      let ref = 0;
      while (ref < n - 1 && g.centerDepthM[ref] < zRef) ref++;
      steadyProfileBelow(column, p, ref, mean[ref], q, work);
      let maxShift = 0;
      const t = column.getTemperatures();
      const h = column.getEnthalpy();
      for (let c = ref + 1; c < n; c++) {
        const shift = work[c] - mean[c];
        maxShift = Math.max(maxShift, Math.abs(shift));
        h[c] = column.enthalpyFromTemperature(c, t[c] + shift);
        prevMean[c] += shift;
      }
      column.setEnthalpy(h);
      accelerated++;
      if ((accelerated >= 3 && maxShift < 0.02) || accelerated >= 30) accelerating = false;
      continue;
    }
    if (change < SPINUP_TOLERANCE_K) return { years, converged: true, maxChangeK: change, acceleratedYears: accelerated };
  }
  return { years, converged: false, maxChangeK: Number.isFinite(change) ? change : 999, acceleratedYears: accelerated };
}
