import { describe, expect, it } from 'vitest';
import { rateHazard, HAZARD_LABELS, type HazardInput } from './hazard';

// Thresholds: warm > −2 °C, very warm > −1 °C (common practice); settlement 0.10 / 0.30 m (common
// practice, this engine's screening choice); approach after Nelson et al. 2001 (doi:10.1038/35069701)
// and Hjort et al. 2018 (doi:10.1038/s41467-018-07557-4).
const base: HazardInput = {
  groundTemperatureC: -4,
  baselinePermafrost: true,
  windowPermafrost: true,
  talik: false,
  settlementM: 0,
  transitionZoneStrain: 0.02,
  transitionZoneIceAssumed: false,
  anyIceAssumed: false,
  thermalStateObserved: false,
};

describe('hazard rules', () => {
  it('cold permafrost without settlement or talik is of lower concern, never called safe', () => {
    const r = rateHazard(base);
    expect(r.hazard).toBe('low');
    expect(r.hazard_reasons).toEqual(['cold_permafrost']);
    for (const label of Object.values(HAZARD_LABELS)) {
      expect(label).toMatch(/in this screening$/);
      expect(label.toLowerCase()).not.toContain('safe');
    }
  });

  it('warm (−2 … −1 °C) and very warm (> −1 °C) permafrost (common practice)', () => {
    expect(rateHazard({ ...base, groundTemperatureC: -1.5 })).toMatchObject({ hazard: 'moderate', hazard_reasons: ['warm_permafrost'] });
    expect(rateHazard({ ...base, groundTemperatureC: -2 }).hazard_reasons).toContain('cold_permafrost');
    expect(rateHazard({ ...base, groundTemperatureC: -0.5 }).hazard).toBe('moderate');
    // The contract's example: warm permafrost over ice-rich ground → moderate with both reasons.
    expect(rateHazard({ ...base, groundTemperatureC: -1.2, transitionZoneStrain: 0.2 })).toMatchObject({
      hazard: 'moderate',
      hazard_reasons: ['warm_permafrost', 'ice_rich_below_active_layer'],
    });
    // Very warm and ice-rich → higher (hazard.ts rule; warm frozen soil creeps faster, Andersland & Ladanyi 2004, from memory).
    expect(rateHazard({ ...base, groundTemperatureC: -0.5, transitionZoneStrain: 0.2 }).hazard).toBe('high');
  });

  it('settlement thresholds 0.10 and 0.30 m (common practice)', () => {
    expect(rateHazard({ ...base, settlementM: 0.099 }).hazard).toBe('low');
    expect(rateHazard({ ...base, settlementM: 0.1 })).toMatchObject({ hazard: 'moderate' });
    expect(rateHazard({ ...base, settlementM: 0.3 }).hazard_reasons).toContain('settlement_high');
    expect(rateHazard({ ...base, settlementM: 0.3 }).hazard).toBe('high');
  });

  it('a talik or permafrost thawed through gives higher concern (Nelson et al. 2001)', () => {
    expect(rateHazard({ ...base, talik: true })).toMatchObject({ hazard: 'high' });
    expect(rateHazard({ ...base, windowPermafrost: false }).hazard_reasons).toContain('permafrost_thawed_through');
    expect(rateHazard({ ...base, baselinePermafrost: false }).hazard_reasons).toEqual(['no_permafrost_modelled']);
  });

  // Issue 3: each "present" checklist answer adds a stated reason and a "not modelled" entry.
  it('each checklist item present adds a reason and a not-modelled entry, and raises low to moderate', () => {
    const r = rateHazard({ ...base, checklist: { ponding: 'present', groundwater_flow: 'absent', heated_buildings: 'present', snow_drifts: 'unknown', surface_disturbance: 'absent', recent_fire: 'absent', erosion_or_slope_movement: 'absent' } });
    expect(r.not_modelled).toEqual(['ponding', 'heated_buildings']);
    expect(r.hazard_reasons).toEqual(['cold_permafrost', 'checklist_ponding', 'checklist_heated_buildings']);
    expect(r.hazard).toBe('moderate');
    // "unknown" and "absent" add nothing.
    expect(rateHazard({ ...base, checklist: { ponding: 'unknown', groundwater_flow: 'absent', heated_buildings: 'absent', snow_drifts: 'absent', surface_disturbance: 'absent', recent_fire: 'absent', erosion_or_slope_movement: 'absent' } }).not_modelled).toEqual([]);
  });

  // Issue 3: a confidence level from measured or assumed inputs (rule in hazard.ts).
  it('confidence follows measured vs assumed inputs', () => {
    expect(rateHazard(base).confidence).toBe('partly_measured_inputs');
    expect(rateHazard({ ...base, thermalStateObserved: true }).confidence).toBe('measured_inputs');
    expect(rateHazard({ ...base, anyIceAssumed: true }).confidence).toBe('assumed_inputs');
    expect(rateHazard({ ...base, transitionZoneIceAssumed: true, anyIceAssumed: true }).hazard_reasons).toContain('ice_content_assumed');
  });
});
