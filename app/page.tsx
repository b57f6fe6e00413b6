import { getTranslations } from 'next-intl/server';

export default async function HomePage() {
  const t = await getTranslations();
  return (
    <main id="main" className="mx-auto max-w-4xl px-6 py-10">
      <p className="mb-6 rounded border border-thaw-fill bg-thaw-pale px-4 py-2 text-sm" role="note">
        {t('common.demoNotice')}
      </p>
      <h1 className="text-3xl font-bold text-frost-strong">{t('common.appName')}</h1>
      <p className="mt-1 text-ink-soft">{t('common.tagline')}</p>
      <h2 className="mt-8 text-xl font-bold">{t('home.title')}</h2>
      <p className="mt-2 max-w-prose leading-relaxed">{t('home.intro')}</p>
      <section aria-labelledby="caution" className="mt-8 rounded border-l-4 border-frost bg-frost-pale px-4 py-3">
        <h2 id="caution" className="font-bold">{t('caution.title')}</h2>
        <p className="mt-1 text-sm leading-relaxed">{t('caution.body')}</p>
      </section>
    </main>
  );
}
