import 'server-only';
import { randomBytes } from 'node:crypto';
import { and, asc, desc, eq, inArray } from 'drizzle-orm';
import type { Db, Tx } from '@/db/client';
import { briefingLanguages, briefings, briefingStrings, briefingVersions, communities, outlooks, type Role } from '@/db/schema';
import { hasRole, ROLES } from '@/lib/schemas/roles';
import { recordAuditEvent } from './audit-log';

/**
 * The briefing lifecycle, apart from the session (callers pass who acts): draft → in review →
 * published, a published version never changed and superseded by the next publication, languages
 * reviewed and approved by translators. Every check of role and organisation is here, so the session
 * wrapper (lib/data/briefings.ts), jobs and tests share it; every transition writes its audit event
 * in the same transaction as the change.
 *
 * Roles: planners (and admins) create, submit and publish (English with the version); translators
 * (and planners, admins) add a language, correct its strings and approve it; council members read.
 * Another organisation's briefing answers 404 exactly like a missing one; a lower role 403.
 */

export interface BriefingActor {
  userId: string;
  organisationId: string;
  role: Role;
}

export class BriefingError extends Error {
  constructor(
    public readonly status: 403 | 404 | 409 | 422,
    public readonly code: string,
  ) {
    super(code);
  }
}

export const SOURCE_LANGUAGE = 'en';
/** BCP 47 tag as the product accepts it: language, optional script and region (e.g. `iu-Cans`, `fr-CA`). */
const LANG_TAG = /^[a-z]{2,3}(-[A-Z][a-z]{3})?(-([A-Z]{2}|\d{3}))?$/;

function requireRole(actor: BriefingActor, allowed: readonly Role[]): void {
  if (!hasRole(actor, allowed)) throw new BriefingError(403, 'briefing.forbidden');
}

async function loadVersion(db: Db | Tx, actor: BriefingActor, versionId: string, forUpdate = false) {
  const q = db
    .select({ version: briefingVersions, organisationId: briefings.organisationId })
    .from(briefingVersions)
    .innerJoin(briefings, eq(briefings.id, briefingVersions.briefingId))
    .where(eq(briefingVersions.id, versionId))
    .limit(1);
  const [row] = forUpdate ? await q.for('update') : await q;
  if (!row || row.organisationId !== actor.organisationId) throw new BriefingError(404, 'briefing.not_found');
  return row.version;
}

const audit = (tx: Tx, actor: BriefingActor, event: Parameters<typeof recordAuditEvent>[0]['event'], subject: string, detail: Record<string, unknown>) =>
  recordAuditEvent({ event, organisationId: actor.organisationId, actorUserId: actor.userId, subject, detail, ip: null }, tx);

export interface CreateBriefingInput {
  communityId: string;
  /** Outlooks of the community's terrain units (one or more). */
  outlookIds: string[];
  numbersSha256: string;
  /** English strings generated from the numbers, by key. */
  strings: Record<string, string>;
}

/** Planners: a new briefing with version 1 as a draft in English. */
export async function createBriefing(db: Db, actor: BriefingActor, input: CreateBriefingInput): Promise<{ briefingId: string; versionId: string; publicId: string }> {
  requireRole(actor, ROLES.planning);
  if (input.outlookIds.length === 0) throw new BriefingError(422, 'briefing.outlooks.required');
  return db.transaction(async (tx) => {
    const [community] = await tx.select({ organisationId: communities.organisationId }).from(communities).where(eq(communities.id, input.communityId)).limit(1);
    if (!community || community.organisationId !== actor.organisationId) throw new BriefingError(404, 'briefing.not_found');
    const found = await tx.select({ id: outlooks.id, organisationId: outlooks.organisationId }).from(outlooks).where(inArray(outlooks.id, input.outlookIds));
    if (found.length !== new Set(input.outlookIds).size || found.some((o) => o.organisationId !== actor.organisationId)) {
      throw new BriefingError(404, 'briefing.not_found');
    }
    const briefingId = crypto.randomUUID();
    const versionId = crypto.randomUUID();
    const publicId = randomBytes(16).toString('base64url').slice(0, 22);
    await tx.insert(briefings).values({ id: briefingId, organisationId: actor.organisationId, communityId: input.communityId, publicId, createdByUserId: actor.userId });
    await insertDraftVersion(tx, { id: versionId, briefingId, version: 1 }, input);
    await audit(tx, actor, 'briefing.created', briefingId, { versionId, version: 1, outlookIds: input.outlookIds });
    return { briefingId, versionId, publicId };
  });
}

