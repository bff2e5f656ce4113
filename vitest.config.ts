import { availableParallelism } from 'node:os';
import { BaseSequencer, type TestSpecification } from 'vitest/node';
import { defineConfig } from 'vitest/config';

/**
 * The test files that load mathjs (imperial units: about 1.3 s of CPU to import, once
 * per worker), one after the other so that one worker loads it: they run beside the
 * browser file, which takes longer than all of them together.
 */
const MATHJS_USERS = [
  'test/common/units.test.ts',
  'test/report/imperial.test.ts',
  'test/server/stabilityForms.test.ts',
  'test/server/imperialEverywhere.test.ts',
  'test/server/answerShaping.test.ts',
  'test/cli/sheetCommands.test.ts',
];

/**
 * Test files that run longest, or mostly wait, started first and in this order, each on
 * whichever worker is free: the browser file (mostly waiting on Chromium, which uses the
 * other core), the store's SIGKILL rounds (twenty of them in CI, mostly waiting on its
 * writer), the files that load mathjs (above), then the rest of the long ones, the
 * socket timeouts (1.3 s of waiting) and the free-loop bound (a service process and a
 * heavy check). Started last, any of them would run alone at the end with the other
 * worker idle. The list is read the same way in a clean clone (no results cache) and in
 * a working copy; the other files follow in vitest's own order.
 */
const LONG_FIRST = [
  'test/browser/page.test.ts',
  'test/server/durability.test.ts',
  ...MATHJS_USERS,
  'test/server/mutatedCorpus.test.ts',
  'test/server/badRequests.test.ts',
  'test/cli/cli.test.ts',
  'test/server/e2e.test.ts',
  'test/server/workerThreads.test.ts',
  'test/cli/limits.test.ts',
  'test/server/protocol.test.ts',
  'test/server/freeLoop.test.ts',
];

/**
 * vitest's order (failed files, then the longest by the results cache, else the largest),
 * with LONG_FIRST moved to the front. It must be the root config's sequencer: the pool
 * reads only that one, not a project's.
 */
class LongFirst extends BaseSequencer {
  override async sort(files: TestSpecification[]): Promise<TestSpecification[]> {
    const sorted = await super.sort(files);
    const rank = (f: TestSpecification): number => {
      const at = LONG_FIRST.findIndex((p) => f.moduleId.replaceAll('\\', '/').endsWith(p));
      return at < 0 ? LONG_FIRST.length : at;
    };
    return sorted
      .map((f, k) => ({ f, k }))
      .sort((a, b) => rank(a.f) - rank(b.f) || a.k - b.k)
      .map(({ f }) => f);
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
    sequence: { sequencer: LongFirst },
  },
});
