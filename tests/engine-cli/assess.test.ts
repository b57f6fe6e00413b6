/**
 * The `assess` command through the real CLI (`npm run --silent engine -- assess`), as the engine
 * contract (docs/engine-contract.md) specifies: JSON in on stdin, JSON out on stdout with the
 * listed fields and never NaN or Infinity; bad input exits 2 with one line naming the field on
 * stderr and nothing on stdout. A short run (one scenario, one horizon) keeps the test quick.
 */
import { spawnSync } from 'node:child_process';
import path from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { createHash } from 'node:crypto';
import canonicalize from 'canonicalize';
import { exampleSite } from '../../lib/engine/site-schema';
import { assessInputSchema } from '../../lib/engine/assess';
import { formatIssues } from '../../lib/engine/validation';

const root = path.resolve(__dirname, '..', '..');

function runCli(input: string) {
  const r = spawnSync('npm', ['run', '--silent', 'engine', '--', 'assess'], { cwd: root, input, encoding: 'utf8', timeout: 120_000 });
  return { status: r.status, stdout: r.stdout, stderr: r.stderr };
}

function site() {
  const s = structuredClone(exampleSite) as Record<string, unknown>;
  delete s.observed; // no calibration: a quicker run
  return s;
}

/** Fields every result (and the baseline) carries (engine contract, `assess` output). */
const RESULT_FIELDS = [
  'air_temperature_c',
  'thawing_index_c_days',
  'freezing_index_c_days',
  'seasonal_thaw_m',
  'permafrost_table_m',
  'talik',
  'talik_onset_year',
  'ground_temperature_c',
  'ground_temperature_depth_m',
  'settlement_m',
  'hazard',
  'hazard_reasons',
  'confidence',
] as const;

