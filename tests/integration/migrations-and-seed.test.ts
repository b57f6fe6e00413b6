import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { count, eq } from 'drizzle-orm';
import { createThrowawayDb, type ThrowawayDb } from './throwaway-db';
import { applyMigrations, pendingMigrationCount } from '@/db/migrations';
import { seedDemo } from '@/db/seed';
import { communities, groundProfiles, groundProfileVersions, memberships, organisations, users } from '@/db/schema';
import { demoCommunities } from '@/lib/demo/nivalen';
import { verifyPassword } from '@/lib/auth/passwords';

let t: ThrowawayDb;

beforeAll(async () => {
  t = await createThrowawayDb({ migrate: false });
});
afterAll(async () => {
  await t?.drop();
});

describe('migrations on a fresh MariaDB database', () => {
  it('reports every committed migration as pending, then none once applied, and applies twice safely', async () => {
    expect(await pendingMigrationCount(t.pool)).toBeGreaterThan(0);
    await applyMigrations(t.db);
    expect(await pendingMigrationCount(t.pool)).toBe(0);
    await applyMigrations(t.db);
    expect(await pendingMigrationCount(t.pool)).toBe(0);
  });
});

describe('the demo seed', () => {
  it('writes the region once and changes nothing on a second run', async () => {
    const first = await seedDemo(t.db);
    expect(first.newProfileVersions).toBe(first.profiles);
    const counts = async () => ({
      organisations: (await t.db.select({ n: count() }).from(organisations))[0]!.n,
      users: (await t.db.select({ n: count() }).from(users))[0]!.n,
      memberships: (await t.db.select({ n: count() }).from(memberships))[0]!.n,
      communities: (await t.db.select({ n: count() }).from(communities))[0]!.n,
      profiles: (await t.db.select({ n: count() }).from(groundProfiles))[0]!.n,
      versions: (await t.db.select({ n: count() }).from(groundProfileVersions))[0]!.n,
    });
    const before = await counts();
    expect(before.communities).toBe(demoCommunities.length);
    const second = await seedDemo(t.db);
    expect(second.newProfileVersions).toBe(0);
    expect(await counts()).toEqual(before);
  });

  it('keeps a role an admin changed, and stores demo passwords only as Argon2id hashes', async () => {
    const [planner] = await t.db.select().from(users).where(eq(users.email, 'planner@nivalen.example'));
    expect(planner!.passwordHash).toMatch(/^\$argon2id\$/);
    expect(await verifyPassword(planner!.passwordHash!, 'thawline-demo')).toBe(true);
    await t.db.update(memberships).set({ role: 'council' }).where(eq(memberships.userId, planner!.id));
    await seedDemo(t.db);
    const [m] = await t.db.select().from(memberships).where(eq(memberships.userId, planner!.id));
    expect(m!.role).toBe('council');
  });

  it('marks every demo organisation and community as demo data', async () => {
    const orgs = await t.db.select({ isDemo: organisations.isDemo, country: organisations.countryCode }).from(organisations);
    expect(orgs.length).toBeGreaterThan(0);
    expect(orgs.every((o) => o.isDemo && o.country === 'XX')).toBe(true);
    const comms = await t.db.select({ isDemo: communities.isDemo }).from(communities);
    expect(comms.length).toBeGreaterThan(0);
    expect(comms.every((c) => c.isDemo)).toBe(true);
  });
});
