import Link from 'next/link';
import { getTranslations } from 'next-intl/server';
import { listCommunities } from '@/lib/data/communities';
import { CommunityMap } from '@/components/map/community-map';
import { DemoNotice } from '@/components/community/demo-badge';

export const metadata = { title: 'Communities' };

export default async function CommunitiesPage() {
  const t = await getTranslations('communities');
  const communities = await listCommunities();
  return (
    <main id="main" className="mx-auto max-w-6xl space-y-6 px-6 py-8">
      <DemoNotice show={communities.some((c) => c.isDemo)} />
      <h1 className="text-2xl font-bold">{t('title')}</h1>
      <div className="grid gap-6 lg:grid-cols-[2fr_1fr]">
        <CommunityMap
          communities={communities.map(({ slug, name, latitudeDeg, longitudeDeg, profileCount }) => ({ slug, name, latitudeDeg, longitudeDeg, profileCount }))}
          label={t('mapLabel')}
        />
        <section aria-labelledby="community-list">
          <h2 id="community-list" className="font-bold">{t('listTitle')}</h2>
          {communities.length === 0 ? (
            <p className="mt-2 text-sm">{t('none')}</p>
          ) : (
            <ul className="mt-2 divide-y divide-snow-200">
              {communities.map((c) => (
                <li key={c.id} className="py-2">
                  <Link href={`/communities/${c.slug}`} className="font-bold text-frost underline-offset-2 hover:underline">{c.name}</Link>
                  <p className="text-sm text-ink-soft">
                    {t('terrainUnits', { count: c.profileCount })} · {c.latitudeDeg.toFixed(2)}° N, {Math.abs(c.longitudeDeg).toFixed(2)}° {c.longitudeDeg < 0 ? 'W' : 'E'}
                  </p>
                </li>
              ))}
            </ul>
          )}
        </section>
      </div>
    </main>
  );
}
