/**
 * Site model, surface forcing: the daily snow covers of a year, the temperature imposed on the top
 * of the column (n-factors or the explicit snow layer; see site-model.ts for the documented
 * choices and their sources), and the monthly air-temperature series of a scenario.
 *
 * API: `dailySnowCovers(prepared, params)`, `surfaceTemperatureC(airC, snow, params, snowModelled)`,
 * `monthlySeriesFor(prepared, scenario, fromYear, toYear)` → `MonthlySeries`,
 * `preindustrialMonthly(prepared)`, `dailyPeriodic(monthly)`.
 */
import { DAYS_PER_YEAR } from './constants';
import { MIN_SNOW_THICKNESS_M, type SnowCover } from './heat-conduction';
import { localMonthlyAirTemperatures, preindustrialMonthlyAirTemperatures } from './local-climate';
import type { ScenarioId } from './scenario-forcing';
import type { Site } from './site-schema';
import { snowPropertiesAdapter } from './site-model-adapters';
import { BASELINE_REFERENCE_SCENARIO, type PreparedSite, type SurfaceParameters } from './site-model-preparation';

/** Per-day snow covers of a year for the given parameters (null: bare). */
export function dailySnowCovers(p: PreparedSite, params: SurfaceParameters): (SnowCover | null)[] {
  const out: (SnowCover | null)[] = [];
  for (let d = 0; d < DAYS_PER_YEAR; d++) {
    const h = p.snowModelled ? p.baseSnowDepthM[d] * params.snowDepthFactor : 0;
    if (h < MIN_SNOW_THICKNESS_M) {
      out.push(null);
      continue;
    }
    // snowPropertiesAdapter clamps the shifted density to Sturm's range.
    const props = snowPropertiesAdapter(p.baseSnowDensityKgM3[d] + params.snowDensityShiftKgM3);
    out.push({ thicknessM: h, conductivityWmK: props.conductivityWmK, heatCapacityJm3K: props.heatCapacityJm3K });
  }
  return out;
}

/**
 * Temperature imposed at the top of the column on one day [°C].
 * @param airC Daily mean air temperature [°C].
 * @param snow Snow of the day or null.
 * @param params n-factors [-].
 * @returns n_t·T_air (thawing) or n_f·T_air (freezing, bare ground only), or T_air on snow [2–4].
 */
export function surfaceTemperatureC(airC: number, snow: SnowCover | null, params: SurfaceParameters, snowModelled: boolean): number {
  if (snow) return airC;
  if (airC > 0) return params.nThaw * airC;
  // Freezing n-factor only where snow is not modelled (snow-cleared covers); vegetated covers use
  // the explicit snow layer instead.
  return snowModelled ? airC : params.nFreeze * airC;
}


/** A monthly series of air temperature, one row of 12 per year, `firstYear` first. */
export interface MonthlySeries {
  firstYear: number;
  monthlyC: Float64Array[];
}

/** Monthly air temperature series for a scenario over [fromYear, toYear] (local-climate.ts). */
export function monthlySeriesFor(p: PreparedSite, scenario: ScenarioId, fromYear: number, toYear: number): MonthlySeries {
  const s = localMonthlyAirTemperatures({
    normalsC: p.site.climate.monthly_air_temperature_c,
    baselinePeriod: p.site.climate.baseline_period as [number, number],
    scenario,
    permafrostCarbonFeedback: p.permafrostCarbonFeedback,
    monthlyFactors: p.regional.monthly,
    fromYear,
    toYear,
    localProjection: localProjectionOf(p.site),
  });
  return { firstYear: fromYear, monthlyC: s.monthlyC };
}

/** The site's local projection in the form local-climate.ts takes (validated by the site schema). */
function localProjectionOf(site: Site): Parameters<typeof localMonthlyAirTemperatures>[0]['localProjection'] {
  return (site.climate.local_projection ?? undefined) as Parameters<typeof localMonthlyAirTemperatures>[0]['localProjection'];
}

/** The site's 1850–1900 monthly climate (local-climate.ts). */
export function preindustrialMonthly(p: PreparedSite): Float64Array {
  return preindustrialMonthlyAirTemperatures({
    normalsC: p.site.climate.monthly_air_temperature_c,
    baselinePeriod: p.site.climate.baseline_period as [number, number],
    scenario: BASELINE_REFERENCE_SCENARIO,
    permafrostCarbonFeedback: p.permafrostCarbonFeedback,
    monthlyFactors: p.regional.monthly,
  });
}
