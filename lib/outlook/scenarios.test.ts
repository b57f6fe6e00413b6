import { describe, expect, it } from 'vitest';
import { SCENARIOS, SCENARIO_EMISSIONS_WORDS } from '@/lib/engine';
import { BASELINE_STYLE, OUTLOOK_SCENARIOS, SCENARIO_STYLES, orderScenarios } from './scenarios';
import en from '@/messages/en.json';

/** WCAG 2.2 relative luminance and contrast ratio (W3C WCAG 2.2 glossary). */
function luminance(hex: string): number {
  const [r, g, b] = [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16) / 255).map((c) => (c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4));
  return 0.2126 * r! + 0.7152 * g! + 0.0722 * b!;
}
const contrast = (a: string, b: string) => {
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x);
  return (hi! + 0.05) / (lo! + 0.05);
};

describe('scenario styles', () => {
  it('keep the engine order, low to high, and the AR6 words (IPCC AR6 WG1 SPM, Table SPM.1)', () => {
    expect([...OUTLOOK_SCENARIOS]).toEqual([...SCENARIOS]);
    for (const s of OUTLOOK_SCENARIOS) expect(SCENARIO_STYLES[s].words).toBe(SCENARIO_EMISSIONS_WORDS[s]);
    expect(orderScenarios(['SSP5-8.5', 'SSP1-2.6', 'unknown', 'SSP2-4.5'])).toEqual(['SSP1-2.6', 'SSP2-4.5', 'SSP5-8.5']);
  });

  it('name each scenario by its AR6 words with the SSP code beside, never "business as usual" (design-language.md)', () => {
    for (const s of OUTLOOK_SCENARIOS) {
      const name = en.outlook.scenario[SCENARIO_STYLES[s].key];
      expect(name).toBe(`${SCENARIO_EMISSIONS_WORDS[s]} emissions (${s})`);
    }
    expect(JSON.stringify(en.outlook).toLowerCase()).not.toContain('business as usual');
  });

  it('tell scenarios apart by line style as well as colour (WCAG 2.2 SC 1.4.1)', () => {
    const dashes = OUTLOOK_SCENARIOS.map((s) => SCENARIO_STYLES[s].dash);
    expect(new Set(dashes).size).toBe(OUTLOOK_SCENARIOS.length);
    expect(dashes).not.toContain(BASELINE_STYLE.dash);
    expect(new Set(OUTLOOK_SCENARIOS.map((s) => SCENARIO_STYLES[s].colour)).size).toBe(OUTLOOK_SCENARIOS.length);
  });

  it('draw every line with at least 3:1 contrast on the card surface and the chart bands (WCAG 2.2 SC 1.4.11)', () => {
    for (const bg of ['#ffffff', '#dbe8f1']) {
      for (const s of OUTLOOK_SCENARIOS) expect(contrast(SCENARIO_STYLES[s].colour, bg), `${s} on ${bg}`).toBeGreaterThanOrEqual(3);
      expect(contrast(BASELINE_STYLE.colour, bg)).toBeGreaterThanOrEqual(3);
    }
  });
});
