// Sums vitest's (two runs) and Playwright's JSON reports into the one closing line the test command promises.
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';

const dir = process.argv[2];
let passed = 0;
let failed = 0;
let skipped = 0;

// vitest runs twice: unit and integration before the build, the HTTP tests against it after.
for (const name of ['vitest.json', 'vitest-http.json']) {
  const vitestFile = join(dir, name);
  if (existsSync(vitestFile)) {
    const v = JSON.parse(readFileSync(vitestFile, 'utf8'));
    passed += v.numPassedTests;
    // A file that failed without a failed test (it did not load, or a hook threw) counts once; vitest's
    // numFailedTestSuites would count every describe block around a failed test again.
    const brokenFiles = (v.testResults ?? []).filter((f) => f.status === 'failed' && !(f.assertionResults ?? []).some((a) => a.status === 'failed'));
    failed += v.numFailedTests + brokenFiles.length;
    skipped += v.numPendingTests + (v.numTodoTests ?? 0);
  } else {
    failed += 1;
  }
}

const pwFile = join(dir, 'playwright.json');
if (existsSync(pwFile)) {
  const p = JSON.parse(readFileSync(pwFile, 'utf8'));
  passed += p.stats.expected + (p.stats.flaky ?? 0);
  failed += p.stats.unexpected;
  skipped += p.stats.skipped;
  if (p.errors?.length) failed += p.errors.length;
} else {
  failed += 1;
}

console.log(`${passed} passed, ${failed} failed${skipped ? `, ${skipped} skipped` : ''}`);
process.exit(failed > 0 ? 1 : 0);
