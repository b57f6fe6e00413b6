'use server';

import { failure, validatedAction, type ActionResult } from '@/lib/server/validated-action';
import { runOutlookSchema } from '@/lib/schemas/outlook';
import { OutlookInputRefused, runOutlook } from '@/lib/data/outlooks';

/**
 * Runs the outlook of a ground profile's current version. Planners and admins only: the data layer
 * checks the role (403) and the organisation (404). The client refreshes the page afterwards, so
 * nothing here re-renders a page.
 */
export const runOutlookAction = validatedAction(runOutlookSchema, async ({ communitySlug, profileSlug }): Promise<ActionResult<{ id: string; reused: boolean }>> => {
  let outcome: Awaited<ReturnType<typeof runOutlook>>;
  try {
    outcome = await runOutlook(communitySlug, profileSlug);
  } catch (e) {
    if (e instanceof OutlookInputRefused) return failure(`The ground profile's inputs do not pass the engine's checks: ${e.message}`);
    throw e;
  }
  const { id, reused } = outcome;
  return { ok: true, message: reused ? 'The stored outlook of these inputs is shown.' : 'The outlook is ready.', data: { id, reused } };
});
