/**
 * The file piscina loads in each worker thread. It is CommonJS on purpose: piscina
 * loads its file with require(), and Node 20 aborts the whole process (a V8 fatal error
 * in require() of an ES module) when a thread is terminated while such a require is
 * under way, which a pool does when it is closed or a job is stopped as the thread
 * starts. This file loads at once; the job code (worker.ts, an ES module) is imported on
 * the first job, asynchronously, which a termination stops cleanly.
 */
type Work = (job: never) => unknown;
let work: Promise<Work> | undefined;

export = async function run(job: never): Promise<unknown> {
  work ??= import('./worker.js').then((m: { default: Work }) => m.default);
  return (await work)(job);
};
