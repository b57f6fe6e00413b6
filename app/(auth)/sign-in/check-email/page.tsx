import type { Metadata } from 'next';
import Link from 'next/link';
import { getTranslations } from 'next-intl/server';
import { env } from '@/lib/server/env';

export const metadata: Metadata = { title: 'Check your e-mail' };

export default async function CheckEmailPage() {
  const t = await getTranslations('auth');
  return (
    <main id="main" className="mx-auto max-w-2xl px-6 py-10">
      <h1 className="text-2xl font-bold text-frost-strong">{t('checkEmailTitle')}</h1>
      <p className="mt-3 leading-relaxed">{t('checkEmailBody')}</p>
      {env.DEV_INBOX ? (
        <p className="mt-3 text-sm">
          {t('checkEmailDevInbox')}{' '}
          <Link href="/dev/inbox" className="font-bold text-frost underline">{t('openDevInbox')}</Link>
        </p>
      ) : null}
      <Link href="/sign-in" className="mt-6 inline-block text-frost underline">{t('backToSignIn')}</Link>
    </main>
  );
}
