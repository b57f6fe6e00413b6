/**
 * The JSON that the v1 API answers with and accepts: zod schemas shared by the route handlers (they
 * validate on the way in and type on the way out), the typed client fetchers (lib/api-client) and
 * the OpenAPI document (lib/schemas/api/openapi.ts, generated from these schemas). Client-safe.
 */
import { z } from 'zod';
import { OUTLOOK_SCENARIOS } from '@/lib/outlook/scenarios';
import { HAZARD_LEVELS } from '@/lib/outlook/result';

/** Decades an outlook may be run for (the engine's HORIZONS; checked equal in a unit test). */
export const API_HORIZONS = [2030, 2040, 2050, 2060, 2070, 2080, 2090] as const;

export const errorDto = z
  .object({
    error: z.object({
      code: z.string().meta({ description: 'Stable machine-readable code, e.g. not_found, forbidden, invalid_input.' }),
      message: z.string().meta({ description: 'One sentence for a person.' }),
      fields: z.record(z.string(), z.array(z.string())).optional().meta({ description: 'Problems by field path (invalid_input only).' }),
    }),
  })
  .meta({ id: 'Error' });
export type ErrorDto = z.infer<typeof errorDto>;

export const idParam = z.string().regex(/^[0-9a-f-]{36}$/, 'must be an id (36 characters: hex digits and hyphens)').meta({ description: 'A UUID.' });
export const slugParam = z.string().regex(/^[a-z0-9-]{1,80}$/, 'must be a slug (lowercase letters, digits and hyphens)').meta({ description: 'A community slug.' });

export const ratingDto = z
  .object({
    level: z.enum(HAZARD_LEVELS),
    scenario: z.string(),
    horizon: z.int(),
    outlookId: z.string(),
    /** The outlook is of an older profile version or engine. */
    stale: z.boolean(),
  })
  .meta({ id: 'Rating', description: 'The highest level of concern of the latest outlook of a terrain unit, and where it occurs.' });

export const terrainUnitDto = z
  .object({ id: z.string(), slug: z.string(), name: z.string(), currentVersion: z.int(), latestRating: ratingDto.nullable() })
  .meta({ id: 'TerrainUnit' });

export const communityDto = z
  .object({
    slug: z.string(),
    name: z.string(),
    latitudeDeg: z.number(),
    longitudeDeg: z.number(),
    languages: z.array(z.string()),
    population: z.string().nullable(),
    description: z.string().nullable(),
    isDemo: z.boolean().meta({ description: 'Invented demonstration data.' }),
    terrainUnits: z.array(terrainUnitDto),
  })
  .meta({ id: 'Community' });
export type CommunityDto = z.infer<typeof communityDto>;

export const communityListDto = z.object({ communities: z.array(communityDto) }).meta({ id: 'CommunityList' });
export type CommunityListDto = z.infer<typeof communityListDto>;

export const profileDto = z
  .object({
    id: z.string(),
    slug: z.string(),
    name: z.string(),
    community: z.object({ slug: z.string(), name: z.string(), isDemo: z.boolean() }),
    currentVersion: z.int(),
    updatedAt: z.string(),
    site: z.record(z.string(), z.unknown()).meta({ description: "The current version's site document (docs/site-schema.md)." }),
    versions: z.array(z.object({ version: z.int(), createdAt: z.string(), sourceNote: z.string().nullable() })),
  })
  .meta({ id: 'GroundProfile' });
export type ProfileDto = z.infer<typeof profileDto>;

export const JOB_STATES = ['queued', 'running', 'succeeded', 'failed', 'cancelled'] as const;

export const jobDto = z
  .object({
    id: z.string(),
    kind: z.string(),
    state: z.enum(JOB_STATES),
    progress: z.number().min(0).max(1),
    stage: z.string().nullable().meta({ description: 'Short stage code: starting, history, scenarios, summary, storing, done.' }),
    attempts: z.int(),
    error: z.string().nullable().meta({ description: 'Why the job failed (failed jobs only).' }),
    result: z.record(z.string(), z.unknown()).nullable().meta({ description: 'The answer of a succeeded job; an outlook job: { outlookId }.' }),
    createdAt: z.string(),
    updatedAt: z.string(),
  })
  .meta({ id: 'Job' });
export type JobDto = z.infer<typeof jobDto>;

export const outlookRequestBody = z
  .strictObject({
    horizons: z
      .array(z.number().refine((v) => (API_HORIZONS as readonly number[]).includes(v), 'must be a decade from 2030 to 2090'))
      .min(1, 'choose at least one horizon')
      .max(API_HORIZONS.length)
      .refine((l) => new Set(l).size === l.length, 'lists a horizon twice'),
    scenarios: z
      .array(z.enum(OUTLOOK_SCENARIOS))
      .min(1, 'choose at least one scenario')
      .max(OUTLOOK_SCENARIOS.length)
      .refine((l) => new Set(l).size === l.length, 'lists a scenario twice'),
  })
  .meta({ id: 'OutlookRequest' });
export type OutlookRequestBody = z.infer<typeof outlookRequestBody>;

export const outlookRequestDto = z.object({ job: jobDto }).meta({ id: 'OutlookRequested' });
export type OutlookRequestDto = z.infer<typeof outlookRequestDto>;

export const outlookDto = z
  .object({
    id: z.string(),
    profileId: z.string(),
    profileVersion: z.int(),
    engineVersion: z.string(),
    inputSha256: z.string(),
    computedAt: z.string(),
    scenarios: z.array(z.string()),
    horizons: z.array(z.int()),
    result: z.record(z.string(), z.unknown()).meta({ description: "The engine's assess document (docs/engine-contract.md)." }),
  })
  .meta({ id: 'Outlook' });
export type OutlookDto = z.infer<typeof outlookDto>;
