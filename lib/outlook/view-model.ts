/**
 * The outlook view-model: everything the outlook page and the printed briefing show of one stored
 * engine result, in the order they show it, with every number already rounded and formatted for the
 * reader's locale. Pure and client-safe (no next, react or database): the page renders it with
 * next-intl, the PDF with a translator of its own.
 *
 * Words are message keys (`Msg`, full key paths into messages/*.json) with their values; the only
 * strings that are not keys are numbers formatted for the locale and years. Every horizon carries its
 * window's years, so a 2080s window (2071–2090) is never read as another period.
 */
import { airSeries, envelopeSeries, thawSeries, type AirSeries, type EnvelopeSeries, type ThawSeries } from './chart-data';
import type { BaselineResult, ConfidenceLevel, HazardLevel, OutlookResult, WindowResult } from './result';
import { formatDepth, formatIndex, formatNumber, formatTemperature, settlementReading } from './rounding';
import { SCENARIO_STYLES, orderScenarios, type OutlookScenario } from './scenarios';
import { buildSummary } from './summary';

/** A message key with its values; the same shape as the house's `Msg`. */
export interface Msg {
  key: string;
  values?: Record<string, string | number | Date>;
}

const m = (key: string, values?: Msg['values']): Msg => (values ? { key, values } : { key });

/** Rating words as message keys under `outlook.rating` ("lower concern", never "safe"). */
export const RATING_WORD: Readonly<Record<HazardLevel, 'lower' | 'moderate' | 'higher'>> = { low: 'lower', moderate: 'moderate', high: 'higher' };

export interface HorizonLabel {
  horizon: number;
  /** First and last year of the window [year]. */
  start: number;
  end: number;
  /** "2080s (2071–2090)". */
  label: Msg;
}

export interface RatingCell {
  level: HazardLevel;
  /** Short word ("moderate concern"). */
  word: Msg;
  /** Full words ("moderate concern in this screening"). */
  long: Msg;
}

export interface TableRow {
  /** 'baseline' or a scenario. */
  scenario: OutlookScenario | 'baseline';
  horizon: number | null;
  window: Msg;
  air: string;
  thawingIndex: string;
  freezingIndex: string;
  thaw: string;
  permafrostTable: Msg | string;
  ground: string;
  talik: Msg;
  settlement: Msg | string;
  rating: RatingCell;
}

export interface ReasonGroup {
  scenario: OutlookScenario | 'baseline';
  title: Msg;
  /** Open at first (the scenario the summary speaks about). */
  open: boolean;
  items: { label: Msg; rating: RatingCell; reasons: Msg[] }[];
}

export interface OutlookViewModel {
  locale: string;
  baseline: { start: number; end: number; label: Msg; reference: Msg };
  scenarios: { id: OutlookScenario; name: Msg; title: Msg; under: Msg }[];
  horizons: HorizonLabel[];
  summary: { scenario: OutlookScenario; sentences: Msg[]; note: Msg } | null;
  ratings: { baseline: RatingCell; rows: { scenario: OutlookScenario; cells: (RatingCell | null)[] }[] };
  reasons: ReasonGroup[];
  notModelled: { items: Msg[] };
  confidence: { level: ConfidenceLevel; text: Msg };
  table: { groundDepth: string; rows: TableRow[]; note: Msg };
  charts: { thaw: ThawSeries; ground: EnvelopeSeries; air: AirSeries };
  cautions: Msg[];
  provenance: { engineVersion: string; inputSha256: string; sources: string[] };
}

/**
 * The engine's rating thresholds the reasons quote (server code passes the engine's constants; the
 * view-model does not import the engine, whose public interface is not client-safe).
 */
export interface RatingThresholds {
  /** Warm permafrost above this mean ground temperature [°C]. */
  warmC: number;
  /** Very warm permafrost above this [°C]. */
  veryWarmC: number;
  /** Settlement from which the rating is moderate [m]. */
  settlementModerateM: number;
  /** Settlement from which the rating is higher [m]. */
  settlementHighM: number;
}

