/** What the route handlers share: the hull store, the cache of prepared hulls, the API document. */
import type { PreparedCache } from './preparedCache.js';
import type { HullStore } from './store/hullStore.js';

export interface ServiceContext {
  readonly store: HullStore;
  readonly cache: PreparedCache;
  /** The OpenAPI document of the service (server/openapi.ts), built once. */
  readonly openapi: Readonly<Record<string, unknown>>;
}
