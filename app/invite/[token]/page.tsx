import type { Metadata } from 'next';
import Link from 'next/link';
import { getTranslations } from 'next-intl/server';
import { AcceptInvitationForm } from '@/components/auth/accept-invitation-form';
import { invitationTokenSchema } from '@/lib/schemas/auth';
import { previewInvitation, type InvitationStatus } from '@/lib/data/invitations';

export const metadata: Metadata = { title: 'Invitation', referrer: 'no-referrer' };

const statusKey: Record<Exclude<InvitationStatus, 'valid'>, string> = {
  invalid: 'inviteInvalid',
  expired: 'inviteExpired',
  used: 'inviteUsed',
  revoked: 'inviteRevoked',
};

/** Public: the token in the path is the proof. A forged, expired, used or withdrawn link says so plainly. */
export default async function InvitationPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const t = await getTranslations('auth');
  const tw = await getTranslations('workspace');
  const parsed = invitationTokenSchema.safeParse(token);
  const preview = parsed.success ? await previewInvitation(parsed.data) : { status: 'invalid' as const };
  return (
    <main id="main" className="mx-auto max-w-2xl px-6 py-10">
      <h1 className="text-2xl font-bold text-frost-strong">{t('inviteTitle')}</h1>
      {preview.status === 'valid' ? (
        <>
          <p className="mt-3">
            {t('inviteValid', { organisation: preview.organisationName ?? '', role: tw(`roles.${preview.role ?? 'council'}`), email: preview.email ?? '' })}
          </p>
          <div className="mt-4">
            <AcceptInvitationForm token={token} />
          </div>
        </>
      ) : (
        <>
          <p role="alert" className="mt-3 rounded bg-rust-pale px-3 py-2 text-rust">{t(statusKey[preview.status])}</p>
          <Link href="/sign-in" className="mt-6 inline-block text-frost underline">{t('backToSignIn')}</Link>
        </>
      )}
    </main>
  );
}
