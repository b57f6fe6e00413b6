/**
 * The `assess` command of the engine contract: a community ground profile under scenarios and
 * planning horizons. Input schema and run: lib/engine/assess.ts.
 */
import { assessInputSchema, runAssessment } from '../../lib/engine/assess';
import { assessWorkerPool } from '../../lib/engine/assess-pool';
import type { EngineCommand } from './types';

export const assessCommand: EngineCommand<typeof assessInputSchema> = {
  schema: assessInputSchema,
  async run(input) {
    // The CLI runs scenarios on worker threads beside the main thread (both cores).
    const { output } = await runAssessment(input, { workers: assessWorkerPool });
    return output;
  },
};
