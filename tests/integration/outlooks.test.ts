/**
 * The outlook store against a real MariaDB (a throw-away database, migrated and seeded with the demo
 * region): one row per organisation, input hash and engine version; reuse of an identical outlook;
 * concurrent runs of the same inputs ending with one row; and no writing an outlook onto another
 * organisation's profile version. The product rule behind the last two: "Every organisation sees
 * only its own communities, drafts and members" (product.md).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { and, asc, eq } from 'drizzle-orm';
import { seedDemo } from '@/db/seed';
import { communities, groundProfiles, groundProfileVersions, organisations, outlooks, users } from '@/db/schema';
import { OutlookStoreRefused, storeOutlook, type StoreOutlookInput } from '@/lib/data/core/outlook-store';
import { createThrowawayDb, type ThrowawayDb } from './throwaway-db';

let t: ThrowawayDb;
const ids = { nivalen: '', cairnholm: '', nivalenVersion: '', cairnholmVersion: '', planner: '' };

async function firstVersion(orgSlug: string) {
  const [row] = await t.db
    .select({ organisationId: organisations.id, versionId: groundProfileVersions.id })
    .from(groundProfileVersions)
    .innerJoin(groundProfiles, eq(groundProfiles.id, groundProfileVersions.profileId))
    .innerJoin(communities, eq(communities.id, groundProfiles.communityId))
    .innerJoin(organisations, eq(organisations.id, communities.organisationId))
    .where(eq(organisations.slug, orgSlug))
    .orderBy(asc(communities.slug), asc(groundProfiles.slug))
    .limit(1);
  return row!;
}

/** A stand-in engine document: the store reads only its provenance; the rest is kept as is. */
function doc(hash: string, engineVersion = '0.1.0'): StoreOutlookInput['result'] {
  return { baseline: { seasonal_thaw_m: 0.6 }, results: [], provenance: { engine_version: engineVersion, input_sha256: hash, profile_sha256: 'p', sources: ['s'] } };
}

const input = (profileVersionId: string, hash: string, engineVersion?: string): StoreOutlookInput => ({
  profileVersionId,
  scenarios: ['SSP2-4.5'],
  horizons: [2050],
  result: doc(hash, engineVersion),
});

beforeAll(async () => {
  t = await createThrowawayDb();
  await seedDemo(t.db);
  const n = await firstVersion('nivalen-regional-office');
  const c = await firstVersion('cairnholm-hamlet-council');
  Object.assign(ids, { nivalen: n.organisationId, nivalenVersion: n.versionId, cairnholm: c.organisationId, cairnholmVersion: c.versionId });
  const [planner] = await t.db.select({ id: users.id }).from(users).where(eq(users.email, 'planner@nivalen.example'));
  ids.planner = planner!.id;
});
afterAll(async () => {
  await t?.drop();
});

const count = async (hash: string) => (await t.db.select({ id: outlooks.id }).from(outlooks).where(eq(outlooks.inputSha256, hash))).length;

describe('storeOutlook', () => {
  it('stores an outlook once and reuses it for the same input hash and engine version', async () => {
    const hash = 'a'.repeat(64);
    const ctx = { organisationId: ids.nivalen, userId: ids.planner };
    const first = await t.db.transaction((tx) => storeOutlook(input(ids.nivalenVersion, hash), ctx, tx));
    expect(first.reused).toBe(false);
    const second = await t.db.transaction((tx) => storeOutlook(input(ids.nivalenVersion, hash), ctx, tx));
    expect(second).toEqual({ id: first.id, reused: true });
    expect(await count(hash)).toBe(1);
    const [row] = await t.db.select().from(outlooks).where(eq(outlooks.id, first.id));
    expect(row!.computedByUserId).toBe(ids.planner);
    expect(row!.result).toEqual(doc(hash));
    expect(row!.engineVersion).toBe('0.1.0');
  });

  it('keeps a separate outlook for another engine version of the same inputs', async () => {
    const hash = 'b'.repeat(64);
    const ctx = { organisationId: ids.nivalen, userId: ids.planner };
    const v1 = await t.db.transaction((tx) => storeOutlook(input(ids.nivalenVersion, hash, '0.1.0'), ctx, tx));
    const v2 = await t.db.transaction((tx) => storeOutlook(input(ids.nivalenVersion, hash, '0.2.0'), ctx, tx));
    expect(v2.id).not.toBe(v1.id);
    expect(v2.reused).toBe(false);
    expect(await count(hash)).toBe(2);
  });

  it('gives each organisation its own row for identical inputs, never the other\'s', async () => {
    const hash = 'c'.repeat(64);
    const own = await t.db.transaction((tx) => storeOutlook(input(ids.nivalenVersion, hash), { organisationId: ids.nivalen, userId: ids.planner }, tx));
    const other = await t.db.transaction((tx) => storeOutlook(input(ids.cairnholmVersion, hash), { organisationId: ids.cairnholm, userId: null }, tx));
    expect(other.id).not.toBe(own.id);
    expect(other.reused).toBe(false);
    const rows = await t.db.select({ org: outlooks.organisationId }).from(outlooks).where(eq(outlooks.inputSha256, hash));
    expect(rows.map((r) => r.org).sort()).toEqual([ids.nivalen, ids.cairnholm].sort());
  });

  it('refuses to store onto another organisation\'s profile version, and writes nothing', async () => {
    const hash = 'd'.repeat(64);
    await expect(t.db.transaction((tx) => storeOutlook(input(ids.cairnholmVersion, hash), { organisationId: ids.nivalen, userId: ids.planner }, tx))).rejects.toBeInstanceOf(OutlookStoreRefused);
    expect(await count(hash)).toBe(0);
  });

  it('ends concurrent runs of the same inputs with one row, both answering its id', async () => {
    const hash = 'e'.repeat(64);
    const ctx = { organisationId: ids.nivalen, userId: ids.planner };
    const [a, b] = await Promise.all([
      t.db.transaction((tx) => storeOutlook(input(ids.nivalenVersion, hash), ctx, tx)),
      t.db.transaction((tx) => storeOutlook(input(ids.nivalenVersion, hash), ctx, tx)),
    ]);
    expect(a.id).toBe(b.id);
    expect([a.reused, b.reused].sort()).toEqual([false, true]);
    expect(await count(hash)).toBe(1);
  });

  it('removes a profile version\'s outlooks with the version (foreign key, cascade)', async () => {
    const hash = 'f'.repeat(64);
    await t.db.transaction((tx) => storeOutlook(input(ids.nivalenVersion, hash), { organisationId: ids.nivalen, userId: ids.planner }, tx));
    const [v] = await t.db.select({ profileId: groundProfileVersions.profileId }).from(groundProfileVersions).where(eq(groundProfileVersions.id, ids.nivalenVersion));
    await t.db.delete(groundProfiles).where(and(eq(groundProfiles.id, v!.profileId)));
    expect(await count(hash)).toBe(0);
  });
});
