/**
 * The demonstration region. INVENTED: the Nivalen region, its organisations, communities, people and
 * every ground profile below are made up for demonstration and tests. The coordinates lie on real land
 * north of 60° N (the mainland tundra and taiga of north-central Canada) so the map and the regional
 * climate factors have somewhere to stand, but no real community or measurement is described.
 *
 * The values are chosen to be physically plausible, not measured: monthly air-temperature normals with
 * mean annual air temperatures from about −4.6 °C (discontinuous permafrost in the south) to −13.8 °C
 * (continuous, cold permafrost on the coast); snow depths and densities typical of tundra and taiga
 * snowpacks (Sturm, Holmgren & Liston 1995, J. Climate 8, snow classes; from memory); dry densities and
 * water contents that fit together (solids + water ≤ 1); ice classes in ASTM D4083 codes.
 */
import type { SiteInput } from '@/lib/engine';
import type { Role } from '@/db/schema/memberships';

export const DEMO_REGION_NAME = 'Nivalen region (invented)';
export const DEMO_PASSWORD = 'thawline-demo';

export interface DemoOrganisation {
  slug: string;
  name: string;
  kind: 'community_government' | 'regional_office';
}

export interface DemoUser {
  email: string;
  name: string;
  locale: string;
  memberships: { organisation: string; role: Role }[];
}

export interface DemoProfile {
  slug: string;
  name: string;
  sourceNote: string;
  site: SiteInput;
}

export interface DemoCommunity {
  slug: string;
  name: string;
  organisation: string;
  languages: string[];
  population: string;
  description: string;
  profiles: DemoProfile[];
}

export const demoOrganisations: DemoOrganisation[] = [
  { slug: 'nivalen-regional-office', name: 'Nivalen Regional Office', kind: 'regional_office' },
  { slug: 'cairnholm-hamlet-council', name: 'Cairnholm Hamlet Council', kind: 'community_government' },
];

export const demoUsers: DemoUser[] = [
  { email: 'admin@nivalen.example', name: 'Aino Admin', locale: 'en', memberships: [{ organisation: 'nivalen-regional-office', role: 'admin' }] },
  { email: 'planner@nivalen.example', name: 'Pekka Planner', locale: 'en', memberships: [{ organisation: 'nivalen-regional-office', role: 'planner' }] },
  { email: 'translator@nivalen.example', name: 'Tove Translator', locale: 'fr', memberships: [{ organisation: 'nivalen-regional-office', role: 'translator' }] },
  { email: 'council@nivalen.example', name: 'Corin Councillor', locale: 'en', memberships: [{ organisation: 'nivalen-regional-office', role: 'council' }] },
  { email: 'admin@cairnholm.example', name: 'Siku Admin', locale: 'en', memberships: [{ organisation: 'cairnholm-hamlet-council', role: 'admin' }] },
  { email: 'planner@cairnholm.example', name: 'Maren Planner', locale: 'nb', memberships: [{ organisation: 'cairnholm-hamlet-council', role: 'planner' }] },
  {
    email: 'rowan@nivalen.example',
    name: 'Rowan Two-Hats',
    locale: 'en',
    memberships: [
      { organisation: 'nivalen-regional-office', role: 'planner' },
      { organisation: 'cairnholm-hamlet-council', role: 'council' },
    ],
  },
];

const BASELINE: [number, number] = [1991, 2020];
const CHECKLIST_UNKNOWN = {
  ponding: 'unknown',
  groundwater_flow: 'unknown',
  heated_buildings: 'unknown',
  snow_drifts: 'unknown',
  surface_disturbance: 'unknown',
  recent_fire: 'unknown',
  erosion_or_slope_movement: 'unknown',
} as const;

type Layer = SiteInput['layers'][number];
const peat = (thickness_m: number, water = 0.75): Layer => ({
  description: 'moss and peat',
  thickness_m,
  texture: 'peat',
  dry_density_kg_m3: 140,
  volumetric_water_content: water,
  organic_content: 0.85,
  ice_class: 'Nbn',
});
const bedrock = (thickness_m: number, description = 'granitic gneiss bedrock'): Layer => ({
  description,
  thickness_m,
  texture: 'bedrock',
  dry_density_kg_m3: 2620,
  volumetric_water_content: 0.01,
  ice_class: 'Nbn',
  excess_ice_content: 0,
});
const snow = (peak: number, density = 240): SiteInput['snow'] => ({
  monthly_depth_m: [0.85, 0.95, 1, 0.9, 0.35, 0, 0, 0, 0.05, 0.3, 0.55, 0.75].map((f) => Math.round(f * peak * 100) / 100),
  density_kg_m3: density,
  scenario_case: 'baseline',
});

