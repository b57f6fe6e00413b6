/**
 * The `ground` command through the real CLI (`npm run --silent engine -- ground`), checked against
 * the engine contract (docs/engine-contract.md) and against analytical solutions of heat
 * conduction (Carslaw & Jaeger 1959, Conduction of Heat in Solids, 2nd ed.).
 */
import { spawnSync } from 'node:child_process';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { neumannTwoPhaseThaw, thawDepthStefan } from '../../lib/engine/stefan';
import { contractExample, contractLayer } from '../fixtures/engine/ground-contract-example';

const root = path.resolve(__dirname, '..', '..');

function runCli(input: unknown) {
  const text = typeof input === 'string' ? input : JSON.stringify(input);
  const r = spawnSync('npm', ['run', '--silent', 'engine', '--', 'ground'], { cwd: root, input: text, encoding: 'utf8', timeout: 60_000 });
  return { status: r.status, stdout: r.stdout, stderr: r.stderr };
}

interface Out {
  times_days: number[];
  thaw_depth_m: number[];
  temperature_c: number[][];
  annual: { year: number; max_thaw_depth_m: number; mean_temperature_c: number[]; min_temperature_c: number[]; max_temperature_c: number[]; talik: boolean }[];
}

function ok(input: unknown): Out {
  const r = runCli(input);
  expect(r.stderr).toBe('');
  expect(r.status).toBe(0);
  return JSON.parse(r.stdout) as Out;
}


