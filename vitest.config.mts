import { defineConfig } from 'vitest/config';
import ClosingLineReporter from './test/support/closingLineReporter';

export default defineConfig({
  test: {
    include: ['test/**/*.test.ts'],
    testTimeout: 60000,
    reporters: ['default', new ClosingLineReporter()],
  },
});
