/**
 * The plain-language summary of an outlook: one paragraph for one scenario (intermediate emissions
 * when it was run), generated from the numbers, in the voice of the house guide (design-language.md;
 * ISO 24495-1 plain-language principles: short sentences, active voice, the number first, then what
 * it means).
 *
 * The sentences are returned as message keys (under `outlook.summary`) with their values already
 * rounded and formatted for the locale, so every language says the same numbers; the page turns them
 * into text with next-intl, the tests with `createTranslator`.
 *
 * What it says, in order:
 *  1. the summer thaw by the first horizon at or after 2050 (else the last one), against the baseline;
 *     where the permafrost has thawed through by then, that instead; with a talik, the depth to the
 *     permafrost table beside it (the summer thaw then stops at last winter's frost);
 *  2. the summer thaw by the last horizon, when that is later;
 *  3. the active layer named once and explained;
 *  4. settlement by the end of the last window, kept apart from "deeper thaw" (a deeper thaw is not
 *     sinking: ground settles only where it holds ice);
 *  5. the ground temperature at the depth of zero annual amplitude, "close to thawing" near 0 °C;
 *  6. a talik, explained as ground that no longer refreezes in winter, for years to decades; or the
 *     permafrost thawing through;
 *  7. the rating of the last horizon with its words ("lower concern in this screening", never "safe");
 *  8. once: warm years thaw deeper than the averages shown.
 */
import { formatDepth, formatNumber, formatTemperature, groundTemperatureState, roundDepthM, settlementReading } from './rounding';
import { SUMMARY_SCENARIO, orderScenarios, type OutlookScenario } from './scenarios';
import type { OutlookResult, WindowResult } from './result';

export interface Sentence {
  /** Message key under `outlook.summary`. */
  key: string;
  values: Record<string, string | number>;
}

export interface Summary {
  scenario: OutlookScenario;
  sentences: Sentence[];
}

/** The scenario the summary speaks about: intermediate if run, else the middle of those run. */
export function summaryScenario(result: OutlookResult): OutlookScenario | null {
  const run = orderScenarios(result.results.map((r) => r.scenario));
  if (run.length === 0) return null;
  return run.includes(SUMMARY_SCENARIO) ? SUMMARY_SCENARIO : run[Math.floor((run.length - 1) / 2)]!;
}

const ratingKey = { low: 'lower', moderate: 'moderate', high: 'higher' } as const;

/**
 * Builds the summary sentences.
 * @param result The stored engine document (parsed).
 * @param locale Locale for the numbers (en, fr, ru, nb).
 * @param scenarioName The scenario's name in the reader's language ("intermediate emissions (SSP2-4.5)").
 * @returns The scenario spoken about and its sentences; null when the result has no scenario.
 */
export function buildSummary(result: OutlookResult, locale: string, scenarioName: (s: OutlookScenario) => string): Summary | null {
  const scenario = summaryScenario(result);
  if (!scenario) return null;
  const rows = result.results.filter((r) => r.scenario === scenario).sort((a, b) => a.horizon - b.horizon);
  const base = result.baseline;
  const baseline = `${base.period[0]}\u2013${base.period[1]}`;
  const name = scenarioName(scenario);
  const first = rows.find((r) => r.horizon >= 2050) ?? rows[rows.length - 1]!;
  const last = rows[rows.length - 1]!;
  const sentences: Sentence[] = [];
  const noPermafrost = base.hazard_reasons.includes('no_permafrost_modelled');

  if (noPermafrost) {
    sentences.push({ key: 'noPermafrost', values: { baseline } });
  } else {
    const thawedThrough = rows.find((r) => r.hazard_reasons.includes('permafrost_thawed_through'));
    const baseDepth = formatDepth(base.seasonal_thaw_m, locale);
    if (thawedThrough && thawedThrough.horizon <= first.horizon) {
      // With no permafrost left, the "summer thaw" is only last winter's frost thawing again: comparing
      // it with the baseline active layer would read as less thaw. Say what happened instead.
      sentences.push({ key: 'thawedThroughLead', values: { scenario: name, horizon: thawedThrough.horizon, baseline, depth: baseDepth } });
    } else {
      if (first.talik && first.permafrost_table_m !== null) {
        // With a talik the summer thaw stops at last winter's frost; the permafrost table lies deeper.
        sentences.push({
          key: 'thawTalik',
          values: { scenario: name, horizon: first.horizon, table: formatDepth(first.permafrost_table_m, locale), baseline, depth: baseDepth },
        });
      } else {
        sentences.push(thawSentence(first, base.seasonal_thaw_m, name, baseline, locale));
      }
      if (last.horizon !== first.horizon && !last.hazard_reasons.includes('permafrost_thawed_through') && !last.talik) {
        sentences.push({ key: 'thawLater', values: { horizon: last.horizon, depth: formatDepth(last.seasonal_thaw_m, locale) } });
      }
    }
    sentences.push({ key: 'activeLayer', values: {} });

    const settle = settlementReading(last.settlement_m);
    const byYear = last.window[1];
    if (settle.kind === 'none') sentences.push({ key: 'settleNone', values: { year: byYear } });
    else if (settle.kind === 'under') sentences.push({ key: 'settleUnder', values: { year: byYear, cm: formatNumber(settle.cm, 0, locale) } });
    else sentences.push({ key: 'settle', values: { year: byYear, cm: formatNumber(settle.cm, 0, locale) } });

    const state = groundTemperatureState(last.ground_temperature_c);
    sentences.push({
      key: state === 'close' ? 'groundClose' : state === 'thawed' ? 'groundThawed' : 'ground',
      values: {
        depth: formatNumber(last.ground_temperature_depth_m, 0, locale),
        base: formatTemperature(base.ground_temperature_c, locale),
        temp: formatTemperature(last.ground_temperature_c, locale),
        baseline,
        horizon: last.horizon,
      },
    });

    const talik = rows.find((r) => r.talik);
    if (talik) {
      const onset = talik.talik_onset_year;
      sentences.push(onset !== null ? { key: 'talik', values: { year: onset } } : { key: 'talikWindow', values: { horizon: talik.horizon } });
    }
    if (thawedThrough && thawedThrough.horizon > first.horizon) sentences.push({ key: 'thawedThrough', values: { horizon: thawedThrough.horizon } });
  }

  sentences.push({ key: 'rating', values: { horizon: last.horizon, rating: ratingKey[last.hazard] } });
  sentences.push({ key: 'warmYears', values: {} });
  return { scenario, sentences };
}

function thawSentence(row: WindowResult, baseThawM: number, scenario: string, baseline: string, locale: string): Sentence {
  // The difference of the rounded figures, so the sentence agrees with the numbers it shows.
  const diff = roundDepthM(roundDepthM(row.seasonal_thaw_m) - roundDepthM(baseThawM));
  const values = { scenario, horizon: row.horizon, depth: formatDepth(row.seasonal_thaw_m, locale), diff: formatNumber(Math.abs(diff), 1, locale), baseline };
  if (diff > 0) return { key: 'thawDeeper', values };
  if (diff < 0) return { key: 'thawShallower', values };
  return { key: 'thawSame', values };
}
