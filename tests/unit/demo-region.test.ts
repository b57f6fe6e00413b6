import { describe, expect, it } from 'vitest';
import { geoContains } from 'd3-geo';
import { feature } from 'topojson-client';
import type { Topology, GeometryCollection } from 'topojson-specification';
import land50 from 'world-atlas/land-50m.json';
import { demoCommunities, demoOrganisations, demoUsers } from '@/lib/demo/nivalen';
import { siteSchema, formatIssues } from '@/lib/engine';
import { validateDemoProfiles } from '@/db/seed';

const land = feature(land50 as unknown as Topology, (land50 as unknown as Topology).objects.land as GeometryCollection);
const profiles = demoCommunities.flatMap((c) => c.profiles.map((p) => ({ community: c, profile: p })));

describe('the invented demo region', () => {
  it('has about eight communities, two organisations and a demo user for every role', () => {
    expect(demoCommunities.length).toBeGreaterThanOrEqual(8);
    expect(demoOrganisations.length).toBeGreaterThanOrEqual(2);
    const roles = new Set(demoUsers.flatMap((u) => u.memberships.map((m) => m.role)));
    expect([...roles].sort()).toEqual(['admin', 'council', 'planner', 'translator']);
    expect(demoUsers.some((u) => new Set(u.memberships.map((m) => m.organisation)).size > 1)).toBe(true);
  });

  it.each(profiles.map((p) => [`${p.community.slug}/${p.profile.slug}`, p] as const))('%s passes the engine site schema', (_, { profile }) => {
    const parsed = siteSchema.safeParse(profile.site);
    expect(parsed.success ? [] : formatIssues(parsed.error)).toEqual([]);
  });

  it.each(profiles.map((p) => [`${p.community.slug}/${p.profile.slug}`, p] as const))('%s lies on land north of 60° N', (_, { profile }) => {
    const { latitude_deg, longitude_deg } = profile.site.location;
    expect(latitude_deg).toBeGreaterThan(60);
    // Natural Earth 1:50m land polygons (world-atlas), the same data the map draws.
    expect(geoContains(land, [longitude_deg, latitude_deg])).toBe(true);
  });

  it.each(profiles.map((p) => [`${p.community.slug}/${p.profile.slug}`, p] as const))(
    '%s has a baseline mean annual air temperature between −15 and −2 °C (a permafrost climate)',
    (_, { profile }) => {
      const t = profile.site.climate.monthly_air_temperature_c;
      const maat = t.reduce((a, b) => a + b, 0) / t.length;
      expect(maat).toBeGreaterThan(-15);
      expect(maat).toBeLessThan(-2);
      // Warmest month above 0 °C: the ground thaws in summer (an active layer exists).
      expect(Math.max(...t)).toBeGreaterThan(0);
    },
  );

  it('is marked as invented where people read it', () => {
    expect(validateDemoProfiles()).toHaveLength(profiles.length);
    for (const p of profiles) expect(p.profile.sourceNote).toMatch(/invented/i);
  });
});
