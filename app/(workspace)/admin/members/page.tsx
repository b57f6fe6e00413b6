import type { Metadata } from 'next';
import { getFormatter, getTranslations } from 'next-intl/server';
import { InviteForm } from '@/components/admin/invite-form';
import { MemberControls, RevokeInvitationButton } from '@/components/admin/member-controls';
import { listPendingInvitations } from '@/lib/data/invitations';
import { listMembers } from '@/lib/data/members';
import { requireActor, ROLES } from '@/lib/data/session';

export const metadata: Metadata = { title: 'Members' };

export default async function MembersPage() {
  const actor = await requireActor(ROLES.admin);
  const [members, pending] = await Promise.all([listMembers(), listPendingInvitations()]);
  const t = await getTranslations('admin');
  const tw = await getTranslations('workspace');
  const format = await getFormatter();
  const date = (iso: string) => format.dateTime(new Date(iso), { dateStyle: 'medium', timeZone: 'UTC' });
  return (
    <main id="main" className="mx-auto max-w-6xl px-6 py-8">
      <h1 className="text-2xl font-bold text-frost-strong">{t('membersTitle')}</h1>
      <p className="mt-1 text-ink-soft">{t('membersIntro', { organisation: actor.organisationName })}</p>
      <table className="mt-4 w-full border-collapse text-left text-sm">
        <thead>
          <tr className="border-b border-snow-300">
            <th scope="col" className="py-2 pr-4">{t('email')}</th>
            <th scope="col" className="py-2 pr-4">{t('name')}</th>
            <th scope="col" className="py-2 pr-4">{t('role')}</th>
            <th scope="col" className="py-2 pr-4">{t('joined')}</th>
            <th scope="col" className="py-2">{t('actions')}</th>
          </tr>
        </thead>
        <tbody>
          {members.map((m) => (
            <tr key={m.membershipId} className="border-b border-snow-200 align-top" data-membership-id={m.membershipId}>
              <td className="py-2 pr-4">
                {m.email}
                {m.isSelf ? <span className="ml-2 text-ink-muted">({t('you')})</span> : null}
              </td>
              <td className="py-2 pr-4">{m.name ?? '—'}</td>
              <td className="py-2 pr-4">{tw(`roles.${m.role}`)}</td>
              <td className="py-2 pr-4">{date(m.joinedAt)}</td>
              <td className="py-2">
                <MemberControls membershipId={m.membershipId} role={m.role} email={m.email} />
              </td>
            </tr>
          ))}
        </tbody>
      </table>

      <section aria-labelledby="invite-heading" className="mt-10 max-w-3xl rounded border border-snow-200 bg-ice-raised p-5">
        <h2 id="invite-heading" className="text-lg font-bold">{t('inviteHeading')}</h2>
        <p className="mt-1 text-sm text-ink-soft">{t('inviteIntro')}</p>
        <div className="mt-3">
          <InviteForm />
        </div>
      </section>

      <section aria-labelledby="pending-heading" className="mt-10">
        <h2 id="pending-heading" className="text-lg font-bold">{t('pendingHeading')}</h2>
        {pending.length === 0 ? (
          <p className="mt-2 text-sm text-ink-muted">{t('noPending')}</p>
        ) : (
          <table className="mt-2 w-full border-collapse text-left text-sm">
            <thead>
              <tr className="border-b border-snow-300">
                <th scope="col" className="py-2 pr-4">{t('email')}</th>
                <th scope="col" className="py-2 pr-4">{t('role')}</th>
                <th scope="col" className="py-2 pr-4">{t('expires')}</th>
                <th scope="col" className="py-2 pr-4">{t('invitedBy')}</th>
                <th scope="col" className="py-2">{t('actions')}</th>
              </tr>
            </thead>
            <tbody>
              {pending.map((p) => (
                <tr key={p.invitationId} className="border-b border-snow-200">
                  <td className="py-2 pr-4">{p.email}</td>
                  <td className="py-2 pr-4">{tw(`roles.${p.role}`)}</td>
                  <td className="py-2 pr-4">{date(p.expiresAt)}</td>
                  <td className="py-2 pr-4">{p.invitedBy ?? '—'}</td>
                  <td className="py-2"><RevokeInvitationButton invitationId={p.invitationId} /></td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </section>
    </main>
  );
}