describe('engine CLI: ground', () => {
  it('the contract example gives close to the listed numbers', () => {
    const out = ok(contractExample);
    // Source: the engine contract's example output (values there are approximate, 2 decimals):
    // thaw 0.29 / 0.41 / 0.51 m; tolerance 0.02 m and 0.15 K for "approximate" (our choice).
    expect(out.times_days).toEqual([10, 20, 30]);
    const listedThaw = [0.29, 0.41, 0.51];
    const listedT = [
      [0.77, -0.27, -0.89],
      [1.97, -0.08, -0.55],
      [2.49, 0.14, -0.38],
    ];
    out.thaw_depth_m.forEach((v, i) => expect(Math.abs(v - listedThaw[i])).toBeLessThanOrEqual(0.02));
    out.temperature_c.forEach((row, i) => row.forEach((v, j) => expect(Math.abs(v - listedT[i][j])).toBeLessThanOrEqual(0.15)));
    expect(out.annual).toEqual([]);
  });

  it('two-phase Neumann solution: thaw front within 4 % after 20 days (contract example)', () => {
    const out = ok({ ...contractExample, duration_days: 20, output: { every_days: 20, depths_m: [0.5] } });
    // Carslaw & Jaeger 1959, §11.2 (two-phase Neumann solution), X = 2λ√(α_t t).
    const exact = neumannTwoPhaseThaw({
      surfaceTemperatureC: 5,
      initialTemperatureC: -2,
      conductivityThawedWmK: 1.2,
      conductivityFrozenWmK: 2.0,
      heatCapacityThawedJm3K: 2.6e6,
      heatCapacityFrozenJm3K: 1.9e6,
      latentHeatJm3: 1e8,
    }).frontDepthM(20 * 86400);
    expect(Math.abs(out.thaw_depth_m[0] / exact - 1)).toBeLessThanOrEqual(0.04);
  });

  it('two-phase Neumann solution: thaw front within 4 % after 20 days (a wet sand of our own, split into two identical layers)', () => {
    // Wet sand (our choice): θ = 0.2 → L = 0.2 × 1000 × 333.55e3 ≈ 6.67e7 J m-3; freezing point −0.5 °C.
    const sand = {
      conductivity_thawed_w_mk: 2.0,
      conductivity_frozen_w_mk: 2.6,
      heat_capacity_thawed_j_m3k: 2.2e6,
      heat_capacity_frozen_j_m3k: 1.8e6,
      latent_heat_j_m3: 6.67e7,
      freezing_point_c: -0.5,
    };
    const out = ok({
      layers: [
        { thickness_m: 0.37, ...sand },
        { thickness_m: 19.63, ...sand },
      ],
      initial_temperature_c: -6,
      surface: { kind: 'constant', temperature_c: 9 },
      duration_days: 20,
      output: { every_days: 20, depths_m: [0.1] },
    });
    // Carslaw & Jaeger 1959, §11.2.
    const exact = neumannTwoPhaseThaw({
      surfaceTemperatureC: 9,
      initialTemperatureC: -6,
      freezingPointC: -0.5,
      conductivityThawedWmK: 2.0,
      conductivityFrozenWmK: 2.6,
      heatCapacityThawedJm3K: 2.2e6,
      heatCapacityFrozenJm3K: 1.8e6,
      latentHeatJm3: 6.67e7,
    }).frontDepthM(20 * 86400);
    expect(exact).toBeGreaterThan(0.5); // the front has crossed the layer boundary at 0.37 m
    expect(Math.abs(out.thaw_depth_m[0] / exact - 1)).toBeLessThanOrEqual(0.04);
  });

  it("Stefan's approximation in the small-Stefan-number limit", () => {
    // Ground at its freezing point, surface 1 K above: Ste = C ΔT / L = 2e6 × 1 / 1.5e8 ≈ 0.013.
    const out = ok({
      layers: [{ ...contractLayer, heat_capacity_thawed_j_m3k: 2e6, heat_capacity_frozen_j_m3k: 2e6, latent_heat_j_m3: 1.5e8 }],
      initial_temperature_c: 0,
      surface: { kind: 'constant', temperature_c: 1 },
      duration_days: 60,
      output: { every_days: 60, depths_m: [0.1] },
    });
    // Stefan X = √(2 k I / L) (Lunardini 1981, Heat Transfer in Cold Climates); for Ste → 0 it is the
    // exact one-phase Neumann solution (Carslaw & Jaeger 1959, §11.2); tolerance 4 % as for Neumann.
    const stefan = thawDepthStefan(60, 1.2, 1.5e8);
    expect(Math.abs(out.thaw_depth_m[0] / stefan - 1)).toBeLessThanOrEqual(0.04);
  });

  it('periodic half-space: amplitude within 5 % and lag within 4 days (Carslaw & Jaeger 1959, §2.6)', () => {
    const k = 1.5;
    const c = 2.0e6;
    const out = ok({
      layers: [{ thickness_m: 40, conductivity_thawed_w_mk: k, conductivity_frozen_w_mk: k, heat_capacity_thawed_j_m3k: c, heat_capacity_frozen_j_m3k: c, latent_heat_j_m3: 0 }],
      initial_temperature_c: -3,
      surface: { kind: 'sinusoid', mean_c: -3, amplitude_c: 10, period_days: 365, phase_days: 0 },
      duration_days: 365 * 6,
      output: { every_days: 1, depths_m: [0, 1, 3] },
    });
    // T(z,t) = T̄ + A e^(−z/d) cos(ωt − z/d), d = √(2α/ω) (Carslaw & Jaeger 1959, §2.6).
    const omega = (2 * Math.PI) / (365 * 86400);
    const d = Math.sqrt((2 * (k / c)) / omega);
    const last = out.annual[out.annual.length - 1];
    expect(last.year).toBe(6);
    // the surface extremes over every step are the forcing's (the step ends on the peak day)
    expect(last.max_temperature_c[0]).toBeCloseTo(7, 6);
    expect(last.min_temperature_c[0]).toBeCloseTo(-13, 2);
    [1, 3].forEach((z, jj) => {
      const j = jj + 1;
      const amp = (last.max_temperature_c[j] - last.min_temperature_c[j]) / 2;
      const exactAmp = 10 * Math.exp(-z / d);
      expect(Math.abs(amp / exactAmp - 1)).toBeLessThanOrEqual(0.05);
      expect(Math.abs(last.mean_temperature_c[j] - -3)).toBeLessThanOrEqual(0.05 * exactAmp);
      // lag: day of the maximum in the last year against z/(d ω)
      let best = -Infinity;
      let bestDay = 0;
      out.times_days.forEach((t, i) => {
        if (t > 365 * 5 && out.temperature_c[i][j] > best) {
          best = out.temperature_c[i][j];
          bestDay = t - 365 * 5;
        }
      });
      const lagDays = z / d / omega / 86400;
      expect(Math.abs(bestDay - lagDays)).toBeLessThanOrEqual(4);
    });
  });

  it('annual entries: extremes over every step bracket the samples; a talik forms under a warm surface, none under a cold one', () => {
    const warm = ok({
      layers: [contractLayer],
      initial_temperature_c: [
        { depth_m: 0, temperature_c: -1 },
        { depth_m: 30, temperature_c: -0.5 },
      ],
      surface: { kind: 'daily', temperature_c: [3, 2, 4] },
      duration_days: 365 * 3,
      output: { every_days: 5, depths_m: [0.5, 2] },
    });
    expect(warm.annual.map((a) => a.year)).toEqual([1, 2, 3]);
    // Issue 3: a talik is a layer ≥ 0.2 m below the seasonal freezing depth thawed two years running.
    // The column starts frozen, so years 1–2 do not qualify (year 1 began frozen); years 2–3 do.
    expect(warm.annual.map((a) => a.talik)).toEqual([false, false, true]);
    warm.annual.forEach((a, y) => {
      warm.times_days.forEach((t, i) => {
        if (t > 365 * y && t <= 365 * (y + 1)) {
          a.min_temperature_c.forEach((m, j) => expect(m).toBeLessThanOrEqual(warm.temperature_c[i][j] + 1e-9));
          a.max_temperature_c.forEach((m, j) => expect(m).toBeGreaterThanOrEqual(warm.temperature_c[i][j] - 1e-9));
          expect(a.max_thaw_depth_m).toBeGreaterThanOrEqual(warm.thaw_depth_m[i] - 1e-9);
        }
      });
    });
    const cold = ok({
      layers: [contractLayer],
      initial_temperature_c: -6,
      surface: { kind: 'sinusoid', mean_c: -8, amplitude_c: 14, period_days: 365, phase_days: 200 },
      duration_days: 365 * 3,
      output: { every_days: 365, depths_m: [1] },
    });
    expect(cold.annual.map((a) => a.talik)).toEqual([false, false, false]);
    expect(cold.annual[2].max_thaw_depth_m).toBeGreaterThan(0.2);
  });

  describe('bad input: exit 2, nothing on stdout, one stderr line naming the field', () => {
    const cases: [string, unknown, string][] = [
      ['zero layer thickness', { ...contractExample, layers: [contractLayer, { ...contractLayer, thickness_m: 0 }] }, 'layers[1].thickness_m: must be > 0'],
      ['negative latent heat', { ...contractExample, layers: [{ ...contractLayer, latent_heat_j_m3: -1 }] }, 'layers[0].latent_heat_j_m3: must be >= 0'],
      ['unknown surface kind', { ...contractExample, surface: { kind: 'weekly', temperature_c: 1 } }, 'surface.kind:'],
      [
        'non-increasing profile depths',
        { ...contractExample, initial_temperature_c: [{ depth_m: 0, temperature_c: -1 }, { depth_m: 0, temperature_c: -2 }] },
        'initial_temperature_c[1].depth_m:',
      ],
      ['reporting depth below the column', { ...contractExample, output: { every_days: 10, depths_m: [0.5, 31] } }, 'output.depths_m[1]: must be <= the column depth'],
      ['missing duration', { ...contractExample, duration_days: undefined }, 'duration_days: is required'],
      ['not JSON', '{"layers": [', '(input): not valid JSON'],
      ['a 1e9 m layer (bounds, docs/site-schema.md)', { ...contractExample, layers: [{ ...contractLayer, thickness_m: 1e9 }] }, 'layers[0].thickness_m: must be <= 1000'],
      ['a conductivity of 1e300', { ...contractExample, layers: [{ ...contractLayer, conductivity_thawed_w_mk: 1e300 }] }, 'layers[0].conductivity_thawed_w_mk: must be <= 10'],
    ];
    for (const [name, input, reason] of cases) {
      it(name, () => {
        const r = runCli(input);
        expect(r.status).toBe(2);
        expect(r.stdout).toBe('');
        const lines = r.stderr.trimEnd().split('\n');
        expect(lines).toHaveLength(1);
        expect(lines[0].startsWith(reason)).toBe(true);
      });
    }
  });
});
