/**
 * Permafrost-carbon feedback: carbon from thawing permafrost, decomposed with a Q10 temperature
 * sensitivity, raises atmospheric CO2 and so the forcing. Optional in the scenario emulator (off by
 * default: the AR6 SPM.1 warming it is checked against does not include it).
 *
 * Model (a deliberately small box model; each parameter below names its source):
 * - Frozen pool: the soil organic carbon of the 0–3 m layer of the northern permafrost region,
 *   1035 PgC (Hugelius et al. 2014 [1], from memory).
 * - Thaw: the thawed share of the pool follows global warming, s · T (capped at 1, never refreezes),
 *   with s = 0.25 per K, AR6's near-surface (top 3 m) permafrost volume loss of about 25 % per °C of
 *   global warming (AR6 WG1 ch. 9, 9.5.2.3 [3]; from memory).
 * - Decomposition: a decomposable fraction f = 0.10 of thawed carbon (the rest is taken as passive
 *   on the century scale) decays first-order at k = Q10^(A·T/10) / τ, with τ = 20 yr at pre-industrial
 *   soil temperature, Q10 = 2.5 and local soil warming A·T with A = 2 times the global warming.
 *   f and τ are of the order of the slow pool of long-term incubations (Schädel et al. 2014 [4], from
 *   memory, order of magnitude only; the field is colder than incubations, hence a longer τ);
 *   Q10 = 2.5 is within the usual 1.5–3 of soil respiration (common practice); A = 2 is the annual
 *   mean of the Arctic-land factors of regional-warming.ts.
 * - All release is taken as CO2 (the smaller CH4 part, which AR6 assesses separately, is left out),
 *   and its airborne part follows the CO2 impulse response of Joos et al. 2013 [5].
 * - Forcing: ΔF = a ln((C + ΔC) / C), a = 3.93 / ln 2 (Myhre et al. 1998 form scaled to AR6's F2x),
 *   with C the scenario's CO2 concentration.
 *
 * Check (in the test): the release to 2100 per degree of global warming lies inside AR6 WG1 ch. 5's
 * assessed permafrost CO2 feedback, 18 (5–95 %: 3.1–41) PgC per °C (AR6 WG1 ch. 5, 5.4.3.2 and
 * Table 5.7 [2]; from memory).
 *
 * References (DOIs from memory except those given in the engine issue):
 * [1] G. Hugelius et al., "Estimated stocks of circumpolar permafrost carbon with quantified uncertainty
 *     ranges and identified data gaps," Biogeosciences 11, 6573–6593, 2014, doi:10.5194/bg-11-6573-2014.
 * [2] J. G. Canadell et al., "Global carbon and other biogeochemical cycles and feedbacks," IPCC AR6
 *     WG1 ch. 5, 2021, doi:10.1017/9781009157896.007.
 * [3] B. Fox-Kemper et al., "Ocean, cryosphere and sea level change," IPCC AR6 WG1 ch. 9, 2021,
 *     doi:10.1017/9781009157896.011.
 * [4] C. Schädel et al., "Circumpolar assessment of permafrost C quality and its vulnerability over time
 *     using long-term incubation data," Glob. Change Biol. 20, 641–652, 2014, doi:10.1111/gcb.12417.
 * [5] F. Joos et al., "Carbon dioxide and climate impulse response functions for the computation of
 *     greenhouse gas metrics," Atmos. Chem. Phys. 13, 2793–2825, 2013, doi:10.5194/acp-13-2793-2013.
 */
import {
  CO2_FORCING_SCALE_W_M2,
  CO2_IRF_A,
  CO2_IRF_A0,
  CO2_IRF_TAU_YR,
  PERMAFROST_SOC_0_3M_PGC,
  PGC_PER_PPM_CO2,
} from './constants';

