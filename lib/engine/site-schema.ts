/**
 * The engine's own schema of a community ground profile ("site"): the one source for the CLI's
 * `assess` command, the application's forms and its CSV uploads (docs/site-schema.md documents
 * every field; the README includes that page).
 *
 * Conventions: SI units, the unit is the suffix of every field name; objects are strict (an
 * unknown or misspelled field is an error, so that a typo never silently drops an input).
 *
 * Depth of the column: the heat-conduction model needs ground to at least
 * {@link MIN_COLUMN_DEPTH_M} (heat reaches tens of metres in a century). When the layers given
 * stop short of that depth, the engine extends the LAST layer given (whatever its texture) down to
 * it, and reports the extension in its output (`column_extended_to_m`) as an assumed input. Give a
 * bedrock layer last if bedrock is known; the schema does not invent one.
 *
 * Ground ice: `ice_class: "unknown"` (the default) never means "no excess ice": the engine then
 * assumes a texture-dependent excess-ice content (lib/engine/ground-ice.ts), because the ground just
 * below the active layer is often the most ice-rich (Shur, Hinkel & Nelson 2005,
 * doi:10.1002/ppp.518).
 */
import { z } from 'zod';
import { localProjectionSchema } from './local-climate';
import { SURFACE_COVERS } from './n-factors';
import { TEXTURES, type Texture } from './soil-properties';

/** Minimum column depth the site model runs with [m]; layers are extended to it (see above). */
export const MIN_COLUMN_DEPTH_M = 50;

/**
 * Deepest column the layers given may describe [m]: 200. Physical: the warming since 1850 reaches
 * about √(κ·t) ≈ √(1e-6 m² s-1 × 250 a) ≈ 90 m by 2100 (Carslaw & Jaeger 1959, §2.4, with a typical
 * ground diffusivity of 1e-6 m² s-1, common practice), so ground deeper than 200 m hardly changes an
 * outlook. Solver budget: 200 m is about 90 cells of the site grid, within the speed goals of
 * docs/bench.md; a 50 km column (50 layers of 1000 m) would take minutes.
 */
export const MAX_COLUMN_DEPTH_M = 200;

/** Soil and rock textures the soil-property models know (the one list, soil-properties.ts). */
export { TEXTURES, type Texture } from './soil-properties';

/** Surface cover types (the one list, n-factors.ts). */
export { SURFACE_COVERS, type SurfaceCover } from './n-factors';

/**
 * Visual ice classes of frozen soil, ASTM D4083 ("Standard Practice for Description of Frozen Soils
 * (Visual-Manual Procedure)"): group N, ice not visible — Nf poorly bonded or friable, Nbn well
 * bonded without excess ice, Nbe well bonded with excess ice; group V, visible ice less than 25 mm
 * thick — Vx individual ice crystals or inclusions, Vc ice coatings on particles, Vr random or
 * irregularly oriented ice formations, Vs stratified or distinctly oriented ice formations; group
 * ICE, ice thicker than 25 mm — "ICE+soil" ice with soil inclusions (the standard writes ICE + the
 * soil type, e.g. "ICE + ML"), "ICE" ice without soil inclusions. Plus "unknown" (no description).
 */
export const ICE_CLASSES = ['Nf', 'Nbn', 'Nbe', 'Vx', 'Vc', 'Vr', 'Vs', 'ICE+soil', 'ICE', 'unknown'] as const;
export type IceClass = (typeof ICE_CLASSES)[number];

export const SNOW_CASES = ['baseline', 'plus_30', 'minus_30', 'drifted'] as const;
export type SnowCase = (typeof SNOW_CASES)[number];

export const CHECKLIST_ANSWERS = ['present', 'absent', 'unknown'] as const;
export const CHECKLIST_ITEMS = [
  'ponding',
  'groundwater_flow',
  'heated_buildings',
  'snow_drifts',
  'surface_disturbance',
  'recent_fire',
  'erosion_or_slope_movement',
] as const;
export type ChecklistItem = (typeof CHECKLIST_ITEMS)[number];

/**
 * Default geothermal heat flux at the column base [W m-2]: 0.06. The mean continental heat flow is
 * about 65 mW m-2 (Pollack, Hurter & Johnson 1993, Rev. Geophys. 31(3), doi:10.1029/93RG01249;
 * value from memory); Arctic permafrost boreholes commonly show 0.04–0.09 W m-2 (from memory).
 */
