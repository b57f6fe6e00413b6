import 'server-only';
import type { Db } from '@/db/connect';
import type { AssessOptions } from '@/lib/engine';
import { OUTLOOK_JOB, outlookJobHandler } from './kinds/outlook';
import type { JobHandler } from './runner';

/** Every job kind the worker runs, by name. A new kind adds its handler here. */
export function jobHandlers(db: Db, engineOptions: Pick<AssessOptions, 'workers' | 'workerThreads'> = {}): Record<string, JobHandler> {
  return {
    [OUTLOOK_JOB]: outlookJobHandler(db, engineOptions),
  };
}
