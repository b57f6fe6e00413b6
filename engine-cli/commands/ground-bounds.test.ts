/**
 * Bounds of the `ground` command (docs/site-schema.md, "Bounds"): inputs that are not physical or
 * that the solver cannot finish in its time budget are refused with status 2 and the field's name,
 * before any array is allocated or any step is taken.
 */
import { describe, expect, it } from 'vitest';
import { runEngineCommand } from '../run-command';
import { contractExample as base, contractLayer as layer } from '../../tests/fixtures/engine/ground-contract-example';

async function refusal(input: unknown): Promise<string> {
  const started = Date.now();
  const r = await runEngineCommand('ground', JSON.stringify(input));
  expect(Date.now() - started).toBeLessThan(5000); // refused before the solver runs
  if (r.ok) throw new Error('expected a refusal');
  expect(r.status).toBe(2);
  return r.reason;
}

describe('ground command: input bounds', () => {
  it('accepts the contract example (the bounds leave ordinary ground alone)', async () => {
    const r = await runEngineCommand('ground', JSON.stringify(base));
    expect(r.ok).toBe(true);
  });
  it('a 1e9 m layer names the thickness (it used to crash with "invalid array size")', async () => {
    expect(await refusal({ ...base, layers: [{ ...layer, thickness_m: 1e9 }] })).toBe('layers[0].thickness_m: must be <= 1000');
  });
  it('a conductivity of 1e300 names the conductivity (it used to be an internal error)', async () => {
    expect(await refusal({ ...base, layers: [{ ...layer, conductivity_frozen_w_mk: 1e300 }] })).toBe('layers[0].conductivity_frozen_w_mk: must be <= 10');
    expect(await refusal({ ...base, layers: [{ ...layer, conductivity_thawed_w_mk: 0.001 }] })).toBe('layers[0].conductivity_thawed_w_mk: must be >= 0.02');
  });
  it('heat capacity above that of water and latent heat above that of pure water are refused', async () => {
    expect(await refusal({ ...base, layers: [{ ...layer, heat_capacity_thawed_j_m3k: 5e7 }] })).toBe('layers[0].heat_capacity_thawed_j_m3k: must be <= 10000000');
    // ρw·Lf = 1000 kg m-3 × 333.7 kJ kg-1 = 3.34e8 J m-3 (common practice).
    expect(await refusal({ ...base, layers: [{ ...layer, latent_heat_j_m3: 4e8 }] })).toBe('layers[0].latent_heat_j_m3: must be <= 340000000');
  });
  it('50 layers of 1000 m (a 50 km column) are refused on the column depth', async () => {
    const reason = await refusal({ ...base, layers: Array.from({ length: 50 }, () => ({ ...layer, thickness_m: 1000 })) });
    expect(reason).toBe('layers: the layers add up to 50000 m; the column may be at most 1000 m deep');
  });
  it('a 1000 m column for 1000 years exceeds the cell-step budget and names duration_days', async () => {
    const reason = await refusal({ ...base, layers: [{ ...layer, thickness_m: 1000 }], duration_days: 365_000, output: { every_days: 365, depths_m: [1] } });
    expect(reason.startsWith('duration_days: with ')).toBe(true);
    expect(reason).toContain('cell-steps');
  });
});