export const DEFAULT_BOTTOM_HEAT_FLUX_W_M2 = 0.06;

/** Particle density of mineral solids [kg m-3], 2650 (quartz-rich soils; Farouki 1981, CRREL Monograph 81-1; common practice). */
export const PARTICLE_DENSITY_MINERAL_KG_M3 = 2650;
/** Particle density of organic solids [kg m-3], 1300 (Farouki 1981, CRREL Monograph 81-1; from memory). */
export const PARTICLE_DENSITY_ORGANIC_KG_M3 = 1300;

/** Earliest year of the modelled record (the historical forcing starts in 1850). */
const FIRST_YEAR = 1850;
/** Latest year a baseline of observed normals may end in. */
const LAST_BASELINE_YEAR = 2025;

const finite = () => z.number();
const year = () => z.int();

/** Exactly 12 monthly values, January first, with a message that names the count. */
function monthly<T extends z.ZodType<number>>(item: T) {
  return z.array(item).superRefine((values, ctx) => {
    if (values.length !== 12) {
      ctx.addIssue({ code: 'custom', message: `needs 12 monthly values, got ${values.length}` });
    }
  });
}

const monthlyAirTemperature = monthly(finite().min(-70).max(40));

const baselinePeriod = z
  .tuple([z.number().int().min(FIRST_YEAR).max(LAST_BASELINE_YEAR), z.number().int().min(FIRST_YEAR).max(LAST_BASELINE_YEAR)])
  .superRefine(([start, end], ctx) => {
    if (end < start + 9) {
      ctx.addIssue({
        code: 'custom',
        path: [1],
        message: `must be at least start + 9 (a baseline of 10 years or more), got ${start}–${end}`,
      });
    }
  });

/** An uploaded local projection series: the climate module's schema (lib/engine/local-climate.ts). */
const localProjection = localProjectionSchema.optional();

const climateSchema = z.strictObject({
  monthly_air_temperature_c: monthlyAirTemperature,
  baseline_period: baselinePeriod,
  regional_factors: monthly(finite().min(0).max(10)).optional(),
  local_projection: localProjection,
});

const snowDensity = z.union([finite().min(50).max(600), monthly(finite().min(50).max(600))]);

const snowSchema = z.strictObject({
  monthly_depth_m: monthly(finite().min(0).max(10)),
  density_kg_m3: snowDensity,
  scenario_case: z.enum(SNOW_CASES).optional(),
});

const surfaceSchema = z.strictObject({
  cover: z.enum(SURFACE_COVERS),
  n_factor_thaw: finite().gt(0).max(3).optional(),
  n_factor_freeze: finite().gt(0).max(1.5).optional(),
});

const layerSchema = z
  .strictObject({
    description: z.string().max(200).optional(),
    thickness_m: finite().gt(0).max(MAX_COLUMN_DEPTH_M),
    texture: z.enum(TEXTURES),
    dry_density_kg_m3: finite().min(20).max(3000),
    volumetric_water_content: finite().min(0).max(1),
    organic_content: finite().min(0).max(1).optional(),
    ice_class: z.enum(ICE_CLASSES).default('unknown'),
    excess_ice_content: finite().min(0).max(1).optional(),
    frozen_dry_density_kg_m3: finite().min(20).max(3000).optional(),
    thawed_dry_density_kg_m3: finite().min(20).max(3000).optional(),
  })
  .superRefine((layer, ctx) => {
    const hasFrozen = layer.frozen_dry_density_kg_m3 !== undefined;
    const hasThawed = layer.thawed_dry_density_kg_m3 !== undefined;
    if (hasFrozen && !hasThawed) {
      ctx.addIssue({ code: 'custom', path: ['thawed_dry_density_kg_m3'], message: 'is required with frozen_dry_density_kg_m3' });
    }
    if (hasThawed && !hasFrozen) {
      ctx.addIssue({ code: 'custom', path: ['frozen_dry_density_kg_m3'], message: 'is required with thawed_dry_density_kg_m3' });
    }
    if (hasFrozen && hasThawed && layer.frozen_dry_density_kg_m3! > layer.thawed_dry_density_kg_m3!) {
      // Thaw consolidation only densifies the soil skeleton (Andersland & Ladanyi 2004, ch. 11).
      ctx.addIssue({
        code: 'custom',
        path: ['frozen_dry_density_kg_m3'],
        message: 'must be <= thawed_dry_density_kg_m3 (thawing does not loosen the soil)',
      });
    }
    // Solids plus water (as ice or liquid) cannot fill more than the whole volume.
    const organic = layer.organic_content ?? (layer.texture === 'peat' ? 0.8 : 0);
    const solidFraction =
      layer.dry_density_kg_m3 * (organic / PARTICLE_DENSITY_ORGANIC_KG_M3 + (1 - organic) / PARTICLE_DENSITY_MINERAL_KG_M3);
    if (solidFraction + layer.volumetric_water_content > 1.0001) {
      ctx.addIssue({
        code: 'custom',
        path: ['volumetric_water_content'],
        message: `with dry_density_kg_m3 ${layer.dry_density_kg_m3} the solids fill ${solidFraction.toFixed(2)} of the volume, so the water content must be <= ${Math.max(0, 1 - solidFraction).toFixed(2)}`,
      });
    }
  });

