import Link from 'next/link';
import type { ReactNode } from 'react';
import { getTranslations } from 'next-intl/server';
import { LanguageSwitcher } from '@/components/auth/language-switcher';
import { OrganisationSwitcher } from '@/components/auth/organisation-switcher';
import { SignOutButton } from '@/components/auth/sign-out-button';
import { QueryProvider } from '@/components/providers/query-provider';
import { hasRole, requireActor, ROLES } from '@/lib/data/session';

/**
 * The signed-in shell. requireActor() here sends anonymous visitors to sign-in; every page below still
 * asks the data layer itself (a layout is not re-run on every client navigation).
 */
export default async function WorkspaceLayout({ children }: { children: ReactNode }) {
  const actor = await requireActor();
  const t = await getTranslations('workspace');
  return (
    <div className="min-h-screen">
      <header className="border-b border-snow-200 bg-ice-raised">
        <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-6 gap-y-2 px-6 py-3">
          <Link href="/workspace" className="text-lg font-bold text-frost-strong">Thawline</Link>
          <nav aria-label={t('nav')} className="flex items-center gap-4 text-sm">
            <Link href="/workspace" className="hover:underline">{t('title')}</Link>
            <Link href="/communities" className="hover:underline">{t('communities')}</Link>
            {hasRole(actor, ROLES.admin) ? (
              <>
                <Link href="/admin/members" className="hover:underline">{t('members')}</Link>
                <Link href="/admin/audit" className="hover:underline">{t('audit')}</Link>
              </>
            ) : null}
          </nav>
          <div className="ml-auto flex flex-wrap items-center gap-3 text-sm">
            <OrganisationSwitcher options={actor.memberships} activeId={actor.organisationId} />
            <span className="rounded bg-frost-pale px-2 py-0.5" title={t('role')}>
              <span className="sr-only">{t('role')}: </span>
              {t(`roles.${actor.role}`)}
            </span>
            <span className="text-ink-muted">{actor.email}</span>
            <LanguageSwitcher />
            <SignOutButton />
          </div>
        </div>
      </header>
      <QueryProvider>{children}</QueryProvider>
    </div>
  );
}
