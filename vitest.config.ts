import { availableParallelism } from 'node:os';
import { BaseSequencer, type TestSpecification } from 'vitest/node';
import { defineConfig } from 'vitest/config';

/**
 * The browser tests first: one file drives a browser for several seconds, and started
 * first it runs on one worker while the other works through the rest, instead of
 * starting last and running alone. Otherwise vitest's own order (failed, then longest).
 */
class BrowserFirst extends BaseSequencer {
  override async sort(files: TestSpecification[]): Promise<TestSpecification[]> {
    const sorted = await super.sort(files);
    const browser = (f: TestSpecification): boolean => /[\\/]test[\\/]browser[\\/]/.test(f.moduleId);
    return [...sorted.filter(browser), ...sorted.filter((f) => !browser(f))];
  }
}

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
    sequence: { sequencer: BrowserFirst },
  },
});
