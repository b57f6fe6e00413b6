/**
 * The `climate` command through the real CLI (`npm run --silent engine -- climate`), as the engine
 * contract (docs/engine-contract.md) specifies: JSON in on stdin, JSON out on stdout; bad input
 * exits 2 with one line naming the field on stderr and nothing on stdout.
 */
import { spawnSync } from 'node:child_process';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

const root = path.resolve(__dirname, '..', '..');

function runCli(input: string) {
  const r = spawnSync('npm', ['run', '--silent', 'engine', '--', 'climate'], { cwd: root, input, encoding: 'utf8', timeout: 60_000 });
  return { status: r.status, stdout: r.stdout, stderr: r.stderr };
}

describe('engine CLI: climate', () => {
  it('good input: years 1850–2100 and global_warming_c, exit 0', () => {
    const r = runCli(JSON.stringify({ scenario: 'SSP2-4.5', permafrost_carbon_feedback: false }));
    expect(r.status).toBe(0);
    const out = JSON.parse(r.stdout) as { years: number[]; global_warming_c: number[] };
    expect(out.years).toHaveLength(251);
    expect(out.years[0]).toBe(1850);
    expect(out.years[250]).toBe(2100);
    expect(out.global_warming_c).toHaveLength(251);
    // IPCC AR6 WG1 Table SPM.1, SSP2-4.5 2081–2100: very likely 2.1–3.5 °C.
    const late = out.global_warming_c.slice(2081 - 1850).reduce((a, b) => a + b, 0) / 20;
    expect(late).toBeGreaterThanOrEqual(2.1);
    expect(late).toBeLessThanOrEqual(3.5);
  });

  it('unknown scenario: exit 2, nothing on stdout, one line on stderr naming the field', () => {
    const r = runCli(JSON.stringify({ scenario: 'RCP8.5' }));
    expect(r.status).toBe(2);
    expect(r.stdout).toBe('');
    const lines = r.stderr.trim().split('\n');
    expect(lines).toHaveLength(1);
    expect(lines[0]).toMatch(/^scenario: must be one of /);
  });

  it('wrong type of the feedback flag: exit 2, nothing on stdout, one line on stderr naming the field', () => {
    const r = runCli(JSON.stringify({ scenario: 'SSP1-2.6', permafrost_carbon_feedback: 1 }));
    expect(r.status).toBe(2);
    expect(r.stdout).toBe('');
    const lines = r.stderr.trim().split('\n');
    expect(lines).toHaveLength(1);
    expect(lines[0]).toMatch(/^permafrost_carbon_feedback: /);
  });
});
