/** Interface languages that ship with the application. English is the source language. */
export const locales = ['en', 'fr', 'ru', 'nb'] as const;
export type Locale = (typeof locales)[number];
export const defaultLocale: Locale = 'en';
export const localeNames: Record<Locale, string> = { en: 'English', fr: 'Français', ru: 'Русский', nb: 'Norsk bokmål' };
/** Languages other than English are drafts until a translator approves them in the application. */
export const reviewedLocales: readonly Locale[] = ['en'];
export const LOCALE_COOKIE = 'thawline_locale';

export function isLocale(value: string | undefined): value is Locale {
  return !!value && (locales as readonly string[]).includes(value);
}
