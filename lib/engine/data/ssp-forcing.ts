/**
 * Effective radiative forcing (ERF) pathways and CO2 concentrations used by the scenario-warming
 * emulator: historical from 1850 (1750 = 0 W m-2), then each SSP to 2100, annual.
 *
 * How the pathways are built (read = taken from the source as given in the engine issue; from
 * memory = recalled, not read from the source here; reconstructed = built by the rule stated):
 *
 * 1. Historical total ERF 1850–2014 (anthropogenic + solar, relative to 1750): a smooth shape
 *    through decadal anchor values (from memory of the AR6 WG1 ch. 7 assessed time series, Fig. 7.8
 *    and Annex III [1, 2]), pinned to the assessed total anthropogenic ERF of 2.72 W m-2 in 2019
 *    relative to 1750 (read [1]; very likely 1.96–3.48, from memory). Volcanic forcing is left out:
 *    it is represented by its long-term mean, taken as zero, so the dips after Krakatau (1883),
 *    Agung (1963), El Chichón (1982) and Pinatubo (1991) are smoothed away. Linear between anchors.
 * 2. 1750–1850: a linear ramp from 0 (used only to start the emulator near equilibrium).
 * 3. Scenarios from 2015, as in CMIP6 (historical to 2014, ScenarioMIP from 2015): a shape-preserving
 *    cubic (Fritsch–Carlson monotone Hermite [5]) through the 2014 historical value and the AR6 ch. 7
 *    total ERF in 2020 / 2050 / 2100 per scenario (read, as given in the issue [1]). Between the
 *    anchors the shape is an interpolation, not an assessment.
 * 4. SSP1-1.9 has no ERF anchor above: it is reconstructed as SSP1-2.6 less the CO2 forcing of
 *    the gap between the two scenarios' CO2 concentrations, the gap opening linearly from 0 in 2020
 *    to its 2100 size (446 − 393 ppm; 446 read [3], 393 from memory [3]); non-CO2 differences are
 *    neglected. In 2100 this gives 2.383 W m-2; as a cross-check, the scenario's nominal 1.9 W m-2
 *    times the mean ratio of AR6 ERF to nominal label of the other four (3.10/2.6, 5.40/4.5,
 *    8.18/7.0, 10.0/8.5 → 1.185) gives 2.25 W m-2.
 * 5. CO2 concentrations (only used for the slope of the logarithmic CO2 law in the permafrost-carbon
 *    feedback): historical anchors from memory (ice core and Mauna Loa records as compiled for CMIP6
 *    [4]), 2100 per scenario from Meinshausen et al. 2020 [3] (446 / 603 / 867 / 1135 ppm read,
 *    SSP1-1.9 393 from memory), 2050 values from memory (approximate), linear between anchors.
 *
 * References (DOIs from memory except those given in the engine issue):
 * [1] P. Forster et al., "The Earth's energy budget, climate feedbacks, and climate sensitivity,"
 *     in IPCC AR6 WG1, Cambridge Univ. Press, 2021, ch. 7, doi:10.1017/9781009157896.009.
 * [2] IPCC AR6 WG1 Annex III, "Tables of historical and projected well-mixed greenhouse gas mixing
 *     ratios and effective radiative forcing of all climate forcers," 2021, doi:10.1017/9781009157896.017.
 * [3] M. Meinshausen et al., "The shared socio-economic pathway (SSP) greenhouse gas concentrations and
 *     their extensions to 2500," Geosci. Model Dev. 13, 3571–3605, 2020, doi:10.5194/gmd-13-3571-2020.
 * [4] M. Meinshausen et al., "Historical greenhouse gas concentrations for climate modelling (CMIP6),"
 *     Geosci. Model Dev. 10, 2057–2116, 2017, doi:10.5194/gmd-10-2057-2017.
 * [5] F. N. Fritsch and R. E. Carlson, "Monotone piecewise cubic interpolation," SIAM J. Numer. Anal.
 *     17(2), 238–246, 1980, doi:10.1137/0717021.
 */
import { CO2_FORCING_SCALE_W_M2 } from '../constants';

