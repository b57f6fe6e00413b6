import { getRequestConfig } from 'next-intl/server';
import { cookies, headers } from 'next/headers';
import { defaultLocale, isLocale, LOCALE_COOKIE, type Locale } from './config';

// The interface language comes from the person's choice (a cookie), else the browser's preference.
export default getRequestConfig(async () => {
  const chosen = (await cookies()).get(LOCALE_COOKIE)?.value;
  let locale: Locale = defaultLocale;
  if (isLocale(chosen)) locale = chosen;
  else {
    const accept = (await headers()).get('accept-language') ?? '';
    const preferred = accept.split(',').map((p) => p.split(';')[0]?.trim().slice(0, 2).toLowerCase());
    const hit = preferred.find((p) => isLocale(p === 'no' || p === 'nn' ? 'nb' : p));
    if (hit) locale = (hit === 'no' || hit === 'nn' ? 'nb' : hit) as Locale;
  }
  const messages = (await import(`../../messages/${locale}.json`)).default;
  return { locale, messages };
});
