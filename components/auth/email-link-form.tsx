'use client';

import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { useTranslations } from 'next-intl';
import { emailSignInSchema, type EmailSignInInput } from '@/lib/schemas/auth';
import { requestEmailLink } from '@/lib/actions/sign-in';
import { applyServerErrors, FieldError, FormMessage, inputClass, primaryButtonClass } from './form-kit';

export function EmailLinkForm({ returnTo }: { returnTo?: string }) {
  const t = useTranslations('auth');
  const [banner, setBanner] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<EmailSignInInput>({
    resolver: zodResolver(emailSignInSchema),
    defaultValues: { email: '', returnTo },
  });
  const { errors, isSubmitting } = formState;
  const onSubmit = handleSubmit(async (values) => {
    setBanner(null);
    const result = await requestEmailLink(values);
    setBanner(applyServerErrors(result, setError));
  });
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" aria-label={t('linkHeading')}>
      <FormMessage tone="error">{banner}</FormMessage>
      <div>
        <label htmlFor="link-email" className="font-bold">{t('email')}</label>
        <input id="link-email" type="email" autoComplete="email" className={inputClass} aria-invalid={!!errors.email} aria-describedby="link-email-error" {...register('email')} />
        <FieldError id="link-email-error" message={errors.email?.message} />
      </div>
      <button type="submit" className={primaryButtonClass} disabled={isSubmitting}>
        {isSubmitting ? t('sending') : t('sendLinkButton')}
      </button>
    </form>
  );
}
