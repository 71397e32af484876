/// <reference types="node" />
// Prints the one closing line CI reads: "N passed, N failed", over every suite.
import fs from 'node:fs';

const file = process.argv[2] ?? 'test-artifacts/vitest.json';
let passed = 0;
let failed = 0;
try {
  const report = JSON.parse(fs.readFileSync(file, 'utf8')) as {
    numPassedTests: number;
    numFailedTests: number;
    numPendingTests: number;
    numTodoTests: number;
    testResults: Array<{ status: string; assertionResults: unknown[] }>;
  };
  passed = report.numPassedTests;
  failed = report.numFailedTests;
  // A file that failed to load has no tests but still failed.
  failed += report.testResults.filter((r) => r.status === 'failed' && r.assertionResults.length === 0).length;
  const skipped = report.numPendingTests + report.numTodoTests;
  if (skipped > 0) failed += skipped; // skipped tests are defects here
} catch {
  failed = 1; // the runner crashed before writing its report
}
console.log(`${passed} passed, ${failed} failed`);
process.exit(failed > 0 || passed === 0 ? 1 : 0);