const profilePoint = z.strictObject({
  depth_m: finite().min(0).max(1000),
  temperature_c: finite().min(-40).max(30),
});

const isoDate = z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'must be a date as YYYY-MM-DD').superRefine((s, ctx) => {
  const d = new Date(`${s}T00:00:00Z`);
  if (Number.isNaN(d.getTime()) || d.toISOString().slice(0, 10) !== s) {
    ctx.addIssue({ code: 'custom', message: 'is not a real calendar date' });
    return;
  }
  const y = d.getUTCFullYear();
  if (y < FIRST_YEAR || y > LAST_BASELINE_YEAR + 1) {
    ctx.addIssue({ code: 'custom', message: `must be in ${FIRST_YEAR}–${LAST_BASELINE_YEAR + 1}` });
  }
});

const groundTemperatureProfile = z.strictObject({
  date: isoDate,
  points: z
    .array(profilePoint)
    .min(2)
    .superRefine((points, ctx) => {
      for (let i = 1; i < points.length; i++) {
        if (points[i].depth_m <= points[i - 1].depth_m) {
          ctx.addIssue({ code: 'custom', path: [i, 'depth_m'], message: 'must be deeper than the point before (strictly increasing)' });
        }
      }
    }),
});

const observedSchema = z
  .strictObject({
    ground_temperature_profile: groundTemperatureProfile.optional(),
    magt_c: finite().min(-30).max(10).optional(),
    magt_depth_m: finite().gt(0).max(1000).optional(),
    active_layer_thickness_m: finite().gt(0).max(20).optional(),
  })
  .superRefine((o, ctx) => {
    if (o.magt_c !== undefined && o.magt_depth_m === undefined) {
      ctx.addIssue({ code: 'custom', path: ['magt_depth_m'], message: 'is required with magt_c' });
    }
    if (o.magt_depth_m !== undefined && o.magt_c === undefined) {
      ctx.addIssue({ code: 'custom', path: ['magt_c'], message: 'is required with magt_depth_m' });
    }
  });

const checklistAnswer = z.enum(CHECKLIST_ANSWERS).default('unknown');
const checklistSchema = z.strictObject({
  ponding: checklistAnswer,
  groundwater_flow: checklistAnswer,
  heated_buildings: checklistAnswer,
  snow_drifts: checklistAnswer,
  surface_disturbance: checklistAnswer,
  recent_fire: checklistAnswer,
  erosion_or_slope_movement: checklistAnswer,
});

/** The site (community ground profile) schema. See docs/site-schema.md. */
export const siteSchema = z
  .strictObject({
    name: z.string().trim().min(1).max(120),
    location: z.strictObject({
      // A permafrost screening tool: continuous and discontinuous permafrost lies poleward of
      // about 45° N outside high mountains (Brown et al. 1997, IPA circum-Arctic map; from memory).
      latitude_deg: finite().min(45).max(90),
      longitude_deg: finite().min(-180).max(180),
    }),
    climate: climateSchema,
    snow: snowSchema,
    surface: surfaceSchema,
    pore_water_salinity_ppt: finite().min(0).max(100).default(0),
    layers: z.array(layerSchema).min(1).max(50),
    observed: observedSchema.optional(),
    checklist: checklistSchema.optional(),
    bottom_heat_flux_w_m2: finite().min(0).max(0.5).default(DEFAULT_BOTTOM_HEAT_FLUX_W_M2),
  })
  .superRefine((site, ctx) => {
    const total = givenColumnDepthM(site);
    if (total > MAX_COLUMN_DEPTH_M) {
      ctx.addIssue({
        code: 'custom',
        path: ['layers'],
        message: `the layers add up to ${total} m; the column may be at most ${MAX_COLUMN_DEPTH_M} m deep (deeper ground hardly changes an outlook to 2100)`,
      });
    }
    const profile = site.observed?.ground_temperature_profile;
    if (profile) {
      const deepest = profile.points[profile.points.length - 1].depth_m;
      if (deepest > Math.max(total, MIN_COLUMN_DEPTH_M)) {
        ctx.addIssue({
          code: 'custom',
          path: ['observed', 'ground_temperature_profile', 'points', profile.points.length - 1, 'depth_m'],
          message: `is deeper than the modelled column (${Math.max(total, MIN_COLUMN_DEPTH_M)} m)`,
        });
      }
    }
    const magtDepth = site.observed?.magt_depth_m;
    if (magtDepth !== undefined && magtDepth > Math.max(total, MIN_COLUMN_DEPTH_M)) {
      ctx.addIssue({
        code: 'custom',
        path: ['observed', 'magt_depth_m'],
        message: `is deeper than the modelled column (${Math.max(total, MIN_COLUMN_DEPTH_M)} m)`,
      });
    }
  });

