import 'server-only';
import { and, desc, eq } from 'drizzle-orm';
import { db } from '@/db/client';
import { communities, groundProfiles, groundProfileVersions, outlooks, users } from '@/db/schema';
import { z } from 'zod';
import { ENGINE_VERSION, runAssessment, formatIssues } from '@/lib/engine';
import { outlookInput, outlookInputSha256 } from '@/lib/outlook/input';
import { outlookResultSchema, type OutlookResult } from '@/lib/outlook/result';
import { findOutlookByKey, storeOutlook } from './core/outlook-store';
import { notFoundUnlessOwn, requireActor, ROLES, type Actor } from './session';

export { storeOutlook, OutlookStoreRefused, type OutlookContext, type StoreOutlookInput } from './core/outlook-store';

/**
 * Outlooks of ground profiles: the engine's assessment of a profile's current version under every
 * scenario and the planning horizons 2030, 2050 and 2080, stored once per organisation, input hash
 * and engine version.
 *
 * - `getOutlook`: any member of the organisation; the outlook of the current inputs, else the latest
 *   one of the profile marked stale (profile version or engine changed), else null.
 * - `runOutlook`: planners and admins; runs the engine in this process (a few seconds) unless an
 *   identical outlook (same input hash and engine version) is stored, which is reused.
 * - `storeOutlook(input, ctx, tx)` (outlook-store.ts): the core write, reusable by jobs and tests.
 *
 * The role is checked before the profile is looked up (403 before 404), and another organisation's
 * profile answers 404 like a missing one (lib/data/session.ts).
 */

/**
 * Engine options inside the application: in-process (no `workers` pool is passed, so the engine's
 * thread pool, lib/engine/assess-pool.ts, is not even in the bundle; its worker starts through tsx
 * beside the engine's source, which a bundle does not have). A run takes a few seconds.
 */
const ENGINE_OPTIONS = {} as const;

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

/**
 * The outlook of a ground profile as members of its organisation see it (any role).
 * @returns The outlook of the current version's inputs on the current engine; else the latest
 *   stored outlook of the profile, marked stale; else null.
 */
export async function getOutlook(communitySlug: string, profileSlug: string): Promise<OutlookView | null> {
  const actor = await requireActor();
  const p = await findCurrentVersion(actor, communitySlug, profileSlug);
  // A stored site the current engine no longer accepts has no current outlook (a run says why).
  let currentHash = '';
  try {
    currentHash = outlookInputSha256(outlookInput(p.site));
  } catch (e) {
    if (!(e instanceof z.ZodError)) throw e;
  }
  const base = () =>
    db
      .select(viewColumns)
      .from(outlooks)
      .innerJoin(groundProfileVersions, eq(groundProfileVersions.id, outlooks.profileVersionId))
      .leftJoin(users, eq(users.id, outlooks.computedByUserId));
  const [current] = await base()
    .where(and(eq(outlooks.organisationId, actor.organisationId), eq(outlooks.inputSha256, currentHash), eq(outlooks.engineVersion, ENGINE_VERSION)))
    .limit(1);
  const row =
    current ??
    (
      await base()
        .where(and(eq(outlooks.organisationId, actor.organisationId), eq(groundProfileVersions.profileId, p.profileId)))
        .orderBy(desc(outlooks.createdAt))
        .limit(1)
    )[0];
  if (!row) return null;

  const stale: StaleReason[] = [];
  if (row.inputSha256 !== currentHash) stale.push('profile_version');
  if (row.engineVersion !== ENGINE_VERSION) stale.push('engine_version');
  const parsed = outlookResultSchema.safeParse(row.result);
  return {
    id: row.id,
    // Identical inputs are the same outlook whichever version first produced them.
    profileVersion: current ? p.version : row.profileVersion,
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

/**
 * Runs the outlook of a ground profile's current version (planners and admins) and stores it.
 * @returns The outlook's id, whether an identical stored one was reused, and the run's time [ms].
 * Throws OutlookInputRefused when the stored inputs do not pass the engine's checks.
 */
export async function runOutlook(communitySlug: string, profileSlug: string): Promise<{ id: string; reused: boolean; ms: number }> {
  const actor = await requireActor(ROLES.planning);
  const p = await findCurrentVersion(actor, communitySlug, profileSlug);
  const input = outlookInput(p.site);
  let inputSha256: string;
  try {
    inputSha256 = outlookInputSha256(input);
  } catch (e) {
    if (e instanceof z.ZodError) throw new OutlookInputRefused(formatIssues(e).join('; '));
    throw e;
  }
  const key = { organisationId: actor.organisationId, inputSha256, engineVersion: ENGINE_VERSION };
  const existing = await findOutlookByKey(key, db);
  if (existing) return { id: existing.id, reused: true, ms: 0 };
  const t0 = performance.now();
  const { output, stats } = await runAssessment(input, ENGINE_OPTIONS);
  const ms = Math.round(performance.now() - t0);
  console.info(`outlook run ${communitySlug}/${profileSlug} v${p.version}: ${ms} ms, history cache ${stats.cacheHit ? 'hit' : 'miss'}, worker scenarios ${stats.workerScenarios}${stats.workerFallback ? `, worker fallback: ${stats.workerFallback}` : ''}`);
  const stored = await db.transaction((tx) =>
    storeOutlook({ profileVersionId: p.versionId, scenarios: [...input.scenarios], horizons: [...input.horizons], result: output }, { organisationId: actor.organisationId, userId: actor.userId }, tx),
  );
  return { ...stored, ms };
}
