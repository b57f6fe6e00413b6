/**
 * The five AR6 illustrative emission scenarios, their words, and the forcing lookup.
 *
 * Words: IPCC AR6 WG1 SPM (B.1 and Table SPM.1) calls SSP1-1.9 and SSP1-2.6 "very low" and "low",
 * SSP2-4.5 "intermediate", SSP3-7.0 "high" and SSP5-8.5 "very high" greenhouse-gas emissions scenarios.
 * References: [1] IPCC, 2021: Summary for Policymakers, in Climate Change 2021: The Physical Science
 * Basis, doi:10.1017/9781009157896.001.
 */
import { z } from 'zod';
import { scenarioErfWm2, type ScenarioId } from './data/ssp-forcing';

export type { ScenarioId } from './data/ssp-forcing';

/** Scenario identifiers, ordered from the lowest to the highest emissions. */
export const SCENARIOS = ['SSP1-1.9', 'SSP1-2.6', 'SSP2-4.5', 'SSP3-7.0', 'SSP5-8.5'] as const satisfies readonly ScenarioId[];

/** AR6 words for each scenario's emissions level [1]. */
export const SCENARIO_EMISSIONS_WORDS: Readonly<Record<ScenarioId, 'very low' | 'low' | 'intermediate' | 'high' | 'very high'>> = {
  'SSP1-1.9': 'very low',
  'SSP1-2.6': 'low',
  'SSP2-4.5': 'intermediate',
  'SSP3-7.0': 'high',
  'SSP5-8.5': 'very high',
};

/** zod schema of a scenario identifier (the message lists the allowed values). */
export const scenarioSchema = z.enum(SCENARIOS);

/**
 * Total effective radiative forcing [W m-2] relative to 1750 for a scenario and year.
 * @param scenario AR6 SSP identifier.
 * @param year Calendar year, 1750–2100 (clamped outside).
 */
export function effectiveRadiativeForcingWm2(scenario: ScenarioId, year: number): number {
  return scenarioErfWm2(scenario, year);
}

