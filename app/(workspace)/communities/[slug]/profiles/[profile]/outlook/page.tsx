import Link from 'next/link';
import { Suspense } from 'react';
import { getLocale, getTranslations } from 'next-intl/server';
import { getGroundProfile } from '@/lib/data/communities';
import { getOutlook, type OutlookView } from '@/lib/data/outlooks';
import { hasRole, requireActor, ROLES } from '@/lib/data/session';
import { SETTLEMENT_HIGH_M, SETTLEMENT_MODERATE_M, VERY_WARM_PERMAFROST_C, WARM_PERMAFROST_C } from '@/lib/engine';
import { airSeries, envelopeSeries, thawSeries } from '@/lib/outlook/chart-data';
import type { BaselineResult, HazardLevel, OutlookResult, WindowResult } from '@/lib/outlook/result';
import { formatDepth, formatIndex, formatNumber, formatTemperature, settlementReading } from '@/lib/outlook/rounding';
import { OUTLOOK_SCENARIOS, SCENARIO_STYLES, orderScenarios, type OutlookScenario } from '@/lib/outlook/scenarios';
import { buildSummary } from '@/lib/outlook/summary';
import { Caution } from '@/components/community/caution';
import { DemoNotice } from '@/components/community/demo-badge';
import { AirTemperatureChart } from '@/components/outlook/air-temperature-chart';
import { GroundTemperatureChart } from '@/components/outlook/ground-temperature-chart';
import { HazardMark, HazardShape } from '@/components/outlook/hazard-mark';
import { RunOutlookButton } from '@/components/outlook/run-outlook-button';
import { ScenarioLine } from '@/components/outlook/scenario-line';
import { ThawDepthChart } from '@/components/outlook/thaw-depth-chart';

type T = Awaited<ReturnType<typeof getTranslations<'outlook'>>>;

const RATING_WORD: Record<HazardLevel, 'lower' | 'moderate' | 'higher'> = { low: 'lower', moderate: 'moderate', high: 'higher' };

export async function generateMetadata() {
  const t = await getTranslations('outlook');
  return { title: t('title') };
}

/**
 * The outlook of one ground profile. The access check (getGroundProfile: sign-in, organisation)
 * runs before anything streams, so another organisation's profile answers 404; only the stored
 * outlook below it is read inside <Suspense> (no loading.tsx: its boundary would stream 200 first).
 */
export default async function OutlookPage({ params }: { params: Promise<{ slug: string; profile: string }> }) {
  const { slug, profile } = await params;
  const p = await getGroundProfile(slug, profile);
  const actor = await requireActor();
  const canRun = hasRole(actor, ROLES.planning);
  const t = await getTranslations('outlook');
  const tp = await getTranslations('profile');

  return (
    <main id="main" className="mx-auto max-w-6xl space-y-8 px-6 py-8">
      <DemoNotice show={p.community.isDemo} />
      <nav className="text-sm">
        <Link href="/communities" className="text-frost underline">{tp('communities')}</Link> /{' '}
        <Link href={`/communities/${p.community.slug}`} className="text-frost underline">{p.community.name}</Link> /{' '}
        <Link href={`/communities/${p.community.slug}/profiles/${p.slug}`} className="text-frost underline">{p.name}</Link> / {t('breadcrumb')}
      </nav>
      <header>
        <h1 className="text-2xl font-bold">{t('heading', { profile: p.name })}</h1>
        <p className="mt-1 max-w-3xl text-ink-soft">{t('intro', { baseline: baselineOf(p.site) })}</p>
      </header>
      <Caution />
      <Suspense fallback={<OutlookSkeleton />}>
        <OutlookBody communitySlug={p.community.slug} profileSlug={p.slug} currentVersion={p.currentVersion} canRun={canRun} />
      </Suspense>
    </main>
  );
}

function baselineOf(site: Record<string, unknown>): string {
  const period = (site.climate as { baseline_period?: [number, number] } | undefined)?.baseline_period;
  return period ? `${period[0]}\u2013${period[1]}` : '1991\u20132020';
}

function OutlookSkeleton() {
  return (
    <div aria-hidden="true" className="space-y-4">
      <div className="h-24 animate-pulse rounded bg-snow-100" />
      <div className="h-64 animate-pulse rounded bg-snow-100" />
    </div>
  );
}

