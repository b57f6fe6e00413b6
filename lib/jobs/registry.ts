import 'server-only';
import type { Db } from '@/db/connect';
import type { AssessOptions } from '@/lib/engine';
import { EMAIL_JOB } from '@/lib/mail/outbox';
import { emailJobHandler } from './kinds/email';
import { OUTLOOK_JOB, outlookJobHandler } from './kinds/outlook';
import type { JobHandler } from './runner';

/**
 * Every job kind the worker runs, by name, in two lanes: heavy work (engine runs, renderings) that
 * takes the cores, and light work (e-mail) that must never wait behind it. A worker process runs
 * each lane with slots of its own. A new kind adds its handler to one lane here.
 */
export function jobLanes(db: Db, engineOptions: Pick<AssessOptions, 'workers' | 'workerThreads'> = {}): { heavy: Record<string, JobHandler>; light: Record<string, JobHandler> } {
  return {
    heavy: { [OUTLOOK_JOB]: outlookJobHandler(db, engineOptions) },
    light: { [EMAIL_JOB]: emailJobHandler() },
  };
}