export type ScenarioId = 'SSP1-1.9' | 'SSP1-2.6' | 'SSP2-4.5' | 'SSP3-7.0' | 'SSP5-8.5';

/** First and last year of the pathways [yr]. */
export const FORCING_FIRST_YEAR = 1750;
export const FORCING_LAST_YEAR = 2100;
/** Last year of the historical pathway; scenarios start the year after (CMIP6 convention). */
export const HISTORICAL_LAST_YEAR = 2014;

/**
 * Historical total ERF anchors [year, W m-2] relative to 1750, volcanic smoothed out.
 * Values 1850–2014 from memory of AR6 WG1 ch. 7 Fig. 7.8 / Annex III (shape only); 2019 read (2.72).
 */
export const HISTORICAL_ERF_ANCHORS: ReadonlyArray<readonly [number, number]> = [
  [1750, 0],
  [1850, 0.2],
  [1870, 0.25],
  [1890, 0.28],
  [1900, 0.32],
  [1910, 0.38],
  [1920, 0.45],
  [1930, 0.52],
  [1940, 0.6],
  [1950, 0.62],
  [1960, 0.75],
  [1970, 0.92],
  [1980, 1.25],
  [1990, 1.62],
  [2000, 1.92],
  [2010, 2.3],
  [2014, 2.5],
  [2019, 2.72],
];

/** AR6 total ERF in 2020 / 2050 / 2100 [W m-2] per scenario (AR6 WG1 ch. 7 [1], read as given in the issue). */
export const SCENARIO_ERF_ANCHORS_W_M2: Readonly<Record<Exclude<ScenarioId, 'SSP1-1.9'>, readonly [number, number, number]>> = {
  'SSP1-2.6': [2.8, 3.58, 3.1],
  'SSP2-4.5': [2.83, 4.24, 5.4],
  'SSP3-7.0': [2.76, 4.63, 8.18],
  'SSP5-8.5': [2.94, 5.3, 10.0],
};
export const SCENARIO_ERF_ANCHOR_YEARS = [2020, 2050, 2100] as const;

/** CO2 in 2100 [ppm] (Meinshausen et al. 2020 [3]; SSP1-1.9 from memory, the others read as given in the issue). */
export const CO2_2100_PPM: Readonly<Record<ScenarioId, number>> = {
  'SSP1-1.9': 393,
  'SSP1-2.6': 446,
  'SSP2-4.5': 603,
  'SSP3-7.0': 867,
  'SSP5-8.5': 1135,
};
/** CO2 in 2050 [ppm], from memory of Meinshausen et al. 2020 [3], approximate. */
export const CO2_2050_PPM: Readonly<Record<ScenarioId, number>> = {
  'SSP1-1.9': 430,
  'SSP1-2.6': 460,
  'SSP2-4.5': 510,
  'SSP3-7.0': 540,
  'SSP5-8.5': 565,
};
/** Historical CO2 anchors [year, ppm], from memory of the CMIP6 historical compilation [4]. */
export const HISTORICAL_CO2_ANCHORS_PPM: ReadonlyArray<readonly [number, number]> = [
  [1750, 278.3],
  [1850, 285.2],
  [1900, 295.7],
  [1950, 310.7],
  [1970, 325.7],
  [1990, 354.4],
  [2000, 369.7],
  [2010, 389.0],
  [2020, 412.0],
];

function linearAnchors(anchors: ReadonlyArray<readonly [number, number]>, year: number): number {
  if (year <= anchors[0][0]) return anchors[0][1];
  for (let i = 1; i < anchors.length; i++) {
    const [y1, v1] = anchors[i];
    if (year <= y1) {
      const [y0, v0] = anchors[i - 1];
      return v0 + ((v1 - v0) * (year - y0)) / (y1 - y0);
    }
  }
  return anchors[anchors.length - 1][1];
}

/**
 * Shape-preserving cubic Hermite interpolation (Fritsch & Carlson 1980 [5]) through knots.
 * @param xs Strictly increasing knot abscissae.
 * @param ys Knot values.
 * @param x Where to evaluate (clamped to the knot range).
 */
