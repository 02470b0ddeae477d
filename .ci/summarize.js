// Sums Vitest's JSON report into the plain closing line CI reads, and sets the exit code:
// non-zero when the test command failed, any test failed, or no test ran.
import { existsSync, readFileSync } from 'node:fs';

const [reportPath, statusText] = process.argv.slice(2);
const commandStatus = Number(statusText ?? '1');
let passed = 0;
let failed = 0;
let skipped = 0;

if (reportPath && existsSync(reportPath)) {
  const report = JSON.parse(readFileSync(reportPath, 'utf8'));
  passed = report.numPassedTests ?? 0;
  failed = (report.numFailedTests ?? 0) + (report.numFailedTestSuites ?? 0);
  skipped = (report.numPendingTests ?? 0) + (report.numTodoTests ?? 0);
} else {
  console.log(`No test report at ${reportPath}: the checks before the tests (typecheck, lint) failed or the runner crashed.`);
}
if (commandStatus !== 0 && failed === 0) failed = 1;

console.log(`${passed} passed, ${failed} failed, ${skipped} skipped`);
process.exit(failed > 0 || passed === 0 || commandStatus !== 0 ? 1 : 0);
