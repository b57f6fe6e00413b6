import 'server-only';
import { cache } from 'react';
import { cookies, headers } from 'next/headers';
import { forbidden, notFound, redirect } from 'next/navigation';
import { and, asc, eq, gt } from 'drizzle-orm';
import { db } from '@/db/client';
import { memberships, organisations, roles, sessions, users, type Role } from '@/db/schema';
import { auth } from '@/lib/auth/auth';
import { safeReturnPath } from '@/lib/schemas/auth';
import { hasRole, ROLES } from '@/lib/schemas/roles';
import { ApiError } from '@/lib/server/api-error';

/**
 * THE authorization core. Every data module asks here who is acting, in which organisation and with
 * which role, and it answers from the database as it is at this moment: the session token only says
 * which user signed in, never their role, so a removed member or an old role does not outlive the next
 * request.
 *
 * Rules every caller follows:
 *  - not signed in                              → pages/actions: redirect to /sign-in?returnTo=…; route handlers: 401
 *  - signed in, no membership left              → 403
 *  - signed in, role not allowed for the action → 403 (next/navigation `forbidden()`, authInterrupts)
 *  - a thing of another organisation            → 404, exactly as if it did not exist (notFoundUnlessOwn).
 *    This holds for another organisation the same person also belongs to: switch organisation first.
 */

export type { Role };
export { roles, hasRole, ROLES };

export interface MembershipSummary {
  organisationId: string;
  organisationName: string;
  role: Role;
}

export interface Actor {
  userId: string;
  email: string;
  name: string | null;
  /** The active organisation (chosen by the person, else their first by name). */
  organisationId: string;
  organisationName: string;
  /** The role in the active organisation. */
  role: Role;
  /** Every organisation the person belongs to now, by name. */
  memberships: MembershipSummary[];
}

/** Cookie holding the organisation the person chose; validated against their memberships on every read. */
export const ACTIVE_ORGANISATION_COOKIE = 'thawline_org';
/** Request header set by proxy.ts with the path and query, so a redirect to sign-in can come back. */
export const PATH_HEADER = 'x-thawline-path';

export interface SignedInUser {
  userId: string;
  email: string;
  name: string | null;
  locale: string;
}

/** The signed-in person as the users table has them now, or null (no session, or the user is gone). */
export const getSignedInUser = cache(async (): Promise<SignedInUser | null> => {
  let userId: string | undefined;
  let sid: string | undefined;
  try {
    const session = await auth();
    userId = session?.user?.id;
    sid = (session as { sid?: string } | null)?.sid;
  } catch {
    // A damaged or foreign cookie is "not signed in", not an error page.
    return null;
  }
  if (!userId || !sid) return null;
  // The session row must still exist (deleted on sign-out) and be unexpired.
  const [user] = await db
    .select({ userId: users.id, email: users.email, name: users.name, locale: users.locale })
    .from(sessions)
    .innerJoin(users, eq(users.id, sessions.userId))
    .where(and(eq(sessions.sessionToken, sid), eq(sessions.userId, userId), gt(sessions.expires, new Date())))
    .limit(1);
  return user ?? null;
});

/** The person's memberships as they are in the database now, ordered by organisation name. */
async function loadMemberships(userId: string): Promise<MembershipSummary[]> {
  return db
    .select({ organisationId: memberships.organisationId, organisationName: organisations.name, role: memberships.role })
    .from(memberships)
    .innerJoin(organisations, eq(organisations.id, memberships.organisationId))
    .where(eq(memberships.userId, userId))
    .orderBy(asc(organisations.name), asc(organisations.id));
}

/**
 * The signed-in user with their active membership, read from the database on this request; null when
 * nobody is signed in or the person belongs to no organisation any more. Cached per request.
 */
export const getActor = cache(async (): Promise<Actor | null> => {
  const user = await getSignedInUser();
  if (!user) return null;
  const list = await loadMemberships(user.userId);
  if (list.length === 0) return null;
  const chosen = (await cookies()).get(ACTIVE_ORGANISATION_COOKIE)?.value;
  const active = list.find((m) => m.organisationId === chosen) ?? list[0];
  return {
    userId: user.userId,
    email: user.email,
    name: user.name,
    organisationId: active.organisationId,
    organisationName: active.organisationName,
    role: active.role,
    memberships: list,
  };
});

