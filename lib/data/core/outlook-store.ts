import 'server-only';
import { and, eq, sql } from 'drizzle-orm';
import type { Db, Tx } from '@/db/connect';
import { communities, groundProfiles, groundProfileVersions, outlooks } from '@/db/schema';
import type { AssessOutput } from '@/lib/engine';

/**
 * The core write of an outlook, apart from the session so that actions, jobs and tests reuse it:
 * it takes the organisation and the person as an explicit context and runs in the caller's
 * transaction. Authorization is the caller's (lib/data/outlooks.ts checks role and organisation).
 */

export interface OutlookKey {
  organisationId: string;
  inputSha256: string;
  engineVersion: string;
}

/** The stored outlook for an organisation, input hash and engine version, or null. */
export async function findOutlookByKey(key: OutlookKey, conn: Db | Tx, options: { lock?: boolean } = {}) {
  const query = conn
    .select({ id: outlooks.id, profileVersionId: outlooks.profileVersionId })
    .from(outlooks)
    .where(and(eq(outlooks.organisationId, key.organisationId), eq(outlooks.inputSha256, key.inputSha256), eq(outlooks.engineVersion, key.engineVersion)))
    .limit(1);
  const [row] = options.lock ? await query.for('update') : await query;
  return row ?? null;
}

export interface StoreOutlookInput {
  profileVersionId: string;
  scenarios: string[];
  horizons: number[];
  /** The engine's output document; its provenance gives the input hash and engine version. */
  result: Pick<AssessOutput, 'provenance'> & Record<string, unknown>;
}

export interface OutlookContext {
  organisationId: string;
  userId: string | null;
}

export class OutlookStoreRefused extends Error {}

/**
 * Stores an outlook, or finds the identical one already stored (same organisation, input hash and
 * engine version; concurrent runs of the same inputs end with one row).
 * @returns The row's id and whether it was already there.
 * Throws OutlookStoreRefused when the profile version is not one of the organisation's.
 */
export async function storeOutlook(input: StoreOutlookInput, ctx: OutlookContext, tx: Tx): Promise<{ id: string; reused: boolean }> {
  const [owner] = await tx
    .select({ organisationId: communities.organisationId })
    .from(groundProfileVersions)
    .innerJoin(groundProfiles, eq(groundProfiles.id, groundProfileVersions.profileId))
    .innerJoin(communities, eq(communities.id, groundProfiles.communityId))
    .where(eq(groundProfileVersions.id, input.profileVersionId))
    .limit(1);
  if (!owner || owner.organisationId !== ctx.organisationId) throw new OutlookStoreRefused('the profile version is not one of this organisation');
  const key = { organisationId: ctx.organisationId, inputSha256: input.result.provenance.input_sha256, engineVersion: input.result.provenance.engine_version };
  const existing = await findOutlookByKey(key, tx);
  if (existing) return { id: existing.id, reused: true };
  const id = crypto.randomUUID();
  await tx
    .insert(outlooks)
    .values({ id, profileVersionId: input.profileVersionId, ...key, scenarios: input.scenarios, horizons: input.horizons, result: input.result, computedByUserId: ctx.userId })
    // Another run of the same inputs got there first: keep its row.
    .onDuplicateKeyUpdate({ set: { id: sql`${outlooks.id}` } });
  // A locking read sees the row a concurrent run committed, which this transaction's snapshot may not.
  const stored = await findOutlookByKey(key, tx, { lock: true });
  return { id: stored!.id, reused: stored!.id !== id };
}

/** The site document of a profile version, or null unless it belongs to the organisation. */
export async function profileVersionSite(conn: Db | Tx, profileVersionId: string, organisationId: string): Promise<Record<string, unknown> | null> {
  const [row] = await conn
    .select({ organisationId: communities.organisationId, site: groundProfileVersions.site })
    .from(groundProfileVersions)
    .innerJoin(groundProfiles, eq(groundProfiles.id, groundProfileVersions.profileId))
    .innerJoin(communities, eq(communities.id, groundProfiles.communityId))
    .where(eq(groundProfileVersions.id, profileVersionId))
    .limit(1);
  return row && row.organisationId === organisationId ? (row.site as Record<string, unknown>) : null;
}
