import { describe, expect, it } from 'vitest';
import { runEngineCommand } from '../run-command';

describe('climate command (engine contract)', () => {
  it('returns years 1850..2100 and a finite warming per year', async () => {
    const out = await runEngineCommand('climate', JSON.stringify({ scenario: 'SSP1-2.6' }));
    expect(out.ok).toBe(true);
    if (!out.ok) return;
    const o = out.output as { years: number[]; global_warming_c: number[] };
    expect(o.years[0]).toBe(1850);
    expect(o.years.at(-1)).toBe(2100);
    expect(o.global_warming_c).toHaveLength(o.years.length);
    expect(Object.keys(o).sort()).toEqual(['global_warming_c', 'years']);
  });

  it('feedback defaults to false; true gives at least as much warming (permafrost carbon adds CO2)', async () => {
    const off = await runEngineCommand('climate', JSON.stringify({ scenario: 'SSP5-8.5' }));
    const offExplicit = await runEngineCommand('climate', JSON.stringify({ scenario: 'SSP5-8.5', permafrost_carbon_feedback: false }));
    const on = await runEngineCommand('climate', JSON.stringify({ scenario: 'SSP5-8.5', permafrost_carbon_feedback: true }));
    if (!off.ok || !on.ok || !offExplicit.ok) throw new Error('expected success');
    expect(off.output).toEqual(offExplicit.output);
    const a = (off.output as { global_warming_c: number[] }).global_warming_c;
    const b = (on.output as { global_warming_c: number[] }).global_warming_c;
    expect(b.at(-1)!).toBeGreaterThan(a.at(-1)!);
  });

  it('bad input: unknown scenario, wrong type, unknown field, missing scenario → status 2 with the field named', async () => {
    const cases: Array<[unknown, RegExp]> = [
      [{ scenario: 'SSP4-6.0' }, /^scenario: must be one of "SSP1-1.9", "SSP1-2.6", "SSP2-4.5", "SSP3-7.0", "SSP5-8.5"$/],
      [{ scenario: 'SSP2-4.5', permafrost_carbon_feedback: 'yes' }, /^permafrost_carbon_feedback: /],
      [{ scenario: 'SSP2-4.5', horizon: 2050 }, /^horizon: unknown field$/],
      [{}, /^scenario: /],
    ];
    for (const [input, reason] of cases) {
      const out = await runEngineCommand('climate', JSON.stringify(input));
      expect(out.ok).toBe(false);
      if (out.ok) continue;
      expect(out.status).toBe(2);
      expect(out.reason).toMatch(reason);
    }
  });
});
