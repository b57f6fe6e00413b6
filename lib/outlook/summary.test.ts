import { describe, expect, it } from 'vitest';
import { createTranslator } from 'next-intl';
import en from '@/messages/en.json';
import fr from '@/messages/fr.json';
import ru from '@/messages/ru.json';
import nb from '@/messages/nb.json';
import type { OutlookResult, WindowResult } from './result';
import { SCENARIO_STYLES, type OutlookScenario } from './scenarios';
import { buildSummary, summaryScenario } from './summary';

// Checks follow the house voice guide (design-language.md, "Voice"); its worked example is the
// first test. Numbers in the fixtures are invented.

const MESSAGES = { en, fr, ru, nb } as const;

function window(over: Partial<WindowResult> = {}): WindowResult {
  return {
    scenario: 'SSP2-4.5',
    horizon: 2050,
    window: [2041, 2060],
    air_temperature_c: -6,
    thawing_index_c_days: 1300,
    freezing_index_c_days: 3800,
    seasonal_thaw_m: 1.4,
    permafrost_table_m: 1.4,
    talik: false,
    talik_onset_year: null,
    ground_temperature_c: -1.7,
    ground_temperature_depth_m: 10,
    settlement_m: 0.03,
    hazard: 'moderate',
    hazard_label: 'moderate concern in this screening',
    hazard_reasons: ['warm_permafrost'],
    not_modelled: [],
    confidence: 'assumed_inputs',
    ...over,
  };
}

function result(rows: Partial<WindowResult>[], base: Partial<WindowResult> = {}): OutlookResult {
  const b = window({ window: [1991, 2020], seasonal_thaw_m: 1.0, ground_temperature_c: -3.1, settlement_m: 0, hazard: 'low', hazard_reasons: ['cold_permafrost'], ...base });
  const { scenario: _s, horizon: _h, ...baseFields } = b;
  void _s;
  void _h;
  return {
    baseline: { period: [1991, 2020], ...baseFields, envelope: { depths_m: [0, 1], min_c: [-20, -5], max_c: [15, 0.5] } },
    results: rows.map((r) => window(r)),
    annual: [],
    envelopes: [],
    provenance: { engine_version: 'test', input_sha256: '0'.repeat(64), sources: [] },
  };
}

function text(r: OutlookResult, locale: keyof typeof MESSAGES = 'en'): string {
  const t = createTranslator({ locale, messages: MESSAGES[locale], namespace: 'outlook', onError: (e) => { throw e; } });
  const summary = buildSummary(r, locale, (s: OutlookScenario) => t(`scenarioUnder.${SCENARIO_STYLES[s].key}`));
  return summary!.sentences.map((s) => t(`summary.${s.key}` as 'summary.warmYears', s.values)).join(' ');
}

const twoHorizons = (over2050: Partial<WindowResult> = {}, over2080: Partial<WindowResult> = {}) => [
  { horizon: 2050, window: [2041, 2060] as [number, number], ...over2050 },
  { horizon: 2080, window: [2071, 2090] as [number, number], seasonal_thaw_m: 1.9, ground_temperature_c: -1.2, settlement_m: 0.12, ...over2080 },
];

