import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['test/**/*.test.ts'],
    // A skipped test is a failing test: forbid .only and treat todo/skip as errors via the reporter check in .ci/run.
    allowOnly: false,
    testTimeout: 60_000,
  },
});
