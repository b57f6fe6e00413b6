import Link from 'next/link';
import { getTranslations } from 'next-intl/server';
import { getSignedInUser, getActor } from '@/lib/data/session';

/** Shown with HTTP 403 when lib/data/session.ts calls forbidden(). */
export default async function Forbidden() {
  const t = await getTranslations('auth');
  const te = await getTranslations('errors');
  const [user, actor] = await Promise.all([getSignedInUser(), getActor()]);
  return (
    <main id="main" className="mx-auto max-w-2xl px-6 py-16">
      <h1 className="text-2xl font-bold">{t('forbiddenTitle')}</h1>
      <p className="mt-2">{user && !actor ? t('noMembershipBody') : t('forbiddenBody')}</p>
      <Link href={actor ? '/workspace' : '/'} className="mt-6 inline-block text-frost underline">{te('home')}</Link>
    </main>
  );
}
