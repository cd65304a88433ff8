/**
 * Prints the one closing line CI reads: `N passed, N failed` (", N skipped" when any).
 *
 * A test file that fails to load, an unhandled error and a failed global setup each count as a
 * failure, so a broken harness can never look like a clean run.
 */
import type { Reporter, TestModule, TestRunEndReason } from 'vitest/node';
import type { SerializedError } from 'vitest';

export default class ClosingLineReporter implements Reporter {
  onTestRunEnd(
    testModules: ReadonlyArray<TestModule>,
    unhandledErrors: ReadonlyArray<SerializedError>,
    reason: TestRunEndReason,
  ): void {
    let passed = 0;
    let failed = 0;
    let skipped = 0;
    for (const mod of testModules) {
      let testsInModule = 0;
      for (const test of mod.children.allTests()) {
        testsInModule += 1;
        const state = test.result().state;
        if (state === 'passed') passed += 1;
        else if (state === 'failed') failed += 1;
        else skipped += 1;
      }
      // A file that could not be collected (syntax error, failed import) has no tests but errors.
      if (testsInModule === 0 && mod.state() === 'failed') failed += 1;
    }
    failed += unhandledErrors.length;
    if (reason === 'failed' && failed === 0) failed = 1; // e.g. a global setup that threw
    const skippedPart = skipped > 0 ? `, ${skipped} skipped` : '';
    process.stdout.write(`\n${passed} passed, ${failed} failed${skippedPart}\n`);
  }
}
