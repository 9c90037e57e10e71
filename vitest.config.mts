import { defineConfig } from 'vitest/config';
import ClosingLineReporter from './test/support/closingLineReporter';

export default defineConfig({
  test: {
    include: ['test/**/*.test.ts'],
    testTimeout: 60000,
    hookTimeout: 180000,
    globalSetup: ['./test/support/buildAndServe.ts'],
    reporters: ['default', new ClosingLineReporter()],
  },
});
