import { describe, expect, it } from 'vitest';
import { exampleSite, siteSchema, DEFAULT_BOTTOM_HEAT_FLUX_W_M2, type SiteInput } from './site-schema';
import { formatIssues } from './validation';

function errorsOf(mutate: (s: any) => void): string[] {
  const s = structuredClone(exampleSite) as any;
  mutate(s);
  const r = siteSchema.safeParse(s);
  return r.success ? [] : formatIssues(r.error);
}

describe('siteSchema: good input', () => {
  it('accepts the example site and fills the defaults', () => {
    const site = siteSchema.parse(exampleSite);
    expect(site.name).toBe(exampleSite.name);
    const minimal: SiteInput = structuredClone(exampleSite);
    delete minimal.bottom_heat_flux_w_m2;
    delete minimal.pore_water_salinity_ppt;
    delete minimal.checklist;
    delete minimal.observed;
    delete (minimal.layers[0] as any).ice_class;
    const m = siteSchema.parse(minimal);
    // 0.06 W m-2: mean continental heat flow ~0.065 (Pollack et al. 1993, doi:10.1029/93RG01249; from memory).
    expect(m.bottom_heat_flux_w_m2).toBe(DEFAULT_BOTTOM_HEAT_FLUX_W_M2);
    expect(m.pore_water_salinity_ppt).toBe(0);
    // An undescribed layer is "unknown", never "no ice" (Shur et al. 2005, doi:10.1002/ppp.518).
    expect(m.layers[0].ice_class).toBe('unknown');
  });
  it('accepts 12 monthly snow densities, an observed profile and MAGT', () => {
    const e = errorsOf((s) => {
      s.snow.density_kg_m3 = [200, 220, 240, 260, 280, 300, 300, 300, 150, 160, 180, 190];
      s.observed = { ground_temperature_profile: { date: '2019-08-15', points: [{ depth_m: 1, temperature_c: -1 }, { depth_m: 10, temperature_c: -3 }] }, magt_c: -3, magt_depth_m: 10 };
    });
    expect(e).toEqual([]);
  });
});

// Each bad input names its field path and the problem (engine contract: `path: problem`).
describe('siteSchema: every field error is named', () => {
  const cases: Array<[string, (s: any) => void, string]> = [
    ['name empty', (s) => (s.name = ' '), 'name: must have at least 1 characters'],
    ['latitude below 45', (s) => (s.location.latitude_deg = 44.9), 'location.latitude_deg: must be >= 45'],
    ['longitude out of range', (s) => (s.location.longitude_deg = 181), 'location.longitude_deg: must be <= 180'],
    ['11 monthly temperatures', (s) => s.climate.monthly_air_temperature_c.pop(), 'climate.monthly_air_temperature_c: needs 12 monthly values, got 11'],
    ['monthly temperature not a number', (s) => (s.climate.monthly_air_temperature_c[3] = 'cold'), 'climate.monthly_air_temperature_c[3]: must be a number'],
    ['baseline shorter than 10 years', (s) => (s.climate.baseline_period = [2000, 2008]), 'climate.baseline_period[1]: must be at least start + 9 (a baseline of 10 years or more), got 2000–2008'],
    ['baseline year not an integer', (s) => (s.climate.baseline_period = [1990.5, 2020]), 'climate.baseline_period[0]: must be an integer'],
    ['baseline before 1850', (s) => (s.climate.baseline_period = [1840, 1870]), 'climate.baseline_period[0]: must be >= 1850'],
    ['regional factors 13 values', (s) => (s.climate.regional_factors = new Array(13).fill(1.5)), 'climate.regional_factors: needs 12 monthly values, got 13'],
    ['local projection point without a change', (s) => (s.climate.local_projection = { baseline_period: [1995, 2014], series: [{ year: 2050 }] }), 'climate.local_projection.series[0]: give exactly one of annual_change_c or monthly_change_c'],
    ['snow depths 11', (s) => s.snow.monthly_depth_m.pop(), 'snow.monthly_depth_m: needs 12 monthly values, got 11'],
    ['snow depth negative', (s) => (s.snow.monthly_depth_m[0] = -0.1), 'snow.monthly_depth_m[0]: must be >= 0'],
    ['snow density too low', (s) => (s.snow.density_kg_m3 = 10), 'snow.density_kg_m3: must be >= 50'],
    ['snow case unknown', (s) => (s.snow.scenario_case = 'more'), 'snow.scenario_case: must be one of "baseline", "plus_30", "minus_30", "drifted"'],
    ['cover unknown', (s) => (s.surface.cover = 'lawn'), 'surface.cover: must be one of "tundra", "shrub_tundra", "forest", "peat", "gravel_pad", "gravel_road", "paved_road", "airstrip", "bare_soil"'],
    ['n-factor 0', (s) => (s.surface.n_factor_thaw = 0), 'surface.n_factor_thaw: must be > 0'],
    ['n-factor freeze too big', (s) => (s.surface.n_factor_freeze = 2), 'surface.n_factor_freeze: must be <= 1.5'],
    ['salinity negative', (s) => (s.pore_water_salinity_ppt = -1), 'pore_water_salinity_ppt: must be >= 0'],
    ['no layers', (s) => (s.layers = []), 'layers: must have at least 1 entry'],
    ['thickness 0', (s) => (s.layers[1].thickness_m = 0), 'layers[1].thickness_m: must be > 0'],
    ['a 1e9 m layer', (s) => (s.layers[4].thickness_m = 1e9), 'layers[4].thickness_m: must be <= 200'],
    [
      '50 layers of 200 m (a 10 km column)',
      (s) => (s.layers = Array.from({ length: 50 }, () => ({ ...s.layers[4], thickness_m: 200 }))),
      'layers: the layers add up to 10000 m; the column may be at most 200 m deep (deeper ground hardly changes an outlook to 2100)',
    ],
    ['texture unknown', (s) => (s.layers[0].texture = 'loam'), 'layers[0].texture: must be one of "gravel", "sand", "silt", "clay", "peat", "till", "bedrock"'],
    ['dry density missing', (s) => delete s.layers[2].dry_density_kg_m3, 'layers[2].dry_density_kg_m3: is required'],
    ['water content above 1', (s) => (s.layers[0].volumetric_water_content = 1.2), 'layers[0].volumetric_water_content: must be <= 1'],
    ['water plus solids above 1', (s) => (s.layers[3].volumetric_water_content = 0.5), 'layers[3].volumetric_water_content: with dry_density_kg_m3 1800 the solids fill 0.68 of the volume, so the water content must be <= 0.32'],
    ['organic content above 1', (s) => (s.layers[0].organic_content = 1.5), 'layers[0].organic_content: must be <= 1'],
    ['ice class unknown code', (s) => (s.layers[1].ice_class = 'V'), 'layers[1].ice_class: must be one of "Nf", "Nbn", "Nbe", "Vx", "Vc", "Vr", "Vs", "ICE+soil", "ICE", "unknown"'],
    ['excess ice above 1', (s) => (s.layers[3].excess_ice_content = 1.1), 'layers[3].excess_ice_content: must be <= 1'],
    ['frozen density alone', (s) => delete s.layers[2].thawed_dry_density_kg_m3, 'layers[2].thawed_dry_density_kg_m3: is required with frozen_dry_density_kg_m3'],
    ['thawed density alone', (s) => delete s.layers[2].frozen_dry_density_kg_m3, 'layers[2].frozen_dry_density_kg_m3: is required with thawed_dry_density_kg_m3'],
    ['frozen denser than thawed', (s) => (s.layers[2].frozen_dry_density_kg_m3 = 1600), 'layers[2].frozen_dry_density_kg_m3: must be <= thawed_dry_density_kg_m3 (thawing does not loosen the soil)'],
    ['unknown layer field', (s) => (s.layers[0].colour = 'brown'), 'layers[0].colour: unknown field'],
    ['profile date invalid', (s) => (s.observed = { ground_temperature_profile: { date: '2019-02-30', points: [{ depth_m: 1, temperature_c: -1 }, { depth_m: 2, temperature_c: -2 }] } }), 'observed.ground_temperature_profile.date: is not a real calendar date'],
    ['profile depths not increasing', (s) => (s.observed = { ground_temperature_profile: { date: '2019-08-01', points: [{ depth_m: 2, temperature_c: -1 }, { depth_m: 2, temperature_c: -2 }] } }), 'observed.ground_temperature_profile.points[1].depth_m: must be deeper than the point before (strictly increasing)'],
    ['magt without depth', (s) => (s.observed = { magt_c: -2 }), 'observed.magt_depth_m: is required with magt_c'],
    ['ALT zero', (s) => (s.observed = { active_layer_thickness_m: 0 }), 'observed.active_layer_thickness_m: must be > 0'],
    ['checklist answer', (s) => (s.checklist.ponding = 'yes'), 'checklist.ponding: must be one of "present", "absent", "unknown"'],
    ['heat flux negative', (s) => (s.bottom_heat_flux_w_m2 = -0.01), 'bottom_heat_flux_w_m2: must be >= 0'],
    ['unknown top-level field', (s) => (s.elevation_m = 10), 'elevation_m: unknown field'],
  ];
  for (const [label, mutate, expected] of cases) {
    it(label, () => {
      expect(errorsOf(mutate)).toContain(expected);
    });
  }
});

