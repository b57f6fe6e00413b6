import { describe, expect, it } from 'vitest';
import { airSeries, envelopeSeries, thawSeries } from './chart-data';
import type { OutlookResult } from './result';

// What the charts draw (design-language.md, "Look": horizon windows as shaded bands, scenarios in
// the same order everywhere, the baseline as the reference). Invented numbers.

const win = (scenario: string, horizon: number, air: number) => ({
  scenario,
  horizon,
  window: [horizon - 9, horizon + 10] as [number, number],
  air_temperature_c: air,
  thawing_index_c_days: 1000,
  freezing_index_c_days: 4000,
  seasonal_thaw_m: 1,
  permafrost_table_m: 1,
  talik: false,
  talik_onset_year: null,
  ground_temperature_c: -2,
  ground_temperature_depth_m: 12,
  settlement_m: 0,
  hazard: 'low' as const,
  hazard_label: '',
  hazard_reasons: [],
  not_modelled: [],
  confidence: 'assumed_inputs' as const,
});

const depths = [0, 1, 5, 10, 15, 20, 30];
const result: OutlookResult = {
  baseline: { ...win('x', 2000, -9), period: [1991, 2020], window: [1991, 2020], envelope: { depths_m: depths, min_c: depths.map(() => -5), max_c: depths.map(() => -1) } },
  results: [win('SSP5-8.5', 2050, -5), win('SSP1-2.6', 2050, -8), win('SSP5-8.5', 2030, -7), win('SSP1-2.6', 2030, -8.5)],
  annual: [
    { scenario: 'SSP5-8.5', year: 1992, air_temperature_c: -9, seasonal_thaw_m: 0.6, ground_temperature_c: -3, settlement_m: 0 },
    { scenario: 'SSP1-2.6', year: 1991, air_temperature_c: -9, seasonal_thaw_m: 0.5, ground_temperature_c: -3, settlement_m: 0 },
    { scenario: 'SSP5-8.5', year: 1991, air_temperature_c: -9, seasonal_thaw_m: 0.5, ground_temperature_c: -3, settlement_m: 0 },
  ],
  envelopes: ['SSP1-2.6', 'SSP5-8.5'].flatMap((scenario) => [2030, 2050].map((horizon) => ({ scenario, horizon, depths_m: depths, min_c: depths.map(() => -4), max_c: depths.map(() => 0) }))),
  provenance: { engine_version: 't', input_sha256: '0', sources: [] },
};

describe('chart series', () => {
  it('keeps scenarios low to high and years in order, with the horizon windows for the bands', () => {
    const t = thawSeries(result);
    expect(t.scenarios).toEqual(['SSP1-2.6', 'SSP5-8.5']);
    expect(t.rows.map((r) => r.year)).toEqual([1991, 1992]);
    expect(t.rows[0]).toEqual({ year: 1991, 'SSP1-2.6': 0.5, 'SSP5-8.5': 0.5 });
    expect(t.windows).toEqual([
      { horizon: 2030, start: 2021, end: 2040 },
      { horizon: 2050, start: 2041, end: 2060 },
    ]);
    expect(t.baseline).toEqual({ start: 1991, end: 2020, thawM: 1 });
  });

  it('draws the envelope to 5 m below the ground-temperature depth (here 17 m), with the baseline beside each scenario', () => {
    const e = envelopeSeries(result);
    expect(e.maxDepthM).toBe(17);
    expect(e.byHorizon[2050]!.map((r) => r.depth)).toEqual([0, 1, 5, 10, 15]);
    expect(e.byHorizon[2050]![0]).toEqual({ depth: 0, 'base:min': -5, 'base:max': -1, 'SSP1-2.6:min': -4, 'SSP1-2.6:max': 0, 'SSP5-8.5:min': -4, 'SSP5-8.5:max': 0 });
  });

  it('starts the air temperature of every scenario at the baseline, then one point a horizon', () => {
    const a = airSeries(result);
    expect(a.rows.map((r) => r.key)).toEqual(['baseline', '2030', '2050']);
    expect(a.rows[0]).toMatchObject({ 'SSP1-2.6': -9, 'SSP5-8.5': -9 });
    expect(a.rows[2]).toMatchObject({ 'SSP1-2.6': -8, 'SSP5-8.5': -5 });
  });
});