export function monotoneCubic(xs: readonly number[], ys: readonly number[], x: number): number {
  const n = xs.length;
  if (x <= xs[0]) return ys[0];
  if (x >= xs[n - 1]) return ys[n - 1];
  const h: number[] = [];
  const delta: number[] = [];
  for (let i = 0; i < n - 1; i++) {
    h.push(xs[i + 1] - xs[i]);
    delta.push((ys[i + 1] - ys[i]) / h[i]);
  }
  const m = new Array<number>(n);
  m[0] = delta[0];
  m[n - 1] = delta[n - 2];
  for (let i = 1; i < n - 1; i++) {
    if (delta[i - 1] * delta[i] <= 0) m[i] = 0;
    else {
      // Weighted harmonic mean of the neighbouring slopes (Fritsch & Butland form of [5]).
      const w1 = 2 * h[i] + h[i - 1];
      const w2 = h[i] + 2 * h[i - 1];
      m[i] = (w1 + w2) / (w1 / delta[i - 1] + w2 / delta[i]);
    }
  }
  let k = 0;
  while (x > xs[k + 1]) k++;
  const t = (x - xs[k]) / h[k];
  const t2 = t * t;
  const t3 = t2 * t;
  return (
    (2 * t3 - 3 * t2 + 1) * ys[k] + (t3 - 2 * t2 + t) * h[k] * m[k] + (-2 * t3 + 3 * t2) * ys[k + 1] + (t3 - t2) * h[k] * m[k + 1]
  );
}

/**
 * Historical total ERF in a year [W m-2] relative to 1750 (volcanic smoothed out).
 * @param year Calendar year; held at the 2019 value after 2019 (use the scenario pathways instead).
 */
export function historicalErfWm2(year: number): number {
  return linearAnchors(HISTORICAL_ERF_ANCHORS, year);
}

/** CO2 concentration [ppm] in a year along a scenario (approximate; see the file comment, item 5). */
export function co2ConcentrationPpm(scenario: ScenarioId, year: number): number {
  if (year <= 2020) return linearAnchors(HISTORICAL_CO2_ANCHORS_PPM, year);
  return linearAnchors(
    [
      [2020, 412.0],
      [2050, CO2_2050_PPM[scenario]],
      [2100, CO2_2100_PPM[scenario]],
    ],
    year,
  );
}

function anchoredScenarioErf(scenario: Exclude<ScenarioId, 'SSP1-1.9'>, year: number): number {
  const [f20, f50, f100] = SCENARIO_ERF_ANCHORS_W_M2[scenario];
  return monotoneCubic([HISTORICAL_LAST_YEAR, ...SCENARIO_ERF_ANCHOR_YEARS], [historicalErfWm2(HISTORICAL_LAST_YEAR), f20, f50, f100], year);
}

/** CO2 gap SSP1-2.6 − SSP1-1.9 [ppm], opening linearly from 2020 to 2100 (reconstruction, item 4). */
function ssp119Co2GapPpm(year: number): number {
  if (year <= 2020) return 0;
  const full = CO2_2100_PPM['SSP1-2.6'] - CO2_2100_PPM['SSP1-1.9'];
  return (full * Math.min(year - 2020, 80)) / 80;
}

/**
 * Total effective radiative forcing [W m-2] relative to 1750 in a year along a scenario.
 * @param scenario One of the five AR6 SSPs.
 * @param year Calendar year, 1750–2100 (clamped outside).
 * @returns ERF [W m-2]: historical to 2014, the scenario pathway from 2015 (see the file comment).
 */
export function scenarioErfWm2(scenario: ScenarioId, year: number): number {
  const y = Math.min(Math.max(year, FORCING_FIRST_YEAR), FORCING_LAST_YEAR);
  if (y <= HISTORICAL_LAST_YEAR) return historicalErfWm2(y);
  if (scenario !== 'SSP1-1.9') return anchoredScenarioErf(scenario, y);
  const base = anchoredScenarioErf('SSP1-2.6', y);
  const c126 = co2ConcentrationPpm('SSP1-2.6', y);
  const gap = ssp119Co2GapPpm(y);
  return base - CO2_FORCING_SCALE_W_M2 * Math.log(c126 / (c126 - gap));
}