/** The path of the current request (set by proxy.ts), for the sign-in return path. */
async function currentPath(): Promise<string> {
  return safeReturnPath((await headers()).get(PATH_HEADER));
}

export function signInPath(returnTo: string): string {
  return `/sign-in?returnTo=${encodeURIComponent(returnTo)}`;
}

/**
 * For pages, layouts and server actions: the actor, or an interrupt.
 *  - not signed in → redirect('/sign-in?returnTo=<this path>')
 *  - signed in but in no organisation, or role not in `allowed` → forbidden() (HTTP 403)
 */
export async function requireActor(allowed?: readonly Role[]): Promise<Actor> {
  const actor = await getActor();
  if (!actor) {
    if (await getSignedInUser()) forbidden();
    redirect(signInPath(await currentPath()));
  }
  if (allowed && !hasRole(actor, allowed)) forbidden();
  return actor;
}

/** True when the thing belongs to the actor's active organisation. */
export function isOwn(organisationId: string | null | undefined, actor: Actor): boolean {
  return !!organisationId && organisationId === actor.organisationId;
}

/**
 * Answers 404 (next/navigation notFound) unless the thing exists and belongs to the actor's active
 * organisation. Pass the row's organisationId, or null/undefined when the row was not found.
 * Returns the id for convenience: `notFoundUnlessOwn(row?.organisationId, actor)`.
 */
export function notFoundUnlessOwn(organisationId: string | null | undefined, actor: Actor): asserts organisationId is string {
  if (!isOwn(organisationId, actor)) notFound();
}

/** Errors a data function throws when called from a route handler path; mapped to a status by `routeError`. */
export class AccessError extends Error {
  constructor(public readonly status: 401 | 403 | 404, message: string) {
    super(message);
  }
}

function jsonError(status: number, error: string): Response {
  return Response.json({ error }, { status, headers: { 'cache-control': 'no-store' } });
}

export const accessMessages = {
  401: 'Sign in to continue.',
  403: 'Your role in this organisation does not allow this.',
  404: 'Not found.',
} as const;

/**
 * For route handlers: the actor, or a Response to return as is (401 not signed in, 403 role or no
 * membership). Usage:
 *   const a = await actorForRoute(['planner']); if (a instanceof Response) return a;
 */
export async function actorForRoute(allowed?: readonly Role[]): Promise<Actor | Response> {
  const actor = await getActor();
  if (!actor) {
    if (await getSignedInUser()) return jsonError(403, 'You are signed in but no longer belong to an organisation.');
    return jsonError(401, accessMessages[401]);
  }
  if (allowed && !hasRole(actor, allowed)) return jsonError(403, accessMessages[403]);
  return actor;
}

/**
 * For v1 API data functions: the actor, or an ApiError (401 not signed in, 403 no membership or role
 * not allowed) that the route frame answers as JSON.
 */
export async function apiActor(allowed?: readonly Role[]): Promise<Actor> {
  const actor = await getActor();
  if (!actor) {
    if (await getSignedInUser()) throw new ApiError(403, 'no_membership', 'You are signed in but no longer belong to an organisation.');
    throw new ApiError(401, 'unauthenticated', accessMessages[401]);
  }
  if (allowed && !hasRole(actor, allowed)) throw new ApiError(403, 'forbidden', accessMessages[403]);
  return actor;
}

/** For v1 API data functions: an ApiError 404 unless the thing belongs to the actor's organisation. */
export function apiOwnOr404(organisationId: string | null | undefined, actor: Actor, what = 'Not found.'): asserts organisationId is string {
  if (!isOwn(organisationId, actor)) throw new ApiError(404, 'not_found', what);
}

/** For route handlers: a 404 Response unless the thing belongs to the actor's organisation, else null. */
export function notFoundResponseUnlessOwn(organisationId: string | null | undefined, actor: Actor): Response | null {
  return isOwn(organisationId, actor) ? null : jsonError(404, accessMessages[404]);
}

/** Maps an AccessError to its Response (other errors are rethrown). */
export function routeError(e: unknown): Response {
  if (e instanceof AccessError) return jsonError(e.status, e.message);
  throw e;
}

