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

/** Test files whose checks bound a time (a response while heavy work runs). */
const TIMED = ['test/server/freeLoop.test.ts'];

export default defineConfig({
  test: {
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
    projects: [
      {
        extends: true,
        test: { name: 'main', include: ['test/**/*.test.ts'], exclude: ['**/node_modules/**', ...TIMED], sequence: { sequencer: BrowserFirst, groupOrder: 0 } },
      },
      // Files that bound a response time run last and alone, once every other file is
      // done: a browser or a corpus on the other core would measure the machine, not the
      // service.
      { extends: true, test: { name: 'timed', include: [...TIMED], sequence: { groupOrder: 1 } } },
    ],
  },
});
