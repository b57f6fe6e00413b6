/**
 * Shapes the stored engine document into the small series the outlook's charts draw, on the server,
 * so the browser receives only what it shows (not the whole document).
 */
import type { OutlookResult } from './result';
import { orderScenarios, type OutlookScenario } from './scenarios';

export interface ThawSeries {
  scenarios: OutlookScenario[];
  /** One row a year: `year` and one seasonal thaw depth [m] per scenario id. */
  rows: Record<string, number>[];
  /** Horizon windows [first year, last year], for shaded bands. */
  windows: { horizon: number; start: number; end: number }[];
  baseline: { start: number; end: number; thawM: number };
}

export function thawSeries(result: OutlookResult): ThawSeries {
  const scenarios = orderScenarios(result.results.map((r) => r.scenario));
  const byYear = new Map<number, Record<string, number>>();
  for (const a of result.annual) {
    if (!scenarios.includes(a.scenario as OutlookScenario)) continue;
    const row = byYear.get(a.year) ?? { year: a.year };
    row[a.scenario] = a.seasonal_thaw_m;
    byYear.set(a.year, row);
  }
  const windows = [...new Map(result.results.map((r) => [r.horizon, { horizon: r.horizon, start: r.window[0], end: r.window[1] }])).values()].sort((a, b) => a.horizon - b.horizon);
  return {
    scenarios,
    rows: [...byYear.values()].sort((a, b) => a.year! - b.year!),
    windows,
    baseline: { start: result.baseline.period[0], end: result.baseline.period[1], thawM: result.baseline.seasonal_thaw_m },
  };
}

export interface EnvelopeSeries {
  scenarios: OutlookScenario[];
  horizons: number[];
  /** Depth of the table's ground temperature (zero annual amplitude at baseline) [m]. */
  groundTemperatureDepthM: number;
  /**
   * Per horizon, one row per depth: `depth` [m], `base:min`/`base:max` and `<scenario>:min`/`:max`
   * [°C]. Depths down to `maxDepthM`.
   */
  byHorizon: Record<number, Record<string, number>[]>;
  maxDepthM: number;
}

/**
 * Ground-temperature envelopes for the depth chart.
 * @param result Stored engine document.
 * @param minShownDepthM The chart reaches at least this depth [m], and 5 m below the depth of the
 *   table's ground temperature.
 */
export function envelopeSeries(result: OutlookResult, minShownDepthM = 15): EnvelopeSeries {
  const scenarios = orderScenarios(result.results.map((r) => r.scenario));
  const horizons = [...new Set(result.envelopes.map((e) => e.horizon))].sort((a, b) => a - b);
  const zaa = result.baseline.ground_temperature_depth_m;
  const maxDepthM = Math.max(minShownDepthM, zaa + 5);
  const base = result.baseline.envelope;
  const byHorizon: Record<number, Record<string, number>[]> = {};
  for (const h of horizons) {
    const rows: Record<string, number>[] = [];
    base.depths_m.forEach((depth, i) => {
      if (depth > maxDepthM) return;
      const row: Record<string, number> = { depth, 'base:min': base.min_c[i]!, 'base:max': base.max_c[i]! };
      for (const s of scenarios) {
        const e = result.envelopes.find((x) => x.scenario === s && x.horizon === h);
        const j = e ? e.depths_m.indexOf(depth) : -1;
        if (e && j >= 0) {
          row[`${s}:min`] = e.min_c[j]!;
          row[`${s}:max`] = e.max_c[j]!;
        }
      }
      rows.push(row);
    });
    byHorizon[h] = rows;
  }
  return { scenarios, horizons, groundTemperatureDepthM: zaa, byHorizon, maxDepthM };
}

export interface AirSeries {
  scenarios: OutlookScenario[];
  /** First row the baseline (every scenario at the baseline value), then one per horizon. */
  rows: ({ key: string; horizon: number | null } & Record<string, number | string | null>)[];
  baselineC: number;
}

export function airSeries(result: OutlookResult): AirSeries {
  const scenarios = orderScenarios(result.results.map((r) => r.scenario));
  const horizons = [...new Set(result.results.map((r) => r.horizon))].sort((a, b) => a - b);
  const baselineC = result.baseline.air_temperature_c;
  const first: AirSeries['rows'][number] = { key: 'baseline', horizon: null };
  for (const s of scenarios) first[s] = baselineC;
  const rows: AirSeries['rows'] = [first];
  for (const h of horizons) {
    const row: AirSeries['rows'][number] = { key: String(h), horizon: h };
    for (const s of scenarios) row[s] = result.results.find((r) => r.scenario === s && r.horizon === h)?.air_temperature_c ?? null;
    rows.push(row);
  }
  return { scenarios, rows, baselineC };
}