export const demoCommunities: DemoCommunity[] = [
  {
    slug: 'larchbend',
    name: 'Larchbend',
    organisation: 'nivalen-regional-office',
    languages: ['en', 'fr'],
    population: 'about 640',
    description: 'A river community in open larch forest at the southern edge of the region, on warm, patchy permafrost.',
    profiles: [
      {
        slug: 'riverside-silt-terrace',
        name: 'Riverside silt terrace',
        sourceNote: 'Invented demonstration profile (no borehole).',
        site: {
          name: 'Larchbend — riverside silt terrace',
          location: { latitude_deg: 62.71, longitude_deg: -108.94 },
          climate: { monthly_air_temperature_c: [-25.1, -21.6, -13.6, -3.1, 6.9, 13.9, 15.9, 12.4, 4.4, -6.1, -16.1, -23.1], baseline_period: BASELINE },
          snow: snow(0.26, 280),
          surface: { cover: 'peat' },
          pore_water_salinity_ppt: 0,
          layers: [
            peat(0.6, 0.75),
            { description: 'silt, active layer', thickness_m: 1.0, texture: 'silt', dry_density_kg_m3: 1350, volumetric_water_content: 0.4, organic_content: 0.03, ice_class: 'Nbn' },
            { description: 'ice-rich silt with ice lenses', thickness_m: 4, texture: 'silt', dry_density_kg_m3: 950, volumetric_water_content: 0.62, ice_class: 'Vs', excess_ice_content: 0.25 },
            { description: 'silty clay', thickness_m: 8, texture: 'clay', dry_density_kg_m3: 1450, volumetric_water_content: 0.42, ice_class: 'Vx', excess_ice_content: 0.05 },
            bedrock(40),
          ],
          checklist: { ...CHECKLIST_UNKNOWN, ponding: 'present', heated_buildings: 'present', recent_fire: 'absent' },
          bottom_heat_flux_w_m2: 0.07,
        },
      },
      {
        slug: 'esker-gravel',
        name: 'Esker gravel ridge',
        sourceNote: 'Invented demonstration profile (no borehole).',
        site: {
          name: 'Larchbend — esker gravel ridge',
          location: { latitude_deg: 62.73, longitude_deg: -108.9 },
          climate: { monthly_air_temperature_c: [-25.1, -21.6, -13.6, -3.1, 6.9, 13.9, 15.9, 12.4, 4.4, -6.1, -16.1, -23.1], baseline_period: BASELINE },
          snow: snow(0.45, 230),
          surface: { cover: 'forest' },
          pore_water_salinity_ppt: 0,
          layers: [
            { description: 'sandy gravel', thickness_m: 6, texture: 'gravel', dry_density_kg_m3: 1950, volumetric_water_content: 0.08, ice_class: 'Nf' },
            { description: 'sand', thickness_m: 10, texture: 'sand', dry_density_kg_m3: 1650, volumetric_water_content: 0.18, ice_class: 'Nbn' },
            bedrock(40),
          ],
          checklist: { ...CHECKLIST_UNKNOWN, ponding: 'absent', surface_disturbance: 'absent' },
          bottom_heat_flux_w_m2: 0.07,
        },
      },
    ],
  },
  {
    slug: 'sedgehaven',
    name: 'Sedgehaven',
    organisation: 'nivalen-regional-office',
    languages: ['en', 'fr'],
    population: 'about 310',
    description: 'A lakeshore community on peat-covered tundra with silty lake sediments below.',
    profiles: [
      {
        slug: 'peat-plateau',
        name: 'Peat plateau by the lake',
        sourceNote: 'Invented demonstration profile (no borehole).',
        site: {
          name: 'Sedgehaven — peat plateau',
          location: { latitude_deg: 63.92, longitude_deg: -104.18 },
          climate: { monthly_air_temperature_c: [-29.1, -25.5, -17.1, -6.1, 4.4, 11.8, 13.9, 10.3, 1.9, -9.1, -19.6, -27.0], baseline_period: BASELINE },
          snow: snow(0.3, 300),
          surface: { cover: 'peat' },
          pore_water_salinity_ppt: 0,
          layers: [
            peat(1.2, 0.8),
            { description: 'organic lake silt', thickness_m: 3, texture: 'silt', dry_density_kg_m3: 1100, volumetric_water_content: 0.55, organic_content: 0.08, ice_class: 'Vr', excess_ice_content: 0.15 },
            { description: 'sandy till', thickness_m: 12, texture: 'till', dry_density_kg_m3: 1850, volumetric_water_content: 0.2, ice_class: 'Nbn' },
            bedrock(40),
          ],
          checklist: { ...CHECKLIST_UNKNOWN, ponding: 'absent' },
        },
      },
    ],
  },
  {
    slug: 'gravelspit',
    name: 'Gravelspit',
    organisation: 'nivalen-regional-office',
    languages: ['en', 'fr'],
    population: 'about 180',
    description: 'A small settlement built on a thick gravel pad over glacial sand, with a gravel airstrip.',
    profiles: [
      {
        slug: 'airstrip-pad',
        name: 'Airstrip gravel pad',
        sourceNote: 'Invented demonstration profile (no borehole).',
        site: {
          name: 'Gravelspit — airstrip pad',
          location: { latitude_deg: 65.31, longitude_deg: -111.62 },
          climate: { monthly_air_temperature_c: [-30.4, -26.8, -18.4, -7.4, 3.1, 10.5, 12.6, 9.0, 0.6, -10.4, -20.9, -28.3], baseline_period: BASELINE },
          snow: snow(0.15, 330),
          surface: { cover: 'airstrip' },
          pore_water_salinity_ppt: 0,
          layers: [
            { description: 'compacted gravel fill', thickness_m: 1.5, texture: 'gravel', dry_density_kg_m3: 2050, volumetric_water_content: 0.07, ice_class: 'Nf' },
            { description: 'fine sand', thickness_m: 6, texture: 'sand', dry_density_kg_m3: 1600, volumetric_water_content: 0.25, ice_class: 'Nbn' },
            { description: 'silty sand with ice', thickness_m: 6, texture: 'sand', dry_density_kg_m3: 1500, volumetric_water_content: 0.33, ice_class: 'Vx', excess_ice_content: 0.05 },
            bedrock(40),
          ],
          checklist: { ...CHECKLIST_UNKNOWN, surface_disturbance: 'present' },
        },
      },
      {
        slug: 'tundra-sand',
        name: 'Undisturbed tundra on sand',
        sourceNote: 'Invented demonstration profile (no borehole).',
        site: {
          name: 'Gravelspit — tundra on sand',
          location: { latitude_deg: 65.33, longitude_deg: -111.58 },
          climate: { monthly_air_temperature_c: [-30.4, -26.8, -18.4, -7.4, 3.1, 10.5, 12.6, 9.0, 0.6, -10.4, -20.9, -28.3], baseline_period: BASELINE },
          snow: snow(0.35, 280),
          surface: { cover: 'tundra' },
          pore_water_salinity_ppt: 0,
          layers: [
            peat(0.15, 0.6),
            { description: 'fine sand', thickness_m: 7, texture: 'sand', dry_density_kg_m3: 1600, volumetric_water_content: 0.25, ice_class: 'Nbn' },
            { description: 'silty sand with ice', thickness_m: 6, texture: 'sand', dry_density_kg_m3: 1500, volumetric_water_content: 0.33, ice_class: 'Vx', excess_ice_content: 0.05 },
            bedrock(40),
          ],
          checklist: { ...CHECKLIST_UNKNOWN, surface_disturbance: 'absent' },
        },
      },
    ],
  },
  {
    slug: 'mossbank',
    name: 'Mossbank',
    organisation: 'nivalen-regional-office',
    languages: ['en', 'fr'],
    population: 'about 420',
    description: 'A community on a terrace of ice-rich marine clay above a river mouth.',
    profiles: [
      {
        slug: 'clay-terrace',
        name: 'Ice-rich clay terrace',
        sourceNote: 'Invented demonstration profile (no borehole).',
        site: {
          name: 'Mossbank — clay terrace',
          location: { latitude_deg: 66.21, longitude_deg: -106.93 },
          climate: { monthly_air_temperature_c: [-32.1, -28.4, -19.8, -8.6, 2.2, 9.7, 11.9, 8.2, -0.4, -11.6, -22.4, -29.9], baseline_period: BASELINE },
          snow: snow(0.35, 270),
          surface: { cover: 'shrub_tundra' },
          pore_water_salinity_ppt: 2,
          layers: [
            peat(0.25, 0.7),
            { description: 'silty clay, active layer', thickness_m: 0.8, texture: 'clay', dry_density_kg_m3: 1300, volumetric_water_content: 0.48, ice_class: 'Nbn' },
            { description: 'clay with reticulate ice', thickness_m: 5, texture: 'clay', dry_density_kg_m3: 900, volumetric_water_content: 0.64, ice_class: 'Vr', excess_ice_content: 0.3 },
            { description: 'clay', thickness_m: 10, texture: 'clay', dry_density_kg_m3: 1400, volumetric_water_content: 0.45, ice_class: 'Nbe', excess_ice_content: 0.05 },
            bedrock(40),
          ],
          checklist: { ...CHECKLIST_UNKNOWN, erosion_or_slope_movement: 'present' },
        },
      },
    ],
  },
  {
    slug: 'frostmere',
    name: 'Frostmere',
    organisation: 'nivalen-regional-office',
    languages: ['en', 'fr'],
    population: 'about 150',
    description: 'A hilltop community on thin till over bedrock, with cold permafrost.',
    profiles: [
      {
        slug: 'bedrock-knoll',
        name: 'Bedrock knoll',
        sourceNote: 'Invented demonstration profile (no borehole).',
        site: {
          name: 'Frostmere — bedrock knoll',
          location: { latitude_deg: 67.42, longitude_deg: -109.81 },
          climate: { monthly_air_temperature_c: [-33.9, -30.1, -21.4, -9.9, 1.1, 8.8, 11.1, 7.3, -1.4, -12.9, -23.9, -31.6], baseline_period: BASELINE },
          snow: snow(0.25, 300),
          surface: { cover: 'bare_soil' },
          pore_water_salinity_ppt: 0,
          layers: [
            { description: 'stony till', thickness_m: 3, texture: 'till', dry_density_kg_m3: 1850, volumetric_water_content: 0.2, ice_class: 'Nbn' },
            bedrock(50),
          ],
          checklist: { ...CHECKLIST_UNKNOWN, ponding: 'absent', groundwater_flow: 'absent' },
        },
      },
    ],
  },
  {
    slug: 'willowrun',
    name: 'Willowrun',
    organisation: 'nivalen-regional-office',
    languages: ['en', 'fr'],
    population: 'about 260',
    description: 'A creek-side community in shrub tundra on ice-rich silt, with deep drifted snow.',
    profiles: [
      {
        slug: 'creek-silt',
        name: 'Creek-side silt flat',
        sourceNote: 'Invented demonstration profile (no borehole).',
        site: {
          name: 'Willowrun — creek-side silt',
          location: { latitude_deg: 64.63, longitude_deg: -113.42 },
          climate: { monthly_air_temperature_c: [-27.3, -23.7, -15.5, -4.8, 5.5, 12.6, 14.7, 11.1, 2.9, -7.8, -18.1, -25.2], baseline_period: BASELINE },
          snow: snow(0.25, 300),
          surface: { cover: 'shrub_tundra' },
          pore_water_salinity_ppt: 0,
          layers: [
            peat(0.3, 0.7),
            { description: 'silt, active layer', thickness_m: 0.9, texture: 'silt', dry_density_kg_m3: 1300, volumetric_water_content: 0.45, organic_content: 0.04, ice_class: 'Nbn' },
            { description: 'ice-rich silt', thickness_m: 5, texture: 'silt', dry_density_kg_m3: 1000, volumetric_water_content: 0.6, ice_class: 'Vs', frozen_dry_density_kg_m3: 1000, thawed_dry_density_kg_m3: 1400 },
            { description: 'sandy silt', thickness_m: 10, texture: 'silt', dry_density_kg_m3: 1500, volumetric_water_content: 0.35, ice_class: 'Nbe' },
            bedrock(40),
          ],
          checklist: { ...CHECKLIST_UNKNOWN, snow_drifts: 'present', groundwater_flow: 'present' },
        },
      },
    ],
  },
  {
    slug: 'tussock-ridge',
    name: 'Tussock Ridge',
    organisation: 'nivalen-regional-office',
    languages: ['en', 'fr'],
    population: 'about 90',
    description: 'A northern outpost on tussock tundra over silty till, with cold permafrost.',
    profiles: [
      {
        slug: 'tussock-till',
        name: 'Tussock tundra on till',
        sourceNote: 'Invented demonstration profile (no borehole).',
        site: {
          name: 'Tussock Ridge — tundra on till',
          location: { latitude_deg: 68.58, longitude_deg: -112.24 },
          climate: { monthly_air_temperature_c: [-34.5, -30.8, -22.2, -11.0, -0.2, 7.3, 9.5, 5.8, -2.8, -14.0, -24.8, -32.3], baseline_period: BASELINE },
          snow: snow(0.3, 290),
          surface: { cover: 'tundra' },
          pore_water_salinity_ppt: 0,
          layers: [
            peat(0.2, 0.7),
            { description: 'silty till, active layer', thickness_m: 0.6, texture: 'till', dry_density_kg_m3: 1600, volumetric_water_content: 0.3, ice_class: 'Nbn' },
            { description: 'ice-rich silty till', thickness_m: 3, texture: 'till', dry_density_kg_m3: 1300, volumetric_water_content: 0.48, ice_class: 'Vr', excess_ice_content: 0.15 },
            { description: 'till', thickness_m: 12, texture: 'till', dry_density_kg_m3: 1850, volumetric_water_content: 0.2, ice_class: 'Nbn' },
            bedrock(40),
          ],
        },
      },
    ],
  },
  {
    slug: 'cairnholm',
    name: 'Cairnholm',
    organisation: 'cairnholm-hamlet-council',
    languages: ['en', 'fr', 'nb'],
    population: 'about 870',
    description: 'A coastal hamlet on raised beaches of saline marine silt and beach gravel.',
    profiles: [
      {
        slug: 'marine-silt',
        name: 'Saline marine silt',
        sourceNote: 'Invented demonstration profile (no borehole).',
        site: {
          name: 'Cairnholm — saline marine silt',
          location: { latitude_deg: 69.38, longitude_deg: -107.61 },
          climate: { monthly_air_temperature_c: [-33.8, -30.4, -22.5, -12.3, -2.5, 4.3, 6.2, 2.8, -5.1, -15.3, -25.1, -31.9], baseline_period: BASELINE },
          snow: snow(0.3, 320),
          surface: { cover: 'tundra' },
          pore_water_salinity_ppt: 20,
          layers: [
            peat(0.1, 0.6),
            { description: 'marine silt, active layer', thickness_m: 0.7, texture: 'silt', dry_density_kg_m3: 1400, volumetric_water_content: 0.42, ice_class: 'Nbn' },
            { description: 'saline marine silt with ice lenses', thickness_m: 8, texture: 'silt', dry_density_kg_m3: 1150, volumetric_water_content: 0.52, ice_class: 'Vs', excess_ice_content: 0.12 },
            { description: 'marine clay', thickness_m: 12, texture: 'clay', dry_density_kg_m3: 1450, volumetric_water_content: 0.44, ice_class: 'Nbe' },
            bedrock(40),
          ],
          checklist: { ...CHECKLIST_UNKNOWN, erosion_or_slope_movement: 'present', heated_buildings: 'present' },
        },
      },
      {
        slug: 'beach-gravel',
        name: 'Raised beach gravel',
        sourceNote: 'Invented demonstration profile (no borehole).',
        site: {
          name: 'Cairnholm — raised beach gravel',
          location: { latitude_deg: 69.4, longitude_deg: -107.57 },
          climate: { monthly_air_temperature_c: [-33.8, -30.4, -22.5, -12.3, -2.5, 4.3, 6.2, 2.8, -5.1, -15.3, -25.1, -31.9], baseline_period: BASELINE },
          snow: snow(0.2, 340),
          surface: { cover: 'gravel_pad' },
          pore_water_salinity_ppt: 5,
          layers: [
            { description: 'beach gravel', thickness_m: 3, texture: 'gravel', dry_density_kg_m3: 1950, volumetric_water_content: 0.1, ice_class: 'Nf' },
            { description: 'sand', thickness_m: 8, texture: 'sand', dry_density_kg_m3: 1650, volumetric_water_content: 0.22, ice_class: 'Nbn' },
            bedrock(40),
          ],
        },
      },
    ],
  },
];
