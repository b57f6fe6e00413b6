import Link from 'next/link';
import { Suspense } from 'react';
import { getLocale, getTranslations } from 'next-intl/server';
import { getGroundProfile } from '@/lib/data/communities';
import { getOutlook, type OutlookView } from '@/lib/data/outlooks';
import { hasRole, requireActor, ROLES } from '@/lib/data/session';
import { SETTLEMENT_HIGH_M, SETTLEMENT_MODERATE_M, VERY_WARM_PERMAFROST_C, WARM_PERMAFROST_C } from '@/lib/engine';
import type { OutlookResult } from '@/lib/outlook/result';
import { buildOutlookViewModel } from '@/lib/outlook/view-model';
import { Caution } from '@/components/community/caution';
import { DemoNotice } from '@/components/community/demo-badge';
import { ChartsSection } from '@/components/outlook/charts-section';
import { NotesSection } from '@/components/outlook/notes-section';
import { ProvenanceSection } from '@/components/outlook/provenance-section';
import { RatingSection } from '@/components/outlook/rating-section';
import { ReasonsSection } from '@/components/outlook/reasons-section';
import { ResultsTable } from '@/components/outlook/results-table';
import { RunOutlookPanel } from '@/components/outlook/run-outlook-panel';
import { SummarySection } from '@/components/outlook/summary-section';

type T = Awaited<ReturnType<typeof getTranslations<'outlook'>>>;

export async function generateMetadata() {
  const t = await getTranslations('outlook');
  return { title: t('title') };
}

/**
 * The outlook of one ground profile. The access check (getGroundProfile: sign-in, organisation)
 * runs before anything streams, so another organisation's profile answers 404; only the stored
 * outlook below it is read inside <Suspense> (no loading.tsx: its boundary would stream 200 first).
 */
export default async function OutlookPage({ params, searchParams }: { params: Promise<{ slug: string; profile: string }>; searchParams: Promise<{ outlook?: string | string[] }> }) {
  const { slug, profile } = await params;
  const asked = (await searchParams).outlook;
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
        <OutlookBody communitySlug={p.community.slug} profileSlug={p.slug} currentVersion={p.currentVersion} canRun={canRun} outlookId={typeof asked === 'string' ? asked : undefined} />
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

async function OutlookBody({ communitySlug, profileSlug, currentVersion, canRun, outlookId }: { communitySlug: string; profileSlug: string; currentVersion: number; canRun: boolean; outlookId?: string }) {
  const outlook = await getOutlook(communitySlug, profileSlug, outlookId);
  const t = await getTranslations('outlook');
  const locale = await getLocale();
  const panel = (again: boolean) => <RunOutlookPanel communitySlug={communitySlug} profileSlug={profileSlug} again={again} version={currentVersion} />;

  if (!outlook) {
    return (
      <section aria-labelledby="run" className="rounded border border-snow-200 bg-ice-raised px-4 py-4">
        <h2 id="run" className="font-bold">{t('none')}</h2>
        <div className="mt-3">{canRun ? panel(false) : <p className="text-sm">{t('noneReader')}</p>}</div>
      </section>
    );
  }

  return (
    <>
      {outlook.stale.length > 0 ? <StaleNotice outlook={outlook} t={t} canRun={canRun} run={panel(true)} /> : null}
      {outlook.result ? <OutlookResultView outlook={outlook} result={outlook.result} locale={locale} /> : <p className="rounded bg-rust-pale px-4 py-3">{t('unreadable')}</p>}
      {canRun && outlook.stale.length === 0 ? (
        <details className="rounded border border-snow-200 bg-ice-raised px-4 py-3">
          <summary className="cursor-pointer font-bold">{t('run.other')}</summary>
          <div className="mt-3">{panel(true)}</div>
        </details>
      ) : null}
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

async function OutlookResultView({ outlook, result, locale }: { outlook: OutlookView; result: OutlookResult; locale: string }) {
  const t = await getTranslations();
  const thresholds = { warmC: WARM_PERMAFROST_C, veryWarmC: VERY_WARM_PERMAFROST_C, settlementModerateM: SETTLEMENT_MODERATE_M, settlementHighM: SETTLEMENT_HIGH_M };
  const vm = buildOutlookViewModel(result, { locale, thresholds, hasMessage: (key) => t.has(key as never) });
  return (
    <>
      <SummarySection vm={vm} />
      <RatingSection vm={vm} />
      <ReasonsSection vm={vm} />
      <NotesSection vm={vm} />
      <ChartsSection vm={vm} />
      <ResultsTable vm={vm} />
      <ProvenanceSection vm={vm} outlook={outlook} />
    </>
  );
}
