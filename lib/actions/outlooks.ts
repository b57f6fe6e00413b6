'use server';

import { failure, validatedAction, type ActionResult } from '@/lib/server/validated-action';
import { runOutlookSchema } from '@/lib/schemas/outlook';
import type { JobDto } from '@/lib/schemas/api/dto';
import { OutlookInputRefused, requestOutlook } from '@/lib/data/outlooks';

/**
 * Queues the outlook of a ground profile's current version for the chosen scenarios and horizons
 * (planners and admins: the data layer checks the role, 403, and the organisation, 404) and answers
 * at once with the job; the page follows it through GET /api/v1/jobs/{id}. A worker process runs it.
 */
export const runOutlookAction = validatedAction(runOutlookSchema, async ({ communitySlug, profileSlug, scenarios, horizons }): Promise<ActionResult<{ job: JobDto }>> => {
  try {
    const job = await requestOutlook(communitySlug, profileSlug, { scenarios, horizons });
    return { ok: true, data: { job } };
  } catch (e) {
    if (e instanceof OutlookInputRefused) return failure(`The ground profile's inputs do not pass the engine's checks: ${e.message}`);
    throw e;
  }
});
