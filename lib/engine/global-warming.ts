/**
 * Global warming along an emission scenario: the two-layer emulator driven by the scenario's ERF,
 * optionally with the permafrost-carbon feedback.
 *
 * API (stable):
 * - `globalWarmingSeries(scenario, { permafrostCarbonFeedback? })` → `{ years, global_warming_c }`:
 *   annual global-mean surface air temperature change [°C] relative to the 1850–1900 mean, years
 *   1850..2100. Memoised per (scenario, feedback); the arrays are frozen, do not mutate them.
 * - `globalWarmingAt(scenario, year, opts?)` → [°C] for one year (1850–2100, clamped).
 * - `globalWarmingMean(scenario, firstYear, lastYear, opts?)` → mean [°C] over inclusive years.
 * - `globalWarmingDetails(scenario, opts?)` → the series plus forcing [W m-2], permafrost release
 *   [PgC] and extra CO2 [ppm] per year (for provenance and tests).
 * - `GLOBAL_WARMING_FIRST_YEAR` = 1850, `GLOBAL_WARMING_LAST_YEAR` = 2100.
 *
 * Construction: the emulator starts at equilibrium in 1750 (forcing 0), runs the historical forcing
 * (volcanic smoothed out) and the scenario; its annual surface temperature minus its 1850–1900 mean
 * is the warming. With the permafrost-carbon feedback, thaw counts warming above that 1850–1900
 * mean and acts from 1901 (the pool is taken as in balance with the 1850–1900 climate). See data/ssp-forcing.ts, two-layer-ebm.ts, permafrost-carbon.ts for sources.
 * References: [1] IPCC AR6 WG1 SPM, Table SPM.1 (the checks), doi:10.1017/9781009157896.001.
 */
import { co2ConcentrationPpm, FORCING_FIRST_YEAR, scenarioErfWm2 } from './data/ssp-forcing';
import type { ScenarioId } from './scenario-forcing';
import {
  newPermafrostCarbonState,
  permafrostAirborneCo2Ppm,
  permafrostCo2ForcingWm2,
  stepPermafrostCarbonYear,
} from './permafrost-carbon';
import { CALIBRATED_TWO_LAYER, stepTwoLayerYear, type TwoLayerState } from './two-layer-ebm';

export const GLOBAL_WARMING_FIRST_YEAR = 1850;
export const GLOBAL_WARMING_LAST_YEAR = 2100;
/** Pre-industrial reference period of the warming (AR6 convention). */
export const PREINDUSTRIAL_PERIOD = [1850, 1900] as const;

export interface GlobalWarmingOptions {
  /** Include the permafrost-carbon feedback (default false). */
  permafrostCarbonFeedback?: boolean;
}

export interface GlobalWarmingSeries {
  years: readonly number[];
  global_warming_c: readonly number[];
}

export interface GlobalWarmingDetails extends GlobalWarmingSeries {
  /** Total forcing used each year [W m-2] (scenario + permafrost CO2). */
  forcing_w_m2: readonly number[];
  /** Cumulative permafrost-carbon release to the end of each year [PgC] (0 without the feedback). */
  permafrost_release_pgc: readonly number[];
  /** Extra atmospheric CO2 from permafrost [ppm]. */
  permafrost_co2_ppm: readonly number[];
}

const cache = new Map<string, GlobalWarmingDetails>();
const rawCache = new Map<string, Float64Array>();

/** The emulator's annual surface temperature [K above 1750], 1750–2100, without feedback (memoised). */
function globalWarmingRaw(scenario: ScenarioId): Float64Array {
  let hit = rawCache.get(scenario);
  if (!hit) {
    const n = GLOBAL_WARMING_LAST_YEAR - FORCING_FIRST_YEAR + 1;
    hit = new Float64Array(n);
    const ebm: TwoLayerState = { surfaceK: 0, deepK: 0 };
    for (let i = 0; i < n; i++) hit[i] = stepTwoLayerYear(ebm, CALIBRATED_TWO_LAYER, scenarioErfWm2(scenario, FORCING_FIRST_YEAR + i));
    rawCache.set(scenario, hit);
  }
  return hit;
}

/** Mean of the emulator's surface temperature over 1850–1900 [K above 1750], without feedback. */
function preindustrialMeanK(temp: Float64Array): number {
  const i0 = PREINDUSTRIAL_PERIOD[0] - FORCING_FIRST_YEAR;
  const i1 = PREINDUSTRIAL_PERIOD[1] - FORCING_FIRST_YEAR;
  let base = 0;
  for (let i = i0; i <= i1; i++) base += temp[i];
  return base / (i1 - i0 + 1);
}

