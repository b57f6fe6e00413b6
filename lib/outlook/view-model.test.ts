import { describe, expect, it } from 'vitest';
import { createTranslator } from 'next-intl';
import en from '@/messages/en.json';
import fr from '@/messages/fr.json';
import ru from '@/messages/ru.json';
import nb from '@/messages/nb.json';
import type { OutlookResult, WindowResult } from './result';
import { SETTLEMENT_HIGH_M, SETTLEMENT_MODERATE_M, VERY_WARM_PERMAFROST_C, WARM_PERMAFROST_C } from '@/lib/engine';
import { buildOutlookViewModel as build, reasonMsg as reason, renderMsg, type Msg, type ViewModelOptions } from './view-model';

const thresholds = { warmC: WARM_PERMAFROST_C, veryWarmC: VERY_WARM_PERMAFROST_C, settlementModerateM: SETTLEMENT_MODERATE_M, settlementHighM: SETTLEMENT_HIGH_M };
const buildOutlookViewModel = (r: OutlookResult, o: Omit<ViewModelOptions, 'thresholds'>) => build(r, { ...o, thresholds });
const reasonMsg = (code: string, locale: string, has?: (k: string) => boolean) => reason(code, locale, thresholds, has);

// Numbers in the fixtures are invented.
const MESSAGES = { en, fr, ru, nb } as const;
type Locale = keyof typeof MESSAGES;

function win(over: Partial<WindowResult> = {}): WindowResult {
  return {
    scenario: 'SSP2-4.5', horizon: 2050, window: [2041, 2060], air_temperature_c: -6.04, thawing_index_c_days: 1304, freezing_index_c_days: 3796,
    seasonal_thaw_m: 1.44, permafrost_table_m: 1.44, talik: false, talik_onset_year: null, ground_temperature_c: -1.66, ground_temperature_depth_m: 10,
    settlement_m: 0.12, hazard: 'moderate', hazard_label: 'moderate concern in this screening', hazard_reasons: ['warm_permafrost'], not_modelled: [],
    confidence: 'assumed_inputs', ...over,
  };
}

function result(): OutlookResult {
  const { scenario: _s, horizon: _h, ...b } = win({ window: [1991, 2020], seasonal_thaw_m: 1.0, ground_temperature_c: -3.1, settlement_m: 0, hazard: 'low', hazard_reasons: ['cold_permafrost', 'checklist_ponding'], thawing_index_c_days: 1000, freezing_index_c_days: 4210 });
  void _s; void _h;
  return {
    baseline: { period: [1991, 2020], ...b, envelope: { depths_m: [0, 1], min_c: [-20, -5], max_c: [15, 0.5] } },
    results: [
      win({ scenario: 'SSP5-8.5', horizon: 2080, window: [2071, 2090], hazard: 'high', hazard_reasons: ['very_warm_permafrost', 'talik'], talik: true, talik_onset_year: 2077 }),
      win(),
      win({ horizon: 2080, window: [2071, 2090], seasonal_thaw_m: 1.9, settlement_m: 0.02 }),
      win({ scenario: 'SSP5-8.5' }),
    ],
    annual: [],
    envelopes: [],
    provenance: { engine_version: 'test', input_sha256: '0'.repeat(64), sources: ['a source'] },
  };
}

function renderer(locale: Locale) {
  const t = createTranslator({ locale, messages: MESSAGES[locale], onError: (e) => { throw e; } });
  const has = (key: string) => t.has(key as never);
  return { has, text: (msg: Msg | string) => (typeof msg === 'string' ? msg : renderMsg((k, v) => t(k as never, v as never), msg)) };
}

