/**
 * Regional amplification of warming for a northern land site, by calendar month: local surface air
 * warming per degree of global warming [K K-1].
 *
 * Defaults: seasonal (DJF, MAM, JJA, SON) factors per AR6 WG1 Atlas land region north of about
 * 60° N [1, 2], as the CMIP6 median local change per degree of global warming (from memory of the
 * Atlas's regional results; approximate, rounded to 0.1; to be checked against the Atlas before any
 * use beyond screening). Monthly values: each month takes its season's factor, then a circular 1-2-1
 * smoothing over the months (which keeps the annual mean). Winter is amplified much more than summer
 * over Arctic land (snow and sea-ice loss and the stable winter boundary layer; AR6 WG1 ch. 4 and
 * Atlas [1, 3]); summer, which drives the thaw depth, is amplified little.
 *
 * Not a land multiplier: the observed Arctic-wide warming of about four times the global rate over
 * 1979–2021 (Rantanen et al. 2022 [4]) is for the whole region north of 66.5° N, ocean and sea ice
 * included, where the largest amplification is over the ice-losing ocean in winter; it must not be
 * used as a factor for a land site.
 *
 * Region lookup (simple boxes, documented, not the Atlas polygons; lon in degrees east, −180..180):
 * - GIC (Greenland/Iceland): −60 ≤ lon ≤ −10 and lat ≥ 59.5, or −75 ≤ lon < −60 and lat ≥ 75.5;
 * - NWN (N.W. North America): lon < −105 (and east of −169);
 * - NEN (N.E. North America): −105 ≤ lon < −10, not GIC;
 * - NEU (Northern Europe): −10 ≤ lon < 40 (Svalbard, lat ≥ 74, takes RAR: a high-Arctic coast);
 * - RAR (Russian Arctic): lon ≥ 40 or lon < −169, lat ≥ 66;
 * - south of 66° N: WSB (West Siberia) for 40 ≤ lon < 90 (also the north-east of European Russia,
 *   which the Atlas puts in EEU), ESB (East Siberia) for 90 ≤ lon < 135, RFE (Russian Far East) for
 *   lon ≥ 135 or lon < −169.
 * The engine's sites lie at or north of 45° N; between 45° and about 55° N these boxes are the
 * nearest northern regions, a coarser approximation (the source string says so).
 *
 * References (DOIs from memory except those given in the engine issue):
 * [1] J. M. Gutiérrez et al., "Atlas," in IPCC AR6 WG1, 2021, doi:10.1017/9781009157896.021;
 *     Interactive Atlas, https://interactive-atlas.ipcc.ch.
 * [2] M. Iturbide et al., "An update of IPCC climate reference regions for subcontinental analysis of
 *     climate model data," Earth Syst. Sci. Data 12, 2959–2970, 2020, doi:10.5194/essd-12-2959-2020.
 * [3] J. Lee et al., "Future global climate: scenario-based projections and near-term information,"
 *     IPCC AR6 WG1 ch. 4, 2021, doi:10.1017/9781009157896.006.
 * [4] M. Rantanen et al., "The Arctic has warmed nearly four times faster than the globe since 1979,"
 *     Commun. Earth Environ. 3, 168, 2022, doi:10.1038/s43247-022-00498-3.
 */
import { EngineInputError } from './validation';

export type AtlasRegion = 'NWN' | 'NEN' | 'GIC' | 'NEU' | 'RAR' | 'WSB' | 'ESB' | 'RFE';

/** Seasonal factors [DJF, MAM, JJA, SON] per degree of global warming (from memory, see above). */
export const ATLAS_SEASONAL_FACTORS: Readonly<Record<AtlasRegion, readonly [number, number, number, number]>> = {
  NWN: [2.6, 1.8, 1.2, 2.0],
  NEN: [3.0, 1.9, 1.2, 2.4],
  GIC: [2.4, 1.7, 1.1, 2.0],
  NEU: [2.0, 1.4, 1.1, 1.3],
  RAR: [3.2, 2.1, 1.3, 2.7],
  WSB: [2.4, 1.8, 1.3, 1.8],
  ESB: [2.3, 1.7, 1.3, 1.9],
  RFE: [2.2, 1.6, 1.2, 1.8],
};

