import { describe, expect, it } from 'vitest';
import { demoCommunities } from '@/lib/demo/nivalen';
import { runAssessment } from '@/lib/engine';

/**
 * Plausibility of the invented demo region as the engine sees it (issue: foundation seed). The region is
 * invented, so these are not checks of the engine against a source; they keep the demo data inside what a
 * permafrost community could look like: a baseline seasonal thaw of 0.3–2.5 m at every terrain unit
 * (active layers of that size are typical of the circumpolar monitoring network, e.g. the CALM sites in
 * Brown, Hinkel & Nelson 2000, Polar Geography 24; range from memory), and every concern level somewhere.
 */
const profiles = demoCommunities.flatMap((c) => c.profiles.map((p) => ({ id: `${c.slug}/${p.slug}`, site: p.site })));

describe('demo region baseline outlook', async () => {
  const baselines = new Map<string, { seasonal_thaw_m: number; hazard: string }>();
  for (const p of profiles) {
    const { output } = await runAssessment({ site: p.site, scenarios: ['SSP2-4.5'], horizons: [2050] }, { useWorkers: false });
    baselines.set(p.id, output.baseline as unknown as { seasonal_thaw_m: number; hazard: string });
  }

  it.each(profiles.map((p) => [p.id]))('%s has a baseline seasonal thaw between 0.3 and 2.5 m', (id) => {
    const thaw = baselines.get(id)!.seasonal_thaw_m;
    expect(thaw).toBeGreaterThanOrEqual(0.3);
    expect(thaw).toBeLessThanOrEqual(2.5);
  });

  it('shows all three concern levels across the region', () => {
    const levels = new Set([...baselines.values()].map((b) => b.hazard));
    expect([...levels].sort()).toEqual(['high', 'low', 'moderate']);
  });
});
