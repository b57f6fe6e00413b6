import 'server-only';
import { asc, desc, eq, sql } from 'drizzle-orm';
import { db } from '@/db/client';
import { communities, groundProfiles, groundProfileVersions, outlooks } from '@/db/schema';
import { ENGINE_VERSION } from '@/lib/engine';
import { HAZARD_LEVELS, type HazardLevel } from '@/lib/outlook/result';
import type { CommunityDto } from '@/lib/schemas/api/dto';
import { apiActor, apiOwnOr404, type Actor } from './session';

/**
 * Communities for the v1 API (the map and the overview): the active organisation's communities with
 * their terrain units and each unit's latest rating, the highest level of concern in its latest
 * outlook and the scenario and horizon where it first occurs. Any member.
 *
 * A rating is marked stale when its outlook was run on an older profile version or engine (then the
 * page offers to run it again).
 */

type Rating = NonNullable<CommunityDto['terrainUnits'][number]['latestRating']>;

const columns = {
  id: communities.id,
  slug: communities.slug,
  name: communities.name,
  latitudeDeg: communities.latitudeDeg,
  longitudeDeg: communities.longitudeDeg,
  languages: communities.languages,
  population: communities.population,
  description: communities.description,
  isDemo: communities.isDemo,
  organisationId: communities.organisationId,
};

export async function listCommunitiesForMember(): Promise<CommunityDto[]> {
  const actor = await apiActor();
  const rows = await db.select(columns).from(communities).where(eq(communities.organisationId, actor.organisationId)).orderBy(asc(communities.name));
  return withTerrainUnits(actor, rows);
}

export async function getCommunityForMember(slug: string): Promise<CommunityDto> {
  const actor = await apiActor();
  const [row] = await db.select(columns).from(communities).where(eq(communities.slug, slug)).limit(1);
  apiOwnOr404(row?.organisationId, actor);
  return (await withTerrainUnits(actor, [row!]))[0]!;
}

type CommunityRow = Awaited<ReturnType<typeof selectCommunities>>[number];

async function withTerrainUnits(actor: Actor, rows: CommunityRow[]): Promise<CommunityDto[]> {
  const units = await db
    .select({ id: groundProfiles.id, slug: groundProfiles.slug, name: groundProfiles.name, currentVersion: groundProfiles.currentVersion, communityId: groundProfiles.communityId })
    .from(groundProfiles)
    .innerJoin(communities, eq(communities.id, groundProfiles.communityId))
    .where(eq(communities.organisationId, actor.organisationId))
    .orderBy(asc(groundProfiles.name));
  const ratings = await latestRatings(actor.organisationId, new Map(units.map((u) => [u.id, u.currentVersion])));
  return rows.map(({ organisationId: _o, id, ...c }) => {
    void _o;
    return {
      ...c,
      terrainUnits: units.filter((u) => u.communityId === id).map(({ communityId: _c, ...u }) => (void _c, { ...u, latestRating: ratings.get(u.id) ?? null })),
    };
  });
}

function selectCommunities() {
  return db.select(columns).from(communities);
}

/** The latest outlook's highest level per terrain unit (the levels are read in the database). */
async function latestRatings(organisationId: string, currentVersions: Map<string, number>): Promise<Map<string, Rating>> {
  const rows = await db
    .select({
      id: outlooks.id,
      engineVersion: outlooks.engineVersion,
      profileId: groundProfileVersions.profileId,
      version: groundProfileVersions.version,
      levels: sql<string>`JSON_EXTRACT(${outlooks.result}, '$.results[*].hazard')`,
      scenarios: sql<string>`JSON_EXTRACT(${outlooks.result}, '$.results[*].scenario')`,
      horizons: sql<string>`JSON_EXTRACT(${outlooks.result}, '$.results[*].horizon')`,
    })
    .from(outlooks)
    .innerJoin(groundProfileVersions, eq(groundProfileVersions.id, outlooks.profileVersionId))
    .where(eq(outlooks.organisationId, organisationId))
    .orderBy(desc(outlooks.createdAt));
  const out = new Map<string, Rating>();
  for (const r of rows) {
    if (out.has(r.profileId)) continue;
    const levels = parseList<string>(r.levels);
    const scenarios = parseList<string>(r.scenarios);
    const horizons = parseList<number>(r.horizons);
    // The highest level; among equals, the earliest horizon.
    let best = -1;
    let bestRank = -1;
    for (let i = 0; i < levels.length; i++) {
      const rank = HAZARD_LEVELS.indexOf(levels[i] as HazardLevel);
      if (rank > bestRank || (rank === bestRank && rank >= 0 && horizons[i]! < horizons[best]!)) {
        best = i;
        bestRank = rank;
      }
    }
    if (best < 0) continue;
    out.set(r.profileId, {
      level: levels[best] as HazardLevel,
      scenario: scenarios[best]!,
      horizon: horizons[best]!,
      outlookId: r.id,
      stale: r.engineVersion !== ENGINE_VERSION || r.version !== currentVersions.get(r.profileId),
    });
  }
  return out;
}

function parseList<T>(raw: unknown): T[] {
  if (Array.isArray(raw)) return raw as T[];
  if (typeof raw !== 'string') return [];
  try {
    const v = JSON.parse(raw);
    return Array.isArray(v) ? v : [];
  } catch {
    return [];
  }
}
