'use client';

import { useState, useTransition } from 'react';
import { useTranslations } from 'next-intl';
import { acceptInvitation } from '@/lib/actions/invitations';
import { FormMessage, primaryButtonClass } from './form-kit';

export function AcceptInvitationForm({ token }: { token: string }) {
  const t = useTranslations('auth');
  const [banner, setBanner] = useState<string | null>(null);
  const [pending, startTransition] = useTransition();
  return (
    <div className="space-y-4">
      <FormMessage tone="error">{banner}</FormMessage>
      <button
        type="button"
        className={primaryButtonClass}
        disabled={pending}
        onClick={() =>
          startTransition(async () => {
            const result = await acceptInvitation({ token });
            if (result && !result.ok) setBanner(result.message);
          })
        }
      >
        {pending ? t('inviteAccepting') : t('inviteAccept')}
      </button>
    </div>
  );
}