export const ATLAS_REGION_NAMES: Readonly<Record<AtlasRegion, string>> = {
  NWN: 'N.W. North America',
  NEN: 'N.E. North America',
  GIC: 'Greenland/Iceland',
  NEU: 'Northern Europe',
  RAR: 'Russian Arctic',
  WSB: 'West Siberia',
  ESB: 'East Siberia',
  RFE: 'Russian Far East',
};

/** Season index (0 DJF, 1 MAM, 2 JJA, 3 SON) of each calendar month, January first. */
const SEASON_OF_MONTH = [0, 0, 1, 1, 1, 2, 2, 2, 3, 3, 3, 0] as const;

/**
 * Monthly factors from four seasonal ones: season value per month, then circular 1-2-1 smoothing.
 * @param seasonal [DJF, MAM, JJA, SON] factors [K K-1].
 * @returns 12 factors, January first [K K-1]; their mean equals the mean of the step values.
 */
export function monthlyFromSeasonalFactors(seasonal: readonly [number, number, number, number]): number[] {
  const step = SEASON_OF_MONTH.map((s) => seasonal[s]);
  return step.map((v, m) => 0.25 * step[(m + 11) % 12] + 0.5 * v + 0.25 * step[(m + 1) % 12]);
}

/**
 * The AR6 Atlas land region of a northern site by the box lookup documented above.
 * @param latitudeDeg Latitude [° N], 45–90.
 * @param longitudeDeg Longitude [° E], −180..180.
 */
export function atlasRegionFor(latitudeDeg: number, longitudeDeg: number): AtlasRegion {
  if (!(latitudeDeg >= 45 && latitudeDeg <= 90)) {
    throw new EngineInputError('location.latitude_deg', 'regional warming factors have defaults only from 45 to 90° N');
  }
  if (!(longitudeDeg >= -180 && longitudeDeg <= 180)) {
    throw new EngineInputError('location.longitude_deg', 'must be within -180..180');
  }
  const lat = latitudeDeg;
  const lon = longitudeDeg;
  const russianSide = lon >= 40 || lon < -169;
  if (russianSide) {
    if (lat >= 66) return 'RAR';
    if (lon >= 40 && lon < 90) return 'WSB';
    if (lon >= 90 && lon < 135) return 'ESB';
    return 'RFE';
  }
  if (lon >= -10) return lat >= 74 ? 'RAR' : 'NEU';
  if ((lon >= -60 && lat >= 59.5) || (lon >= -75 && lat >= 75.5)) return 'GIC';
  if (lon < -105) return 'NWN';
  return 'NEN';
}

/**
 * Default monthly regional warming factors for a land site.
 * @param latitudeDeg Latitude [° N], 45–90.
 * @param longitudeDeg Longitude [° E], −180..180.
 * @returns `{ region, monthly, source }`: the Atlas region code, 12 factors [K K-1] (January first),
 *   and a source line for provenance.
 */
export function regionalFactorsFor(latitudeDeg: number, longitudeDeg: number): { region: string; monthly: number[]; source: string } {
  const region = atlasRegionFor(latitudeDeg, longitudeDeg);
  const coarse = latitudeDeg < 55 ? '; site south of 55° N: nearest northern region, coarser' : '';
  return {
    region,
    monthly: monthlyFromSeasonalFactors(ATLAS_SEASONAL_FACTORS[region]),
    source:
      `IPCC AR6 WG1 Atlas region ${region} (${ATLAS_REGION_NAMES[region]}), seasonal warming per degree of global warming, ` +
      `CMIP6 median (from memory, approximate)${coarse}`,
  };
}

/**
 * The site's factors: its own 12 if given (overriding the default), else the Atlas default.
 * @param latitudeDeg Latitude [° N].
 * @param longitudeDeg Longitude [° E].
 * @param override 12 factors [K K-1], January first, or undefined.
 */
export function siteRegionalFactors(
  latitudeDeg: number,
  longitudeDeg: number,
  override?: readonly number[],
): { region: string; monthly: number[]; source: string } {
  if (override) {
    if (override.length !== 12) throw new EngineInputError('climate.regional_factors', `needs 12 monthly values, got ${override.length}`);
    return { region: 'site', monthly: [...override], source: 'site-supplied monthly warming factors' };
  }
  return regionalFactorsFor(latitudeDeg, longitudeDeg);
}
