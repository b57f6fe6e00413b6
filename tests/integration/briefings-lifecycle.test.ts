/**
 * The briefing lifecycle against a real MariaDB (throw-away, migrated, demo-seeded): draft → in
 * review → published; a published version superseded by the next and still readable; roles
 * (planner publishes, translator corrects and approves a language, council member reads, another
 * organisation 404); translators' corrections surviving a regeneration of unchanged numbers; and an
 * audit event for every transition, rolled back with a refused one.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { and, asc, eq, like } from 'drizzle-orm';
import { seedDemo } from '@/db/seed';
import { auditEvents, briefingVersions, communities, groundProfiles, groundProfileVersions, memberships, organisations, users } from '@/db/schema';
import { storeOutlook } from '@/lib/data/core/outlook-store';
import {
  addLanguage,
  approveLanguage,
  BriefingError,
  briefingHistory,
  briefingStringsOf,
  correctString,
  createBriefing,
  createNextVersion,
  publishVersion,
  regenerateStrings,
  submitForReview,
  type BriefingActor,
} from '@/lib/data/core/briefing-lifecycle';
import { createThrowawayDb, type ThrowawayDb } from './throwaway-db';

let t: ThrowawayDb;
let planner: BriefingActor, translator: BriefingActor, council: BriefingActor, other: BriefingActor;
let communityId = '';
let outlookId = '';

const strings = { 'keyMessages.0': 'Thaw reaches 2.1 m by 2050.', 'cautions.designBasis': 'A screening estimate, not a design basis.' };
const fr = { 'keyMessages.0': 'Le dégel atteint 2,1 m en 2050.', 'cautions.designBasis': 'Une estimation de dépistage.' };

async function actorOf(email: string, orgSlug: string): Promise<BriefingActor> {
  const [row] = await t.db
    .select({ userId: users.id, organisationId: organisations.id, role: memberships.role })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .innerJoin(organisations, eq(organisations.id, memberships.organisationId))
    .where(and(eq(users.email, email), eq(organisations.slug, orgSlug)));
  if (!row) throw new Error(`no member ${email} in ${orgSlug}`);
  return row;
}

const rejects = async (p: Promise<unknown>, status: number, code?: string) => {
  const e = await p.then(() => null, (x: unknown) => x);
  expect(e).toBeInstanceOf(BriefingError);
  expect((e as BriefingError).status).toBe(status);
  if (code) expect((e as BriefingError).code).toBe(code);
};

const events = async (subject: string) =>
  (await t.db.select({ event: auditEvents.event }).from(auditEvents).where(and(eq(auditEvents.subject, subject), like(auditEvents.event, 'briefing.%'))).orderBy(asc(auditEvents.id))).map((e) => e.event);

beforeAll(async () => {
  t = await createThrowawayDb();
  await seedDemo(t.db);
  const members = await t.db
    .select({ email: users.email, role: memberships.role, slug: organisations.slug })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .innerJoin(organisations, eq(organisations.id, memberships.organisationId));
  const find = (role: string, slug: string) => members.find((m) => m.role === role && m.slug === slug)!;
  planner = await actorOf(find('planner', 'nivalen-regional-office').email, 'nivalen-regional-office');
  translator = await actorOf(find('translator', 'nivalen-regional-office').email, 'nivalen-regional-office');
  council = await actorOf(find('council', 'nivalen-regional-office').email, 'nivalen-regional-office');
  const otherOrg = members.find((m) => m.slug !== 'nivalen-regional-office' && (m.role === 'planner' || m.role === 'admin'))!;
  other = await actorOf(otherOrg.email, otherOrg.slug);
  const [v] = await t.db
    .select({ versionId: groundProfileVersions.id, communityId: communities.id })
    .from(groundProfileVersions)
    .innerJoin(groundProfiles, eq(groundProfiles.id, groundProfileVersions.profileId))
    .innerJoin(communities, eq(communities.id, groundProfiles.communityId))
    .where(eq(communities.organisationId, planner.organisationId))
    .limit(1);
  communityId = v!.communityId;
  const doc = { baseline: {}, results: [], provenance: { engine_version: '0.1.0', input_sha256: 'c'.repeat(64), profile_sha256: 'p', sources: ['s'] } };
  outlookId = (
    await t.db.transaction((tx) =>
      storeOutlook({ profileVersionId: v!.versionId, scenarios: ['SSP2-4.5'], horizons: [2050], result: doc }, { organisationId: planner.organisationId, userId: planner.userId }, tx),
    )
  ).id;
});
afterAll(async () => {
  await t?.drop();
});

const create = (actor = planner) => createBriefing(t.db, actor, { communityId, outlookIds: [outlookId], numbersSha256: 'n1', strings });

describe('briefing lifecycle', () => {
  it('goes draft → in review → published with an audit event for each step', async () => {
    const b = await create();
    expect(b.publicId).toMatch(/^[A-Za-z0-9_-]{22}$/);
    await submitForReview(t.db, planner, b.versionId);
    expect(await publishVersion(t.db, planner, b.versionId)).toEqual({ languages: ['en'] });
    expect(await events(b.briefingId)).toEqual(['briefing.created', 'briefing.submitted', 'briefing.published']);
    const [h] = await briefingHistory(t.db, council, b.briefingId);
    expect(h).toMatchObject({ version: 1, state: 'published', languages: [{ lang: 'en', state: 'approved', shipped: true }] });
    expect(h!.publishedAt).not.toBeNull();
  });

  it('refuses skipped or repeated steps (409) and writes no event for them', async () => {
    const b = await create();
    await rejects(publishVersion(t.db, planner, b.versionId), 409, 'briefing.not_in_review');
    await submitForReview(t.db, planner, b.versionId);
    await rejects(submitForReview(t.db, planner, b.versionId), 409, 'briefing.not_draft');
    await rejects(regenerateStrings(t.db, planner, b.versionId, 'en', 'n1', strings), 409, 'briefing.not_draft');
    expect(await events(b.briefingId)).toEqual(['briefing.created', 'briefing.submitted']);
  });

  it('supersedes the published version with the next publication and keeps the history readable', async () => {
    const b = await create();
    await submitForReview(t.db, planner, b.versionId);
    await publishVersion(t.db, planner, b.versionId);
    const v2 = await createNextVersion(t.db, planner, b.briefingId, { outlookIds: [outlookId], numbersSha256: 'n2', strings: { ...strings, 'keyMessages.0': 'Thaw reaches 2.3 m by 2050.' } });
    expect(v2.version).toBe(2);
    await rejects(createNextVersion(t.db, planner, b.briefingId, { outlookIds: [outlookId], numbersSha256: 'n3', strings }), 409, 'briefing.open_version_exists');
    await submitForReview(t.db, planner, v2.versionId);
    await publishVersion(t.db, planner, v2.versionId);
    const history = await briefingHistory(t.db, council, b.briefingId);
    expect(history.map((h) => [h.version, h.state])).toEqual([[2, 'published'], [1, 'superseded']]);
    // The superseded version's text is what was published, and it can no longer be changed.
    expect((await briefingStringsOf(t.db, council, b.versionId, 'en'))['keyMessages.0']!.text).toBe('Thaw reaches 2.1 m by 2050.');
    await rejects(addLanguage(t.db, translator, b.versionId, 'fr', fr, { shipped: true }), 409, 'briefing.superseded');
    expect(await events(b.briefingId)).toEqual(['briefing.created', 'briefing.submitted', 'briefing.published', 'briefing.version_created', 'briefing.submitted', 'briefing.superseded', 'briefing.published']);
  });

  it('lets a translator add, correct and approve a language; approved text is fixed', async () => {
    const b = await create();
    await addLanguage(t.db, translator, b.versionId, 'fr', fr, { shipped: true });
    await correctString(t.db, translator, b.versionId, 'fr', 'keyMessages.0', 'Le dégel atteint 2,1 m d’ici 2050.');
    await rejects(approveLanguage(t.db, translator, b.versionId, 'fr'), 409, 'briefing.not_in_review');
    await submitForReview(t.db, planner, b.versionId);
    await publishVersion(t.db, planner, b.versionId);
    // Approved after publication: the language joins the published version.
    expect(await approveLanguage(t.db, translator, b.versionId, 'fr')).toEqual({ published: true });
    await rejects(correctString(t.db, translator, b.versionId, 'fr', 'keyMessages.0', 'autre'), 409, 'briefing.lang.approved');
    await rejects(correctString(t.db, translator, b.versionId, 'en', 'keyMessages.0', 'other'), 409, 'briefing.lang.approved');
    const s = await briefingStringsOf(t.db, council, b.versionId, 'fr');
    expect(s['keyMessages.0']).toEqual({ text: 'Le dégel atteint 2,1 m d’ici 2050.', generated: fr['keyMessages.0'], corrected: true });
    const [h] = await briefingHistory(t.db, planner, b.briefingId);
    expect(h!.languages).toEqual([{ lang: 'en', state: 'approved', shipped: true }, { lang: 'fr', state: 'approved', shipped: true }]);
  });

  it('accepts a language the product does not ship only with every string supplied', async () => {
    const b = await create();
    await rejects(addLanguage(t.db, translator, b.versionId, 'iu-Cans', { 'keyMessages.0': 'ᐅᖃᐅᓯᖅ' }, { shipped: false }), 422, 'briefing.strings.missing');
    await rejects(addLanguage(t.db, translator, b.versionId, 'not a tag', fr, { shipped: false }), 422, 'briefing.lang.invalid');
    await addLanguage(t.db, translator, b.versionId, 'iu-Cans', { 'keyMessages.0': 'ᐅᖃᐅᓯᖅ', 'cautions.designBasis': 'ᖃᐅᔨᓴᕐᓂᖅ' }, { shipped: false });
    await rejects(addLanguage(t.db, translator, b.versionId, 'iu-Cans', fr, { shipped: false }), 409, 'briefing.lang.exists');
    const [h] = await briefingHistory(t.db, translator, b.briefingId);
    expect(h!.languages).toContainEqual({ lang: 'iu-Cans', state: 'draft', shipped: false });
    expect((await briefingStringsOf(t.db, translator, b.versionId, 'iu-Cans'))['keyMessages.0']!.text).toBe('ᐅᖃᐅᓯᖅ');
  });

  it('keeps a correction when the same numbers are regenerated and drops it when they change', async () => {
    const b = await create();
    await correctString(t.db, translator, b.versionId, 'en', 'keyMessages.0', 'Thaw reaches about 2.1 m by 2050.');
    await regenerateStrings(t.db, planner, b.versionId, 'en', 'n1', strings);
    expect((await briefingStringsOf(t.db, planner, b.versionId, 'en'))['keyMessages.0']).toMatchObject({ text: 'Thaw reaches about 2.1 m by 2050.', corrected: true });
    await regenerateStrings(t.db, planner, b.versionId, 'en', 'n9', { ...strings, 'keyMessages.0': 'Thaw reaches 2.6 m by 2050.' });
    expect((await briefingStringsOf(t.db, planner, b.versionId, 'en'))['keyMessages.0']).toEqual({ text: 'Thaw reaches 2.6 m by 2050.', generated: 'Thaw reaches 2.6 m by 2050.', corrected: false });
  });

  it('answers 403 to lower roles and 404 to another organisation', async () => {
    const b = await create();
    await rejects(create(translator), 403);
    await rejects(create(council), 403);
    await rejects(submitForReview(t.db, translator, b.versionId), 403);
    await rejects(correctString(t.db, council, b.versionId, 'en', 'keyMessages.0', 'x'), 403);
    await rejects(approveLanguage(t.db, council, b.versionId, 'fr'), 403);
    await rejects(submitForReview(t.db, other, b.versionId), 404, 'briefing.not_found');
    await rejects(briefingHistory(t.db, other, b.briefingId), 404);
    await rejects(briefingStringsOf(t.db, other, b.versionId, 'en'), 404);
    // Another organisation's community or outlook is not found either.
    await rejects(create(other), 404);
    const [v] = await t.db.select({ state: briefingVersions.state }).from(briefingVersions).where(eq(briefingVersions.id, b.versionId));
    expect(v!.state).toBe('draft');
    expect(await events(b.briefingId)).toEqual(['briefing.created']);
  });
});
