/** What the route handlers share: the hull store, the cache of prepared hulls, the API document. */
import type { AnswerCache } from './answerCache.js';
import type { PreparedCache } from './preparedCache.js';
import type { HullStore } from './store/hullStore.js';

export interface ServiceContext {
  readonly store: HullStore;
  readonly cache: PreparedCache;
  /** Serialised answers of computations on stored hulls, by ETag. */
  readonly answers: AnswerCache;
  /** The OpenAPI document of the service (server/openapi.ts), built once. */
  readonly openapi: Readonly<Record<string, unknown>>;
}
