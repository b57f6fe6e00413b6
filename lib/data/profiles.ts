import 'server-only';
import { and, asc, eq } from 'drizzle-orm';
import { db } from '@/db/client';
import { communities, groundProfiles, groundProfileVersions } from '@/db/schema';
import type { ProfileDto } from '@/lib/schemas/api/dto';
import { apiActor, apiOwnOr404 } from './session';

/** A ground profile (terrain unit) by id, for the v1 API: any member of its organisation. */
export async function getProfileForMember(id: string): Promise<ProfileDto> {
  const actor = await apiActor();
  const [row] = await db
    .select({
      id: groundProfiles.id,
      slug: groundProfiles.slug,
      name: groundProfiles.name,
      currentVersion: groundProfiles.currentVersion,
      updatedAt: groundProfiles.updatedAt,
      organisationId: communities.organisationId,
      communitySlug: communities.slug,
      communityName: communities.name,
      isDemo: communities.isDemo,
      site: groundProfileVersions.site,
    })
    .from(groundProfiles)
    .innerJoin(communities, eq(communities.id, groundProfiles.communityId))
    .innerJoin(groundProfileVersions, and(eq(groundProfileVersions.profileId, groundProfiles.id), eq(groundProfileVersions.version, groundProfiles.currentVersion)))
    .where(eq(groundProfiles.id, id))
    .limit(1);
  apiOwnOr404(row?.organisationId, actor);
  const versions = await db
    .select({ version: groundProfileVersions.version, createdAt: groundProfileVersions.createdAt, sourceNote: groundProfileVersions.sourceNote })
    .from(groundProfileVersions)
    .where(eq(groundProfileVersions.profileId, id))
    .orderBy(asc(groundProfileVersions.version));
  return {
    id: row!.id,
    slug: row!.slug,
    name: row!.name,
    community: { slug: row!.communitySlug, name: row!.communityName, isDemo: row!.isDemo },
    currentVersion: row!.currentVersion,
    updatedAt: row!.updatedAt.toISOString(),
    site: row!.site,
    versions: versions.map((v) => ({ ...v, createdAt: v.createdAt.toISOString() })),
  };
}
