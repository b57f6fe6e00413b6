import 'server-only';
import { z } from 'zod';
import type { Db } from '@/db/connect';
import { EngineInputError, formatIssues, runAssessment, type AssessOptions, type AssessProgress } from '@/lib/engine';
import { profileVersionSite, storeOutlook } from '@/lib/data/core/outlook-store';
import { PermanentJobError } from '../queue';
import type { JobHandler } from '../runner';

/**
 * Job kind "outlook": runs the engine's assessment of one ground-profile version under the chosen
 * scenarios and horizons and stores the outlook (lib/data/core/outlook-store.ts), answering
 * `{ outlookId, reused }`. The request that queued it checked the role and the organisation; the
 * job re-checks that the version still belongs to the job's organisation.
 */
export const OUTLOOK_JOB = 'outlook';

export const outlookJobPayload = z.strictObject({
  profileVersionId: z.string().min(1),
  scenarios: z.array(z.string()).min(1),
  horizons: z.array(z.number()).min(1),
});
export type OutlookJobPayload = z.infer<typeof outlookJobPayload>;

/** Stage codes the page turns into words (outlook.job.stage.* messages). */
const STAGE: Record<AssessProgress['stage'], string> = { history: 'history', scenarios: 'scenarios', summary: 'summary' };

export function outlookJobHandler(db: Db, engineOptions: Pick<AssessOptions, 'workers' | 'workerThreads' | 'cache'> = {}): JobHandler {
  return async ({ job, progress }) => {
    const parsed = outlookJobPayload.safeParse(job.payload);
    if (!parsed.success || !job.organisationId) throw new PermanentJobError(`the job's payload is not an outlook request: ${parsed.success ? 'no organisation' : formatIssues(parsed.error).join('; ')}`);
    const payload = parsed.data;
    const site = await profileVersionSite(db, payload.profileVersionId, job.organisationId);
    if (!site) throw new PermanentJobError('the ground-profile version is gone or not one of this organisation');
    progress(0.01, 'starting');
    let output;
    try {
      ({ output } = await runAssessment(
        { site: site as never, scenarios: payload.scenarios as never, horizons: payload.horizons },
        { ...engineOptions, onProgress: (p) => progress(p.fraction, STAGE[p.stage]) },
      ));
    } catch (e) {
      if (e instanceof z.ZodError) throw new PermanentJobError(`the ground profile's inputs do not pass the engine's checks: ${formatIssues(e).join('; ')}`);
      if (e instanceof EngineInputError) throw new PermanentJobError(`the ground profile's inputs do not pass the engine's checks: ${e.message}`);
      throw e;
    }
    progress(0.99, 'storing');
    const stored = await db.transaction((tx) =>
      storeOutlook(
        { profileVersionId: payload.profileVersionId, scenarios: payload.scenarios, horizons: payload.horizons, result: output },
        { organisationId: job.organisationId!, userId: job.createdByUserId },
        tx,
      ),
    );
    return { outlookId: stored.id, reused: stored.reused };
  };
}
