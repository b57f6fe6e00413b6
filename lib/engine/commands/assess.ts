import { z } from 'zod';
import type { EngineCommand } from './types';

// Placeholder until the assess command lands.
export const assessCommand: EngineCommand = {
  schema: z.object({}),
  run() {
    throw new Error('the assess command is not implemented yet');
  },
};