export interface ViewModelOptions {
  /** BCP 47 tag of the reader (en, fr, ru, nb). */
  locale: string;
  thresholds: RatingThresholds;
  /** Checklist item codes that have a message under `profile.check` (others are shown as their code). */
  hasMessage?: (key: string) => boolean;
}

function rating(level: HazardLevel): RatingCell {
  return { level, word: m(`outlook.rating.short.${RATING_WORD[level]}`), long: m(`outlook.rating.${RATING_WORD[level]}`) };
}

/**
 * One hazard reason code as a message, its thresholds formatted for the locale.
 * @param code Reason code from the engine (`warm_permafrost`, `checklist_ponding`, …).
 * @param locale Reader's locale.
 * @param thresholds The engine's rating thresholds.
 * @param has Whether a message key exists; unknown codes come back as `outlook.reasons.unknown`.
 */
export function reasonMsg(code: string, locale: string, thresholds: RatingThresholds, has: (key: string) => boolean = () => true): Msg {
  if (code.startsWith('checklist_')) {
    const item = code.slice('checklist_'.length);
    const key = `profile.check.${item}`;
    return m('outlook.reasons.checklist', { item: has(key) ? key : item });
  }
  const key = `outlook.reasons.${code}`;
  if (!has(key)) return m('outlook.reasons.unknown', { code });
  return m(key, {
    warm: formatNumber(thresholds.warmC, 0, locale),
    veryWarm: formatNumber(thresholds.veryWarmC, 0, locale),
    moderate: formatNumber(Math.round(thresholds.settlementModerateM * 100), 0, locale),
    high: formatNumber(Math.round(thresholds.settlementHighM * 100), 0, locale),
  });
}

function horizonLabel(r: WindowResult): HorizonLabel {
  return { horizon: r.horizon, start: r.window[0], end: r.window[1], label: m('outlook.horizonWindow', { horizon: r.horizon, start: r.window[0], end: r.window[1] }) };
}

function tableCells(r: WindowResult | BaselineResult, locale: string): Omit<TableRow, 'scenario' | 'horizon' | 'window'> {
  const s = settlementReading(r.settlement_m);
  return {
    air: formatTemperature(r.air_temperature_c, locale),
    thawingIndex: formatIndex(r.thawing_index_c_days, locale),
    freezingIndex: formatIndex(r.freezing_index_c_days, locale),
    thaw: formatDepth(r.seasonal_thaw_m, locale),
    permafrostTable: r.permafrost_table_m === null ? m('outlook.cell.noPermafrost') : formatDepth(r.permafrost_table_m, locale),
    ground: formatTemperature(r.ground_temperature_c, locale),
    talik: r.talik ? (r.talik_onset_year ? m('outlook.cell.talikFrom', { year: r.talik_onset_year }) : m('outlook.cell.talikYes')) : m('outlook.cell.talikNo'),
    settlement: s.kind === 'none' ? formatNumber(0, 0, locale) : s.kind === 'under' ? m('outlook.cell.settlementUnder') : formatNumber(s.cm, 0, locale),
    rating: rating(r.hazard),
  };
}

/**
 * Builds the outlook view-model.
 * @param result The stored engine document, parsed with `outlookResultSchema`.
 * @param options The reader's locale and an optional key check for reason codes.
 * @returns The sections in page order; numbers formatted for `options.locale`.
 */