describe('engine CLI: assess', () => {
  let good: ReturnType<typeof runCli>;
  beforeAll(() => {
    good = runCli(JSON.stringify({ site: site(), scenarios: ['SSP2-4.5'], horizons: [2030] }));
  });

  it('good input: exit 0, contract fields present', () => {
    expect(good.stderr).toBe('');
    expect(good.status).toBe(0);
    const out = JSON.parse(good.stdout);
    expect(out.baseline.period).toEqual([1991, 2020]);
    for (const f of RESULT_FIELDS) expect(out.baseline).toHaveProperty(f);
    expect(out.results).toHaveLength(1);
    const r = out.results[0];
    expect(r).toMatchObject({ scenario: 'SSP2-4.5', horizon: 2030, window: [2021, 2040] });
    for (const f of RESULT_FIELDS) expect(r).toHaveProperty(f);
    expect(['low', 'moderate', 'high']).toContain(r.hazard);
    expect(Array.isArray(r.hazard_reasons)).toBe(true);
    // The same depth of zero annual amplitude in every entry (contract).
    expect(r.ground_temperature_depth_m).toBe(out.baseline.ground_temperature_depth_m);
    expect(out.annual.length).toBeGreaterThan(0);
    expect(out.annual[0]).toMatchObject({ scenario: 'SSP2-4.5' });
    expect(out.annual[0]).toHaveProperty('seasonal_thaw_m');
    expect(out.envelopes[0]).toMatchObject({ scenario: 'SSP2-4.5', horizon: 2030 });
    expect(out.envelopes[0].depths_m.length).toBe(out.envelopes[0].min_c.length);
    expect(out.envelopes[0].depths_m.length).toBe(out.envelopes[0].max_c.length);
    expect(out.provenance.engine_version).toMatch(/^\d+\.\d+\.\d+$/);
    expect(out.provenance.input_sha256).toMatch(/^[0-9a-f]{64}$/);
    expect(out.provenance.sources.length).toBeGreaterThan(0);
  });

  it('good input: no NaN or Infinity anywhere (JSON cannot carry them; nulls only where documented)', () => {
    // JSON.stringify writes NaN/Infinity as null: nulls may only be the documented nullable fields.
    const allowedNull = new Set(['talik_onset_year', 'permafrost_table_m', 'column_extended_to_m', 'baseline_permafrost_table_m', 'baseline_permafrost_base_m', 'workerFallback']);
    const walk = (v: unknown, key: string) => {
      if (v === null) expect(allowedNull.has(key), `null at ${key}`).toBe(true);
      else if (typeof v === 'number') expect(Number.isFinite(v)).toBe(true);
      else if (Array.isArray(v)) v.forEach((x) => walk(x, key));
      else if (typeof v === 'object') for (const [k, x] of Object.entries(v as object)) walk(x, k);
    };
    walk(JSON.parse(good.stdout), '');
  });

  it('the input hash is the SHA-256 of the validated input in RFC 8785 canonical JSON', () => {
    const out = JSON.parse(good.stdout);
    const validated = assessInputSchema.parse({ site: site(), scenarios: ['SSP2-4.5'], horizons: [2030] });
    // RFC 8785 canonicalization (the `canonicalize` package), then SHA-256 (FIPS 180-4).
    expect(out.provenance.input_sha256).toBe(createHash('sha256').update(canonicalize(validated)!).digest('hex'));
    // Key order does not matter to the canonical form (RFC 8785 §3.2.3): unparsed objects, since the
    // schema would rebuild them in its own key order anyway.
    const raw = { site: site(), scenarios: ['SSP2-4.5'], horizons: [2030] };
    const reordered = { horizons: [2030], scenarios: ['SSP2-4.5'], site: Object.fromEntries(Object.entries(site()).reverse()) };
    expect(JSON.stringify(reordered)).not.toBe(JSON.stringify(raw));
    expect(canonicalize(reordered)).toBe(canonicalize(raw));
  });

  it('a horizon that is not a decade 2030–2090: exit 2, one line naming horizons[0], nothing on stdout', () => {
    const r = runCli(JSON.stringify({ site: site(), scenarios: ['SSP2-4.5'], horizons: [2035] }));
    expect(r.status).toBe(2);
    expect(r.stdout).toBe('');
    const lines = r.stderr.trim().split('\n');
    expect(lines).toHaveLength(1);
    expect(lines[0]).toMatch(/^horizons\[0\]: must be a decade from 2030 to 2090/);
    // The same rule in-process for the ends of the range (contract: decades 2030 to 2090 only).
    for (const [horizons, path] of [[[2020], 'horizons[0]'], [[2050, 2100], 'horizons[1]'], [[2050, 2050.5], 'horizons[1]']] as const) {
      const parsed = assessInputSchema.safeParse({ site: site(), scenarios: ['SSP2-4.5'], horizons });
      expect(parsed.success).toBe(false);
      expect(formatIssues(parsed.error!)[0]).toMatch(new RegExp(`^${path.replace(/[[\]]/g, '\\$&')}: must be a decade from 2030 to 2090`));
    }
  });

  it('a bad site field: exit 2 naming its path (contract example), nothing on stdout', () => {
    const s = site() as { layers: { thickness_m: number }[] };
    s.layers[1].thickness_m = 0;
    const r = runCli(JSON.stringify({ site: s, scenarios: ['SSP2-4.5'], horizons: [2050] }));
    expect(r.status).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr.trim()).toBe('site.layers[1].thickness_m: must be > 0');
  });

  it('a 50 km column (50 layers of 1000 m): exit 2 naming the layer thickness, at once (bounds, docs/site-schema.md)', () => {
    const s = site() as { layers: { thickness_m: number }[] };
    s.layers = Array.from({ length: 50 }, () => ({ ...s.layers[s.layers.length - 1], thickness_m: 1000 }));
    const r = runCli(JSON.stringify({ site: s, scenarios: ['SSP2-4.5'], horizons: [2050] }));
    expect(r.status).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr.trim()).toBe('site.layers[0].thickness_m: must be <= 200');
  });

  it('an unknown scenario: exit 2 naming scenarios[1]', () => {
    const r = runCli(JSON.stringify({ site: site(), scenarios: ['SSP2-4.5', 'RCP8.5'], horizons: [2050] }));
    expect(r.status).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr.trim()).toMatch(/^scenarios\[1\]: must be one of /);
  });
});