describe('outlook view-model', () => {
  it('orders scenarios low to high and horizons by year, each horizon with its window years', () => {
    const vm = buildOutlookViewModel(result(), { locale: 'en' });
    expect(vm.scenarios.map((s) => s.id)).toEqual(['SSP2-4.5', 'SSP5-8.5']);
    expect(vm.horizons.map((h) => [h.horizon, h.start, h.end])).toEqual([[2050, 2041, 2060], [2080, 2071, 2090]]);
    expect(renderer('en').text(vm.horizons[1]!.label)).toBe('2080s (2071–2090)');
  });

  it('labels every reason item with its window years, never the bare decade', () => {
    const vm = buildOutlookViewModel(result(), { locale: 'en' });
    const { text } = renderer('en');
    const labels = vm.reasons.slice(1).flatMap((g) => g.items.map((i) => text(i.label)));
    expect(labels).toEqual(['2050s (2041–2060)', '2080s (2071–2090)', '2050s (2041–2060)', '2080s (2071–2090)']);
  });

  it('formats the reasons text in the reader\'s locale (French decimal comma, true minus)', () => {
    const { text, has } = renderer('fr');
    const s = text(reasonMsg('warm_permafrost', 'fr', has));
    expect(s).toContain('\u22122');
    expect(s).toContain('\u22121');
    // English formatting would have put a hyphen-minus there.
    expect(s).not.toMatch(/-\d/);
    const en = renderer('en');
    expect(en.text(reasonMsg('settlement_moderate', 'en', en.has))).toContain('10 to 30 cm');
  });

  it('translates a checklist item inside its reason and names an unknown code instead of failing', () => {
    const { text, has } = renderer('en');
    expect(text(reasonMsg('checklist_ponding', 'en', has))).toMatch(/^Present on the site: (?!ponding\.).+\. A one-dimensional/);
    expect(text(reasonMsg('brand_new_code', 'en', has))).toContain('brand_new_code');
  });

  it('puts the same rounded figures in the table for every locale, formatted for that locale', () => {
    const en = buildOutlookViewModel(result(), { locale: 'en' }).table.rows;
    const fr = buildOutlookViewModel(result(), { locale: 'fr' }).table.rows;
    expect(en.map((r) => [r.scenario, r.horizon])).toEqual([['baseline', null], ['SSP2-4.5', 2050], ['SSP2-4.5', 2080], ['SSP5-8.5', 2050], ['SSP5-8.5', 2080]]);
    expect(en[1]).toMatchObject({ air: '\u22126.0', thawingIndex: '1,300', freezingIndex: '3,800', thaw: '1.4', ground: '\u22121.7', settlement: '10' });
    expect(fr[1]).toMatchObject({ air: '\u22126,0', thaw: '1,4', ground: '\u22121,7', settlement: '10' });
    expect(fr[1]!.thawingIndex.replace(/\s/g, ' ')).toBe('1 300');
    expect(renderer('en').text(en[2]!.settlement)).toBe('under 5');
    expect(buildOutlookViewModel({ ...result(), baseline: { ...result().baseline, settlement_m: 0 } }, { locale: 'en' }).table.rows[0]!.settlement).toBe('0');
    expect(renderer('en').text(en[4]!.talik)).toContain('2077');
  });

  it('rates with words as well as levels and fills the grid only where a run exists', () => {
    const r = result();
    r.results = r.results.filter((x) => !(x.scenario === 'SSP5-8.5' && x.horizon === 2050));
    const vm = buildOutlookViewModel(r, { locale: 'en' });
    expect(vm.ratings.rows.map((row) => row.cells.map((c) => c?.level ?? null))).toEqual([['moderate', 'moderate'], [null, 'high']]);
    expect(renderer('en').text(vm.ratings.rows[1]!.cells[1]!.long)).toBe(en.outlook.rating.higher);
  });

  it('renders every message of the view-model in all four languages', () => {
    for (const locale of Object.keys(MESSAGES) as Locale[]) {
      const { text, has } = renderer(locale);
      const vm = buildOutlookViewModel(result(), { locale, hasMessage: has });
      const msgs: (Msg | string)[] = [
        vm.baseline.label, vm.baseline.reference, ...vm.scenarios.flatMap((s) => [s.name, s.title, s.under]), ...vm.horizons.map((h) => h.label),
        ...(vm.summary?.sentences ?? []), ...vm.reasons.flatMap((g) => [g.title, ...g.items.flatMap((i) => [i.label, i.rating.word, ...i.reasons])]),
        ...vm.notModelled.items, vm.confidence.text, vm.table.note, ...vm.table.rows.flatMap((row) => [row.window, row.permafrostTable, row.talik, row.settlement]), ...vm.cautions,
      ];
      for (const msg of msgs) expect(text(msg)).not.toMatch(/\{|outlook\.|profile\./);
    }
  });

  it('speaks about the intermediate scenario in the summary, with its name in the sentence', () => {
    const vm = buildOutlookViewModel(result(), { locale: 'en' });
    expect(vm.summary?.scenario).toBe('SSP2-4.5');
    const first = renderer('en').text(vm.summary!.sentences[0]!);
    expect(first.startsWith('Under intermediate emissions (SSP2-4.5), by the 2050s the summer thaw could reach about 1.4 m')).toBe(true);
    expect(vm.reasons.find((g) => g.open)?.scenario).toBe('SSP2-4.5');
  });
});
