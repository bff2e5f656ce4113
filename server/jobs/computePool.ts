/**
 * The worker threads that run heavy jobs (job.ts) off the request thread, so that
 * `/healthz` and small requests are answered while a large computation runs. A pool of
 * piscina (a well-kept worker-thread pool from the registry): SERVICE_LIMITS.workerThreads
 * threads, a bounded queue (503 with Retry-After when it is full), each job stopped
 * after SERVICE_LIMITS.computeTimeout (its thread is terminated, 503), and a heap limit
 * per thread (a job that needs more is stopped, 503). A request whose client goes away
 * stops its job too. The threads run at a lower priority than the request thread.
 *
 * The pool is made on the first heavy job, so a service (or a test) that never has one
 * starts no thread; closing the app destroys it.
 */
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { Piscina } from 'piscina';
import { serviceFail } from '../serviceErrors.js';
import type { ServiceLimits } from '../serviceLimits.js';
import { fromWire, type Job, type JobOutcome, type JobValue } from './job.js';

/**
 * The worker's compiled file. From the build (dist/server/jobs/) it lies beside this one;
 * when this module runs from its TypeScript source (the tests), the build's copy is used
 * (test/globalSetup.ts builds dist/ before the tests run).
 */
function workerFile(): string {
  const beside = fileURLToPath(new URL('./workerEntry.cjs', import.meta.url));
  if (existsSync(beside)) return beside;
  return fileURLToPath(new URL('../../dist/server/jobs/workerEntry.cjs', import.meta.url));
}

export class ComputePool {
  private pool: Piscina<Job, JobOutcome> | undefined;

  constructor(private readonly limits: Pick<ServiceLimits, 'workerThreads' | 'workerQueue' | 'workerHeapMb' | 'computeTimeout'>) {}

  /** Run `job` in a worker thread; resolves to its value, or rejects with the problem it raised or met. */
  async run(job: Job, cancelled?: AbortSignal): Promise<JobValue> {
    this.pool ??= new Piscina<Job, JobOutcome>({
      filename: workerFile(),
      minThreads: 1,
      maxThreads: this.limits.workerThreads,
      maxQueue: this.limits.workerQueue,
      idleTimeout: 60_000,
      resourceLimits: { maxOldGenerationSizeMb: this.limits.workerHeapMb },
      // Worker threads run at a lower priority than the request thread (nice +10, Linux
      // and macOS), so that on a busy machine the scheduler serves requests first.
      niceIncrement: 10,
    });
    const timeout = AbortSignal.timeout(this.limits.computeTimeout);
    const signal = cancelled === undefined ? timeout : AbortSignal.any([timeout, cancelled]);
    let outcome: JobOutcome;
    try {
      outcome = await this.pool.run(job, { signal });
    } catch (e) {
      const message = e instanceof Error ? e.message : String(e);
      if (timeout.aborted) {
        serviceFail('HYD_COMPUTE_LIMIT', ['computation'], `the computation ran longer than ${this.limits.computeTimeout / 1000} s (computeTimeout) and was stopped; ask for less at once`);
      }
      if (cancelled?.aborted === true) serviceFail('HYD_COMPUTE_LIMIT', ['computation'], 'the client went away; the computation was stopped');
      if (/queue is at limit|no task queue/i.test(message)) {
        serviceFail('HYD_BUSY', ['computation'], `all ${this.limits.workerThreads} worker thread(s) are busy and ${this.limits.workerQueue} computations wait already; retry in a few seconds`, { 'retry-after': '5' });
      }
      if (/out of memory|ERR_WORKER_OUT_OF_MEMORY/i.test(message) || (e as { code?: string }).code === 'ERR_WORKER_OUT_OF_MEMORY') {
        serviceFail('HYD_COMPUTE_LIMIT', ['computation'], `the computation needed more than ${this.limits.workerHeapMb} MiB (workerHeapMb) and was stopped; ask for less at once`);
      }
      throw e;
    }
    if (!outcome.ok) throw fromWire(outcome.error);
    return outcome.value;
  }

  /** Threads running now (0 before the first heavy job). */
  get threads(): number {
    return this.pool?.threads.length ?? 0;
  }

  async close(): Promise<void> {
    const p = this.pool;
    this.pool = undefined;
    if (p !== undefined) await p.destroy();
  }
}
