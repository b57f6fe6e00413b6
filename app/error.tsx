'use client';

import { useTranslations } from 'next-intl';

export default function ErrorPage({ reset }: { error: Error & { digest?: string }; reset: () => void }) {
  const t = useTranslations('errors');
  return (
    <main id="main" className="mx-auto max-w-2xl px-6 py-16">
      <h1 className="text-2xl font-bold">{t('errorTitle')}</h1>
      <p className="mt-2">{t('errorBody')}</p>
      <button type="button" onClick={reset} className="mt-6 rounded bg-frost px-4 py-2 font-bold text-white hover:bg-frost-strong">
        {t('retry')}
      </button>
    </main>
  );
}
