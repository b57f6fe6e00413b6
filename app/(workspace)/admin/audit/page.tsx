import type { Metadata } from 'next';
import { getTranslations } from 'next-intl/server';
import { listAuditEvents } from '@/lib/data/audit';
import { requireActor, ROLES } from '@/lib/data/session';

export const metadata: Metadata = { title: 'Audit log' };

function detailText(detail: Record<string, unknown> | null): string {
  if (!detail) return '';
  return Object.entries(detail)
    .map(([k, v]) => `${k}: ${typeof v === 'string' ? v : JSON.stringify(v)}`)
    .join(', ');
}

export default async function AuditPage() {
  const actor = await requireActor(ROLES.admin);
  const events = await listAuditEvents({ limit: 200 });
  const t = await getTranslations('admin');
  return (
    <main id="main" className="mx-auto max-w-6xl px-6 py-8">
      <h1 className="text-2xl font-bold text-frost-strong">{t('auditTitle')}</h1>
      <p className="mt-1 text-ink-soft">{t('auditIntro', { organisation: actor.organisationName })}</p>
      {events.length === 0 ? (
        <p className="mt-4 text-sm text-ink-muted">{t('noEvents')}</p>
      ) : (
        <div className="mt-4 overflow-x-auto">
          <table className="w-full border-collapse text-left text-sm">
            <thead>
              <tr className="border-b border-snow-300">
                <th scope="col" className="py-2 pr-4">{t('when')}</th>
                <th scope="col" className="py-2 pr-4">{t('event')}</th>
                <th scope="col" className="py-2 pr-4">{t('actor')}</th>
                <th scope="col" className="py-2 pr-4">{t('subject')}</th>
                <th scope="col" className="py-2 pr-4">{t('detail')}</th>
                <th scope="col" className="py-2">{t('ip')}</th>
              </tr>
            </thead>
            <tbody>
              {events.map((e) => (
                <tr key={e.id} className="border-b border-snow-200">
                  <td className="whitespace-nowrap py-1.5 pr-4 tabular">{e.createdAt.slice(0, 19).replace('T', ' ')}</td>
                  <td className="py-1.5 pr-4 font-mono text-xs">{e.event}</td>
                  <td className="py-1.5 pr-4">{e.actorEmail ?? '—'}</td>
                  <td className="py-1.5 pr-4">{e.subject ?? '—'}</td>
                  <td className="py-1.5 pr-4">{detailText(e.detail)}</td>
                  <td className="py-1.5 tabular">{e.ip ?? '—'}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </main>
  );
}
