/**
 * Prints one plain closing line, "tests: N passed, N failed[, N skipped]", after vitest's own
 * summary, so that tools which read only a run's last line can count the tests.
 */
import type { Reporter, TestModule } from 'vitest/node';

export default class ClosingLineReporter implements Reporter {
  onTestRunEnd(testModules: ReadonlyArray<TestModule>): void {
    const counts = { passed: 0, failed: 0, skipped: 0 };
    for (const module of testModules) {
      for (const test of module.children.allTests()) {
        const state = test.result().state;
        if (state === 'passed') counts.passed++;
        else if (state === 'failed') counts.failed++;
        else counts.skipped++;
      }
    }
    const skipped = counts.skipped > 0 ? `, ${counts.skipped} skipped` : '';
    process.stdout.write(`tests: ${counts.passed} passed, ${counts.failed} failed${skipped}\n`);
  }
}
