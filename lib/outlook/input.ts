/**
 * The engine input of an outlook and its fingerprint. Server and tests only (it imports the engine's
 * schema); client components must not import this file.
 */
import { canonicalSha256, assessInputSchema, type AssessInput } from '@/lib/engine';
import { OUTLOOK_HORIZONS, OUTLOOK_SCENARIOS, orderScenarios } from './scenarios';

/** Every scenario (low → high) and the three planning horizons, on one site document. */
export function outlookInput(site: unknown): AssessInput {
  return { site: site as AssessInput['site'], scenarios: [...OUTLOOK_SCENARIOS], horizons: [...OUTLOOK_HORIZONS] };
}

/**
 * The engine's provenance hash of an input, computed without running it: SHA-256 of the validated
 * input (defaults applied) in RFC 8785 canonical JSON, exactly as lib/engine/assess.ts writes
 * `provenance.input_sha256` (checked in input.test.ts). Throws a ZodError on an invalid site.
 */
export function outlookInputSha256(input: AssessInput): string {
  return canonicalSha256(assessInputSchema.parse(input));
}

/** The engine input of a planner's choice of scenarios and horizons, in the fixed orders. */
export function outlookInputFor(site: unknown, choice: { scenarios: readonly string[]; horizons: readonly number[] }): AssessInput {
  return {
    site: site as AssessInput['site'],
    scenarios: orderScenarios(choice.scenarios) as AssessInput['scenarios'],
    horizons: [...new Set(choice.horizons)].sort((a, b) => a - b),
  };
}
