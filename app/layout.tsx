import type { Metadata } from 'next';
import { NextIntlClientProvider } from 'next-intl';
import { getLocale, getTranslations } from 'next-intl/server';
import type { ReactNode } from 'react';
import { notoSans, notoSyllabics } from './fonts';
import { reviewedLocales, type Locale } from '@/lib/i18n/config';
import './globals.css';

export async function generateMetadata(): Promise<Metadata> {
  const t = await getTranslations('common');
  return { title: { default: 'Thawline', template: '%s · Thawline' }, description: t('tagline') };
}

export default async function RootLayout({ children }: { children: ReactNode }) {
  const locale = await getLocale();
  const t = await getTranslations('common');
  return (
    <html lang={locale} className={`${notoSans.variable} ${notoSyllabics.variable}`}>
      <body className="min-h-screen font-sans">
        <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:bg-ice-raised focus:p-2">
          {t('skipToContent')}
        </a>
        {/* Interface languages other than English ship as drafts until a translator approves them. */}
        {!reviewedLocales.includes(locale as Locale) && (
          <p role="note" className="border-b border-snow-200 bg-snow-100 px-4 py-1 text-center text-xs text-ink-soft">
            {t('draftLanguage')}
          </p>
        )}
        <NextIntlClientProvider>{children}</NextIntlClientProvider>
      </body>
    </html>
  );
}
