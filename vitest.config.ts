import { defineConfig } from 'vitest/config';

// Node tests only: browser tests under test/web/ run in Chromium through web-test-runner.
export default defineConfig({
  test: {
    include: ['test/**/*.test.ts'],
    exclude: ['test/web/**', 'node_modules/**'],
    environment: 'node',
    // Generous: the machines are shared, and a loaded core runs a whole-mission test several times slower.
    testTimeout: 60_000,
  },
});