/** A draft version with its English language and strings (the first version and every later one). */
async function insertDraftVersion(tx: Tx, v: { id: string; briefingId: string; version: number }, input: Omit<CreateBriefingInput, 'communityId'>) {
  await tx.insert(briefingVersions).values({ ...v, outlookIds: input.outlookIds, numbersSha256: input.numbersSha256 });
  await tx.insert(briefingLanguages).values({ versionId: v.id, lang: SOURCE_LANGUAGE });
  await writeStrings(tx, v.id, SOURCE_LANGUAGE, input.strings, input.numbersSha256);
}

/** Inserts a language's strings; `kept` carries translators' corrections over by key. */
async function writeStrings(tx: Tx, versionId: string, lang: string, strings: Record<string, string>, numbersSha256: string, kept?: Map<string, { correction: string | null; correctedByUserId: string | null }>) {
  const rows = Object.entries(strings).map(([key, generated]) => {
    const k = kept?.get(key);
    return { versionId, lang, key, generated, numbersSha256, correction: k?.correction ?? null, correctedByUserId: k?.correctedByUserId ?? null };
  });
  if (rows.length > 0) await tx.insert(briefingStrings).values(rows);
}

/**
 * Planners: replaces a draft's generated strings of one language. A translator's correction is kept
 * when the numbers are unchanged (same SHA-256) and dropped with the numbers it was made for.
 */
export async function regenerateStrings(db: Db, actor: BriefingActor, versionId: string, lang: string, numbersSha256: string, strings: Record<string, string>): Promise<void> {
  requireRole(actor, ROLES.planning);
  await db.transaction(async (tx) => {
    const v = await loadVersion(tx, actor, versionId, true);
    if (v.state !== 'draft') throw new BriefingError(409, 'briefing.not_draft');
    const old = await tx.select().from(briefingStrings).where(and(eq(briefingStrings.versionId, versionId), eq(briefingStrings.lang, lang)));
    const kept = new Map(old.filter((s) => s.correction !== null && s.numbersSha256 === numbersSha256).map((s) => [s.key, s]));
    await tx.delete(briefingStrings).where(and(eq(briefingStrings.versionId, versionId), eq(briefingStrings.lang, lang)));
    await writeStrings(tx, versionId, lang, strings, numbersSha256, kept);
    await tx.update(briefingVersions).set({ numbersSha256 }).where(eq(briefingVersions.id, versionId));
  });
}

/** Planners: draft → in review (English and every added language go to review with it). */
export async function submitForReview(db: Db, actor: BriefingActor, versionId: string): Promise<void> {
  requireRole(actor, ROLES.planning);
  await db.transaction(async (tx) => {
    const v = await loadVersion(tx, actor, versionId, true);
    if (v.state !== 'draft') throw new BriefingError(409, 'briefing.not_draft');
    await tx.update(briefingVersions).set({ state: 'in_review' }).where(eq(briefingVersions.id, versionId));
    await tx.update(briefingLanguages).set({ state: 'in_review' }).where(and(eq(briefingLanguages.versionId, versionId), eq(briefingLanguages.state, 'draft')));
    await audit(tx, actor, 'briefing.submitted', v.briefingId, { versionId, version: v.version });
  });
}

/**
 * Planners: in review → published, English approved with it; the briefing's earlier published version
 * becomes superseded (still readable). Returns the languages approved at publication.
 */
