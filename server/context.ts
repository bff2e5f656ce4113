/** What the route handlers share: the hull store, the caches, the worker threads, the limits in force, the API document. */
import type { AnswerCache } from './answerCache.js';
import type { ComputePool } from './jobs/computePool.js';
import type { PreparedCache } from './preparedCache.js';
import type { ServiceLimits } from './serviceLimits.js';
import type { HullStore } from './store/hullStore.js';

export interface ServiceContext {
  readonly store: HullStore;
  readonly cache: PreparedCache;
  /** Serialised answers of computations on stored hulls, by ETag. */
  readonly answers: AnswerCache;
  /** Worker threads for heavy jobs (server/jobs/). */
  readonly pool: ComputePool;
  /** The limits in force: SERVICE_LIMITS, or a test's smaller ones. */
  readonly limits: ServiceLimits;
  /** The OpenAPI document of the service (server/openapi.ts), built on first use and kept. */
  readonly openapi: () => Readonly<Record<string, unknown>>;
}
