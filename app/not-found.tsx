import Link from 'next/link';
import { getTranslations } from 'next-intl/server';

export default async function NotFound() {
  const t = await getTranslations('errors');
  return (
    <main id="main" className="mx-auto max-w-2xl px-6 py-16">
      <h1 className="text-2xl font-bold">{t('notFoundTitle')}</h1>
      <p className="mt-2">{t('notFoundBody')}</p>
      <Link href="/" className="mt-6 inline-block text-frost underline">{t('home')}</Link>
    </main>
  );
}
