// Adds up the test counts of the vitest and Playwright JSON reports and prints one closing line
// ("N passed, N failed"). A step that failed without a report (typecheck, lint, build) counts as one failure.
import fs from 'node:fs';
import path from 'node:path';

const [dir, failedStepsArg] = process.argv.slice(2);
let passed = 0;
let failed = 0;
let skipped = 0;
const read = (f) => {
  try {
    return JSON.parse(fs.readFileSync(path.join(dir, f), 'utf8'));
  } catch {
    return undefined;
  }
};
let reportFailures = 0;
for (const f of ['unit.json', 'api.json']) {
  const r = read(f);
  if (!r) continue;
  passed += r.numPassedTests ?? 0;
  failed += r.numFailedTests ?? 0;
  skipped += (r.numPendingTests ?? 0) + (r.numTodoTests ?? 0);
  reportFailures += r.numFailedTests > 0 || r.success === false ? 1 : 0;
}
const e2e = read('e2e.json');
if (e2e?.stats) {
  passed += e2e.stats.expected ?? 0;
  failed += (e2e.stats.unexpected ?? 0) + (e2e.stats.flaky ?? 0);
  skipped += e2e.stats.skipped ?? 0;
  reportFailures += e2e.stats.unexpected > 0 ? 1 : 0;
}
// Steps that failed but left no failing test behind (typecheck, lint, build, a crashed runner).
failed += Math.max(0, Number(failedStepsArg) - reportFailures);
console.log(`${passed} passed, ${failed} failed${skipped ? `, ${skipped} skipped` : ''}`);
