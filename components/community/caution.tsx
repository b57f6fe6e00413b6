import { getTranslations } from 'next-intl/server';

/** The screening caution, plain and visible on every screen that shows a result. */
export async function Caution() {
  const t = await getTranslations('caution');
  return (
    <section aria-label={t('title')} className="rounded border-l-4 border-frost bg-frost-pale px-4 py-3">
      <h2 className="font-bold">{t('title')}</h2>
      <p className="mt-1 text-sm leading-relaxed">{t('body')}</p>
      <p className="mt-1 text-sm leading-relaxed">{t('governs')}</p>
    </section>
  );
}