describe('siteSchema: a wrong value in any field names that field', () => {
  // Every leaf of the example site (plus the optional fields it leaves out), set to a value of the
  // wrong type, must give an error whose path is exactly that field (engine contract: `path: problem`).
  const full = structuredClone(exampleSite) as any;
  full.climate.regional_factors = new Array(12).fill(1.5);
  full.climate.local_projection = { baseline_period: [1995, 2014], series: [{ year: 2050, annual_change_c: 2 }] };
  full.surface.n_factor_thaw = 1;
  full.surface.n_factor_freeze = 0.5;
  full.observed = {
    ground_temperature_profile: { date: '2019-08-15', points: [{ depth_m: 1, temperature_c: -1 }, { depth_m: 10, temperature_c: -3 }] },
    magt_c: -3,
    magt_depth_m: 10,
    active_layer_thickness_m: 0.6,
  };
  const leaves: (string | number)[][] = [];
  const walk = (v: unknown, path: (string | number)[]) => {
    if (Array.isArray(v)) v.forEach((x, i) => walk(x, [...path, i]));
    else if (v && typeof v === 'object') for (const [k, x] of Object.entries(v)) walk(x, [...path, k]);
    else leaves.push(path);
  };
  walk(full, []);
  it('the full example parses', () => {
    expect(siteSchema.safeParse(full).success).toBe(true);
  });
  for (const path of leaves) {
    const name = path.map((k) => (typeof k === 'number' ? `[${k}]` : `.${k}`)).join('').replace(/^\./, '');
    it(name, () => {
      const s = structuredClone(full);
      let o = s;
      for (const k of path.slice(0, -1)) o = o[k];
      const last = path[path.length - 1];
      o[last] = typeof o[last] === 'string' ? 12345 : 'wrong';
      const r = siteSchema.safeParse(s);
      expect(r.success).toBe(false);
      const lines = formatIssues(r.error!);
      // The field itself, or (for the scalar-or-12 snow density union) the field as a whole.
      expect(lines.some((l) => l.startsWith(`${name}: `))).toBe(true);
    });
  }
});
