'use client';

import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { useTranslations } from 'next-intl';
import { passwordSignInSchema, type PasswordSignInInput } from '@/lib/schemas/auth';
import { signInWithPassword } from '@/lib/actions/sign-in';
import { applyServerErrors, FieldError, FormMessage, inputClass, primaryButtonClass } from './form-kit';

export function PasswordSignInForm({ returnTo }: { returnTo?: string }) {
  const t = useTranslations('auth');
  const [banner, setBanner] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<PasswordSignInInput>({
    resolver: zodResolver(passwordSignInSchema),
    defaultValues: { email: '', password: '', returnTo },
  });
  const { errors, isSubmitting } = formState;
  const onSubmit = handleSubmit(async (values) => {
    setBanner(null);
    const result = await signInWithPassword(values);
    setBanner(applyServerErrors(result, setError));
  });
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" aria-label={t('passwordHeading')}>
      <FormMessage tone="error">{banner}</FormMessage>
      <div>
        <label htmlFor="pw-email" className="font-bold">{t('email')}</label>
        <input id="pw-email" type="email" autoComplete="username" className={inputClass} aria-invalid={!!errors.email} aria-describedby="pw-email-error" {...register('email')} />
        <FieldError id="pw-email-error" message={errors.email?.message} />
      </div>
      <div>
        <label htmlFor="pw-password" className="font-bold">{t('password')}</label>
        <input id="pw-password" type="password" autoComplete="current-password" className={inputClass} aria-invalid={!!errors.password} aria-describedby="pw-password-error" {...register('password')} />
        <FieldError id="pw-password-error" message={errors.password?.message} />
      </div>
      <button type="submit" className={primaryButtonClass} disabled={isSubmitting}>
        {isSubmitting ? t('signingIn') : t('signInButton')}
      </button>
    </form>
  );
}
