import 'server-only';
import { and, desc, eq } from 'drizzle-orm';
import { db } from '@/db/client';
import { communities, groundProfiles, groundProfileVersions, outlooks, users } from '@/db/schema';
import { z } from 'zod';
import { ENGINE_VERSION, formatIssues } from '@/lib/engine';
import { enqueueJob } from '@/lib/jobs/queue';
import { OUTLOOK_JOB } from '@/lib/jobs/kinds/outlook';
import { outlookInput, outlookInputFor, outlookInputSha256 } from '@/lib/outlook/input';
import { outlookResultSchema, type OutlookResult } from '@/lib/outlook/result';
import type { JobDto, OutlookDto } from '@/lib/schemas/api/dto';
import { ApiError } from '@/lib/server/api-error';
import { findOutlookByKey } from './core/outlook-store';
import { toJobDto } from './jobs';
import { apiActor, apiOwnOr404, notFoundUnlessOwn, requireActor, ROLES, type Actor } from './session';

export { storeOutlook, OutlookStoreRefused, type OutlookContext, type StoreOutlookInput } from './core/outlook-store';

/**
 * Outlooks of ground profiles: the engine's assessment of a profile version under the scenarios and
 * planning horizons a planner chose, stored once per organisation, input hash and engine version.
 *
 * - `getOutlook`: any member; the outlook asked for by id (after a run), else the one of the current
 *   inputs with every scenario and the default horizons, else the profile's latest, marked stale when
 *   its inputs or engine are not the current ones; else null.
 * - `requestOutlook` / `requestOutlookForProfile`: planners and admins; queue a job (lib/jobs) that a
 *   worker process runs, or return the job of the same input hash and engine version.
 * - `getOutlookForMember`: the v1 API's read of one stored outlook.
 * - `storeOutlook(input, ctx, tx)` (core/outlook-store.ts): the core write, used by the job.
 *
 * The role is checked before the profile is looked up (403 before 404), and another organisation's
 * profile answers 404 like a missing one (lib/data/session.ts).
 */

export type StaleReason = 'profile_version' | 'engine_version';

export interface OutlookView {
  id: string;
  /** Version of the ground profile the outlook was computed for. */
  profileVersion: number;
  currentProfileVersion: number;
  engineVersion: string;
  currentEngineVersion: string;
  inputSha256: string;
  computedAt: string;
  /** Name (or e-mail) of the member who ran it; null if they were removed since. */
  computedBy: string | null;
  scenarios: string[];
  horizons: number[];
  /** Empty when the outlook is of the current inputs and engine. */
  stale: StaleReason[];
  /** The engine's document; null if a stored document of an older engine cannot be read any more. */
  result: OutlookResult | null;
}

interface ProfileRef {
  organisationId: string;
  profileId: string;
  versionId: string;
  version: number;
  site: Record<string, unknown>;
}

/** The profile's current version, or 404 unless it belongs to the actor's organisation. */
async function findCurrentVersion(actor: Actor, communitySlug: string, profileSlug: string): Promise<ProfileRef> {
  const [row] = await db
    .select({
      organisationId: communities.organisationId,
      profileId: groundProfiles.id,
      versionId: groundProfileVersions.id,
      version: groundProfileVersions.version,
      site: groundProfileVersions.site,
    })
    .from(groundProfiles)
    .innerJoin(communities, eq(communities.id, groundProfiles.communityId))
    .innerJoin(groundProfileVersions, and(eq(groundProfileVersions.profileId, groundProfiles.id), eq(groundProfileVersions.version, groundProfiles.currentVersion)))
    .where(and(eq(communities.slug, communitySlug), eq(groundProfiles.slug, profileSlug)))
    .limit(1);
  notFoundUnlessOwn(row?.organisationId, actor);
  return row!;
}

