import type { Metadata } from 'next';
import Link from 'next/link';
import { getTranslations } from 'next-intl/server';
import { hasRole, requireActor, ROLES } from '@/lib/data/session';

export const metadata: Metadata = { title: 'Workspace' };

/** The start page after sign-in: who you are here, and where to go. */
export default async function WorkspacePage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const actor = await requireActor();
  const welcome = (await searchParams).welcome === '1';
  const t = await getTranslations('workspace');
  const role = t(`roles.${actor.role}`);
  return (
    <main id="main" className="mx-auto max-w-6xl px-6 py-8">
      {welcome ? (
        <p role="status" className="mb-4 rounded bg-lichen-pale px-3 py-2 text-lichen">{t('welcomeNew', { organisation: actor.organisationName })}</p>
      ) : null}
      <h1 className="text-2xl font-bold text-frost-strong">{t('welcome', { name: actor.name ?? actor.email })}</h1>
      <p className="mt-1 text-ink-soft">{t('intro', { organisation: actor.organisationName, role })}</p>
      <section aria-labelledby="can-do" className="mt-6 max-w-prose">
        <h2 id="can-do" className="text-lg font-bold">{t('whatYouCanDo')}</h2>
        <p className="mt-1">{t(`roleHelp.${actor.role}`)}</p>
        <ul className="mt-3 list-disc space-y-1 pl-6">
          <li>
            <Link href="/communities" className="text-frost underline">{t('communities')}</Link>
          </li>
          {hasRole(actor, ROLES.admin) ? (
            <>
              <li>
                <Link href="/admin/members" className="text-frost underline">{t('members')}</Link>
              </li>
              <li>
                <Link href="/admin/audit" className="text-frost underline">{t('audit')}</Link>
              </li>
            </>
          ) : null}
        </ul>
      </section>
    </main>
  );
}
