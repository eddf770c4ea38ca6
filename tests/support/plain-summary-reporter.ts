// Closes a vitest run with one plain line, `N passed, N failed` (plus `, N skipped` when any were), counted
// from vitest's own results, for CI harnesses that read the last line. A file, suite or hook that errors
// outside a test counts as one failure, and so does each unhandled error. When tests/run.ts sets
// LANEWRIGHT_SUMMARY_FILE, the line is written there instead, so the runner can print it after its own
// clean-up and keep it last.
import { writeFileSync } from 'node:fs';
import { testEnv } from './test-env';
import type { Reporter, SerializedError, TestModule, TestSuite } from 'vitest/node';

export interface RunCounts {
  passed: number;
  failed: number;
  skipped: number;
}

/** Failures outside tests: collection errors, failing beforeAll/afterAll hooks, files that did not run. */
function errorsOutsideTests(module: TestModule): number {
  const suites: Array<TestModule | TestSuite> = [module, ...module.children.allSuites()];
  const hookOrCollectionErrors = suites.filter((suite) => suite.errors().length > 0).length;
  if (hookOrCollectionErrors > 0) return hookOrCollectionErrors;
  const moduleFailedWithoutFailingTest = module.state() === 'failed' && module.children.allTests('failed').next().done;
  return moduleFailedWithoutFailingTest ? 1 : 0;
}

export function countResults(
  testModules: ReadonlyArray<TestModule>,
  unhandledErrors: ReadonlyArray<SerializedError>,
): RunCounts {
  const counts: RunCounts = { passed: 0, failed: unhandledErrors.length, skipped: 0 };
  for (const module of testModules) {
    for (const test of module.children.allTests()) {
      const state = test.result().state;
      if (state === 'passed') counts.passed += 1;
      else if (state === 'failed') counts.failed += 1;
      else if (state === 'skipped') counts.skipped += 1;
      // A test still pending at the end was cut short (timeout of its file, interrupted run).
      else counts.failed += 1;
    }
    counts.failed += errorsOutsideTests(module);
  }
  return counts;
}

export function summaryLine({ passed, failed, skipped }: RunCounts): string {
  return `${passed} passed, ${failed} failed${skipped > 0 ? `, ${skipped} skipped` : ''}`;
}

export default class PlainSummaryReporter implements Reporter {
  onTestRunEnd(testModules: ReadonlyArray<TestModule>, unhandledErrors: ReadonlyArray<SerializedError>): void {
    const line = summaryLine(countResults(testModules, unhandledErrors));
    const target = testEnv().LANEWRIGHT_SUMMARY_FILE;
    if (target) writeFileSync(target, `${line}\n`);
    else console.log(line);
  }
}
