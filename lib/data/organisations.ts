import 'server-only';
import { cookies } from 'next/headers';
import { preferenceCookieOptions } from '@/lib/server/env';
import { ACTIVE_ORGANISATION_COOKIE, requireActor } from './session';

/**
 * Makes one of the person's own organisations the active one (a cookie, checked on every request
 * against the memberships). Another organisation's id answers 404 as if it did not exist.
 */
export async function switchOrganisation(organisationId: string): Promise<{ found: boolean }> {
  const actor = await requireActor();
  const target = actor.memberships.find((m) => m.organisationId === organisationId);
  if (!target) return { found: false };
  (await cookies()).set(ACTIVE_ORGANISATION_COOKIE, organisationId, preferenceCookieOptions);
  return { found: true };
}
