import { describe, expect, it } from 'vitest';
import { runAssessment, exampleSite, canonicalSha256 } from '@/lib/engine';
import { outlookInput, outlookInputSha256 } from './input';
import { outlookResultSchema } from './result';
import { buildSummary } from './summary';

describe('outlook input and the stored document', () => {
  it('computes the engine\'s own input hash without running it (RFC 8785 canonical JSON, SHA-256), and reads the engine\'s output', async () => {
    const input = { site: exampleSite, scenarios: ['SSP2-4.5' as const], horizons: [2050, 2080] };
    const { output } = await runAssessment(input, { cache: null, useWorkers: false });
    expect(outlookInputSha256(input)).toBe(output.provenance.input_sha256);
    const parsed = outlookResultSchema.parse(output);
    expect(parsed.results.map((r) => r.horizon)).toEqual([2050, 2080]);
    expect(buildSummary(parsed, 'en', () => 'Under intermediate emissions (SSP2-4.5)')!.sentences.length).toBeGreaterThan(4);
  });

  it('asks for all five scenarios, low to high, and the horizons 2030, 2050, 2080', () => {
    const input = outlookInput(exampleSite);
    expect(input.scenarios).toEqual(['SSP1-1.9', 'SSP1-2.6', 'SSP2-4.5', 'SSP3-7.0', 'SSP5-8.5']);
    expect(input.horizons).toEqual([2030, 2050, 2080]);
    // Key order does not change the fingerprint (RFC 8785); checked on the hash itself, on unparsed
    // objects, since the schema would rebuild any input in its own key order.
    expect(canonicalSha256({ b: 1, a: { d: 2, c: 3 } })).toBe(canonicalSha256({ a: { c: 3, d: 2 }, b: 1 }));
    expect(canonicalSha256({ a: 1 })).not.toBe(canonicalSha256({ a: 2 }));
  });
});
