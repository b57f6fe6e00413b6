import 'server-only';
import { and, asc, count, eq } from 'drizzle-orm';
import { db } from '@/db/client';
import { communities, groundProfiles, groundProfileVersions } from '@/db/schema';
import { notFound } from 'next/navigation';
import { requireActor, notFoundUnlessOwn } from './session';

/**
 * Communities and their ground profiles, as their organisation's members see them. Every read asks
 * the session core who is acting; another organisation's community answers 404 like a missing one.
 */

export interface CommunitySummary {
  id: string;
  slug: string;
  name: string;
  latitudeDeg: number;
  longitudeDeg: number;
  languages: string[];
  population: string | null;
  description: string | null;
  isDemo: boolean;
  profileCount: number;
}

export interface GroundProfileSummary {
  id: string;
  slug: string;
  name: string;
  currentVersion: number;
  updatedAt: string;
}

export interface CommunityDetail extends CommunitySummary {
  organisationName: string;
  profiles: GroundProfileSummary[];
}

export interface GroundProfileDetail extends GroundProfileSummary {
  community: Pick<CommunitySummary, 'id' | 'slug' | 'name' | 'isDemo'>;
  /** The engine's site document of the current version. */
  site: Record<string, unknown>;
  siteSha256: string;
  sourceNote: string | null;
  versions: { version: number; createdAt: string; sourceNote: string | null }[];
}

const summaryColumns = {
  id: communities.id,
  slug: communities.slug,
  name: communities.name,
  latitudeDeg: communities.latitudeDeg,
  longitudeDeg: communities.longitudeDeg,
  languages: communities.languages,
  population: communities.population,
  description: communities.description,
  isDemo: communities.isDemo,
};

/** The active organisation's communities, by name, with how many terrain units each has. */
export async function listCommunities(): Promise<CommunitySummary[]> {
  const actor = await requireActor();
  const rows = await db
    .select({ ...summaryColumns, profileCount: count(groundProfiles.id) })
    .from(communities)
    .leftJoin(groundProfiles, eq(groundProfiles.communityId, communities.id))
    .where(eq(communities.organisationId, actor.organisationId))
    .groupBy(communities.id)
    .orderBy(asc(communities.name));
  return rows.map((r) => ({ ...r, profileCount: Number(r.profileCount) }));
}

async function findOwnCommunity(slug: string) {
  const actor = await requireActor();
  const [row] = await db
    .select({ ...summaryColumns, organisationId: communities.organisationId })
    .from(communities)
    .where(eq(communities.slug, slug))
    .limit(1);
  notFoundUnlessOwn(row?.organisationId, actor);
  return { row: row!, actor };
}

export async function getCommunity(slug: string): Promise<CommunityDetail> {
  const { row, actor } = await findOwnCommunity(slug);
  const profiles = await db
    .select({ id: groundProfiles.id, slug: groundProfiles.slug, name: groundProfiles.name, currentVersion: groundProfiles.currentVersion, updatedAt: groundProfiles.updatedAt })
    .from(groundProfiles)
    .where(eq(groundProfiles.communityId, row.id))
    .orderBy(asc(groundProfiles.name));
  const { organisationId: _omit, ...summary } = row;
  void _omit;
  return {
    ...summary,
    organisationName: actor.organisationName,
    profileCount: profiles.length,
    profiles: profiles.map((p) => ({ ...p, updatedAt: p.updatedAt.toISOString() })),
  };
}

export async function getGroundProfile(communitySlug: string, profileSlug: string): Promise<GroundProfileDetail> {
  const { row } = await findOwnCommunity(communitySlug);
  const [profile] = await db
    .select()
    .from(groundProfiles)
    .where(and(eq(groundProfiles.communityId, row.id), eq(groundProfiles.slug, profileSlug)))
    .limit(1);
  // A profile slug of another community is "not found" here too (the community is the actor's own).
  if (!profile) notFound();
  // The list of versions without their documents; only the current version's site is read.
  const versions = await db
    .select({ version: groundProfileVersions.version, createdAt: groundProfileVersions.createdAt, sourceNote: groundProfileVersions.sourceNote })
    .from(groundProfileVersions)
    .where(eq(groundProfileVersions.profileId, profile.id))
    .orderBy(asc(groundProfileVersions.version));
  const [current] = await db
    .select({ site: groundProfileVersions.site, siteSha256: groundProfileVersions.siteSha256, sourceNote: groundProfileVersions.sourceNote })
    .from(groundProfileVersions)
    .where(and(eq(groundProfileVersions.profileId, profile.id), eq(groundProfileVersions.version, profile.currentVersion)))
    .limit(1);
  // Every profile is written with its first version in one transaction (db/seed.ts); a missing
  // current version is damaged data, not a user's mistake.
  if (!current) throw new Error(`ground profile ${profile.id} has no version ${profile.currentVersion}`);
  return {
    id: profile.id,
    slug: profile.slug,
    name: profile.name,
    currentVersion: profile.currentVersion,
    updatedAt: profile.updatedAt.toISOString(),
    community: { id: row.id, slug: row.slug, name: row.name, isDemo: row.isDemo },
    site: current.site,
    siteSha256: current.siteSha256,
    sourceNote: current.sourceNote,
    versions: versions.map((v) => ({ ...v, createdAt: v.createdAt.toISOString() })),
  };
}
