// node scripts/test-summary.mjs RESULTS_DIR [FAILED_STEP...] — adds up the vitest and Playwright JSON
// reports and prints the closing line `N passed, N failed, N skipped`; exit 1 if anything failed.
import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';

const [dir, ...failedSteps] = process.argv.slice(2);
let passed = 0, failed = 0, skipped = 0;
for (const name of ['unit', 'integration']) {
  const f = path.join(dir, `${name}.json`);
  if (!existsSync(f)) continue;
  const r = JSON.parse(readFileSync(f, 'utf8'));
  passed += r.numPassedTests; failed += r.numFailedTests; skipped += r.numPendingTests + (r.numTodoTests ?? 0);
}
const e2e = path.join(dir, 'e2e.json');
if (existsSync(e2e)) {
  const s = JSON.parse(readFileSync(e2e, 'utf8')).stats;
  passed += s.expected + (s.flaky ?? 0); failed += s.unexpected; skipped += s.skipped;
}
// A failed stage (type-check, lint, a runner that crashed) counts as a failure in the closing line too,
// so that line never reads as a pass when the command as a whole failed.
if (failedSteps.length) console.log(`failed stages: ${failedSteps.join(', ')} (${failed} failing tests)`);
let failures = failed + failedSteps.length;
if (passed === 0 && failures === 0) { console.log('no test ran'); failures = 1; }
console.log(`Tests: ${passed} passed, ${failures} failed, ${skipped} skipped`);
process.exit(failures > 0 ? 1 : 0);