const viewColumns = {
  id: outlooks.id,
  profileVersionId: outlooks.profileVersionId,
  profileVersion: groundProfileVersions.version,
  engineVersion: outlooks.engineVersion,
  inputSha256: outlooks.inputSha256,
  scenarios: outlooks.scenarios,
  horizons: outlooks.horizons,
  result: outlooks.result,
  createdAt: outlooks.createdAt,
  computedByName: users.name,
  computedByEmail: users.email,
};

/** The hash of the current site under an outlook's own choice; '' when the engine refuses the site. */
function hashFor(site: Record<string, unknown>, choice: OutlookChoice): string {
  try {
    return outlookInputSha256(outlookInputFor(site, choice));
  } catch (e) {
    if (e instanceof z.ZodError) return '';
    throw e;
  }
}

/**
 * The outlook of a ground profile as members of its organisation see it (any role).
 * @param outlookId An outlook to show (the one a run just stored); ignored unless it is of this
 *   organisation and profile.
 * @returns That outlook; else the outlook of the current inputs (every scenario, default horizons) on
 *   the current engine; else the latest stored outlook of the profile; else null. Stale reasons say
 *   whether its inputs (under its own scenarios and horizons) or its engine differ from the current.
 */
export async function getOutlook(communitySlug: string, profileSlug: string, outlookId?: string): Promise<OutlookView | null> {
  const actor = await requireActor();
  const p = await findCurrentVersion(actor, communitySlug, profileSlug);
  const base = () =>
    db
      .select(viewColumns)
      .from(outlooks)
      .innerJoin(groundProfileVersions, eq(groundProfileVersions.id, outlooks.profileVersionId))
      .leftJoin(users, eq(users.id, outlooks.computedByUserId));
  const own = eq(outlooks.organisationId, actor.organisationId);
  const defaultHash = hashFor(p.site, outlookInput(p.site));
  const asked = outlookId && /^[0-9a-f-]{36}$/.test(outlookId) ? (await base().where(and(own, eq(outlooks.id, outlookId))).limit(1))[0] : undefined;
  const askedFits = asked && (asked.inputSha256 === hashFor(p.site, asked) || asked.profileVersionId === p.versionId);
  const row =
    (askedFits ? asked : undefined) ??
    (await base().where(and(own, eq(outlooks.inputSha256, defaultHash), eq(outlooks.engineVersion, ENGINE_VERSION))).limit(1))[0] ??
    (await base().where(and(own, eq(groundProfileVersions.profileId, p.profileId))).orderBy(desc(outlooks.createdAt)).limit(1))[0];
  if (!row) return null;

  const currentInputs = row.inputSha256 === hashFor(p.site, row);
  const stale: StaleReason[] = [];
  if (!currentInputs) stale.push('profile_version');
  if (row.engineVersion !== ENGINE_VERSION) stale.push('engine_version');
  const parsed = outlookResultSchema.safeParse(row.result);
  return {
    id: row.id,
    // Identical inputs are the same outlook whichever version first produced them.
    profileVersion: currentInputs ? p.version : row.profileVersion,
    currentProfileVersion: p.version,
    engineVersion: row.engineVersion,
    currentEngineVersion: ENGINE_VERSION,
    inputSha256: row.inputSha256,
    computedAt: row.createdAt.toISOString(),
    computedBy: row.computedByName ?? row.computedByEmail ?? null,
    scenarios: row.scenarios,
    horizons: row.horizons,
    stale,
    result: parsed.success ? parsed.data : null,
  };
}

/** The profile's stored inputs do not pass the engine's checks; the message lists `path: problem`. */
export class OutlookInputRefused extends Error {}

/** The scenarios and horizons a planner chose (validated by lib/schemas/api/dto.ts outlookRequestBody). */
export interface OutlookChoice {
  scenarios: readonly string[];
  horizons: readonly number[];
}

