/**
 * Worker-thread entry of the assessment: runs scenarios from a shared history and posts the year
 * records back. Started by assess-pool.ts; one job at a time.
 *
 * Message in: `{ id, site, history: { params, carry2014 }, scenarios, lastYear, permafrostCarbonFeedback }`.
 * Message out: `{ id, ok: true, results: { scenario, records }[] }` or `{ id, ok: false, error }`.
 */
import { parentPort } from 'node:worker_threads';
import { prepareSite, runScenario, type SiteHistory } from './site-model';
import type { Site } from './site-schema';
import type { ScenarioId } from './scenario-forcing';

export interface WorkerJob {
  id: number;
  site: Site;
  history: Pick<SiteHistory, 'params' | 'carry2014'>;
  scenarios: ScenarioId[];
  lastYear: number;
  permafrostCarbonFeedback: boolean;
}

if (parentPort) {
  const port = parentPort;
  port.on('message', (job: WorkerJob | { id: number; ping: true }) => {
    if ('ping' in job) {
      port.postMessage({ id: job.id, ok: true, pong: true });
      return;
    }
    try {
      const p = prepareSite(job.site, { permafrostCarbonFeedback: job.permafrostCarbonFeedback });
      const results = job.scenarios.map((scenario) => ({ scenario, records: runScenario(p, job.history, scenario, job.lastYear) }));
      port.postMessage({ id: job.id, ok: true, results });
    } catch (e) {
      port.postMessage({ id: job.id, ok: false, error: e instanceof Error ? e.message : String(e) });
    }
  });
}
