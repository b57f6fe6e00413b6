'use server';

import { cookies } from 'next/headers';
import { notFound } from 'next/navigation';
import { revalidatePath } from 'next/cache';
import { z } from 'zod';
import { validatedAction, type ActionResult } from '@/lib/server/validated-action';
import { switchOrganisationSchema } from '@/lib/schemas/admin';
import { switchOrganisation } from '@/lib/data/organisations';
import { preferenceCookieOptions } from '@/lib/server/env';
import { locales, LOCALE_COOKIE } from '@/lib/i18n/config';

/** Makes another of the person's organisations active. Not one of theirs → 404. */
export const switchOrganisationAction = validatedAction(switchOrganisationSchema, async ({ organisationId }): Promise<ActionResult> => {
  const { found } = await switchOrganisation(organisationId);
  if (!found) notFound();
  revalidatePath('/', 'layout');
  return { ok: true };
});

/** Chooses the interface language (a cookie). Anyone may call it; it changes nothing but the language. */
export const setLocaleAction = validatedAction(z.object({ locale: z.enum(locales, { error: 'Choose one of the listed languages.' }) }), async ({ locale }): Promise<ActionResult> => {
  (await cookies()).set(LOCALE_COOKIE, locale, preferenceCookieOptions);
  revalidatePath('/', 'layout');
  return { ok: true };
});
