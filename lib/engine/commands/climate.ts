import { z } from 'zod';
import type { EngineCommand } from './types';

// Placeholder until the climate command lands.
export const climateCommand: EngineCommand = {
  schema: z.object({}),
  run() {
    throw new Error('the climate command is not implemented yet');
  },
};
