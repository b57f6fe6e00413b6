'use client';

import { useTransition } from 'react';
import { useRouter } from 'next/navigation';
import { useLocale, useTranslations } from 'next-intl';
import { setLocaleAction } from '@/lib/actions/preferences';
import { localeNames, locales, type Locale } from '@/lib/i18n/config';

export function LanguageSwitcher() {
  const t = useTranslations('workspace');
  const locale = useLocale();
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  return (
    <span>
      <label htmlFor="lang-switch" className="sr-only">{t('language')}</label>
      <select
        id="lang-switch"
        className="rounded border border-snow-300 bg-ice-raised px-2 py-1 text-sm"
        value={locale}
        disabled={pending}
        onChange={(e) => {
          const next = e.target.value as Locale;
          startTransition(async () => {
            await setLocaleAction({ locale: next });
            router.refresh();
          });
        }}
      >
        {locales.map((l) => (
          <option key={l} value={l} lang={l}>
            {localeNames[l]}
          </option>
        ))}
      </select>
    </span>
  );
}
