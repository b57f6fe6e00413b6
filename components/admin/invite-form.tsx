'use client';

import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { useTranslations } from 'next-intl';
import { inviteMemberSchema, roleValues, type InviteMemberInput } from '@/lib/schemas/admin';
import { inviteMember } from '@/lib/actions/members';
import { applyServerErrors, FieldError, FormMessage, inputClass, primaryButtonClass } from '@/components/auth/form-kit';

export function InviteForm() {
  const t = useTranslations('admin');
  const tw = useTranslations('workspace');
  const [banner, setBanner] = useState<{ tone: 'ok' | 'error'; text: string } | null>(null);
  const { register, handleSubmit, setError, reset, formState } = useForm<InviteMemberInput>({
    resolver: zodResolver(inviteMemberSchema),
    defaultValues: { email: '', role: 'planner' },
  });
  const { errors, isSubmitting } = formState;
  const onSubmit = handleSubmit(async (values) => {
    setBanner(null);
    const result = await inviteMember(values);
    if (result?.ok) {
      reset({ email: '', role: values.role });
      setBanner({ tone: 'ok', text: result.message ?? '' });
      return;
    }
    const message = applyServerErrors(result, setError);
    if (message) setBanner({ tone: 'error', text: message });
  });
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-3" aria-label={t('inviteHeading')}>
      {banner ? <FormMessage tone={banner.tone}>{banner.text}</FormMessage> : null}
      <div className="flex flex-wrap items-start gap-4">
        <div className="min-w-64 flex-1">
          <label htmlFor="invite-email" className="font-bold">{t('email')}</label>
          <input id="invite-email" type="email" className={inputClass} aria-invalid={!!errors.email} aria-describedby="invite-email-error" {...register('email')} />
          <FieldError id="invite-email-error" message={errors.email?.message} />
        </div>
        <div>
          <label htmlFor="invite-role" className="font-bold">{t('role')}</label>
          <select id="invite-role" className={inputClass} aria-invalid={!!errors.role} aria-describedby="invite-role-error" {...register('role')}>
            {roleValues.map((r) => (
              <option key={r} value={r}>{tw(`roles.${r}`)}</option>
            ))}
          </select>
          <FieldError id="invite-role-error" message={errors.role?.message} />
        </div>
      </div>
      <button type="submit" className={primaryButtonClass} disabled={isSubmitting}>{t('inviteButton')}</button>
    </form>
  );
}
