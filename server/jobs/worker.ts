/**
 * A worker thread of the pool (computePool.ts): runs one job at a time (job.ts) and
 * hands back its outcome as plain data. Loaded by piscina; nothing here touches HTTP.
 */
import { runJob, type Job, type JobOutcome } from './job.js';

export default function work(job: Job): Promise<JobOutcome> {
  return runJob(job);
}
