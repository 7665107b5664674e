import { defineConfig } from 'vitest/config';

// Node tests only: browser tests under test/web/ run in Chromium through web-test-runner.
export default defineConfig({
  test: {
    include: ['test/**/*.test.ts'],
    exclude: ['test/web/**', 'node_modules/**'],
    environment: 'node',
    // Property tests and the 3-D reference scenarios take seconds on a busy 2-core machine: a timeout is not a wrong answer.
    testTimeout: 120_000,
  },
});
