/**
 * Screening rating of ground thaw sensitivity for one ground profile and one window: `low`,
 * `moderate`, `high`, shown as lower / moderate / higher concern "in this screening" (never
 * "safe"), with structured reason codes, a confidence level and the list of what the 1-D model does
 * not see (from the site checklist).
 *
 * API: `rateHazard(input: HazardInput): HazardRating`; `HAZARD_LABELS`; `NOT_MODELLED_TEXT`.
 *
 * Approach: like the settlement-risk zonation of Nelson et al. [1] and the infrastructure hazard
 * index of Hjort et al. [2], the rating combines the thaw of ice-bearing ground (here the modelled
 * cumulative settlement and the ice content just below the permafrost table) with the ground's
 * thermal state (mean annual ground temperature, talik). Thresholds are in lib/engine/constants.ts:
 * warm permafrost above −2 °C and very warm above −1 °C (common practice in cold-regions
 * engineering; frozen soil loses strength and creeps faster near 0 °C, [3], from memory); settlement 0.10 m
 * and 0.30 m (common practice, a screening choice of this engine).
 *
 * Rules (each adds its reason code; the rating is the highest level any rule gives):
 * - no permafrost in the modelled column at baseline: `no_permafrost_modelled` → low.
 * - permafrost present at baseline but none left in the window: `permafrost_thawed_through` → high.
 * - a talik in the window: `talik` → high.
 * - settlement ≥ 0.30 m: `settlement_high` → high; ≥ 0.10 m: `settlement_moderate` → moderate.
 * - MAGT > −1 °C: `very_warm_permafrost` → moderate, high when also ice-rich below the table.
 * - −2 < MAGT ≤ −1 °C: `warm_permafrost` → moderate.
 * - MAGT ≤ −2 °C: `cold_permafrost` (no level).
 * - mean thaw strain ≥ 0.10 in the 2 m below the permafrost table: `ice_rich_below_active_layer`
 *   (no level on its own: it raises very warm permafrost to high).
 * - ice content assumed for an undescribed layer in that zone: `ice_content_assumed` (no level).
 * - each checklist item answered "present": `checklist_<item>`, raises a low rating to moderate (a
 *   1-D model cannot quantify it, so the screening does not leave it at lower concern), and adds
 *   the item to `not_modelled`.
 *
 * Confidence: `measured_inputs` when the thermal state is tied to observations (calibration reached
 * its target, or the run starts from an observed profile) and no layer's ice is assumed;
 * `partly_measured_inputs` when one of the two holds; `assumed_inputs` otherwise.
 *
 * References:
 * [1] F. E. Nelson, O. A. Anisimov, N. I. Shiklomanov, "Subsidence risk from thawing permafrost,"
 *     Nature 410, 889–890, 2001, doi:10.1038/35069701.
 * [2] J. Hjort et al., "Degrading permafrost puts Arctic infrastructure at risk by mid-century,"
 *     Nat. Commun. 9, 5147, 2018, doi:10.1038/s41467-018-07557-4.
 * [3] O. B. Andersland, B. Ladanyi, Frozen Ground Engineering, 2nd ed., Wiley/ASCE, 2004.
 */
import {
  ICE_RICH_THAW_STRAIN,
  SETTLEMENT_HIGH_M,
  SETTLEMENT_MODERATE_M,
  VERY_WARM_PERMAFROST_C,
  WARM_PERMAFROST_C,
} from './constants';
import { CHECKLIST_ITEMS, type ChecklistItem, type Site } from './site-schema';

export type HazardLevel = 'low' | 'moderate' | 'high';
export type Confidence = 'measured_inputs' | 'partly_measured_inputs' | 'assumed_inputs';

export type HazardReason =
  | 'no_permafrost_modelled'
  | 'permafrost_thawed_through'
  | 'talik'
  | 'settlement_high'
  | 'settlement_moderate'
  | 'very_warm_permafrost'
  | 'warm_permafrost'
  | 'cold_permafrost'
  | 'ice_rich_below_active_layer'
  | 'ice_content_assumed'
  | `checklist_${ChecklistItem}`;

/** How each level is shown: never "safe". */
export const HAZARD_LABELS: Record<HazardLevel, string> = {
  low: 'lower concern in this screening',
  moderate: 'moderate concern in this screening',
  high: 'higher concern in this screening',
};