export function buildOutlookViewModel(result: OutlookResult, options: ViewModelOptions): OutlookViewModel {
  const { locale } = options;
  const has = options.hasMessage ?? (() => true);
  const base = result.baseline;
  const scenarioIds = orderScenarios(result.results.map((r) => r.scenario));
  const horizons = [...new Map(result.results.map((r) => [r.horizon, horizonLabel(r)])).values()].sort((a, b) => a.horizon - b.horizon);
  const row = (s: string, h: number) => result.results.find((r) => r.scenario === s && r.horizon === h);
  const baselineLabel = m('outlook.baseline', { start: base.period[0], end: base.period[1] });
  const reference = m('outlook.baselineReference', { start: base.period[0], end: base.period[1] });
  // The summary names its scenario by message key; renderMsg translates it in the sentence's language.
  const summary = buildSummary(result, locale, (s) => `outlook.scenarioUnder.${SCENARIO_STYLES[s].key}`);
  const scenarios = scenarioIds.map((id) => ({
    id,
    name: m(`outlook.scenario.${SCENARIO_STYLES[id].key}`),
    title: m(`outlook.scenarioTitle.${SCENARIO_STYLES[id].key}`),
    under: m(`outlook.scenarioUnder.${SCENARIO_STYLES[id].key}`),
  }));

  const tableRows: TableRow[] = [
    { scenario: 'baseline', horizon: null, window: m('outlook.yearSpan', { start: base.window[0], end: base.window[1] }), ...tableCells(base, locale) },
    ...scenarioIds.flatMap((s) =>
      horizons.flatMap((h) => {
        const r = row(s, h.horizon);
        return r ? [{ scenario: s, horizon: h.horizon, window: horizonLabel(r).label, ...tableCells(r, locale) }] : [];
      }),
    ),
  ];

  return {
    locale,
    baseline: { start: base.period[0], end: base.period[1], label: baselineLabel, reference },
    scenarios,
    horizons,
    summary: summary
      ? {
          scenario: summary.scenario,
          sentences: summary.sentences.map((s) => m(`outlook.summary.${s.key}`, s.values)),
          note: m('outlook.scenarioNote'),
        }
      : null,
    ratings: { baseline: rating(base.hazard), rows: scenarioIds.map((s) => ({ scenario: s, cells: horizons.map((h) => { const r = row(s, h.horizon); return r ? rating(r.hazard) : null; }) })) },
    reasons: [
      { scenario: 'baseline', title: reference, open: false, items: [{ label: baselineLabel, rating: rating(base.hazard), reasons: base.hazard_reasons.map((c) => reasonMsg(c, locale, options.thresholds, has)) }] },
      ...scenarioIds.map((s) => ({
        scenario: s,
        title: m(`outlook.scenarioTitle.${SCENARIO_STYLES[s].key}`),
        open: s === summary?.scenario,
        items: horizons.flatMap((h) => {
          const r = row(s, h.horizon);
          return r ? [{ label: h.label, rating: rating(r.hazard), reasons: r.hazard_reasons.map((c) => reasonMsg(c, locale, options.thresholds, has)) }] : [];
        }),
      })),
    ],
    notModelled: { items: [...new Set([base, ...result.results].flatMap((r) => r.not_modelled))].map((i) => (has(`outlook.notModelled.${i}`) ? m(`outlook.notModelled.${i}`) : m('outlook.notModelledCode', { code: i }))) },
    confidence: { level: base.confidence, text: m(`outlook.confidence.${base.confidence}`) },
    table: { groundDepth: formatNumber(base.ground_temperature_depth_m, 0, locale), rows: tableRows, note: m('outlook.tableNote') },
    charts: { thaw: thawSeries(result), ground: envelopeSeries(result), air: airSeries(result) },
    cautions: [m('caution.title'), m('caution.body'), m('caution.governs')],
    provenance: { engineVersion: result.provenance.engine_version, inputSha256: result.provenance.input_sha256, sources: result.provenance.sources },
  };
}

/** Values of a Msg that are themselves message keys (the scenario's name in a summary sentence). */
const NESTED_KEY_VALUES: readonly string[] = ['scenario', 'item'];

/**
 * Turns a Msg into text with any translator (next-intl's `t` at the root, or `createTranslator`),
 * translating nested keys (values named `scenario` or `item` that are message keys) first.
 * @param translate Root translator: (full key, values) → text.
 * @param msg The message.
 */
export function renderMsg(translate: (key: string, values?: Record<string, string | number | Date>) => string, msg: Msg): string {
  if (!msg.values) return translate(msg.key);
  const values = Object.fromEntries(
    Object.entries(msg.values).map(([k, v]) => [k, NESTED_KEY_VALUES.includes(k) && typeof v === 'string' && /^(outlook|profile)\.[\w.]+$/.test(v) ? translate(v) : v]),
  );
  return translate(msg.key, values);
}
