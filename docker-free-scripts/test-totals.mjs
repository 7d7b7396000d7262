// Prints the closing totals line of npm test from vitest's JSON report, counting the type-check, the
// build, the import-cycle check and the lint and format check as one check each (when they ran), so a failure there is never hidden behind
// green tests.
import { existsSync, readFileSync } from 'node:fs';

const [file, typecheck, build, acyclic, linted] = process.argv.slice(2);
let passed = 0;
let failed = 0;
let skipped = 0;
if (existsSync(file)) {
  const r = JSON.parse(readFileSync(file, 'utf8'));
  passed = r.numPassedTests ?? 0;
  // A file that failed to load (or whose hooks failed) has no failed test of its own: count it once.
  const brokenFiles = (r.testResults ?? []).filter((s) => s.status === 'failed' && !(s.assertionResults ?? []).some((a) => a.status === 'failed')).length;
  failed = (r.numFailedTests ?? 0) + brokenFiles;
  skipped = (r.numPendingTests ?? 0) + (r.numTodoTests ?? 0);
} else {
  failed += 1;
  console.error('no test report was written: vitest did not run to the end');
}
// npm test -- <file> runs only vitest: the checks of the whole tree were not part of it.
const checks =
  typecheck === '--tests-only'
    ? []
    : [
        ['type-check', typecheck],
        ['build', build],
        ['import-cycle check', acyclic],
        ['lint and format check', linted],
      ];
for (const [name, ok] of checks) {
  if (ok === '1') passed += 1;
  else {
    failed += 1;
    console.error(`${name} failed (see above)`);
  }
}
console.log(`\n${passed} passed, ${failed} failed${skipped ? `, ${skipped} skipped` : ''}`);
process.exit(failed > 0 ? 1 : 0);
