'use client';

import { useState, useTransition } from 'react';
import { useRouter } from 'next/navigation';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { useTranslations } from 'next-intl';
import { changeRoleSchema, roleValues, type ChangeRoleInput } from '@/lib/schemas/admin';
import { changeRole, removeMemberAction, revokeInvitationAction } from '@/lib/actions/members';
import { applyServerErrors, FieldError, quietButtonClass } from '@/components/auth/form-kit';

/** Role select and remove button for one member row. */
export function MemberControls({ membershipId, role, email }: { membershipId: string; role: ChangeRoleInput['role']; email: string }) {
  const t = useTranslations('admin');
  const tw = useTranslations('workspace');
  const router = useRouter();
  const [message, setMessage] = useState<string | null>(null);
  const [removing, startRemove] = useTransition();
  const { register, handleSubmit, setError, formState } = useForm<ChangeRoleInput>({
    resolver: zodResolver(changeRoleSchema),
    defaultValues: { membershipId, role },
  });
  const onSubmit = handleSubmit(async (values) => {
    setMessage(null);
    const result = await changeRole(values);
    const error = applyServerErrors(result, setError);
    if (error && !result?.ok && !result?.fieldErrors.role) setMessage(error);
    if (result?.ok) router.refresh();
  });
  const selectId = `role-${membershipId}`;
  return (
    <div className="flex flex-wrap items-start gap-2">
      <form onSubmit={onSubmit} noValidate className="flex items-start gap-2">
        <input type="hidden" {...register('membershipId')} />
        <label htmlFor={selectId} className="sr-only">{t('changeRole')} ({email})</label>
        <div>
          <select id={selectId} className="rounded border border-snow-300 bg-ice-raised px-2 py-1 text-sm" aria-invalid={!!formState.errors.role} aria-describedby={`${selectId}-error`} {...register('role')}>
            {roleValues.map((r) => (
              <option key={r} value={r}>{tw(`roles.${r}`)}</option>
            ))}
          </select>
          <FieldError id={`${selectId}-error`} message={formState.errors.role?.message} />
        </div>
        <button type="submit" className={quietButtonClass} disabled={formState.isSubmitting}>{t('save')}</button>
      </form>
      <button
        type="button"
        className={`${quietButtonClass} text-rust`}
        disabled={removing}
        onClick={() => {
          if (!window.confirm(t('confirmRemove', { email }))) return;
          startRemove(async () => {
            const result = await removeMemberAction({ membershipId });
            if (result && !result.ok) setMessage(result.message);
            else router.refresh();
          });
        }}
      >
        {t('remove')}
      </button>
      {message ? <p role="alert" className="w-full text-sm text-rust">{message}</p> : null}
    </div>
  );
}

export function RevokeInvitationButton({ invitationId }: { invitationId: string }) {
  const t = useTranslations('admin');
  const router = useRouter();
  const [pending, start] = useTransition();
  return (
    <button
      type="button"
      className={quietButtonClass}
      disabled={pending}
      onClick={() =>
        start(async () => {
          await revokeInvitationAction({ invitationId });
          router.refresh();
        })
      }
    >
      {t('revoke')}
    </button>
  );
}
