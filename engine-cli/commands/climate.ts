/**
 * `climate` command of the engine contract: global warming along an emission scenario.
 * Input `{ scenario, permafrost_carbon_feedback? }` (strict); output `{ years: [1850..2100],
 * global_warming_c: [...] }`, annual global-mean surface air temperature change [°C] relative to
 * the 1850–1900 mean, rounded to 0.0001 °C.
 */
import { z } from 'zod';
import { globalWarmingSeries } from '../../lib/engine/global-warming';
import { scenarioSchema } from '../../lib/engine/scenario-forcing';
import type { EngineCommand } from './types';

export const climateInputSchema = z.strictObject({
  scenario: scenarioSchema,
  permafrost_carbon_feedback: z.boolean().default(false),
});

export type ClimateInput = z.infer<typeof climateInputSchema>;
export interface ClimateOutput {
  years: number[];
  global_warming_c: number[];
}

export function runClimate(input: ClimateInput): ClimateOutput {
  const s = globalWarmingSeries(input.scenario, { permafrostCarbonFeedback: input.permafrost_carbon_feedback });
  return { years: [...s.years], global_warming_c: s.global_warming_c.map((v) => Math.round(v * 1e4) / 1e4) };
}

export const climateCommand: EngineCommand<typeof climateInputSchema, ClimateOutput> = {
  schema: climateInputSchema,
  run: runClimate,
};