/** Parameters of the permafrost-carbon box model (units in the names; sources in the file comment). */
export interface PermafrostCarbonParameters {
  frozenPoolPgC: number;
  thawFractionPerK: number;
  decomposableFraction: number;
  turnoverYr: number;
  q10: number;
  soilWarmingPerGlobalK: number;
}

export const PERMAFROST_CARBON_DEFAULTS: Readonly<PermafrostCarbonParameters> = Object.freeze({
  frozenPoolPgC: PERMAFROST_SOC_0_3M_PGC,
  thawFractionPerK: 0.25,
  decomposableFraction: 0.1,
  turnoverYr: 20,
  q10: 2.5,
  soilWarmingPerGlobalK: 2.0,
});

/** AR6 WG1 ch. 5 assessed permafrost CO2 feedback [PgC K-1]: 18, 5–95 % range 3.1–41 (from memory). */
export const AR6_PERMAFROST_CO2_FEEDBACK_PGC_PER_K = { best: 18, low: 3.1, high: 41 } as const;

/** Mutable state of the feedback model. */
export interface PermafrostCarbonState {
  /** Carbon thawed so far [PgC]. */
  thawedPgC: number;
  /** Decomposable thawed carbon not yet released [PgC]. */
  decomposablePgC: number;
  /** Cumulative release [PgC]. */
  releasedPgC: number;
  /** Airborne carbon of the release in each impulse-response box [PgC] (index 0: permanent part). */
  airborneBoxesPgC: Float64Array;
}

export function newPermafrostCarbonState(): PermafrostCarbonState {
  return { thawedPgC: 0, decomposablePgC: 0, releasedPgC: 0, airborneBoxesPgC: new Float64Array(1 + CO2_IRF_A.length) };
}

/**
 * Advance the permafrost-carbon model one year, in place.
 * @param state Model state, updated.
 * @param globalWarmingK Global surface warming of the year relative to pre-industrial [K].
 * @param p Parameters.
 * @returns The year's release [PgC yr-1].
 */
export function stepPermafrostCarbonYear(state: PermafrostCarbonState, globalWarmingK: number, p: PermafrostCarbonParameters = PERMAFROST_CARBON_DEFAULTS): number {
  const warming = Math.max(globalWarmingK, 0);
  const target = p.frozenPoolPgC * Math.min(1, p.thawFractionPerK * warming);
  if (target > state.thawedPgC) {
    state.decomposablePgC += p.decomposableFraction * (target - state.thawedPgC);
    state.thawedPgC = target;
  }
  const k = Math.pow(p.q10, (p.soilWarmingPerGlobalK * warming) / 10) / p.turnoverYr;
  const release = state.decomposablePgC * (1 - Math.exp(-k));
  state.decomposablePgC -= release;
  state.releasedPgC += release;
  const boxes = state.airborneBoxesPgC;
  boxes[0] += CO2_IRF_A0 * release;
  for (let i = 0; i < CO2_IRF_A.length; i++) {
    boxes[i + 1] = boxes[i + 1] * Math.exp(-1 / CO2_IRF_TAU_YR[i]) + CO2_IRF_A[i] * release;
  }
  return release;
}

/** Extra atmospheric CO2 from the release [ppm]. */
export function permafrostAirborneCo2Ppm(state: PermafrostCarbonState): number {
  let sum = 0;
  for (let i = 0; i < state.airborneBoxesPgC.length; i++) sum += state.airborneBoxesPgC[i];
  return sum / PGC_PER_PPM_CO2;
}

/**
 * Extra forcing from the permafrost CO2 [W m-2], logarithmic law scaled to AR6's F2x.
 * @param extraCo2Ppm Added CO2 [ppm].
 * @param baseCo2Ppm The scenario's CO2 concentration that year [ppm].
 */
export function permafrostCo2ForcingWm2(extraCo2Ppm: number, baseCo2Ppm: number): number {
  return CO2_FORCING_SCALE_W_M2 * Math.log((baseCo2Ppm + extraCo2Ppm) / baseCo2Ppm);
}
