import 'server-only';
import { db } from '@/db/client';
import type { JobDto } from '@/lib/schemas/api/dto';
import { getJob, type Job } from '@/lib/jobs/queue';
import { apiActor, apiOwnOr404 } from './session';

/**
 * Jobs as members see them: any member of the job's organisation may follow its progress; another
 * organisation's job answers 404 like a missing one.
 */

export function toJobDto(job: Job): JobDto {
  return {
    id: job.id,
    kind: job.kind,
    state: job.state,
    progress: job.progress,
    stage: job.stage,
    attempts: job.attempts,
    error: job.state === 'failed' ? job.error : null,
    result: job.state === 'succeeded' ? (job.result ?? null) : null,
    createdAt: job.createdAt.toISOString(),
    updatedAt: job.updatedAt.toISOString(),
  };
}

export async function getJobForMember(id: string): Promise<JobDto> {
  const actor = await apiActor();
  const job = await getJob(db, id);
  apiOwnOr404(job?.organisationId, actor);
  return toJobDto(job!);
}