async function OutlookBody({ communitySlug, profileSlug, currentVersion, canRun }: { communitySlug: string; profileSlug: string; currentVersion: number; canRun: boolean }) {
  const outlook = await getOutlook(communitySlug, profileSlug);
  const t = await getTranslations('outlook');
  const locale = await getLocale();
  const help = t('run.help', { version: currentVersion });

  if (!outlook) {
    return (
      <section aria-labelledby="run" className="rounded border border-snow-200 bg-ice-raised px-4 py-4">
        <h2 id="run" className="font-bold">{t('none')}</h2>
        <div className="mt-3">{canRun ? <RunOutlookButton communitySlug={communitySlug} profileSlug={profileSlug} again={false} help={help} /> : <p className="text-sm">{t('noneReader')}</p>}</div>
      </section>
    );
  }

  return (
    <>
      {outlook.stale.length > 0 ? <StaleNotice outlook={outlook} t={t} canRun={canRun} run={<RunOutlookButton communitySlug={communitySlug} profileSlug={profileSlug} again help={help} />} /> : null}
      {outlook.result ? <OutlookResultView outlook={outlook} result={outlook.result} locale={locale} t={t} /> : <p className="rounded bg-rust-pale px-4 py-3">{t('unreadable')}</p>}
    </>
  );
}

function StaleNotice({ outlook, t, canRun, run }: { outlook: OutlookView; t: T; canRun: boolean; run: React.ReactNode }) {
  return (
    <section aria-labelledby="stale" className="rounded border-l-4 border-thaw bg-thaw-pale px-4 py-3">
      <h2 id="stale" className="font-bold">{t('stale.title')}</h2>
      {outlook.stale.includes('profile_version') ? <p className="mt-1 text-sm">{t('stale.profileVersion', { old: outlook.profileVersion, current: outlook.currentProfileVersion })}</p> : null}
      {outlook.stale.includes('engine_version') ? <p className="mt-1 text-sm">{t('stale.engineVersion', { old: outlook.engineVersion, current: outlook.currentEngineVersion })}</p> : null}
      <div className="mt-2">{canRun ? run : <p className="text-sm">{t('stale.reader')}</p>}</div>
    </section>
  );
}