export type SiteInput = z.input<typeof siteSchema>;
export type Site = z.output<typeof siteSchema>;
export type SiteLayer = Site['layers'][number];

/** Total thickness of the layers given [m] (before the engine's extension to {@link MIN_COLUMN_DEPTH_M}). */
export function givenColumnDepthM(site: { layers: ReadonlyArray<{ thickness_m: number }> }): number {
  return site.layers.reduce((s, l) => s + l.thickness_m, 0);
}

/**
 * A complete, illustrative site: an ice-rich silt terrace with a peat cover in the western Canadian
 * Arctic. The climate normals are rounded, illustrative values of the kind found near 68° N
 * (from memory, not a station record); the snow is wind-packed tundra snow (350 kg m-3, at most
 * 0.35 m); they are for documentation and tests, not for decisions.
 */
export const exampleSite: SiteInput = {
  name: 'Example terrace (illustrative)',
  location: { latitude_deg: 68.36, longitude_deg: -133.72 },
  climate: {
    monthly_air_temperature_c: [-26.5, -25.5, -21.5, -12.5, -1.0, 10.0, 13.5, 10.5, 3.5, -7.0, -18.5, -23.5],
    baseline_period: [1991, 2020],
  },
  snow: {
    monthly_depth_m: [0.3, 0.33, 0.35, 0.35, 0.1, 0, 0, 0, 0.02, 0.1, 0.2, 0.25],
    density_kg_m3: 350,
    scenario_case: 'baseline',
  },
  surface: { cover: 'tundra' },
  pore_water_salinity_ppt: 0,
  layers: [
    {
      description: 'moss and peat',
      thickness_m: 0.3,
      texture: 'peat',
      dry_density_kg_m3: 150,
      volumetric_water_content: 0.6,
      organic_content: 0.8,
      ice_class: 'Nbn',
    },
    {
      description: 'organic silt, active layer and transition zone',
      thickness_m: 1.2,
      texture: 'silt',
      dry_density_kg_m3: 1200,
      volumetric_water_content: 0.5,
      organic_content: 0.05,
      ice_class: 'Vr',
    },
    {
      description: 'ice-rich silt with lenses',
      thickness_m: 3.5,
      texture: 'silt',
      dry_density_kg_m3: 1000,
      volumetric_water_content: 0.6,
      ice_class: 'Vs',
      frozen_dry_density_kg_m3: 1000,
      thawed_dry_density_kg_m3: 1450,
    },
    {
      description: 'clayey till',
      thickness_m: 10,
      texture: 'till',
      dry_density_kg_m3: 1800,
      volumetric_water_content: 0.3,
      ice_class: 'Nbe',
      excess_ice_content: 0.05,
    },
    {
      description: 'sandstone bedrock',
      thickness_m: 35,
      texture: 'bedrock',
      dry_density_kg_m3: 2500,
      volumetric_water_content: 0.05,
      ice_class: 'Nbn',
    },
  ],
  observed: {
    active_layer_thickness_m: 0.6,
  },
  checklist: {
    ponding: 'absent',
    groundwater_flow: 'unknown',
    heated_buildings: 'absent',
    snow_drifts: 'unknown',
    surface_disturbance: 'absent',
    recent_fire: 'absent',
    erosion_or_slope_movement: 'absent',
  },
  bottom_heat_flux_w_m2: 0.06,
};
