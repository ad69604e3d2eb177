// Prints "N passed, N failed" from Jest's --json report; a missing report counts as one failure.
import { existsSync, readFileSync } from 'node:fs';

const file = process.argv[2] ?? 'test-results/jest.json';
if (!existsSync(file)) {
  console.log('0 passed, 1 failed');
} else {
  const report = JSON.parse(readFileSync(file, 'utf8'));
  // A suite that fails to load has no test results but still counts as a failure.
  const brokenSuites = report.numRuntimeErrorTestSuites ?? 0;
  console.log(`${report.numPassedTests} passed, ${report.numFailedTests + brokenSuites} failed`);
}