function compute(scenario: ScenarioId, feedback: boolean): GlobalWarmingDetails {
  // The permafrost pool is taken as in balance with the 1850–1900 climate: thaw counts warming above
  // the 1850–1900 mean, and the feedback acts from 1901, so both runs share the same reference.
  const feedbackBaseK = feedback ? preindustrialMeanK(globalWarmingRaw(scenario)) : 0;
  const nAll = GLOBAL_WARMING_LAST_YEAR - FORCING_FIRST_YEAR + 1;
  const temp = new Float64Array(nAll);
  const forcing = new Float64Array(nAll);
  const release = new Float64Array(nAll);
  const extraCo2 = new Float64Array(nAll);
  const ebm: TwoLayerState = { surfaceK: 0, deepK: 0 };
  const pf = newPermafrostCarbonState();
  let extraForcing = 0;
  for (let i = 0; i < nAll; i++) {
    const year = FORCING_FIRST_YEAR + i;
    const f = scenarioErfWm2(scenario, year) + extraForcing;
    forcing[i] = f;
    temp[i] = stepTwoLayerYear(ebm, CALIBRATED_TWO_LAYER, f);
    if (feedback && year > PREINDUSTRIAL_PERIOD[1]) {
      // Explicit coupling with a one-year lag: this year's warming sets next year's extra forcing.
      stepPermafrostCarbonYear(pf, temp[i] - feedbackBaseK);
      extraCo2[i] = permafrostAirborneCo2Ppm(pf);
      release[i] = pf.releasedPgC;
      extraForcing = permafrostCo2ForcingWm2(extraCo2[i], co2ConcentrationPpm(scenario, year));
    }
  }
  const base = preindustrialMeanK(temp);
  const years: number[] = [];
  const warming: number[] = [];
  const forcingOut: number[] = [];
  const releaseOut: number[] = [];
  const co2Out: number[] = [];
  for (let year = GLOBAL_WARMING_FIRST_YEAR; year <= GLOBAL_WARMING_LAST_YEAR; year++) {
    const i = year - FORCING_FIRST_YEAR;
    years.push(year);
    warming.push(temp[i] - base);
    forcingOut.push(forcing[i]);
    releaseOut.push(release[i]);
    co2Out.push(extraCo2[i]);
  }
  return {
    years: Object.freeze(years),
    global_warming_c: Object.freeze(warming),
    forcing_w_m2: Object.freeze(forcingOut),
    permafrost_release_pgc: Object.freeze(releaseOut),
    permafrost_co2_ppm: Object.freeze(co2Out),
  };
}

/**
 * Full emulator output for a scenario (memoised).
 * @param scenario AR6 SSP identifier.
 * @param options `permafrostCarbonFeedback` (default false).
 */
export function globalWarmingDetails(scenario: ScenarioId, options: GlobalWarmingOptions = {}): GlobalWarmingDetails {
  const feedback = options.permafrostCarbonFeedback === true;
  const key = `${scenario}|${feedback ? 1 : 0}`;
  let hit = cache.get(key);
  if (!hit) {
    hit = Object.freeze(compute(scenario, feedback));
    cache.set(key, hit);
  }
  return hit;
}

/**
 * Annual global-mean surface air temperature change [°C] relative to 1850–1900, 1850–2100.
 * @param scenario AR6 SSP identifier.
 * @param options `permafrostCarbonFeedback` (default false).
 * @returns `{ years, global_warming_c }`, frozen arrays (memoised; do not mutate).
 */
export function globalWarmingSeries(scenario: ScenarioId, options: GlobalWarmingOptions = {}): GlobalWarmingSeries {
  const d = globalWarmingDetails(scenario, options);
  return { years: d.years, global_warming_c: d.global_warming_c };
}

/** Global warming [°C] relative to 1850–1900 in one year (clamped to 1850–2100). */
export function globalWarmingAt(scenario: ScenarioId, year: number, options: GlobalWarmingOptions = {}): number {
  const d = globalWarmingDetails(scenario, options);
  const y = Math.min(Math.max(Math.round(year), GLOBAL_WARMING_FIRST_YEAR), GLOBAL_WARMING_LAST_YEAR);
  return d.global_warming_c[y - GLOBAL_WARMING_FIRST_YEAR];
}

/** Mean global warming [°C] over the inclusive years `firstYear..lastYear` (each clamped to 1850–2100). */
export function globalWarmingMean(scenario: ScenarioId, firstYear: number, lastYear: number, options: GlobalWarmingOptions = {}): number {
  let sum = 0;
  for (let y = firstYear; y <= lastYear; y++) sum += globalWarmingAt(scenario, y, options);
  return sum / (lastYear - firstYear + 1);
}
