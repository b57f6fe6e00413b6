/**
 * How the outlook shows each emission scenario, the same on every chart, table and document:
 * the order (lowest to highest emissions, as lib/engine/scenario-forcing.ts SCENARIOS), the AR6
 * words with the SSP code beside, a colour AND a line style, so that no scenario is told apart by
 * colour alone (design-language.md; WCAG 2.2 SC 1.4.1 "Use of Color").
 *
 * Pure data: client chart components import it without pulling in the engine.
 *
 * Colours come from the palette (tailwind.config.ts): lichen, permafrost blue, ink, thaw ochre,
 * alert rust, from cool to warm as emissions rise. Each has at least 3:1 contrast against the card
 * surface (WCAG 2.2 SC 1.4.11 "Non-text Contrast"; checked in scenarios.test.ts).
 */

export const OUTLOOK_SCENARIOS = ['SSP1-1.9', 'SSP1-2.6', 'SSP2-4.5', 'SSP3-7.0', 'SSP5-8.5'] as const;
export type OutlookScenario = (typeof OUTLOOK_SCENARIOS)[number];

/** Planning horizons an outlook is run for (decades; each stands for the 20-year window Y−9 … Y+10). */
export const OUTLOOK_HORIZONS = [2030, 2050, 2080] as const;

/** The scenario the plain-language summary speaks about. */
export const SUMMARY_SCENARIO: OutlookScenario = 'SSP2-4.5';

export interface ScenarioStyle {
  /** Message key under outlook.scenario (next-intl keys cannot hold dots). */
  key: 'veryLow' | 'low' | 'intermediate' | 'high' | 'veryHigh';
  /** AR6 words, English (IPCC AR6 WG1 SPM, Table SPM.1). */
  words: 'very low' | 'low' | 'intermediate' | 'high' | 'very high';
  colour: string;
  /** SVG stroke-dasharray; '' is a solid line. */
  dash: string;
  /** Width of the line [px]. */
  width: number;
}

export const SCENARIO_STYLES: Readonly<Record<OutlookScenario, ScenarioStyle>> = {
  'SSP1-1.9': { key: 'veryLow', words: 'very low', colour: '#466e33', dash: '2 3', width: 2 },
  'SSP1-2.6': { key: 'low', words: 'low', colour: '#1d5a85', dash: '7 4', width: 2 },
  'SSP2-4.5': { key: 'intermediate', words: 'intermediate', colour: '#15212c', dash: '', width: 2.5 },
  'SSP3-7.0': { key: 'high', words: 'high', colour: '#9a5a14', dash: '10 3 2 3', width: 2 },
  'SSP5-8.5': { key: 'veryHigh', words: 'very high', colour: '#9e3519', dash: '14 3 2 3 2 3', width: 2 },
};

/** The baseline (reference period) on charts: a neutral grey, thin, long dashes. */
export const BASELINE_STYLE = { colour: '#56646f', dash: '4 2', width: 1.5 } as const;

/** Scenarios of a result in the fixed low → high order (unknown ids dropped). */
export function orderScenarios(list: readonly string[]): OutlookScenario[] {
  return OUTLOOK_SCENARIOS.filter((s) => list.includes(s));
}