export async function publishVersion(db: Db, actor: BriefingActor, versionId: string): Promise<{ languages: string[] }> {
  requireRole(actor, ROLES.planning);
  return db.transaction(async (tx) => {
    const v = await loadVersion(tx, actor, versionId, true);
    if (v.state !== 'in_review') throw new BriefingError(409, 'briefing.not_in_review');
    const now = new Date();
    const previous = await tx
      .select({ id: briefingVersions.id, version: briefingVersions.version })
      .from(briefingVersions)
      .where(and(eq(briefingVersions.briefingId, v.briefingId), eq(briefingVersions.state, 'published')))
      .for('update');
    for (const p of previous) {
      await tx.update(briefingVersions).set({ state: 'superseded' }).where(eq(briefingVersions.id, p.id));
      await audit(tx, actor, 'briefing.superseded', v.briefingId, { versionId: p.id, version: p.version, by: v.version });
    }
    await tx.update(briefingVersions).set({ state: 'published', publishedAt: now, publishedByUserId: actor.userId }).where(eq(briefingVersions.id, versionId));
    await tx
      .update(briefingLanguages)
      .set({ state: 'approved', approvedAt: now, approvedByUserId: actor.userId })
      .where(and(eq(briefingLanguages.versionId, versionId), eq(briefingLanguages.lang, SOURCE_LANGUAGE)));
    const approved = await tx.select({ lang: briefingLanguages.lang }).from(briefingLanguages).where(and(eq(briefingLanguages.versionId, versionId), eq(briefingLanguages.state, 'approved')));
    const languages = approved.map((l) => l.lang).sort();
    await audit(tx, actor, 'briefing.published', v.briefingId, { versionId, version: v.version, languages });
    return { languages };
  });
}

/** Planners: a new draft version after the latest one, from new outlooks (the published one stays as it is). */
export async function createNextVersion(db: Db, actor: BriefingActor, briefingId: string, input: Omit<CreateBriefingInput, 'communityId'>): Promise<{ versionId: string; version: number }> {
  requireRole(actor, ROLES.planning);
  return db.transaction(async (tx) => {
    const [b] = await tx.select().from(briefings).where(eq(briefings.id, briefingId)).limit(1).for('update');
    if (!b || b.organisationId !== actor.organisationId) throw new BriefingError(404, 'briefing.not_found');
    const [latest] = await tx.select().from(briefingVersions).where(eq(briefingVersions.briefingId, briefingId)).orderBy(desc(briefingVersions.version)).limit(1);
    if (latest && (latest.state === 'draft' || latest.state === 'in_review')) throw new BriefingError(409, 'briefing.open_version_exists');
    const version = (latest?.version ?? 0) + 1;
    const versionId = crypto.randomUUID();
    await insertDraftVersion(tx, { id: versionId, briefingId, version }, input);
    await audit(tx, actor, 'briefing.version_created', briefingId, { versionId, version });
    return { versionId, version };
  });
}

/**
 * Translators: adds a language to a version with its strings (generated from a shipped catalogue, or
 * supplied by the translator for a language the product does not ship). Also on a published version:
 * the language stays unpublished until approved.
 */
export async function addLanguage(db: Db, actor: BriefingActor, versionId: string, lang: string, strings: Record<string, string>, opts: { shipped: boolean }): Promise<void> {
  requireRole(actor, ROLES.translating);
  if (!LANG_TAG.test(lang) || lang === SOURCE_LANGUAGE) throw new BriefingError(422, 'briefing.lang.invalid');
  await db.transaction(async (tx) => {
    const v = await loadVersion(tx, actor, versionId, true);
    if (v.state === 'superseded') throw new BriefingError(409, 'briefing.superseded');
    const [exists] = await tx.select({ id: briefingLanguages.id }).from(briefingLanguages).where(and(eq(briefingLanguages.versionId, versionId), eq(briefingLanguages.lang, lang))).limit(1);
    if (exists) throw new BriefingError(409, 'briefing.lang.exists');
    const english = await tx.select({ key: briefingStrings.key }).from(briefingStrings).where(and(eq(briefingStrings.versionId, versionId), eq(briefingStrings.lang, SOURCE_LANGUAGE)));
    const missing = english.map((s) => s.key).filter((k) => !strings[k]?.trim());
    if (missing.length > 0) throw new BriefingError(422, 'briefing.strings.missing');
    await tx.insert(briefingLanguages).values({ versionId, lang, shipped: opts.shipped, state: v.state === 'draft' ? 'draft' : 'in_review' });
    await writeStrings(tx, versionId, lang, Object.fromEntries(english.map((s) => [s.key, strings[s.key]!])), v.numbersSha256);
    await audit(tx, actor, 'briefing.language_added', v.briefingId, { versionId, lang, shipped: opts.shipped });
  });
}

async function loadLanguage(tx: Tx, versionId: string, lang: string) {
  const [l] = await tx.select().from(briefingLanguages).where(and(eq(briefingLanguages.versionId, versionId), eq(briefingLanguages.lang, lang))).limit(1).for('update');
  if (!l) throw new BriefingError(404, 'briefing.not_found');
  return l;
}

