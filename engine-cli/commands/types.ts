import type { z } from 'zod';

/** One engine command: its input schema and a pure function from validated input to output. */
export interface EngineCommand<S extends z.ZodType = z.ZodType, O = unknown> {
  schema: S;
  run(input: z.infer<S>): O | Promise<O>;
}
