/**
 * The Fastify application. `buildApp()` assembles it and never listens (tests use
 * `inject`; server/main.ts listens).
 */
import Fastify, { type FastifyInstance, type FastifyServerOptions } from 'fastify';
import { AnswerCache } from './answerCache.js';
import type { ServiceContext } from './context.js';
import { buildOpenapi } from './openapi.js';
import { OneLinePerRequest } from './plugins/requestLog.js';
import { registerUploadBody } from './plugins/uploadBody.js';
import { PreparedCache } from './preparedCache.js';
import { ComputePool } from './jobs/computePool.js';
import { clientErrorProblem, frameworkProblem, registerProblemHandler } from './problem.js';
import { ALL_ROUTES } from './routes/index.js';
import { registerRoutes } from './routes/routeSpec.js';
import { SERVICE_LIMITS, type ServiceLimits } from './serviceLimits.js';
import { HullStore } from './store/hullStore.js';

export interface AppOptions {
  /** The hull store; when left out, one is opened in `dataDir`. */
  readonly store?: HullStore;
  /** Directory of the store's file, or ':memory:' (the default, for tests). */
  readonly dataDir?: string;
  /** Fastify's logger option: false (the default) for none, or pino options. */
  readonly logger?: FastifyServerOptions['logger'];
  /** Limits other than SERVICE_LIMITS (tests use small timeouts and thresholds). */
  readonly limits?: Partial<ServiceLimits>;
}

declare module 'fastify' {
  interface FastifyInstance {
    /** The store and cache the routes use (for tests and for main.ts's demo preload). */
    readonly halfbreadth: { readonly store: HullStore; readonly cache: PreparedCache; readonly pool: ComputePool };
  }
}

export async function buildApp(options: AppOptions = {}): Promise<FastifyInstance> {
  const ownStore = options.store === undefined;
  const store = options.store ?? HullStore.open(options.dataDir ?? ':memory:');
  const limits: ServiceLimits = { ...SERVICE_LIMITS, ...options.limits };
  const app = Fastify({
    logger: options.logger ?? false,
    logController: new OneLinePerRequest(),
    // Counted while the body arrives: a body over it is cut off before it is parsed.
    bodyLimit: limits.bodyLimit,
    requestTimeout: limits.requestTimeout,
    connectionTimeout: limits.connectionTimeout,
    keepAliveTimeout: limits.keepAliveTimeout,
    http: {
      maxHeaderSize: limits.maxHeaderSize,
      headersTimeout: limits.headersTimeout,
      // Node looks for requests past their time only this often (30 s by default), so a
      // 30 s request timeout could let a slow body run on for nearly a minute.
      connectionsCheckingInterval: limits.timeoutCheckInterval,
    },
    // Node's own answers to malformed requests, slow ones and overlong headers, as problem documents.
    clientErrorHandler: clientErrorProblem,
    routerOptions: { maxParamLength: 200 },
    // Closing stops idle keep-alive sockets at once and lets requests in flight finish.
    forceCloseConnections: 'idle',
    return503OnClosing: true,
    frameworkErrors: frameworkProblem,
  });
  const cache = new PreparedCache(store, limits.preparedCacheSize);
  const pool = new ComputePool(limits);
  // The OpenAPI document is made when first asked for: about a third of building the app,
  // which every start (and every test's app) would otherwise pay for a page few open.
  let openapi: ReturnType<typeof buildOpenapi> | undefined;
  const ctx: ServiceContext = {
    store,
    cache,
    answers: new AnswerCache(limits.answerCacheChars),
    pool,
    limits,
    openapi: () => (openapi ??= buildOpenapi(ALL_ROUTES)),
  };

  registerProblemHandler(app);
  registerUploadBody(app);
  // Once the service is closing, an answer to a request still in flight tells the client
  // to close its connection, so the socket ends with the answer instead of idling until
  // the keep-alive timeout and holding up the exit (idle sockets are closed by
  // forceCloseConnections: 'idle' when closing starts; this covers the ones that turn
  // idle after it).
  let closing = false;
  app.addHook('preClose', async () => {
    closing = true;
  });
  app.addHook('onSend', async (_req, reply, payload) => {
    reply.header('x-content-type-options', 'nosniff');
    if (closing) reply.header('connection', 'close');
    return payload;
  });
  registerRoutes(app, ALL_ROUTES, ctx);
  app.addHook('onClose', async () => pool.close());
  if (ownStore) app.addHook('onClose', async () => store.close());

  app.decorate('halfbreadth', { store, cache, pool });
  await app.ready();
  return app;
}
