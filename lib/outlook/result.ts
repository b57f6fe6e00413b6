/**
 * The parts of the engine's stored `assess` document (engine contract, docs/engine-contract.md)
 * that the outlook page shows, read with zod so that a stored document of an older engine version
 * that lacks a field fails loudly instead of drawing nonsense. Unknown fields are dropped: the page
 * gets only what it shows.
 */
import { z } from 'zod';

export const HAZARD_LEVELS = ['low', 'moderate', 'high'] as const;
export type HazardLevel = (typeof HAZARD_LEVELS)[number];
export const CONFIDENCE_LEVELS = ['measured_inputs', 'partly_measured_inputs', 'assumed_inputs'] as const;
export type ConfidenceLevel = (typeof CONFIDENCE_LEVELS)[number];

const windowFields = {
  window: z.tuple([z.int(), z.int()]),
  air_temperature_c: z.number(),
  thawing_index_c_days: z.number(),
  freezing_index_c_days: z.number(),
  seasonal_thaw_m: z.number(),
  permafrost_table_m: z.number().nullable(),
  talik: z.boolean(),
  talik_onset_year: z.int().nullable(),
  ground_temperature_c: z.number(),
  ground_temperature_depth_m: z.number(),
  settlement_m: z.number(),
  hazard: z.enum(HAZARD_LEVELS),
  hazard_label: z.string(),
  hazard_reasons: z.array(z.string()),
  not_modelled: z.array(z.string()),
  confidence: z.enum(CONFIDENCE_LEVELS),
};

const envelopeFields = {
  depths_m: z.array(z.number()),
  min_c: z.array(z.number()),
  max_c: z.array(z.number()),
};

export const outlookResultSchema = z.object({
  baseline: z.object({ period: z.tuple([z.int(), z.int()]), ...windowFields, envelope: z.object(envelopeFields) }),
  results: z.array(z.object({ scenario: z.string(), horizon: z.int(), ...windowFields })),
  annual: z.array(
    z.object({
      scenario: z.string(),
      year: z.int(),
      air_temperature_c: z.number(),
      seasonal_thaw_m: z.number(),
      ground_temperature_c: z.number(),
      settlement_m: z.number(),
    }),
  ),
  envelopes: z.array(z.object({ scenario: z.string(), horizon: z.int(), ...envelopeFields })),
  provenance: z.object({ engine_version: z.string(), input_sha256: z.string(), sources: z.array(z.string()) }),
});

export type OutlookResult = z.output<typeof outlookResultSchema>;
export type WindowResult = OutlookResult['results'][number];
export type BaselineResult = OutlookResult['baseline'];
export type Envelope = OutlookResult['envelopes'][number];
