import { z } from 'zod';
import type { EngineCommand } from './types';

// Placeholder until the ground command lands.
export const groundCommand: EngineCommand = {
  schema: z.object({}),
  run() {
    throw new Error('the ground command is not implemented yet');
  },
};
