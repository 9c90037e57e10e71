import { defineConfig } from 'vitest/config';
import ClosingLineReporter from './test/support/closingLineReporter';

/**
 * Tests that bound how long the page's main thread is busy (issue #15) run on their own, after
 * everything else: on 2 cores, other test files running beside them would lengthen every task
 * they measure. Every other file runs in parallel, as before.
 */
const ALONE = [
  'test/preview/browser/longTasks.test.ts',
  'test/preview/browser/longTasksAboveLiveSize.test.ts',
  'test/preview/browser/longTasksFormulaWorker.test.ts',
];

export default defineConfig({
  test: {
    testTimeout: 60000,
    hookTimeout: 180000,
    globalSetup: ['./test/support/buildAndServe.ts'],
    reporters: ['default', new ClosingLineReporter()],
    projects: [
      { extends: true, test: { name: 'parallel', include: ['test/**/*.test.ts'], exclude: ALONE, sequence: { groupOrder: 0 } } },
      { extends: true, test: { name: 'alone', include: ALONE, fileParallelism: false, sequence: { groupOrder: 1 } } },
    ],
  },
});
