/**
 * A member removed or demoted by an admin loses access on the very next request, although their
 * session cookie is unchanged ("a token session must not keep a removed member or an old role
 * alive"). The last admin cannot remove or demote themself. Switching organisation changes what is
 * visible. Against the running application and the real database.
 */
import { and, asc, eq, inArray } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { communities, memberships, organisations, users } from '@/db/schema';
import { hashPassword } from '@/lib/auth/passwords';
import { AppClient, ensureAppRunning, testDb, visibleText } from './helpers/app-client';

const { pool, db } = testDb();
const prefix = `members-${Date.now().toString(36)}`;
const PASSWORD = 'a-test-password-for-members';
const MEMBERS = 'action lib/actions/members.ts';
const created: string[] = [];
let nivalenId = '';
let cairnholmId = '';

async function tempMember(label: string, organisationId: string, role: 'admin' | 'planner' | 'translator' | 'council') {
  const userId = crypto.randomUUID();
  const membershipId = crypto.randomUUID();
  const email = `${prefix}-${label}@example.org`;
  await db.insert(users).values({ id: userId, email, name: label, passwordHash: await hashPassword(PASSWORD) });
  await db.insert(memberships).values({ id: membershipId, organisationId, userId, role });
  created.push(userId);
  return { userId, membershipId, email };
}

const action = (client: AppClient, name: string, arg: unknown) => client.action(`${MEMBERS.replace('action ', '')}#${name}`, [arg]);

beforeAll(async () => {
  await ensureAppRunning();
  const orgs = await db.select({ id: organisations.id, slug: organisations.slug }).from(organisations);
  nivalenId = orgs.find((o) => o.slug === 'nivalen-regional-office')!.id;
  cairnholmId = orgs.find((o) => o.slug === 'cairnholm-hamlet-council')!.id;
});

afterAll(async () => {
  if (created.length) await db.delete(users).where(inArray(users.id, created));
  await pool.end();
});

describe('membership changes take effect on the next request', () => {
  it('a removed member loses access at once', async () => {
    const admin = new AppClient('admin');
    await admin.signInWithPassword('admin@nivalen.example');
    const m = await tempMember('removed', nivalenId, 'planner');
    const person = new AppClient('removed');
    await person.signInWithPassword(m.email, PASSWORD);
    expect((await person.get('/workspace')).status).toBe(200);
    expect((await person.get('/communities')).status).toBe(200);

    const r = await action(admin, 'removeMemberAction', { membershipId: m.membershipId });
    expect(r.status).toBe(200);
    expect(r.body).toContain('"ok":true');

    // Same cookie as before; the membership is gone from the database.
    expect((await person.get('/workspace')).status).toBe(403);
    expect((await person.get('/communities')).status).toBe(403);
    // Signed in but in no organisation any more: 403 (lib/data/session.ts), for actions as for pages.
    expect((await person.action('lib/actions/preferences.ts#switchOrganisationAction', [{ organisationId: nivalenId }])).status).toBe(403);
  });

  it('a demoted admin loses the admin pages and actions at once, and keeps the workspace', async () => {
    const admin = new AppClient('admin');
    await admin.signInWithPassword('admin@nivalen.example');
    const m = await tempMember('demoted', nivalenId, 'admin');
    const person = new AppClient('demoted');
    await person.signInWithPassword(m.email, PASSWORD);
    expect((await person.get('/admin/members')).status).toBe(200);

    const r = await action(admin, 'changeRole', { membershipId: m.membershipId, role: 'council' });
    expect(r.body).toContain('"ok":true');

    expect((await person.get('/admin/members')).status).toBe(403);
    expect((await person.get('/admin/audit')).status).toBe(403);
    expect((await action(person, 'inviteMember', { email: `${prefix}-x@example.org`, role: 'admin' })).status).toBe(403);
    expect((await person.get('/workspace')).status).toBe(200);
    expect(visibleText((await person.get('/workspace')).body)).toMatch(/>\s*council\s*</);
  });

  it('signing out ends the session, even for a copy of the cookie kept from before', async () => {
    const m = await tempMember('signout', nivalenId, 'planner');
    const person = new AppClient('signout');
    await person.signInWithPassword(m.email, PASSWORD);
    const kept = person.clone('kept copy');
    expect((await kept.get('/workspace')).status).toBe(200);
    const out = await person.action('lib/actions/sign-out.ts#signOutAction', []);
    expect(out.redirect).toMatch(/^\/sign-in/);
    const again = await kept.get('/workspace');
    expect(again.status).toBe(307);
    expect(again.redirect).toMatch(/^\/sign-in\?returnTo=/);
  });

  it('the last admin cannot demote or remove themself', async () => {
    // Cairnholm's seeded admin is its only admin.
    const admins = await db.select({ id: memberships.id }).from(memberships).where(and(eq(memberships.organisationId, cairnholmId), eq(memberships.role, 'admin')));
    expect(admins).toHaveLength(1);
    const admin = new AppClient('cairnholm admin');
    await admin.signInWithPassword('admin@cairnholm.example');

    const demote = await action(admin, 'changeRole', { membershipId: admins[0].id, role: 'planner' });
    expect(demote.status).toBe(200);
    expect(demote.body).toContain('"ok":false');
    expect(demote.body).toContain('at least one admin');
    const remove = await action(admin, 'removeMemberAction', { membershipId: admins[0].id });
    expect(remove.body).toContain('at least one admin');

    const [still] = await db.select({ role: memberships.role }).from(memberships).where(eq(memberships.id, admins[0].id));
    expect(still.role).toBe('admin');
    expect((await admin.get('/admin/members')).status).toBe(200);
  });

  it('a person in two organisations sees only the active one, and switches', async () => {
    const rowan = new AppClient('rowan');
    await rowan.signInWithPassword('rowan@nivalen.example');
    const slugOf = async (orgId: string) =>
      (await db.select({ slug: communities.slug }).from(communities).where(eq(communities.organisationId, orgId)).orderBy(asc(communities.slug)).limit(1))[0].slug;
    const nivalenSlug = await slugOf(nivalenId);
    const cairnholmSlug = await slugOf(cairnholmId);

    // First membership by organisation name: Cairnholm Hamlet Council (council), before Nivalen.
    const switched = await rowan.action('lib/actions/preferences.ts#switchOrganisationAction', [{ organisationId: nivalenId }]);
    expect(switched.body).toContain('"ok":true');
    expect((await rowan.get(`/communities/${nivalenSlug}`)).status).toBe(200);
    expect((await rowan.get(`/communities/${cairnholmSlug}`)).status).toBe(404);

    await rowan.action('lib/actions/preferences.ts#switchOrganisationAction', [{ organisationId: cairnholmId }]);
    expect((await rowan.get(`/communities/${cairnholmSlug}`)).status).toBe(200);
    expect((await rowan.get(`/communities/${nivalenSlug}`)).status).toBe(404);
    // The communities shown are Cairnholm's now (the switcher lists both organisations, so its names prove nothing).
    const list = visibleText((await rowan.get('/communities')).body);
    expect(list).toContain('Cairnholm');
    expect(list).not.toContain('Larchbend');
  });
});