/** Translators: corrects one string of a language not yet approved (approved text is fixed). */
export async function correctString(db: Db, actor: BriefingActor, versionId: string, lang: string, key: string, text: string): Promise<void> {
  requireRole(actor, ROLES.translating);
  if (!text.trim()) throw new BriefingError(422, 'briefing.correction.empty');
  await db.transaction(async (tx) => {
    const v = await loadVersion(tx, actor, versionId, true);
    if (v.state === 'superseded') throw new BriefingError(409, 'briefing.superseded');
    const l = await loadLanguage(tx, versionId, lang);
    if (l.state === 'approved') throw new BriefingError(409, 'briefing.lang.approved');
    const res = await tx
      .update(briefingStrings)
      .set({ correction: text, correctedByUserId: actor.userId })
      .where(and(eq(briefingStrings.versionId, versionId), eq(briefingStrings.lang, lang), eq(briefingStrings.key, key)));
    if (res[0].affectedRows !== 1) throw new BriefingError(404, 'briefing.not_found');
    await audit(tx, actor, 'briefing.string_corrected', v.briefingId, { versionId, lang, key });
  });
}

/**
 * Translators: approves a language other than English once the version is in review or published.
 * Returns whether the version is published (then the language joins the published briefing).
 */
export async function approveLanguage(db: Db, actor: BriefingActor, versionId: string, lang: string): Promise<{ published: boolean }> {
  requireRole(actor, ROLES.translating);
  if (lang === SOURCE_LANGUAGE) throw new BriefingError(409, 'briefing.lang.source');
  return db.transaction(async (tx) => {
    const v = await loadVersion(tx, actor, versionId, true);
    if (v.state !== 'in_review' && v.state !== 'published') throw new BriefingError(409, 'briefing.not_in_review');
    const l = await loadLanguage(tx, versionId, lang);
    if (l.state === 'approved') throw new BriefingError(409, 'briefing.lang.approved');
    await tx.update(briefingLanguages).set({ state: 'approved', approvedAt: new Date(), approvedByUserId: actor.userId }).where(eq(briefingLanguages.id, l.id));
    await audit(tx, actor, 'briefing.language_approved', v.briefingId, { versionId, version: v.version, lang });
    return { published: v.state === 'published' };
  });
}

export interface BriefingHistoryEntry {
  versionId: string;
  version: number;
  state: string;
  publishedAt: string | null;
  languages: { lang: string; state: string; shipped: boolean }[];
}

/** Any member: every version of the briefing, newest first, with each language's state. */
export async function briefingHistory(db: Db, actor: BriefingActor, briefingId: string): Promise<BriefingHistoryEntry[]> {
  const [b] = await db.select({ organisationId: briefings.organisationId }).from(briefings).where(eq(briefings.id, briefingId)).limit(1);
  if (!b || b.organisationId !== actor.organisationId) throw new BriefingError(404, 'briefing.not_found');
  const versions = await db.select().from(briefingVersions).where(eq(briefingVersions.briefingId, briefingId)).orderBy(desc(briefingVersions.version));
  const langs = versions.length
    ? await db.select().from(briefingLanguages).where(inArray(briefingLanguages.versionId, versions.map((v) => v.id))).orderBy(asc(briefingLanguages.lang))
    : [];
  return versions.map((v) => ({
    versionId: v.id,
    version: v.version,
    state: v.state,
    publishedAt: v.publishedAt?.toISOString() ?? null,
    languages: langs.filter((l) => l.versionId === v.id).map((l) => ({ lang: l.lang, state: l.state, shipped: l.shipped })),
  }));
}

/** Any member: the strings of one language of a version (the correction where there is one). */
export async function briefingStringsOf(db: Db, actor: BriefingActor, versionId: string, lang: string): Promise<Record<string, { text: string; generated: string; corrected: boolean }>> {
  await loadVersion(db, actor, versionId);
  const rows = await db.select().from(briefingStrings).where(and(eq(briefingStrings.versionId, versionId), eq(briefingStrings.lang, lang))).orderBy(asc(briefingStrings.key));
  return Object.fromEntries(rows.map((r) => [r.key, { text: r.correction ?? r.generated, generated: r.generated, corrected: r.correction !== null }]));
}
