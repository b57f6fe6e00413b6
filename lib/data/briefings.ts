import 'server-only';
import { forbidden, notFound } from 'next/navigation';
import { db } from '@/db/client';
import * as core from './core/briefing-lifecycle';
import { requireActor, type Actor } from './session';

/**
 * Briefings for pages and server actions: the session's actor handed to the lifecycle core
 * (lib/data/core/briefing-lifecycle.ts, where the role and organisation checks live). A refused role
 * becomes 403 (forbidden()), another organisation's or a missing briefing 404 (notFound()); a refused
 * transition (409/422) is rethrown as core.BriefingError for the action to turn into its message.
 */

export { BriefingError, type BriefingHistoryEntry, type CreateBriefingInput } from './core/briefing-lifecycle';

const asBriefingActor = (a: Actor): core.BriefingActor => ({ userId: a.userId, organisationId: a.organisationId, role: a.role });

async function run<T>(f: (actor: core.BriefingActor) => Promise<T>): Promise<T> {
  const actor = asBriefingActor(await requireActor());
  try {
    return await f(actor);
  } catch (e) {
    if (e instanceof core.BriefingError && e.status === 403) forbidden();
    if (e instanceof core.BriefingError && e.status === 404) notFound();
    throw e;
  }
}

export const createBriefing = (input: core.CreateBriefingInput) => run((a) => core.createBriefing(db, a, input));
export const submitBriefingForReview = (versionId: string) => run((a) => core.submitForReview(db, a, versionId));
export const publishBriefingVersion = (versionId: string) => run((a) => core.publishVersion(db, a, versionId));
export const addBriefingLanguage = (versionId: string, lang: string, strings: Record<string, string>, opts: { shipped: boolean }) =>
  run((a) => core.addLanguage(db, a, versionId, lang, strings, opts));
export const correctBriefingString = (versionId: string, lang: string, key: string, text: string) => run((a) => core.correctString(db, a, versionId, lang, key, text));
export const approveBriefingLanguage = (versionId: string, lang: string) => run((a) => core.approveLanguage(db, a, versionId, lang));
export const getBriefingHistory = (briefingId: string) => run((a) => core.briefingHistory(db, a, briefingId));
export const getBriefingStrings = (versionId: string, lang: string) => run((a) => core.briefingStringsOf(db, a, versionId, lang));
