import 'server-only';
/**
 * Writes the invented demonstration region (lib/demo/nivalen.ts) into a database, idempotently: a
 * second run changes nothing, and a changed demo profile becomes a new profile version (old versions
 * are never overwritten). Everything is validated before anything is written, in one transaction.
 */
import { and, eq } from 'drizzle-orm';
import type { Db } from './connect';
import { communities, groundProfiles, groundProfileVersions, memberships, organisations, users } from './schema';
import { demoCommunities, demoOrganisations, demoUsers, DEMO_PASSWORD } from '@/lib/demo/nivalen';
import { siteSchema, formatIssues, canonicalSha256 } from '@/lib/engine';
import { hashPassword } from '@/lib/auth/passwords';

export interface SeedSummary {
  organisations: number;
  users: number;
  communities: number;
  profiles: number;
  newProfileVersions: number;
}

export function validateDemoProfiles() {
  return demoCommunities.flatMap((c) =>
    c.profiles.map((p) => {
      const parsed = siteSchema.safeParse(p.site);
      if (!parsed.success) {
        throw new Error(`demo profile ${c.slug}/${p.slug}: ${formatIssues(parsed.error).join('; ')}`);
      }
      return { community: c, profile: p, site: parsed.data };
    }),
  );
}

export async function seedDemo(db: Db): Promise<SeedSummary> {
  const profiles = validateDemoProfiles();
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  let newProfileVersions = 0;

  await db.transaction(async (tx) => {
    const orgIds = new Map<string, string>();
    for (const o of demoOrganisations) {
      const [existing] = await tx.select({ id: organisations.id }).from(organisations).where(eq(organisations.slug, o.slug));
      if (existing) {
        await tx.update(organisations).set({ name: o.name, kind: o.kind, countryCode: 'XX', isDemo: true }).where(eq(organisations.id, existing.id));
        orgIds.set(o.slug, existing.id);
      } else {
        const id = crypto.randomUUID();
        await tx.insert(organisations).values({ id, slug: o.slug, name: o.name, kind: o.kind, countryCode: 'XX', isDemo: true });
        orgIds.set(o.slug, id);
      }
    }

    for (const u of demoUsers) {
      const [existing] = await tx.select({ id: users.id, passwordHash: users.passwordHash }).from(users).where(eq(users.email, u.email));
      let userId: string;
      if (existing) {
        userId = existing.id;
        // Keep a password a demo user changed; restore one that was removed.
        if (!existing.passwordHash) await tx.update(users).set({ passwordHash }).where(eq(users.id, userId));
      } else {
        userId = crypto.randomUUID();
        await tx.insert(users).values({ id: userId, email: u.email, name: u.name, locale: u.locale, passwordHash, emailVerified: new Date() });
      }
      for (const m of u.memberships) {
        const organisationId = orgIds.get(m.organisation)!;
        const [has] = await tx
          .select({ id: memberships.id })
          .from(memberships)
          .where(and(eq(memberships.organisationId, organisationId), eq(memberships.userId, userId)));
        // An admin may have changed a demo member's role since the last seed: leave it as it is.
        if (!has) await tx.insert(memberships).values({ organisationId, userId, role: m.role });
      }
    }

    const communityIds = new Map<string, string>();
    for (const c of demoCommunities) {
      const values = {
        organisationId: orgIds.get(c.organisation)!,
        name: c.name,
        latitudeDeg: c.profiles[0]!.site.location.latitude_deg,
        longitudeDeg: c.profiles[0]!.site.location.longitude_deg,
        languages: c.languages,
        population: c.population,
        description: c.description,
        isDemo: true,
      };
      const [existing] = await tx.select({ id: communities.id }).from(communities).where(eq(communities.slug, c.slug));
      if (existing) {
        await tx.update(communities).set(values).where(eq(communities.id, existing.id));
        communityIds.set(c.slug, existing.id);
      } else {
        const id = crypto.randomUUID();
        await tx.insert(communities).values({ id, slug: c.slug, ...values });
        communityIds.set(c.slug, id);
      }
    }

    for (const { community, profile, site } of profiles) {
      const communityId = communityIds.get(community.slug)!;
      const siteSha256 = canonicalSha256(site);
      const [existing] = await tx
        .select({ id: groundProfiles.id, currentVersion: groundProfiles.currentVersion })
        .from(groundProfiles)
        .where(and(eq(groundProfiles.communityId, communityId), eq(groundProfiles.slug, profile.slug)));
      if (!existing) {
        const id = crypto.randomUUID();
        await tx.insert(groundProfiles).values({ id, communityId, slug: profile.slug, name: profile.name, currentVersion: 1 });
        await tx.insert(groundProfileVersions).values({ profileId: id, version: 1, site, siteSha256, sourceNote: profile.sourceNote });
        newProfileVersions++;
        continue;
      }
      const [current] = await tx
        .select({ siteSha256: groundProfileVersions.siteSha256 })
        .from(groundProfileVersions)
        .where(and(eq(groundProfileVersions.profileId, existing.id), eq(groundProfileVersions.version, existing.currentVersion)));
      if (current?.siteSha256 !== siteSha256) {
        const version = existing.currentVersion + 1;
        await tx.insert(groundProfileVersions).values({ profileId: existing.id, version, site, siteSha256, sourceNote: profile.sourceNote });
        await tx.update(groundProfiles).set({ currentVersion: version, name: profile.name }).where(eq(groundProfiles.id, existing.id));
        newProfileVersions++;
      }
    }
  });

  return {
    organisations: demoOrganisations.length,
    users: demoUsers.length,
    communities: demoCommunities.length,
    profiles: profiles.length,
    newProfileVersions,
  };
}