function OutlookResultView({ outlook, result, locale, t }: { outlook: OutlookView; result: OutlookResult; locale: string; t: T }) {
  const scenarios = orderScenarios(result.results.map((r) => r.scenario));
  const horizons = [...new Set(result.results.map((r) => r.horizon))].sort((a, b) => a - b);
  const base = result.baseline;
  const baseline = t('baseline', { start: base.period[0], end: base.period[1] });
  const names = Object.fromEntries(OUTLOOK_SCENARIOS.map((s) => [s, t(`scenario.${SCENARIO_STYLES[s].key}`)])) as Record<OutlookScenario, string>;
  const titles = Object.fromEntries(OUTLOOK_SCENARIOS.map((s) => [s, t(`scenarioTitle.${SCENARIO_STYLES[s].key}`)])) as Record<OutlookScenario, string>;
  const horizonNames = Object.fromEntries(horizons.map((h) => [h, t('horizon', { horizon: h })])) as Record<number, string>;
  const summary = buildSummary(result, locale, (s) => t(`scenarioUnder.${SCENARIO_STYLES[s].key}`));
  const row = (s: string, h: number) => result.results.find((r) => r.scenario === s && r.horizon === h);
  const ratingWords = (level: HazardLevel) => ({ word: t(`rating.short.${RATING_WORD[level]}`), detail: t('rating.inThisScreening') });

  return (
    <>
      {summary ? (
        <section aria-labelledby="summary" className="max-w-3xl">
          <h2 id="summary" className="text-lg font-bold">{t('summaryTitle')}</h2>
          <p className="mt-2 leading-relaxed">
            {summary.sentences.map((s) => t(`summary.${s.key}` as 'summary.warmYears', s.values)).join(' ')}
          </p>
          <p className="mt-2 text-sm text-ink-soft">{t('scenarioNote')}</p>
        </section>
      ) : null}

      <section aria-labelledby="rating">
        <h2 id="rating" className="text-lg font-bold">{t('rating.title')}</h2>
        <p className="mt-1 max-w-3xl text-sm text-ink-soft">{t('rating.intro')}</p>
        <p className="mt-1 text-sm text-ink-soft">{t('rating.legend')}</p>
        <div className="mt-3 overflow-x-auto">
          <table className="w-full min-w-[640px] text-sm">
            <thead className="border-b border-snow-300 text-left text-ink-soft">
              <tr>
                <th scope="col" className="py-1 font-normal">{t('rating.scenarioColumn')}</th>
                <th scope="col" className="font-normal">{t('baselineReference', { start: base.period[0], end: base.period[1] })}</th>
                {horizons.map((h) => <th key={h} scope="col" className="font-normal">{t('horizonWindow', { horizon: h, start: h - 9, end: h + 10 })}</th>)}
              </tr>
            </thead>
            <tbody>
              {scenarios.map((s) => (
                <tr key={s} className="border-b border-snow-200 align-top">
                  <th scope="row" className="py-2 pr-3 text-left font-normal">
                    <span className="inline-flex items-center gap-2"><ScenarioLine scenario={s} width={28} />{titles[s]}</span>
                  </th>
                  <td className="py-2 pr-3"><HazardMark level={base.hazard} {...ratingWords(base.hazard)} /></td>
                  {horizons.map((h) => {
                    const r = row(s, h);
                    return <td key={h} className="py-2 pr-3">{r ? <HazardMark level={r.hazard} {...ratingWords(r.hazard)} /> : '—'}</td>;
                  })}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </section>

      <section aria-labelledby="reasons">
        <h2 id="reasons" className="text-lg font-bold">{t('reasonsTitle')}</h2>
        <p className="mt-1 text-sm text-ink-soft">{t('reasonsIntro')}</p>
        <div className="mt-2 space-y-2">
          <Reasons title={t('baselineReference', { start: base.period[0], end: base.period[1] })} items={[{ label: baseline, r: base }]} t={t} open={false} />
          {scenarios.map((s) => (
            <Reasons key={s} title={titles[s]} scenario={s} items={horizons.flatMap((h) => (row(s, h) ? [{ label: horizonNames[h]!, r: row(s, h)! }] : []))} t={t} open={s === summary?.scenario} />
          ))}
        </div>
      </section>

      <div className="grid gap-6 md:grid-cols-2">
        <NotModelled result={result} t={t} />
        <section aria-labelledby="confidence">
          <h2 id="confidence" className="text-lg font-bold">{t('confidenceTitle')}</h2>
          <p className="mt-1 text-sm">{t(`confidence.${base.confidence}`)}</p>
        </section>
      </div>

      <section aria-labelledby="charts" className="space-y-8">
        <h2 id="charts" className="sr-only">{t('charts.thawTitle')}</h2>
        <figure className="rounded border border-snow-200 bg-ice-raised p-4">
          <figcaption>
            <h3 className="font-bold">{t('charts.thawTitle')}</h3>
            <p className="text-sm text-ink-soft">{t('charts.thawDesc', { baseline })}</p>
          </figcaption>
          <div className="mt-3">
            <ThawDepthChart
              data={thawSeries(result)}
              names={names}
              labels={{ legend: t('charts.legend'), depthAxis: t('charts.depthAxis'), yearAxis: t('charts.yearAxis'), horizons: horizonNames, baseline, surface: t('charts.surface') }}
            />
          </div>
        </figure>
        <div className="grid gap-6 lg:grid-cols-2">
          <figure className="rounded border border-snow-200 bg-ice-raised p-4">
            <figcaption>
              <h3 className="font-bold">{t('charts.groundTitle')}</h3>
              <p className="text-sm text-ink-soft">{t('charts.groundDesc')}</p>
            </figcaption>
            <div className="mt-3">
              <GroundTemperatureChart
                data={envelopeSeries(result)}
                names={names}
                labels={{
                  legend: t('charts.legend'),
                  depthAxis: t('charts.depthAxis'),
                  tempAxis: t('charts.tempAxis'),
                  zero: t('charts.zero'),
                  coldest: t('charts.coldest'),
                  warmest: t('charts.warmest'),
                  horizonPicker: t('charts.horizonPicker'),
                  horizons: horizonNames,
                  baseline,
                }}
              />
            </div>
          </figure>
          <figure className="rounded border border-snow-200 bg-ice-raised p-4">
            <figcaption>
              <h3 className="font-bold">{t('charts.airTitle')}</h3>
              <p className="text-sm text-ink-soft">{t('charts.airDesc', { baseline })}</p>
            </figcaption>
            <div className="mt-3">
              <AirTemperatureChart
                data={airSeries(result)}
                names={names}
                labels={{ legend: t('charts.legend'), airAxis: t('charts.airAxis'), categories: { baseline, ...Object.fromEntries(horizons.map((h) => [String(h), horizonNames[h]!])) }, baseline }}
              />
            </div>
          </figure>
        </div>
      </section>

      <ResultsTable result={result} scenarios={scenarios} horizons={horizons} titles={titles} locale={locale} t={t} />

      <Provenance outlook={outlook} result={result} t={t} />
    </>
  );
}

function reasonText(code: string, t: T, check: (item: string) => string): string {
  const values = {
    warm: formatNumber(WARM_PERMAFROST_C, 0, 'en'),
    veryWarm: formatNumber(VERY_WARM_PERMAFROST_C, 0, 'en'),
    moderate: Math.round(SETTLEMENT_MODERATE_M * 100),
    high: Math.round(SETTLEMENT_HIGH_M * 100),
  };
  if (code.startsWith('checklist_')) return t('reasons.checklist', { item: check(code.slice('checklist_'.length)) });
  const key = `reasons.${code}` as 'reasons.talik';
  return t.has(key) ? t(key, values) : code;
}

async function Reasons({ title, scenario, items, t, open }: { title: string; scenario?: OutlookScenario; items: { label: string; r: WindowResult | BaselineResult }[]; t: T; open: boolean }) {
  const tp = await getTranslations('profile');
  const check = (item: string) => (tp.has(`check.${item}` as 'check.ponding') ? tp(`check.${item}` as 'check.ponding') : item);
  return (
    <details open={open} className="rounded border border-snow-200 bg-ice-raised px-4 py-2">
      <summary className="cursor-pointer">
        <span className="inline-flex items-center gap-2">{scenario ? <ScenarioLine scenario={scenario} width={28} /> : <ScenarioLine scenario="baseline" width={28} />}<span className="font-bold">{title}</span></span>
      </summary>
      <dl className="mt-2 space-y-2 text-sm">
        {items.map(({ label, r }) => (
          <div key={label} className="grid gap-1 sm:grid-cols-[7rem_1fr]">
            <dt className="flex items-start gap-1.5">
              <span className="shrink-0 font-bold">{label}</span>
              <HazardShape level={r.hazard} />
              <span className="sr-only">{t(`rating.${RATING_WORD[r.hazard]}`)}</span>
            </dt>
            <dd>
              <p className="font-bold">{t(`rating.${RATING_WORD[r.hazard]}`)}</p>
              <ul className="list-disc pl-5">
                {r.hazard_reasons.map((code) => <li key={code}>{reasonText(code, t, check)}</li>)}
              </ul>
            </dd>
          </div>
        ))}
      </dl>
    </details>
  );
}

function NotModelled({ result, t }: { result: OutlookResult; t: T }) {
  const items = [...new Set([result.baseline, ...result.results].flatMap((r) => r.not_modelled))];
  return (
    <section aria-labelledby="not-modelled">
      <h2 id="not-modelled" className="text-lg font-bold">{t('notModelledTitle')}</h2>
      {items.length ? (
        <>
          <p className="mt-1 text-sm">{t('notModelledPresent')}</p>
          <ul className="mt-1 list-disc pl-5 text-sm">
            {items.map((i) => <li key={i}>{t.has(`notModelled.${i}` as 'notModelled.ponding') ? t(`notModelled.${i}` as 'notModelled.ponding') : i}</li>)}
          </ul>
        </>
      ) : (
        <p className="mt-1 text-sm">{t('notModelledNone')}</p>
      )}
      <p className="mt-2 text-sm text-ink-soft">{t('notModelledAlways')}</p>
    </section>
  );
}

const CELL = 'px-2 py-1';
const HEAD = 'px-2 py-1 font-normal leading-tight';

function ResultsTable({ result, scenarios, horizons, titles, locale, t }: { result: OutlookResult; scenarios: OutlookScenario[]; horizons: number[]; titles: Record<string, string>; locale: string; t: T }) {
  const base = result.baseline;
  const depth = formatNumber(base.ground_temperature_depth_m, 0, locale);
  const settlement = (m: number) => {
    const s = settlementReading(m);
    return s.kind === 'none' ? '0' : s.kind === 'under' ? t('cell.settlementUnder') : formatNumber(s.cm, 0, locale);
  };
  const talik = (r: WindowResult | BaselineResult) => (r.talik ? (r.talik_onset_year ? t('cell.talikFrom', { year: r.talik_onset_year }) : t('cell.talikYes')) : t('cell.talikNo'));
  const cells = (r: WindowResult | BaselineResult) => (
    <>
      <td className={CELL}>{formatTemperature(r.air_temperature_c, locale)}</td>
      <td className={CELL}>{formatIndex(r.thawing_index_c_days, locale)}</td>
      <td className={CELL}>{formatIndex(r.freezing_index_c_days, locale)}</td>
      <td className={CELL}>{formatDepth(r.seasonal_thaw_m, locale)}</td>
      <td className={CELL}>{r.permafrost_table_m === null ? t('cell.noPermafrost') : formatDepth(r.permafrost_table_m, locale)}</td>
      <td className={CELL}>{formatTemperature(r.ground_temperature_c, locale)}</td>
      <td className={CELL}>{talik(r)}</td>
      <td className={CELL}>{settlement(r.settlement_m)}</td>
      <td className={`${CELL} pl-4 text-left`}>
        <span className="inline-flex items-center gap-1.5 whitespace-nowrap"><HazardShape level={r.hazard} size={12} />{t(`rating.short.${RATING_WORD[r.hazard]}`)}</span>
      </td>
    </>
  );
  return (
    <section aria-labelledby="table">
      <h2 id="table" className="text-lg font-bold">{t('tableTitle')}</h2>
      <p className="mt-1 text-sm text-ink-soft">{t('tableNote')}</p>
      <div className="mt-2 overflow-x-auto">
        <table className="w-full min-w-[960px] text-right text-sm">
          <thead className="border-b border-snow-300 align-bottom text-ink-soft">
            <tr>
              <th scope="col" className={`${HEAD} pl-0 text-left`}>{t('col.scenario')}</th>
              <th scope="col" className={`${HEAD} text-left`}>{t('col.window')}</th>
              <th scope="col" className={HEAD}>{t('col.air')}</th>
              <th scope="col" className={HEAD}>{t('col.thawingIndex')}</th>
              <th scope="col" className={HEAD}>{t('col.freezingIndex')}</th>
              <th scope="col" className={HEAD}>{t('col.thaw')}</th>
              <th scope="col" className={HEAD}>{t('col.table')}</th>
              <th scope="col" className={HEAD}>{t('col.ground', { depth })}</th>
              <th scope="col" className={HEAD}>{t('col.talik')}</th>
              <th scope="col" className={HEAD}>{t('col.settlement')}</th>
              <th scope="col" className={`${HEAD} pl-4 text-left`}>{t('col.rating')}</th>
            </tr>
          </thead>
          <tbody>
            <tr className="border-b-2 border-snow-300 bg-snow-100">
              <th scope="row" className="py-1 text-left font-normal"><span className="inline-flex items-center gap-2"><ScenarioLine scenario="baseline" width={24} />{t('baselineReference', { start: base.period[0], end: base.period[1] })}</span></th>
              <td className={`${CELL} text-left`}>{`${base.window[0]}\u2013${base.window[1]}`}</td>
              {cells(base)}
            </tr>
            {scenarios.flatMap((s) =>
              horizons.map((h, i) => {
                const r = result.results.find((x) => x.scenario === s && x.horizon === h);
                if (!r) return null;
                return (
                  <tr key={`${s}-${h}`} className={`border-b ${i === horizons.length - 1 ? 'border-snow-300' : 'border-snow-200'}`}>
                    {i === 0 ? (
                      <th scope="rowgroup" rowSpan={horizons.length} className="py-1 pr-2 text-left align-top font-normal">
                        <span className="inline-flex items-center gap-2"><ScenarioLine scenario={s} width={24} />{titles[s]}</span>
                      </th>
                    ) : null}
                    <td className={`${CELL} whitespace-nowrap text-left`}>{t('horizonWindow', { horizon: h, start: r.window[0], end: r.window[1] })}</td>
                    {cells(r)}
                  </tr>
                );
              }),
            )}
          </tbody>
        </table>
      </div>
    </section>
  );
}

function Provenance({ outlook, result, t }: { outlook: OutlookView; result: OutlookResult; t: T }) {
  const when = outlook.computedAt.slice(0, 16).replace('T', ' ');
  return (
    <footer aria-labelledby="provenance" className="border-t border-snow-300 pt-4 text-sm">
      <h2 id="provenance" className="font-bold">{t('provenance.title')}</h2>
      <dl className="mt-2 grid gap-x-6 gap-y-1 sm:grid-cols-[14rem_1fr]">
        <dt className="text-ink-soft">{t('provenance.engine')}</dt>
        <dd>{result.provenance.engine_version}</dd>
        <dt className="text-ink-soft">{t('provenance.input')}</dt>
        <dd className="break-all font-mono text-xs leading-5">{result.provenance.input_sha256}</dd>
        <dt className="text-ink-soft">{t('provenance.profileVersion')}</dt>
        <dd>{outlook.profileVersion}</dd>
        <dt className="text-ink-soft">{t('provenance.computed')}</dt>
        <dd>{outlook.computedBy ? t('provenance.computedBy', { when, who: outlook.computedBy }) : t('provenance.computedWhen', { when })}</dd>
      </dl>
      <h3 className="mt-3 font-bold">{t('provenance.sources')}</h3>
      <ol className="mt-1 list-decimal space-y-0.5 pl-5 text-xs text-ink-soft">
        {result.provenance.sources.map((s) => <li key={s}>{s}</li>)}
      </ol>
    </footer>
  );
}
