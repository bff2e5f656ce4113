import { availableParallelism } from 'node:os';
import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['test/**/*.test.ts'],
    // Builds dist/ when the sources are newer, for the end-to-end tests that run it.
    globalSetup: ['test/globalSetup.ts'],
    // A skipped test is a failing test: forbid .only and treat todo/skip as errors via the reporter check in .ci/run.
    allowOnly: false,
    testTimeout: 60_000,
    // Much of each test's time is waiting on child processes and sockets, so two workers
    // pay even on a 2-core machine. Files share a worker's loaded modules instead of
    // loading them afresh (about half the run's time): no test may rely on module state
    // that another file left behind (DEVELOPERS.md, "Tests").
    maxWorkers: Math.max(2, availableParallelism()),
    isolate: false,
  },
});
