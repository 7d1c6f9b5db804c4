// The test runner's settings. Timeouts are generous so the suite holds on a loaded 2-core machine
// (a CLI test runs the built command, and a whole notebook check takes many seconds there); no test
// asserts on wall-clock time outside test/bench.
import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['test/**/*.test.ts'],
    testTimeout: 180_000,
    hookTimeout: 180_000,
    teardownTimeout: 60_000,
  },
});
