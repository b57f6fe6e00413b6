import Link from 'next/link';
import { getTranslations } from 'next-intl/server';
import { LanguageSwitcher } from '@/components/auth/language-switcher';
import { getSignedInUser } from '@/lib/data/session';
import { Caution } from '@/components/community/caution';
import { DemoNotice } from '@/components/community/demo-badge';

export default async function HomePage() {
  const t = await getTranslations();
  const user = await getSignedInUser();
  return (
    <>
    <header className="border-b border-snow-200 bg-ice-raised">
      <div className="mx-auto flex max-w-4xl items-center gap-4 px-6 py-3">
        <span className="text-lg font-bold text-frost-strong">{t('common.appName')}</span>
        <div className="ml-auto flex items-center gap-3 text-sm">
          <LanguageSwitcher />
          <Link href={user ? '/workspace' : '/sign-in'} className="rounded bg-frost px-3 py-1.5 font-bold text-white hover:bg-frost-strong">
            {user ? t('home.toWorkspace') : t('common.signIn')}
          </Link>
        </div>
      </div>
    </header>
    <main id="main" className="mx-auto max-w-4xl px-6 py-10">
      <div className="mb-6">
        <DemoNotice />
      </div>
      <h1 className="text-3xl font-bold text-frost-strong">{t('common.appName')}</h1>
      <p className="mt-1 text-ink-soft">{t('common.tagline')}</p>
      <h2 className="mt-8 text-xl font-bold">{t('home.title')}</h2>
      <p className="mt-2 max-w-prose leading-relaxed">{t('home.intro')}</p>
      <div className="mt-8">
        <Caution />
      </div>
    </main>
    </>
  );
}
