import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
// @ts-expect-error -- a plain ES module script without type declarations
import { syncedReadme } from '../../scripts/sync-readme.mjs';

describe('README', () => {
  it('contains the current site schema, role matrix and bench figures from docs/ (node scripts/sync-readme.mjs)', () => {
    const readme = readFileSync('README.md', 'utf8');
    expect(syncedReadme(readme)).toBe(readme);
  });

  it('has a Quick start with exactly two commands, the second being what CI runs', () => {
    const readme = readFileSync('README.md', 'utf8');
    const quick = readme.split('## Quick start')[1]!.split('\n## ')[0]!;
    const block = quick.split('```bash')[1]!.split('```')[0]!.trim().split('\n');
    expect(block).toEqual(['npm run demo', 'npm run test:all']);
    expect(readFileSync('.ci/run', 'utf8')).toContain(block[1]);
  });

  it('opens with the product name and one paragraph of at least 80 words', () => {
    const readme = readFileSync('README.md', 'utf8');
    const [title, , paragraph] = readme.split('\n');
    expect(title).toBe('# Thawline');
    expect(paragraph!.split(/\s+/).length).toBeGreaterThanOrEqual(80);
  });
});