describe('plain-language summary', () => {
  it('says the voice guide\'s own example for intermediate emissions by the 2050s (design-language.md)', () => {
    const s = text(result(twoHorizons()));
    expect(s.startsWith('Under intermediate emissions (SSP2-4.5), by the 2050s the summer thaw could reach about 1.4 m, some 0.4 m deeper than in 1991–2020.')).toBe(true);
    expect(s).toContain('Ground that thaws deeper can settle where it holds ice');
    expect(s).toContain('By the 2080s it could reach about 1.9 m.');
  });

  it('names the active layer once and explains it (design-language.md: "name the trade\'s terms once and explain them")', () => {
    const s = text(result(twoHorizons()));
    expect(s.match(/active layer/g)).toHaveLength(1);
    expect(s).toContain('the ground that thaws each summer');
  });

  it('keeps settlement apart from deeper thaw, in 5 cm steps (design-language.md)', () => {
    expect(text(result(twoHorizons({}, { settlement_m: 0.12 })))).toContain('the surface could settle by about 10 cm by 2090');
    expect(text(result(twoHorizons({}, { settlement_m: 0.018 })))).toContain('by less than 5 cm by 2090');
    expect(text(result(twoHorizons({}, { settlement_m: 0 })))).toContain('finds no settlement by 2090');
  });

  it('says warm years thaw deeper than the averages, exactly once (design-language.md)', () => {
    const s = text(result(twoHorizons()));
    expect(s.split('Warm years thaw deeper than the averages shown.').length - 1).toBe(1);
  });

  it('never calls the lowest rating "safe", in any language (design-language.md)', () => {
    const low = result(twoHorizons({ hazard: 'low', hazard_reasons: ['cold_permafrost'] }, { hazard: 'low', hazard_reasons: ['cold_permafrost'], ground_temperature_c: -3 }));
    expect(text(low)).toContain('this ground is of lower concern in this screening');
    const forbidden: Record<keyof typeof MESSAGES, RegExp> = { en: /\bsafe/i, fr: /\bsûre?s?\b|sans danger|en sécurité/i, ru: /безопасн/i, nb: /\btrygg|\bsikker/i };
    for (const l of Object.keys(MESSAGES) as (keyof typeof MESSAGES)[]) {
      expect(text(low, l)).not.toMatch(forbidden[l]);
      expect(JSON.stringify(MESSAGES[l].outlook)).not.toMatch(forbidden[l]);
    }
  });

  it('explains a talik as ground that no longer refreezes in winter, for years to decades (design-language.md)', () => {
    const s = text(result(twoHorizons({}, { talik: true, talik_onset_year: 2074, hazard: 'high', hazard_reasons: ['talik'] })));
    expect(s).toContain('From about 2074 a talik could form: a layer of ground that no longer refreezes in winter, for years to decades.');
    expect(s).toContain('higher concern in this screening');
    expect(text(result(twoHorizons()))).not.toContain('talik');
  });

  it('says "close to thawing" near 0 °C, never "still frozen" (design-language.md)', () => {
    const close = text(result(twoHorizons({}, { ground_temperature_c: -0.3 })));
    expect(close).toContain('to about \u22120.3 °C in the 2080s: close to thawing.');
    expect(close).not.toMatch(/still frozen/i);
    expect(text(result(twoHorizons({}, { ground_temperature_c: -1.2 })))).not.toContain('close to thawing');
  });

  it('says "about the same" when the rounded thaw does not change, and "less deep" when it shrinks', () => {
    expect(text(result(twoHorizons({ seasonal_thaw_m: 1.02 })))).toContain('about 1.0 m, about the same as in 1991–2020');
    expect(text(result(twoHorizons({ seasonal_thaw_m: 0.8 })))).toContain('some 0.2 m less deep than in 1991–2020');
  });

  it('does not read a permafrost that thawed through as a shallower summer thaw', () => {
    // Once no permafrost is left, the yearly thaw is only last winter's frost (engine contract): comparing
    // it with the baseline active layer would tell residents the thaw got smaller.
    const s = text(result(twoHorizons({ seasonal_thaw_m: 0.4, hazard: 'high', hazard_reasons: ['permafrost_thawed_through'] })));
    expect(s).toContain('by the 2050s the permafrost in the modelled ground could thaw all the way through');
    expect(s).not.toContain('less deep');
    expect(s.match(/thaw all the way through/g)).toHaveLength(1);
  });

  it('with a talik, names the depth of the permafrost table, not only the summer thaw', () => {
    const s = text(result(twoHorizons({ seasonal_thaw_m: 0.6, permafrost_table_m: 3.2, talik: true, talik_onset_year: 2044, hazard: 'high', hazard_reasons: ['talik'] })));
    expect(s).toContain('the top of the permafrost could lie about 3.2 m down');
    expect(s).not.toContain('less deep');
  });

  it('speaks of intermediate emissions when run, else of the middle scenario run', () => {
    const all = ['SSP1-1.9', 'SSP1-2.6', 'SSP2-4.5', 'SSP3-7.0', 'SSP5-8.5'].map((scenario) => ({ scenario }));
    expect(summaryScenario(result(all))).toBe('SSP2-4.5');
    expect(summaryScenario(result([{ scenario: 'SSP1-2.6' }, { scenario: 'SSP5-8.5' }, { scenario: 'SSP3-7.0' }]))).toBe('SSP3-7.0');
  });

  it('renders every sentence in all four languages without a missing message', () => {
    const cases = [
      result(twoHorizons()),
      result(twoHorizons({ seasonal_thaw_m: 1.0 }, { talik: true, talik_onset_year: null, ground_temperature_c: 0.4, settlement_m: 0.02, hazard: 'high', hazard_reasons: ['permafrost_thawed_through'] })),
      result(twoHorizons(), { hazard_reasons: ['no_permafrost_modelled'], permafrost_table_m: null }),
      result(twoHorizons({ hazard: 'high', hazard_reasons: ['permafrost_thawed_through'] })),
      result(twoHorizons({ permafrost_table_m: 3.2, talik: true, talik_onset_year: 2044, hazard: 'high', hazard_reasons: ['talik'] })),
    ];
    for (const l of Object.keys(MESSAGES) as (keyof typeof MESSAGES)[]) {
      for (const c of cases) expect(text(c, l).length).toBeGreaterThan(80);
    }
    expect(text(cases[1]!, 'fr')).toContain('1,0');
  });
});