/** What each checklist item means for a 1-D model, for the "not modelled" list. */
export const NOT_MODELLED_TEXT: Record<ChecklistItem, string> = {
  ponding: 'ponding or poor drainage: standing water warms the ground and deepens thaw; surface water is not modelled',
  groundwater_flow: 'groundwater flow: moving water carries heat sideways and can open taliks; the model conducts heat vertically only',
  heated_buildings: 'heated buildings: heat from floors and utilities thaws the ground below; buildings are not modelled',
  snow_drifts: 'snow drifts: deep drifted snow insulates and warms the ground; only the snow case chosen is modelled',
  surface_disturbance: 'surface disturbance: removing vegetation or organic cover deepens thaw beyond the cover type chosen',
  recent_fire: 'recent fire: burning the organic layer deepens thaw for decades; the burned state is not modelled',
  erosion_or_slope_movement: 'erosion or slope movement: loss or movement of ground is not modelled',
};

export interface HazardInput {
  /** Window-mean ground temperature at the baseline depth of zero annual amplitude [°C]. */
  groundTemperatureC: number;
  /** Permafrost exists in the modelled column at baseline. */
  baselinePermafrost: boolean;
  /** Permafrost exists in the modelled column in every year of the window. */
  windowPermafrost: boolean;
  /** A talik in any year of the window. */
  talik: boolean;
  /** Cumulative settlement at the end of the window [m]. */
  settlementM: number;
  /** Mean thaw strain in the transition zone below the baseline permafrost table [-]. */
  transitionZoneStrain: number;
  /** Any layer in that zone has assumed (undescribed) ice. */
  transitionZoneIceAssumed: boolean;
  /** Any layer of the profile has assumed (undescribed) ice. */
  anyIceAssumed: boolean;
  /** The thermal state is tied to observations (calibration reached its target, or observed start). */
  thermalStateObserved: boolean;
  checklist?: Site['checklist'];
}

export interface HazardRating {
  hazard: HazardLevel;
  hazard_label: string;
  hazard_reasons: HazardReason[];
  confidence: Confidence;
  not_modelled: ChecklistItem[];
}

const RANK: Record<HazardLevel, number> = { low: 0, moderate: 1, high: 2 };
const raise = (a: HazardLevel, b: HazardLevel): HazardLevel => (RANK[b] > RANK[a] ? b : a);

/**
 * Rates ground thaw sensitivity for one window by the rules in this module's header [1, 2].
 * @param input Modelled window state: temperature [°C], settlement [m], strain [-], flags.
 * @returns Level, its label, reason codes (in rule order), confidence and the not-modelled list.
 */
export function rateHazard(input: HazardInput): HazardRating {
  const reasons: HazardReason[] = [];
  let level: HazardLevel = 'low';
  const iceRich = input.transitionZoneStrain >= ICE_RICH_THAW_STRAIN;

  if (!input.baselinePermafrost) {
    reasons.push('no_permafrost_modelled');
  } else {
    if (!input.windowPermafrost) {
      reasons.push('permafrost_thawed_through');
      level = raise(level, 'high');
    }
    if (input.talik) {
      reasons.push('talik');
      level = raise(level, 'high');
    }
    if (input.settlementM >= SETTLEMENT_HIGH_M) {
      reasons.push('settlement_high');
      level = raise(level, 'high');
    } else if (input.settlementM >= SETTLEMENT_MODERATE_M) {
      reasons.push('settlement_moderate');
      level = raise(level, 'moderate');
    }
    const t = input.groundTemperatureC;
    if (t > VERY_WARM_PERMAFROST_C) {
      reasons.push('very_warm_permafrost');
      level = raise(level, iceRich ? 'high' : 'moderate');
    } else if (t > WARM_PERMAFROST_C) {
      reasons.push('warm_permafrost');
      level = raise(level, 'moderate');
    } else {
      reasons.push('cold_permafrost');
    }
    if (iceRich) reasons.push('ice_rich_below_active_layer');
    if (input.transitionZoneIceAssumed) reasons.push('ice_content_assumed');
  }

  const notModelled: ChecklistItem[] = [];
  for (const item of CHECKLIST_ITEMS) {
    if (input.checklist?.[item] === 'present') {
      notModelled.push(item);
      reasons.push(`checklist_${item}`);
      level = raise(level, 'moderate');
    }
  }

  const score = (input.thermalStateObserved ? 1 : 0) + (input.anyIceAssumed ? 0 : 1);
  const confidence: Confidence = score === 2 ? 'measured_inputs' : score === 1 ? 'partly_measured_inputs' : 'assumed_inputs';
  return { hazard: level, hazard_label: HAZARD_LABELS[level], hazard_reasons: reasons, confidence, not_modelled: notModelled };
}
