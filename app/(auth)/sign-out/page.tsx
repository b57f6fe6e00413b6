import type { Metadata } from 'next';
import { getTranslations } from 'next-intl/server';
import { SignOutButton } from '@/components/auth/sign-out-button';

export const metadata: Metadata = { title: 'Sign out' };

export default async function SignOutPage() {
  const t = await getTranslations('auth');
  return (
    <main id="main" className="mx-auto max-w-2xl px-6 py-10">
      <h1 className="text-2xl font-bold text-frost-strong">{t('signOutTitle')}</h1>
      <p className="mt-3">{t('signOutBody')}</p>
      <div className="mt-4">
        <SignOutButton className="rounded bg-frost px-4 py-2 font-bold text-white hover:bg-frost-strong" />
      </div>
    </main>
  );
}
