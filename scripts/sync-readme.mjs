// node scripts/sync-readme.mjs [--check] — copies the reference pages the README must contain
// (docs/site-schema.md, docs/role-matrix.md, docs/bench.md) into README.md between their markers,
// one heading level down. The docs are the source; --check exits 1 if the README is out of date
// (tests/unit/readme-sync.test.ts runs it).
import { readFileSync, writeFileSync } from 'node:fs';

export const SECTIONS = { 'site-schema': 'docs/site-schema.md', 'role-matrix': 'docs/role-matrix.md', bench: 'docs/bench.md' };

export function syncedReadme(readme, read = (f) => readFileSync(f, 'utf8')) {
  let out = readme;
  for (const [name, file] of Object.entries(SECTIONS)) {
    const start = `<!-- ${name}:start -->`;
    const end = `<!-- ${name}:end -->`;
    const i = out.indexOf(start);
    const j = out.indexOf(end);
    if (i < 0 || j < i) throw new Error(`README.md: markers ${start} … ${end} missing`);
    const body = read(file)
      .trim()
      .replace(/^(#+) /gm, '#$1 ')
      // Links between docs pages stay valid from the repository root.
      .replace(/\]\((?!https?:|#|docs\/)([\w-]+\.md)\)/g, '](docs/$1)');
    out = `${out.slice(0, i + start.length)}\n<!-- copied from ${file} by scripts/sync-readme.mjs; edit that file -->\n${body}\n${out.slice(j)}`;
  }
  return out;
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const readme = readFileSync('README.md', 'utf8');
  const next = syncedReadme(readme);
  if (process.argv.includes('--check')) {
    if (next !== readme) {
      console.error('README.md is out of date with docs/: run node scripts/sync-readme.mjs');
      process.exit(1);
    }
  } else writeFileSync('README.md', next);
}
