import 'server-only';
import { cookies } from 'next/headers';
import { eq } from 'drizzle-orm';
import { db } from '@/db/client';
import { organisations } from '@/db/schema';
import { env } from '@/lib/env';
import { ACTIVE_ORGANISATION_COOKIE, getActor, requireActor, type MembershipSummary } from './session';

export interface OrganisationDto {
  id: string;
  name: string;
  kind: 'community_government' | 'regional_office';
  countryCode: string;
  isDemo: boolean;
}

/** The active organisation of the signed-in person (any role). */
export async function getActiveOrganisation(): Promise<OrganisationDto> {
  const actor = await requireActor();
  const [org] = await db
    .select({ id: organisations.id, name: organisations.name, kind: organisations.kind, countryCode: organisations.countryCode, isDemo: organisations.isDemo })
    .from(organisations)
    .where(eq(organisations.id, actor.organisationId))
    .limit(1);
  // The membership join in getActor just found it; a concurrent delete is the only way to get here.
  if (!org) throw new Error('active organisation vanished');
  return org;
}

/** The organisations the signed-in person belongs to now. */
export async function listMyOrganisations(): Promise<MembershipSummary[]> {
  return (await requireActor()).memberships;
}

/**
 * Makes one of the person's own organisations the active one (a cookie, checked on every request
 * against the memberships). Another organisation's id answers 404 as if it did not exist.
 */
export async function switchOrganisation(organisationId: string): Promise<{ found: boolean }> {
  const actor = await getActor();
  if (!actor) await requireActor();
  const target = actor!.memberships.find((m) => m.organisationId === organisationId);
  if (!target) return { found: false };
  (await cookies()).set(ACTIVE_ORGANISATION_COOKIE, organisationId, {
    httpOnly: true,
    sameSite: 'lax',
    secure: env.APP_URL.startsWith('https:'),
    path: '/',
    maxAge: 365 * 24 * 60 * 60,
  });
  return { found: true };
}
