import type { Metadata } from 'next';
import Link from 'next/link';
import { getTranslations } from 'next-intl/server';
import { EmailLinkForm } from '@/components/auth/email-link-form';
import { FormMessage } from '@/components/auth/form-kit';
import { PasswordSignInForm } from '@/components/auth/password-sign-in-form';
import { safeReturnPath } from '@/lib/schemas/auth';
import { getSignedInUser } from '@/lib/data/session';

export const metadata: Metadata = { title: 'Sign in' };

const KNOWN_ERRORS = ['Verification', 'AccessDenied', 'CredentialsSignin', 'MissingCSRF'] as const;

export default async function SignInPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const params = await searchParams;
  const one = (k: string) => (typeof params[k] === 'string' ? (params[k] as string) : undefined);
  const t = await getTranslations('auth');
  const user = await getSignedInUser();
  // Auth.js sends people back here with ?error=<type> (pages.error); the callbackUrl it adds is ours too.
  const returnTo = safeReturnPath(one('returnTo') ?? one('callbackUrl'));
  const error = one('error');
  const errorKey = error ? ((KNOWN_ERRORS as readonly string[]).includes(error) ? error : 'default') : null;
  return (
    <main id="main" className="mx-auto max-w-3xl px-6 py-10">
      <h1 className="text-2xl font-bold text-frost-strong">{t('signInTitle')}</h1>
      <p className="mt-1 text-ink-soft">{t('signInIntro')}</p>
      <div className="mt-4 space-y-2">
        {errorKey ? <FormMessage tone="error">{t(`errors.${errorKey}`)}</FormMessage> : null}
        {one('signedOut') ? <FormMessage tone="ok">{t('signedOut')}</FormMessage> : null}
        {user ? (
          <p className="rounded bg-frost-pale px-3 py-2 text-sm">
            {t('alreadySignedIn', { email: user.email })}{' '}
            <Link href="/workspace" className="font-bold text-frost underline">{t('toWorkspace')}</Link>
          </p>
        ) : null}
      </div>
      <div className="mt-6 grid gap-8 md:grid-cols-2">
        <section aria-labelledby="pw-heading" className="rounded border border-snow-200 bg-ice-raised p-5">
          <h2 id="pw-heading" className="text-lg font-bold">{t('passwordHeading')}</h2>
          <div className="mt-3">
            <PasswordSignInForm returnTo={returnTo} />
          </div>
        </section>
        <section aria-labelledby="link-heading" className="rounded border border-snow-200 bg-ice-raised p-5">
          <h2 id="link-heading" className="text-lg font-bold">{t('linkHeading')}</h2>
          <p className="mt-1 text-sm text-ink-soft">{t('linkIntro')}</p>
          <div className="mt-3">
            <EmailLinkForm returnTo={returnTo} />
          </div>
        </section>
      </div>
      <p className="mt-6 text-sm text-ink-muted">{t('demoHint')}</p>
    </main>
  );
}
