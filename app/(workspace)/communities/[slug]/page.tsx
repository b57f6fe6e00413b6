import Link from 'next/link';
import { getTranslations } from 'next-intl/server';
import { getCommunity } from '@/lib/data/communities';
import { CommunityMap } from '@/components/map/community-map';
import { DemoNotice } from '@/components/community/demo-badge';

export default async function CommunityPage({ params }: { params: Promise<{ slug: string }> }) {
  const { slug } = await params;
  const t = await getTranslations('communities');
  const c = await getCommunity(slug);
  return (
    <main id="main" className="mx-auto max-w-6xl space-y-6 px-6 py-8">
      <DemoNotice show={c.isDemo} />
      <nav className="text-sm"><Link href="/communities" className="text-frost underline">{t('title')}</Link> / {c.name}</nav>
      <header>
        <h1 className="text-2xl font-bold">{c.name}</h1>
        <p className="text-ink-soft">{c.description}</p>
        <p className="mt-1 text-sm text-ink-soft">
          {c.organisationName} · {c.population ? `${t('population')} ${c.population} · ` : ''}
          {t('languages')} {c.languages.join(', ')}
        </p>
      </header>
      <div className="grid gap-6 lg:grid-cols-[1fr_1fr]">
        <section aria-labelledby="units">
          <h2 id="units" className="font-bold">{t('terrainUnitsTitle')}</h2>
          <p className="mt-1 text-sm text-ink-soft">{t('terrainUnitsHelp')}</p>
          <ul className="mt-3 divide-y divide-snow-200 rounded border border-snow-200 bg-ice-raised">
            {c.profiles.map((p) => (
              <li key={p.id} className="px-4 py-3">
                <Link href={`/communities/${c.slug}/profiles/${p.slug}`} className="font-bold text-frost hover:underline">{p.name}</Link>
                <p className="text-xs text-ink-muted">{t('version', { version: p.currentVersion })}</p>
              </li>
            ))}
          </ul>
        </section>
        <CommunityMap communities={[{ slug: c.slug, name: c.name, latitudeDeg: c.latitudeDeg, longitudeDeg: c.longitudeDeg, profileCount: c.profileCount }]} selected={c.slug} label={t('mapLabel')} />
      </div>
    </main>
  );
}