/**
 * Queues the outlook of a profile's current version for the chosen scenarios and horizons, or
 * returns the job that already has (or had) the same input hash and engine version: two planners
 * pressing the button for the same input get one job. When the outlook is stored already, the job
 * is written as succeeded with it. The engine runs in a worker process, never here.
 */
async function queueOutlook(actor: Actor, p: ProfileRef, choice: OutlookChoice): Promise<JobDto> {
  const input = outlookInputFor(p.site, choice);
  let inputSha256: string;
  try {
    inputSha256 = outlookInputSha256(input);
  } catch (e) {
    if (e instanceof z.ZodError) throw new OutlookInputRefused(formatIssues(e).join('; '));
    throw e;
  }
  const key = { organisationId: actor.organisationId, inputSha256, engineVersion: ENGINE_VERSION };
  const stored = await findOutlookByKey(key, db);
  const { job } = await enqueueJob(db, {
    kind: OUTLOOK_JOB,
    organisationId: actor.organisationId,
    payload: { profileVersionId: p.versionId, scenarios: [...input.scenarios], horizons: [...input.horizons] },
    inputSha256,
    dedupeKey: `${OUTLOOK_JOB}:${actor.organisationId}:${inputSha256}:${ENGINE_VERSION}`,
    createdByUserId: actor.userId,
    succeededWith: stored ? { outlookId: stored.id, reused: true } : undefined,
  });
  return toJobDto(job);
}

/** For the outlook page's button (planners and admins): queues the outlook, see queueOutlook. */
export async function requestOutlook(communitySlug: string, profileSlug: string, choice: OutlookChoice): Promise<JobDto> {
  const actor = await requireActor(ROLES.planning);
  const p = await findCurrentVersion(actor, communitySlug, profileSlug);
  return queueOutlook(actor, p, choice);
}

/** `POST /api/v1/profiles/{id}/outlooks` (planners and admins). */
export async function requestOutlookForProfile(profileId: string, choice: OutlookChoice): Promise<JobDto> {
  const actor = await apiActor(ROLES.planning);
  const [row] = await db
    .select({ organisationId: communities.organisationId, profileId: groundProfiles.id, versionId: groundProfileVersions.id, version: groundProfileVersions.version, site: groundProfileVersions.site })
    .from(groundProfiles)
    .innerJoin(communities, eq(communities.id, groundProfiles.communityId))
    .innerJoin(groundProfileVersions, and(eq(groundProfileVersions.profileId, groundProfiles.id), eq(groundProfileVersions.version, groundProfiles.currentVersion)))
    .where(eq(groundProfiles.id, profileId))
    .limit(1);
  apiOwnOr404(row?.organisationId, actor);
  try {
    return await queueOutlook(actor, row!, choice);
  } catch (e) {
    if (e instanceof OutlookInputRefused) throw new ApiError(422, 'inputs_refused', `The ground profile's inputs do not pass the engine's checks: ${e.message}`);
    throw e;
  }
}

/** `GET /api/v1/outlooks/{id}`: a stored outlook, any member of its organisation. */
export async function getOutlookForMember(id: string): Promise<OutlookDto> {
  const actor = await apiActor();
  const [row] = await db
    .select({ ...viewColumns, organisationId: outlooks.organisationId, profileId: groundProfileVersions.profileId })
    .from(outlooks)
    .innerJoin(groundProfileVersions, eq(groundProfileVersions.id, outlooks.profileVersionId))
    .leftJoin(users, eq(users.id, outlooks.computedByUserId))
    .where(eq(outlooks.id, id))
    .limit(1);
  apiOwnOr404(row?.organisationId, actor);
  return {
    id: row!.id,
    profileId: row!.profileId,
    profileVersion: row!.profileVersion,
    engineVersion: row!.engineVersion,
    inputSha256: row!.inputSha256,
    computedAt: row!.createdAt.toISOString(),
    scenarios: row!.scenarios,
    horizons: row!.horizons,
    result: row!.result,
  };
}
